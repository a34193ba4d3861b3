package org.exitance.geometry.viewfactor;

/**
 * Chooses the method for an unobstructed pair from its proximity ρ = r / (R_p + R_q), where r is
 * the distance between the centroids and R the circumradius of each polygon about its centroid.
 *
 * <p>The table {@link #MEASURED} holds, for ρ ≥ ρ_k, the largest error of the m-point-per-direction
 * {@link AreaQuadrature} found on random pairs (triangles, squares, 1.9 : 0.3 parallelograms,
 * random orientation and skew, both facets fully in front of each other; 300 pairs per ρ, seed
 * 12345; reference: {@link ContourIntegral} with order 10), relative to the scale
 * A_p A_q / (π r²). Produced by {@code ProximityCalibration} (test sources) and recorded in
 * docs/view-factors.md. The rule picks the smallest order whose measured error times
 * {@link #SAFETY} is at most the requested tolerance; if none qualifies (near pairs), the contour
 * integral is used. The reported error bound of a pair is that product times its scale.
 * Values at large ρ are limited by the reference's own cancellation error, which makes them
 * conservative.
 */
final class ProximityRule {

    /** Safety factor applied to the measured errors. */
    static final double SAFETY = 3;

    /** ρ_k, ascending. */
    static final double[] RHO = {3, 4, 6, 8, 12, 16, 24, 32, 64};
    /** MEASURED[k][m]: max relative error of order m (1..6) for ρ ≥ RHO[k]. */
    static final double[][] MEASURED = {
        {0, 3.1e-2, 4.8e-4, 7.0e-6, 1.1e-7, 1.6e-9, 2.2e-11},
        {0, 1.8e-2, 1.7e-4, 1.3e-6, 1.1e-8, 9.3e-11, 6.9e-13},
        {0, 8.1e-3, 5.1e-5, 1.4e-7, 4.5e-10, 1.9e-12, 1.5e-12},
        {0, 4.6e-3, 2.0e-5, 2.6e-8, 4.8e-11, 5.8e-12, 5.8e-12},
        {0, 2.0e-3, 6.0e-6, 2.9e-9, 1.5e-11, 1.5e-11, 1.5e-11},
        {0, 1.1e-3, 2.5e-6, 7.0e-10, 3.7e-11, 3.7e-11, 3.7e-11},
        {0, 5.1e-4, 7.5e-7, 2.1e-10, 2.1e-10, 2.1e-10, 2.1e-10},
        {0, 2.9e-4, 3.2e-7, 4.8e-10, 4.8e-10, 4.8e-10, 4.8e-10},
        {0, 7.2e-5, 4.0e-8, 4.0e-9, 4.0e-9, 4.0e-9, 4.0e-9},
    };
    /** Highest area-quadrature order in the table. */
    static final int MAX_ORDER = 6;

    private final double tolerance;
    /** order[k]: chosen order for bracket k, or 0 for the contour integral. */
    private final int[] order;
    private final double[] bound;

    ProximityRule(double tolerance) {
        this.tolerance = tolerance;
        order = new int[RHO.length];
        bound = new double[RHO.length];
        for (int k = 0; k < RHO.length; k++) {
            for (int m = 1; m <= MAX_ORDER; m++) {
                if (MEASURED[k][m] * SAFETY <= tolerance) {
                    order[k] = m;
                    bound[k] = MEASURED[k][m] * SAFETY;
                    break;
                }
            }
            // the error of an order cannot grow with the distance: an order that met the
            // tolerance nearer still meets it (the table's far rows are floored by the reference's
            // own cancellation, so without this a tight tolerance sent far pairs to the contour)
            if (k > 0 && order[k - 1] > 0 && (order[k] == 0 || order[k] > order[k - 1])) {
                order[k] = order[k - 1];
                bound[k] = Math.min(bound[k - 1], MEASURED[k][order[k]] * SAFETY);
            }
        }
    }

    /** @return the requested relative tolerance */
    double tolerance() {
        return tolerance;
    }

    /** @return the bracket index for ρ, or −1 below the first bracket */
    static int bracket(double rho) {
        int k = -1;
        while (k + 1 < RHO.length && rho >= RHO[k + 1]) {
            k++;
        }
        return k;
    }

    /** @return area-quadrature order for ρ, or 0 for the contour integral */
    int order(double rho) {
        int k = bracket(rho);
        return k < 0 ? 0 : order[k];
    }

    /** @return relative error bound (× A_p A_q/(π r²)) for the quadrature chosen at ρ; 0 for contour */
    double bound(double rho) {
        int k = bracket(rho);
        return k < 0 ? 0 : bound[k];
    }
}
