package org.exitance.sensitivity;

import org.exitance.result.SolveResult;

/**
 * Sensitivities of a solved case to its band-mean emissivities (see
 * {@link TangentLinear#compute}).
 *
 * @param solved         the solve they belong to
 * @param netHeat        ∂Q_i/∂ε_jk (W per unit ε), indexed [i][j][k]; do not modify
 * @param temperature    ∂T_i/∂ε_jk (K per unit ε), indexed [i][j][k]; zero for fixed temperatures; do not modify
 */
public record EmissivitySensitivities(SolveResult solved, double[][][] netHeat, double[][][] temperature) {
}
