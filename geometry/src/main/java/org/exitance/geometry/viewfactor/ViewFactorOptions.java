package org.exitance.geometry.viewfactor;

/**
 * Settings of a view-factor computation. Immutable.
 *
 * <p>One tolerance drives the accuracy: {@link #withTolerance} sets the target of the facet row
 * sums and derives from it the pair tolerance of the far-pair area rules (tolerance / 100, used
 * also to split ill-conditioned and curved near pairs) and the contour order (10 at 1e-5, two
 * more per decade). The visibility sampling of partly hidden pairs is not yet driven by it
 * ({@code visibilityOrder}); the result says whether the tolerance was met.
 *
 * @param threads worker threads; 0 means all available processors. Results do not depend on it.
 * @param pairTolerance target error of each unobstructed far pair relative to A_i A_j/(π r²);
 *        drives {@link ProximityRule} (default 1e-7 = tolerance / 100)
 * @param contourOrder Gauss points per outer sub-interval of {@link ContourIntegral} (default 10)
 * @param visibilityOrder stratification cells per direction on each facet for pairs whose
 *        hull holds an occluder (default 2, i.e. 4 × 4 = 16 rays between two quadrilaterals;
 *        one more for near pairs, ρ &lt; 3)
 * @param obstruction obstruction handling (default AUTO)
 * @param smoothing closure enforcement (default AUTO: closed enclosures within the tolerance are
 *        made exactly closed and reciprocal)
 * @param tolerance target of the facet row sums |1 − Σ_j F_ij| of a closed enclosure (default
 *        1e-5); surface row sums are expected within a tenth of it
 * @param curvedPatches integrate curved facets on their exact {@link org.exitance.geometry.Patch}
 *        (exact areas and shapes) instead of their inscribed polygons (default false: touching
 *        curved pairs are resolved only to 2e-4 … 2e-3 so far, see docs/view-factors.md)
 */
public record ViewFactorOptions(int threads, double pairTolerance, int contourOrder, int visibilityOrder,
        Obstruction obstruction, Smoothing smoothing, double tolerance, boolean curvedPatches) {

    /** Default row-sum tolerance. */
    public static final double DEFAULT_TOLERANCE = 1e-5;

    /** @throws IllegalArgumentException for out-of-range values */
    public ViewFactorOptions {
        if (threads < 0) {
            throw new IllegalArgumentException("threads must be >= 0, got " + threads);
        }
        if (!(pairTolerance > 0 && pairTolerance < 1)) {
            throw new IllegalArgumentException("pairTolerance must be in (0, 1), got " + pairTolerance);
        }
        if (contourOrder < 2 || contourOrder > GaussLegendre.MAX_POINTS - 4) {
            throw new IllegalArgumentException("contourOrder must be in [2, 28], got " + contourOrder);
        }
        if (visibilityOrder < 1 || visibilityOrder > 16) {
            throw new IllegalArgumentException("visibilityOrder must be in [1, 16], got " + visibilityOrder);
        }
        if (obstruction == null || smoothing == null) {
            throw new IllegalArgumentException("obstruction and smoothing must be given");
        }
        if (!(tolerance >= 1e-12 && tolerance <= 0.1)) {
            throw new IllegalArgumentException("tolerance must be in [1e-12, 0.1], got " + tolerance);
        }
    }

    /** @return the defaults: all cores, tolerance 1e-5 (pair 1e-7, contour order 10), visibility order 2, AUTO, AUTO */
    public static ViewFactorOptions defaults() {
        return new ViewFactorOptions(0, 1e-7, 10, 2, Obstruction.AUTO, Smoothing.AUTO, DEFAULT_TOLERANCE, false);
    }

    /**
     * @param tol target of the facet row sums, in [1e-12, 0.1]
     * @return a copy with this tolerance and the pair tolerance and contour order derived from it
     */
    public ViewFactorOptions withTolerance(double tol) {
        if (!(tol >= 1e-12 && tol <= 0.1)) {
            throw new IllegalArgumentException("tolerance must be in [1e-12, 0.1], got " + tol);
        }
        int order = (int) Math.round(10 + 2 * Math.log10(DEFAULT_TOLERANCE / tol));
        order = Math.max(6, Math.min(GaussLegendre.MAX_POINTS - 4, order));
        return new ViewFactorOptions(threads, Math.min(1e-3, tol / 100), order, visibilityOrder, obstruction, smoothing,
                tol, curvedPatches);
    }

    /** @return a copy that integrates curved facets on their exact patches (or not) */
    public ViewFactorOptions withCurvedPatches(boolean on) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, visibilityOrder, obstruction, smoothing, tolerance,
                on);
    }

    /** @return a copy with another thread count */
    public ViewFactorOptions withThreads(int n) {
        return new ViewFactorOptions(n, pairTolerance, contourOrder, visibilityOrder, obstruction, smoothing, tolerance, curvedPatches);
    }

    /** @return a copy with another pair tolerance (overrides the one derived from the tolerance) */
    public ViewFactorOptions withPairTolerance(double tol) {
        return new ViewFactorOptions(threads, tol, contourOrder, visibilityOrder, obstruction, smoothing, tolerance, curvedPatches);
    }

    /** @return a copy with another visibility order */
    public ViewFactorOptions withVisibilityOrder(int order) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, order, obstruction, smoothing, tolerance, curvedPatches);
    }

    /** @return a copy with another obstruction mode */
    public ViewFactorOptions withObstruction(Obstruction o) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, visibilityOrder, o, smoothing, tolerance, curvedPatches);
    }

    /** @return a copy with another smoothing mode */
    public ViewFactorOptions withSmoothing(Smoothing s) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, visibilityOrder, obstruction, s, tolerance, curvedPatches);
    }
}
