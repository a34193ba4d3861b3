package org.exitance.geometry.viewfactor;

/**
 * Settings of a view-factor computation. Immutable.
 *
 * @param threads worker threads; 0 means all available processors. Results do not depend on it.
 * @param pairTolerance target error of each unobstructed far pair relative to A_i A_j/(π r²);
 *        drives {@link ProximityRule} (default 1e-7)
 * @param contourOrder Gauss points per outer sub-interval of {@link ContourIntegral} (default 6)
 * @param visibilityOrder stratification cells per direction on each facet for pairs whose
 *        hull holds an occluder (default 2, i.e. 4 × 4 = 16 rays between two quadrilaterals;
 *        one more for near pairs, ρ &lt; 3)
 * @param obstruction obstruction handling (default AUTO)
 * @param smoothing closure enforcement (default NONE)
 */
public record ViewFactorOptions(int threads, double pairTolerance, int contourOrder, int visibilityOrder,
        Obstruction obstruction, Smoothing smoothing) {

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
    }

    /** @return the defaults: all cores, 1e-7, contour order 6, visibility order 2, AUTO, NONE */
    public static ViewFactorOptions defaults() {
        return new ViewFactorOptions(0, 1e-7, 10, 2, Obstruction.AUTO, Smoothing.NONE);
    }

    /** @return a copy with another thread count */
    public ViewFactorOptions withThreads(int n) {
        return new ViewFactorOptions(n, pairTolerance, contourOrder, visibilityOrder, obstruction, smoothing);
    }

    /** @return a copy with another pair tolerance */
    public ViewFactorOptions withPairTolerance(double tol) {
        return new ViewFactorOptions(threads, tol, contourOrder, visibilityOrder, obstruction, smoothing);
    }

    /** @return a copy with another visibility order */
    public ViewFactorOptions withVisibilityOrder(int order) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, order, obstruction, smoothing);
    }

    /** @return a copy with another obstruction mode */
    public ViewFactorOptions withObstruction(Obstruction o) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, visibilityOrder, o, smoothing);
    }

    /** @return a copy with another smoothing mode */
    public ViewFactorOptions withSmoothing(Smoothing s) {
        return new ViewFactorOptions(threads, pairTolerance, contourOrder, visibilityOrder, obstruction, s);
    }
}
