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
                best = consider(leaf, pl[0], pl[1], pl[2], pl[3], best, out);
            }
            for (int e = 0; e < n; e++) {
                int a = v0 + e, b = v0 + (e + 1) % n;
                if (edges.realEdge[a]) {
                    for (int v = 0; v < q.n; v++) {
                        if (plane(q.xyz, 3 * v, t.xyz, 3 * a, t.xyz, 3 * b)) {
                            best = consider(leaf, candidate[0], candidate[1], candidate[2], candidate[3], best, out);
                        }
                    }
                }
                if (edges.realVertex[a]) {
                    for (int w = 0; w < q.n; w++) {
                        if (plane(t.xyz, 3 * a, q.xyz, 3 * w, q.xyz, 3 * ((w + 1) % q.n))) {
                            best = consider(leaf, candidate[0], candidate[1], candidate[2], candidate[3], best, out);
                        }
                    }
                }
            }
        }
        return best;
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

    private static double consider(Poly leaf, double mx, double my, double mz, double d, double best, double[] out) {
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
        if (balance < MIN_BALANCE || balance <= best) {
            return best;
        }
        out[0] = mx;
        out[1] = my;
        out[2] = mz;
        out[3] = d;
        return balance;
    }
}
