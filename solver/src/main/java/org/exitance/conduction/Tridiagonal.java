package org.exitance.conduction;

/** The Thomas algorithm for a tridiagonal system (Golub and Van Loan, Matrix Computations, 4th ed., §4.3). */
final class Tridiagonal {
    private Tridiagonal() {
    }

    /**
     * Solves A x = d in place: row j is lo[j] x[j−1] + di[j] x[j] + up[j] x[j+1].
     *
     * @param lo  sub-diagonal (lo[0] unused), not modified
     * @param di  diagonal, modified (overwritten by the elimination)
     * @param up  super-diagonal (last unused), not modified
     * @param d   right-hand side, modified: the solution
     */
    static void solve(double[] lo, double[] di, double[] up, double[] d) {
        int m = d.length;
        for (int j = 1; j < m; j++) {
            double w = lo[j] / di[j - 1];
            di[j] -= w * up[j - 1];
            d[j] -= w * d[j - 1];
        }
        d[m - 1] /= di[m - 1];
        for (int j = m - 2; j >= 0; j--) {
            d[j] = (d[j] - up[j] * d[j + 1]) / di[j];
        }
    }
}
