package org.exitance.geometry.viewfactor;

import org.exitance.geometry.bvh.TriangleBvh;

/**
 * Partly hidden pairs by shadow projection: the exchange area
 *
 * <pre>  A_p F_pq = ∫_p F_{dx→V(x)} dA_x </pre>
 *
 * where V(x) is the part of q seen from the point x (definition of the view factor with
 * obstruction, Siegel &amp; Howell, 4th ed., eq. 4.13 with the visibility function). For each
 * point x the receiver integral is exact: V(x) is q with the shadow of every occluder cut away,
 * and the factor from the differential element at x to each convex piece of V(x) is the
 * closed form for a polygon (Siegel &amp; Howell, 4th ed., §4.3, the contour form for a
 * differential area: F = (1/2π) Σ_k γ_k n_x·(a_k × a_{k+1}) / |a_k × a_{k+1}|, a_k the vectors
 * from x to the vertices, γ_k the angles between them). Only the emitter integral is numerical.
 *
 * <p>The part of q seen from a point is found by {@link VisiblePart}.
 *
 * <p>Emitter integral, adaptive. The integrand is smooth except across event lines
 * ({@link EventLines}), where a shadow edge passes a vertex and it has a kink. The emitter is
 * kept as up to {@value #MAX_LEAVES} pieces; the piece with the largest error estimate is refined
 * next: split along the event line that halves it most evenly if one crosses it, otherwise
 * integrated with a rule two orders higher (up to {@value #MAX_ORDER}; the integrand is analytic
 * there, so raising the order converges fastest; the new rule against the previous one is then
 * the estimate), and split across its long axis only after that. On each piece:
 * <ul>
 *   <li>no occluder in the hull of the piece and q: its exact unobstructed value;</li>
 *   <li>a convex closed occluder ({@link ConvexOccluders}) or a merged occluder face
 *       ({@link CoplanarOccluders}) covers a cross-section of the hull: exactly 0;</li>
 *   <li>otherwise Gauss rules of orders 2 and 3 ({@link AreaRules}); their difference is the
 *       error estimate where no event line crosses the piece (the integrand is analytic there);
 *       where one does, at least {@value #KINK_SHARE} of the piece's integral (more if the
 *       sampled visible fraction varies more) is counted as possible error, so such pieces are
 *       split along their events first.</li>
 * </ul>
 * The smaller of the visible and the hidden integral is integrated and the other taken from the
 * exact unobstructed value, so a pair that is almost entirely visible (or hidden) carries only
 * the error of its small part. Splitting stops when the estimates add up to the tolerance or the
 * pieces run out; the sum of the estimates is reported.
 *
 * <p>Limits: at most {@value VisiblePart#MAX_PIECES} visible pieces per point and the occluder count of
 * the caller; beyond that {@link #exchangeArea} returns NaN and the caller falls back to ray
 * sampling. Mutable scratch; one instance per thread.
 */
final class ShadowIntegral {

    /** Largest number of pieces of the emitter (leaves of the bisection). */
    static final int MAX_LEAVES = 128;
    /** First order of the emitter rule; the rule one order lower gives the error estimate. */
    static final int ORDER = 3;
    /** Highest order used on a leaf that no event line crosses (then it is split). */
    static final int MAX_ORDER = 9;
    /**
     * Smallest share of a leaf's integral counted as possible error while an event line crosses
     * the leaf (also when every sample saw the same visible fraction).
     */
    static final double KINK_SHARE = 1.0 / 16;

    /** Computes A_p' F_p'q of a piece p' of the emitter without obstruction (m²). */
    interface Unobstructed {
        double exchangeArea(Poly emitterPiece, Poly receiver);
    }

