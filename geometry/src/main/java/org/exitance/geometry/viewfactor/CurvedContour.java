package org.exitance.geometry.viewfactor;

/**
 * Exchange area of two surfaces bounded by exact straight and circular {@link Curve}s, by the
 * double contour integral (Stokes' theorem applied to each surface; Siegel &amp; Howell,
 * <i>Thermal Radiation Heat Transfer</i>, 4th ed., §5.3; Modest, <i>Radiative Heat Transfer</i>,
 * 3rd ed., eq. 4.32):
 *
 * <pre>  A_p F_pq = (1 / 2π) ∮_p ∮_q ln (r / r₀) dx_p · dx_q   (+ A_p when p = q) </pre>
 *
 * with both boundaries counter-clockwise about their radiating normals; r₀ is any length
 * (∮ dx = 0 makes it drop out; it is taken near the pair's size to limit cancellation). The form
 * holds for curved (non-planar) surfaces as long as the kernel keeps its sign on the pair, i.e.
 * every point of one surface sees all of the other in front of its tangent plane and nothing is in
 * the way; {@link CurvedPairs} decides where that is proved. For a surface with itself the Stokes
 * reduction leaves the area term A_p (Sparrow's self-view form; a plane disc then gives 0 and a
 * closed sphere 1, as tested).
 *
 * <p>Evaluation per curve pair:
 * <ul>
 *   <li>pieces of one line or one circle shared by both boundaries (common edges of neighbouring
 *       patches, a patch with itself): ∫∫ ln|s − t| in closed form on a line,
 *       L²(ln L − 3/2); on a circle the difference depends on the angle w alone, leaving
 *       2 ∫₀^L (L − w) ρ² cos w ln(2ρ sin(w/2)) dw, done with Gauss panels graded geometrically
 *       toward both ends (log singularities);</li>
 *   <li>the rest: adaptive Gauss–Legendre (8 × 8) on the parameter rectangle, halved along its
 *       longer side until the halves agree with the whole within the cell's share of the
 *       tolerance (corners where curves meet are log-singular points, which halving resolves);</li>
 *   <li>curves whose tangents are perpendicular everywhere (a line along a circle's axis, two
 *       perpendicular lines) add nothing and are skipped.</li>
 * </ul>
 * Mutable scratch; one instance per thread.
 */
final class CurvedContour {

    private static final int N = 8;
    private static final double[] G = GaussLegendre.nodes(N), W = GaussLegendre.weights(N);
    private static final int GRADED_LEVELS = 40;
    private static final double GRADING = 0.25;
    private static final int MAX_DEPTH = 48;
    /**
     * Most rule evaluations per pair (about four times the most any shipped case or closed-form
     * test needs, 2,480 at the tightest tolerance); a pair that needs more is given up
     * ({@link #exhausted}) and left to the polygon methods, so that a degenerate shape (a cavity a
     * micrometre high, discs 10⁵ times wider than their gap) costs seconds, not hours.
     */
    static final long BUDGET = 10_000;
    private static final double INV_2PI = 1.0 / (2 * Math.PI);

    private final double[] cp = new double[6 * N], dp = new double[6 * N];
    private final Curve[] pc = {new Curve(), new Curve(), new Curve()};
    private final Curve[] pd = {new Curve(), new Curve(), new Curve()};
    private final double[] cut = new double[4], dut = new double[4];
    private final boolean[] cOver = new boolean[3], dOver = new boolean[3];
    private double ref, tolerance, error;
    private long rules;
    /** Error estimate of the last call (m²). */
    double lastError;
    /** Whether the last call ran out of its {@link #BUDGET} (its result is then not to be used). */
    boolean exhausted;
    /** Sum of |curve-pair terms| / 2π of the last call (m²): the size rounding acts on. */
    double lastMagnitude;

