package org.exitance.network;

/** Access for the benchmark (test tree) to the package's dense LU; not a test. */
public final class DenseTiming {
    private DenseTiming() {
    }

    /**
     * Factors {@code work} in place and solves {@code A x = b}.
     *
     * @param work      A, N×N row-major; overwritten by the factors
     * @param original  A again, not modified, for the residual
     * @return ‖b − A x‖∞ / ‖b‖∞
     */
    public static double factorAndSolve(double[] work, int n, double[] b, double[] original) {
        DenseLu lu = DenseLu.factor(work, n);
        double[] x = new double[n];
        lu.solve(b, x);
        double worst = 0;
        double scale = 0;
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += original[i * n + j] * x[j];
            }
            worst = Math.max(worst, Math.abs(b[i] - s));
            scale = Math.max(scale, Math.abs(b[i]));
        }
        return worst / scale;
    }
}
