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
}
