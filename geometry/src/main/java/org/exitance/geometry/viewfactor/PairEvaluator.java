package org.exitance.geometry.viewfactor;

import org.exitance.geometry.bvh.TriangleBvh;

/**
 * Computes the exchange area A_i F_ij of one facet pair, choosing the method per pair:
 * <ol>
 *   <li>each facet entirely behind or on the other's plane (back-facing, coplanar): 0;</li>
 *   <li>partly behind: both polygons clipped to the half-space in front of the other
 *       (exact: the kernel is zero behind a plane);</li>
 *   <li>with obstruction possible: the hull of the two polygons ({@link Shaft}) is tested
 *       against the occluders' BVH; no occluder inside → unobstructed; otherwise
 *       {@link VisibilityQuadrature} (0 if every ray is blocked: "hidden");</li>
 *   <li>unobstructed: {@link ProximityRule} picks {@link ContourIntegral} (near) or
 *       {@link AreaQuadrature} of a given order (far).</li>
 * </ol>
 * Mutable scratch state; one instance per thread. The result of a pair depends only on the two
 * facets' coordinates and the options: never on the thread, on other pairs, or on the facets'
 * positions in the scene (the roles of the two facets and the random seed come from
 * {@link FacetTable#key}).
 */
final class PairEvaluator {

    static final int ZERO = 0, CLIPPED = 1, CONTOUR = 2, QUADRATURE = 3, PARTIAL = 4, HIDDEN = 5, RAYS = 6;
    static final int CURVED_ON_POLYGONS = 7, CURVED_EXACT = 8;
    static final int COUNTERS = 9;
    /** Most occluder facets in one pair's hull handled by shadow projection (more: rays). */
    static final int MAX_OCCLUDERS = 256;


    private final FacetTable t;
    private final TriangleBvh occluders;
    private final ProximityRule rule;
    private final int contourOrder;
    private final int visibilityOrder;
    private final ContourIntegral contour = new ContourIntegral();
    private final AreaQuadrature quadrature;
    private final VisibilityQuadrature visibility;
    private final ShadowIntegral shadow;
    /**
     * Target error of a partly hidden pair relative to its unobstructed exchange area: 100 ×
     * the pair tolerance, at most 1e-2 (1e-5 by default). The estimate is a bound-like sum
     * over the pair's emitter pieces; measured errors are far smaller (docs/view-factors.md).
     */
    private final double visibilityTolerance;
    private final SplitPairs split;
    private final double contourTolerance;
    private final Shaft shaft = new Shaft();
    /** Pairs with an exact curved side, or null for a scene of plain polygons. */
    private final CurvedPairs curved;
    private final int[] owners = new int[MAX_OCCLUDERS];
    /** Facets found by the last {@link #blocked} that may block the pair ([0, blockers) of {@link #owners}; −1: too many). */
    private int blockers;
    private final CoaxialPairs coaxial = new CoaxialPairs();
    private final Poly p = new Poly();
    private final Poly q = new Poly();
    private final double[] scratch = new double[3 * Poly.MAX_VERTICES];
    final long[] counters = new long[COUNTERS];
    /** Error estimate of the last pair (m²). */
    double lastError;

    PairEvaluator(FacetTable t, TriangleBvh occluders, CoplanarOccluders planes, SilhouetteEdges edges,
            ConvexOccluders convex, ProximityRule rule, int contourOrder, int visibilityOrder) {
        this.t = t;
        this.occluders = occluders;
        this.rule = rule;
        this.contourOrder = contourOrder;
        this.visibilityOrder = visibilityOrder;
        this.quadrature = new AreaQuadrature(t);
        this.contourTolerance = 0.1 * rule.tolerance();
        this.split = new SplitPairs(contour, quadrature, rule, contourOrder);
        this.visibility = occluders == null ? null : new VisibilityQuadrature(t, occluders);
        this.shadow = occluders == null ? null : new ShadowIntegral(t, occluders, planes.prepared(), convex.view(),
                new EventLines(t, edges, planes), edges.closed, MAX_OCCLUDERS, this::sortByKey);
        this.visibilityTolerance = Math.min(1e-2, 100 * rule.tolerance());
        this.curved = t.curved ? new CurvedPairs(t, 0.1 * rule.tolerance(), rule) : null;
    }

