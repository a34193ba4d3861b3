package org.exitance.cases;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;
import org.exitance.timeline.Drivers;
import org.exitance.timeline.Schedule;
import org.exitance.timeline.TimeSettings;

/**
 * Reads the {@code time} block of a case (docs/case-format.md, "time"; docs/transient.md): the
 * duration or the period, the tolerance, steps, output, targets, schedules and thermostats.
 */
final class TimeReader {
    private TimeReader() {
    }

    /** The time settings and the drivers of a case, read together. */
    record Block(TimeSettings settings, Drivers drivers) { }

    static Block read(JsonCursor t, List<EnclosureSurface> surfaces, Set<String> sources, boolean environment)
            throws CaseException {
        t.allowOnly("duration_s", "periodic", "tolerance_K", "firstStep_s", "maxStep_s", "minStep_s", "fixedStep_s",
                "initialTemperature_K", "initialTemperature_C", "output", "targets", "schedules", "thermostats");
        Map<String, EnclosureSurface> byName = new HashMap<>();
        surfaces.forEach(s -> byName.put(s.name(), s));
        double period = Double.NaN;
        double periodTol = Double.NaN;
        double duration;
        if (t.has("periodic")) {
            if (t.has("duration_s")) {
                throw t.field("duration_s").error("a periodic run lasts until it repeats: give periodic.maxCycles instead");
            }
            JsonCursor p = t.field("periodic").allowOnly("period_s", "tolerance_K", "maxCycles");
            period = p.field("period_s").positiveWithin(Limits.DURATION_S);
            periodTol = p.has("tolerance_K") ? p.field("tolerance_K").positiveWithin(Limits.STEP_TOLERANCE_K) : 0.01;
            int cycles = p.has("maxCycles") ? p.field("maxCycles").wholeWithin(Limits.CYCLES) : 20;
            duration = period * cycles;
        } else {
            duration = t.field("duration_s").positiveWithin(Limits.DURATION_S);
        }
        double tol = t.has("tolerance_K") ? t.field("tolerance_K").positiveWithin(Limits.STEP_TOLERANCE_K) : 0.01;
        double first = t.has("firstStep_s") ? t.field("firstStep_s").positiveWithin(Limits.STEP_S) : duration * 1e-6;
        double max = t.has("maxStep_s") ? t.field("maxStep_s").positiveWithin(Limits.STEP_S) : duration / 50;
        double min = t.has("minStep_s") ? t.field("minStep_s").positiveWithin(Limits.STEP_S) : duration * 1e-12;
        double fixed = t.has("fixedStep_s") ? t.field("fixedStep_s").positiveWithin(Limits.STEP_S) : Double.NaN;
        if (min > Math.min(first, max)) {
            throw t.error("minStep_s must not exceed firstStep_s or maxStep_s");
        }
        if (fixed < min || fixed > duration) {
            throw t.field("fixedStep_s").error("a fixed step must lie between minStep_s and the duration");
        }
        if (!Double.isNaN(fixed) && duration / fixed > 1e7) {
            throw t.field("fixedStep_s").error("more than 10 million fixed steps; take a larger step");
        }
        double initial = TemperatureField.read(t, "initialTemperature")
                .orElseThrow(() -> t.error("missing required key 'initialTemperature_K' (or 'initialTemperature_C')"));
        double every = Double.NaN;
        double[] at = new double[0];
        List<String> show = new ArrayList<>();
        if (t.has("output")) {
            JsonCursor o = t.field("output").allowOnly("every_s", "at_s", "show");
            if (o.has("every_s")) {
                every = o.field("every_s").positiveWithin(Limits.STEP_S);
                if (duration / every > 1e6) {
                    throw o.field("every_s").error("more than a million output instants; choose a larger spacing");
                }
            }
            if (o.has("at_s")) {
                List<JsonCursor> el = o.field("at_s").elementsWithin(Limits.TABLE_POINTS);
                at = new double[el.size()];
                for (int i = 0; i < at.length; i++) {
                    at[i] = el.get(i).within(Limits.TIME_S);
                }
            }
            if (o.has("show")) {
                for (JsonCursor s : o.field("show").elements()) {
                    show.add(surface(s, byName));
                }
            }
        }
        List<TimeSettings.Target> targets = new ArrayList<>();
        if (t.has("targets")) {
            for (JsonCursor g : t.field("targets").elementsWithin(Limits.TABLE_POINTS)) {
                g.allowOnly("surface", "temperature_K", "temperature_C");
                String s = surface(g.field("surface"), byName);
                double k = TemperatureField.read(g, "temperature")
                        .orElseThrow(() -> g.error("missing required key 'temperature_K' (or 'temperature_C')"));
                targets.add(new TimeSettings.Target(s, k));
            }
        }
        Drivers drivers = DriverReader.read(t, byName, sources, environment);
        try {
            return new Block(new TimeSettings(duration, tol, Math.min(first, max), max, min, fixed, every, at, initial,
                    period, periodTol, targets, show), drivers);
        } catch (IllegalArgumentException e) {
            throw t.error(e.getMessage());
        }
    }

    /** A surface name that must exist. */
    static String surface(JsonCursor c, Map<String, EnclosureSurface> byName) throws CaseException {
        String s = c.nonEmptyText();
        if (!byName.containsKey(s)) {
            throw c.error("no surface named '" + s + "'");
        }
        return s;
    }

    /** The boundary of the face that carries the node's condition. */
    static BoundaryCondition carrier(String name, Map<String, EnclosureSurface> byName) {
        EnclosureSurface s = byName.get(name);
        return s.boundary() instanceof BoundaryCondition.OnOtherFace ? byName.get(s.otherFace()).boundary() : s.boundary();
    }

    /** A schedule object {"time_s": [...], "value": [...], "repeat_s": P}. */
    static Schedule schedule(JsonCursor s, Limits.Range range) throws CaseException {
        s.allowOnly("time_s", "value", "repeat_s");
        List<JsonCursor> ts = s.field("time_s").elementsWithin(Limits.TABLE_POINTS);
        List<JsonCursor> vs = s.field("value").elementsWithin(Limits.TABLE_POINTS);
        if (ts.isEmpty() || ts.size() != vs.size()) {
            throw s.error("needs as many values as times, at least one");
        }
        double[] x = new double[ts.size()];
        double[] y = new double[ts.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = ts.get(i).within(Limits.TIME_S);
            y[i] = vs.get(i).within(range);
            if (i > 0 && x[i] < x[i - 1]) {
                throw ts.get(i).error("schedule times must not decrease");
            }
            if (i > 1 && x[i] == x[i - 2]) {
                throw ts.get(i).error("at most two schedule points may share a time (a jump)");
            }
        }
        double repeat = s.has("repeat_s") ? s.field("repeat_s").positiveWithin(Limits.DURATION_S) : Double.NaN;
        if (!Double.isNaN(repeat) && x[x.length - 1] > repeat) {
            throw s.field("repeat_s").error("a repeating schedule's times must lie within its repeat period");
        }
        return new Schedule(x, y, repeat);
    }
}
