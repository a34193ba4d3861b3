package org.exitance.geometry.viewfactor;

/**
 * How many facet pairs (i &lt; j) each method handled.
 *
 * @param zero back-facing, coplanar or clipped away: exactly 0
 * @param clipped pairs clipped to each other's front half-space (also counted in another field)
 * @param contour unobstructed pairs by the contour integral
 * @param quadrature unobstructed pairs by area quadrature
 * @param partlyHidden pairs by visibility-weighted quadrature with some rays visible
 * @param hidden pairs whose every ray was blocked
 */
public record MethodCounts(long zero, long clipped, long contour, long quadrature, long partlyHidden, long hidden) {

    /** @return total pairs evaluated (clipped excluded, as it overlaps) */
    public long total() {
        return zero + contour + quadrature + partlyHidden + hidden;
    }
}
