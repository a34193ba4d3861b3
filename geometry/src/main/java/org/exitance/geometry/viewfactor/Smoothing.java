package org.exitance.geometry.viewfactor;

/**
 * Optional enforcement of reciprocity and summation by least-squares smoothing of the facet
 * exchange areas ({@link ExchangeAreaSmoother}). Never applied unless requested.
 */
public enum Smoothing {
    /** Leave the computed factors as they are (default). */
    NONE,
    /** Closed enclosure: symmetric exchange areas and every facet row summing to 1. */
    CLOSED,
    /**
     * Open enclosure: symmetric exchange areas; the remainder to the environment is free but kept
     * non-negative (rows whose sum exceeds 1 are constrained to sum to exactly 1).
     */
    OPEN
}
