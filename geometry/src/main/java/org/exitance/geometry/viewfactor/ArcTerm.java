package org.exitance.geometry.viewfactor;

/**
 * The contour term of a circular arc seen from a point x (for {@link ConeContour}): on
 * R(φ) = d + U cos φ + W sin φ (d = centre − x, U ⊥ W, |U| = |W| = r),
 * n·(R × R′) = n·(U × W) + n·(d × W) cos φ − n·(d × U) sin φ and |R|² = α + β cos φ + γ sin φ
 * with α = |d|² + r², β = 2 d·U, γ = 2 d·W, so the term is the integral of a ratio of linear
 * trigonometric polynomials, in closed form (Gradshteyn &amp; Ryzhik, 7th ed., 2.553.3 and
 * 2.554.3): with β cos φ + γ sin φ = ρ cos(φ − φ₀),
 *
 * <pre>  ∫ (A + B cos ψ + C sin ψ)/(α + ρ cos ψ) dψ = (B/ρ) ψ + (A − Bα/ρ) I₀(ψ) − (C/ρ) ln(α + ρ cos ψ),
 *   I₀(ψ) = 2 atan2(k sin(ψ/2), cos(ψ/2)) / √(α² − ρ²),  k = √((α − ρ)/(α + ρ)), </pre>
 *
 * where α ± ρ = (d·w)² + (|d_⊥| ± r)² (w the arc's unit normal) is formed without cancellation.
 * Where ρ &lt; 10⁻³ α (x near the arc's axis: the closed form would cancel) the integrand is
 * nearly constant and 20-point Gauss–Legendre is exact to rounding. Arcs of at most π only, so
 * that the atan2 form stays on one branch.
 */
final class ArcTerm {

    private static final double TWO_PI = 2 * Math.PI;

    private ArcTerm() {
    }

    /**
     * @param data the curve's piece data (not modified): centre (3), U (3), W (3), φ start, φ end
     *        from index o
     * @return ∫ n·(R × dR)/|R|² along the arc, R = point − x
     */
    static double of(double[] data, int o, double x, double y, double z, double nx, double ny, double nz) {
        double dx = data[o] - x, dy = data[o + 1] - y, dz = data[o + 2] - z;
        double ux = data[o + 3], uy = data[o + 4], uz = data[o + 5];
        double wx = data[o + 6], wy = data[o + 7], wz = data[o + 8];
        double f0 = data[o + 9], f1 = data[o + 10];
        // numerator A + B cos φ + C sin φ
        double kx = uy * wz - uz * wy, ky = uz * wx - ux * wz, kz = ux * wy - uy * wx; // U × W
        double a = nx * kx + ny * ky + nz * kz;
        double b = nx * (dy * wz - dz * wy) + ny * (dz * wx - dx * wz) + nz * (dx * wy - dy * wx);
        double c = -(nx * (dy * uz - dz * uy) + ny * (dz * ux - dx * uz) + nz * (dx * uy - dy * ux));
        double r2 = ux * ux + uy * uy + uz * uz, r = Math.sqrt(r2);
        double du = (dx * ux + dy * uy + dz * uz) / r, dw = (dx * wx + dy * wy + dz * wz) / r;
        double dn = (dx * kx + dy * ky + dz * kz) / r2;
        double dperp = Math.hypot(du, dw);
        double alpha = dx * dx + dy * dy + dz * dz + r2;
        double rho = 2 * r * dperp;
        if (rho < 1e-3 * alpha) {
            return gauss(f0, f1, a, b, c, alpha, 2 * r * du, 2 * r * dw);
        }
        double am = dn * dn + (dperp - r) * (dperp - r), ap = dn * dn + (dperp + r) * (dperp + r);
        double phi0 = Math.atan2(dw, du), cs = du / dperp, sn = dw / dperp;
        double bp = b * cs + c * sn, cp = -b * sn + c * cs;
        double s = Math.sqrt(am * ap), kk = Math.sqrt(am / ap);
        // ψ ends, shifted together so that their midpoint lies in [−π, π)
        double pa = f0 - phi0, pb = f1 - phi0;
        double shift = TWO_PI * Math.floor((0.5 * (pa + pb) + Math.PI) / TWO_PI);
        pa -= shift;
        pb -= shift;
        double i0 = 2 * (Math.atan2(kk * Math.sin(0.5 * pb), Math.cos(0.5 * pb))
                - Math.atan2(kk * Math.sin(0.5 * pa), Math.cos(0.5 * pa))) / s;
        double logs = Math.log(logArg(pb, kk) / logArg(pa, kk));
        return (bp / rho) * (pb - pa) + (a - bp * alpha / rho) * i0 - (cp / rho) * logs;
    }

    /** cos²(ψ/2) + k² sin²(ψ/2): (α + ρ cos ψ)/(α + ρ) without cancellation. */
    private static double logArg(double psi, double k) {
        double c = Math.cos(0.5 * psi), s = Math.sin(0.5 * psi);
        return c * c + k * k * s * s;
    }

    private static double gauss(double f0, double f1, double a, double b, double c, double alpha, double be, double ga) {
        double[] x = GaussLegendre.nodes(20), w = GaussLegendre.weights(20);
        double sum = 0;
        for (int k = 0; k < x.length; k++) {
            double f = f0 + (f1 - f0) * x[k], cs = Math.cos(f), sn = Math.sin(f);
            sum += w[k] * (a + b * cs + c * sn) / (alpha + be * cs + ga * sn);
        }
        return sum * (f1 - f0);
    }
}
