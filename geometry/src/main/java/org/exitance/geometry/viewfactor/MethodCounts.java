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
 */
public record MethodCounts(long zero, long clipped, long contour, long quadrature, long partlyHidden, long hidden,
        long raySampled) {

    /** @return total pairs evaluated (clipped excluded, as it overlaps) */
    public long total() {
        return zero + contour + quadrature + partlyHidden + hidden;
    }
}
