package org.exitance.pipeline;

import java.util.Locale;

/**
 * Whether a geometry's view factors meet the case's view-factor tolerance T: the computation's
 * own error estimate of every facet row (the sum of its pairs' estimates) within T, no facet
 * row summing to more than 1 + T, and, for a closed geometry (no environment), every facet row
 * within T of 1. A case that misses it is still solved and printed, with the shortfall as a
 * warning, and the command ends with exit code 3.
 */
public final class ViewFactorAccuracy {
    private ViewFactorAccuracy() {
    }

    /**
     * @param v the view factors
     * @param open whether the case has an environment
     * @param tolerance the case's view-factor tolerance
     * @return one line saying what misses the tolerance, or null when everything meets it
     */
    public static String shortfall(ComputedViewFactors v, boolean open, double tolerance) {
        String tol = String.format(Locale.ROOT, "%.3g", tolerance);
        if (v.maxRowErrorEstimate() > tolerance) {
            return "view-factor tolerance " + tol + " not met: the estimated error of a facet row is "
                    + String.format(Locale.ROOT, "%.3g", v.maxRowErrorEstimate())
                    + (v.compressed() ? "; it comes from the compressed operator (its blocks built to a hundredth of"
                    + " the tolerance): hold the view factors dense (geometry.options.storage) or raise"
                    + " geometry.options.tolerance" : "; refine the facets near obstructions or raise geometry.options.tolerance");
        }
        if (v.maxRowSumExcess() > tolerance) {
            return "view-factor tolerance " + tol + " not met: a facet row sums to "
                    + String.format(Locale.ROOT, "%.9g", 1 + v.maxRowSumExcess());
        }
        if (!open && v.maxRowSumDeviation() > tolerance) {
            return "view-factor tolerance " + tol + " not met: the geometry is closed but facet row " + v.worstRow()
                    + " sums to 1 − " + String.format(Locale.ROOT, "%.3g", v.maxRowSumDeviation());
        }
        return null;
    }
}
