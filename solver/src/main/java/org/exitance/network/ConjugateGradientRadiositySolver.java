package org.exitance.network;

/**
 * Preconditioned conjugate gradients on the symmetric form of the radiosity equations.
 *
 * <p>Row i of {@code (I − diag(ρ)F) J = b} multiplied by {@code A_i/ρ_i} gives
 * {@code S J = c} with {@code S = diag(A/ρ) − diag(A) F} and {@code c_i = A_i b_i / ρ_i}.
 * With reciprocity {@code A_i F_ij = A_j F_ji}, S is symmetric, and positive definite when the
 * enclosure absorbs something in the band (Modest, Radiative Heat Transfer, 3rd ed., §5.5,
 * on the symmetric radiosity matrix; conjugate gradients: Saad, Iterative Methods for Sparse
 * Linear Systems, 2nd ed., Alg. 9.1). Rows with ρ_i = 0 are black: J_i = b_i is known and moves
 * to the right-hand side. The preconditioner is the diagonal (Jacobi).
 *
 * <p>The stopping test is on the residual of the original (unsymmetrized) system, so a view-factor
 * matrix with imperfect reciprocity is still solved to the stated tolerance or reported.
 */
public final class ConjugateGradientRadiositySolver implements RadiositySolver {
    private final double relativeTolerance;
    private final int maxIterations;

    /**
     * @param relativeTolerance stop when ‖b − AJ‖∞ ≤ tol · ‖b‖∞
     * @param maxIterations     iterations allowed before {@link NetworkConvergenceException}
     */
    public ConjugateGradientRadiositySolver(double relativeTolerance, int maxIterations) {
        this.relativeTolerance = relativeTolerance;
        this.maxIterations = maxIterations;
    }

    @Override
    public String name() {
        return "conjugate gradients";
    }

    @Override
    public boolean supportsWindows() {
        return false;
    }

    /** A few work vectors of N doubles: the operator is applied from F itself. */
    @Override
    public long preparedBytes(int n) {
        return 16L * Double.BYTES * n;
    }

    /** Opaque enclosures only: a window's coupling breaks the symmetry this method needs. */
    @Override
    public Prepared prepare(double[] f, int n, double[] rho, double[] area, WindowCoupling windows) {
        if (!windows.isEmpty()) {
            throw new IllegalArgumentException("conjugate gradients need a symmetric radiosity matrix; an enclosure"
                    + " with windows needs the direct solver (RadiositySolver.forSize)");
        }
        // Unknown (non-black) rows.
        int[] free = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (rho[i] > 0) {
                free[m++] = i;
            }
        }
        final int[] idx = java.util.Arrays.copyOf(free, m);
        final int count = m;
        double[] diag = new double[count];
        for (int a = 0; a < count; a++) {
            int i = idx[a];
            diag[a] = area[i] / rho[i] - area[i] * f[i * n + i];
        }
        return new Prepared() {
            private int iterations;
            private double residual;

            @Override
            public void solve(double[] b, double[] j) {
                // Known black radiosities.
                double[] x = new double[n];
                for (int i = 0; i < n; i++) {
                    if (!(rho[i] > 0)) {
                        x[i] = b[i];
                    }
                }
                // c = A_i b_i/ρ_i + A_i Σ_{black k} F_ik J_k  for free rows
                double[] c = new double[count];
                for (int a = 0; a < count; a++) {
                    int i = idx[a];
                    double s = 0;
                    int row = i * n;
                    for (int k = 0; k < n; k++) {
                        if (!(rho[k] > 0)) {
                            s += f[row + k] * x[k];
                        }
                    }
                    c[a] = area[i] * b[i] / rho[i] + area[i] * s;
                }
                double[] y = new double[count];
                for (int a = 0; a < count; a++) {
                    y[a] = c[a] / diag[a]; // Jacobi start
                }
                double[] r = new double[count];
                double[] z = new double[count];
                double[] p = new double[count];
                double[] q = new double[count];
                multiply(y, q);
                for (int a = 0; a < count; a++) {
                    r[a] = c[a] - q[a];
                    z[a] = r[a] / diag[a];
                    p[a] = z[a];
                }
                double rz = dot(r, z);
                iterations = 0;
                residual = Double.POSITIVE_INFINITY;
                while (true) {
                    for (int a = 0; a < count; a++) {
                        x[idx[a]] = y[a];
                    }
                    residual = RadiositySolver.relativeResidual(f, n, rho, b, x);
                    if (residual <= relativeTolerance || count == 0) {
                        break;
                    }
                    if (iterations >= maxIterations) {
                        throw new NetworkConvergenceException("conjugate gradients did not converge in "
                                + iterations + " iterations (relative residual " + residual + ")",
                                iterations, residual);
                    }
                    multiply(p, q);
                    double pq = dot(p, q);
                    if (!(pq > 0)) {
                        throw new NetworkConvergenceException("conjugate gradients broke down (matrix not positive"
                                + " definite: check reciprocity and that the band has some absorption)",
                                iterations, residual);
                    }
                    double alpha = rz / pq;
                    for (int a = 0; a < count; a++) {
                        y[a] += alpha * p[a];
                        r[a] -= alpha * q[a];
                        z[a] = r[a] / diag[a];
                    }
                    double rzNew = dot(r, z);
                    double beta = rzNew / rz;
                    rz = rzNew;
                    for (int a = 0; a < count; a++) {
                        p[a] = z[a] + beta * p[a];
                    }
                    iterations++;
                }
                System.arraycopy(x, 0, j, 0, n);
            }

            /** out = S v on the free rows; v not modified, out modified. */
            private void multiply(double[] v, double[] out) {
                for (int a = 0; a < count; a++) {
                    int i = idx[a];
                    int row = i * n;
                    double s = 0;
                    for (int bb = 0; bb < count; bb++) {
                        s += f[row + idx[bb]] * v[bb];
                    }
                    out[a] = area[i] / rho[i] * v[a] - area[i] * s;
                }
            }

            @Override
            public int lastIterations() {
                return iterations;
            }

            @Override
            public double lastRelativeResidual() {
                return residual;
            }
        };
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }
}
