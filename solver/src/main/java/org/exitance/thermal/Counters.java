package org.exitance.thermal;

/** Iteration bookkeeping for the report. */
final class Counters {
    int newtonIterations;
    int propertyIterations;
    double residualW;
    double lastStep = Double.POSITIVE_INFINITY;
    double lastOuterMove;
    int maxLinearIterations;
    double maxLinearResidual;
}
