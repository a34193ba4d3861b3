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
 *
 * <p>Past the dense wall the matrix is held compressed ({@link #compressed}): only its products
 * exist ({@link #products()}), and what needs single entries or the whole array ({@link #get},
 * {@link #sharedRowMajor}, {@link #toRows}) throws {@link DenseOnly}; the layers that would call
 * them refuse such a model first, with a message for the user.
 */
public final class ViewFactorMatrix {
    private final int n;
    private final double[] data;
    private final ViewFactorProducts products;
    private double[] rowSums;

    private ViewFactorMatrix(double[] data, int n) {
        this.n = n;
        this.data = data;
        this.products = null;
    }

    private ViewFactorMatrix(ViewFactorProducts products) {
        this.n = products.size();
        this.data = null;
        this.products = products;
    }

    /** What needs the entries of a matrix that is held compressed. */
    public static final class DenseOnly extends UnsupportedOperationException {
        private static final long serialVersionUID = 1L;

        DenseOnly(String what) {
            super(what + " needs the dense view-factor matrix, which this model holds compressed"
                    + " (geometry.options.storage)");
        }
    }

    /**
     * A matrix held as a compressed operator (not copied).
     *
     * @param products the operator; shared, not modified
     */
    public static ViewFactorMatrix compressed(ViewFactorProducts products) {
        return new ViewFactorMatrix(products);
    }

    /** Whether the entries are held (false: only products, {@link #products()}). */
    public boolean isDense() {
        return products == null;
    }

    /** The compressed operator, or null for a dense matrix. */
    public ViewFactorProducts products() {
        return products;
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
        if (data == null) {
            throw new DenseOnly("a single view factor");
        }
        return data[i * n + j];
    }

    /** Σ_j F_ij, summed in column order. */
    public double rowSum(int i) {
        if (data == null) {
            synchronized (this) {
                if (rowSums == null) {
                    rowSums = products.rowSums();
                }
            }
            return rowSums[i];
        }
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
        if (data == null) {
            throw new DenseOnly("the row-major view-factor array");
        }
        return data;
    }

    /** A copy as rows. */
    public double[][] toRows() {
        if (data == null) {
            throw new DenseOnly("the view-factor matrix as rows");
        }
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
        if (data == null) {
            return new ViewFactorMatrix(new PermutedProducts(products, order));
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
