package org.exitance.geometry.viewfactor;

/**
 * The emitter integral of a partly hidden pair when a round body is in the way, nested: over a
 * convex emitter polygon, an outer adaptive Gauss rule across lines parallel to its longest edge,
 * and on each line an adaptive one-dimensional rule cut at the points where the integrand's make-up
 * changes.
 *
 * <p>Why nested. The integrand x ↦ F_{dx→V(x)} is smooth except on event curves, where a
 * shadow edge passes a receiver vertex, a silhouette touches a receiver edge, the body's outline
 * changes (x crossing an end plane) or polygon shadows meet; behind a round body these are curves,
 * not lines, so the straight cuts of {@link ShadowIntegral} cannot follow them. Along a line they
 * are points. The integrand at x reports a signature (the make-up of the visible part: the pieces
 * of the polygon cuts and the pieces of the cut silhouette, {@link VisiblePart#signature}); where
 * two neighbouring nodes of a line disagree, the event between them is found by bisection and
 * the line is cut there. Each piece of a line, and each outer interval, is mapped by
 * τ = 3σ² − 2σ³ (derivative zero at both ends, so the square-root onsets found at event points
 * and the kinks at the ends become smooth in σ) and its 8-point Gauss–Legendre rule compared with
 * the sum of the rules on its halves, halved where they disagree by more than its share of the
 * tolerance (shared by length). A line's make-up (the sequence of its pieces' signatures) is its
 * own signature: an outer interval whose lines differ in make-up is halved down to
 * {@value #STRUCTURE_DEPTH} levels whatever its rules say, since the outer integrand is singular
 * where event curves turn along the lines or meet. The estimate is the sum of the accepted pieces'
 * differences, the lines' weighted by the outer rule.
 *
 * <p>Mutable scratch; one instance per thread.
 */
final class EmitterLines {

    /** The integrand at a point of the emitter. */
    interface Integrand {
        /** Writes {F to the visible part, F to the whole receiver} at x into out (modified). */
        void at(double x, double y, double z, double[] out);

        /** @return the signature of the last point given to {@link #at} */
        long signature();
    }

    private static final int DEPTH = 14;
    private static final int BISECTIONS = 30;
    /** Rules on [0, 1]. */
    private static final double[] X8 = GaussLegendre.nodes(8), W8 = GaussLegendre.weights(8);

    private final double[] eu = new double[3], ev = new double[3];
    private final double[] vu = new double[Poly.MAX_VERTICES], vv = new double[Poly.MAX_VERTICES];
    private final double[] val = new double[2];
    private Poly p;
    private Integrand g;
    private int nv;
    private double ox, oy, oz;
    private long budget;
    /** Evaluations left before refinement stops (the estimate then keeps what is unresolved). */
    private long left;
    private double lineTol;
    /** Error estimate of the last {@link #integrate} (m²): visible and hidden part. */
    double errorVisible, errorHidden;

    /**
     * @param poly convex emitter (not modified)
     * @param integrand the point factors
     * @param tolerance target absolute error of the smaller of the two integrals (m²)
     * @param evaluations most integrand evaluations
     * @return {∫ F_{dx→V}, ∫ F_{dx→q∖V}} over the emitter (m²), in a new array
     */
    double[] integrate(Poly poly, Integrand integrand, double tolerance, long evaluations) {
        p = poly;
        g = integrand;
        budget = evaluations;
        left = evaluations;
        axes();
        double lo = Double.MAX_VALUE, hi = -Double.MAX_VALUE;
        for (int k = 0; k < nv; k++) {
            lo = Math.min(lo, vu[k]);
            hi = Math.max(hi, vu[k]);
        }
        double[] us = vu.clone();
        java.util.Arrays.sort(us, 0, nv);
        lineTol = 0.25 * tolerance / Math.max(hi - lo, 1e-300);
        double[] sum = new double[4];
        double start = lo;
        for (int k = 1; k < nv; k++) {
            if (us[k] - start > 1e-12 * (hi - lo)) {
                outer(start, us[k], tolerance * (us[k] - start) / (hi - lo), 0, sum);
                start = us[k];
            }
        }
        errorVisible = sum[2];
        errorHidden = sum[3];
        return new double[] {sum[0], sum[1]};
    }

