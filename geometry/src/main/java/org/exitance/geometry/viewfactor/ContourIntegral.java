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
    /** Σ |edge-pair terms| × scale² / 2π of the last call (m²): the size rounding acts on. */
    double lastMagnitude;
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
        double sum = 0, magnitude = 0;
        for (int a = 0; a < p.n; a++) {
            int a1 = (a + 1) % p.n;
            for (int b = 0; b < q.n; b++) {
                int b1 = (b + 1) % q.n;
                double ep = edgePair(pa, 3 * a, 3 * a1, qa, 3 * b, 3 * b1, order);
                sum += ep;
                magnitude += Math.abs(ep);
            }
        }
        lastMagnitude = magnitude * INV_2PI * scale * scale;
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
        if (!(la > 0 && lb > 0)) {
            return 0; // a zero-length edge contributes nothing (clipping can leave one)
        }
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
            // Parallel: exact double integral (collinear when h = 0), unless both edges are much
            // shorter than their distance, where the four-term sum would cancel.
            double hx = wx - beta0 * ax, hy = wy - beta0 * ay, hz = wz - beta0 * az;
            double h = Math.sqrt(hx * hx + hy * hy + hz * hz);
            if (h < 1e-10 * lmax) {
                h = 0;
            }
            if (h == 0 || Math.min(la, lb) > PARALLEL_CLOSED_FORM_RATIO * h) {
                double c = Math.min(beta0, beta1), d = Math.max(beta0, beta1);
                double j = f(la - c, h) - f(-c, h) - f(la - d, h) + f(-d, h);
                return dot > 0 ? j : -j;
            }
        }
        double touching = touching(pv, p0, p1, ax, ay, az, la, qv, q0, q1, bx, by, bz, lb, 1e-12 * lmax);
        if (!Double.isNaN(touching)) {
            return dot * touching;
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

    /**
     * ∫_a ∫_b ln r for non-parallel edges that touch: at a common end point, or with an end point
     * of one lying inside the other (split there into two pairs with a common end point). NaN if
     * they do not touch. Arrays not modified.
     */
    private static double touching(double[] pv, int p0, int p1, double ax, double ay, double az, double la,
            double[] qv, int q0, int q1, double bx, double by, double bz, double lb, double tol) {
        for (int ea = 0; ea < 2; ea++) {
            int pe = ea == 0 ? p0 : p1;
            double sa = ea == 0 ? 1 : -1; // direction along a away from this end
            for (int eb = 0; eb < 2; eb++) {
                int qe = eb == 0 ? q0 : q1;
                double sb = eb == 0 ? 1 : -1;
                if (dist(pv, pe, qv, qe) <= tol) {
                    double c = sa * sb * (ax * bx + ay * by + az * bz);
                    return commonVertex(la, lb, c);
                }
            }
        }
        // an end of b inside a
        for (int eb = 0; eb < 2; eb++) {
            int qe = eb == 0 ? q0 : q1;
            double sb = eb == 0 ? 1 : -1;
            double t = (qv[qe] - pv[p0]) * ax + (qv[qe + 1] - pv[p0 + 1]) * ay + (qv[qe + 2] - pv[p0 + 2]) * az;
            if (t > tol && t < la - tol && offLine(pv, p0, ax, ay, az, t, qv, qe) <= tol) {
                double c = sb * (ax * bx + ay * by + az * bz); // cos between +a and b away from the point
                return commonVertex(la - t, lb, c) + commonVertex(t, lb, -c);
            }
        }
        for (int ea = 0; ea < 2; ea++) {
            int pe = ea == 0 ? p0 : p1;
            double sa = ea == 0 ? 1 : -1;
            double t = (pv[pe] - qv[q0]) * bx + (pv[pe + 1] - qv[q0 + 1]) * by + (pv[pe + 2] - qv[q0 + 2]) * bz;
            if (t > tol && t < lb - tol && offLine(qv, q0, bx, by, bz, t, pv, pe) <= tol) {
                double c = sa * (ax * bx + ay * by + az * bz);
                return commonVertex(la, lb - t, c) + commonVertex(la, t, -c);
            }
        }
        return Double.NaN;
    }

    /**
     * J(a, b, φ) = ∫_0^a ∫_0^b ln √(s² + t² − 2 s t cos φ) dt ds, two segments of lengths a and b
     * leaving one point at angle φ. In polar coordinates of the (s, t) rectangle, split at its
     * diagonal, with τ = tan α (and cot α on the other part), 1 + τ² − 2τ cos φ = (τ − cos φ)² +
     * sin² φ, so each part is the antiderivative H of ln(x² + h²) (derivation in
     * docs/view-factors.md):
     *
     * <pre>J = (ab/2)(ln a + ln b − 1) + (a²/4)[H(b/a − c; s) − H(−c; s)] + (b²/4)[H(a/b − c; s) − H(−c; s)]</pre>
     *
     * with c = cos φ, s = sin φ.
     */
    static double commonVertex(double a, double b, double c) {
        double sn = Math.sqrt(Math.max(0, 1 - c * c));
        return 0.5 * a * b * (Math.log(a) + Math.log(b) - 1)
                + 0.25 * a * a * (bigH(b / a - c, sn) - bigH(-c, sn))
                + 0.25 * b * b * (bigH(a / b - c, sn) - bigH(-c, sn));
    }

    private static double dist(double[] u, int i, double[] v, int j) {
        double x = u[i] - v[j], y = u[i + 1] - v[j + 1], z = u[i + 2] - v[j + 2];
        return Math.sqrt(x * x + y * y + z * z);
    }

    /** Distance of point w[k] from the point at parameter t on the line p + t d. */
    private static double offLine(double[] pv, int p0, double dx, double dy, double dz, double t, double[] w, int k) {
        double x = w[k] - pv[p0] - t * dx, y = w[k + 1] - pv[p0 + 1] - t * dy, z = w[k + 2] - pv[p0 + 2] - t * dz;
        return Math.sqrt(x * x + y * y + z * z);
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

    /**
     * Points on a geometric panel [σℓ, ℓ] whose nearest singularity lies at the panel's distance
     * ℓσ... from its inner end: the Bernstein-ellipse parameter is 3 for σ = 1/4 against
     * 3 + √8 for a plain panel (singularity at least one length away), so the panel needs
     * ln(3 + √8)/ln 3 ≈ 1.6 times the points of a plain one for the same error (Trefethen,
     * <i>Approximation Theory and Approximation Practice</i>, ch. 19: Gauss error ~ ρ^−2n).
     */
    static int panelPoints(int order) {
        return Math.min(GaussLegendre.MAX_POINTS - 2, (int) Math.ceil(1.6 * order));
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
                    qv, q0, bx, by, bz, lb, panelPoints(order));
            outerEdge = innerEdge;
            level++;
        }
        if (outerEdge > d) {
            sum += graded(pv, p0, ax, ay, az, end, dir * outerEdge, qv, q0, bx, by, bz, lb, panelPoints(order) + 2);
        } else {
            sum += plain(pv, p0, ax, ay, az, Math.min(end, end + dir * outerEdge), outerEdge, qv, q0, bx, by, bz, lb,
                    panelPoints(order));
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

    /**
     * Error of a contour sum per unit of Σ|edge terms| ({@link #lastMagnitude}): rounding of the
     * sum ({@value SplitPairs#ROUNDING}) plus the Gauss error of a plain panel whose nearest
     * singularity lies one panel length away, 10 (3 + √8)^−2n (Bernstein-ellipse estimate with a
     * margin of 10; geometric panels get 1.6 times the points for the same error).
     */
    static double relativeError(int order) {
        return SplitPairs.ROUNDING + 10 * Math.pow(3 + Math.sqrt(8), -2.0 * order);
    }

    /** Parallel edges use the closed form when both are longer than this times their distance. */
    static final double PARALLEL_CLOSED_FORM_RATIO = 0.05;

    /**
     * F(u; h) = ¼ (u² − h²) ln(u² + h²) − ¾ u² + h u atan(u/h), the second antiderivative in u of
     * ½ ln(u² + h²) (differentiate twice to check); F(u; 0) = G(u), F(0; h) = −¼ h² ln h².
     */
    static double f(double u, double h) {
        if (h == 0) {
            return g(u);
        }
        double u2 = u * u, h2 = h * h;
        return 0.25 * (u2 - h2) * Math.log(u2 + h2) - 0.75 * u2 + h * u * Math.atan(u / h);
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
