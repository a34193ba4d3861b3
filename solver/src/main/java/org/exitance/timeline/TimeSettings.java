package org.exitance.timeline;

import java.util.List;

/**
 * How a transient is integrated and reported (docs/transient.md).
 *
 * @param durationS        time to integrate (s); in a periodic run, the longest it may take
 * @param toleranceK       local error allowed per step in every temperature (K)
 * @param firstStepS       the step after a start or a switch (s)
 * @param maxStepS         the largest step (s)
 * @param minStepS         the floor: a step that must be cut below it ends the run (s)
 * @param fixedStepS       a fixed step (s) instead of error control, or NaN
 * @param outputEveryS     output spacing (s), or NaN for the start and end only
 * @param outputAtS        more output instants (s); copied
 * @param initialK         starting temperature of nodes and walls without their own (K)
 * @param periodS          the period of a periodic run (s), or NaN for a run of durationS
 * @param periodToleranceK a periodic run stops when no temperature differs from one period
 *                         earlier by more than this (K)
 * @param targets          temperatures to report the reaching time of; copied
 * @param plotNodes        the surfaces shown in the table and plot (empty: every unknown node); copied
 */
public record TimeSettings(double durationS, double toleranceK, double firstStepS, double maxStepS, double minStepS,
                           double fixedStepS, double outputEveryS, double[] outputAtS, double initialK,
                           double periodS, double periodToleranceK, List<Target> targets, List<String> plotNodes) {
    public TimeSettings {
        outputAtS = outputAtS.clone();
        targets = List.copyOf(targets);
        plotNodes = List.copyOf(plotNodes);
        if (!(durationS > 0) || !(toleranceK > 0) || !(minStepS > 0) || !(maxStepS >= minStepS)) {
            throw new IllegalArgumentException("duration, tolerance and steps must be positive");
        }
    }

    /** True for a run repeated period by period until it repeats. */
    public boolean periodic() {
        return !Double.isNaN(periodS);
    }

    /**
     * A temperature a node is to reach: the first time it crosses it is reported.
     *
     * @param surface      the surface (node)
     * @param temperatureK the target (K)
     */
    public record Target(String surface, double temperatureK) { }
}
