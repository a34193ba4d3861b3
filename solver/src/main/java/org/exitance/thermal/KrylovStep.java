package org.exitance.thermal;

import org.exitance.bands.BandLoop;

/**
 * The Newton step of Newton–Krylov: {@code J δT = −R} solved by restarted GMRES (Saad, Iterative
 * Methods for Sparse Linear Systems, 2nd ed., Alg. 6.9, with Givens rotations; Kelley, Solving
 * Nonlinear Equations with Newton's Method, SIAM 2003, ch. 3) without forming J. Each product
 * J·v costs one band solve per band ({@link org.exitance.network.BandNetwork#fluxResponse}): the
 * node temperatures change by v, each face's band emissive power by dE/dT·v.
 *
 * <p>Scaling: rows are divided by the nodes' heat tolerances ({@link NodeBalance}), so residual
 * norms are in units of "tolerances"; columns are preconditioned by the diagonal
 * {@code d_a = Σ_k Σ_{i∈a} A_i ε_ik dE_ik/dT + Σ hA + Σ G} (the emission, 4εσAT³ for a gray surface,
 * plus convection and links). Bands are solved in band order and summed in band order, so the
 * product does not depend on the thread count.
 *
 * <p><b>Inexact Newton.</b> GMRES stops when the linear residual is below η times the Newton
 * residual or below {@link #ABSOLUTE} tolerances, whichever is larger, with the forcing term η of
 * Eisenstat and Walker (SIAM J. Sci. Comput. 17, 1996, choice 2: {@code η_k = γ (‖R_k‖/‖R_k−1‖)²},
 * γ = 0.9, safeguarded by {@code γ η_k−1²} when that exceeds 0.1), kept between {@link #RELATIVE}
 * and {@link #ETA_MAX}: loose far from the solution, where a precise step is wasted, and tight as
 * Newton converges, which keeps its fast local convergence (Kelley 2003, §3.2.3). The band
 * solves behind each product (conjugate gradients) are solved to a tolerance of {@code η/100}
 * per surface, within [1e-7, 1e-4] ({@link #innerTolerance}): a product need only be as
 * accurate as the step it serves. A restart cycle that converges ends on GMRES's own residual
 * estimate; only a restart forms the true residual (one more product).
 */
final class KrylovStep {
    /** Krylov vectors kept before a restart. */
    static final int RESTART = 60;
    /** Products allowed per Newton step. */
    static final int MAX_PRODUCTS = 20 * RESTART;
    /** The tightest forcing term. */
    static final double RELATIVE = 1e-6;
    /** The loosest forcing term (the first step of each Newton solve). */
    static final double ETA_MAX = 0.1;
    static final double ABSOLUTE = 1e-2;
    private static final double GAMMA = 0.9;

    private double lastNorm = Double.NaN;
    private double lastEta;

    private final Problem p;
    private final BandLoop loop;
    private final int[] rows;
    private final int[] nodeOf;
    private int products;

    KrylovStep(Problem p, BandLoop loop) {
        this.p = p;
        this.loop = loop;
        this.nodeOf = Jacobian.nodeOf(p);
        int count = 0;
        for (int[] f : p.faces) {
            count += f.length;
        }
        rows = new int[count];
        int r = 0;
        for (int[] f : p.faces) {
            for (int i : f) {
                rows[r++] = i;
            }
        }
    }

    /** Jacobian–vector products done so far. */
    int products() {
        return products;
    }

    /** d/dT of the extra paths per node (W/K) of the balance being solved, or null before the first step. */
    private double[] dPaths;

    /**
     * The Newton step.
     *
     * @param dE   dE_ik/dT_i at the current temperatures, [band][surface]; not modified
     * @param bal  the current node balances (residuals and tolerances); not modified
     * @return δT per node (K), a new array
     * @throws IllPosedCaseException when a node's temperature moves no heat balance
     */
    double[] solve(double[][] dE, NodeBalance bal) {
        int m = p.unknown.length;
        double[] tol = bal.toleranceW();
        dPaths = bal.pathDerivativeWPerK();
        double[] diag = diagonal(dE);
        double[] rhs = new double[m];
        for (int a = 0; a < m; a++) {
            rhs[a] = -bal.residualW()[a] / tol[a];
        }
        double beta = norm(rhs);
        double eta = forcing(beta);
        double relax = innerTolerance(eta) / SolverChoice.CG_TOLERANCE;
        double target = Math.max(eta * beta, ABSOLUTE);
        double[] y = new double[m]; // preconditioned unknowns: δT = y / d
        double[] r = rhs.clone();
        while (beta > target && products < MAX_PRODUCTS) {
            int k = Math.min(RESTART, MAX_PRODUCTS - products);
            double[][] v = new double[k + 1][];
            double[][] h = new double[k + 1][k];
            double[] cs = new double[k];
            double[] sn = new double[k];
            double[] g = new double[k + 1];
            g[0] = beta;
            v[0] = scaled(r, 1 / beta);
            int j = 0;
            for (; j < k && Math.abs(g[j]) > target; j++) {
                double[] w = apply(v[j], diag, tol, dE, relax);
                for (int i = 0; i <= j; i++) { // modified Gram–Schmidt
                    h[i][j] = dot(w, v[i]);
                    axpy(-h[i][j], v[i], w);
                }
                h[j + 1][j] = norm(w);
                v[j + 1] = h[j + 1][j] > 0 ? scaled(w, 1 / h[j + 1][j]) : new double[m];
                for (int i = 0; i < j; i++) {
                    double t = cs[i] * h[i][j] + sn[i] * h[i + 1][j];
                    h[i + 1][j] = -sn[i] * h[i][j] + cs[i] * h[i + 1][j];
                    h[i][j] = t;
                }
                double den = Math.hypot(h[j][j], h[j + 1][j]);
                cs[j] = den > 0 ? h[j][j] / den : 1;
                sn[j] = den > 0 ? h[j + 1][j] / den : 0;
                h[j][j] = den;
                h[j + 1][j] = 0;
                g[j + 1] = -sn[j] * g[j];
                g[j] = cs[j] * g[j];
                if (!(den > 0)) {
                    throw Posedness.singular();
                }
            }
            double[] c = new double[j];
            for (int i = j - 1; i >= 0; i--) {
                double s = g[i];
                for (int l = i + 1; l < j; l++) {
                    s -= h[i][l] * c[l];
                }
                c[i] = s / h[i][i];
            }
            for (int i = 0; i < j; i++) {
                axpy(c[i], v[i], y);
            }
            if (j == 0 || j < k) {
                break; // converged within the cycle (GMRES's estimate |g_j| ≤ target), or no progress
            }
            double[] ay = apply(y, diag, tol, dE, relax);
            for (int a = 0; a < m; a++) {
                r[a] = rhs[a] - ay[a];
            }
            beta = norm(r);
        }
        double[] dx = new double[m];
        for (int a = 0; a < m; a++) {
            dx[a] = y[a] / diag[a];
            if (!Double.isFinite(dx[a])) {
                throw Posedness.singular();
            }
        }
        return dx;
    }

