package org.exitance.geometry.hierarchy;

/**
 * Closure of the compressed operator of a closed enclosure by symmetric diagonal scaling: find
 * d &gt; 0 with d_i Σ_j K̃_ij d_j = A_i for every facet, and use K' = D K̃ D. This keeps K'
 * symmetric (reciprocity), keeps every entry's sign (non-negative entries stay non-negative;
 * zero entries stay zero), changes entry ij by the factor d_i d_j, and costs one vector per
 * facet instead of a correction matrix. The compressed entries are within the block tolerance of
 * the exact ones and the exact rows of a closed enclosure sum to A_i, so d stays within about
 * that tolerance of 1; the report gives max |d_i − 1|, which bounds the relative change of every
 * entry by 2 max |d − 1| + max |d − 1|².
 *
 * <p>Iteration: d_i ← d_i √(A_i / (d_i (K̃ d)_i)), the symmetric form of the Sinkhorn–Knopp
 * balancing (Knight, "The Sinkhorn–Knopp algorithm: convergence and applications", SIAM J.
 * Matrix Anal. Appl. 30 (2008) 261–275, from memory), one product per step. With
 * d = 1 + e it contracts e by ½(I − P), P = diag(1/A) K̃ (eigenvalues in [−1, 1]), so it
 * converges unless the enclosure splits into two sets that see only each other.
 */
final class Closure {

    /** Target: every row sum within this of A_i, relative. */
    static final double ROW_TOLERANCE = 1e-13;
    static final int MAX_ITERATIONS = 400;

    int iterations;
    double maxDeviation;
    double rowError;
    /** max_i |Σ_j K̃_ij − A_i| / A_i before any scaling: the raw closure error of the compressed entries. */
    double rawRowError = Double.NaN;
    /** The facet (scene order) of the largest raw row error. */
    int rawWorst;
    /** Why closure was not applied, or null. */
    String refused;

    /**
     * @param op the operator; its scale vector is replaced on success
     */
    void apply(CompressedOperator op) {
        int n = op.size();
        double[] d = new double[n];
        java.util.Arrays.fill(d, 1);
        double[] y = new double[n];
        for (iterations = 0; iterations <= MAX_ITERATIONS; iterations++) {
            op.multiplyTree(d, 1, y);
            rowError = 0;
            for (int p = 0; p < n; p++) {
                double sum = d[p] * y[p];
                if (!(sum > 0)) {
                    refused = "a facet sees nothing (row sum " + sum + " m²): not a closed enclosure";
                    return;
                }
                double e = Math.abs(sum - op.area[p]) / op.area[p];
                if (iterations == 0 && e > rowError) {
                    rawWorst = op.tree.perm[p];
                }
                rowError = Math.max(rowError, e);
            }
            if (iterations == 0) {
                rawRowError = rowError;
            }
            if (rowError <= ROW_TOLERANCE) {
                break;
            }
            if (iterations == MAX_ITERATIONS) {
                refused = String.format("closure scaling did not converge in %d steps (row error %.1e)",
                        MAX_ITERATIONS, rowError);
                return;
            }
            for (int p = 0; p < n; p++) {
                d[p] *= Math.sqrt(op.area[p] / (d[p] * y[p]));
            }
        }
        maxDeviation = 0;
        for (int p = 0; p < n; p++) {
            maxDeviation = Math.max(maxDeviation, Math.abs(d[p] - 1));
        }
        op.scale = d;
    }
}
