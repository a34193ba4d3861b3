package org.exitance.thermal;

import org.exitance.network.BandState;

/**
 * The heat balance of every unknown-temperature node at one temperature vector, with a
 * tolerance of its own: {@code tol_a = r · flow_a + (c u + ℓ) · terms_a}, where
 * <ul>
 *   <li>flow_a is the heat that flows through the node by every path: radiation emitted,
 *       absorbed or transmitted in every band ({@link BandState#throughput}), convection
 *       |hA(T − T_f)|, every conductive link |G(T_a − T_b)|, and its demand |Q_a|;</li>
 *   <li>terms_a is the size of the numbers the residual is computed from: the radiative
 *       throughput, hA(T + T_f) and G(T_a + T_b) for each link, and |Q_a|; rounding alone
 *       leaves an error of about u · terms_a (u the unit round-off), which for a stiff link
 *       (G = 10⁸ W/K at 1000 K) is far above any fraction of the radiative power;</li>
 *   <li>r is the relative heat tolerance of the settings, c = 64 a safety factor on rounding,
 *       and ℓ the largest relative residual of the band solves.</li>
 * </ul>
 * The extra paths of the problem ({@link SurfacePaths}: walls, storage) count in flow and terms
 * like convection, with d/dT of them kept for the Jacobian's diagonal.
 * A node is balanced when |R_a| ≤ tol_a (methods: the node's own scale, not a global one;
 * Kelley, Solving Nonlinear Equations with Newton's Method, SIAM 2003, §1.5 on termination).
 *
 * @param residualW   R_a (W), positive when the node loses more heat than its condition asks
 * @param toleranceW  tol_a (W)
 * @param pathDerivativeWPerK  per node, d/dT of its extra paths (W/K)
 */
record NodeBalance(double[] residualW, double[] toleranceW, double[] pathDerivativeWPerK) {
    private static final double ROUNDING = 64 * Math.ulp(1.0);

    /**
     * @param states  the solved bands at t (not modified)
     * @param t       temperatures (K), not modified
     * @param relativeTolerance  r
     */
    static NodeBalance of(Problem p, BandState[] states, double[] t, double relativeTolerance) {
        double linear = 0;
        for (BandState s : states) {
            linear = Math.max(linear, s.relativeResidual());
        }
        int m = p.unknown.length;
        double[] r = new double[m];
        double[] tol = new double[m];
        double[] dPaths = new double[m];
        double[] extra = new double[2];
        for (int a = 0; a < m; a++) {
            r[a] = -p.target[a];
            double flow = Math.abs(p.target[a]);
            double terms = Math.abs(p.target[a]);
            for (int i : p.faces[a]) {
                double q = 0;
                double through = 0;
                for (BandState s : states) {
                    q += s.netFlux()[i];
                    through += s.throughput()[i];
                }
                r[a] += p.area[i] * q;
                flow += p.area[i] * through;
                terms += p.area[i] * through;
                if (p.allPaths[a]) {
                    double conv = p.convectionW(i, t[i]);
                    double cond = p.conductionW(i, t);
                    r[a] += conv + cond;
                    flow += Math.abs(conv) + p.conductionMagnitudeW(i, t);
                    terms += p.convG[i] * (Math.abs(t[i]) + Math.abs(p.fluidT[i])) + p.conductionTermsW(i, t);
                    p.paths.heat(i, t[i], extra);
                    r[a] += extra[0];
                    flow += Math.abs(extra[0]);
                    terms += Math.abs(extra[0]) + Math.abs(extra[1] * t[i]);
                    dPaths[a] += extra[1];
                }
            }
            tol[a] = Math.max(relativeTolerance * flow + (ROUNDING + linear) * terms, Double.MIN_NORMAL);
        }
        return new NodeBalance(r, tol, dPaths);
    }

    /** max_a |R_a| / tol_a: at most 1 when every node is balanced. */
    double scaledNorm() {
        return scaledNorm(toleranceW);
    }

    /** max_a |R_a| / w_a with other weights w (W, not modified): the line search's merit function. */
    double scaledNorm(double[] w) {
        double worst = 0;
        for (int a = 0; a < residualW.length; a++) {
            worst = Math.max(worst, Math.abs(residualW[a]) / w[a]);
        }
        return worst;
    }

    /** max_a |R_a| (W). */
    double largestW() {
        double worst = 0;
        for (double x : residualW) {
            worst = Math.max(worst, Math.abs(x));
        }
        return worst;
    }
}