    /**
     * @param i a facet whose patch is concave (it sees itself)
     * @return A_i F_ii over the exact patch (m²); sets {@link #lastError}
     */
    double selfExchangeArea(int i) {
        p.load(t, i);
        q.load(t, i);
        lastError = 0;
        int coverage = blocked(i, i) ? coaxialCoverage(i, i) : CoaxialPairs.SEEN;
        if (coverage == CoaxialPairs.PARTIAL) {
            return coaxialPair(i, i);
        }
        if (coverage == CoaxialPairs.HIDDEN) {
            counters[CURVED_EXACT]++;
            counters[HIDDEN]++;
            lastError = 0;
            return 0;
        }
        double s = curved.exchangeArea(i, p, i, q);
        lastError = curved.lastError;
        if (Double.isNaN(s)) {
            // the contour integral ran out of its budget (a degenerate shape): the flat facet's 0,
            // and an error as large as the exchange area can be, so the tolerance is not met
            counters[CURVED_ON_POLYGONS]++;
            lastError = t.exactArea[i];
            return 0;
        }
        if (coverage < 0) {
            // something inside the patch's own solid may hide part of it from itself: anything
            // between 0 and the unobstructed value, said so in the estimate
            counters[CURVED_ON_POLYGONS]++;
            lastError += 0.5 * s;
            return 0.5 * s;
        }
        counters[CURVED_EXACT]++;
        return s;
    }

    /**
     * A pair with an exact curved side: 0 when one is behind the other, the contour integral over
     * the exact boundaries when each sees all of the other with nothing in the way, else NaN
     * (the polygon methods then take it, see {@link #polygonFallback}); NaN too when that contour
     * integral runs out of its budget (a degenerate shape).
     */
    private double curvedPair(int i, int j) {
        p.load(t, i);
        q.load(t, j);
        int kind = curved.classify(i, p, j, q);
        if (kind == CurvedPairs.ZERO) {
            counters[ZERO]++;
            counters[CURVED_EXACT]++;
            return 0;
        }
        int coverage = blocked(i, j) ? coaxialCoverage(i, j) : CoaxialPairs.SEEN;
        if (coverage < 0) {
            return Double.NaN;
        }
        if (coverage == CoaxialPairs.HIDDEN) {
            counters[HIDDEN]++;
            counters[CURVED_EXACT]++;
            return 0;
        }
        if (coverage == CoaxialPairs.PARTIAL) {
            return coaxialPair(i, j);
        }
        if (kind == CurvedPairs.PARTIAL) {
            counters[QUADRATURE]++;
            counters[CURVED_EXACT]++;
            double s = curved.partialExchangeArea(i, p, j, q);
            lastError = curved.lastError;
            return s;
        }
        double s = curved.exchangeArea(i, p, j, q);
        if (Double.isNaN(s)) {
            return s; // the contour integral's budget ran out: the polygons take the pair
        }
        counters[CONTOUR]++;
        counters[CURVED_EXACT]++;
        lastError = curved.lastError;
        return s;
    }

    /**
     * Whether an occluder may block the exact pair (p, q loaded): the hull of the two polygons,
     * widened by both patches' sagittas and the largest sagitta of any facet (an exact occluder
     * lies within that of its polygon), holds a facet that does not bound a region containing
     * both.
     */
    private boolean blocked(int i, int j) {
        if (occluders == null) {
            return false;
        }
        shaft.build(p, q);
        // widened (a negative tolerance: a facet counts unless it is that far outside a plane) by
        // both patches' sagittas and by the most an exact occluder bulges out of its polygon
        int found = occluders.collect(shaft.planes, shaft.count,
                shaft.tolerance - (t.sagitta[i] + t.sagitta[j] + t.maxSagitta), i, j, owners);
        blockers = found;
        if (found < 0) {
            return true;
        }
        blockers = 0;
        for (int k = 0; k < found; k++) {
            if (!curved.cannotBlock(owners[k], i, p, j, q)) {
                owners[blockers++] = owners[k];
            }
        }
        return blockers > 0;
    }