    /**
     * @param p boundary of the first surface (not modified), counter-clockwise about its normal
     * @param np number of curves of p
     * @param q boundary of the second surface (not modified)
     * @param nq number of curves of q
     * @param selfArea A_p if p and q are the same surface, else 0 (m²)
     * @param scale a length of the pair's size (m), for r₀ and for degenerate curves
     * @param tol absolute tolerance on A_p F_pq (m²)
     * @return A_p F_pq (m²)
     */
    double exchangeArea(Curve[] p, int np, Curve[] q, int nq, double selfArea, double scale, double tol) {
        ref = scale;
        error = 0;
        rules = 0;
        double sum = 0, magnitude = 0;
        int terms = 0;
        for (int a = 0; a < np; a++) {
            for (int b = 0; b < nq; b++) {
                if (!p[a].degenerate(scale) && !q[b].degenerate(scale) && !perpendicular(p[a], q[b])) {
                    terms++;
                }
            }
        }
        tolerance = 2 * Math.PI * tol / Math.max(1, terms);
        for (int a = 0; a < np; a++) {
            for (int b = 0; b < nq; b++) {
                Curve c = p[a], d = q[b];
                if (c.degenerate(scale) || d.degenerate(scale) || perpendicular(c, d)) {
                    continue;
                }
                double v = term(c, d);
                sum += v;
                magnitude += Math.abs(v);
            }
        }
        exhausted = rules > BUDGET;
        lastError = error * INV_2PI;
        lastMagnitude = magnitude * INV_2PI;
        return sum * INV_2PI + selfArea;
    }

    /** @return true if dx_c · dx_d = 0 all along both curves */
    private static boolean perpendicular(Curve c, Curve d) {
        if (c.kind == Curve.LINE && d.kind == Curve.LINE) {
            double dot = c.g[3] * d.g[3] + c.g[4] * d.g[4] + c.g[5] * d.g[5];
            return Math.abs(dot) <= 1e-15 * c.length() * d.length();
        }
        if (c.kind == Curve.ARC && d.kind == Curve.ARC) {
            return false;
        }
        Curve line = c.kind == Curve.LINE ? c : d, arc = c.kind == Curve.LINE ? d : c;
        double[] a = arc.g, l = line.g;
        double nx = a[4] * a[8] - a[5] * a[7], ny = a[5] * a[6] - a[3] * a[8], nz = a[3] * a[7] - a[4] * a[6];
        double cx = l[4] * nz - l[5] * ny, cy = l[5] * nx - l[3] * nz, cz = l[3] * ny - l[4] * nx;
        return Math.sqrt(cx * cx + cy * cy + cz * cz) <= 1e-15 * line.length();
    }

    /** ∫∫ ln(r/r₀) dx_c · dx_d over one curve pair, split where the two share a line or circle. */
    private double term(Curve c, Curve d) {
        boolean shared = c.kind == d.kind
                && (c.kind == Curve.LINE ? Coincidence.lines(c, d, ref, cut, dut) : Coincidence.arcs(c, d, ref, cut, dut));
        if (!shared) {
            return general(c, 0, 1, d, 0, 1);
        }
        // cut[0..1], dut[0..1]: the parameters of the shared piece on c and on d; cut[2]: its
        // closed-form self term with the directions of travel applied
        int nc = pieces(c, cut[0], cut[1], pc, cOver);
        int nd = pieces(d, dut[0], dut[1], pd, dOver);
        double sum = cut[2];
        for (int a = 0; a < nc; a++) {
            for (int b = 0; b < nd; b++) {
                if (cOver[a] && dOver[b]) {
                    continue;
                }
                sum += general(pc[a], 0, 1, pd[b], 0, 1);
            }
        }
        return sum;
    }

    /** Splits c at parameters t0 &lt; t1 into up to three pieces (into {@code out}, modified); flags the shared one. */
    private static int pieces(Curve c, double t0, double t1, Curve[] out, boolean[] over) {
        int n = 0;
        double lo = Math.min(t0, t1), hi = Math.max(t0, t1);
        if (lo > 1e-12) {
            out[n].set(c).restrict(0, lo);
            over[n++] = false;
        }
        out[n].set(c).restrict(lo, hi);
        over[n++] = true;
        if (hi < 1 - 1e-12) {
            out[n].set(c).restrict(hi, 1);
            over[n++] = false;
        }
        return n;
    }

    /** Adaptive integral over the parameter rectangle [s0, s1] × [t0, t1]. */
    private double general(Curve c, double s0, double s1, Curve d, double t0, double t1) {
        double whole = rule(c, s0, s1, d, t0, t1);
        return adapt(c, s0, s1, d, t0, t1, whole, tolerance, 0);
    }