    /** The forcing term of the class doc for a Newton residual of norm {@code norm} (tolerance units). */
    private double forcing(double norm) {
        double eta = ETA_MAX;
        if (!Double.isNaN(lastNorm) && lastNorm > 0) {
            double ratio = norm / lastNorm;
            eta = GAMMA * ratio * ratio;
            double safeguard = GAMMA * lastEta * lastEta;
            if (safeguard > 0.1) {
                eta = Math.max(eta, safeguard);
            }
        }
        eta = Math.min(ETA_MAX, Math.max(RELATIVE, eta));
        lastNorm = norm;
        lastEta = eta;
        return eta;
    }

    /** Per-surface tolerance of the band solves behind the products of a step with forcing term η. */
    static double innerTolerance(double eta) {
        return Math.min(1e-4, Math.max(1e-7, 1e-2 * eta));
    }

    /** W J P y: rows scaled by 1/tol, columns by 1/d (a new array; y not modified). */
    private double[] apply(double[] y, double[] diag, double[] tol, double[][] dE, double relax) {
        SolveMonitor.checkCancelled();
        products++;
        int m = y.length;
        double[] v = new double[m];
        for (int a = 0; a < m; a++) {
            v[a] = y[a] / diag[a];
        }
        double[] jv = product(v, dE, relax);
        for (int a = 0; a < m; a++) {
            jv[a] /= tol[a];
        }
        return jv;
    }

    /**
     * J v (W) for node temperature changes v (K); all bands at once, summed in band order.
     *
     * @param relax  factor on the conjugate-gradient tolerance of the band solves
     */
    double[] product(double[] v, double[][] dE, double relax) {
        int n = p.area.length;
        int nb = loop.bands().size();
        double[][] de = new double[nb][n];
        for (int k = 0; k < nb; k++) {
            for (int a = 0; a < v.length; a++) {
                for (int i : p.faces[a]) {
                    de[k][i] = dE[k][i] * v[a];
                }
            }
        }
        double[][] dq = loop.fluxResponses(de, rows, relax);
        double[] out = new double[v.length];
        for (int k = 0; k < nb; k++) {
            for (int r = 0; r < rows.length; r++) {
                int i = rows[r];
                out[nodeOf[i]] += p.area[i] * dq[k][r];
            }
        }
        Jacobian.addOtherPaths(p, nodeOf, v, out);
        if (dPaths != null) {
            for (int a = 0; a < v.length; a++) {
                out[a] += dPaths[a] * v[a];
            }
        }
        return out;
    }

    /** The diagonal preconditioner of the class doc (W/K). */
    private double[] diagonal(double[][] dE) {
        int m = p.unknown.length;
        double[] d = new double[m];
        double[][] eps = loop.emissivity();
        for (int a = 0; a < m; a++) {
            d[a] += dPaths == null ? 0 : dPaths[a];
        }
        for (int a = 0; a < m; a++) {
            for (int i : p.faces[a]) {
                for (int k = 0; k < dE.length; k++) {
                    d[a] += p.area[i] * eps[k][i] * dE[k][i];
                }
                if (p.allPaths[a]) {
                    d[a] += p.convG[i];
                }
            }
        }
        for (int l = 0; l < p.linkG.length; l++) {
            for (int x : new int[] {p.linkA[l], p.linkB[l]}) {
                int a = nodeOf[x];
                if (a >= 0 && p.allPaths[a]) {
                    d[a] += p.linkG[l];
                }
            }
        }
        for (int a = 0; a < m; a++) {
            if (!(d[a] > 0)) {
                throw new IllPosedCaseException("the temperature of surface '" + p.enc.surface(p.unknown[a]).name()
                        + "' does not affect any heat balance (zero emissivity in every band?): it is undefined");
            }
        }
        return d;
    }

    private static double[] scaled(double[] x, double s) {
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = s * x[i];
        }
        return out;
    }

    private static void axpy(double a, double[] x, double[] y) {
        for (int i = 0; i < x.length; i++) {
            y[i] += a * x[i];
        }
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    private static double norm(double[] x) {
        return Math.sqrt(dot(x, x));
    }
}