    private final FacetTable t;
    private final Poly[] leaves = new Poly[MAX_LEAVES];
    private final double[] error = new double[MAX_LEAVES];
    private final double[] value = new double[MAX_LEAVES];
    private final double[] ruleVisible = new double[MAX_LEAVES];
    private final double[] ruleHidden = new double[MAX_LEAVES];
    private final int[][] leafOccluders;
    private final int[] leafOccluderCount = new int[MAX_LEAVES];
    private final boolean[] hasEvent = new boolean[MAX_LEAVES];
    private final int[] order = new int[MAX_LEAVES];
    private final double[][] leafEvent = new double[MAX_LEAVES][4];
    private final EventLines events;
    private final Shaft shaft = new Shaft();
    private final Poly backup = new Poly();
    private Shaft rootShaft;
    private final TriangleBvh bvh;
    private final CoplanarOccluders.Prepared planes;
    private final ConvexOccluders.View convex;
    private final java.util.function.ObjIntConsumer<int[]> sortByKey;
    private Unobstructed unobstructed;
    private final double[] scratch = new double[3 * Poly.MAX_VERTICES];
    private final double[] rule = new double[Poly.RULE_SCRATCH];
    private final double[] axis = new double[3];
    private final int[] occluders;
    private final VisiblePart part;
    private int occluderCount;
    private boolean overflow;
    /** Error estimate of the last call (m²). */
    double lastError;
    /** Per call: the round body held exactly (null: none), and the shape error of bodies left on polygons. */
    private RoundOccluder body;
    private double polygonShapeError;
    private final BodyOccluders bodies;
    /** Whether the root leaf was integrated by {@link EmitterLines} (then it is not refined). */
    private boolean nested;
    private final EmitterLines lines = new EmitterLines();
    /** Most integrand evaluations of one pair's nested integral. */
    static final long NESTED_BUDGET = 400_000;

    /**
     * @param t the facets
     * @param bvh the occluders' triangles
     * @param planes merged coplanar occluder faces (proofs of hidden pieces)
     * @param convex convex closed occluders (proofs of hidden pieces)
     * @param events event lines of the emitter
     * @param closedSolids per facet: part of a closed solid (not modified; {@link SilhouetteEdges#closed})
     * @param maxOccluders most occluder facets in one hull (more: {@link #exchangeArea} fails)
     * @param sortByKey puts facet indices in an order that does not depend on the scene's order
     */
    ShadowIntegral(FacetTable t, TriangleBvh bvh, CoplanarOccluders.Prepared planes, ConvexOccluders.View convex,
            EventLines events, boolean[] closedSolids, int maxOccluders, java.util.function.ObjIntConsumer<int[]> sortByKey) {
        this.t = t;
        this.convex = convex;
        this.events = events;
        this.planes = planes;
        this.bvh = bvh;
        this.occluders = new int[maxOccluders];
        this.leafOccluders = new int[MAX_LEAVES][maxOccluders];
        this.sortByKey = sortByKey;
        this.part = new VisiblePart(t, closedSolids, planes.owner());
        this.bodies = new BodyOccluders(t, bvh, maxOccluders);
        for (int k = 0; k < leaves.length; k++) {
            leaves[k] = new Poly();
        }
    }

    /**
     * @param p emitter (not modified)
     * @param q receiver, entirely in front of p's plane and p in front of q's (not modified)
     * @param exact A_p F_pq without obstruction (m²)
     * @param unobstructedOfPiece the same for a piece of p
     * @param tolerance target absolute error (m²)
     * @param pairShaft the hull of p and q, already built (not modified)
     * @return A_p F_pq with obstruction (m²), or NaN if a point's visible part had more than
     *         {@value VisiblePart#MAX_PIECES} pieces (then use another method)
     */
    double exchangeArea(Poly p, Poly q, double exact, Unobstructed unobstructedOfPiece, double tolerance,
            Shaft pairShaft) {
        overflow = false;
        rootShaft = pairShaft;
        unobstructed = unobstructedOfPiece;
        leaves[0].copyFrom(p);
        order[0] = ORDER;
        int n = 1;
        nested = false;
        polygonShapeError = 0;
        pairTolerance = tolerance;
        evaluate(0, q, exact);
        while (!overflow && !nested) {
            double total = 0, worst = -1;
            int k = -1;
            for (int c = 0; c < n; c++) {
                total += error[c];
                if (error[c] > worst) {
                    worst = error[c];
                    k = c;
                }
            }
            if (total <= tolerance) {
                break;
            }
            if (!hasEvent[k] && order[k] + 2 <= MAX_ORDER) {
                // smooth on this leaf: a higher order converges fastest
                raise(k, q, n == 1 ? exact : Double.NaN);
                continue;
            }
            if (n + 1 > MAX_LEAVES) {
                break;
            }
            Poly leaf = leaves[k], other = leaves[n];
            other.copyFrom(leaf);
            backup.copyFrom(leaf);
            if (hasEvent[k]) {
                double[] e = leafEvent[k];
                leaf.clip(e[0], e[1], e[2], e[3], scratch);
                other.clip(-e[0], -e[1], -e[2], -e[3], scratch);
            } else {
                leaf.bisectLongAxis(other, axis, scratch);
            }
            if (leaf.n < 3 || other.n < 3) {
                // the cut left nothing on one side (rounding): undo it, refine otherwise next time
                leaf.copyFrom(backup);
                hasEvent[k] = false;
                continue;
            }
            order[k] = ORDER;
            order[n] = ORDER;
            evaluate(k, q, Double.NaN);
            evaluate(n, q, Double.NaN);
            n++;
        }
        if (overflow) {
            return Double.NaN;
        }
        double s = 0, err = 0;
        for (int c = 0; c < n; c++) {
            err += error[c];
            s += value[c];
        }
        // round bodies whose polygons stood in for them: the hidden part is off by up to twice
        // their relative shape error (the shadow's size scales with the outline's)
        lastError = err + 2 * polygonShapeError * Math.max(0, exact - s);
        return s;
    }

