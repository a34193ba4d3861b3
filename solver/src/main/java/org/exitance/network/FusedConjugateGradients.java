package org.exitance.network;

/**
 * Conjugate gradients of several bands of one enclosure at once (the method, preconditioner and
 * stopping rule of each band are those of {@link ConjugateGradientRadiositySolver}): each band
 * runs its own iteration, but every iteration multiplies F with all active bands' search
 * directions in one pass over the operator ({@link RadiationOperator#multiply}). Each band's
 * numbers are those of its own solve, whatever the other bands and the thread count.
 *
 * <p><b>Passes over F.</b> One per iteration, and none else: the start J₀ (zero on the free rows,
 * or a warm start such as the last solve's J) costs one pass for F·J₀ unless J₀ is zero or its
 * product is given; and F·J is carried along by recurrence, {@code F y ← F y + α F p}, from the
 * products the iterations form anyway, so a caller that needs F·J (irradiation, flux responses)
 * gets it without another pass. The recurrence differs from a fresh product only by the rounding
 * of the iterations' updates (relative 1e-15 per iteration).
 */
final class FusedConjugateGradients {
    private FusedConjugateGradients() {
    }

    /**
     * Solves every band.
     *
     * @param bands    prepared bands sharing one operator
     * @param b        right-hand side per band, not modified
     * @param out      receives J per band; modified
     * @param relax    factor on the bands' tolerances (1 for a band solve; more for a flux response
     *                 that only steers a Newton step)
     * @param global   the stopping rule of a flux response ({@link SymmetricBand#converged}): each
     *                 surface's heat residual against the enclosure's largest power, not its own
     * @param start    per band, a starting J (its black rows are ignored: they take b), or null for
     *                 zero; not modified
     * @param startFj  per band, F·start when the caller has it (used only if every black row of start
     *                 already equals b), or null; not modified
     * @param fjOut    per band, receives F·J (recurrence, see the class doc) when non-null; modified
     */
    static void solve(SymmetricBand[] bands, double[][] b, double[][] out, double relax, boolean global,
                      double[][] start, double[][] startFj, double[][] fjOut) {
        int nb = bands.length;
        int n = bands[0].n;
        double[] j0 = new double[n * nb];
        boolean nonzero = false;
        boolean reuse = start != null && startFj != null;
        for (int k = 0; k < nb; k++) {
            SymmetricBand s = bands[k];
            for (int i = 0; i < n; i++) {
                double v = s.free[i] ? (start != null ? start[k][i] : 0.0) : b[k][i];
                j0[i * nb + k] = v;
                nonzero |= v != 0;
                reuse &= s.free[i] || start != null && start[k][i] == b[k][i];
            }
        }
        double[] fj0 = new double[n * nb];
        if (reuse) {
            for (int k = 0; k < nb; k++) {
                for (int i = 0; i < n; i++) {
                    fj0[i * nb + k] = startFj[k][i];
                }
            }
        } else if (nonzero) {
            bands[0].op.multiply(j0, nb, fj0);
        }
        State[] st = new State[nb];
        for (int k = 0; k < nb; k++) {
            SymmetricBand s = bands[k];
            State x = new State(n);
            for (int i = 0; i < n; i++) {
                x.fj[i] = fj0[i * nb + k];
                if (s.free[i]) {
                    // r₀ = c − S y₀ = A_i (b_i − y_i)/ρ_i + A_i (F J₀)_i, with J₀ = y₀ + the black rows' b
                    x.y[i] = j0[i * nb + k];
                    x.r[i] = s.area[i] * (b[k][i] - x.y[i]) / s.rho[i] + s.area[i] * x.fj[i];
                }
            }
            s.precondition(x.r, x.z);
            System.arraycopy(x.z, 0, x.p, 0, n);
            x.rz = dot(x.r, x.z);
            s.iterations = 0;
            st[k] = x;
        }
        while (true) {
            boolean any = false;
            for (int k = 0; k < nb; k++) {
                State x = st[k];
                if (!x.done && bands[k].converged(b[k], x.y, x.r, relax, global)) {
                    x.done = true;
                } else if (!x.done) {
                    bands[k].checkProgress();
                    any = true;
                }
            }
            if (!any) {
                break;
            }
            multiply(bands, st);
            for (int k = 0; k < nb; k++) {
                State x = st[k];
                if (!x.done) {
                    step(bands[k], x);
                }
            }
        }
        for (int k = 0; k < nb; k++) {
            for (int i = 0; i < n; i++) {
                out[k][i] = bands[k].free[i] ? st[k].y[i] : b[k][i];
            }
            if (fjOut != null) {
                System.arraycopy(st[k].fj, 0, fjOut[k], 0, n);
            }
        }
    }

    /** One conjugate-gradient update of a band from its q = S p and fp = F p. */
    private static void step(SymmetricBand s, State x) {
        int n = s.n;
        double pq = dot(x.p, x.q);
        if (!(pq > 0)) {
            throw new NetworkConvergenceException("conjugate gradients broke down (matrix not positive"
                    + " definite: check reciprocity and that the band has some absorption)",
                    s.iterations, s.residual);
        }
        double alpha = x.rz / pq;
        for (int i = 0; i < n; i++) {
            x.y[i] += alpha * x.p[i];
            x.r[i] -= alpha * x.q[i];
            x.fj[i] += alpha * x.fp[i];
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

    /** fp = F p and q = S p for every band not done, in one pass over F. */
    private static void multiply(SymmetricBand[] bands, State[] st) {
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
            double[] src = st[active[a]].p;
            for (int i = 0; i < n; i++) {
                v[i * na + a] = src[i];
            }
        }
        double[] w = new double[n * na];
        bands[0].op.multiply(v, na, w);
        for (int a = 0; a < na; a++) {
            SymmetricBand s = bands[active[a]];
            State x = st[active[a]];
            for (int i = 0; i < n; i++) {
                x.fp[i] = w[i * na + a];
                x.q[i] = s.free[i] ? s.area[i] / s.rho[i] * v[i * na + a] - s.area[i] * x.fp[i] : 0.0;
            }
        }
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
        final double[] y;
        final double[] r;
        final double[] z;
        final double[] p;
        final double[] q;
        final double[] fp;
        final double[] fj;
        double rz;
        boolean done;

        State(int n) {
            y = new double[n];
            r = new double[n];
            z = new double[n];
            p = new double[n];
            q = new double[n];
            fp = new double[n];
            fj = new double[n];
        }
    }
}