    /**
     * A pair of exact patches of revolution blocked only by round solids on their axis that span
     * its heights, after {@link #blocked} found the blockers: prepares {@link #coaxial} and returns
     * its {@link CoaxialPairs#coverage}, or −1 when it is not such a pair (the polygon methods
     * then take it).
     */
    private int coaxialCoverage(int i, int j) {
        return blockers <= 0 ? -1 : coaxial.coverage(t, i, j, owners, blockers);
    }

    /** A_i F_ij of a PARTIAL coaxial pair (prepared by {@link #coaxialCoverage}); sets {@link #lastError}. */
    private double coaxialPair(int i, int j) {
        double v = coaxial.exchangeArea(curved.relativeTolerance() * Math.min(t.exactArea[i], t.exactArea[j]));
        lastError = coaxial.lastError;
        counters[CURVED_EXACT]++;
        counters[v == 0 ? HIDDEN : PARTIAL]++;
        return v;
    }

    /**
     * A curved pair the exact methods do not take: the polygon methods on the two polygons, scaled
     * to the exact areas (√ of both ratios, which keeps reciprocity). The polygons' shape error
     * enters the estimate: the exchange area times the larger relative area difference, twice.
     *
     * @param s the polygons' exchange area (m²)
     */
    private double polygonFallback(int i, int j, double s) {
        counters[CURVED_ON_POLYGONS]++;
        double ri = t.exactArea[i] / t.area[i], rj = t.exactArea[j] / t.area[j];
        double scaled = s * Math.sqrt(ri * rj);
        lastError += 2 * scaled * Math.max(Math.abs(1 - ri), Math.abs(1 - rj));
        return scaled;
    }

    /**
     * @param i first facet
     * @param j second facet
     * @return A_i F_ij (m²); also sets {@link #lastError} and increments a counter
     */
    double exchangeArea(int i, int j) {
        if (t.key[i] > t.key[j] || (t.key[i] == t.key[j] && i > j)) {
            int swap = i;
            i = j;
            j = swap;
        }
        lastError = 0;
        boolean exact = curved != null && curved.involved(i, j);
        if (exact) {
            double v = curvedPair(i, j);
            if (!Double.isNaN(v)) {
                return v;
            }
            double s = polygons(i, j);
            return polygonFallback(i, j, s);
        }
        return polygons(i, j);
    }