    /** Axes: u along the longest edge, v across it in the plane; vertex coordinates. */
    private void axes() {
        nv = p.n;
        double best = -1;
        for (int k = 0; k < nv; k++) {
            int l = (k + 1) % nv;
            double dx = p.xyz[3 * l] - p.xyz[3 * k], dy = p.xyz[3 * l + 1] - p.xyz[3 * k + 1], dz = p.xyz[3 * l + 2] - p.xyz[3 * k + 2];
            double d2 = dx * dx + dy * dy + dz * dz;
            if (d2 > best) {
                best = d2;
                eu[0] = dx;
                eu[1] = dy;
                eu[2] = dz;
            }
        }
        double len = Math.sqrt(best);
        eu[0] /= len;
        eu[1] /= len;
        eu[2] /= len;
        ev[0] = p.ny * eu[2] - p.nz * eu[1];
        ev[1] = p.nz * eu[0] - p.nx * eu[2];
        ev[2] = p.nx * eu[1] - p.ny * eu[0];
        ox = p.cx;
        oy = p.cy;
        oz = p.cz;
        for (int k = 0; k < nv; k++) {
            double dx = p.xyz[3 * k] - ox, dy = p.xyz[3 * k + 1] - oy, dz = p.xyz[3 * k + 2] - oz;
            vu[k] = dx * eu[0] + dy * eu[1] + dz * eu[2];
            vv[k] = dx * ev[0] + dy * ev[1] + dz * ev[2];
        }
    }

    /** Adds {vis, hid, err vis, err hid} over u ∈ [a, b] into acc (modified). */
    private void outer(double a, double b, double tol, int depth, double[] acc) {
        double[] whole = new double[4];
        rule(a, b, whole, 0);
        outer(a, b, whole, 8, tol, depth, acc);
    }

    /**
     * The outer interval [a, b] whose 8-point rule gave {@code whole} (its lines' signatures in
     * [0, lines) of the line arrays): compared with the two halves' rules (the outer integrand
     * has singular points inside, where event curves turn along the lines or meet, and there two
     * rules on one interval can agree by chance while both are off). Where the lines' make-up
     * (the sequence of signatures along each) changes between neighbouring lines, the interval is
     * cut there first, found by bisection; otherwise it is accepted with the halves' sum when
     * whole and halves agree, else each half is refined.
     */
    private void outer(double a, double b, double[] whole, int lines, double tol, int depth, double[] acc) {
        double m = 0.5 * (a + b);
        double[] lo = new double[4], hi = new double[4];
        rule(a, m, lo, lines);
        rule(m, b, hi, lines + 8);
        boolean changes = depth < STRUCTURE_DEPTH && changes(lines + 16);
        double ev = Math.abs(whole[0] - lo[0] - hi[0]), eh = Math.abs(whole[1] - lo[1] - hi[1]);
        double inner = Math.min(lo[2] + hi[2], lo[3] + hi[3]);
        if ((changes || Math.min(ev, eh) + inner > tol) && depth < DEPTH && left > 0) {
            outer(a, m, lo, 0, 0.5 * tol, depth + 1, acc);
            outer(m, b, hi, 0, 0.5 * tol, depth + 1, acc);
            return;
        }
        acc[0] += lo[0] + hi[0];
        acc[1] += lo[1] + hi[1];
        acc[2] += ev + lo[2] + hi[2];
        acc[3] += eh + lo[3] + hi[3];
    }

    private final long[] lineSig = new long[24];
    /** Signature of the last line: its pieces' signatures in order, runs counted once. */
    private long lastLineSignature, lastPieceSignature;

    /**
     * Outer depth down to which an interval whose lines differ in make-up is halved whatever its
     * rules say (to a quarter of the emitter's extent across the lines).
     */
    private static final int STRUCTURE_DEPTH = 2;

    /** @return whether the lines [0, m) differ in make-up */
    private boolean changes(int m) {
        for (int i = 1; i < m; i++) {
            if (lineSig[i] != lineSig[0]) {
                return true;
            }
        }
        return false;
    }

    /**
     * The mapped 8-point rule over u ∈ [a, b], each node a line: out = {vis, hid, err vis,
     * err hid}, the errors the lines' own, weighted; the lines' signatures from index {@code at}.
     */
    private void rule(double a, double b, double[] out, int at) {
        java.util.Arrays.fill(out, 0);
        double[] line = new double[4];
        for (int k = 0; k < X8.length; k++) {
            double s = X8[k];
            double u = a + (b - a) * (3 * s * s - 2 * s * s * s);
            double w = W8[k] * (b - a) * 6 * s * (1 - s);
            lineIntegral(u, line);
            lineSig[at + k] = lastLineSignature;
            out[0] += w * line[0];
            out[1] += w * line[1];
            out[2] += w * line[2];
            out[3] += w * line[3];
        }
    }

    /** {vis, hid, err vis, err hid} along the line u (m). */
    private void lineIntegral(double u, double[] out) {
        java.util.Arrays.fill(out, 0);
        double v0 = Double.MAX_VALUE, v1 = -Double.MAX_VALUE;
        for (int k = 0; k < nv; k++) {
            int l = (k + 1) % nv;
            double a = vu[k] - u, b = vu[l] - u;
            if ((a <= 0 && b >= 0) || (a >= 0 && b <= 0)) {
                double t = a == b ? 0 : a / (a - b);
                double v = vv[k] + t * (vv[l] - vv[k]);
                v0 = Math.min(v0, v);
                v1 = Math.max(v1, v);
            }
        }
        lastLineSignature = 0;
        lastPieceSignature = 0;
        if (!(v1 > v0)) {
            return;
        }
        piece(u, v0, v1, lineTol / (v1 - v0), 0, out);
    }

