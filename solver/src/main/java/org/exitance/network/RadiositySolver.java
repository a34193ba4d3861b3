package org.exitance.network;

/**
 * Strategy for the linear system of one band's radiosity network,
 * {@code (I − diag(ρ) F) J = b}, where F is the N×N view-factor matrix (row-major), ρ the
 * band reflectivities and b the source vector (W/m²).
 *
 * <p>Two strategies exist: {@link DirectRadiositySolver} (LU, exact to round-off, O(N³) once
 * then O(N²) per right-hand side) and {@link ConjugateGradientRadiositySolver} (the symmetric
 * form with a Jacobi preconditioner, O(N²) per iteration). {@link #forSize(int)} states the
 * rule that picks one.
 */
public interface RadiositySolver {

    /** Above this many surfaces (or facets) the default rule switches to conjugate gradients. */
    int DIRECT_LIMIT = 2000;

    /**
     * Prepares the operator of one band.
     *
     * @param viewFactors  F, N×N row-major, not modified
     * @param n            N
     * @param reflectivity ρ per surface in [0, 1], not modified
     * @param areasM2      areas (m²), used by the symmetric form; not modified
     * @return a prepared operator that solves for any right-hand side
     */
    Prepared prepare(double[] viewFactors, int n, double[] reflectivity, double[] areasM2);

    /** A band operator ready to solve. */
    interface Prepared {
        /**
         * Solves {@code (I − diag(ρ) F) J = b}.
         *
         * @param b  right-hand side (W/m²), not modified
         * @param j  receives J (W/m²); modified
         * @throws NetworkConvergenceException if an iterative method does not reach its tolerance
         */
        void solve(double[] b, double[] j);

        /** Iterations used by the last solve (1 for a direct solve). */
        int lastIterations();

        /** Relative residual ‖b − AJ‖∞ / ‖b‖∞ of the last solve. */
        double lastRelativeResidual();
    }

    /** The default rule: direct LU up to {@link #DIRECT_LIMIT} surfaces, conjugate gradients above. */
    static RadiositySolver forSize(int n) {
        return n <= DIRECT_LIMIT ? new DirectRadiositySolver() : new ConjugateGradientRadiositySolver(1e-12, 10 * n + 1000);
    }

    /** ‖b − (I − diag(ρ)F) x‖∞ / max(‖b‖∞, tiny); all arrays not modified. */
    static double relativeResidual(double[] f, int n, double[] rho, double[] b, double[] x) {
        double worst = 0;
        double scale = 0;
        for (int i = 0; i < n; i++) {
            double s = 0;
            int row = i * n;
            for (int k = 0; k < n; k++) {
                s += f[row + k] * x[k];
            }
            double r = b[i] - (x[i] - rho[i] * s);
            worst = Math.max(worst, Math.abs(r));
            scale = Math.max(scale, Math.abs(b[i]));
        }
        return scale > 0 ? worst / scale : worst;
    }
}
