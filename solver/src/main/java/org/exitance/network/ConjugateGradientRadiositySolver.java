package org.exitance.network;

import java.util.stream.IntStream;

/**
 * Preconditioned conjugate gradients on the symmetric form of the radiosity equations.
 *
 * <p>Row i of {@code (I − diag(ρ)F) J = b} multiplied by {@code A_i/ρ_i} gives
 * {@code S J = c} with {@code S = diag(A/ρ) − diag(A) F} and {@code c_i = A_i b_i / ρ_i}.
 * With reciprocity {@code A_i F_ij = A_j F_ji}, S is symmetric, and positive definite when the
 * enclosure absorbs something in the band (Modest, Radiative Heat Transfer, 3rd ed., §5.5,
 * on the symmetric radiosity matrix; conjugate gradients: Saad, Iterative Methods for Sparse
 * Linear Systems, 2nd ed., Alg. 9.1). Rows with ρ_i = 0 are black: J_i = b_i is known and moves
 * to the right-hand side.
 *
 * <p><b>Preconditioner.</b> The diagonal (Jacobi) plus a one-vector coarse correction on the
 * constant radiosity: {@code M⁻¹ = D⁻¹ + z (zᵀSz)⁻¹ zᵀ}, z = 1 on the non-black rows (additive
 * two-level preconditioner, Saad, 2nd ed., §14.5, with the coarse space of one vector). In a
 * closed, nearly perfectly reflecting enclosure (ρ → 1) the constant is the near-null vector of
 * S (rows of F sum to 1), which alone makes plain Jacobi need ~1/√(1 − ρ) times more iterations;
 * the coarse term removes it, so ρ = 0.999 converges in tens of iterations, not hundreds.
 *
 * <p><b>Stopping rule, in watts.</b> The heat residual of surface i is {@code A_i r_i = ρ_i (c − SJ)_i}
 * (W), with r = b − (I − ρF)J the radiosity residual; CG updates it by recurrence from the product
 * S·p it computes anyway. It stops when every surface's heat residual is within the tolerance times
 * the power that surface radiates and receives, {@code |A_i r_i| ≤ tol · A_i (|b_i| + |J_i|)}: the
 * same per-node scale as the heat test of the temperature solve. The band network then checks the
 * true residual once with the product F·J it forms for the irradiation anyway.
 * Work: one pass over F per iteration (2N² flops); memory: a few vectors of N, no N² array.
 */
public final class ConjugateGradientRadiositySolver implements RadiositySolver {
    private final double relativeTolerance;
    private final int maxIterations;

