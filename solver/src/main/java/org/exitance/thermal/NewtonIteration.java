package org.exitance.thermal;

import org.ejml.data.DMatrixRMaj;
import org.exitance.bands.BandLoop;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.SolverSettings;
import org.exitance.network.DenseLu;

/**
 * Damped Newton on the unknown temperatures with band properties held fixed (Kelley, Solving
 * Nonlinear Equations with Newton's Method, SIAM 2003, ch. 1–2). The residual of node a is its
 * heat balance summed over bands, {@code R_a = Σ_{i ∈ a} A_i Σ_k q_ik(T) − Q_a} (plus convection
 * and links where the condition balances every path; {@link NodeBalance}); the Jacobian is exact
 * ({@link Jacobian}).
 * No temperature changes by more than half its value in a step, and a backtracking line search
 * (Armijo) keeps the residual decreasing.
 */
final class NewtonIteration {
    private final Problem p;
    private final SolverSettings settings;
    private final Counters counters;
    private final SolverChoice choice;

    NewtonIteration(Problem p, SolverSettings settings, Counters counters, SolverChoice choice) {
        this.p = p;
        this.settings = settings;
        this.counters = counters;
        this.choice = choice;
    }

    /**
     * Solves for the unknown temperatures with the band networks of {@code loop}. Converged means
     * both: every node's heat residual is within its own tolerance ({@link NodeBalance}), and the
     * last Newton step moved no temperature by more than the temperature tolerance. At least one
     * step is always taken, so a starting guess is never reported as a solution unchecked.
     *
     * @param start  starting temperatures (K), not modified
     * @return the converged temperatures (a new array)
     * @throws SolveFailedException when Newton does not converge or a demand needs T ≤ 0 K
     */
    double[] solve(BandLoop loop, double[] start) {
        int[] u = p.unknown;
        int m = u.length;
        // direct: the sensitivities of every band, from one blocked solve each, serve every Newton step
        double[][] sens = choice.jacobianFree() ? null : Jacobian.nodeHeatSensitivities(p, loop);
        KrylovStep krylov = choice.jacobianFree() ? new KrylovStep(p, loop) : null;
        double[] t = start.clone();
        NodeBalance bal = NodeBalance.of(p, loop.solve(t), t, settings.relativeHeatTolerance());
        for (int it = 0; it < settings.maxNewtonIterations(); it++) {
            double norm = bal.scaledNorm();
            double[] dx;
            if (krylov != null) {
                int before = krylov.products();
                dx = krylov.solve(loop.emissivePowerDerivatives(t), bal);
                counters.krylovProducts += krylov.products() - before;
            } else {
                DMatrixRMaj jac = Jacobian.compact(p, sens, loop.emissivePowerDerivatives(t),
                        bal.pathDerivativeWPerK());
                Posedness.requireLiveColumns(p, jac);
                dx = step(jac, bal.residualW());
            }
            double lambda = 1.0;
            for (int a = 0; a < m; a++) {
                double d = Math.abs(dx[a]);
                if (d > 0.5 * t[u[a]]) {
                    lambda = Math.min(lambda, 0.5 * t[u[a]] / d);
                }
            }
            double[] trial = t.clone();
            NodeBalance next = null;
            for (int ls = 0; ls < 40; ls++) {
                for (int a = 0; a < m; a++) {
                    double ta = t[u[a]] + lambda * dx[a];
                    for (int i : p.faces[a]) {
                        trial[i] = ta;
                    }
                }
                next = NodeBalance.of(p, loop.solve(trial), trial, settings.relativeHeatTolerance());
                // the merit function weighs every node by the current iterate's tolerances, which stay
                // fixed during the line search (the trial's own tolerances move with its temperatures)
                if (next.scaledNorm(bal.toleranceW()) <= (1 - 1e-4 * lambda) * norm || next.scaledNorm() <= 1) {
                    break;
                }
                lambda *= 0.5;
            }
            double stepK = 0;
            for (int a = 0; a < m; a++) {
                stepK = Math.max(stepK, Math.abs(trial[u[a]] - t[u[a]]));
            }
            counters.lastStep = stepK;
            counters.newtonIterations++;
            t = trial;
            bal = next;
            counters.residualW = bal.largestW();
            SolveMonitor.current().newtonStep(loop.bands().size(), counters.newtonIterations, counters.residualW);
            SolveMonitor.checkCancelled();
            checkFloor(t, bal.residualW(), counters.newtonIterations);
            if (bal.scaledNorm() <= 1 && stepK <= settings.temperatureToleranceK()) {
                return t;
            }
        }
        double[] r = bal.residualW();
        throw new SolveFailedException("Newton's method did not converge in " + settings.maxNewtonIterations()
                + " iterations: largest heat residual " + fmt(maxAbs(r)) + " W at "
                + p.enc.surface(u[argMaxAbs(r)]).name() + " (its tolerance " + fmt(bal.toleranceW()[argMaxAbs(r)])
                + " W)", counters.newtonIterations, maxAbs(r));
    }

    /** The Newton step −J⁻¹ r by LU ({@link DenseLu}, in place on the Jacobian's array; a new array). */
    private double[] step(DMatrixRMaj jac, double[] r) {
        int m = r.length;
        DenseLu lu = DenseLu.factor(jac.data, m);
        if (lu == null) {
            throw Posedness.singular();
        }
        double[] rhs = new double[m];
        for (int a = 0; a < m; a++) {
            rhs[a] = -r[a];
        }
        double[] dx = new double[m];
        lu.solve(rhs, dx);
        for (int a = 0; a < m; a++) {
            if (!Double.isFinite(dx[a])) {
                throw Posedness.singular();
            }
        }
        return dx;
    }

    /** A demand that needs a temperature at or below 0 K is impossible: say so. */
    private void checkFloor(double[] t, double[] r, int iterations) {
        for (int a = 0; a < p.unknown.length; a++) {
            int i = p.unknown[a];
            if (t[i] < 1e-3 && r[a] > 0) {
                EnclosureSurface s = p.enc.surface(i);
                throw new SolveFailedException("surface '" + s.name() + "' cannot reach its " + s.boundary().label()
                        + " demand of " + fmt(p.target[a]) + " W: even near 0 K its net heat would be "
                        + fmt(r[a] + p.target[a]) + " W", iterations, r[a]);
            }
        }
    }

    private static double maxAbs(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    private static int argMaxAbs(double[] v) {
        int best = 0;
        for (int i = 1; i < v.length; i++) {
            if (Math.abs(v[i]) > Math.abs(v[best])) {
                best = i;
            }
        }
        return best;
    }

    static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.6g", v);
    }
}
