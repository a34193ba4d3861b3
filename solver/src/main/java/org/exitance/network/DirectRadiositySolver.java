package org.exitance.network;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;

/**
 * LU factorization with partial pivoting (EJML) of {@code I − diag(ρ) F − T F} (T: the window
 * coupling, {@link WindowCoupling}; absent for opaque enclosures). It handles the unsymmetric
 * matrix that windows produce. The matrix is
 * non-singular whenever every closed sub-enclosure has some absorption (some ρ &lt; 1) in the band;
 * every solve checks its residual, and a singular or near-singular matrix is reported, never
 * solved silently.
 */
public final class DirectRadiositySolver implements RadiositySolver {
    /** Largest relative residual accepted after an LU solve; beyond it the matrix is reported singular. */
    static final double SOLVE_CHECK = 1e-8;

    @Override
    public String name() {
        return "direct LU";
    }

    @Override
    public boolean supportsWindows() {
        return true;
    }

    /** The operator and its LU factors, N² doubles each. */
    @Override
    public long preparedBytes(int n) {
        double bytes = 2.0 * Double.BYTES * n * (double) n + 16.0 * Double.BYTES * n;
        return bytes >= Long.MAX_VALUE ? Long.MAX_VALUE : (long) bytes;
    }

    @Override
    public Prepared prepare(double[] viewFactors, int n, double[] reflectivity, double[] areasM2,
                            WindowCoupling windows) {
        DMatrixRMaj a = new DMatrixRMaj(n, n);
        double[] data = a.data;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            for (int k = 0; k < n; k++) {
                data[row + k] = -reflectivity[i] * viewFactors[row + k];
            }
            int o = windows.other(i);
            double tau = windows.tau(i);
            if (o >= 0 && tau != 0) {
                int orow = o * n;
                for (int k = 0; k < n; k++) {
                    data[row + k] -= tau * viewFactors[orow + k];
                }
            }
            data[row + i] += 1.0;
        }
        LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(n);
        if (!lu.setA(a)) {
            throw new NetworkConvergenceException("radiosity matrix is singular (a closed part of the enclosure"
                    + " reflects everything in this band)", 0, Double.POSITIVE_INFINITY);
        }
        return new Prepared() {
            private double residual;

            @Override
            public void solve(double[] b, double[] j) {
                DMatrixRMaj rhs = DMatrixRMaj.wrap(n, 1, b.clone());
                DMatrixRMaj x = new DMatrixRMaj(n, 1);
                lu.solve(rhs, x);
                System.arraycopy(x.data, 0, j, 0, n);
                residual = RadiositySolver.relativeResidual(viewFactors, n, reflectivity, windows, b, j);
                if (!(residual <= SOLVE_CHECK)) {
                    throw new NetworkConvergenceException("radiosity matrix is singular or too ill-conditioned"
                            + " (relative residual " + residual + " after LU): a closed part of the enclosure reflects"
                            + " (almost) everything in this band", 1, residual);
                }
            }

            @Override
            public int lastIterations() {
                return 1;
            }

            @Override
            public double lastRelativeResidual() {
                return residual;
            }
        };
    }
}
