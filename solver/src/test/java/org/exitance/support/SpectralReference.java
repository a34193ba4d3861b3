package org.exitance.support;

import java.util.Arrays;
import java.util.TreeSet;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * Band integrals for the solve checks, sharing no code with the program's spectral package:
 * Planck's law in the dimensionless form E_bλ dλ = (15 σT⁴/π⁴) x³/(eˣ − 1) dx with
 * x = c₂/(λT) (Modest, Radiative Heat Transfer, 3rd ed., §1.6, eq. 1.25 and the fraction
 * function f(nλT)), h, c and k exact (SI 2019, CODATA 2018), and 16-point Gauss–Legendre rules
 * from Apache Commons Math on panels no wider than 1 in x, split at every wavelength where a
 * property or spectrum table has a node. Band-mean properties are Planck means
 * (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §3.3, band form common practice).
 *
 * <p>Arguments are not modified.
 */
public final class SpectralReference {
    static final double H = 6.62607015e-34;
    static final double C = 299792458;
    static final double K = 1.380649e-23;
    /** σ = 2π⁵k⁴/(15h³c²) (W/(m²·K⁴)). */
    public static final double SIGMA = 2 * Math.pow(Math.PI, 5) * Math.pow(K, 4) / (15 * H * H * H * C * C);
    /** c₂ = hc/k in µm·K. */
    static final double C2_UM_K = H * C / K * 1e6;
    private static final double PI4_OVER_15 = Math.pow(Math.PI, 4) / 15;
    /** Beyond x = 120 past the start of a band its Planck weight has fallen by e⁻¹²⁰ at least. */
    private static final double X_SPAN = 120;
    private static final GaussIntegrator RULE = new GaussIntegratorFactory().legendre(16, -1, 1);

    private SpectralReference() {
    }

    /** ∫_lo^hi E_bλ(λ, T) dλ (W/m²); hi may be +∞. */
    public static double bandPowerWPerM2(double loUm, double hiUm, double t) {
        return SIGMA * Math.pow(t, 4) * blackbodyFraction(loUm, hiUm, t);
    }

    /** Share of blackbody emission at T between lo and hi (µm). */
    public static double blackbodyFraction(double loUm, double hiUm, double t) {
        return planckIntegral(x -> 1.0, loUm, hiUm, t, new double[0]) / PI4_OVER_15;
    }

    /**
     * Planck mean of a property over a band: ∫ p(λ, T_p) E_bλ(λ, T_w) dλ / ∫ E_bλ(λ, T_w) dλ.
     * Where the weight underflows (no emission in the band at T_w), the plain mean over the band
     * (the value at its lower edge for an open band), the program's documented convention.
     */
    public static double planckMean(SpectralEmissivity p, double loUm, double hiUm, double weightK, double propertyK) {
        double[] kinks = p.breakpointsUm();
        double den = planckIntegral(x -> 1.0, loUm, hiUm, weightK, kinks);
        if (!(den > 1e-300)) {
            if (hiUm == Double.POSITIVE_INFINITY) {
                return p.at(Math.max(loUm, lastOf(kinks)), propertyK);
            }
            return lambdaIntegral(l -> p.at(l, propertyK), loUm, hiUm, kinks) / (hiUm - loUm);
        }
        double num = planckIntegral(x -> p.at(C2_UM_K / (x * weightK), propertyK), loUm, hiUm, weightK, kinks);
        return num / den;
    }

    /** Share of a tabulated source's power between lo and hi (µm). */
    public static double spectrumFraction(SourceSpectrum s, double loUm, double hiUm) {
        double[] w = s.wavelengthUm();
        double all = lambdaIntegral(s::irradianceAt, w[0], w[w.length - 1], w);
        return lambdaIntegral(s::irradianceAt, Math.max(loUm, w[0]), Math.min(hiUm, w[w.length - 1]), w) / all;
    }

    /** Mean of a property over a band weighted by a tabulated source spectrum (NaN if it has no power there). */
    public static double spectrumMean(SpectralEmissivity p, SourceSpectrum s, double loUm, double hiUm, double propertyK) {
        double[] w = s.wavelengthUm();
        double lo = Math.max(loUm, w[0]);
        double hi = Math.min(hiUm, w[w.length - 1]);
        if (!(hi > lo)) {
            return Double.NaN;
        }
        double[] kinks = merged(w, p.breakpointsUm());
        double den = lambdaIntegral(s::irradianceAt, lo, hi, kinks);
        double num = lambdaIntegral(l -> s.irradianceAt(l) * p.at(l, propertyK), lo, hi, kinks);
        return den > 0 ? num / den : Double.NaN;
    }

    /** ∫ w(x) x³/(eˣ − 1) dx over the band's x range, w given as a function of x. */
    private static double planckIntegral(DoubleUnaryOperator w, double loUm, double hiUm, double t, double[] kinksUm) {
        double xa = hiUm == Double.POSITIVE_INFINITY ? 0.0 : C2_UM_K / (hiUm * t);
        double xb = loUm <= 0 ? Double.POSITIVE_INFINITY : C2_UM_K / (loUm * t);
        xb = Math.min(xb, xa + X_SPAN);
        if (!(xb > xa)) {
            return 0.0;
        }
        TreeSet<Double> edges = new TreeSet<>();
        edges.add(xa);
        edges.add(xb);
        for (double k : kinksUm) {
            double x = C2_UM_K / (k * t);
            if (x > xa && x < xb) {
                edges.add(x);
            }
        }
        DoubleUnaryOperator f = x -> x == 0 ? 0.0 : w.applyAsDouble(x) * x * x * x / Math.expm1(x);
        return panels(f, edges, 1.0);
    }

    /** ∫ f(λ) dλ from a to b (µm), split at the kinks and into 64 panels at least. */
    private static double lambdaIntegral(DoubleUnaryOperator f, double a, double b, double[] kinksUm) {
        if (!(b > a)) {
            return 0.0;
        }
        TreeSet<Double> edges = new TreeSet<>();
        edges.add(a);
        edges.add(b);
        for (double k : kinksUm) {
            if (k > a && k < b) {
                edges.add(k);
            }
        }
        return panels(f, edges, (b - a) / 64);
    }

    private static double panels(DoubleUnaryOperator f, TreeSet<Double> edges, double maxWidth) {
        double sum = 0;
        Double lo = edges.first();
        for (Double hi : edges.tailSet(lo, false)) {
            int m = (int) Math.ceil((hi - lo) / maxWidth);
            double w = (hi - lo) / m;
            for (int p = 0; p < m; p++) {
                double a = lo + p * w;
                double half = 0.5 * w;
                double mid = a + half;
                double s = 0;
                for (int q = 0; q < RULE.getNumberOfPoints(); q++) {
                    s += RULE.getWeight(q) * f.applyAsDouble(mid + half * RULE.getPoint(q));
                }
                sum += half * s;
            }
            lo = hi;
        }
        return sum;
    }

    private static double lastOf(double[] a) {
        return a.length == 0 ? 0.0 : a[a.length - 1];
    }

    private static double[] merged(double[] a, double[] b) {
        double[] m = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, m, a.length, b.length);
        Arrays.sort(m);
        return m;
    }
}
