package org.exitance.timeline;

import java.util.List;
import java.util.Map;
import org.exitance.conduction.HeatCapacity;
import org.exitance.model.BandSet;
import org.exitance.model.RadiationCase;

/** Builders of transient cases for the tests. */
final class Transients {
    private Transients() {
    }

    /** Time settings: adaptive steps with the given tolerance, output at the given instants. */
    static TimeSettings adaptive(double durationS, double toleranceK, double initialK, double... outputAt) {
        return new TimeSettings(durationS, toleranceK, durationS * 1e-7, durationS / 20, durationS * 1e-12, Double.NaN,
                Double.NaN, outputAt, initialK, Double.NaN, Double.NaN, List.of(), List.of());
    }

    /** Time settings with a fixed step. */
    static TimeSettings fixedStep(double durationS, double stepS, double initialK, double... outputAt) {
        return new TimeSettings(durationS, 1, stepS, stepS, stepS * 1e-6, stepS, Double.NaN, outputAt, initialK,
                Double.NaN, Double.NaN, List.of(), List.of());
    }

    static TransientResult run(RadiationCase m, Map<String, HeatCapacity> caps, Drivers d, TimeSettings ts) {
        return new TransientRun(new TransientCase(m, caps, d, ts), BandSet.gray("test")).run(null);
    }

    /** The temperature of a surface at the sample nearest t (K). */
    static double at(TransientResult r, String surface, double t) {
        int i = r.indexOf(surface);
        Sample best = r.samples().get(0);
        for (Sample s : r.samples()) {
            if (Math.abs(s.timeS() - t) < Math.abs(best.timeS() - t)) {
                best = s;
            }
        }
        if (Math.abs(best.timeS() - t) > 1e-6 * Math.max(1, t)) {
            throw new AssertionError("no sample at t = " + t);
        }
        return best.temperatureK()[i];
    }
}
