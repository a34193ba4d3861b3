package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * View factor from a differential element to an exact plane patch (an annular sector bounded by
 * two arcs and two radial segments), the patch first cut to the front of the element's tangent
 * plane, by the contour form for a differential area (Siegel &amp; Howell, 4th ed., §4.3; Modest,
 * 3rd ed., eq. 4.39; the form {@link PointFactor} sums in closed form for straight edges):
 *
 * <pre>  F_{dx→A} = −(1/2π) ∮_{∂A} n_x · (a × dy) / |a|²,   a = y − x </pre>
 *
 * with ∂A counter-clockwise about A's normal, which faces x. The cut follows the boundary and
 * bridges each stretch outside the tangent plane by a straight chord along the cut line (for an
 * annular sector, which is not convex, a bridge may run back over another: such pairs cancel in
 * the contour sum). Straight pieces are summed in closed form; arcs by adaptive Gauss–Legendre,
 * split at the point nearest x. Mutable scratch; one instance per thread.
 */
final class PlaneRegionFactor {

    private static final int M = 10;
    private static final double[] G = GaussLegendre.nodes(M), W = GaussLegendre.weights(M);
    private static final double INV_2PI = 0.5 / Math.PI;
    private static final int MAX_DEPTH = 40;

    private final Curve[] curves = {new Curve(), new Curve(), new Curve(), new Curve()};
    private final Curve piece = new Curve();
    private final double[] pt = new double[6], cuts = new double[16], roots = new double[16];
    private double x, y, z, nx, ny, nz, d0;
    private boolean open;
    private final double[] exit = new double[3], firstEntry = new double[3];
    private boolean pendingExit, haveFirst;
    private double sum, tolerance;
    /** Integrand evaluations of the last call. */
    long evaluations;

    /**
     * @param p the plane patch (not modified); x must be in front of it
     * @param tol absolute tolerance on the factor
     * @return F from the element at (px, py, pz) with unit normal (qx, qy, qz) to the part of p
     *         in front of the element's tangent plane
     */
    double factor(Patch p, double px, double py, double pz, double qx, double qy, double qz, double tol) {
        x = px;
        y = py;
        z = pz;
        nx = qx;
        ny = qy;
        nz = qz;
        d0 = nx * x + ny * y + nz * z;
        tolerance = tol;
        evaluations = 0;
        int n = PatchCurves.of(p, curves);
        sum = 0;
        pendingExit = false;
        haveFirst = false;
        open = false;
        for (int k = 0; k < n; k++) {
            Curve c = curves[k];
            if (c.degenerate(1e-300)) {
                continue;
            }
            int m = insideIntervals(c);
            for (int s = 0; s + 1 < m; s += 2) {
                double t0 = cuts[s], t1 = cuts[s + 1];
                c.point(t0, pt, 0);
                if (t0 > 0 || !open) {
                    entry(pt[0], pt[1], pt[2]);
                }
                piece.set(c).restrict(t0, t1);
                sum += curveTerm(piece);
                open = t1 >= 1;
                if (t1 < 1) {
                    c.point(t1, pt, 0);
                    exit[0] = pt[0];
                    exit[1] = pt[1];
                    exit[2] = pt[2];
                    pendingExit = true;
                }
            }
            if (m == 0) {
                open = false;
            }
        }
        if (pendingExit && haveFirst) {
            sum += segment(exit[0], exit[1], exit[2], firstEntry[0], firstEntry[1], firstEntry[2]);
        }
        return Math.max(0, -sum * INV_2PI);
    }

    /** A stretch starts at (ex, ey, ez): bridge from the last exit, or remember it as the first entry. */
    private void entry(double ex, double ey, double ez) {
        if (pendingExit) {
            sum += segment(exit[0], exit[1], exit[2], ex, ey, ez);
            pendingExit = false;
        } else if (!haveFirst) {
            firstEntry[0] = ex;
            firstEntry[1] = ey;
            firstEntry[2] = ez;
            haveFirst = true;
        }
    }

