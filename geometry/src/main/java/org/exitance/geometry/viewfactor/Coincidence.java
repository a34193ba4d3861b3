package org.exitance.geometry.viewfactor;

/**
 * Finds the piece that two boundary curves share (the same line or the same circle traversed by
 * both, as on the common edge of neighbouring patches or a patch with itself) and its closed-form
 * self term, for {@link CurvedContour}.
 */
final class Coincidence {

    /** Curves count as one line or circle when they agree to this fraction of the pair's size. */
    static final double SAME = 1e-9;

    private Coincidence() {
    }

    /**
     * Two segments on one line.
     *
     * @param ref the pair's length scale r₀ (m)
     * @param cut receives the shared piece's parameters on c (0, 1) and its term ∫∫ ln(r/r₀) dx·dx
     *        (2); modified
     * @param dut receives the same points' parameters on d (0, 1); modified
     * @return true if they share a piece of positive length
     */
    static boolean lines(Curve c, Curve d, double ref, double[] cut, double[] dut) {
        double lc = c.length();
        double ex = c.g[3] / lc, ey = c.g[4] / lc, ez = c.g[5] / lc;
        double tol = SAME * ref;
        double s0 = offLine(c, ex, ey, ez, d.g[0], d.g[1], d.g[2], tol);
        double s1 = offLine(c, ex, ey, ez, d.g[0] + d.g[3], d.g[1] + d.g[4], d.g[2] + d.g[5], tol);
        if (Double.isNaN(s0) || Double.isNaN(s1)) {
            return false;
        }
        double o0 = Math.max(0, Math.min(s0, s1)), o1 = Math.min(lc, Math.max(s0, s1));
        double len = o1 - o0;
        if (len <= 1e-12 * ref) {
            return false;
        }
        cut[0] = o0 / lc;
        cut[1] = o1 / lc;
        dut[0] = (o0 - s0) / (s1 - s0);
        dut[1] = (o1 - s0) / (s1 - s0);
        double direction = Math.signum(s1 - s0);
        cut[2] = direction * len * len * (Math.log(len / ref) - 1.5);
        return true;
    }

    /** @return the coordinate of (x, y, z) along c's line, or NaN if it lies off the line */
    private static double offLine(Curve c, double ex, double ey, double ez, double x, double y, double z, double tol) {
        double vx = x - c.g[0], vy = y - c.g[1], vz = z - c.g[2];
        double s = vx * ex + vy * ey + vz * ez;
        double px = vx - s * ex, py = vy - s * ey, pz = vz - s * ez;
        return px * px + py * py + pz * pz <= tol * tol ? s : Double.NaN;
    }

    /**
     * Two arcs on one circle.
     *
     * @see #lines
     */
    static boolean arcs(Curve c, Curve d, double ref, double[] cut, double[] dut) {
        double tol = SAME * ref;
        double[] a = c.g, b = d.g;
        if (Math.abs(c.rho - d.rho) > tol || sq(a[0] - b[0]) + sq(a[1] - b[1]) + sq(a[2] - b[2]) > tol * tol) {
            return false;
        }
        double ncx = a[4] * a[8] - a[5] * a[7], ncy = a[5] * a[6] - a[3] * a[8], ncz = a[3] * a[7] - a[4] * a[6];
        double ndx = b[4] * b[8] - b[5] * b[7], ndy = b[5] * b[6] - b[3] * b[8], ndz = b[3] * b[7] - b[4] * b[6];
        double cos = ncx * ndx + ncy * ndy + ncz * ndz;
        if (Math.abs(cos) < 1 - 1e-10) {
            return false;
        }
        double sigma = Math.signum(cos);
        // d's start point as an angle in c's frame
        double th = d.theta0;
        double px = Math.cos(th) * b[3] + Math.sin(th) * b[6];
        double py = Math.cos(th) * b[4] + Math.sin(th) * b[7];
        double pz = Math.cos(th) * b[5] + Math.sin(th) * b[8];
        double psi = Math.atan2(px * a[6] + py * a[7] + pz * a[8], px * a[3] + py * a[4] + pz * a[5]);
        double dsweep = sigma * d.sweep;
        double loC = Math.min(c.theta0, c.theta0 + c.sweep), hiC = Math.max(c.theta0, c.theta0 + c.sweep);
        double best = 0, bestShift = 0;
        double loD0 = Math.min(psi, psi + dsweep), hiD0 = Math.max(psi, psi + dsweep);
        long k0 = Math.round((loC - loD0) / (2 * Math.PI));
        for (long k = k0 - 1; k <= k0 + 1; k++) {
            double shift = 2 * Math.PI * k;
            double over = Math.min(hiC, hiD0 + shift) - Math.max(loC, loD0 + shift);
            if (over > best) {
                best = over;
                bestShift = shift;
            }
        }
        if (best <= 1e-12) {
            return false;
        }
        double start = psi + bestShift;
        double o0 = Math.max(loC, Math.min(start, start + dsweep)), o1 = Math.min(hiC, Math.max(start, start + dsweep));
        cut[0] = (o0 - c.theta0) / c.sweep;
        cut[1] = (o1 - c.theta0) / c.sweep;
        dut[0] = (o0 - start) / dsweep;
        dut[1] = (o1 - start) / dsweep;
        cut[2] = Math.signum(c.sweep) * Math.signum(dsweep) * CurvedContour.arcSelf(c.rho, o1 - o0, ref);
        return true;
    }

    private static double sq(double v) {
        return v * v;
    }
}