    /**
     * @param relativeTolerance stop when every surface's heat residual is within this fraction of
     *                          the power it radiates and receives (see the class doc)
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

    /** Opaque enclosures only: a window's coupling breaks the symmetry this method needs. */
    @Override
    public Prepared prepare(double[] f, int n, double[] rho, double[] area, WindowCoupling windows) {
        if (!windows.isEmpty()) {
            throw new IllegalArgumentException("conjugate gradients need a symmetric radiosity matrix; an enclosure"
                    + " with windows needs the direct solver (RadiositySolver.forSize)");
        }
        int[] free = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (rho[i] > 0) {
                free[m++] = i;
            }
        }
        return new Symmetric(f, n, rho.clone(), area.clone(), java.util.Arrays.copyOf(free, m), relativeTolerance,
                maxIterations);
    }

    /** The prepared symmetric operator of one band. */
    private static final class Symmetric implements Prepared {
        private final double[] f;
        private final int n;
        private final double[] rho;
        private final double[] area;
        private final int[] idx;
        private final double[] diag;
        private final double coarse;
        private final double tol;
        private final int maxIterations;
        private int iterations;
        private double residual;

        Symmetric(double[] f, int n, double[] rho, double[] area, int[] idx, double tol, int maxIterations) {
            this.f = f;
            this.n = n;
            this.rho = rho;
            this.area = area;
            this.idx = idx;
            this.tol = tol;
            this.maxIterations = maxIterations;
            int count = idx.length;
            diag = new double[count];
            double[] ones = new double[count];
            java.util.Arrays.fill(ones, 1.0);
            double[] s1 = new double[count];
            multiply(ones, s1);
            double zsz = 0;
            for (int a = 0; a < count; a++) {
                int i = idx[a];
                diag[a] = area[i] / rho[i] - area[i] * f[i * n + i];
                zsz += s1[a];
            }
            coarse = zsz > 0 ? 1.0 / zsz : 0.0;
        }

        @Override
        public void solve(double[] b, double[] j) {
            int count = idx.length;
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                if (!(rho[i] > 0)) {
                    x[i] = b[i];
                }
            }
            // c = A_i b_i/ρ_i + A_i Σ_{black k} F_ik J_k for the free rows
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
            double[] r = c.clone();
            double[] z = new double[count];
            double[] p = new double[count];
            double[] q = new double[count];
            if (count > 0) {
                precondition(c, y);
                multiply(y, q);
                for (int a = 0; a < count; a++) {
                    r[a] = c[a] - q[a];
                }
            }
            precondition(r, z);
            System.arraycopy(z, 0, p, 0, count);
            double rz = dot(r, z);
            iterations = 0;
            while (!converged(b, y, r)) {
                if (iterations >= maxIterations) {
                    throw new NetworkConvergenceException("conjugate gradients did not converge in " + iterations
                            + " iterations (relative residual " + residual + "; a nearly perfectly reflecting band"
                            + " converges slowly)", iterations, residual);
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
                }
                precondition(r, z);
                double rzNew = dot(r, z);
                double beta = rzNew / rz;
                rz = rzNew;
                for (int a = 0; a < count; a++) {
                    p[a] = z[a] + beta * p[a];
                }
                iterations++;
            }
            for (int a = 0; a < count; a++) {
                x[idx[a]] = y[a];
            }
            System.arraycopy(x, 0, j, 0, n);
        }

        /** The heat test of the class doc on the recurrence residual; sets {@link #residual}. */
        private boolean converged(double[] b, double[] y, double[] r) {
            boolean ok = true;
            double worst = 0;
            double scale = 0;
            for (double v : b) {
                scale = Math.max(scale, Math.abs(v));
            }
            for (int a = 0; a < idx.length; a++) {
                int i = idx[a];
                double heat = rho[i] * r[a]; // A_i r_i (W)
                double through = area[i] * (Math.abs(b[i]) + Math.abs(y[a]));
                if (Math.abs(heat) > tol * through) {
                    ok = false;
                }
                worst = Math.max(worst, Math.abs(heat) / area[i]);
            }
            residual = scale > 0 ? worst / scale : worst;
            return ok;
        }

        /** z = (D⁻¹ + 1 (1ᵀS1)⁻¹ 1ᵀ) r; r not modified, z modified. */
        private void precondition(double[] r, double[] z) {
            double sum = 0;
            for (double v : r) {
                sum += v;
            }
            double shift = coarse * sum;
            for (int a = 0; a < r.length; a++) {
                z[a] = r[a] / diag[a] + shift;
            }
        }

        /** out = S v on the free rows, rows in parallel; v not modified, out modified. */
        private void multiply(double[] v, double[] out) {
            int count = idx.length;
            int blocks = Math.max(1, Math.min(count / 64, 64));
            IntStream.range(0, blocks).parallel().forEach(blk -> {
                int a0 = (int) ((long) count * blk / blocks);
                int a1 = (int) ((long) count * (blk + 1) / blocks);
                for (int a = a0; a < a1; a++) {
                    int i = idx[a];
                    int row = i * n;
                    double s0 = 0;
                    double s1 = 0;
                    int bb = 0;
                    for (; bb + 1 < count; bb += 2) {
                        s0 += f[row + idx[bb]] * v[bb];
                        s1 += f[row + idx[bb + 1]] * v[bb + 1];
                    }
                    if (bb < count) {
                        s0 += f[row + idx[bb]] * v[bb];
                    }
                    out[a] = area[i] / rho[i] * v[a] - area[i] * (s0 + s1);
                }
            });
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

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }
}
