package org.exitance.geometry.viewfactor;

/**
 * ∫_lo^hi (a1 + b1 cos φ + g1 sin φ)(a2 + b2 cos φ + g2 sin φ) / (a3 + b3 cos φ + g3 sin φ)² dφ
 * in closed form, for a3 &gt; R = √(b3² + g3²) &gt; 0: the kernel of two cosines over r⁴ on a
 * circle, as {@link PartialPairs} meets it.
 *
 * <p>With ϑ = φ − ψ (ψ = atan2(g3, b3)) the denominator is w = A + R cos ϑ and the numerator
 * k0 + k1 C + k2 C² + S (k3 + k4 C) (C = cos ϑ, S = sin ϑ). Putting C = (w − A)/R, the even part
 * is e2 + e1/w + e0/w²; with q = √(A² − R²),
 * ∫ dϑ/w = (ϑ − 2 atan(R S / (A + q + R C))) / q and ∫ dϑ/w² = (A ∫ dϑ/w − R S / w) / q²
 * (Gradshteyn &amp; Ryzhik, 7th ed., 2.553.3 and 2.554.3; from memory, and checked against adaptive
 * Gauss–Legendre in ArcIntegralTest). The odd part is elementary: S dϑ = −dC. The substitution
 * divides by R and R², so callers use it only when R ≥ {@value #SMALL_AMPLITUDE} A.
 */
final class ArcIntegral {

    /** Below R / A = this the closed form loses digits; callers integrate numerically. */
    static final double SMALL_AMPLITUDE = 1e-2;
    /**
     * Below A − R = this × A (x within about 1e-4 of the circle's size from it) the even part's
     * differences lose digits; callers integrate numerically, split at the peak.
     */
    static final double NEAR = 1e-8;

    private ArcIntegral() {
    }

    /**
     * @param amr A − R = a3 − R, passed in so that the caller can compute it without cancellation
     * @return the integral
     */
    static double closed(double a1, double b1, double g1, double a2, double b2, double g2,
            double a3, double b3, double g3, double amr, double lo, double hi) {
        double big = a3, rr = Math.hypot(b3, g3);
        double psi = Math.atan2(g3, b3), cp = Math.cos(psi), sp = Math.sin(psi);
        double p = a1, qq = b1 * cp + g1 * sp, r = g1 * cp - b1 * sp;
        double p2 = a2, q2 = b2 * cp + g2 * sp, r2 = g2 * cp - b2 * sp;
        double k0 = p * p2 + r * r2, k1 = p * q2 + qq * p2, k2 = qq * q2 - r * r2;
        double k3 = p * r2 + r * p2, k4 = qq * r2 + r * q2;
        double inv = 1 / rr, ar = big * inv;
        double e2 = k2 * inv * inv, e1 = (k1 - 2 * k2 * ar) * inv, e0 = k0 - k1 * ar + k2 * ar * ar;
        double q = Math.sqrt(amr * (big + rr));
        double tl = lo - psi, th = hi - psi;
        double cl = Math.cos(tl), sl = Math.sin(tl), ch = Math.cos(th), sh = Math.sin(th);
        double wl = big + rr * cl, wh = big + rr * ch;
        double j1 = (th - tl - 2 * (Math.atan(rr * sh / (big + q + rr * ch)) - Math.atan(rr * sl / (big + q + rr * cl)))) / q;
        double j2 = (big * j1 - rr * (sh / wh - sl / wl)) / (q * q);
        double odd = (k3 * rr - k4 * big) * (cl - ch) * inv / (wh * wl) - k4 * inv * inv * Math.log1p(rr * (ch - cl) / wl);
        return e2 * (th - tl) + e1 * j1 + e0 * j2 + odd;
    }
}
