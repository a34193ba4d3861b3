package org.exitance.cases;

/**
 * The largest accepted |α + ρ + τ − 1| of a window whose ε, ρ and τ are all given
 * (docs/case-format.md, "Measured data given as all three").
 *
 * @param value   the tolerance, a fraction from 0 to 1
 * @param stated  true when the material gives {@code measurementTolerance}; false for the default
 */
public record MeasurementTolerance(double value, boolean stated) {
}
