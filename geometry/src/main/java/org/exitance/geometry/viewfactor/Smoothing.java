package org.exitance.geometry.viewfactor;

/**
 * Enforcement of reciprocity and summation by least-squares smoothing of the facet exchange
 * areas ({@link ExchangeAreaSmoother}). The result always states the raw (unsmoothed) errors and
 * what smoothing changed.
 */
public enum Smoothing {
    /**
     * Default: CLOSED when the raw facet matrix is a closed enclosure within the tolerance (every
     * facet row sum within {@link ViewFactorOptions#tolerance()} of 1, and some row off by more
     * than {@link ViewFactorCalculator#AUTO_SMOOTHING_FLOOR}), else nothing. A matrix outside its
     * tolerance is never smoothed into looking closed.
     */
    AUTO,
    /** Leave the computed factors as they are. */
    NONE,
    /** Closed enclosure: symmetric exchange areas and every facet row summing to 1. */
    CLOSED,
    /**
     * Open enclosure: symmetric exchange areas; the remainder to the environment is free but kept
     * non-negative (rows whose sum exceeds 1 are constrained to sum to exactly 1).
     */
    OPEN
}
