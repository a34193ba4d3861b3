package org.exitance.geometry.viewfactor;

/**
 * Unobstructed pairs whose contour integral is ill-conditioned: the edge terms are of the order
 * of R² ln R while the result is much smaller (a thin strip seen edge-on from afar, a very
 * small facet near a large one), so rounding in the double contour sum exceeds the tolerance.
 * The larger polygon is bisected by the plane through its centroid perpendicular to its long
 * axis, recursively, and each sub-pair is evaluated with the method its own proximity calls for
 * (area quadrature when far, the contour integral when near and well conditioned). Exchange
 * areas are additive over a partition of either polygon (definition, Siegel &amp; Howell 4th ed.
 * eq. 4.13), so the sum is the pair's exchange area.
 *
 * <p>Error estimate of a contour sub-pair: {@link #ROUNDING} × Σ|edge terms| (rounding of the sum;
 * the edge terms themselves are exact to a few ulps or resolved to below it by the quadrature);
 * of an area sub-pair: the proximity rule's bound. Depth is limited ({@value #MAX_DEPTH}); a pair
 * still ill-conditioned there keeps its contour value and reports its (larger) error estimate.
 * Mutable scratch; one instance per thread.
 */
final class SplitPairs {

    /** Relative rounding attributed to a double contour sum, per unit of Σ|edge terms|. */
    static final double ROUNDING = 4e-16;
    /** Largest recursion depth. */
    static final int MAX_DEPTH = 14;

    private final ContourIntegral contour;
    private final AreaQuadrature quadrature;
    private final ProximityRule rule;
    private final int contourOrder;
    private final Poly[] pool = new Poly[4 * (MAX_DEPTH + 2)];
    private final double[] scratch = new double[3 * Poly.MAX_VERTICES];
    private final double[] axis = new double[3];
    /** Error estimate of the last call (m²). */
    double lastError;

    SplitPairs(ContourIntegral contour, AreaQuadrature quadrature, ProximityRule rule, int contourOrder) {
        this.contour = contour;
        this.quadrature = quadrature;
        this.rule = rule;
        this.contourOrder = contourOrder;
        for (int k = 0; k < pool.length; k++) {
            pool[k] = new Poly();
        }
    }

    /**
     * @param p first polygon (not modified)
     * @param q second polygon (not modified)
     * @param relTol relative tolerance of the result
     * @return A_p F_pq (m²)
     */
    double exchangeArea(Poly p, Poly q, double relTol) {
        lastError = 0;
        return pair(p, q, relTol, 0);
    }

    private double pair(Poly p, Poly q, double relTol, int depth) {
        double r = Math.sqrt(sq(p.cx - q.cx) + sq(p.cy - q.cy) + sq(p.cz - q.cz));
        double rho = r / (p.radius + q.radius);
        int order = rule.order(rho);
        if (order > 0) {
            lastError += rule.bound(rho) * p.area * q.area / (Math.PI * r * r);
            return quadrature.exchangeArea(p, q, order);
        }
        double s = contour.exchangeArea(p, q, contourOrder);
        double err = ContourIntegral.relativeError(contourOrder) * contour.lastMagnitude;
        if (err <= relTol * Math.abs(s) || depth >= MAX_DEPTH) {
            lastError += err;
            return s;
        }
        Poly big = p.radius >= q.radius ? p : q, other = big == p ? q : p;
        Poly a = pool[2 * depth], b = pool[2 * depth + 1];
        a.copyFrom(big);
        a.bisectLongAxis(b, axis, scratch);
        double sum = 0;
        for (Poly half : new Poly[] {a, b}) {
            if (half.n >= 3 && half.area > 0) {
                sum += big == p ? pair(half, other, relTol, depth + 1) : pair(other, half, relTol, depth + 1);
            }
        }
        return sum;
    }

    private static double sq(double v) {
        return v * v;
    }
}
