package org.exitance.network;

import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;

/**
 * LU factorization with partial pivoting, in place on one row-major N×N array: right-looking and
 * blocked (panels of {@link #PANEL} columns; the trailing update {@code A22 −= L21 U12} is a
 * matrix product done in column chunks that stay in cache), as in Golub &amp; Van Loan, Matrix
 * Computations, 4th ed., §3.2.11 (block LU) and §3.4 (partial pivoting).
 *
 * <p>Memory: the factors overwrite the array; nothing else of size N² is allocated. Work is
 * split by rows (factorization) or by right-hand-side columns (solves) over the fork-join pool
 * the caller runs in (also used for the m×m Newton step of the temperature solve); every entry
 * is computed by the same operations in the same order whatever the split, so the factors and
 * solutions are bit-for-bit the same for any thread count. The trailing update, nearly all of
 * the 2N³/3 operations, is a {@link TrailingKernel}: the vector-API one when the JVM has its
 * module, otherwise plain Java, with the same factors bit for bit.
 */
public final class DenseLu {
    /** Panel width (columns factored together). */
    static final int PANEL = 64;
    /** Column chunk of the trailing update and of block solves (doubles). */
    private static final int CHUNK = 256;

    private final int n;
    private final double[] a;
    private final int[] pivot;
    private final TrailingKernel kernel;

    /**
     * Factors {@code a} in place.
     *
     * @param a  N×N row-major; modified: holds L (unit, below the diagonal) and U afterwards, and
     *           is kept by this object
     * @param n  N
     * @return the factorization, or null when a pivot is exactly zero (the matrix is singular)
     */
    public static DenseLu factor(double[] a, int n) {
        return factor(a, n, TrailingKernel.best());
    }

    /** As {@link #factor(double[], int)}, with the trailing update done by {@code kernel}. */
    static DenseLu factor(double[] a, int n, TrailingKernel kernel) {
        DenseLu lu = new DenseLu(a, n, kernel);
        return lu.run() ? lu : null;
    }

    private DenseLu(double[] a, int n, TrailingKernel kernel) {
        this.n = n;
        this.a = a;
        this.pivot = new int[n];
        this.kernel = kernel;
    }

    private boolean run() {
        for (int kb = 0; kb < n; kb += PANEL) {
            int ke = Math.min(kb + PANEL, n);
            if (!panel(kb, ke)) {
                return false;
            }
            // U12: rows kb..ke, columns ke..n, by forward substitution with the panel's unit L11.
            for (int k = kb; k < ke; k++) {
                int rk = k * n;
                for (int i = k + 1; i < ke; i++) {
                    int ri = i * n;
                    double l = a[ri + k];
                    if (l != 0) {
                        for (int j = ke; j < n; j++) {
                            a[ri + j] -= l * a[rk + j];
                        }
                    }
                }
            }
            if (ke < n) {
                trailing(kb, ke);
            }
        }
        return true;
    }

    /** Factors columns kb..ke of rows kb..n (unblocked), swapping whole rows. */
    private boolean panel(int kb, int ke) {
        for (int k = kb; k < ke; k++) {
            int p = k;
            double best = Math.abs(a[k * n + k]);
            for (int i = k + 1; i < n; i++) {
                double v = Math.abs(a[i * n + k]);
                if (v > best) {
                    best = v;
                    p = i;
                }
            }
            if (!(best > 0) || !Double.isFinite(best)) {
                return false;
            }
            pivot[k] = p;
            if (p != k) {
                int rp = p * n;
                int rk = k * n;
                for (int j = 0; j < n; j++) {
                    double t = a[rk + j];
                    a[rk + j] = a[rp + j];
                    a[rp + j] = t;
                }
            }
            int rk = k * n;
            double inv = 1.0 / a[rk + k];
            for (int i = k + 1; i < n; i++) {
                int ri = i * n;
                double l = a[ri + k] * inv;
                a[ri + k] = l;
                if (l != 0) {
                    for (int j = k + 1; j < ke; j++) {
                        a[ri + j] -= l * a[rk + j];
                    }
                }
            }
        }
        return true;
    }

