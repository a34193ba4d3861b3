package org.exitance.timeline;

import java.util.List;

/**
 * What a transient run found. Lists are unmodifiable.
 *
 * @param title        the case title
 * @param surfaces     surface names in case order (the order of every per-surface array)
 * @param shown        the surfaces chosen for the table and plot
 * @param samples      the output instants, in time order
 * @param extremes     per unknown node, its lowest and highest temperature at the steps
 * @param targets      per target, the time it was first reached (NaN: not reached)
 * @param switches     every thermostat switch, in time order
 * @param cycles       in a periodic run, one entry per period integrated; empty otherwise
 * @param repeated     in a periodic run, whether the last period repeated within the tolerance
 * @param energy       the run's energy account
 * @param steps        step statistics
 * @param toleranceK   the local error tolerance per step (K), or NaN in fixed-step mode
 * @param bands        the band set's label
 */
public record TransientResult(String title, List<String> surfaces, List<String> shown, List<Sample> samples,
                              List<Extremes> extremes, List<TargetTime> targets, List<Switch> switches, List<Cycle> cycles, boolean repeated,
                              Energy energy, Steps steps, double toleranceK, String bands) {
    public TransientResult {
        surfaces = List.copyOf(surfaces);
        shown = List.copyOf(shown);
        samples = List.copyOf(samples);
        extremes = List.copyOf(extremes);
        targets = List.copyOf(targets);
        cycles = List.copyOf(cycles);
        switches = List.copyOf(switches);
    }

    /** Index of a surface by name, or −1. */
    public int indexOf(String surface) {
        return surfaces.indexOf(surface);
    }

    /** Lowest and highest temperature of a node (K) and when (s). */
    public record Extremes(String surface, double minK, double minTimeS, double maxK, double maxTimeS) { }

    /** A thermostat switched its heater on or off at a time (s). */
    public record Switch(double timeS, String heater, boolean on) { }

    /** The first time (s) a node reached a temperature (K), NaN when it did not. */
    public record TargetTime(String surface, double targetK, double timeS) { }

    /**
     * One period of a periodic run: energy supplied and lost over it (J), the change of stored
     * heat (J), and the largest change of any temperature from the period's start (K).
     */
    public record Cycle(int number, double startS, double endS, double suppliedJ, double lostJ, double storedChangeJ,
                        double maxChangeK) { }

    /**
     * The energy account of the run (J): stored at start and end, supplied and lost (the
     * integrator's sums, trapezoidal over the steps). The drift is what the sums leave unexplained.
     */
    public record Energy(double storedStartJ, double storedEndJ, double suppliedJ, double lostJ) {
        /** (stored end − start) − (supplied − lost) (J). */
        public double driftJ() {
            return storedEndJ - storedStartJ - (suppliedJ - lostJ);
        }

        /** |drift| over the largest of |stored change|, supplied and |lost| (0 when all are 0). */
        public double driftRelative() {
            double scale = Math.max(Math.abs(storedEndJ - storedStartJ), Math.max(Math.abs(suppliedJ), Math.abs(lostJ)));
            return scale == 0 ? 0 : Math.abs(driftJ()) / scale;
        }
    }

    /** Accepted and rejected steps, smallest and largest accepted step (s), thermostat switches. */
    public record Steps(int accepted, int rejected, double smallestS, double largestS, int switches) { }
}
