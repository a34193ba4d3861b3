package org.exitance.spectral;

/**
 * Dimensionless blackbody integrals {@code ∫ x^m/(e^x − 1) dx} for m = 2 and m = 3, the kernels
 * behind the blackbody radiation function and the first λ-moment of Planck's law.
 *
 * <p>With ζ = C2/(λT):
 * <ul>
 *   <li>{@code ∫_{λ1}^{λ2} E_bλ dλ = (C1 T⁴/C2⁴) ∫_{ζ2}^{ζ1} x³/(e^x−1) dx}</li>
 *   <li>{@code ∫_{λ1}^{λ2} λ E_bλ dλ = (C1 T³/C2³) ∫_{ζ2}^{ζ1} x²/(e^x−1) dx}</li>
 * </ul>
 *
 * <p>Tails {@code Q_m(ζ) = ∫_ζ^∞} use the exponential series (Siegel &amp; Howell 7th ed.
 * Ch. 1, blackbody fractions; Modest 3rd ed. Ch. 1, blackbody fractional emissive power; Chang &amp;
 * Rhee 1984 — section/equation numbers are not quoted because they could not be checked here):
 * <pre>
 *   Q_3(ζ) = Σ_{n≥1} e^{−nζ} (ζ³/n + 3ζ²/n² + 6ζ/n³ + 6/n⁴)
 *   Q_2(ζ) = Σ_{n≥1} e^{−nζ} (ζ²/n + 2ζ/n² + 2/n³)
 * </pre>
 * obtained by expanding 1/(e^x−1) = Σ e^{−nx} and integrating term by term; used for ζ ≥ 2.
 *
 * <p>Heads {@code P_m(ζ) = ∫_0^ζ} use the Bernoulli expansion x/(e^x−1) = Σ_k B_k x^k/k!
 * (radius of convergence 2π), integrated term by term:
 * <pre>
 *   P_m(ζ) = Σ_k B_k ζ^{k+m} / (k! (k+m))
 *   P_3(ζ) = ζ³ (1/3 − ζ/8 + ζ²/60 − ζ⁴/5040 + ζ⁶/272160 − ζ⁸/13305600 + ζ¹⁰/622702080 − …)
 *   P_2(ζ) = ζ² (1/2 − ζ/6 + ζ²/48 − ζ⁴/4320 + ζ⁶/241920 − …)
 * </pre>
 * used for ζ &lt; 2, where successive even terms shrink by ≈ (ζ/2π)² ≤ 0.1.
 * Complete integrals: P_3(∞) = π⁴/15 = 3!ζ(4), P_2(∞) = 2ζ(3).
 *
 * <p>Integrals over a finite sub-range [a, b] narrower than {@link #GAUSS_WIDTH} are evaluated
 * with a fixed 12-point Gauss–Legendre rule instead of differencing two series (avoids
 * cancellation; the integrand is analytic with nearest poles at ±2πi, so the rule is exact to
 * rounding on such short ranges).
 */
final class BlackbodyIntegrals {

    /** π⁴/15 = ∫_0^∞ x³/(e^x−1) dx. */
    static final double TOTAL3 = Math.PI * Math.PI * Math.PI * Math.PI / 15.0;
    /** 2ζ(3) = ∫_0^∞ x²/(e^x−1) dx (Apéry's constant ζ(3) = 1.2020569031595942854). */
    static final double TOTAL2 = 2.0 * 1.2020569031595942854;
    /** 15/π⁴, converts Q_3 / P_3 into blackbody fractions. */
    static final double FIFTEEN_OVER_PI4 = 15.0 / (Math.PI * Math.PI * Math.PI * Math.PI);

    /** Switch between the head (Bernoulli) and tail (exponential) series. */
    static final double SWITCH_ZETA = 2.0;
    /** Above this ζ every tail term underflows; tails are returned as exactly 0. */
    static final double UNDERFLOW_ZETA = 800.0;
    /** Sub-ranges of ζ narrower than this are integrated by Gauss–Legendre. */
    static final double GAUSS_WIDTH = 0.5;

