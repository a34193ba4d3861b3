package org.exitance.properties;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.exitance.model.Material;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * The curves of a spectrum plot: ε(λ) of a material, and normalized Planck curves
 * E_bλ(λ, T)/E_bλ(λ_max, T) with λ_max = b/T from Wien's displacement law (Incropera 6th ed.
 * Sec. 12.3; Siegel &amp; Howell 7th ed. Ch. 1), so every curve peaks at 1 and shares the ε axis.
 * A tabulated source is drawn as G_λ/max G_λ at its own samples.
 *
 * @param fromUm       left end of the wavelength axis, µm
 * @param toUm         right end, µm
 * @param emissivity   ε(λ): one curve, or one per temperature when ε depends on temperature
 * @param planck       one normalized Planck curve per plotted surface temperature
 * @param sources      one normalized curve per source
 * @param transmissivity  τ(λ) of a window: one curve, or one per temperature when τ depends on
 *                        temperature; empty for an opaque material
 * @param reflectivity    ρ(λ) = 1 − ε(λ) − τ(λ) (energy conservation with α = ε, Kirchhoff; for
 *                        an opaque material ρ = 1 − ε): one curve, or one per temperature when ε or τ
 *                        depends on temperature. A window's given ρ is stored this way, exactly
 *                        (the reader keeps ε, ρ and τ on one grid where each is bilinear)
 */
