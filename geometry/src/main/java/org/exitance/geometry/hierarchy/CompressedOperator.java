package org.exitance.geometry.hierarchy;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;

/**
 * The compressed exchange-area operator K' = D K̃ D of a scene (m²): K̃ the hierarchical
 * low-rank approximation of K_ij = A_i F_ij stored once for both triangles (so K' is symmetric,
 * i.e. reciprocal, by construction) and D = diag(d) the closure scaling ({@link Closure}). The
 * view factors are F' = diag(1/A) K'. Built by {@link OperatorBuilder}; immutable afterwards and
 * safe for concurrent products.
 *
 * <p>Products are split into fixed tasks that do not depend on the thread count: the small
 * factor products W x of every low-rank block first (each into its own slot), then every leaf
 * cluster's rows, adding its contributions in a fixed order. Results are therefore identical bit
 * for bit for any number of threads.
 */
public final class CompressedOperator {

    final ClusterTree tree;
    final List<Block> blocks;
    /** Per leaf: its contributions, 2 × block index (+1 when the block is used transposed). */
    final int[][] contributions;
    /** Position of each facet in tree order. */
    final int[] positionOf;
    /** Exact facet areas in tree order (m²). */
    final double[] area;
    /** Closure scaling per position (1 without closure). */
    double[] scale;
    private final ForkJoinPool pool;
    OperatorReport report;

    CompressedOperator(ClusterTree tree, List<Block> blocks, int[][] contributions, double[] area, int threads) {
        this.tree = tree;
        this.blocks = blocks;
        this.contributions = contributions;
        this.area = area;
        int n = tree.perm.length;
        positionOf = new int[n];
        for (int p = 0; p < n; p++) {
            positionOf[tree.perm[p]] = p;
        }
        scale = new double[n];
        java.util.Arrays.fill(scale, 1);
        pool = new ForkJoinPool(Math.max(1, threads));
    }

    /** @return number of facets */
    public int size() {
        return area.length;
    }

    /** @return exact area of facet i (scene order, m²) */
    public double area(int i) {
        return area[positionOf[i]];
    }

    /** @return what was built: tolerance, ranks, memory, closure correction, error estimate */
    public OperatorReport report() {
        return report;
    }

    /** @return bytes held by the block entries and the index arrays */
    public long bytes() {
        long s = 8L * 3 * area.length;
        for (Block b : blocks) {
            s += b.bytes() + 48;
        }
        for (int[] c : contributions) {
            s += 4L * c.length + 16;
        }
        return s;
    }

    /**
     * Exchange-area product Y = K' V (m² × the unit of V).
     *
     * @param v N × b row-major in scene facet order; not modified
     * @param b columns (bands)
     * @param out N × b row-major; overwritten
     */
    public void multiplyExchangeAreas(double[] v, int b, double[] out) {
        int n = size();
        double[] x = new double[n * b];
        for (int p = 0; p < n; p++) {
            int i = tree.perm[p];
            for (int c = 0; c < b; c++) {
                x[p * b + c] = scale[p] * v[i * b + c];
            }
        }
        double[] y = new double[n * b];
        multiplyTree(x, b, y);
        for (int p = 0; p < n; p++) {
            int i = tree.perm[p];
            for (int c = 0; c < b; c++) {
                out[i * b + c] = scale[p] * y[p * b + c];
            }
        }
    }

    /**
     * View-factor product Y = F' V = diag(1/A) K' V.
     *
     * @param v N × b row-major in scene facet order; not modified
     * @param b columns (bands)
     * @param out N × b row-major; overwritten (may not be {@code v})
     */
    public void multiplyViewFactors(double[] v, int b, double[] out) {
        multiplyExchangeAreas(v, b, out);
        for (int i = 0; i < size(); i++) {
            double inv = 1 / area(i);
            for (int c = 0; c < b; c++) {
                out[i * b + c] *= inv;
            }
        }
    }

    /**
     * Selected rows of F' V, each row of K̃ formed from its blocks (O(N · rank) per row) and applied
     * to V. For many rows (more than N/16) one full product is cheaper and is used instead.
     *
     * @param rows facets whose rows are wanted (scene order); not modified
     * @param v N × b row-major in scene facet order; not modified
     * @param b columns
     * @param out rows.length × b row-major, row r for facet rows[r]; overwritten
     */
    public void multiplyViewFactorRows(int[] rows, double[] v, int b, double[] out) {
        int n = size();
        if (rows.length > n / 16) {
            double[] all = new double[n * b];
            multiplyViewFactors(v, b, all);
            for (int r = 0; r < rows.length; r++) {
                System.arraycopy(all, rows[r] * b, out, r * b, b);
            }
            return;
        }
        double[] x = new double[n * b];
        for (int q = 0; q < n; q++) {
            int j = tree.perm[q];
            for (int c = 0; c < b; c++) {
                x[q * b + c] = scale[q] * v[j * b + c];
            }
        }
        double[] row = new double[n];
        for (int r = 0; r < rows.length; r++) {
            int p = positionOf[rows[r]];
            java.util.Arrays.fill(row, 0);
            addRow(p, row);
            double f = scale[p] / area[p];
            for (int c = 0; c < b; c++) {
                double s = 0;
                for (int q = 0; q < n; q++) {
                    s += row[q] * x[q * b + c];
                }
                out[r * b + c] = f * s;
            }
        }
    }