    /**
     * Bernoulli numbers B_2, B_4, …, B_30 as exact rationals (numerator, denominator).
     * Source: Abramowitz &amp; Stegun, Handbook of Mathematical Functions, Table 23.2.
     */
    private static final double[][] BERNOULLI_EVEN = {
        {1, 6}, {-1, 30}, {1, 42}, {-1, 30}, {5, 66}, {-691, 2730}, {7, 6}, {-3617, 510},
        {43867, 798}, {-174611, 330}, {854513, 138}, {-236364091, 2730}, {8553103, 6},
        {-23749461029.0, 870}, {8615841276005.0, 14322},
    };

    /** HEAD3[j] = B_{2j}/((2j)! (2j+3)) for j ≥ 1 (HEAD3[0] unused); likewise HEAD2 with (2j+2). */
    static final double[] HEAD3 = new double[BERNOULLI_EVEN.length + 1];
    static final double[] HEAD2 = new double[BERNOULLI_EVEN.length + 1];

    private static final int GAUSS_POINTS = 12;
    private static final double[] GAUSS_X = new double[GAUSS_POINTS];
    private static final double[] GAUSS_W = new double[GAUSS_POINTS];

    static {
        double factorial = 1.0;
        for (int j = 1; j <= BERNOULLI_EVEN.length; j++) {
            factorial *= (2.0 * j - 1.0) * (2.0 * j);
            double b = BERNOULLI_EVEN[j - 1][0] / BERNOULLI_EVEN[j - 1][1];
            HEAD3[j] = b / (factorial * (2 * j + 3));
            HEAD2[j] = b / (factorial * (2 * j + 2));
        }
        double[][] rule = GaussLegendre.rule(GAUSS_POINTS);
        System.arraycopy(rule[0], 0, GAUSS_X, 0, GAUSS_POINTS);
        System.arraycopy(rule[1], 0, GAUSS_W, 0, GAUSS_POINTS);
    }

    private BlackbodyIntegrals() {
    }

    /** Tail Q_3(ζ) = ∫_ζ^∞ x³/(e^x−1) dx for 0 ≤ ζ ≤ ∞. */
    static double tail3(double zeta) {
        if (zeta >= SWITCH_ZETA) {
            return tailSeries(zeta, 3);
        }
        return TOTAL3 - head3Series(zeta);
    }

    /** Tail Q_2(ζ) = ∫_ζ^∞ x²/(e^x−1) dx for 0 ≤ ζ ≤ ∞. */
    static double tail2(double zeta) {
        if (zeta >= SWITCH_ZETA) {
            return tailSeries(zeta, 2);
        }
        return TOTAL2 - head2Series(zeta);
    }

    /** Head P_3(ζ) = ∫_0^ζ x³/(e^x−1) dx. */
    static double head3(double zeta) {
        return zeta < SWITCH_ZETA ? head3Series(zeta) : TOTAL3 - tailSeries(zeta, 3);
    }

    /** Head P_2(ζ) = ∫_0^ζ x²/(e^x−1) dx. */
    static double head2(double zeta) {
        return zeta < SWITCH_ZETA ? head2Series(zeta) : TOTAL2 - tailSeries(zeta, 2);
    }

    /** Exponential (tail) series, valid for ζ &gt; 0; intended for ζ ≥ 2. */
    static double tailSeries(double zeta, int m) {
        if (zeta > UNDERFLOW_ZETA) {
            return 0.0;
        }
        double q = Math.exp(-zeta);
        double en = 1.0;
        double sum = 0.0;
        double z2 = zeta * zeta;
        for (int n = 1; n <= 200; n++) {
            en *= q;
            double inv = 1.0 / n;
            double term;
            if (m == 3) {
                term = en * inv * (z2 * zeta + inv * (3.0 * z2 + inv * (6.0 * zeta + inv * 6.0)));
            } else {
                term = en * inv * (z2 + inv * (2.0 * zeta + inv * 2.0));
            }
            sum += term;
            if (term <= 1e-17 * sum) {
                break;
            }
        }
        return sum;
    }

    /** Bernoulli (head) series for P_3, intended for 0 ≤ ζ &lt; 2. */
    static double head3Series(double zeta) {
        double z2 = zeta * zeta;
        double sum = 0.0;
        double p = z2; // ζ^{2j}
        for (int j = 1; j < HEAD3.length; j++) {
            double term = HEAD3[j] * p;
            sum += term;
            if (Math.abs(term) <= 1e-18) {
                break;
            }
            p *= z2;
        }
        return z2 * zeta * ((1.0 / 3.0 - zeta / 8.0) + sum);
    }

