package org.exitance.network;

/**
 * One band prepared for conjugate gradients on the symmetric form (the method, preconditioner
 * and stopping rule are documented in {@link ConjugateGradientRadiositySolver}). Vectors are of
 * full length N; a black row (ρ_i = 0) holds zero in every search vector and its known J_i = b_i
 * enters the right-hand side.
 */
final class SymmetricBand implements RadiositySolver.Prepared {
    final RadiationOperator op;
    final int n;
    final double[] rho;
    final double[] area;
    final boolean[] free;
    private final double[] diag;
    private final double coarse;
    private final double tol;
    private final int maxIterations;
    int iterations;
    double residual;

    /**
     * @param op    the view-factor operator (shared, not modified)
     * @param rho   ρ per surface; kept, not modified
     * @param area  A per surface (m²); kept, not modified
     */
    SymmetricBand(RadiationOperator op, double[] rho, double[] area, double tol, int maxIterations) {
        this.op = op;
        this.n = op.size();
        this.rho = rho;
        this.area = area;
        this.tol = tol;
        this.maxIterations = maxIterations;
        free = new boolean[n];
        diag = new double[n];
        boolean allFree = true;
        double[] ones = new double[n];
        for (int i = 0; i < n; i++) {
            free[i] = rho[i] > 0;
            allFree &= free[i];
            ones[i] = free[i] ? 1.0 : 0.0;
            diag[i] = free[i] ? area[i] / rho[i] - area[i] * op.diagonal(i) : 1.0;
        }
        double[] fo;
        if (allFree) {
            fo = op.rowSums();
        } else {
            fo = new double[n];
            op.multiply(ones, 1, fo);
        }
        double zsz = 0;
        for (int i = 0; i < n; i++) {
            if (free[i]) {
                zsz += area[i] / rho[i] - area[i] * fo[i];
            }
        }
        coarse = zsz > 0 ? 1.0 / zsz : 0.0;
    }

    /**
     * Tolerance factor of the flux responses behind Newton–Krylov products: they only steer the
     * Newton step (GMRES asks for 1e-6 of the Newton residual), never the converged residual, which
     * every path evaluates with full band solves.
     */
    static final double RESPONSE_RELAXATION = 1e6;

    @Override
    public void solve(double[] b, double[] j) {
        FusedConjugateGradients.solve(new SymmetricBand[] {this}, new double[][] {b}, new double[][] {j}, 1.0, false,
                null, null, null);
    }

    /**
     * The heat test of the class doc on the recurrence residual; sets {@link #residual}.
     *
     * @param global  false: each surface against the power it radiates and receives (band solves);
     *                true: each surface against the largest such power of the enclosure, the rule of
     *                a flux response, whose many zero sources would make a per-surface test
     *                needlessly strict for a product that only steers a Newton step
     */
    boolean converged(double[] b, double[] y, double[] r, double relax, boolean global) {
        boolean ok = true;
        double worst = 0;
        double scale = 0;
        for (double v : b) {
            scale = Math.max(scale, Math.abs(v));
        }
        double largest = 0;
        if (global) {
            for (int i = 0; i < n; i++) {
                if (free[i]) {
                    largest = Math.max(largest, area[i] * (Math.abs(b[i]) + Math.abs(y[i])));
                }
            }
        }
        for (int i = 0; i < n; i++) {
            if (free[i]) {
                double heat = rho[i] * r[i]; // A_i r_i (W)
                double power = global ? largest : area[i] * (Math.abs(b[i]) + Math.abs(y[i]));
                if (Math.abs(heat) > relax * tol * power) {
                    ok = false;
                }
                worst = Math.max(worst, Math.abs(heat) / area[i]);
            }
        }
        residual = scale > 0 ? worst / scale : worst;
        return ok;
    }

    void checkProgress() {
        if (iterations >= maxIterations) {
            throw new NetworkConvergenceException("conjugate gradients did not converge in " + iterations
                    + " iterations (relative residual " + residual + "; a nearly perfectly reflecting band"
                    + " converges slowly)", iterations, residual);
        }
    }

    /** z = (D⁻¹ + 1 (1ᵀS1)⁻¹ 1ᵀ) r on the free rows, 0 on black rows; r not modified, z modified. */
    void precondition(double[] r, double[] z) {
        double sum = 0;
        for (int i = 0; i < n; i++) {
            if (free[i]) {
                sum += r[i];
            }
        }
        double shift = coarse * sum;
        for (int i = 0; i < n; i++) {
            z[i] = free[i] ? r[i] / diag[i] + shift : 0.0;
        }
    }

    @Override
    public double acceptedResidual() {
        return Math.max(1e-8, 1e3 * tol);
    }

    @Override
    public int lastIterations() {
        return iterations;
    }

    @Override
    public double lastRelativeResidual() {
        return residual;
    }
}
