package org.exitance.pipeline;

import java.nio.file.Path;
import java.util.List;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseReader;
import org.exitance.model.EnclosureSurface;

/**
 * The computed surface view factors of a geometry case in the case's surface order, with the
 * checks that need them: a geometry without an environment must be closed, and a facet row above
 * 1 is reported as a warning (closure against the tolerance: ViewFactorAccuracy).
 */
final class GeometryViewFactors {
    /** Share of a surface's radiation that may escape a geometry declared closed (no environment). */
    static final double OPEN_GEOMETRY = 1e-3;
    /**
     * Excess of a facet row above 1 beyond which facets overlap (two parts in the same place) or
     * the divisions are far too coarse for the view factors to mean anything.
     */
    static final double OVERLAP = 0.05;

    private GeometryViewFactors() {
    }

    /**
     * @param open     whether the case has an environment to receive what leaves the geometry
     * @param warnings receives the closure findings (modified: lines are appended)
     * @return F[i][j] in the order of {@code surfaces}, a new array
     */
    static double[][] inCaseOrder(ComputedViewFactors v, List<EnclosureSurface> surfaces, boolean open, Path file,
                                  List<String> warnings) throws CaseException {
        int n = surfaces.size();
        int[] at = new int[n];
        for (int i = 0; i < n; i++) {
            at[i] = v.surfaceNames().indexOf(surfaces.get(i).name());
        }
        double[][] f = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                f[i][j] = v.matrix()[at[i]][at[j]];
            }
            double leaving = v.environmentFactors()[at[i]];
            // a deficit within the view factors' own estimated error is theirs, not an opening:
            // ViewFactorAccuracy reports it (exit code 3)
            if (!open && leaving > OPEN_GEOMETRY && leaving > v.maxRowErrorEstimate()) {
                throw new CaseException(file, "$.geometry", "the geometry is open: " + CaseReader.fmt(leaving)
                        + " of the radiation leaving '" + surfaces.get(i).name() + "' escapes; add an \"environment\""
                        + " to receive it, or close the geometry");
            }
        }
        if (v.maxRowSumExcess() > OVERLAP) {
            throw new CaseException(file, "$.geometry", "a facet row of view factors sums to "
                    + CaseReader.fmt(1 + v.maxRowSumExcess()) + ", more than " + Math.round(100 * OVERLAP)
                    + " % above 1: facets overlap (two parts in the same place), or the divisions are too coarse");
        }
        // a closed geometry's row-sum error beyond the view-factor tolerance is reported by
        // ViewFactorAccuracy (exit code 3); within it, the smoothing for the solve says what it changed
        if (v.maxRowSumExcess() > 1e-6) {
            warnings.add("view factors: a facet row sums to " + CaseReader.fmt(1 + v.maxRowSumExcess()) + ", above 1");
        }
        return f;
    }
}
