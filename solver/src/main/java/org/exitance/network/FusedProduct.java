package org.exitance.network;

import java.util.stream.IntStream;

/**
 * Products of the view-factor matrix with several vectors at once, {@code W = F V} with V and W
 * row-major N×B (one column per band): F is read once for all B columns, so a pass costs the
 * arithmetic of B products but the memory traffic of one (8N² bytes). Rows are split over the
 * cores in pairs; each entry is one chain of fused multiply-adds over k in ascending order
 * ({@link RowProductKernel}: on the vector API when the JVM has it), so the result does not
 * depend on the thread count, on the kernel or on how many columns are multiplied together.
 */
final class FusedProduct {
    private FusedProduct() {
    }

    /**
     * @param f  F, N×N row-major, not modified
     * @param v  N×b row-major, not modified
     * @param w  receives F V, N×b row-major; modified
     */
    static void multiply(double[] f, int n, double[] v, int b, double[] w) {
        multiply(f, n, v, b, w, RowProductKernel.best());
    }

    /** As {@link #multiply(double[], int, double[], int, double[])} with the given kernel. */
    static void multiply(double[] f, int n, double[] v, int b, double[] w, RowProductKernel kernel) {
        IntStream.range(0, (n + 1) / 2).parallel().forEach(p -> {
            int i = 2 * p;
            int j = i + 1 < n ? i + 1 : -1;
            kernel.rows(f, n, i, j, v, b, w, i * b, (i + 1) * b);
        });
    }

    /**
     * Rows of F V only.
     *
     * @param rows  the rows wanted, not modified
     * @param w     receives row r of the result at [r·b, (r+1)·b) for rows[r]; modified
     */
    static void multiplyRows(double[] f, int n, int[] rows, double[] v, int b, double[] w) {
        RowProductKernel kernel = RowProductKernel.best();
        IntStream.range(0, (rows.length + 1) / 2).parallel().forEach(p -> {
            int r = 2 * p;
            int second = r + 1 < rows.length ? rows[r + 1] : -1;
            kernel.rows(f, n, rows[r], second, v, b, w, r * b, (r + 1) * b);
        });
    }
}