    /** Parameter intervals of c in front of the tangent plane, as [t0, t1] pairs in {@link #cuts}. @return 2 × count */
    private int insideIntervals(Curve c) {
        if (c.kind == Curve.LINE) {
            double s0 = nx * c.g[0] + ny * c.g[1] + nz * c.g[2] - d0;
            double ds = nx * c.g[3] + ny * c.g[4] + nz * c.g[5];
            double s1 = s0 + ds;
            if (s0 >= 0 && s1 >= 0) {
                cuts[0] = 0;
                cuts[1] = 1;
                return 2;
            }
            if (s0 < 0 && s1 < 0) {
                return 0;
            }
            double tr = s0 / (s0 - s1);
            cuts[0] = s0 >= 0 ? 0 : tr;
            cuts[1] = s0 >= 0 ? tr : 1;
            return 2;
        }
        // α + β cos θ + γ sin θ along the arc, θ = θ0 + t Δθ
        double[] g = c.g;
        double alpha = nx * g[0] + ny * g[1] + nz * g[2] - d0;
        double beta = c.rho * (nx * g[3] + ny * g[4] + nz * g[5]);
        double gamma = c.rho * (nx * g[6] + ny * g[7] + nz * g[8]);
        double[] r = roots;
        int nr = 0;
        double amp = Math.hypot(beta, gamma);
        r[nr++] = 0;
        if (amp > Math.abs(alpha)) {
            double base = Math.atan2(gamma, beta), off = Math.acos(-alpha / amp);
            for (double th : new double[] {base + off, base - off}) {
                for (int k = -2; k <= 2; k++) {
                    double t = (th + 2 * Math.PI * k - c.theta0) / c.sweep;
                    if (t > 0 && t < 1) {
                        r[nr++] = t;
                    }
                }
            }
        }
        r[nr++] = 1;
        java.util.Arrays.sort(r, 0, nr);
        int m = 0;
        for (int k = 0; k + 1 < nr; k++) {
            double mid = 0.5 * (r[k] + r[k + 1]), th = c.theta0 + mid * c.sweep;
            if (alpha + beta * Math.cos(th) + gamma * Math.sin(th) > 0) {
                if (m > 0 && cuts[m - 1] == r[k]) {
                    cuts[m - 1] = r[k + 1];
                } else {
                    cuts[m++] = r[k];
                    cuts[m++] = r[k + 1];
                }
            }
        }
        return m;
    }

    /** ∫ n_x · (a × dy) / |a|² along a segment, in closed form: γ n_x·(a₀ × a₁)/|a₀ × a₁|. */
    private double segment(double x0, double y0, double z0, double x1, double y1, double z1) {
        double ax = x0 - x, ay = y0 - y, az = z0 - z, bx = x1 - x, by = y1 - y, bz = z1 - z;
        double cx = ay * bz - az * by, cy = az * bx - ax * bz, cz = ax * by - ay * bx;
        double len = Math.sqrt(cx * cx + cy * cy + cz * cz);
        if (!(len > 0)) {
            return 0;
        }
        double gamma = Math.atan2(len, ax * bx + ay * by + az * bz);
        return gamma * (nx * cx + ny * cy + nz * cz) / len;
    }

    private double curveTerm(Curve c) {
        if (c.kind == Curve.LINE) {
            return segment(c.g[0], c.g[1], c.g[2], c.g[0] + c.g[3], c.g[1] + c.g[4], c.g[2] + c.g[5]);
        }
        double whole = rule(c, 0, 1);
        return adapt(c, 0, 1, whole, tolerance * 2 * Math.PI, 0);
    }

    private double adapt(Curve c, double t0, double t1, double whole, double tol, int depth) {
        double m = 0.5 * (t0 + t1);
        double a = rule(c, t0, m), b = rule(c, m, t1);
        if (Math.abs(a + b - whole) <= Math.max(tol, 1e-13 * Math.abs(a + b)) || depth >= MAX_DEPTH) {
            return a + b;
        }
        return adapt(c, t0, m, a, 0.5 * tol, depth + 1) + adapt(c, m, t1, b, 0.5 * tol, depth + 1);
    }

    private double rule(Curve c, double t0, double t1) {
        evaluations += M;
        double s = 0, h = t1 - t0;
        for (int k = 0; k < M; k++) {
            c.eval(t0 + h * G[k], pt, 0);
            double ax = pt[0] - x, ay = pt[1] - y, az = pt[2] - z;
            double cx = ay * pt[5] - az * pt[4], cy = az * pt[3] - ax * pt[5], cz = ax * pt[4] - ay * pt[3];
            s += W[k] * (nx * cx + ny * cy + nz * cz) / (ax * ax + ay * ay + az * az);
        }
        return s * h;
    }
}
