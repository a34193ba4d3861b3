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
    private final double[] rho;
    private final double[] area;
    private final boolean[] free;
    private final double[] diag;
    private final double coarse;
    private final double tol;
    private final int maxIterations;
    private int iterations;
    private double residual;

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
        solveTogether(new SymmetricBand[] {this}, new double[][] {b}, new double[][] {j}, 1.0);
    }

    /**
     * See {@link ConjugateGradientRadiositySolver#solveTogether}.
     *
     * @param relax  factor on the tolerance (1 for a band solve, {@link #RESPONSE_RELAXATION} for a response)
     */
    static void solveTogether(SymmetricBand[] bands, double[][] b, double[][] out, double relax) {
        int nb = bands.length;
        int n = bands[0].n;
        RadiationOperator op = bands[0].op;
        // known black radiosities, and c = A_i b_i/ρ_i + A_i Σ_{black k} F_ik J_k on the free rows
        double[] known = new double[n * nb];
        for (int k = 0; k < nb; k++) {
            for (int i = 0; i < n; i++) {
                known[i * nb + k] = bands[k].free[i] ? 0.0 : b[k][i];
            }
        }
        double[] fk = new double[n * nb];
        op.multiply(known, nb, fk);
        State[] st = new State[nb];
        for (int k = 0; k < nb; k++) {
            SymmetricBand s = bands[k];
            State x = new State(n);
            for (int i = 0; i < n; i++) {
                x.c[i] = s.free[i] ? s.area[i] * b[k][i] / s.rho[i] + s.area[i] * fk[i * nb + k] : 0.0;
            }
            s.precondition(x.c, x.y);
            st[k] = x;
        }
        double[][] q = multiply(bands, st, true);
        for (int k = 0; k < nb; k++) {
            State x = st[k];
            for (int i = 0; i < n; i++) {
                x.r[i] = x.c[i] - q[k][i];
            }
            bands[k].precondition(x.r, x.z);
            System.arraycopy(x.z, 0, x.p, 0, n);
            x.rz = dot(x.r, x.z);
            bands[k].iterations = 0;
        }
        while (true) {
            boolean any = false;
            for (int k = 0; k < nb; k++) {
                State x = st[k];
                if (!x.done && bands[k].converged(b[k], x.y, x.r, relax)) {
                    x.done = true;
                } else if (!x.done) {
                    bands[k].checkProgress();
                    any = true;
                }
            }
            if (!any) {
                break;
            }
            q = multiply(bands, st, false);
            for (int k = 0; k < nb; k++) {
                State x = st[k];
                if (x.done) {
                    continue;
                }
                SymmetricBand s = bands[k];
                double pq = dot(x.p, q[k]);
                if (!(pq > 0)) {
                    throw new NetworkConvergenceException("conjugate gradients broke down (matrix not positive"
                            + " definite: check reciprocity and that the band has some absorption)",
                            s.iterations, s.residual);
                }
                double alpha = x.rz / pq;
                for (int i = 0; i < n; i++) {
                    x.y[i] += alpha * x.p[i];
                    x.r[i] -= alpha * q[k][i];
                }
                s.precondition(x.r, x.z);
                double rzNew = dot(x.r, x.z);
                double beta = rzNew / x.rz;
                x.rz = rzNew;
                for (int i = 0; i < n; i++) {
                    x.p[i] = x.z[i] + beta * x.p[i];
                }
                s.iterations++;
            }
        }
        for (int k = 0; k < nb; k++) {
            for (int i = 0; i < n; i++) {
                out[k][i] = bands[k].free[i] ? st[k].y[i] : b[k][i];
            }
        }
    }

    /** S_k v_k for every band not done (v = y at the start, else p), in one pass over F. */
    private static double[][] multiply(SymmetricBand[] bands, State[] st, boolean start) {
        int n = bands[0].n;
        int[] active = new int[bands.length];
        int na = 0;
        for (int k = 0; k < bands.length; k++) {
            if (!st[k].done) {
                active[na++] = k;
            }
        }
        double[] v = new double[n * na];
        for (int a = 0; a < na; a++) {
            double[] src = start ? st[active[a]].y : st[active[a]].p;
            for (int i = 0; i < n; i++) {
                v[i * na + a] = src[i];
            }
        }
        double[] w = new double[n * na];
        bands[0].op.multiply(v, na, w);
        double[][] q = new double[bands.length][];
        for (int a = 0; a < na; a++) {
            int k = active[a];
            SymmetricBand s = bands[k];
            double[] out = new double[n];
            for (int i = 0; i < n; i++) {
                out[i] = s.free[i] ? s.area[i] / s.rho[i] * v[i * na + a] - s.area[i] * w[i * na + a] : 0.0;
            }
            q[k] = out;
        }
        return q;
    }

    /** The heat test of the class doc on the recurrence residual; sets {@link #residual}. */
    private boolean converged(double[] b, double[] y, double[] r, double relax) {
        boolean ok = true;
        double worst = 0;
        double scale = 0;
        for (double v : b) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int i = 0; i < n; i++) {
            if (free[i]) {
                double heat = rho[i] * r[i]; // A_i r_i (W)
                if (Math.abs(heat) > relax * tol * area[i] * (Math.abs(b[i]) + Math.abs(y[i]))) {
                    ok = false;
                }
                worst = Math.max(worst, Math.abs(heat) / area[i]);
            }
        }
        residual = scale > 0 ? worst / scale : worst;
        return ok;
    }

    private void checkProgress() {
        if (iterations >= maxIterations) {
            throw new NetworkConvergenceException("conjugate gradients did not converge in " + iterations
                    + " iterations (relative residual " + residual + "; a nearly perfectly reflecting band"
                    + " converges slowly)", iterations, residual);
        }
    }

    /** z = (D⁻¹ + 1 (1ᵀS1)⁻¹ 1ᵀ) r on the free rows, 0 on black rows; r not modified, z modified. */
    private void precondition(double[] r, double[] z) {
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

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    /** Conjugate-gradient vectors of one band. */
    private static final class State {
        final double[] c;
        final double[] y;
        final double[] r;
        final double[] z;
        final double[] p;
        double rz;
        boolean done;

        State(int n) {
            c = new double[n];
            y = new double[n];
            r = new double[n];
            z = new double[n];
            p = new double[n];
        }
    }
}
