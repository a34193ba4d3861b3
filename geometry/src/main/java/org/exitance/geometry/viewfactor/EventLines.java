package org.exitance.geometry.viewfactor;

/**
 * The lines on an emitter piece across which the visible part of a receiver changes its
 * structure, so that the point-to-visible-part factor has a kink there (the critical lines of
 * discontinuity meshing: Heckbert, "Discontinuity meshing for radiosity", Eurographics Workshop
 * on Rendering 1992; Lischinski, Tampieri &amp; Greenberg, IEEE CG&amp;A 12(6), 1992). For a
 * receiver q and occluder facets they lie in
 * <ul>
 *   <li>the plane of an occluder face (where that face turns from front to back),</li>
 *   <li>the plane through a vertex of q and an edge of an occluder (a shadow edge passes the
 *       vertex),</li>
 *   <li>the plane through a corner of an occluder and an edge of q.</li>
 * </ul>
 * Only edges and corners that can bound a shadow count ({@link SilhouetteEdges}). Events between
 * two occluders (a corner of one and an edge of another, or three edges) are not listed; where
 * they matter the error estimate of the quadrature has to find them. Mutable; one per thread.
 */
final class EventLines {

    /** Smallest share of a piece's extent that a cut may leave on one side. */
    static final double MIN_BALANCE = 1e-3;

    private final FacetTable t;
    private final SilhouetteEdges edges;
    private final CoplanarOccluders groups;
    private final int[] seen;
    private int stamp;
    private final double[] candidate = new double[4];
    /** The region of the candidate's plane where its event is real: apex + αA + βB. */
    private final double[] apex = new double[3], dirA = new double[3], dirB = new double[3];
    private boolean hasWedge, sumAtLeastOne;
    // scratch of realOnLeaf: where the plane crosses the leaf, their wedge coordinates, the λ range
    private final double[] crossX = new double[2], crossY = new double[2], crossZ = new double[2];
    private final double[] alpha = new double[2], beta = new double[2], interval = new double[2];

    EventLines(FacetTable t, SilhouetteEdges edges, CoplanarOccluders groups) {
        this.t = t;
        this.edges = edges;
        this.groups = groups;
        this.seen = new int[groups.groups()];
    }

    /**
     * @param leaf emitter piece (not modified)
     * @param q receiver (not modified)
     * @param occ occluder facets in the hull of leaf and q (not modified)
     * @param count entries of occ used
     * @param out receives the plane (m, d) of the cut that splits leaf most evenly (modified)
     * @return that cut's balance (smaller side's share of the extent), or 0 if no event line
     *         crosses the leaf
     */
    double best(Poly leaf, Poly q, int[] occ, int count, double[] out) {
        stamp++;
        double best = 0;
        for (int k = 0; k < count; k++) {
            int f = occ[k], v0 = t.vertexStart[f], n = t.vertexStart[f + 1] - v0;
            int g = groups.group(f);
            if (g >= 0 && seen[g] != stamp) {
                seen[g] = stamp;
                double[] pl = groups.plane(g);
                hasWedge = false;
                best = consider(leaf, pl[0], pl[1], pl[2], pl[3], best, out);
            }
            for (int e = 0; e < n; e++) {
                int a = v0 + e, b = v0 + (e + 1) % n;
                if (edges.realEdge[a] && silhouetteOnLeaf(leaf, f, edges.neighbour[a])) {
                    for (int v = 0; v < q.n; v++) {
                        if (plane(q.xyz, 3 * v, t.xyz, 3 * a, t.xyz, 3 * b)) {
                            // a shadow edge passes q's vertex where the line from it through
                            // the point crosses the occluder edge: x − v = αA + βB, α, β ≥ 0, α + β ≥ 1
                            wedge(t.xyz, 3 * a, q.xyz, 3 * v, t.xyz, 3 * b, q.xyz, 3 * v, q.xyz, 3 * v, true);
                            best = consider(leaf, candidate[0], candidate[1], candidate[2], candidate[3], best, out);
                        }
                    }
                }
                if (edges.realVertex[a]) {
                    for (int w = 0; w < q.n; w++) {
                        int w1 = (w + 1) % q.n;
                        if (plane(t.xyz, 3 * a, q.xyz, 3 * w, q.xyz, 3 * w1)) {
                            // the shadow of the corner crosses q's edge where the line from the
                            // edge through the corner reaches the point: x − c = αA + βB, α, β ≥ 0
                            wedge(t.xyz, 3 * a, q.xyz, 3 * w, t.xyz, 3 * a, q.xyz, 3 * w1, t.xyz, 3 * a, false);
                            best = consider(leaf, candidate[0], candidate[1], candidate[2], candidate[3], best, out);
                        }
                    }
                }
            }
        }
        return best;
    }

