package org.exitance.thermal;

import org.ejml.data.DMatrixRMaj;
import org.exitance.bands.BandLoop;
import org.exitance.model.MemoryBudget;

/**
 * The exact Jacobian of the node heat balances with band properties held fixed. Each band is
 * linear in the emissive powers, so {@code ∂R_a/∂T_b = Σ_k Σ_{i ∈ a} A_i (∂q_ik/∂E_bk)(dE_bk/dT_b)}
 * plus the derivatives of convection and links; ∂q/∂E comes from one extra band solve per
 * unknown node ({@link org.exitance.network.BandNetwork#fluxSensitivity}), dE/dT is analytic.
 */
final class Jacobian {
    private Jacobian() {
    }

    /**
     * ∂q_i/∂E_v per band and unknown node v, [band][node][surface]; a window node adds both
     * faces (raising its temperature raises the emission of both; the network is linear in E).
     */
    static double[][][] nodeSensitivities(Problem p, BandLoop loop) {
        int m = p.unknown.length;
        int nb = loop.bands().size();
        long n = p.area.length;
        MemoryBudget.require("the Newton sensitivities of " + m + " unknown temperatures in " + nb + " bands over " + n
                + " surfaces", MemoryBudget.saturatedProduct(MemoryBudget.saturatedProduct((long) nb * m, n)
                + (long) m * m, MemoryBudget.DOUBLE_BYTES));
        double[][][] sens = new double[nb][m][];
        for (int k = 0; k < nb; k++) {
            for (int b = 0; b < m; b++) {
                sens[k][b] = loop.network(k).fluxSensitivity(p.faces[b][0]);
                for (int f = 1; f < p.faces[b].length; f++) {
                    double[] more = loop.network(k).fluxSensitivity(p.faces[b][f]);
                    for (int i = 0; i < more.length; i++) {
                        sens[k][b][i] += more[i];
                    }
                }
            }
        }
        return sens;
    }

    /**
     * ∂R_a/∂T_b (W/K) of the unknown nodes.
     *
     * @param sens  {@link #nodeSensitivities}; not modified
     * @param dE    dE_ik/dT_i, [band][surface], at the current temperatures; not modified
     */
    static DMatrixRMaj of(Problem p, double[][][] sens, double[][] dE) {
        int[] u = p.unknown;
        int m = u.length;
        DMatrixRMaj jac = new DMatrixRMaj(m, m);
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < m; b++) {
                double s = 0;
                for (int k = 0; k < dE.length; k++) {
                    double de = dE[k][u[b]];
                    for (int i : p.faces[a]) {
                        s += p.area[i] * sens[k][b][i] * de;
                    }
                }
                double other = p.allPaths[a] ? p.otherPathsDerivative(a, b) : 0.0;
                jac.set(a, b, s + other);
            }
        }
        return jac;
    }
}