    private double pairTolerance;
    /** Value and estimate of the root leaf by {@link EmitterLines} with {@link #body} in the way. */
    private void nestedLeaf(int c, Poly q, double exact) {
        Poly p = leaves[c];
        EmitterLines.Integrand g = new EmitterLines.Integrand() {
            @Override
            public void at(double x, double y, double z, double[] out) {
                double total = PointFactor.toPolygon(x, y, z, p.nx, p.ny, p.nz, q);
                double seen = part.factor(x, y, z, p, q, occluders, occluderCount, body);
                if (Double.isNaN(seen)) {
                    overflow = true;
                    seen = 0;
                }
                out[0] = Math.min(seen, total);
                out[1] = total;
            }

            @Override
            public long signature() {
                return part.signature();
            }
        };
        double[] r = lines.integrate(p, g, pairTolerance, NESTED_BUDGET);
        double vis = r[0], hid = r[1];
        if (hid < vis) {
            value[c] = Math.max(0, exact - hid);
            error[c] = lines.errorHidden;
        } else {
            value[c] = vis;
            error[c] = lines.errorVisible;
        }
        hasEvent[c] = false;
        nested = true;
    }

    /**
     * Sets the value and error estimate of leaf c (at its current order): exact when no occluder
     * is in the hull of the leaf and q, 0 when a merged face proves it hidden, otherwise the
     * Gauss rule of the leaf's order, with the rule one order lower for the estimate and the
     * event-line penalty described in the class comment. Also finds the leaf's best event line.
     */
    private void evaluate(int c, Poly q, double exact) {
        Poly p = leaves[c];
        Shaft hull = shaft;
        if (rootShaft != null) {
            hull = rootShaft; // the first leaf is the whole emitter: the pair's hull, already built
            rootShaft = null;
        } else {
            shaft.build(p, q);
        }
        int count = bvh.collect(hull.planes, hull.count, hull.tolerance, p.facet, q.facet, occluders);
        if (count < 0) {
            overflow = true;
            return;
        }
        count = bodies.addFacets(hull, p, q, occluders, count);
        if (count < 0) {
            overflow = true;
            return;
        }
        sortByKey.accept(occluders, count);
        occluderCount = count;
        if (count > 0 && (convex.hides(p, q, occluders, count) || planes.hides(p, q, occluders, count))) {
            value[c] = 0;
            error[c] = 0;
            hasEvent[c] = false;
            leafOccluderCount[c] = count;
            return;
        }
        if (c == 0) {
            count = bodies.separate(p, q, occluders, count);
            body = bodies.body;
            polygonShapeError = Math.max(polygonShapeError, bodies.shapeError);
            occluderCount = count;
            if (body != null) {
                nestedLeaf(c, q, Double.isNaN(exact) ? unobstructed.exchangeArea(p, q) : exact);
                return;
            }
        }
        System.arraycopy(occluders, 0, leafOccluders[c], 0, count);
        leafOccluderCount[c] = count;
        if (count == 0) {
            value[c] = Double.isNaN(exact) ? unobstructed.exchangeArea(p, q) : exact;
            error[c] = 0;
            hasEvent[c] = false;
            return;
        }
        minFraction = 1;
        maxFraction = 0;
        double[] low = integrals(p, q, order[c] - 1);
        double vis2 = low[0], hid2 = low[1];
        double[] high = integrals(p, q, order[c]);
        double vis = high[0], hid = high[1];
        hasEvent[c] = events.best(p, q, occluders, count, leafEvent[c]) > 0;
        double penalty = 0;
        if (hasEvent[c]) {
            for (int k = 0; k < p.n; k++) {
                // vertices, moved a thousandth of the way to the centroid (a vertex may lie on q's edge)
                double x = p.xyz[3 * k] + 1e-3 * (p.cx - p.xyz[3 * k]);
                double y = p.xyz[3 * k + 1] + 1e-3 * (p.cy - p.xyz[3 * k + 1]);
                double z = p.xyz[3 * k + 2] + 1e-3 * (p.cz - p.xyz[3 * k + 2]);
                sample(x, y, z, p, q);
            }
            // the integrand has a kink inside: the rules' difference does not bound the error
            penalty = Math.max(maxFraction - minFraction, KINK_SHARE) * (vis + hid);
        }
        settle(c, q, exact, vis, hid, vis2, hid2, penalty);
    }

