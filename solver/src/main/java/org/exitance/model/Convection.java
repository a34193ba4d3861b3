package org.exitance.model;

/**
 * Convection from a surface to a fluid at a fixed temperature, Newton's law of cooling:
 * heat leaving the surface {@code Q = h A (T − T_fluid)} (W).
 *
 * @param coefficientWPerM2K  h, W/(m²·K), zero or more
 * @param fluidTemperatureK   T_fluid, K, above 0
 */
public record Convection(double coefficientWPerM2K, double fluidTemperatureK) {
    public Convection {
        if (!(coefficientWPerM2K >= 0) || !Double.isFinite(coefficientWPerM2K)) {
            throw new IllegalArgumentException("convection coefficient must be finite and >= 0: " + coefficientWPerM2K);
        }
        if (!(fluidTemperatureK > 0) || !Double.isFinite(fluidTemperatureK)) {
            throw new IllegalArgumentException("fluid temperature must be finite and > 0 K: " + fluidTemperatureK);
        }
    }

    /** Heat leaving a surface of the given area at temperature t (W). */
    public double heatW(double areaM2, double temperatureK) {
        return coefficientWPerM2K * areaM2 * (temperatureK - fluidTemperatureK);
    }
}
