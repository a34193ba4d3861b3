package org.exitance.validation;

import java.util.List;

/**
 * The reference values a validation case carries, with their source and tolerance. A computed
 * value c passes against an expected value e when |c − e| ≤ relativeTolerance·|e| + absoluteTolerance.
 *
 * @param source             the published source (book, edition, equation or table)
 * @param derivation         how the reference numbers follow from the source, in words
 * @param relativeTolerance  relative tolerance (–)
 * @param absoluteTolerance  absolute tolerance in the quantity's own unit
 * @param values             the expected values
 */
public record ExpectedValues(String source, String derivation, double relativeTolerance, double absoluteTolerance,
                             List<Expectation> values) {
    public ExpectedValues {
        values = List.copyOf(values);
    }

    /** Whether a computed value passes against an expected one. */
    public boolean passes(double computed, double expected) {
        return Math.abs(computed - expected) <= relativeTolerance * Math.abs(expected) + absoluteTolerance;
    }
}