    /**
     * Raises the order of leaf c (no event line crosses it) by two; the new rule against the
     * previous one gives the estimate. The leaf's occluders are those found when it was made.
     */
    private void raise(int c, Poly q, double exact) {
        order[c] += 2;
        occluderCount = leafOccluderCount[c];
        System.arraycopy(leafOccluders[c], 0, occluders, 0, occluderCount);
        double prevVis = ruleVisible[c], prevHid = ruleHidden[c];
        double[] high = integrals(leaves[c], q, order[c]);
        settle(c, q, exact, high[0], high[1], prevVis, prevHid, 0);
    }

    /** Sets value and error of leaf c from its rule (vis, hid) and a lower rule (vis2, hid2). */
    private void settle(int c, Poly q, double exact, double vis, double hid, double vis2, double hid2, double penalty) {
        ruleVisible[c] = vis;
        ruleHidden[c] = hid;
        double rule;
        if (hid < vis) {
            double unob = Double.isNaN(exact) ? unobstructed.exchangeArea(leaves[c], q) : exact;
            value[c] = Math.max(0, unob - hid);
            rule = Math.abs(hid2 - hid);
        } else {
            value[c] = vis;
            rule = Math.abs(vis2 - vis);
        }
        error[c] = rule + penalty;
    }

    /** @return the visible fraction at a point; updates the leaf's range of fractions */
    private double sample(double x, double y, double z, Poly p, Poly q) {
        double total = PointFactor.toPolygon(x, y, z, p.nx, p.ny, p.nz, q);
        double seen = part.factor(x, y, z, p, q, occluders, occluderCount);
        if (Double.isNaN(seen)) {
            overflow = true;
            seen = 0;
        }
        double f = total > 0 ? Math.min(1, seen / total) : 1;
        minFraction = Math.min(minFraction, f);
        maxFraction = Math.max(maxFraction, f);
        lastTotal = total;
        return f;
    }

    private double minFraction, maxFraction, lastTotal;
    private final double[] result = new double[2];

    /** @return {∫ F_{dx→V}, ∫ F_{dx→q∖V}} over p with the order-m Gauss rule (m²); shared array */
    private double[] integrals(Poly p, Poly q, int m) {
        int np = AreaRules.build(p, m, rule, 0);
        double vis = 0, all = 0;
        for (int a = 0; a < np && !overflow; a++) {
            double w = rule[4 * a + 3];
            double f = sample(rule[4 * a], rule[4 * a + 1], rule[4 * a + 2], p, q);
            all += w * lastTotal;
            vis += w * lastTotal * f;
        }
        result[0] = vis;
        result[1] = Math.max(0, all - vis);
        return result;
    }

}
