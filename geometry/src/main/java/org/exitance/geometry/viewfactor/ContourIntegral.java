package org.exitance.geometry.viewfactor;

/**
 * Exchange area of two unobstructed planar polygons by the double contour integral
 * (Stokes' theorem applied twice; Mitalas &amp; Stephenson 1966; Sparrow 1963):
 *
 * <pre>  A_p F_pq = (1 / 2π) ∮_p ∮_q ln r  ds_p · ds_q </pre>
 *
 * with both contours counter-clockwise about their own radiating normal (Siegel &amp; Howell,
 * <i>Thermal Radiation Heat Transfer</i>, 4th ed., §5.3, contour-integral form of the
 * configuration factor; Modest, <i>Radiative Heat Transfer</i>, 3rd ed., eq. 4.32). The sign and
 * the 1/2π factor are checked by the closed-form tests.
 *
 * <p>Evaluation, per edge pair (a, b) with unit tangents t_a, t_b: the term is
 * (t_a · t_b) ∫_a ∫_b ln r ds dt (zero for perpendicular edges).
 * <ul>
 *   <li>Inner integral in closed form: for a point p at perpendicular distance h from line b and
 *       axial coordinate ξ, ∫_0^{L_b} ln r dτ = ½ [H(L_b − ξ) − H(−ξ)] with
 *       H(x) = x ln(x² + h²) − 2x + 2h atan(x/h) (standard antiderivative; differentiate to check).</li>
 *   <li>Outer integral by Gauss–Legendre on sub-intervals of edge a split at the points where the
 *       distance to edge b can be smallest (projections of b's end points, the closest point of the
 *       two lines). On a sub-interval whose end lies closer to b than the sub-interval's length,
 *       the nodes are graded toward that end by s = ℓ u³ (removes the s·ln s end singularity of
 *       touching edges to high order). Points per sub-interval: {@code order} (plain) or
 *       {@code order + 4} (graded).</li>
 *   <li>Collinear edges (shared edges of adjacent facets, T-junctions): exact. For segments
 *       x ∈ [a₁, a₂], y ∈ [c, d] on one line, ∫∫ ln|x − y| dy dx = G(a₂−c) − G(a₁−c) − G(a₂−d) + G(a₁−d)
 *       with G(u) = u² ln|u| / 2 − 3u²/4, G(0) = 0 (G'' = ln|u|; derived in docs/view-factors.md).</li>
 * </ul>
 * Coordinates are shifted to p's centroid and scaled by max(R_p, R_q) before evaluation, so the
 * result does not depend on units. Far pairs lose accuracy to cancellation (terms ~L² ln r, result
 * ~A²/r²): the proximity rule sends them to {@link AreaQuadrature}.
 */
final class ContourIntegral implements PairMethod {

    private static final double INV_2PI = 1.0 / (2 * Math.PI);
    private final double[] pa = new double[3 * Poly.MAX_VERTICES];
    private final double[] qa = new double[3 * Poly.MAX_VERTICES];
    private final double[] breaks = new double[8];

    @Override
    public double exchangeArea(Poly p, Poly q, int order) {
        double scale = Math.max(p.radius, q.radius);
        double inv = 1.0 / scale;
        for (int k = 0; k < p.n; k++) {
            pa[3 * k] = (p.xyz[3 * k] - p.cx) * inv;
            pa[3 * k + 1] = (p.xyz[3 * k + 1] - p.cy) * inv;
            pa[3 * k + 2] = (p.xyz[3 * k + 2] - p.cz) * inv;
        }
        for (int k = 0; k < q.n; k++) {
            qa[3 * k] = (q.xyz[3 * k] - p.cx) * inv;
            qa[3 * k + 1] = (q.xyz[3 * k + 1] - p.cy) * inv;
            qa[3 * k + 2] = (q.xyz[3 * k + 2] - p.cz) * inv;
        }
        double sum = 0;
        for (int a = 0; a < p.n; a++) {
            int a1 = (a + 1) % p.n;
            for (int b = 0; b < q.n; b++) {
                int b1 = (b + 1) % q.n;
                sum += edgePair(pa, 3 * a, 3 * a1, qa, 3 * b, 3 * b1, order);
            }
        }
        return sum * INV_2PI * scale * scale;
    }

