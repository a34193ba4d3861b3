package org.exitance.geometry.viewfactor;

/**
 * How many facet pairs (i &lt; j) each method handled.
 *
 * @param zero back-facing, coplanar or clipped away: exactly 0
 * @param clipped pairs clipped to each other's front half-space (also counted in another field)
 * @param contour unobstructed pairs by the contour integral
 * @param quadrature unobstructed pairs by area quadrature
 * @param partlyHidden pairs with an occluder in their hull and a visible part
 * @param hidden pairs with an occluder in their hull and nothing visible
 * @param raySampled of the last two, the pairs sampled by rays because shadow projection
 *        declined (too many occluders in the hull); also counted in one of them
 * @param curvedOnPolygons pairs with an exact curved side that were computed on the inscribed
 *        polygons (a horizon crosses the pair, or something may be in the way) and scaled to the
 *        exact areas, with the shape error in their estimate; also counted in another field
 * @param curvedExact pairs with an exact curved side computed on the exact shapes (also counted
 *        as contour or zero)
 */
public record MethodCounts(long zero, long clipped, long contour, long quadrature, long partlyHidden, long hidden,
        long raySampled, long curvedOnPolygons, long curvedExact) {

    /** @return total pairs evaluated (clipped excluded, as it overlaps) */
    public long total() {
        return zero + contour + quadrature + partlyHidden + hidden;
    }
}
