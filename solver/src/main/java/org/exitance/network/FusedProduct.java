package org.exitance.network;

import java.util.stream.IntStream;

/**
 * Products of the view-factor matrix with several vectors at once, {@code W = F V} with V and W
 * row-major N×B (one column per band): F is read once for all B columns, so a pass costs the
 * arithmetic of B products but the memory traffic of one (8N² bytes). Rows are split over the
 * cores; each entry is one sum over k in ascending order with its own accumulator, so the result
 * does not depend on the thread count or on how many columns are multiplied together.
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
        IntStream.range(0, n).parallel().forEach(i -> row(f, n, i, v, b, w, i * b));
    }

    /**
     * Rows of F V only.
     *
     * @param rows  the rows wanted, not modified
     * @param w     receives row r of the result at [r·b, (r+1)·b) for rows[r]; modified
     */
    static void multiplyRows(double[] f, int n, int[] rows, double[] v, int b, double[] w) {
        IntStream.range(0, rows.length).parallel().forEach(r -> row(f, n, rows[r], v, b, w, r * b));
    }

    /** w[o .. o+b) = row i of F times V; eight, then four columns at a time. */
    private static void row(double[] f, int n, int i, double[] v, int b, double[] w, int o) {
        int fr = i * n;
        int c = 0;
        for (; c + 7 < b; c += 8) {
            double a0 = 0;
            double a1 = 0;
            double a2 = 0;
            double a3 = 0;
            double a4 = 0;
            double a5 = 0;
            double a6 = 0;
            double a7 = 0;
            for (int k = 0; k < n; k++) {
                double fik = f[fr + k];
                int vk = k * b + c;
                a0 += fik * v[vk];
                a1 += fik * v[vk + 1];
                a2 += fik * v[vk + 2];
                a3 += fik * v[vk + 3];
                a4 += fik * v[vk + 4];
                a5 += fik * v[vk + 5];
                a6 += fik * v[vk + 6];
                a7 += fik * v[vk + 7];
            }
            w[o + c] = a0;
            w[o + c + 1] = a1;
            w[o + c + 2] = a2;
            w[o + c + 3] = a3;
            w[o + c + 4] = a4;
            w[o + c + 5] = a5;
            w[o + c + 6] = a6;
            w[o + c + 7] = a7;
        }
        for (; c + 3 < b; c += 4) {
            double a0 = 0;
            double a1 = 0;
            double a2 = 0;
            double a3 = 0;
            for (int k = 0; k < n; k++) {
                double fik = f[fr + k];
                int vk = k * b + c;
                a0 += fik * v[vk];
                a1 += fik * v[vk + 1];
                a2 += fik * v[vk + 2];
                a3 += fik * v[vk + 3];
            }
            w[o + c] = a0;
            w[o + c + 1] = a1;
            w[o + c + 2] = a2;
            w[o + c + 3] = a3;
        }
        for (; c < b; c++) {
            double a0 = 0;
            for (int k = 0; k < n; k++) {
                a0 += f[fr + k] * v[k * b + c];
            }
            w[o + c] = a0;
        }
    }
}
