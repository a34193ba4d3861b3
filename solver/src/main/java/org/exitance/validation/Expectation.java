package org.exitance.validation;

/**
 * One expected value of a validation case.
 *
 * @param target        surface name, or the environment's name
 * @param quantity      "netHeat_W", "netFlux_W_m2" or "temperature_K"
 * @param value         the reference value in the quantity's unit
 */
public record Expectation(String target, String quantity, double value) {
}
