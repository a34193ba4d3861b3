package org.exitance.network;

/**
 * Strategy for the linear system of one band's radiosity network,
 * {@code (I − diag(ρ) F − T F) J = b}, where F is the N×N view-factor matrix (row-major), ρ the
 * band reflectivities, T the window coupling ({@link WindowCoupling}: row i holds τ_i in the column
 * block of its other face, zero without windows) and b the source vector (W/m²).
 *
 * <p>Two strategies exist: {@link DirectRadiositySolver} (blocked in-place LU, exact to round-off,
 * O(N³) once then O(N²) per right-hand side) and {@link ConjugateGradientRadiositySolver} (the
 * symmetric form with a Jacobi preconditioner and a coarse correction, O(N²) per iteration).
 * {@link #forSize(int, boolean)} is a rule for callers that need a band solver alone; a
 * temperature solve chooses its band solver and its Newton step together (thermal.SolverChoice).
 */
public interface RadiositySolver {

    /** Above this many surfaces (or facets) {@link #forSize} switches to conjugate gradients. */
    int DIRECT_LIMIT = 2000;

    /** The strategy's name for reports, e.g. "direct LU". */
    String name();

    /**
     * Bytes one prepared band operator of N surfaces holds at its peak (the estimate the
     * memory check makes before every band is prepared); saturates at Long.MAX_VALUE.
     */
    long preparedBytes(int n);

    /** Whether the strategy solves enclosures with windows (whose coupled matrix is unsymmetric). */
    boolean supportsWindows();

    /**
     * Prepares the operator of one band.
     *
     * @param viewFactors  F, N×N row-major, not modified
     * @param n            N
     * @param reflectivity ρ per surface in [0, 1], not modified
     * @param areasM2      areas (m²), used by the symmetric form; not modified
     * @return a prepared operator that solves for any right-hand side
     */
    default Prepared prepare(double[] viewFactors, int n, double[] reflectivity, double[] areasM2) {
        return prepare(viewFactors, n, reflectivity, areasM2, WindowCoupling.none());
    }

    /**
     * Prepares the operator of one band with windows.
     *
     * @param windows  τ and other face per surface, not modified
     * @throws IllegalArgumentException if the strategy cannot handle windows (conjugate gradients)
     */
    Prepared prepare(double[] viewFactors, int n, double[] reflectivity, double[] areasM2, WindowCoupling windows);

    /**
     * Prepares the operator of one band from a {@link RadiationOperator}. Strategies that work from
     * products alone (conjugate gradients) use the operator; the direct strategy factors the dense
     * array.
     *
     * @param operator     F as an operator, not modified
     * @param viewFactors  F, N×N row-major, not modified; may be null for a strategy that works from
     *                     the operator alone
     * @throws IllegalArgumentException if the strategy needs the dense array and it is null
     */
    default Prepared prepare(RadiationOperator operator, double[] viewFactors, double[] reflectivity,
                             double[] areasM2, WindowCoupling windows) {
        if (viewFactors == null) {
            throw new IllegalArgumentException(name() + " needs the dense view-factor matrix");
        }
        return prepare(viewFactors, operator.size(), reflectivity, areasM2, windows);
    }

    /** A band operator ready to solve. */
    interface Prepared {
        /**
         * Solves {@code (I − diag(ρ) F − T F) J = b}.
         *
         * @param b  right-hand side (W/m²), not modified
         * @param j  receives J (W/m²); modified
         * @throws NetworkConvergenceException if an iterative method does not reach its tolerance
         */
        void solve(double[] b, double[] j);

        /**
         * Solves for several right-hand sides at once: {@code (I − diag(ρ) F − T F) X = B}, with B
         * and X N×cols row-major (row i at [i·cols, (i+1)·cols)). The direct strategy does this with
         * one factorization and one residual check of the block; the default solves column by column.
         *
         * @param b     right-hand sides (W/m² or per unit), N×cols; not modified unless it is x itself
         * @param cols  number of right-hand sides
         * @param x     receives X, N×cols; modified (may be the same array as b: solved in place)
         */
        default void solveBlock(double[] b, int cols, double[] x) {
            int n = b.length / Math.max(cols, 1);
            double[] col = new double[n];
            double[] out = new double[n];
            for (int c = 0; c < cols; c++) { // column c is read before it is overwritten
                for (int i = 0; i < n; i++) {
                    col[i] = b[i * cols + c];
                }
                solve(col, out);
                for (int i = 0; i < n; i++) {
                    x[i * cols + c] = out[i];
                }
            }
        }

        /**
         * The largest relative residual {@code ‖b − AJ‖∞ / ‖b‖∞} the strategy accepts; the band
         * network checks every solve against it with the product F·J it computes anyway.
         */
        double acceptedResidual();

        /** Iterations used by the last solve (1 for a direct solve). */
        int lastIterations();

        /**
         * Relative residual ‖b − AJ‖∞ / ‖b‖∞ of the last solve, as the strategy knows it without an
         * extra product (0 for a direct solve, whose residual the network measures).
         */
        double lastRelativeResidual();
    }

    /**
     * The default rule: direct LU whenever the enclosure has a window (the window coupling makes
     * the matrix unsymmetric, so conjugate gradients do not apply), and otherwise up to
     * {@link #DIRECT_LIMIT} surfaces; conjugate gradients for larger enclosures without windows.
     *
     * @param n        surfaces
     * @param windows  whether some surface is a window face
     */
    static RadiositySolver forSize(int n, boolean windows) {
        return windows || n <= DIRECT_LIMIT ? new DirectRadiositySolver()
                : new ConjugateGradientRadiositySolver(1e-12, 10 * n + 1000);
    }

    /** ‖b − (I − diag(ρ)F) x‖∞ / max(‖b‖∞, tiny); all arrays not modified. */
    static double relativeResidual(double[] f, int n, double[] rho, double[] b, double[] x) {
        return relativeResidual(f, n, rho, WindowCoupling.none(), b, x);
    }

    /** ‖b − (I − diag(ρ)F − T F) x‖∞ / max(‖b‖∞, tiny); all arrays not modified. */
    static double relativeResidual(double[] f, int n, double[] rho, WindowCoupling w, double[] b, double[] x) {
        double worst = 0;
        double scale = 0;
        for (int i = 0; i < n; i++) {
            double r = b[i] - w.rowTimes(f, n, rho, x, i);
            worst = Math.max(worst, Math.abs(r));
            scale = Math.max(scale, Math.abs(b[i]));
        }
        return scale > 0 ? worst / scale : worst;
    }
}
