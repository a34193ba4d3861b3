package org.exitance.geometry.viewfactor;

/**
 * One exact piece of a boundary: a straight segment or an arc of a circle, parametrised by
 * t ∈ [0, 1] in its direction of travel.
 * <ul>
 *   <li>LINE: x(t) = p + t d (d = end − start, m);</li>
 *   <li>ARC: x(t) = c + ρ (cos θ a + sin θ b), θ = θ₀ + t Δθ, with a, b orthonormal (the circle's
 *       plane), ρ the radius (m), Δθ the signed sweep (rad).</li>
 * </ul>
 * Mutable (set by {@link #line} or {@link #arc}), so that a pair's curves can be filled without
 * allocation; one set per thread.
 */
final class Curve {

    static final int LINE = 0, ARC = 1;

    int kind;
    /** LINE: p (0..2), d (3..5). ARC: c (0..2), a (3..5), b (6..8). */
    final double[] g = new double[9];
    /** ARC only: radius (m), first angle and signed sweep (rad). */
    double rho, theta0, sweep;

    /** Sets a segment from (x0, y0, z0) to (x1, y1, z1) (m). @return this */
    Curve line(double x0, double y0, double z0, double x1, double y1, double z1) {
        kind = LINE;
        g[0] = x0;
        g[1] = y0;
        g[2] = z0;
        g[3] = x1 - x0;
        g[4] = y1 - y0;
        g[5] = z1 - z0;
        return this;
    }

    /**
     * Sets an arc.
     *
     * @param c centre (m), {@code c[co..co+3)}; not modified
     * @param a first unit axis of the circle's plane, {@code a[ao..ao+3)}; not modified
     * @param b second unit axis (⊥ a), {@code b[bo..bo+3)}; not modified
     * @return this
     */
    Curve arc(double[] c, int co, double[] a, int ao, double[] b, int bo, double radius, double from, double signedSweep) {
        kind = ARC;
        for (int k = 0; k < 3; k++) {
            g[k] = c[co + k];
            g[3 + k] = a[ao + k];
            g[6 + k] = b[bo + k];
        }
        rho = radius;
        theta0 = from;
        sweep = signedSweep;
        return this;
    }

    /** @return length (m) */
    double length() {
        return kind == LINE ? Math.sqrt(g[3] * g[3] + g[4] * g[4] + g[5] * g[5]) : rho * Math.abs(sweep);
    }

    /** @return true if the curve has (almost) no length: a point, to be left out of contour sums */
    boolean degenerate(double scale) {
        return length() <= 1e-14 * scale;
    }

    /**
     * Point and derivative dx/dt at t.
     *
     * @param out receives x (3) and dx/dt (3) at [off, off + 6); modified
     */
    void eval(double t, double[] out, int off) {
        if (kind == LINE) {
            out[off] = g[0] + t * g[3];
            out[off + 1] = g[1] + t * g[4];
            out[off + 2] = g[2] + t * g[5];
            out[off + 3] = g[3];
            out[off + 4] = g[4];
            out[off + 5] = g[5];
            return;
        }
        double th = theta0 + t * sweep;
        double c = Math.cos(th), s = Math.sin(th), rc = rho * c, rs = rho * s, k = rho * sweep;
        for (int i = 0; i < 3; i++) {
            out[off + i] = g[i] + rc * g[3 + i] + rs * g[6 + i];
            out[off + 3 + i] = k * (c * g[6 + i] - s * g[3 + i]);
        }
    }

    /** Point at t into {@code out[off..off+3)} (modified). */
    void point(double t, double[] out, int off) {
        if (kind == LINE) {
            out[off] = g[0] + t * g[3];
            out[off + 1] = g[1] + t * g[4];
            out[off + 2] = g[2] + t * g[5];
            return;
        }
        double th = theta0 + t * sweep;
        double rc = rho * Math.cos(th), rs = rho * Math.sin(th);
        for (int i = 0; i < 3; i++) {
            out[off + i] = g[i] + rc * g[3 + i] + rs * g[6 + i];
        }
    }

    /** Copies {@code o} into this. @return this */
    Curve set(Curve o) {
        kind = o.kind;
        System.arraycopy(o.g, 0, g, 0, 9);
        rho = o.rho;
        theta0 = o.theta0;
        sweep = o.sweep;
        return this;
    }

    /** Restricts this curve to its parameters [t0, t1] (re-parametrised to [0, 1]). @return this */
    Curve restrict(double t0, double t1) {
        if (kind == LINE) {
            double x0 = g[0] + t0 * g[3], y0 = g[1] + t0 * g[4], z0 = g[2] + t0 * g[5];
            double x1 = g[0] + t1 * g[3], y1 = g[1] + t1 * g[4], z1 = g[2] + t1 * g[5];
            return line(x0, y0, z0, x1, y1, z1);
        }
        double th0 = theta0 + t0 * sweep;
        sweep = (t1 - t0) * sweep;
        theta0 = th0;
        return this;
    }
}