    /**
     * (t_a · t_b) ∫_a ∫_b ln r ds dt for edges P0→P1 (in {@code pv}) and Q0→Q1 (in {@code qv}).
     * Arrays not modified.
     */
    double edgePair(double[] pv, int p0, int p1, double[] qv, int q0, int q1, int order) {
        double ax = pv[p1] - pv[p0], ay = pv[p1 + 1] - pv[p0 + 1], az = pv[p1 + 2] - pv[p0 + 2];
        double bx = qv[q1] - qv[q0], by = qv[q1 + 1] - qv[q0 + 1], bz = qv[q1 + 2] - qv[q0 + 2];
        double la = Math.sqrt(ax * ax + ay * ay + az * az), lb = Math.sqrt(bx * bx + by * by + bz * bz);
        ax /= la;
        ay /= la;
        az /= la;
        bx /= lb;
        by /= lb;
        bz /= lb;
        double dot = ax * bx + ay * by + az * bz;
        if (Math.abs(dot) < 1e-15) {
            return 0;
        }
        double cxp = ay * bz - az * by, cyp = az * bx - ax * bz, czp = ax * by - ay * bx;
        double sin2 = cxp * cxp + cyp * cyp + czp * czp;
        double wx = qv[q0] - pv[p0], wy = qv[q0 + 1] - pv[p0 + 1], wz = qv[q0 + 2] - pv[p0 + 2];
        double beta0 = wx * ax + wy * ay + wz * az; // Q0 on line a
        double beta1 = beta0 + lb * dot;           // Q1 on line a
        double lmax = Math.max(la, lb);
        if (sin2 < 1e-24) {
            // Parallel: distance between the lines.
            double hx = wx - beta0 * ax, hy = wy - beta0 * ay, hz = wz - beta0 * az;
            double h = Math.sqrt(hx * hx + hy * hy + hz * hz);
            if (h < 1e-10 * lmax) {
                double c = Math.min(beta0, beta1), d = Math.max(beta0, beta1);
                double j = g(la - c) - g(-c) - g(la - d) + g(-d);
                return dot > 0 ? j : -j;
            }
        }
        int nb = 0;
        breaks[nb++] = 0;
        breaks[nb++] = la;
        breaks[nb++] = clamp(beta0, la);
        breaks[nb++] = clamp(beta1, la);
        if (sin2 >= 1e-24) {
            // Closest points of the two lines: s on a, t on b with (P0 + s a − Q0 − t b) ⟂ a, b.
            double wa = wx * ax + wy * ay + wz * az, wb = wx * bx + wy * by + wz * bz;
            double s = (wa - dot * wb) / (1 - dot * dot);
            breaks[nb++] = clamp(s, la);
        }
        java.util.Arrays.sort(breaks, 0, nb);
        double total = 0;
        double prev = breaks[0];
        for (int k = 1; k < nb; k++) {
            double s1 = breaks[k];
            if (s1 - prev > 1e-13 * la) {
                total += outer(pv, p0, ax, ay, az, prev, s1, qv, q0, bx, by, bz, lb, order);
                prev = s1;
            }
        }
        return dot * total;
    }

    private static double clamp(double s, double la) {
        return s < 0 ? 0 : (s > la ? la : s);
    }

    /**
     * ∫_{s0}^{s1} I_b(P0 + s a) ds. An end closer to edge b than the interval's length gets a
     * geometric panel mesh toward it (panel ratio {@value #SIGMA}), the innermost panel graded.
     */
    private double outer(double[] pv, int p0, double ax, double ay, double az, double s0, double s1,
            double[] qv, int q0, double bx, double by, double bz, double lb, int order) {
        double len = s1 - s0;
        double d0 = segmentDistance(pv, p0, ax, ay, az, s0, qv, q0, bx, by, bz, lb);
        double d1 = segmentDistance(pv, p0, ax, ay, az, s1, qv, q0, bx, by, bz, lb);
        boolean near0 = d0 < len, near1 = d1 < len;
        if (!near0 && !near1) {
            return plain(pv, p0, ax, ay, az, s0, len, qv, q0, bx, by, bz, lb, order);
        }
        if (near0 && near1) {
            double half = 0.5 * len;
            return towardEnd(pv, p0, ax, ay, az, s0, half, d0, qv, q0, bx, by, bz, lb, order)
                    + towardEnd(pv, p0, ax, ay, az, s1, -half, d1, qv, q0, bx, by, bz, lb, order);
        }
        return near0 ? towardEnd(pv, p0, ax, ay, az, s0, len, d0, qv, q0, bx, by, bz, lb, order)
                : towardEnd(pv, p0, ax, ay, az, s1, -len, d1, qv, q0, bx, by, bz, lb, order);
    }

    /** Panel ratio of the geometric mesh toward a near end. */
    static final double SIGMA = 0.25;
    /** Most geometric panels toward one end (SIGMA^10 ≈ 1e-6 of the interval). */
    static final int MAX_LEVELS = 10;

