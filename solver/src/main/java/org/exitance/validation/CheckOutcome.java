package org.exitance.validation;

/**
 * One expected value compared with the computed one.
 *
 * @param target    surface or environment name
 * @param quantity  "netHeat_W", "netFlux_W_m2" or "temperature_K"
 * @param expected  reference value
 * @param computed  Exitance's value (NaN when the solve failed)
 * @param allowed   the allowed absolute difference
 * @param passed    whether |computed − expected| ≤ allowed
 */
public record CheckOutcome(String target, String quantity, double expected, double computed, double allowed,
                           boolean passed) {
}
