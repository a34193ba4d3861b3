package org.exitance.cases;

import java.util.List;
import org.exitance.model.EnclosureSurface;

/**
 * Reads the view-factor matrix a case gives ({@code viewFactors}) and checks it: one row and
 * one column per surface in the order of {@code $.surfaces}, entries in [0, 1], no row above 1,
 * closure of a closed enclosure, and reciprocity A_i F_ij = A_j F_ji, each within a tolerance
 * (the summation rule and reciprocity: Incropera et al., Fundamentals of Heat and Mass Transfer,
 * 6th ed., Sec. 13.1, from memory).
 */
final class ViewFactorMatrixReader {
    /** Default |1 − Σ_j F_ij| allowed in a closed enclosure, and Σ_j F_ij − 1 allowed in any. */
    static final double DEFAULT_ROW_SUM_TOLERANCE = 1e-6;
    /** Default relative reciprocity error |A_i F_ij − A_j F_ji| / max(...) beyond which a case is rejected. */
    static final double DEFAULT_RECIPROCITY_TOLERANCE = 1e-2;
    /** Relative reciprocity error above which a warning is printed. */
    static final double RECIPROCITY_WARNING = 1e-6;

    private ViewFactorMatrixReader() {
    }

    /**
     * @param open     whether the case has an environment (rows may then sum to less than 1)
     * @param warnings receives non-fatal findings (modified: lines are appended)
     * @return F[i][j] in case order, a new array
     */
    static double[][] read(JsonCursor vf, List<EnclosureSurface> surfaces, boolean open, List<String> warnings)
            throws CaseException {
        vf.allowOnly("matrix", "rowSumTolerance", "reciprocityTolerance");
        double rowTol = vf.has("rowSumTolerance") ? vf.field("rowSumTolerance").positiveWithin(Limits.MATRIX_TOLERANCE) : DEFAULT_ROW_SUM_TOLERANCE;
        double recTol = vf.has("reciprocityTolerance")
                ? vf.field("reciprocityTolerance").positiveWithin(Limits.MATRIX_TOLERANCE) : DEFAULT_RECIPROCITY_TOLERANCE;
        JsonCursor m = vf.field("matrix");
        List<JsonCursor> rows = m.elements();
        int n = surfaces.size();
        if (rows.size() != n) {
            throw m.error("has " + rows.size() + " rows for " + n + " surfaces (rows follow the order of $.surfaces)");
        }
        double[][] f = new double[n][];
        for (int i = 0; i < n; i++) {
            JsonCursor row = rows.get(i);
            List<JsonCursor> cells = row.elements();
            if (cells.size() != n) {
                throw row.error("has " + cells.size() + " entries for " + n + " surfaces");
            }
            f[i] = new double[n];
            double sum = 0;
            for (int j = 0; j < n; j++) {
                f[i][j] = cells.get(j).fraction();
                sum += f[i][j];
            }
            String who = "row of '" + surfaces.get(i).name() + "'";
            if (sum > 1 + rowTol) {
                throw row.error(who + " sums to " + CaseReader.fmt(sum) + ", above 1 (tolerance " + rowTol + ")");
            }
            if (!open && sum < 1 - rowTol) {
                throw row.error(who + " sums to " + CaseReader.fmt(sum) + ", below 1: the enclosure is open;"
                        + " add an \"environment\" to receive the remainder, or complete the row");
            }
            if (!open && Math.abs(1 - sum) > 1e-12) {
                warnings.add("view factors: " + who + " sums to " + CaseReader.fmt(sum) + " (|1 − Σ| = "
                        + CaseReader.fmt(Math.abs(1 - sum)) + ")");
            }
        }
        checkReciprocity(f, rows, surfaces, recTol, warnings);
        return f;
    }

    private static void checkReciprocity(double[][] f, List<JsonCursor> rows, List<EnclosureSurface> surfaces,
                                         double recTol, List<String> warnings) throws CaseException {
        int n = f.length;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double aij = surfaces.get(i).areaM2() * f[i][j];
                double aji = surfaces.get(j).areaM2() * f[j][i];
                double big = Math.max(aij, aji);
                if (big == 0) {
                    continue;
                }
                double rel = Math.abs(aij - aji) / big;
                if (rel > recTol) {
                    throw rows.get(i).elements().get(j).error("reciprocity broken between '" + surfaces.get(i).name()
                            + "' and '" + surfaces.get(j).name() + "': A_i F_ij = " + CaseReader.fmt(aij)
                            + " m² but A_j F_ji = " + CaseReader.fmt(aji) + " m² (relative error "
                            + CaseReader.fmt(rel) + " > " + recTol + ")");
                }
                if (rel > RECIPROCITY_WARNING) {
                    warnings.add("view factors: reciprocity error " + CaseReader.fmt(rel) + " between '"
                            + surfaces.get(i).name() + "' and '" + surfaces.get(j).name()
                            + "'; the energy balance will show it");
                }
            }
        }
    }
}
