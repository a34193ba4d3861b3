package org.exitance.cases;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;

/**
 * Reads a semi-transparent material: any two of emissivity ε(λ), reflectivity ρ(λ) and
 * transmissivity τ(λ), or all three, each gray ({@code "transmissivity": 0.9}) or a table or steps
 * in λ ({@code "spectralTransmissivity": {"wavelength_um": [...], "transmissivity": [...]}}).
 * For a diffuse surface α_λ = ε_λ (Kirchhoff) and α_λ + ρ_λ + τ_λ = 1 (energy conservation;
 * Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., ch. 3, from memory), so two
 * determine the third. All given properties are checked at every node of the union of their
 * tables (values interpolated there): each must lie in [0, 1] and, when all three are given, they
 * must sum to 1 within {@value #SUM_TOLERANCE}. Since the tables are piecewise linear with held
 * ends, the derived property is exactly piecewise linear on that union, and so is stored there.
 * The properties of a window must not depend on temperature.
 */
final class SemiTransparentProperties {
    /** Largest |α + ρ + τ − 1| accepted at a table node. */
    static final double SUM_TOLERANCE = 1e-6;

    private SemiTransparentProperties() {
    }

    static Material read(String name, JsonCursor m, Path caseDir, String description) throws CaseException {
        SpectralEmissivity eps = property(m, "emissivity", "spectralEmissivity", caseDir);
        SpectralEmissivity tau = property(m, "transmissivity", "spectralTransmissivity", caseDir);
        SpectralEmissivity rho = property(m, "reflectivity", "spectralReflectivity", caseDir);
        int given = (eps != null ? 1 : 0) + (tau != null ? 1 : 0) + (rho != null ? 1 : 0);
        if (given < 2) {
            throw m.error("a semi-transparent material needs two of emissivity, reflectivity and transmissivity"
                    + " (the third is 1 minus the other two), or all three");
        }
        TreeSet<Double> nodes = new TreeSet<>();
        for (SpectralEmissivity p : new SpectralEmissivity[] {eps, tau, rho}) {
            if (p != null) {
                for (double w : p.breakpointsUm()) {
                    nodes.add(w);
                }
            }
        }
        double[] at = nodes.isEmpty() ? new double[] {1.0} : nodes.stream().mapToDouble(Double::doubleValue).toArray();
        double[] e = new double[at.length];
        double[] t = new double[at.length];
        for (int i = 0; i < at.length; i++) {
            double lambda = at[i];
            double ev = eps == null ? Double.NaN : eps.at(lambda, 300);
            double tv = tau == null ? Double.NaN : tau.at(lambda, 300);
            double rv = rho == null ? Double.NaN : rho.at(lambda, 300);
            String derived = eps == null ? "ε" : tau == null ? "τ" : rho == null ? "ρ" : null;
            if (eps == null) {
                ev = 1 - rv - tv;
            } else if (tau == null) {
                tv = 1 - ev - rv;
            } else if (rho == null) {
                rv = 1 - ev - tv;
            }
            String values = "at " + num(lambda) + " µm: ε = " + num(ev) + ", ρ = " + num(rv) + ", τ = " + num(tv);
            if (derived == null) {
                double sum = ev + rv + tv;
                if (Math.abs(sum - 1) > SUM_TOLERANCE) {
                    throw m.error(values + " sum to " + num(sum)
                            + ", but α + ρ + τ must be 1 (α = ε, within " + SUM_TOLERANCE + ")");
                }
            } else {
                double v = derived.equals("ε") ? ev : derived.equals("τ") ? tv : rv;
                if (v < -SUM_TOLERANCE || v > 1 + SUM_TOLERANCE) {
                    throw m.error(values + ": " + derived + " = 1 minus the other two lies outside [0, 1]");
                }
            }
            e[i] = clamp(ev);
            t[i] = clamp(tv);
        }
        SpectralEmissivity emissivity = eps != null ? eps : model(at, e, nodes.isEmpty());
        SpectralEmissivity transmissivity = tau != null ? tau : model(at, t, nodes.isEmpty());
        boolean passes = false;
        for (double v : t) {
            passes |= v > 0;
        }
        // a material that transmits nothing at any wavelength is opaque after all
        return new Material(name, emissivity, passes ? transmissivity : null, description);
    }

    private static SpectralEmissivity model(double[] at, double[] values, boolean gray) {
        return gray ? new GrayEmissivity(values[0]) : new TabulatedEmissivity(at, values);
    }

    /** Six significant digits without trailing zeros. */
    private static String num(double v) {
        String t = String.format(Locale.ROOT, "%.6g", v);
        return t.contains("e") || !t.contains(".") ? t : t.replaceAll("0+$", "").replaceAll("\\.$", "");
    }

    private static double clamp(double v) {
        return Math.min(1.0, Math.max(0.0, v));
    }

    /** One property, gray or spectral (temperature-independent), or null when absent. */
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
        JsonCursor s = m.field(spectralKey);
        SpectralEmissivity model;
        if (grayKey.equals("emissivity")) {
            model = MaterialReader.spectral(s, caseDir);
        } else {
            s.allowOnly("wavelength_um", "bandEdges_um", grayKey, "csv");
            String form = s.exactlyOneOf("wavelength_um", "bandEdges_um", "csv");
            if (form.equals("csv")) {
                JsonCursor ref = s.field("csv");
                Path csv = caseDir.resolve(ref.nonEmptyText()).normalize();
                List<PropertyCsvReader.Table> tables = PropertyCsvReader.read(csv, ref, grayKey);
                if (tables.size() > 1) {
                    throw ref.error("a semi-transparent material needs properties that do not depend on temperature;"
                            + " give one table (no temperature_K column)");
                }
                model = new TabulatedEmissivity(tables.get(0).wavelengthUm(), tables.get(0).emissivity());
            } else {
                model = MaterialReader.table(s, grayKey);
            }
        }
        if (model.dependsOnTemperature()) {
            throw s.error("a semi-transparent material needs properties that do not depend on temperature");
        }
        return model;
    }
}
