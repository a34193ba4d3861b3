package org.exitance.spectral;

import java.util.function.DoubleUnaryOperator;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Independent reference values for the tests: Planck's law written directly in SI units from
 * h, c, k, and adaptive Gauss–Legendre quadrature from Apache Commons Math
 * (Gauss–Legendre rules with adaptive bisection, see {@link #integrate}). Nothing here uses the
 * series of the main code.
 */
final class Reference {

    static final double H = 6.62607015e-34;
    static final double C = 299792458;
    static final double K = 1.380649e-23;

    /** σ = 2π⁵k⁴/(15h³c²) from the exact constants (the CODATA literal is rounded by 3e-11). */
    static final double SIGMA_DERIVED = 2 * Math.pow(Math.PI, 5) * Math.pow(K, 4) / (15 * H * H * H * C * C);

    private Reference() {
    }

    /** Planck's law in SI: 2πhc²/(λ⁵(exp(hc/(λkT))−1)), λ in m, result W/m³; converted to W/(m²·µm). */
    static double planckSi(double lambdaUm, double t) {
        double l = lambdaUm * 1e-6;
        double x = H * C / (l * K * t);
        if (x > 700) {
            return 2 * Math.PI * H * C * C / Math.pow(l, 5) * Math.exp(-x) * 1e-6;
        }
        return 2 * Math.PI * H * C * C / (Math.pow(l, 5) * Math.expm1(x)) * 1e-6;
    }

    /**
     * ∫_a^b f: [a, b] is split into {@code panels} equal panels; on each, Gauss–Legendre rules of
     * 24 and 32 points (Commons Math {@link GaussIntegratorFactory#legendreHighPrecision}, nodes
     * computed in BigDecimal) are compared and the panel is bisected until they agree to 1e-12
     * relative (a tighter request cannot be met in the Wien tail, where exp(−ζ) amplifies the
     * rounding of ζ by a factor ζ ≈ 10²–10³; the 32-point value is far more accurate than the
     * 24/32 difference suggests, as the comparisons with 40-digit mpmath values show). (IterativeLegendreGaussIntegrator of Commons Math 3.6.1 was tried first; its
     * results carry ~5e-14 relative noise and it fails to converge at a 1e-14 request.)
     */
    static double integrate(DoubleUnaryOperator f, double a, double b, int panels) {
        double sum = 0.0;
        double w = (b - a) / panels;
        for (int i = 0; i < panels; i++) {
            double lo = a + i * w;
            double hi = i == panels - 1 ? b : a + (i + 1) * w;
            sum += adaptive(f, lo, hi, 0);
        }
        return sum;
    }

    private static final GaussIntegratorFactory FACTORY = new GaussIntegratorFactory();

    private static double adaptive(DoubleUnaryOperator f, double lo, double hi, int depth) {
        double coarse = FACTORY.legendreHighPrecision(24, lo, hi).integrate(f::applyAsDouble);
        double fine = FACTORY.legendreHighPrecision(32, lo, hi).integrate(f::applyAsDouble);
        if (Math.abs(fine - coarse) <= 1e-12 * Math.abs(fine) || Math.abs(fine - coarse) < 1e-300) {
            return fine;
        }
        if (depth > 40) {
            throw new IllegalStateException("reference quadrature did not converge on [" + lo + ", " + hi + "]");
        }
        double mid = 0.5 * (lo + hi);
        return adaptive(f, lo, mid, depth + 1) + adaptive(f, mid, hi, depth + 1);
    }

    /** ∫_{λ1}^{λ2} f(λ) dλ in the variable u = ln λ, with ~20 panels per e-fold. */
    static double integrateLog(DoubleUnaryOperator f, double l1, double l2) {
        if (!(l2 > l1)) {
            return 0.0;
        }
        double a = Math.log(l1);
        double b = Math.log(l2);
        int panels = Math.max(1, (int) Math.ceil((b - a) * 20));
        return integrate(u -> {
            double l = Math.exp(u);
            return f.applyAsDouble(l) * l;
        }, a, b, panels);
    }

    /**
     * Reference F(0→λT) by quadrature of x³/(e^x−1): (15/π⁴)∫_ζ^{ζ+120} for ζ ≥ 2, otherwise
     * 1 − (15/π⁴)∫_0^ζ (panels of width ≤ 0.5).
     */
    static double fractionBelow(double lambdaT) {
        double c2 = H * C / K * 1e6;
        double zeta = c2 / lambdaT;
        double norm = 15 / Math.pow(Math.PI, 4);
        DoubleUnaryOperator f = x -> x <= 0 ? 0 : x * x * x / Math.expm1(x);
        if (zeta >= 2) {
            return norm * integrate(f, zeta, zeta + 120, 240);
        }
        return 1 - norm * integrate(f, 0, zeta, Math.max(1, (int) Math.ceil(zeta / 0.5)));
    }

    /**
     * Reference band mean ∫ε(λ,Tp)E_bλ(λ,Tw)dλ / ∫E_bλ(λ,Tw)dλ by quadrature in ln λ, split at the
     * model's breakpoints (kinks). Open ends are truncated at λT_w = 30 µm·K and 1e12 µm·K,
     * where the omitted blackbody fraction is below 1e-25. Returns {numerator, denominator}.
     */
    static double[] bandMeanParts(SpectralEmissivity e, double lower, double upper, double tw, double tp) {
        double lo = Math.max(lower, 30.0 / tw);
        double hi = Math.min(upper, 1e12 / tw);
        double[] bp = e.breakpointsUm();
        double num = 0;
        double den = 0;
        double x = lo;
        for (int i = 0; i <= bp.length; i++) {
            double next = i < bp.length ? Math.min(bp[i], hi) : hi;
            if (next > x) {
                num += integrateLog(l -> e.at(l, tp) * planckSi(l, tw), x, next);
                den += integrateLog(l -> planckSi(l, tw), x, next);
                x = next;
            }
        }
        return new double[] {num, den};
    }

    static double bandMean(SpectralEmissivity e, double lower, double upper, double tw, double tp) {
        double[] p = bandMeanParts(e, lower, upper, tw, tp);
        return p[0] / p[1];
    }
}
