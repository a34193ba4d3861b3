package org.exitance.model;

/**
 * An N×N view-factor matrix held once, row-major: entry (i, j) is F_ij, the fraction of the
 * diffuse radiation leaving surface i that reaches surface j (dimensionless).
 *
 * <p>Ownership: the matrix owns its array. {@link #copyOf(double[][])} copies the caller's rows
 * once; {@link #adopt(double[], int)} takes the caller's row-major array without copying (the
 * caller must not touch it afterwards). Every layer above (the enclosure, the solver's arrays,
 * the band networks) shares this one array read-only, through {@link #sharedRowMajor()}: at
 * 10,000 facets one copy is 800 MB, so no layer makes its own.
 */
public final class ViewFactorMatrix {
    private final int n;
    private final double[] data;

    private ViewFactorMatrix(double[] data, int n) {
        this.n = n;
        this.data = data;
    }

    /**
     * A matrix from rows (copied once).
     *
     * @param rows  N rows of N entries each; not modified
     * @throws IllegalArgumentException if the rows are not square
     */
    public static ViewFactorMatrix copyOf(double[][] rows) {
        int n = rows.length;
        double[] d = new double[Math.multiplyExact(n, n)];
        for (int i = 0; i < n; i++) {
            if (rows[i].length != n) {
                throw new IllegalArgumentException("view-factor row " + i + " has " + rows[i].length + " entries for "
                        + n + " surfaces");
            }
            System.arraycopy(rows[i], 0, d, i * n, n);
        }
        return new ViewFactorMatrix(d, n);
    }

    /**
     * A matrix that takes ownership of a row-major array (no copy).
     *
     * @param rowMajor  N·N entries, row i at [i·N, (i+1)·N); owned by the matrix from now on
     * @param n         N
     */
    public static ViewFactorMatrix adopt(double[] rowMajor, int n) {
        if (rowMajor.length != (long) n * n) {
            throw new IllegalArgumentException("view-factor array has " + rowMajor.length + " entries for " + n
                    + " surfaces");
        }
        return new ViewFactorMatrix(rowMajor, n);
    }

    /** N. */
    public int size() {
        return n;
    }

    /** F_ij. */
    public double get(int i, int j) {
        return data[i * n + j];
    }

    /** Σ_j F_ij, summed in column order. */
    public double rowSum(int i) {
        double s = 0;
        int row = i * n;
        for (int j = 0; j < n; j++) {
            s += data[row + j];
        }
        return s;
    }

    /**
     * The row-major array itself, shared: read it, never modify it. For hot loops (band
     * networks, linear solvers) that must not copy 8·N² bytes.
     */
    public double[] sharedRowMajor() {
        return data;
    }

    /** A copy as rows. */
    public double[][] toRows() {
        double[][] out = new double[n][n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(data, i * n, out[i], 0, n);
        }
        return out;
    }

    /** The matrix with rows and columns reordered: new index a holds old index order[a] (a new array). */
    public ViewFactorMatrix permuted(int[] order) {
        if (order.length != n) {
            throw new IllegalArgumentException("permutation of length " + order.length + " for " + n + " surfaces");
        }
        double[] d = new double[data.length];
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                d[a * n + b] = data[order[a] * n + order[b]];
            }
        }
        return new ViewFactorMatrix(d, n);
    }
}