    /**
     * Can the edge between facets f and g (g = −1: an open edge) bound a shadow seen from some
     * point of the leaf? An edge between two facets bounds one only where one of them faces the
     * point and the other does not; if both planes leave the whole leaf on the same side (both
     * facing it, or both turned away), it cannot, anywhere on the leaf.
     */
    private boolean silhouetteOnLeaf(Poly leaf, int f, int g) {
        if (g < 0) {
            return true;
        }
        int sf = sideOf(leaf, f), sg = sideOf(leaf, g);
        return sf == 0 || sg == 0 || sf != sg;
    }

    /** @return +1 leaf in front of facet f's plane, −1 behind, 0 both */
    private int sideOf(Poly leaf, int f) {
        double nx = t.normal[3 * f], ny = t.normal[3 * f + 1], nz = t.normal[3 * f + 2];
        double d = nx * t.centroid[3 * f] + ny * t.centroid[3 * f + 1] + nz * t.centroid[3 * f + 2];
        boolean front = false, back = false;
        for (int k = 0; k < leaf.n; k++) {
            double s = nx * leaf.xyz[3 * k] + ny * leaf.xyz[3 * k + 1] + nz * leaf.xyz[3 * k + 2] - d;
            front |= s > 0;
            back |= s < 0;
        }
        return front && back ? 0 : (front ? 1 : -1);
    }

    /** Plane through point (ps, pi) and segment (as, ai)–(bs, bi) into {@link #candidate}; false if degenerate. */
    private boolean plane(double[] ps, int pi, double[] as, int ai, double[] bs, int bi) {
        double ux = as[ai] - ps[pi], uy = as[ai + 1] - ps[pi + 1], uz = as[ai + 2] - ps[pi + 2];
        double wx = bs[bi] - ps[pi], wy = bs[bi + 1] - ps[pi + 1], wz = bs[bi + 2] - ps[pi + 2];
        double mx = uy * wz - uz * wy, my = uz * wx - ux * wz, mz = ux * wy - uy * wx;
        double len = Math.sqrt(mx * mx + my * my + mz * mz);
        if (!(len > 1e-12 * (ux * ux + uy * uy + uz * uz + wx * wx + wy * wy + wz * wz))) {
            return false;
        }
        candidate[0] = mx / len;
        candidate[1] = my / len;
        candidate[2] = mz / len;
        candidate[3] = candidate[0] * ps[pi] + candidate[1] * ps[pi + 1] + candidate[2] * ps[pi + 2];
        return true;
    }

    /**
     * Sets the wedge of the next candidate: apex at (ps, pi), directions A = a1 − a0 and
     * B = b1 − b0 (points given as array and offset); {@code sum}: also α + β ≥ 1.
     */
    private void wedge(double[] a1s, int a1, double[] a0s, int a0, double[] b1s, int b1, double[] b0s, int b0,
            double[] ps, int pi, boolean sum) {
        for (int k = 0; k < 3; k++) {
            dirA[k] = a1s[a1 + k] - a0s[a0 + k];
            dirB[k] = b1s[b1 + k] - b0s[b0 + k];
            apex[k] = ps[pi + k];
        }
        hasWedge = true;
        sumAtLeastOne = sum;
    }

