package org.exitance.network;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import java.util.concurrent.ForkJoinPool;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.CommonOps_DDRM;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The fused product F V against EJML's matrix product (a general-purpose library), and its promise
 * that an entry does not depend on the kernel (vector API or plain Java), on the thread count or on
 * how many columns are multiplied together: bit for bit. (Checked to fail: a plain-Java kernel
 * with separate multiply and add, as before, differs from the vector lanes in the last bits.)
 */
class FusedProductTest {

    @ParameterizedTest
    @CsvSource({"1, 1", "7, 3", "64, 8", "101, 11", "130, 16"})
    void everyEntryIsTheSameChainWhateverTheKernelThreadsOrColumns(int n, int b) throws Exception {
        assertThat(RowProductKernel.best().describe()).startsWith("vector");
        Random r = new Random(31L * n + b);
        double[] f = new double[n * n];
        for (int i = 0; i < f.length; i++) {
            f[i] = r.nextDouble() / n;
        }
        double[] v = new double[n * b];
        for (int i = 0; i < v.length; i++) {
            v[i] = r.nextDouble() * 1e4 - 2e3;
        }
        DMatrixRMaj ref = new DMatrixRMaj(n, b);
        CommonOps_DDRM.mult(DMatrixRMaj.wrap(n, n, f), DMatrixRMaj.wrap(n, b, v), ref);

        double[] scalar = new double[n * b];
        FusedProduct.multiply(f, n, v, b, scalar, RowProductKernel.scalar());
        for (int i = 0; i < n * b; i++) {
            assertThat(scalar[i]).isCloseTo(ref.data[i], within(1e-12 * 1e4));
        }
        for (int threads : new int[] {1, 2}) {
            double[] w = new double[n * b];
            ForkJoinPool pool = new ForkJoinPool(threads);
            try {
                pool.submit(() -> FusedProduct.multiply(f, n, v, b, w)).get();
            } finally {
                pool.shutdown();
            }
            assertThat(w).as("vector kernel, %d threads", threads).containsExactly(scalar);
        }
        int c = b - 1; // the last column alone
        double[] column = new double[n];
        for (int i = 0; i < n; i++) {
            column[i] = v[i * b + c];
        }
        double[] alone = new double[n];
        FusedProduct.multiply(f, n, column, 1, alone);
        int[] rows = {n - 1, 0, n / 2};
        double[] some = new double[rows.length * b];
        FusedProduct.multiplyRows(f, n, rows, v, b, some);
        for (int i = 0; i < n; i++) {
            assertThat(alone[i]).isEqualTo(scalar[i * b + c]);
        }
        for (int q = 0; q < rows.length; q++) {
            for (int k = 0; k < b; k++) {
                assertThat(some[q * b + k]).isEqualTo(scalar[rows[q] * b + k]);
            }
        }
    }
}
