package org.exitance.cases;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.TemperatureTabulatedEmissivity;

/**
 * Reads a semi-transparent material: any two of emissivity ε(λ), reflectivity ρ(λ) and
 * transmissivity τ(λ), or all three, each gray ({@code "transmissivity": 0.9}), a table or steps
 * in λ, one table per temperature ({@code byTemperature}) or a CSV file (optionally with a
 * {@code temperature_K} column). For a diffuse surface α_λ = ε_λ (Kirchhoff) and
 * α_λ + ρ_λ + τ_λ = 1 (energy conservation; Siegel &amp; Howell, Thermal Radiation Heat Transfer,
 * 5th ed., ch. 3, from memory), so two determine the third.
 *
 * <p>The properties are checked at every node of the grid made of the union of their wavelength
 * nodes and the union of their temperatures. Each property is bilinear in (λ, T) on every cell of
 * that grid (linear in λ between nodes, linear in T between tables, ends held), so a check at
 * the nodes holds everywhere, and a derived property stored on the grid is exact.
 *
 * <p>Measured data given as all three rarely sum to exactly 1. Where the sum misses 1 by more than
 * {@value #ROUNDING} at some node, the three are scaled by 1/(α + ρ + τ) at every node (linear
 * between them), which keeps each in [0, 1]. A miss larger than the material's
 * {@code measurementTolerance} (default {@value #DEFAULT_MEASUREMENT_TOLERANCE}) is an error in a
 * case; the property survey of a material file instead records it as a warning.
 */
final class SemiTransparentProperties {
    /** Largest |α + ρ + τ − 1| at a node taken as rounding of consistent data (the values are then used as given). */
    static final double ROUNDING = 1e-6;
    /** Default largest |α + ρ + τ − 1| accepted from measured data (absolute; about ±0.01 per measured quantity, from memory). */
    static final double DEFAULT_MEASUREMENT_TOLERANCE = 0.02;

    private SemiTransparentProperties() {
    }

    /**
     * @param warnings where a sum outside the measurement tolerance is recorded (modified: lines are
     *                 added), or null to make it an error
     */
    static Material read(String name, JsonCursor m, Path caseDir, String description, List<String> warnings)
            throws CaseException {
        SpectralEmissivity eps = property(m, "emissivity", "spectralEmissivity", caseDir);
        SpectralEmissivity tau = property(m, "transmissivity", "spectralTransmissivity", caseDir);
        SpectralEmissivity rho = property(m, "reflectivity", "spectralReflectivity", caseDir);
        int given = (eps != null ? 1 : 0) + (tau != null ? 1 : 0) + (rho != null ? 1 : 0);
        if (given < 2) {
            throw m.error("a semi-transparent material needs two of emissivity, reflectivity and transmissivity"
                    + " (the third is 1 minus the other two), or all three");
        }
        double tolerance = DEFAULT_MEASUREMENT_TOLERANCE;
        if (m.has("measurementTolerance")) {
            if (given < 3) {
                throw m.field("measurementTolerance").error("applies when all three of emissivity, reflectivity and"
                        + " transmissivity are given");
            }
            tolerance = m.field("measurementTolerance").fraction();
        }
        SpectralEmissivity[] all = {eps, tau, rho};
        double[] at = wavelengths(all);
        double[] temps = temperatures(all);
        double[][] e = new double[temps.length][at.length];
        double[][] t = new double[temps.length][at.length];
        double worst = 0;
        String worstAt = "";
        String derived = eps == null ? "ε" : tau == null ? "τ" : rho == null ? "ρ" : null;
        for (int q = 0; q < temps.length; q++) {
            for (int i = 0; i < at.length; i++) {
                double lambda = at[i];
                double ev = eps == null ? Double.NaN : eps.at(lambda, temps[q]);
                double tv = tau == null ? Double.NaN : tau.at(lambda, temps[q]);
                double rv = rho == null ? Double.NaN : rho.at(lambda, temps[q]);
                if (eps == null) {
                    ev = 1 - rv - tv;
                } else if (tau == null) {
                    tv = 1 - ev - rv;
                } else if (rho == null) {
                    rv = 1 - ev - tv;
                }
                String where = "at " + num(lambda) + " µm" + (temps.length > 1 ? " and " + num(temps[q]) + " K" : "");
                String values = where + ": ε = " + num(ev) + ", ρ = " + num(rv) + ", τ = " + num(tv);
                if (derived == null) {
                    double sum = ev + rv + tv;
                    if (Math.abs(sum - 1) > worst) {
                        worst = Math.abs(sum - 1);
                        worstAt = values + " sum to " + num(sum);
                    }
                    if (Math.abs(sum - 1) > ROUNDING) {
                        ev /= sum;
                        tv /= sum;
                    }
                } else {
                    double v = derived.equals("ε") ? ev : derived.equals("τ") ? tv : rv;
                    if (v < -ROUNDING || v > 1 + ROUNDING) {
                        throw m.error(values + ": " + derived + " = 1 minus the other two lies outside [0, 1]");
                    }
                }
                e[q][i] = clamp(ev);
                t[q][i] = clamp(tv);
            }
        }
        if (worst > tolerance) {
            String problem = worstAt + ", but α + ρ + τ must be 1 (α = ε) within the measurement tolerance "
                    + num(tolerance) + " (set it with \"measurementTolerance\")";
            if (warnings == null) {
                throw m.error(problem);
            }
            warnings.add(m.path() + ": " + problem + "; the three are scaled to sum to 1");
        }
        boolean rescaled = worst > ROUNDING;
        boolean gray = at.length == 1 && temps.length == 1 && all(all, SpectralEmissivity::isGray);
        SpectralEmissivity emissivity = eps != null && !rescaled ? eps : model(at, temps, e, gray);
        SpectralEmissivity transmissivity = tau != null && !rescaled ? tau : model(at, temps, t, gray);
        boolean passes = false;
        for (double[] row : t) {
            for (double v : row) {
                passes |= v > 0;
            }
        }
        // a material that transmits nothing at any wavelength is opaque after all
        return new Material(name, emissivity, passes ? transmissivity : null, description);
    }