    private double adapt(Curve c, double s0, double s1, Curve d, double t0, double t1, double whole, double tol,
            int depth) {
        boolean splitC = (s1 - s0) * c.length() >= (t1 - t0) * d.length();
        double a, b;
        if (splitC) {
            double m = 0.5 * (s0 + s1);
            a = rule(c, s0, m, d, t0, t1);
            b = rule(c, m, s1, d, t0, t1);
        } else {
            double m = 0.5 * (t0 + t1);
            a = rule(c, s0, s1, d, t0, m);
            b = rule(c, s0, s1, d, m, t1);
        }
        double diff = Math.abs(a + b - whole);
        if (diff <= tol || depth >= MAX_DEPTH || rules > BUDGET) {
            error += diff;
            return a + b;
        }
        if (splitC) {
            double m = 0.5 * (s0 + s1);
            return adapt(c, s0, m, d, t0, t1, a, 0.5 * tol, depth + 1) + adapt(c, m, s1, d, t0, t1, b, 0.5 * tol, depth + 1);
        }
        double m = 0.5 * (t0 + t1);
        return adapt(c, s0, s1, d, t0, m, a, 0.5 * tol, depth + 1) + adapt(c, s0, s1, d, m, t1, b, 0.5 * tol, depth + 1);
    }

    /** N × N Gauss–Legendre rule on one cell. */
    private double rule(Curve c, double s0, double s1, Curve d, double t0, double t1) {
        rules++;
        double hs = s1 - s0, ht = t1 - t0;
        for (int i = 0; i < N; i++) {
            c.eval(s0 + hs * G[i], cp, 6 * i);
            d.eval(t0 + ht * G[i], dp, 6 * i);
        }
        double inv2 = 1.0 / (ref * ref);
        double sum = 0;
        for (int i = 0; i < N; i++) {
            int oi = 6 * i;
            double x = cp[oi], y = cp[oi + 1], z = cp[oi + 2], tx = cp[oi + 3], ty = cp[oi + 4], tz = cp[oi + 5];
            double row = 0;
            for (int j = 0; j < N; j++) {
                int oj = 6 * j;
                double rx = x - dp[oj], ry = y - dp[oj + 1], rz = z - dp[oj + 2];
                double r2 = (rx * rx + ry * ry + rz * rz) * inv2;
                double dot = tx * dp[oj + 3] + ty * dp[oj + 4] + tz * dp[oj + 5];
                row += W[j] * 0.5 * Math.log(r2) * dot;
            }
            sum += W[i] * row;
        }
        return sum * hs * ht;
    }

    /**
     * 2 ∫₀^L (L − w) ρ² cos w ln(2ρ sin(w/2) / r₀) dw: the self term of an arc of angle L on
     * a circle of radius ρ (the difference of two points of the arc depends on their angle only).
     * Gauss panels graded geometrically toward w = 0 and, for L near 2π, toward w = L.
     */
    static double arcSelf(double rho, double angle, double r0) {
        double sum = 0;
        double lo = 0, hi = angle, mid = 0.5 * angle;
        if (!(angle > 0)) {
            return 0;
        }
        // panels [mid·g^(k+1), mid·g^k] toward 0 and the mirror toward L
        double upper = mid;
        for (int k = 0; k < GRADED_LEVELS; k++) {
            double lower = upper * GRADING;
            sum += arcPanel(rho, angle, r0, lo + lower, lo + upper);
            sum += arcPanel(rho, angle, r0, hi - upper, hi - lower);
            upper = lower;
        }
        // the last tiny panels: ∫₀^ε (L − w) ρ² ln(ρ w / r₀) dw ≈ L ρ² ε (ln(ρε/r₀) − 1)
        double eps = upper;
        sum += angle * rho * rho * eps * (Math.log(rho * eps / r0) - 1);
        return 2 * sum;
    }

    private static double arcPanel(double rho, double angle, double r0, double a, double b) {
        double[] g = GaussLegendre.nodes(12), w = GaussLegendre.weights(12);
        double s = 0, h = b - a;
        for (int k = 0; k < 12; k++) {
            double x = a + h * g[k];
            s += w[k] * (angle - x) * rho * rho * Math.cos(x) * Math.log(2 * rho * Math.sin(0.5 * x) / r0);
        }
        return s * h;
    }
}
