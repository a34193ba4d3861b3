package org.exitance.network;

/**
 * What the iterative band solves need from the view-factor matrix F (N×N, dimensionless): its
 * products with blocks of vectors, a few of its rows, its diagonal and its row sums. The dense
 * implementation ({@link #dense}) holds F itself; a compressed one (hierarchical low-rank blocks)
 * can stand in for it wherever this interface is used: conjugate gradients on the symmetric form
 * ({@link ConjugateGradientRadiositySolver}), the fused multi-band solves and flux responses
 * ({@link NetworkGroup}) and the F products of {@link BandNetwork}. The direct (LU) paths keep the
 * plain dense array.
 *
 * <p>Contract for every implementation: results do not depend on the thread count (each entry of
 * a product is formed in a fixed order); blocks are row-major, row i of an N×b block at
 * {@code [i·b, (i+1)·b)}, one column per band, so one pass over the operator serves all bands.
 */
public interface RadiationOperator {

    /** N, the number of surfaces (facets). */
    int size();

    /**
     * {@code W = F V} for an N×b block.
     *
     * @param v     V, N×b row-major; not modified
     * @param cols  b ≥ 1
     * @param w     receives F V, N×b row-major; modified (must not be v)
     */
    void multiply(double[] v, int cols, double[] w);

    /**
     * Selected rows of {@code F V}.
     *
     * @param rows  the rows wanted (surface indices); not modified
     * @param v     V, N×b row-major; not modified
     * @param cols  b ≥ 1
     * @param w     receives row rows[r] of F V at {@code [r·b, (r+1)·b)}; modified
     */
    void multiplyRows(int[] rows, double[] v, int cols, double[] w);

    /** F_ii (0 for a flat facet). */
    double diagonal(int i);

    /** Σ_j F_ij per row (a new array; 1 in a closed enclosure, less where the environment is seen). */
    double[] rowSums();

    /** Bytes the operator holds (8N² for the dense matrix). */
    long memoryBytes();

    /**
     * Passes over the operator so far: a product of all N rows counts 1, of r rows r/N, whatever
     * the number of columns (the benchmark's measure of work).
     */
    double passes();

    /**
     * The dense operator over F itself.
     *
     * @param f  F, N×N row-major; shared, not copied, not modified
     */
    static RadiationOperator dense(double[] f, int n) {
        return new DenseRadiationOperator(f, n);
    }
}
