package org.exitance.result;

/**
 * The environment of an open enclosure after a solve.
 *
 * @param name          its name
 * @param temperatureK  its fixed temperature (K)
 * @param netHeatW      net power leaving the environment into the enclosure (W); negative when
 *                      the enclosure loses heat to its surroundings
 * @param bandNetHeatW  the same per band (W); do not modify
 */
public record EnvironmentResult(String name, double temperatureK, double netHeatW, double[] bandNetHeatW) {
}