    /**
     * @return F'_ii, the self view factor of facet i (scene order): 0 for a flat facet, the
     *         share a concave patch sends to itself
     */
    public double diagonal(int i) {
        int p = positionOf[i];
        int leaf = leafOf(p);
        int node = tree.leaves[leaf];
        for (int code : contributions[leaf]) {
            Block blk = blocks.get(code >> 1);
            if (blk.s == node && blk.t == node && blk.dense != null) {
                int q = p - tree.start[node];
                return scale[p] * scale[p] * blk.dense[q * blk.n + q] / area[p];
            }
        }
        return 0;
    }

    /** @return Σ_j F'_ij per facet (scene order, a new array): 1 in a closed enclosure after closure */
    public double[] rowSums() {
        int n = size();
        double[] one = new double[n], y = new double[n];
        java.util.Arrays.fill(one, 1);
        multiplyViewFactors(one, 1, y);
        return y;
    }

    /** y = K̃ x in tree order (no closure scaling); x not modified, y overwritten. */
    void multiplyTree(double[] x, int b, double[] y) {
        java.util.Arrays.fill(y, 0, size() * b, 0);
        int nb = blocks.size();
        int[] zOff = new int[nb + 1];
        for (int k = 0; k < nb; k++) {
            zOff[k + 1] = zOff[k] + 2 * blocks.get(k).rank() * b;
        }
        double[] z = new double[zOff[nb]];
        run(nb, k -> factorProducts(blocks.get(k), x, b, z, zOff[k]));
        run(contributions.length, leaf -> leafRows(leaf, x, b, z, zOff, y));
    }

    private void run(int count, java.util.function.IntConsumer task) {
        pool.submit(() -> IntStream.range(0, count).parallel().forEach(task)).join();
    }

    /** z[off ..] = W x_t (rank × b), then z[off + rank b ..] = U x_s. */
    private void factorProducts(Block blk, double[] x, int b, double[] z, int off) {
        int k = blk.rank();
        int ts = tree.start[blk.t], ss = tree.start[blk.s];
        for (int l = 0; l < k; l++) {
            double[] w = blk.w[l], u = blk.u[l];
            for (int j = 0; j < blk.n; j++) {
                double a = w[j];
                int xo = (ts + j) * b;
                for (int c = 0; c < b; c++) {
                    z[off + l * b + c] += a * x[xo + c];
                }
            }
            int o2 = off + (k + l) * b;
            for (int i = 0; i < blk.m; i++) {
                double a = u[i];
                int xo = (ss + i) * b;
                for (int c = 0; c < b; c++) {
                    z[o2 + c] += a * x[xo + c];
                }
            }
        }
    }

    private void leafRows(int leaf, double[] x, int b, double[] z, int[] zOff, double[] y) {
        int node = tree.leaves[leaf];
        int from = tree.start[node], to = tree.end[node];
        for (int code : contributions[leaf]) {
            Block blk = blocks.get(code >> 1);
            boolean transposed = (code & 1) != 0;
            int k = blk.rank();
            int ss = tree.start[blk.s], ts = tree.start[blk.t];
            for (int p = from; p < to; p++) {
                int yo = p * b;
                if (blk.dense != null) {
                    if (!transposed) {
                        int ro = (p - ss) * blk.n;
                        for (int j = 0; j < blk.n; j++) {
                            double a = blk.dense[ro + j];
                            int xo = (ts + j) * b;
                            for (int c = 0; c < b; c++) {
                                y[yo + c] += a * x[xo + c];
                            }
                        }
                    } else {
                        int col = p - ts;
                        for (int i = 0; i < blk.m; i++) {
                            double a = blk.dense[i * blk.n + col];
                            int xo = (ss + i) * b;
                            for (int c = 0; c < b; c++) {
                                y[yo + c] += a * x[xo + c];
                            }
                        }
                    }
                } else {
                    double[][] f = transposed ? blk.w : blk.u;
                    int q = p - (transposed ? ts : ss);
                    int zo = zOff[code >> 1] + (transposed ? k * b : 0);
                    for (int l = 0; l < k; l++) {
                        double a = f[l][q];
                        for (int c = 0; c < b; c++) {
                            y[yo + c] += a * z[zo + l * b + c];
                        }
                    }
                }
            }
        }
    }

    /**
     * Row p of K̃ (tree order, no closure scaling), added into out.
     *
     * @param out N values in tree order; modified (added to)
     */
    void addRow(int p, double[] out) {
        int leaf = leafOf(p);
        for (int code : contributions[leaf]) {
            Block blk = blocks.get(code >> 1);
            boolean transposed = (code & 1) != 0;
            int ss = tree.start[blk.s], ts = tree.start[blk.t];
            if (blk.dense != null) {
                if (!transposed) {
                    for (int j = 0; j < blk.n; j++) {
                        out[ts + j] += blk.dense[(p - ss) * blk.n + j];
                    }
                } else {
                    for (int i = 0; i < blk.m; i++) {
                        out[ss + i] += blk.dense[i * blk.n + p - ts];
                    }
                }
            } else {
                double[][] f = transposed ? blk.w : blk.u, g = transposed ? blk.u : blk.w;
                int q = p - (transposed ? ts : ss), o = transposed ? ss : ts;
                for (int l = 0; l < blk.rank(); l++) {
                    double a = f[l][q];
                    double[] gl = g[l];
                    for (int j = 0; j < gl.length; j++) {
                        out[o + j] += a * gl[j];
                    }
                }
            }
        }
    }

    private int leafOf(int p) {
        int v = 0;
        while (!tree.leaf(v)) {
            v = p < tree.end[tree.child1[v]] ? tree.child1[v] : tree.child2[v];
        }
        return tree.leafLo[v];
    }
}
