package org.exitance.network;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The blocked in-place LU against EJML's (a general-purpose library) on random matrices that need
 * pivoting, of sizes below, at and across the panel width, for one and several right-hand sides.
 */
class DenseLuTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 5, 64, 65, 150, 203})
    void solvesAsEjmlDoes(int n) {
        Random r = new Random(n);
        double[] a = new double[n * n];
        for (int i = 0; i < a.length; i++) {
            a[i] = r.nextDouble() - 0.5; // no diagonal dominance: partial pivoting needed
        }
        int cols = 7;
        double[] b = new double[n * cols];
        for (int i = 0; i < b.length; i++) {
            b[i] = r.nextDouble();
        }
        DMatrixRMaj x = new DMatrixRMaj(n, cols);
        assertThat(CommonOps_DDRM.solve(DMatrixRMaj.wrap(n, n, a.clone()), DMatrixRMaj.wrap(n, cols, b.clone()), x))
                .isTrue();
        DenseLu lu = DenseLu.factor(a.clone(), n);
        double[] block = b.clone();
        lu.solveInPlace(block, cols);
        double[] one = new double[n];
        double[] col = new double[n];
        for (int i = 0; i < n; i++) {
            col[i] = b[i * cols + 3];
        }
        lu.solve(col, one);
        double scale = 0;
        for (double v : x.data) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int i = 0; i < n * cols; i++) {
            assertThat(block[i]).isCloseTo(x.data[i], within(1e-10 * scale));
        }
        for (int i = 0; i < n; i++) {
            assertThat(one[i]).isCloseTo(x.data[i * cols + 3], within(1e-10 * scale));
        }
    }

    @Test
    void aSingularMatrixIsRefused() {
        double[] a = {1, 2, 3, 2, 4, 6, 1, 0, 1}; // row 2 = 2 × row 1
        assertThat(DenseLu.factor(a, 3)).isNull();
    }

    /**
     * The vector kernel is the one in use under the tests (surefire adds its module), and it gives
     * the scalar kernel's factors and blocked solutions bit for bit, on sizes that leave partial
     * tiles of rows and columns and with one or two threads: each entry is the same chain of fused
     * multiply-adds. (Checked to fail: a tile that skipped its last k, or a remainder row loop that
     * started at the wrong column, breaks it.)
     */
    @ParameterizedTest
    @ValueSource(ints = {67, 203, 300})
    void vectorAndScalarKernelsGiveTheSameFactorsForAnyThreadCount(int n) throws Exception {
        assertThat(TrailingKernel.best().describe()).startsWith("vector");
        Random r = new Random(7 * n);
        double[] a = new double[n * n];
        for (int i = 0; i < a.length; i++) {
            a[i] = r.nextDouble() - 0.5;
        }
        int cols = 37; // tiles of 2 vectors, one more vector and a few single columns
        double[] b = new double[n * cols];
        for (int i = 0; i < b.length; i++) {
            b[i] = r.nextDouble();
        }
        double[] scalar = a.clone();
        double[] xScalar = b.clone();
        DenseLu.factor(scalar, n, TrailingKernel.scalar()).solveInPlace(xScalar, cols);
        for (int threads : new int[] {1, 2}) {
            double[] vector = a.clone();
            double[] xVector = b.clone();
            java.util.concurrent.ForkJoinPool pool = new java.util.concurrent.ForkJoinPool(threads);
            try {
                pool.submit(() -> DenseLu.factor(vector, n, TrailingKernel.best()).solveInPlace(xVector, cols)).get();
            } finally {
                pool.shutdown();
            }
            assertThat(vector).as("factors, threads %d", threads).containsExactly(scalar);
            assertThat(xVector).as("solutions, threads %d", threads).containsExactly(xScalar);
        }
    }
}