    /** Integral over [end, end + signedLen] with geometric panels toward {@code end} (distance d to b). */
    private double towardEnd(double[] pv, int p0, double ax, double ay, double az, double end, double signedLen,
            double d, double[] qv, int q0, double bx, double by, double bz, double lb, int order) {
        double len = Math.abs(signedLen), dir = Math.signum(signedLen);
        double sum = 0;
        double outerEdge = len;
        int level = 0;
        while (outerEdge > d && level < MAX_LEVELS) {
            double innerEdge = outerEdge * SIGMA;
            // panel [innerEdge, outerEdge] measured from the end
            double a = end + dir * innerEdge;
            sum += plain(pv, p0, ax, ay, az, Math.min(a, a + dir * (outerEdge - innerEdge)), outerEdge - innerEdge,
                    qv, q0, bx, by, bz, lb, order + 2);
            outerEdge = innerEdge;
            level++;
        }
        if (outerEdge > d) {
            sum += graded(pv, p0, ax, ay, az, end, dir * outerEdge, qv, q0, bx, by, bz, lb, order + 4);
        } else {
            sum += plain(pv, p0, ax, ay, az, Math.min(end, end + dir * outerEdge), outerEdge, qv, q0, bx, by, bz, lb,
                    order + 2);
        }
        return sum;
    }

    private double plain(double[] pv, int p0, double ax, double ay, double az, double s0, double len,
            double[] qv, int q0, double bx, double by, double bz, double lb, int n) {
        double[] g = GaussLegendre.nodes(n), w = GaussLegendre.weights(n);
        double sum = 0;
        for (int k = 0; k < n; k++) {
            double s = s0 + len * g[k];
            sum += w[k] * inner(pv[p0] + s * ax, pv[p0 + 1] + s * ay, pv[p0 + 2] + s * az, qv, q0, bx, by, bz, lb);
        }
        return sum * len;
    }

    /** Graded rule s = start + signedLen · u³ (signedLen may be negative); returns ∫ over the interval. */
    private double graded(double[] pv, int p0, double ax, double ay, double az, double start, double signedLen,
            double[] qv, int q0, double bx, double by, double bz, double lb, int n) {
        double[] g = GaussLegendre.nodes(n), w = GaussLegendre.weights(n);
        double sum = 0;
        for (int k = 0; k < n; k++) {
            double u = g[k];
            double s = start + signedLen * u * u * u;
            sum += w[k] * 3 * u * u
                    * inner(pv[p0] + s * ax, pv[p0 + 1] + s * ay, pv[p0 + 2] + s * az, qv, q0, bx, by, bz, lb);
        }
        return sum * Math.abs(signedLen);
    }

    /** ∫_0^{lb} ln |x − (Q0 + τ b)| dτ in closed form. */
    static double inner(double x, double y, double z, double[] qv, int q0, double bx, double by, double bz, double lb) {
        double wx = x - qv[q0], wy = y - qv[q0 + 1], wz = z - qv[q0 + 2];
        double xi = wx * bx + wy * by + wz * bz;
        double cx = wy * bz - wz * by, cy = wz * bx - wx * bz, cz = wx * by - wy * bx;
        double h = Math.sqrt(cx * cx + cy * cy + cz * cz);
        return 0.5 * (bigH(lb - xi, h) - bigH(-xi, h));
    }

    /** H(x) = x ln(x² + h²) − 2x + 2h atan(x/h), the antiderivative of ln(x² + h²). */
    static double bigH(double x, double h) {
        double r2 = x * x + h * h;
        double v = -2 * x;
        if (x != 0) {
            v += x * Math.log(r2);
        }
        if (h > 0) {
            v += 2 * h * Math.atan(x / h);
        }
        return v;
    }

    /** G(u) = u² ln|u| / 2 − 3u²/4, with G(0) = 0. */
    static double g(double u) {
        if (u == 0) {
            return 0;
        }
        double u2 = u * u;
        return 0.5 * u2 * Math.log(Math.abs(u)) - 0.75 * u2;
    }

    /** Distance from P0 + s a to the segment Q0 + τ b, τ ∈ [0, lb]. */
    private static double segmentDistance(double[] pv, int p0, double ax, double ay, double az, double s,
            double[] qv, int q0, double bx, double by, double bz, double lb) {
        double x = pv[p0] + s * ax - qv[q0], y = pv[p0 + 1] + s * ay - qv[q0 + 1], z = pv[p0 + 2] + s * az - qv[q0 + 2];
        double t = x * bx + y * by + z * bz;
        t = t < 0 ? 0 : (t > lb ? lb : t);
        x -= t * bx;
        y -= t * by;
        z -= t * bz;
        return Math.sqrt(x * x + y * y + z * z);
    }
}
