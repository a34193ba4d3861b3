package org.exitance.thermal;

import org.exitance.bands.BandLoop;

/** Iteration bookkeeping of one solve, for the report. */
final class Counters {
    int newtonIterations;
    int propertyIterations;
    double residualW;
    double lastStep = Double.POSITIVE_INFINITY;
    double lastOuterMove;
    int maxLinearIterations;
    double maxLinearResidual;

    /** Folds in the linear-solver statistics of a band loop. */
    void addLinear(BandLoop loop) {
        maxLinearIterations = Math.max(maxLinearIterations, loop.maxIterations());
        maxLinearResidual = Math.max(maxLinearResidual, loop.maxRelativeResidual());
    }
}
