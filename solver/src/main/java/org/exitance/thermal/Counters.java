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
    /** Jacobian–vector products of Newton–Krylov, in total. */
    int krylovProducts;
    /** Per band: the most linear-solver iterations of any of its solves. */
    int[] bandIterations = new int[0];

    /** Folds in the linear-solver statistics of a band loop. */
    void addLinear(BandLoop loop) {
        maxLinearIterations = Math.max(maxLinearIterations, loop.maxIterations());
        maxLinearResidual = Math.max(maxLinearResidual, loop.maxRelativeResidual());
        int[] perBand = loop.iterationsPerBand();
        if (perBand.length != bandIterations.length) {
            bandIterations = new int[perBand.length]; // a new band set (gray start, then the bands)
        }
        for (int k = 0; k < perBand.length; k++) {
            bandIterations[k] = Math.max(bandIterations[k], perBand[k]);
        }
    }
}