    /** A_i F_ij of two polygon facets (the methods of the class doc); sets {@link #lastError}. */
    private double polygons(int i, int j) {
        double tol = 1e-9 * (t.radius[i] + t.radius[j]);
        int sideJ = side(i, j, tol);
        int sideI = side(j, i, tol);
        if (sideJ <= 0 || sideI <= 0) {
            counters[ZERO]++;
            return 0;
        }
        p.load(t, i);
        q.load(t, j);
        if (sideJ == 2 || sideI == 2) {
            counters[CLIPPED]++;
            if (sideJ == 2) {
                q.clip(p.nx, p.ny, p.nz, p.nx * p.cx + p.ny * p.cy + p.nz * p.cz, scratch);
            }
            if (q.n >= 3 && q.area > 1e-14 * t.area[j]) {
                // clip p to the front of q's (unchanged) plane
                double qd = t.normal[3 * j] * t.centroid[3 * j] + t.normal[3 * j + 1] * t.centroid[3 * j + 1]
                        + t.normal[3 * j + 2] * t.centroid[3 * j + 2];
                if (sideI == 2) {
                    p.clip(q.nx, q.ny, q.nz, qd, scratch);
                }
            }
            if (q.n < 3 || p.n < 3 || q.area <= 1e-14 * t.area[j] || p.area <= 1e-14 * t.area[i]) {
                counters[ZERO]++;
                return 0;
            }
        }
        double r = Math.sqrt(sq(p.cx - q.cx) + sq(p.cy - q.cy) + sq(p.cz - q.cz));
        double rho = r / (p.radius + q.radius);
        int order = rule.order(rho);
        boolean blocked = false;
        if (occluders != null && occluders.overlapsBounds(p.xyz, p.n, q.xyz, q.n)) {
            shaft.build(p, q);
            // widened where round bodies may bulge out of their polygons into the hull
            blocked = occluders.mayIntersect(shaft.planes, shaft.count, shaft.tolerance - t.bodyBulge, i, j);
        }
        double s;
        if (order == 0) {
            s = split.exchangeArea(p, q, contourTolerance);
            lastError = split.lastError;
        } else {
            s = quadrature.exchangeArea(p, q, order);
            lastError = rule.bound(rho) * p.area * q.area / (Math.PI * r * r);
        }
        if (!blocked) {
            counters[order == 0 ? CONTOUR : QUADRATURE]++;
            return s;
        }
        double v = shadow.exchangeArea(p, q, s, this::unobstructed, visibilityTolerance * s, shaft);
        if (!Double.isNaN(v)) {
            lastError += shadow.lastError;
        } else {
            // more occluders in the hull, or more visible pieces, than shadow projection handles
            counters[RAYS]++;
            long seed = FacetTable.mix(t.key[i] ^ Long.rotateLeft(t.key[j], 17));
            v = visibility.exchangeArea(p, q, rho < 3 ? visibilityOrder + 1 : visibilityOrder, s, seed);
            lastError += visibility.lastStandardError;
        }
        if (v == 0) {
            counters[HIDDEN]++;
        } else {
            counters[PARTIAL]++;
        }
        return v;
    }

    /**
     * Orders facets by their order-independent key (index on ties), so the shadows are cut in an
     * order that does not depend on the scene's facet order. Modifies {@code f[0, n)}.
     */
    private void sortByKey(int[] f, int n) {
        for (int a = 1; a < n; a++) {
            int v = f[a];
            int b = a - 1;
            while (b >= 0 && (t.key[f[b]] > t.key[v] || (t.key[f[b]] == t.key[v] && f[b] > v))) {
                f[b + 1] = f[b];
                b--;
            }
            f[b + 1] = v;
        }
    }

    /** @return A_a F_ab without obstruction, by the method the proximity rule picks (m²) */
    private double unobstructed(Poly a, Poly b) {
        double r = Math.sqrt(sq(a.cx - b.cx) + sq(a.cy - b.cy) + sq(a.cz - b.cz));
        int order = rule.order(r / (a.radius + b.radius));
        return order == 0 ? split.exchangeArea(a, b, contourTolerance) : quadrature.exchangeArea(a, b, order);
    }

    private static double sq(double v) {
        return v * v;
    }

    /**
     * Where facet b lies relative to the plane of facet a: 0 on or behind, 1 in front (on allowed),
     * 2 straddling.
     */
    private int side(int a, int b, double tol) {
        double nx = t.normal[3 * a], ny = t.normal[3 * a + 1], nz = t.normal[3 * a + 2];
        double d = nx * t.centroid[3 * a] + ny * t.centroid[3 * a + 1] + nz * t.centroid[3 * a + 2];
        boolean front = false, behind = false;
        for (int v = t.vertexStart[b], end = t.vertexStart[b + 1]; v < end; v++) {
            double s = nx * t.xyz[3 * v] + ny * t.xyz[3 * v + 1] + nz * t.xyz[3 * v + 2] - d;
            if (s > tol) {
                front = true;
            } else if (s < -tol) {
                behind = true;
            }
        }
        return !front ? 0 : (behind ? 2 : 1);
    }
}