    /** A22 −= L21 U12 for rows and columns ke..n; row blocks in parallel, columns in chunks. */
    private void trailing(int kb, int ke) {
        int rows = n - ke;
        int blocks = Math.max(1, Math.min(rows / 16, 4 * ForkJoinPool.getCommonPoolParallelism() + 4));
        IntStream.range(0, blocks).parallel().forEach(blk -> {
            int i0 = ke + (int) ((long) rows * blk / blocks);
            int i1 = ke + (int) ((long) rows * (blk + 1) / blocks);
            for (int j0 = ke; j0 < n; j0 += CHUNK) {
                kernel.update(a, n, a, n, kb, ke, i0, i1, j0, Math.min(j0 + CHUNK, n));
            }
        });
    }

    /**
     * Solves {@code A x = b} for one right-hand side.
     *
     * @param b  right-hand side, not modified
     * @param x  receives the solution; modified
     */
    public void solve(double[] b, double[] x) {
        if (x != b) {
            System.arraycopy(b, 0, x, 0, n);
        }
        for (int k = 0; k < n; k++) {
            int p = pivot[k];
            if (p != k) {
                double t = x[k];
                x[k] = x[p];
                x[p] = t;
            }
        }
        for (int i = 0; i < n; i++) {
            int ri = i * n;
            double s = x[i];
            for (int k = 0; k < i; k++) {
                s -= a[ri + k] * x[k];
            }
            x[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            int ri = i * n;
            double s = x[i];
            for (int k = i + 1; k < n; k++) {
                s -= a[ri + k] * x[k];
            }
            x[i] = s / a[ri + i];
        }
    }

    /**
     * Solves {@code A X = B} for N×cols row-major B; column chunks in parallel.
     *
     * @param x  on entry B, on return X (N×cols row-major); modified
     */
    void solveInPlace(double[] x, int cols) {
        for (int k = 0; k < n; k++) {
            int p = pivot[k];
            if (p != k) {
                for (int c = 0; c < cols; c++) {
                    double t = x[k * cols + c];
                    x[k * cols + c] = x[p * cols + c];
                    x[p * cols + c] = t;
                }
            }
        }
        int width = 64;
        int chunks = (cols + width - 1) / width;
        IntStream.range(0, chunks).parallel().forEach(ch -> {
            int c0 = ch * width;
            int c1 = Math.min(c0 + width, cols);
            // forward, unit L: row block by row block; the rows above a block are applied a k-block
            // at a time, so that strip of X stays in cache for the whole row block
            for (int ib = 0; ib < n; ib += PANEL) {
                int ie = Math.min(ib + PANEL, n);
                for (int kb = 0; kb < ib; kb += PANEL) {
                    eliminate(x, cols, ib, ie, kb, Math.min(kb + PANEL, ib), c0, c1);
                }
                for (int i = ib; i < ie; i++) {
                    eliminate(x, cols, i, i + 1, ib, i, c0, c1);
                }
            }
            // backward, U: row blocks from the bottom; within a block rows from the bottom
            for (int ib = (n - 1) / PANEL * PANEL; ib >= 0; ib -= PANEL) {
                int ie = Math.min(ib + PANEL, n);
                for (int kb = ie; kb < n; kb += PANEL) {
                    eliminate(x, cols, ib, ie, kb, Math.min(kb + PANEL, n), c0, c1);
                }
                for (int i = ie - 1; i >= ib; i--) {
                    eliminate(x, cols, i, i + 1, i + 1, ie, c0, c1);
                    double d = a[i * n + i];
                    int xi = i * cols;
                    for (int c = c0; c < c1; c++) {
                        x[xi + c] /= d;
                    }
                }
            }
        });
    }

    /** X[i, c0..c1) −= Σ_{k in k0..k1} A[i][k] X[k, c0..c1) for rows i in i0..i1, k ascending; x modified. */
    private void eliminate(double[] x, int cols, int i0, int i1, int k0, int k1, int c0, int c1) {
        kernel.update(a, n, x, cols, k0, k1, i0, i1, c0, c1);
    }
}