    /**
     * @return whether the line where the candidate plane meets the leaf passes through the
     *         candidate's wedge (where the event is real); true without a wedge
     */
    private boolean realOnLeaf(Poly leaf, double mx, double my, double mz, double d) {
        if (!hasWedge) {
            return true;
        }
        int found = 0;
        double[] sx = crossX, sy = crossY, sz = crossZ;
        for (int k = 0; k < leaf.n && found < 2; k++) {
            int l = (k + 1) % leaf.n;
            double a = mx * leaf.xyz[3 * k] + my * leaf.xyz[3 * k + 1] + mz * leaf.xyz[3 * k + 2] - d;
            double b = mx * leaf.xyz[3 * l] + my * leaf.xyz[3 * l + 1] + mz * leaf.xyz[3 * l + 2] - d;
            if ((a < 0 && b >= 0) || (a >= 0 && b < 0)) {
                double u = a / (a - b);
                sx[found] = leaf.xyz[3 * k] + u * (leaf.xyz[3 * l] - leaf.xyz[3 * k]);
                sy[found] = leaf.xyz[3 * k + 1] + u * (leaf.xyz[3 * l + 1] - leaf.xyz[3 * k + 1]);
                sz[found] = leaf.xyz[3 * k + 2] + u * (leaf.xyz[3 * l + 2] - leaf.xyz[3 * k + 2]);
                found++;
            }
        }
        if (found < 2) {
            return true;
        }
        double aa = dot(dirA, dirA), ab = dot(dirA, dirB), bb = dot(dirB, dirB);
        double det = aa * bb - ab * ab;
        if (!(det > 1e-24 * aa * bb)) {
            return true;
        }
        double[] al = alpha, be = beta;
        for (int k = 0; k < 2; k++) {
            double rx = sx[k] - apex[0], ry = sy[k] - apex[1], rz = sz[k] - apex[2];
            double ra = rx * dirA[0] + ry * dirA[1] + rz * dirA[2], rb = rx * dirB[0] + ry * dirB[1] + rz * dirB[2];
            al[k] = (bb * ra - ab * rb) / det;
            be[k] = (aa * rb - ab * ra) / det;
        }
        double tol = 1e-9;
        double[] lohi = interval;
        lohi[0] = 0;
        lohi[1] = 1;
        limit(lohi, al[0] + tol, al[1] - al[0]);
        limit(lohi, be[0] + tol, be[1] - be[0]);
        if (sumAtLeastOne) {
            limit(lohi, al[0] + be[0] - 1 + tol, al[1] + be[1] - al[0] - be[0]);
        }
        return lohi[0] <= lohi[1];
    }

    /** Narrows [lohi[0], lohi[1]] to where c0 + c1 λ ≥ 0. Modifies lohi. */
    private static void limit(double[] lohi, double c0, double c1) {
        if (c1 > 0) {
            lohi[0] = Math.max(lohi[0], -c0 / c1);
        } else if (c1 < 0) {
            lohi[1] = Math.min(lohi[1], -c0 / c1);
        } else if (c0 < 0) {
            lohi[0] = 1;
            lohi[1] = 0;
        }
    }

    private static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    private double consider(Poly leaf, double mx, double my, double mz, double d, double best, double[] out) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < leaf.n; k++) {
            double s = mx * leaf.xyz[3 * k] + my * leaf.xyz[3 * k + 1] + mz * leaf.xyz[3 * k + 2] - d;
            lo = Math.min(lo, s);
            hi = Math.max(hi, s);
        }
        if (!(lo < 0 && hi > 0)) {
            return best;
        }
        double balance = Math.min(-lo, hi) / (hi - lo);
        if (balance < MIN_BALANCE || balance <= best || !realOnLeaf(leaf, mx, my, mz, d)) {
            return best;
        }
        out[0] = mx;
        out[1] = my;
        out[2] = mz;
        out[3] = d;
        return balance;
    }
}
