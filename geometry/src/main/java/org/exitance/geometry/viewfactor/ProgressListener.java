package org.exitance.geometry.viewfactor;

/**
 * Receives the fraction of facet pairs done during a view-factor computation. Called from worker
 * threads after each finished row, serialised (never concurrently), with non-decreasing values;
 * keep it cheap.
 */
@FunctionalInterface
public interface ProgressListener {

    /** A listener that ignores progress. */
    ProgressListener NONE = fraction -> { };

    /** @param fractionDone in [0, 1] */
    void progress(double fractionDone);
}
