package org.exitance.geometry.viewfactor;

/**
 * What closure enforcement did.
 *
 * @param mode the requested mode (NONE: nothing was changed)
 * @param maxChange largest |ΔF_ij| over all facet entries
 * @param rmsChange root mean square of ΔF_ij over all facet entries
 * @param clampedToZero entries held at zero to keep the result non-negative
 * @param solverIterations conjugate-gradient iterations in total
 */
public record SmoothingReport(Smoothing mode, double maxChange, double rmsChange, long clampedToZero,
        int solverIterations) {

    /** @return true if the matrix was modified */
    public boolean applied() {
        return mode != Smoothing.NONE;
    }

    static SmoothingReport none() {
        return new SmoothingReport(Smoothing.NONE, 0, 0, 0, 0);
    }
}
