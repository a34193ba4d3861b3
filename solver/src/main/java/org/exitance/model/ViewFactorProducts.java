package org.exitance.model;

/**
 * The view factors of a model too large for the dense N×N matrix, given by their products only
 * (a compressed operator built from the geometry: hierarchical low-rank blocks). F stays
 * dimensionless; blocks are row-major, row i of an N×b block at {@code [i·b, (i+1)·b)}.
 *
 * <p>Contract: results do not depend on the thread count; the operator is reciprocal
 * (A_i F_ij = A_j F_ji) and, for a closed enclosure, closed; {@link #errorEstimate} states how
 * far a row may be from the exact one.
 */
public interface ViewFactorProducts {

    /** N. */
    int size();

    /**
     * {@code W = F V}.
     *
     * @param v    N×b row-major; not modified
     * @param cols b ≥ 1
     * @param w    receives F V, N×b; modified (must not be v)
     */
    void multiply(double[] v, int cols, double[] w);

    /**
     * Selected rows of {@code F V}.
     *
     * @param rows the rows wanted; not modified
     * @param v    N×b row-major; not modified
     * @param cols b ≥ 1
     * @param w    receives row rows[r] of F V at {@code [r·b, (r+1)·b)}; modified
     */
    void multiplyRows(int[] rows, double[] v, int cols, double[] w);

    /** F_ii. */
    double diagonal(int i);

    /** Σ_j F_ij per row (a new array). */
    double[] rowSums();

    /** Bytes the operator holds. */
    long memoryBytes();

    /** The stated estimate of max_i Σ_j |F_ij − exact F_ij| (dimensionless). */
    double errorEstimate();

    /** One line: what the operator is (blocks, memory, tolerance). */
    String description();
}
