package org.exitance.timeline;

/**
 * The state at one output instant. Arrays are per surface in case order; do not modify them.
 *
 * @param timeS         time (s)
 * @param temperatureK  temperature (K)
 * @param heaterW       dissipation supplied (W), 0 for a surface without a dissipation condition
 * @param radiationW    net radiative heat leaving (W)
 * @param convectionW   heat leaving by convection (W)
 * @param linksW        heat leaving through conductive links (W)
 * @param wallInW       heat leaving the surface into its wall (W), 0 without a wall
 * @param wallOutW      heat leaving its wall through the outer face (W), 0 without a wall
 * @param storedJ       heat stored in capacities and walls (J, from 0 K)
 * @param suppliedJ     heat supplied since the start, the integrator's sum (J)
 * @param lostJ         heat lost since the start, the integrator's sum (J)
 * @param wallCellsK    per surface its wall's cell temperatures then outer face (K), or null
 */
public record Sample(double timeS, double[] temperatureK, double[] heaterW, double[] radiationW, double[] convectionW,
                     double[] linksW, double[] wallInW, double[] wallOutW, double storedJ, double suppliedJ,
                     double lostJ, double[][] wallCellsK) {
}
