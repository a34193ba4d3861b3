package org.exitance.network;

/**
 * LU factorization with partial pivoting ({@link DenseLu}: blocked, in place, split over the
 * cores) of {@code I − diag(ρ) F − T F} (T: the window coupling, {@link WindowCoupling}; absent for
 * opaque enclosures). It handles the unsymmetric matrix that windows produce. The matrix is
 * non-singular whenever every closed sub-enclosure has some absorption (some ρ &lt; 1) in the band;
 * the band network checks every solve's residual with the product F·J it forms anyway
 * ({@link BandNetwork}), and a singular or near-singular matrix is reported, never solved silently.
 *
 * <p>Memory: one N×N work array per prepared band (8·N² bytes, the factors), besides the shared
 * view factors; a case with B bands holds B of them while its band loop lives. Several right-hand
 * sides ({@link Prepared#solveBlock}) cost one more N×cols array.
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
        double[] data = new double[Math.multiplyExact(n, n)];
        for (int i = 0; i < n; i++) {
            int row = i * n;
            double r = reflectivity[i];
            for (int k = 0; k < n; k++) {
                data[row + k] = -r * viewFactors[row + k];
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
        DenseLu lu = DenseLu.factor(data, n);
        if (lu == null) {
            throw new NetworkConvergenceException("radiosity matrix is singular (a closed part of the enclosure"
                    + " reflects everything in this band)", 0, Double.POSITIVE_INFINITY);
        }
        return new Prepared() {
            @Override
            public void solve(double[] b, double[] j) {
                lu.solve(b, j);
            }

            /** One blocked solve, then one residual check of the block (of its column sum). */
            @Override
            public void solveBlock(double[] b, int cols, double[] x) {
                // the sum of the columns solves the system for the sum of the right-hand sides
                double[] bs = new double[n];
                for (int i = 0; i < n; i++) {
                    double sb = 0;
                    for (int c = 0; c < cols; c++) {
                        sb += b[i * cols + c];
                    }
                    bs[i] = sb;
                }
                if (x != b) {
                    System.arraycopy(b, 0, x, 0, n * cols);
                }
                lu.solveInPlace(x, cols);
                double[] xs = new double[n];
                for (int i = 0; i < n; i++) {
                    double sx = 0;
                    for (int c = 0; c < cols; c++) {
                        sx += x[i * cols + c];
                    }
                    xs[i] = sx;
                }
                double residual = RadiositySolver.relativeResidual(viewFactors, n, reflectivity, windows, bs, xs);
                if (!(residual <= SOLVE_CHECK)) {
                    throw new NetworkConvergenceException("radiosity matrix is singular or too ill-conditioned"
                            + " (relative residual " + residual + " after LU): a closed part of the enclosure reflects"
                            + " (almost) everything in this band", 1, residual);
                }
            }

            @Override
            public double acceptedResidual() {
                return SOLVE_CHECK;
            }

            @Override
            public int lastIterations() {
                return 1;
            }

            @Override
            public double lastRelativeResidual() {
                return 0;
            }
        };
    }
}
