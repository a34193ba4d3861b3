package org.exitance.thermal;

import java.util.stream.IntStream;
import org.ejml.data.DMatrixRMaj;
import org.exitance.bands.BandLoop;
import org.exitance.model.MemoryBudget;

/**
 * The exact Jacobian of the node heat balances with band properties held fixed. Each band is
 * linear in the emissive powers, so {@code ∂R_a/∂T_b = Σ_k Σ_{i ∈ a} A_i (∂q_ik/∂E_bk)(dE_bk/dT_b)}
 * plus the derivatives of convection and links; dE/dT is analytic (methods: the Jacobian at scale).
 *
 * <p>Newton uses the compact form: per band the m×m node heat sensitivities
 * {@code S_k[a][b] = Σ_{i ∈ a} A_i ∂q_ik/∂E_bk}, from one blocked solve for all unknown nodes'
 * columns ({@link org.exitance.network.BandNetwork#nodeHeatSensitivities}); they hold for every
 * Newton step of a property update, and each step only rescales their columns by dE/dT. The
 * linearisations after a solve (sensitivities) use the full form, ∂q_i/∂E_b for every surface i.
 */
final class Jacobian {
    private Jacobian() {
    }

    /** S_k, [band][a·m + b] (m²), bands in parallel; see the class doc. */
    static double[][] nodeHeatSensitivities(Problem p, BandLoop loop) {
        int nb = loop.bands().size();
        double[][] s = new double[nb][];
        for (int k = 0; k < nb; k++) { // the blocked solve is itself split over the cores
            s[k] = loop.network(k).nodeHeatSensitivities(p.faces);
        }
        return s;
    }

    /**
     * ∂R_a/∂T_b (W/K) from the compact sensitivities.
     *
     * @param s   {@link #nodeHeatSensitivities}; not modified
     * @param dE  dE_ik/dT_i, [band][surface], at the current temperatures; not modified
     * @param dPaths  per node, d/dT of its extra paths (W/K); not modified
     */
    static DMatrixRMaj compact(Problem p, double[][] s, double[][] dE, double[] dPaths) {
        int[] u = p.unknown;
        int m = u.length;
        DMatrixRMaj jac = new DMatrixRMaj(m, m);
        double[] d = jac.data;
        IntStream.range(0, m).parallel().forEach(a -> {
            int row = a * m;
            for (int k = 0; k < s.length; k++) {
                double[] sk = s[k];
                double[] dk = dE[k];
                for (int b = 0; b < m; b++) {
                    d[row + b] += sk[row + b] * dk[u[b]];
                }
            }
        });
        addOtherPaths(p, jac, dPaths);
        return jac;
    }

    /**
     * Adds the convection, link and extra-path derivatives of the all-paths nodes to jac (modified).
     *
     * @param dPaths  per node, d/dT of its extra paths (W/K); not modified
     */
    static void addOtherPaths(Problem p, DMatrixRMaj jac, double[] dPaths) {
        for (int a = 0; a < dPaths.length; a++) {
            jac.add(a, a, dPaths[a]);
        }
        addOtherPaths(p, jac);
    }

    /** Adds the convection and link derivatives of the all-paths nodes to jac (modified). */
    static void addOtherPaths(Problem p, DMatrixRMaj jac) {
        int[] nodeOf = nodeOf(p);
        for (int a = 0; a < p.unknown.length; a++) {
            if (p.allPaths[a]) {
                for (int i : p.faces[a]) {
                    jac.add(a, a, p.convG[i]);
                }
            }
        }
        for (int l = 0; l < p.linkG.length; l++) {
            for (int end = 0; end < 2; end++) {
                int x = end == 0 ? p.linkA[l] : p.linkB[l];
                int y = end == 0 ? p.linkB[l] : p.linkA[l];
                int a = nodeOf[x];
                if (a >= 0 && p.allPaths[a]) {
                    jac.add(a, a, p.linkG[l]);
                    if (nodeOf[y] >= 0) {
                        jac.add(a, nodeOf[y], -p.linkG[l]);
                    }
                }
            }
        }
    }

    /**
     * The convection and link part of J·v (W) for all-paths nodes, added to out.
     *
     * @param v    temperature changes per node (K), not modified
     * @param out  per node (W); modified
     */
    static void addOtherPaths(Problem p, int[] nodeOf, double[] v, double[] out) {
        for (int a = 0; a < p.unknown.length; a++) {
            if (p.allPaths[a]) {
                for (int i : p.faces[a]) {
                    out[a] += p.convG[i] * v[a];
                }
            }
        }
        for (int l = 0; l < p.linkG.length; l++) {
            for (int end = 0; end < 2; end++) {
                int x = end == 0 ? p.linkA[l] : p.linkB[l];
                int y = end == 0 ? p.linkB[l] : p.linkA[l];
                int a = nodeOf[x];
                if (a >= 0 && p.allPaths[a]) {
                    out[a] += p.linkG[l] * (v[a] - (nodeOf[y] >= 0 ? v[nodeOf[y]] : 0.0));
                }
            }
        }
    }

    /** Per surface: the unknown node it is a face of, or −1 (a new array). */
    static int[] nodeOf(Problem p) {
        int[] nodeOf = new int[p.area.length];
        java.util.Arrays.fill(nodeOf, -1);
        for (int a = 0; a < p.faces.length; a++) {
            for (int i : p.faces[a]) {
                nodeOf[i] = a;
            }
        }
        return nodeOf;
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
     * ∂R_a/∂T_b (W/K) of the unknown nodes from the full sensitivities.
     *
     * @param sens  {@link #nodeSensitivities}; not modified
     * @param dE    dE_ik/dT_i, [band][surface], at the current temperatures; not modified
     */
    static DMatrixRMaj of(Problem p, double[][][] sens, double[][] dE, double[] dPaths) {
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
                jac.set(a, b, s);
            }
        }
        addOtherPaths(p, jac, dPaths);
        return jac;
    }
}
