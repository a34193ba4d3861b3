package org.exitance.network;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The dense {@link RadiationOperator}: its products, rows, diagonal and row sums are those of the
 * plain matrix (common practice: a matrix–block product is B matrix–vector products), and its pass
 * count follows the rows multiplied.
 */
class RadiationOperatorTest {

    @Test
    void denseOperatorIsTheMatrix() {
        int n = 37;
        int b = 11; // eight, then four, then one column at a time inside the kernel
        Random r = new Random(5);
        double[] f = new double[n * n];
        for (int i = 0; i < f.length; i++) {
            f[i] = r.nextDouble();
        }
        double[] v = new double[n * b];
        for (int i = 0; i < v.length; i++) {
            v[i] = r.nextDouble() - 0.5;
        }
        RadiationOperator op = RadiationOperator.dense(f, n);
        double[] w = new double[n * b];
        op.multiply(v, b, w);
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int k = 0; k < n; k++) {
                sum += f[i * n + k];
            }
            assertThat(op.rowSums()[i]).isCloseTo(sum, within(1e-13 * sum));
            assertThat(op.diagonal(i)).isEqualTo(f[i * n + i]);
            for (int c = 0; c < b; c++) {
                double ref = 0;
                for (int k = 0; k < n; k++) {
                    ref += f[i * n + k] * v[k * b + c];
                }
                assertThat(w[i * b + c]).isCloseTo(ref, within(1e-13 * n));
            }
        }
        int[] rows = {30, 2, 17};
        double[] wr = new double[rows.length * b];
        op.multiplyRows(rows, v, b, wr);
        for (int q = 0; q < rows.length; q++) {
            for (int c = 0; c < b; c++) {
                assertThat(wr[q * b + c]).isEqualTo(w[rows[q] * b + c]);
            }
        }
        assertThat(op.passes()).isCloseTo(1 + 3.0 / n, within(1e-12));
        assertThat(op.memoryBytes()).isEqualTo(8L * n * n);
    }
}
