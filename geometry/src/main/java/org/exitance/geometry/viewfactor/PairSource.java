package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Scene;
import org.exitance.geometry.bvh.TriangleBvh;

/**
 * The per-pair view-factor machinery of a scene, prepared once and shared read-only by worker
 * threads: the facet table, the occluder structures (when obstruction is handled) and the
 * proximity rule. {@link ViewFactorCalculator} fills the dense matrix from it; the compressed
 * operator ({@code org.exitance.geometry.hierarchy}) samples single entries from it, so both
 * paths have the same per-pair accuracy and the same visibility handling.
 */
public final class PairSource {

    final FacetTable table;
    final TriangleBvh occluders;
    final CoplanarOccluders planes;
    final SilhouetteEdges edges;
    final ConvexOccluders convex;
    final ProximityRule rule;
    final ViewFactorOptions options;

    /**
     * @param scene geometry
     * @param options settings (pair tolerance, contour and visibility order, obstruction)
     */
    public PairSource(Scene scene, ViewFactorOptions options) {
        this.options = options;
        table = new FacetTable(scene, ProximityRule.MAX_ORDER);
        boolean[] candidates = options.obstruction() == Obstruction.AUTO ? Occluders.candidates(table) : null;
        occluders = candidates == null ? null : Occluders.build(table, candidates);
        planes = occluders == null ? null : new CoplanarOccluders(table, candidates);
        edges = planes == null ? null : new SilhouetteEdges(table, candidates, planes);
        convex = edges == null ? null : new ConvexOccluders(table, edges);
        rule = new ProximityRule(options.pairTolerance());
    }

    /** @return number of facets */
    public int count() {
        return table.count;
    }

    /** @return whether some facet may block a line of sight (the scene is not convex) */
    public boolean obstructed() {
        return occluders != null;
    }

    /**
     * Whether an occluder triangle may lie inside an axis-aligned box (touching its faces does
     * not count): false when nothing can block a line of sight inside it.
     *
     * @param lo box minimum x, y, z (m); not modified
     * @param hi box maximum x, y, z (m); not modified
     */
    public boolean mayBlockInside(double[] lo, double[] hi) {
        if (occluders == null) {
            return false;
        }
        double[] planes = new double[24];
        for (int k = 0; k < 3; k++) {
            planes[8 * k + k] = 1;
            planes[8 * k + 3] = hi[k];
            planes[8 * k + 4 + k] = -1;
            planes[8 * k + 7] = -lo[k];
        }
        return occluders.mayIntersect(planes, 6, 1e-9 * table.sceneSize, -1, -1);
    }

    /** @return exact area of facet i (m²) */
    public double area(int i) {
        return table.exactArea[i];
    }

    /** @return coordinate k (0..2) of facet i's centroid (m) */
    public double centroid(int i, int k) {
        return table.centroid[3 * i + k];
    }

    /** @return circumradius of facet i about its centroid, widened by its patch's sagitta (m) */
    public double radius(int i) {
        return table.radius[i] + table.sagitta[i];
    }

    /** @return whether facet i stands for an exact curved patch (then it is not flat) */
    public boolean curved(int i) {
        return table.patch[i] != null;
    }

    /** @return component k (0..2) of facet i's unit normal */
    public double normal(int i, int k) {
        return table.normal[3 * i + k];
    }

    /**
     * Bounding box of facet i's vertices, widened by its patch's sagitta (m).
     *
     * @param out receives lo x, y, z then hi x, y, z; modified
     */
    public void bounds(int i, double[] out) {
        double w = table.sagitta[i];
        for (int k = 0; k < 3; k++) {
            out[k] = Double.MAX_VALUE;
            out[k + 3] = -Double.MAX_VALUE;
        }
        for (int v = table.vertexStart[i]; v < table.vertexStart[i + 1]; v++) {
            for (int k = 0; k < 3; k++) {
                out[k] = Math.min(out[k], table.xyz[3 * v + k] - w);
                out[k + 3] = Math.max(out[k + 3], table.xyz[3 * v + k] + w);
            }
        }
    }

    /** @return the order-independent key of facet i (a mix of its coordinate bits) */
    public long key(int i) {
        return table.key[i];
    }

    /** @return the surface index of facet i */
    public int surfaceOf(int i) {
        return table.surfaceOf[i];
    }

    /** @return a new evaluator for one thread */
    public Pairs newPairs() {
        return new Pairs(new PairEvaluator(table, occluders, planes, edges, convex, rule, options.contourOrder(),
                options.visibilityOrder()));
    }

    /** One thread's evaluator of exchange areas (mutable scratch state; not thread-safe). */
    public final class Pairs {
        final PairEvaluator ev;

        Pairs(PairEvaluator ev) {
            this.ev = ev;
        }

        /**
         * @return A_i F_ij = A_j F_ji (m²), the same value for (i, j) and (j, i); for i = j the
         *         self exchange area of a concave patch, else 0
         * @throws ArithmeticException for a non-finite pair value (an internal error)
         */
        public double exchangeArea(int i, int j) {
            double s;
            if (i == j) {
                boolean concave = table.patch[i] != null && table.patch[i].concave();
                ev.lastError = 0;
                s = concave ? ev.selfExchangeArea(i) : 0;
            } else {
                s = ev.exchangeArea(i, j);
            }
            if (!Double.isFinite(s) || !Double.isFinite(ev.lastError)) {
                throw new ArithmeticException("non-finite exchange area between facets " + i + " and " + j
                        + " (internal error)");
            }
            return s;
        }

        /** @return error estimate of the last pair (m²) */
        public double lastError() {
            return ev.lastError;
        }

        /** @return the method counters (indices of {@link PairEvaluator}); live, not a copy */
        long[] counters() {
            return ev.counters;
        }
    }
}
