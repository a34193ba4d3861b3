package org.exitance.network;

import java.util.stream.IntStream;

/**
 * The heat sensitivities of a band's unknown nodes from one blocked solve
 * ({@link BandNetwork#nodeHeatSensitivities}, where the method is documented). After the solve
 * {@code X = (I − ρF − TF)⁻¹ ε [e_c]} (N×m), only the rows of F·X at the nodes' faces (and their
 * windows' other faces) are formed, as a blocked matrix product: {@link #ROWS} rows of F at a time
 * against {@link #COLS}-column strips of X, so X is read from memory once per row block.
 */
final class NodeSensitivities {
    private static final int ROWS = 32;
    private static final int COLS = 512;

    private NodeSensitivities() {
    }

    static double[] of(BandNetwork net, int[][] nodeFaces) {
        int n = net.n;
        double[] eps = net.eps;
        double[] tau = net.tau;
        int[] other = net.other;
        double[] area = net.area;
        int m = nodeFaces.length;
        double[] x = new double[Math.multiplyExact(n, m)];
        int[] nodeOf = new int[n];
        java.util.Arrays.fill(nodeOf, -1);
        for (int c = 0; c < m; c++) {
            for (int face : nodeFaces[c]) {
                x[face * m + c] += eps[face];
                nodeOf[face] = c;
            }
        }
        net.prepared.solveBlock(x, m, x);
        // the rows of F X needed: every face, and a window face's other face
        int[] slot = new int[n];
        int[] rows = withOtherFaces(java.util.Arrays.stream(nodeFaces).flatMapToInt(java.util.Arrays::stream).toArray(),
                other, slot);
        double[] fx = rowsTimesBlock(net.f, n, rows, x, m);
        double[] out = new double[m * m];
        IntStream.range(0, m).parallel().forEach(a -> {
            int row = a * m;
            for (int i : nodeFaces[a]) {
                double take = area[i] * (eps[i] + tau[i]);
                int fi = slot[i] * m;
                for (int c = 0; c < m; c++) {
                    out[row + c] -= take * fx[fi + c];
                }
                if (other[i] >= 0 && tau[i] != 0) {
                    int fo = slot[other[i]] * m;
                    double pass = area[i] * tau[i];
                    for (int c = 0; c < m; c++) {
                        out[row + c] += pass * fx[fo + c];
                    }
                }
                out[row + nodeOf[i]] += area[i] * eps[i];
            }
        });
        return out;
    }

    /**
     * The surfaces {@code faces} and their windows' other faces, each once, in order of first
     * appearance (a new array).
     *
     * @param faces  surfaces, not modified
     * @param other  per surface its other face or −1, not modified
     * @param slot   length N; receives each listed surface's position in the result, −1 elsewhere (modified)
     */
    static int[] withOtherFaces(int[] faces, int[] other, int[] slot) {
        java.util.Arrays.fill(slot, -1);
        int[] rows = new int[2 * faces.length];
        int count = 0;
        for (int i : faces) {
            for (int r : new int[] {i, other[i]}) {
                if (r >= 0 && slot[r] < 0) {
                    slot[r] = count;
                    rows[count++] = r;
                }
            }
        }
        return java.util.Arrays.copyOf(rows, count);
    }

    /**
     * Rows of F times the N×m block x (a new rows.length×m array); row blocks in parallel, each
     * entry one sum over k in ascending order.
     */
    private static double[] rowsTimesBlock(double[] f, int n, int[] rows, double[] x, int m) {
        double[] w = new double[rows.length * m];
        int blocks = (rows.length + ROWS - 1) / ROWS;
        IntStream.range(0, blocks).parallel().forEach(blk -> {
            int r0 = blk * ROWS;
            int r1 = Math.min(r0 + ROWS, rows.length);
            for (int c0 = 0; c0 < m; c0 += COLS) {
                int c1 = Math.min(c0 + COLS, m);
                for (int k = 0; k < n; k++) {
                    int xk = k * m;
                    for (int r = r0; r < r1; r++) {
                        double fik = f[rows[r] * n + k];
                        if (fik != 0) {
                            int wr = r * m;
                            for (int c = c0; c < c1; c++) {
                                w[wr + c] += fik * x[xk + c];
                            }
                        }
                    }
                }
            }
        });
        return w;
    }
}
