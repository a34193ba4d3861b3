package org.exitance.network;

import java.util.concurrent.atomic.AtomicLong;

/**
 * The dense view-factor matrix as a {@link RadiationOperator}: products by {@link FusedProduct}
 * (F read once for all columns), the row sums formed once on first use.
 */
final class DenseRadiationOperator implements RadiationOperator {
    private final double[] f;
    private final int n;
    private final AtomicLong rowsMultiplied = new AtomicLong();
    private volatile double[] rowSums;

    /** @param f  F, N×N row-major; shared, not modified */
    DenseRadiationOperator(double[] f, int n) {
        if ((long) n * n != f.length) {
            throw new IllegalArgumentException("view-factor array of " + f.length + " entries is not " + n + "×" + n);
        }
        this.f = f;
        this.n = n;
    }

    @Override
    public int size() {
        return n;
    }

    @Override
    public void multiply(double[] v, int cols, double[] w) {
        rowsMultiplied.addAndGet(n);
        FusedProduct.multiply(f, n, v, cols, w);
    }

    @Override
    public void multiplyRows(int[] rows, double[] v, int cols, double[] w) {
        rowsMultiplied.addAndGet(rows.length);
        FusedProduct.multiplyRows(f, n, rows, v, cols, w);
    }

    @Override
    public double diagonal(int i) {
        return f[i * n + i];
    }

    @Override
    public double[] rowSums() {
        double[] s = rowSums;
        if (s == null) {
            s = new double[n];
            for (int i = 0; i < n; i++) {
                double sum = 0;
                int row = i * n;
                for (int k = 0; k < n; k++) {
                    sum += f[row + k];
                }
                s[i] = sum;
            }
            rowSums = s;
        }
        return s.clone();
    }

    @Override
    public long memoryBytes() {
        return 8L * n * n;
    }

    @Override
    public double passes() {
        return n == 0 ? 0 : (double) rowsMultiplied.get() / n;
    }

    /** The dense array itself (shared, read only): for the direct paths only. */
    double[] array() {
        return f;
    }
}
