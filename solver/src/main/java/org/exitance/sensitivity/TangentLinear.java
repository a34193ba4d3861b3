package org.exitance.sensitivity;

import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.exitance.model.BandSet;
import org.exitance.model.MemoryBudget;
import org.exitance.model.RadiationCase;
import org.exitance.thermal.ConvergedState;
import org.exitance.thermal.IllPosedCaseException;
import org.exitance.thermal.TemperatureSolver;

/**
 * Sensitivities of every surface's net heat (W) and temperature (K) to the band-mean emissivity
 * of every surface in every band, at the converged state of a solve.
 *
 * <p>The parameter ε_jk stands for ε_λ of surface j raised uniformly inside band k, so that its
 * absorptivity for external sources in that band rises with it. Tangent-linear method: for each
 * parameter, one solve with the band's factored matrix, {@code (I − ρF − TF) x = e_j (E_j − G_j)},
 * gives the flux change at fixed temperatures, {@code x − F x}; the temperature change follows from
 * Newton's Jacobian, {@code ΔT = −J⁻¹ ∂R/∂ε} (implicit function theorem; e.g. Nocedal &amp; Wright,
 * Numerical Optimization, 2nd ed., §A.2). The band means' own drift with temperature (Planck
 * weighting, ε(λ, T) tables) is held fixed: exact where ε is constant inside each band.
 */
public final class TangentLinear {
    private TangentLinear() {
    }

    /**
     * Solves the case with these bands and differentiates the converged state.
     *
     * @throws IllPosedCaseException for a case solved on facets, or a singular Jacobian
     */
    public static EmissivitySensitivities compute(RadiationCase c, BandSet bandSet) {
        if (c.facetGroups() != null) {
            throw new IllPosedCaseException("sensitivities are computed on surfaces: set the geometry's"
                    + " \"resolution\" to \"surfaces\"");
        }
        return of(new TemperatureSolver(c).converge(bandSet));
    }

    /** The sensitivities at a converged state (indices [surface i][surface j][band k]). */
    public static EmissivitySensitivities of(ConvergedState s) {
        int n = s.size();
        int nb = s.bands().size();
        int[] unknown = s.unknownSurfaces();
        int m = unknown.length;
        double[][][] sens = s.nodeSensitivities();
        double[][] dE = s.emissivePowerDerivatives();
        double[][] e = s.emissivePowers();
        LinearSolverDense<DMatrixRMaj> lu = null;
        if (m > 0) {
            lu = LinearSolverFactory_DDRM.lu(m);
            if (!lu.setA(s.jacobian(sens))) {
                throw new IllPosedCaseException("the heat balances do not determine the unknown temperatures"
                        + " (singular Jacobian)");
            }
        }
        int[][] faces = new int[m][];
        for (int a = 0; a < m; a++) {
            faces[a] = s.faces(a);
        }
        MemoryBudget.require("the emissivity sensitivities of " + n + " surfaces in " + nb + " bands",
                MemoryBudget.saturatedProduct(MemoryBudget.saturatedProduct(2L * n * n, nb), MemoryBudget.DOUBLE_BYTES));
        double[][][] dq = new double[n][n][nb];
        double[][][] dT = new double[n][n][nb];
        for (int k = 0; k < nb; k++) {
            for (int j = 0; j < n; j++) {
                double[] d = s.network(k).emissivitySensitivity(j, e[k][j] - s.state(k).irradiation()[j]);
                double[] dt = temperatureChange(s, lu, faces, d);
                for (int i = 0; i < n; i++) {
                    double total = d[i];
                    for (int kk = 0; kk < nb; kk++) {
                        for (int a = 0; a < m; a++) {
                            total += sens[kk][a][i] * dE[kk][unknown[a]] * dt[a];
                        }
                    }
                    dq[i][j][k] = s.areaM2(i) * total;
                }
                for (int a = 0; a < m; a++) {
                    for (int i : faces[a]) {
                        dT[i][j][k] = dt[a];
                    }
                }
            }
        }
        return new EmissivitySensitivities(s.result(), dq, dT);
    }

    /** ΔT of the unknown nodes for a flux change d (W/m² per unit ε; not modified): −J⁻¹ Σ A d. */
    private static double[] temperatureChange(ConvergedState s, LinearSolverDense<DMatrixRMaj> lu, int[][] faces,
                                              double[] d) {
        int m = faces.length;
        double[] dt = new double[m];
        if (m == 0) {
            return dt;
        }
        DMatrixRMaj rhs = new DMatrixRMaj(m, 1);
        for (int a = 0; a < m; a++) {
            double r = 0;
            for (int i : faces[a]) {
                r += s.areaM2(i) * d[i];
            }
            rhs.set(a, 0, -r);
        }
        DMatrixRMaj x = new DMatrixRMaj(m, 1);
        lu.solve(rhs, x);
        for (int a = 0; a < m; a++) {
            dt[a] = x.get(a, 0);
        }
        return dt;
    }
}
