package org.exitance.geometry.viewfactor;

/**
 * Summation and reciprocity errors of a view-factor matrix (rows = emitters).
 *
 * @param maxRowSumError max over rows of |1 − Σ_j F_ij| (for an open enclosure this is the
 *        largest environment remainder, not an error)
 * @param rmsRowSumError root mean square of 1 − Σ_j F_ij over rows
 * @param worstRow name of the row with the largest |1 − Σ_j F_ij| (surface name, or
 *        "surface#facetIndex" for facet rows)
 * @param maxReciprocityError max over pairs of |A_i F_ij − A_j F_ji| / max(A_i F_ij, A_j F_ji)
 *        (0 when both are 0)
 * @param worstPair the pair with the largest reciprocity error, "row -> column"
 * @param maxNegativeRemainder max over rows of max(0, Σ_j F_ij − 1): a definite error in both
 *        closed and open geometry
 */
public record ClosureDiagnostics(double maxRowSumError, double rmsRowSumError, String worstRow,
        double maxReciprocityError, String worstPair, double maxNegativeRemainder) {

    /**
     * @param f row-major n × n matrix; not modified
     * @param n size
     * @param area areas (m²); not modified
     * @param names row names
     * @return the diagnostics
     */
    public static ClosureDiagnostics of(double[] f, int n, double[] area, java.util.function.IntFunction<String> names) {
        double maxRow = -1, sumSq = 0, maxRec = 0, maxNeg = 0;
        int worstRow = 0, wi = 0, wj = 0;
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += f[i * n + j];
            }
            double e = 1 - s;
            sumSq += e * e;
            if (Math.abs(e) > maxRow) {
                maxRow = Math.abs(e);
                worstRow = i;
            }
            maxNeg = Math.max(maxNeg, -e);
            for (int j = i + 1; j < n; j++) {
                double a = area[i] * f[i * n + j], b = area[j] * f[j * n + i];
                double m = Math.max(Math.abs(a), Math.abs(b));
                if (m > 0) {
                    double r = Math.abs(a - b) / m;
                    if (r > maxRec) {
                        maxRec = r;
                        wi = i;
                        wj = j;
                    }
                }
            }
        }
        return new ClosureDiagnostics(Math.max(maxRow, 0), Math.sqrt(sumSq / n), names.apply(worstRow), maxRec,
                names.apply(wi) + " -> " + names.apply(wj), maxNeg);
    }
}