public record SpectralCurves(double fromUm, double toUm, List<Curve> emissivity, List<Curve> planck,
                             List<Curve> sources, List<Curve> transmissivity, List<Curve> reflectivity) {

    /** Points per decade of wavelength on the sampling grid. */
    public static final int POINTS_PER_DECADE = 200;

    /**
     * One curve.
     *
     * @param label        legend text
     * @param temperatureK the temperature it belongs to, K (NaN for a tabulated source)
     * @param wavelengthUm x values, increasing, µm
     * @param value        y values, dimensionless
     */
    public record Curve(String label, double temperatureK, double[] wavelengthUm, double[] value) {
        public Curve {
            wavelengthUm = wavelengthUm.clone();
            value = value.clone();
        }

        @Override
        public double[] wavelengthUm() {
            return wavelengthUm.clone();
        }

        @Override
        public double[] value() {
            return value.clone();
        }
    }

    public SpectralCurves {
        transmissivity = List.copyOf(transmissivity);
        reflectivity = List.copyOf(reflectivity);
        emissivity = List.copyOf(emissivity);
        planck = List.copyOf(planck);
        sources = List.copyOf(sources);
    }

    /**
     * Curves for a material at the given surface temperatures (K) and sources. The axis runs
     * over whole decades from λT = 800 µm·K at the hottest temperature (blackbody fraction
     * below ≈ 1e-5) to λT = 30,000 µm·K at the coldest (≈ 0.1 % beyond), widened to hold every
     * tabulated source.
     */
    public static SpectralCurves of(Material material, double[] temperaturesK, List<IrradiationSource> sources) {
        if (temperaturesK.length == 0) {
            throw new IllegalArgumentException("need at least one temperature");
        }
        double tMin = Double.POSITIVE_INFINITY;
        double tMax = 0;
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (double t : temperaturesK) {
            tMin = Math.min(tMin, t);
            tMax = Math.max(tMax, t);
        }
        for (IrradiationSource s : sources) {
            if (s instanceof BlackbodySource b) {
                tMin = Math.min(tMin, b.temperatureK());
                tMax = Math.max(tMax, b.temperatureK());
            } else if (s instanceof SourceSpectrum g) {
                lo = Math.min(lo, g.firstUm());
                hi = Math.max(hi, g.lastUm());
            }
        }
        double from = Math.pow(10, Math.floor(Math.log10(Math.min(lo, 800.0 / tMax)) + 1e-9));
        double to = Math.pow(10, Math.ceil(Math.log10(Math.max(hi, 30_000.0 / tMin)) - 1e-9));
        SpectralEmissivity e = material.emissivity();
        double[] grid = grid(from, to, e.breakpointsUm());

        List<Curve> eps = new ArrayList<>();
        if (e.dependsOnTemperature()) {
            for (double t : temperaturesK) {
                eps.add(new Curve("ε(λ) at " + BlackbodySource.kelvin(t) + " K", t, grid, emissivity(e, t, grid)));
            }
        } else {
            eps.add(new Curve("ε(λ) " + material.name(), Double.NaN, grid, emissivity(e, temperaturesK[0], grid)));
        }
        List<Curve> planck = new ArrayList<>();
        for (double t : temperaturesK) {
            planck.add(new Curve("Planck " + BlackbodySource.kelvin(t) + " K", t, grid, normalizedPlanck(t, grid)));
        }
        List<Curve> src = new ArrayList<>();
        for (IrradiationSource s : sources) {
            if (s instanceof BlackbodySource b) {
                src.add(new Curve("source: " + s.label(), b.temperatureK(), grid, normalizedPlanck(b.temperatureK(), grid)));
            } else if (s instanceof SourceSpectrum g) {
                double[] y = g.irradianceWM2PerUm();
                double peak = g.peakWM2PerUm();
                for (int i = 0; i < y.length; i++) {
                    y[i] /= peak;
                }
                src.add(new Curve("source: " + g.label(), Double.NaN, g.wavelengthUm(), y));
            }
        }
        List<Curve> tau = new ArrayList<>();
        if (material.transmissivity() != null) {
            SpectralEmissivity tr = material.transmissivity();
            double[] g = grid(from, to, tr.breakpointsUm());
            if (tr.dependsOnTemperature()) {
                for (double t : temperaturesK) {
                    tau.add(new Curve("τ(λ) at " + BlackbodySource.kelvin(t) + " K", t, g, emissivity(tr, t, g)));
                }
            } else {
                tau.add(new Curve("τ(λ) " + material.name(), Double.NaN, g, emissivity(tr, temperaturesK[0], g)));
            }
        }
        return new SpectralCurves(from, to, eps, planck, src, tau, reflectivity(material, temperaturesK, from, to));
    }

    /** ρ(λ) = 1 − ε(λ) − τ(λ) on a grid holding the breakpoints of both, per temperature when either depends on it. */
    private static List<Curve> reflectivity(Material material, double[] temperaturesK, double from, double to) {
        SpectralEmissivity e = material.emissivity();
        SpectralEmissivity tr = material.transmissivity();
        double[] breaks = e.breakpointsUm();
        if (tr != null) {
            double[] b = tr.breakpointsUm();
            breaks = Arrays.copyOf(breaks, breaks.length + b.length);
            System.arraycopy(b, 0, breaks, breaks.length - b.length, b.length);
        }
        double[] g = grid(from, to, breaks);
        boolean byT = e.dependsOnTemperature() || tr != null && tr.dependsOnTemperature();
        List<Curve> rho = new ArrayList<>();
        for (double t : byT ? temperaturesK : new double[] {temperaturesK[0]}) {
            double[] y = emissivity(e, t, g);
            for (int i = 0; i < y.length; i++) {
                y[i] = 1 - y[i] - (tr == null ? 0 : tr.at(g[i], t));
            }
            String label = byT ? "ρ(λ) at " + BlackbodySource.kelvin(t) + " K" : "ρ(λ) " + material.name();
            rho.add(new Curve(label, byT ? t : Double.NaN, g, y));
        }
        return rho;
    }

    /**
     * At most {@code max} of the temperatures for a readable plot: all of them if they fit,
     * otherwise the first, the last and evenly spaced ones between.
     */
    public static double[] pickForPlot(double[] temperaturesK, int max) {
        if (max < 2) {
            throw new IllegalArgumentException("max must be at least 2, got " + max);
        }
        if (temperaturesK.length <= max) {
            return temperaturesK.clone();
        }
        double[] out = new double[max];
        for (int i = 0; i < max; i++) {
            out[i] = temperaturesK[(int) Math.round(i * (temperaturesK.length - 1) / (double) (max - 1))];
        }
        return out;
    }

    /** E_bλ(λ, T) / E_bλ(b/T, T) at each λ. */
    static double[] normalizedPlanck(double t, double[] grid) {
        double peak = Planck.spectralEmissivePower(Planck.peakWavelengthUm(t), t);
        double[] y = new double[grid.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = Planck.spectralEmissivePower(grid[i], t) / peak;
        }
        return y;
    }

    private static double[] emissivity(SpectralEmissivity e, double t, double[] grid) {
        double[] y = new double[grid.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = e.at(grid[i], t);
        }
        return y;
    }

    /** Log-spaced points from..to plus every model breakpoint inside, so steps and corners are drawn exactly. */
    private static double[] grid(double from, double to, double[] breakpoints) {
        int n = (int) Math.round(Math.log10(to / from) * POINTS_PER_DECADE);
        double[] g = new double[n + 1 + breakpoints.length];
        for (int i = 0; i <= n; i++) {
            g[i] = from * Math.pow(to / from, i / (double) n);
        }
        int k = n + 1;
        for (double b : breakpoints) {
            if (b > from && b < to) {
                g[k++] = b;
            }
        }
        g = Arrays.copyOf(g, k);
        Arrays.sort(g);
        return Arrays.stream(g).distinct().toArray();
    }
}
