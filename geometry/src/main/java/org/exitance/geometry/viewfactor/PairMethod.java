package org.exitance.geometry.viewfactor;

/**
 * A way to compute the exchange area A_p F_pq (m²) of two planar convex polygons that lie
 * entirely in front of each other's planes. Implementations: {@link ContourIntegral} (near
 * pairs), {@link AreaQuadrature} (far pairs), {@link VisibilityQuadrature} (partly hidden pairs).
 * The calculator picks one per pair by the rule in {@link ProximityRule}. Instances keep
 * scratch arrays and belong to one thread.
 */
interface PairMethod {

    /**
     * @param p first polygon (not modified)
     * @param q second polygon (not modified)
     * @param order accuracy parameter (points per direction); meaning depends on the method
     * @return A_p F_pq (m²), which equals A_q F_qp
     */
    double exchangeArea(Poly p, Poly q, int order);
}