    /**
     * The measurement tolerance of a material read by {@link #read} (so its keys are valid): the
     * stated or default one when ε, ρ and τ are all given, else null.
     */
    static MeasurementTolerance tolerance(JsonCursor m) throws CaseException {
        boolean all = (m.has("emissivity") || m.has("spectralEmissivity"))
                && (m.has("transmissivity") || m.has("spectralTransmissivity"))
                && (m.has("reflectivity") || m.has("spectralReflectivity"));
        if (!all) {
            return null;
        }
        return m.has("measurementTolerance") ? new MeasurementTolerance(m.field("measurementTolerance").fraction(), true)
                : new MeasurementTolerance(DEFAULT_MEASUREMENT_TOLERANCE, false);
    }

    private static boolean all(SpectralEmissivity[] p, java.util.function.Predicate<SpectralEmissivity> test) {
        for (SpectralEmissivity x : p) {
            if (x != null && !test.test(x)) {
                return false;
            }
        }
        return true;
    }

    /** The union of the given properties' wavelength nodes (µm), or {1 µm} when all are gray. */
    private static double[] wavelengths(SpectralEmissivity[] p) {
        TreeSet<Double> nodes = new TreeSet<>();
        for (SpectralEmissivity x : p) {
            if (x != null) {
                for (double w : x.breakpointsUm()) {
                    nodes.add(w);
                }
            }
        }
        return nodes.isEmpty() ? new double[] {1.0} : nodes.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** The union of the given properties' table temperatures (K), or {300 K} when none depends on temperature. */
    private static double[] temperatures(SpectralEmissivity[] p) {
        TreeSet<Double> temps = new TreeSet<>();
        for (SpectralEmissivity x : p) {
            if (x instanceof TemperatureTabulatedEmissivity tt) {
                for (double v : tt.temperaturesK()) {
                    temps.add(v);
                }
            }
        }
        return temps.isEmpty() ? new double[] {300.0} : temps.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /**
     * A property stored on the grid.
     *
     * @param values [temperature][wavelength]; not modified
     */
    private static SpectralEmissivity model(double[] at, double[] temps, double[][] values, boolean gray) {
        if (gray) {
            return new GrayEmissivity(values[0][0]);
        }
        if (temps.length == 1) {
            return new TabulatedEmissivity(at, values[0]);
        }
        TabulatedEmissivity[] tables = new TabulatedEmissivity[temps.length];
        for (int q = 0; q < temps.length; q++) {
            tables[q] = new TabulatedEmissivity(at, values[q]);
        }
        return new TemperatureTabulatedEmissivity(temps, tables);
    }

    /** Six significant digits without trailing zeros. */
    private static String num(double v) {
        String t = String.format(Locale.ROOT, "%.6g", v);
        return t.contains("e") || !t.contains(".") ? t : t.replaceAll("0+$", "").replaceAll("\\.$", "");
    }

    private static double clamp(double v) {
        return Math.min(1.0, Math.max(0.0, v));
    }

    /** One property (gray, a table or steps, by temperature, or from CSV), or null when absent. */
    private static SpectralEmissivity property(JsonCursor m, String grayKey, String spectralKey, Path caseDir)
            throws CaseException {
        if (m.has(grayKey) && m.has(spectralKey)) {
            throw m.error("give " + grayKey + " or " + spectralKey + ", not both");
        }
        if (m.has(grayKey)) {
            return new GrayEmissivity(m.field(grayKey).fraction());
        }
        if (!m.has(spectralKey)) {
            return null;
        }
        return MaterialReader.spectral(m.field(spectralKey), caseDir, grayKey);
    }
}