    /** Bernoulli (head) series for P_2, intended for 0 ≤ ζ &lt; 2. */
    static double head2Series(double zeta) {
        double z2 = zeta * zeta;
        double sum = 0.0;
        double p = z2;
        for (int j = 1; j < HEAD2.length; j++) {
            double term = HEAD2[j] * p;
            sum += term;
            if (Math.abs(term) <= 1e-18) {
                break;
            }
            p *= z2;
        }
        return z2 * ((0.5 - zeta / 6.0) + sum);
    }

    /** The integrand x^m/(e^x−1), with its limits at 0 and ∞. */
    static double kernel(double x, int m) {
        if (x <= 0.0 || x > 1.0e4) {
            return 0.0;
        }
        double xm = m == 3 ? x * x * x : x * x;
        return xm / Math.expm1(x);
    }

    /** ∫_a^b x³/(e^x−1) dx for 0 ≤ a ≤ b ≤ ∞ (b may be +∞). */
    static double integral3(double a, double b) {
        return integral(a, b, 3);
    }

    /** ∫_a^b x²/(e^x−1) dx for 0 ≤ a ≤ b ≤ ∞ (b may be +∞). */
    static double integral2(double a, double b) {
        return integral(a, b, 2);
    }

    private static double integral(double a, double b, int m) {
        if (!(b > a)) {
            return 0.0;
        }
        if (b - a < GAUSS_WIDTH) { // b finite here
            double half = 0.5 * (b - a);
            double mid = 0.5 * (a + b);
            double s = 0.0;
            for (int i = 0; i < GAUSS_POINTS; i++) {
                s += GAUSS_W[i] * kernel(mid + half * GAUSS_X[i], m);
            }
            return s * half;
        }
        if (a >= SWITCH_ZETA) {
            return tailSeries(a, m) - (b == Double.POSITIVE_INFINITY ? 0.0 : tailSeries(b, m));
        }
        if (b <= SWITCH_ZETA) {
            return m == 3 ? head3Series(b) - head3Series(a) : head2Series(b) - head2Series(a);
        }
        double headPart = m == 3
                ? head3Series(SWITCH_ZETA) - head3Series(a)
                : head2Series(SWITCH_ZETA) - head2Series(a);
        double tailPart = tailSeries(SWITCH_ZETA, m)
                - (b == Double.POSITIVE_INFINITY ? 0.0 : tailSeries(b, m));
        return headPart + tailPart;
    }

    /**
     * Over x ∈ [a, b] (finite, 0 ≤ a &lt; b), returns {P, W} with
     * P = ∫ x³/(e^x−1) dx and W = ∫ x³/(e^x−1) · (λ(x) − p)/(q − p) dx, where λ(x) = C2/(xT) and
     * [p, q] = [λ(b), λ(a)] is the wavelength interval. W is the "hat" weight of the upper
     * node of a linear segment, so ∫ ε E_bλ dλ ∝ ε_p (P − W) + ε_q W.
     */
    static void linearSegment(double a, double b, double pUm, double qUm, double temperatureK,
                              double[] out) {
        if (b - a < GAUSS_WIDTH) {
            double half = 0.5 * (b - a);
            double mid = 0.5 * (a + b);
            double scale = PhysicalConstants.C2_UM_K / temperatureK;
            double width = qUm - pUm;
            double sp = 0.0;
            double sw = 0.0;
            for (int i = 0; i < GAUSS_POINTS; i++) {
                double x = mid + half * GAUSS_X[i];
                double f = GAUSS_W[i] * kernel(x, 3);
                double h = (scale / x - pUm) / width;
                sp += f;
                sw += f * Math.min(1.0, Math.max(0.0, h));
            }
            out[0] = sp * half;
            out[1] = sw * half;
            return;
        }
        double p3 = integral3(a, b);
        double m2 = PhysicalConstants.C2_UM_K / temperatureK * integral2(a, b);
        double w = (m2 - pUm * p3) / (qUm - pUm);
        out[0] = p3;
        out[1] = Math.min(p3, Math.max(0.0, w));
    }
}