    private final double[] nodeT = new double[24];
    private final long[] nodeSig = new long[24];

    /**
     * Adds the line piece [a, b] at u into out: the 8-point rule on it against the sum of the
     * rules on its halves (24 points, so that a feature narrower than the rule's spacing is seen
     * more often than by two rules on one piece), cut where the nodes' signatures change, halved
     * where whole and halves disagree.
     *
     * @param density the tolerance per length of line (m²/m): a piece's share is its length's
     */
    private void piece(double u, double a, double b, double density, int depth, double[] out) {
        double[] whole = new double[2];
        rule8(u, a, b, whole, 0);
        settle(u, a, b, whole, 8, density, depth, out);
    }

    /**
     * The piece [a, b] whose 8-point rule gave {@code whole}, its nodes' signatures in
     * [0, nodes) of the node arrays.
     */
    private void settle(double u, double a, double b, double[] whole, int nodes, double density, int depth, double[] out) {
        double mid = 0.5 * (a + b);
        double[] lo = new double[2], hi = new double[2];
        rule8(u, a, mid, lo, nodes);
        rule8(u, mid, b, hi, nodes + 8);
        if (depth < DEPTH && left > 0) {
            double cut = change(u, nodes + 16);
            if (!Double.isNaN(cut) && cut > a && cut < b) {
                piece(u, a, cut, density, depth + 1, out);
                piece(u, cut, b, density, depth + 1, out);
                return;
            }
        }
        double ev = Math.abs(whole[0] - lo[0] - hi[0]), eh = Math.abs(whole[1] - lo[1] - hi[1]);
        // not below the rounding of the point factors (~1e-13 of the piece's value)
        double floor = 1e-13 * (Math.abs(whole[0]) + Math.abs(whole[1]));
        if (Math.min(ev, eh) > Math.max(density * (b - a), floor) && depth < DEPTH && left > 0) {
            settle(u, a, mid, lo, 0, density, depth + 1, out);
            settle(u, mid, b, hi, 0, density, depth + 1, out);
            return;
        }
        out[0] += lo[0] + hi[0];
        out[1] += lo[1] + hi[1];
        out[2] += ev;
        out[3] += eh;
        long sig = nodeSig[nodes];
        if (sig != lastPieceSignature) {
            lastLineSignature = FacetTable.mix(lastLineSignature + sig);
            lastPieceSignature = sig;
        }
    }

    /** The mapped 8-point rule on [a, b] of the line u into r = {vis, hid}; nodes from index {@code at}. */
    private void rule8(double u, double a, double b, double[] r, int at) {
        for (int k = 0; k < X8.length; k++) {
            double s = X8[k];
            double t = a + (b - a) * (3 * s * s - 2 * s * s * s);
            double w = W8[k] * (b - a) * 6 * s * (1 - s);
            eval(u, t);
            r[0] += w * val[0];
            r[1] += w * Math.max(0, val[1] - val[0]);
            nodeT[at + k] = t;
            nodeSig[at + k] = g.signature();
        }
    }

    /**
     * The first place along the line where the nodes' signatures change, by bisection between
     * the two neighbouring nodes that disagree; NaN if all agree.
     */
    private double change(double u, int m) {
        // sort the nodes by position (insertion: at most 24 of them)
        for (int i = 1; i < m; i++) {
            double t = nodeT[i];
            long s = nodeSig[i];
            int j = i - 1;
            while (j >= 0 && nodeT[j] > t) {
                nodeT[j + 1] = nodeT[j];
                nodeSig[j + 1] = nodeSig[j];
                j--;
            }
            nodeT[j + 1] = t;
            nodeSig[j + 1] = s;
        }
        for (int i = 0; i + 1 < m; i++) {
            if (nodeSig[i] != nodeSig[i + 1]) {
                double lo = nodeT[i], hi = nodeT[i + 1];
                long sLo = nodeSig[i];
                for (int it = 0; it < BISECTIONS; it++) {
                    double mid = 0.5 * (lo + hi);
                    eval(u, mid);
                    if (g.signature() == sLo) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                return 0.5 * (lo + hi);
            }
        }
        return Double.NaN;
    }

    private void eval(double u, double v) {
        left--;
        g.at(ox + u * eu[0] + v * ev[0], oy + u * eu[1] + v * ev[1], oz + u * eu[2] + v * ev[2], val);
    }

    /** @return evaluations used by the last {@link #integrate} */
    long used() {
        return budget - left;
    }
}
