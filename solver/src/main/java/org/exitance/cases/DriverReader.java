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

/**
 * Reads {@code time.schedules} and {@code time.thermostats} (docs/case-format.md, "time"):
 * dissipation or temperature of a surface, a source's scale and the environment's temperature
 * against time, and heaters switched by a sensed temperature.
 */
final class DriverReader {
    private DriverReader() {
    }

    static Drivers read(JsonCursor t, Map<String, EnclosureSurface> byName, Set<String> sources, boolean environment)
            throws CaseException {
        Map<String, Schedule> power = new HashMap<>();
        Map<String, Schedule> temperature = new HashMap<>();
        Map<String, Schedule> scale = new HashMap<>();
        Schedule env = null;
        if (t.has("schedules")) {
            for (JsonCursor s : t.field("schedules").elementsWithin(Limits.TABLE_POINTS)) {
                s.allowOnly("surface", "dissipation_W", "temperature_K", "temperature_C", "source", "scale",
                        "environment_K", "environment_C", "description");
                String what = s.exactlyOneOf("dissipation_W", "temperature_K", "temperature_C", "scale", "environment_K",
                        "environment_C");
                switch (what) {
                    case "dissipation_W", "temperature_K", "temperature_C" -> {
                        String name = TimeReader.surface(s.field("surface"), byName);
                        BoundaryCondition bc = byName.get(name).boundary();
                        boolean heat = what.equals("dissipation_W");
                        if (heat && !(bc instanceof BoundaryCondition.HeatInput)) {
                            throw s.field("surface").error("a dissipation schedule needs a surface with a dissipation_W"
                                    + " condition (the face that carries it)");
                        }
                        if (!heat && !(bc instanceof BoundaryCondition.FixedTemperature)) {
                            throw s.field("surface").error("a temperature schedule needs a surface with a fixed"
                                    + " temperature");
                        }
                        Map<String, Schedule> into = heat ? power : temperature;
                        if (power.containsKey(name) || temperature.containsKey(name)) {
                            throw s.field("surface").error("surface '" + name + "' already has a schedule");
                        }
                        into.put(name, heat ? TimeReader.schedule(s.field(what), Limits.HEAT_W)
                                : kelvin(s.field(what), what.endsWith("_C"), Limits.TEMPERATURE_K));
                    }
                    case "scale" -> {
                        String src = s.field("source").nonEmptyText();
                        if (!sources.contains(src)) {
                            throw s.field("source").error("no source named '" + src + "'");
                        }
                        if (scale.containsKey(src)) {
                            throw s.field("source").error("source '" + src + "' already has a schedule");
                        }
                        scale.put(src, TimeReader.schedule(s.field("scale"), Limits.SOURCE_SCALE));
                    }
                    default -> {
                        if (!environment) {
                            throw s.field(what).error("the case has no environment to schedule");
                        }
                        if (env != null) {
                            throw s.field(what).error("the environment already has a schedule");
                        }
                        env = kelvin(s.field(what), what.endsWith("_C"), Limits.ENVIRONMENT_TEMPERATURE_K);
                    }
                }
            }
        }
        List<Drivers.Thermostat> thermostats = new ArrayList<>();
        if (t.has("thermostats")) {
            for (JsonCursor th : t.field("thermostats").elementsWithin(Limits.TABLE_POINTS)) {
                th.allowOnly("heater", "sensor", "on_K", "on_C", "off_K", "off_C", "power_W", "description");
                String heater = TimeReader.surface(th.field("heater"), byName);
                if (!(byName.get(heater).boundary() instanceof BoundaryCondition.HeatInput)) {
                    throw th.field("heater").error("a thermostat's heater needs a dissipation_W condition (its base power,"
                            + " often 0)");
                }
                String sensor = TimeReader.surface(th.field("sensor"), byName);
                double on = TemperatureField.read(th, "on").orElseThrow(() -> th.error("missing required key 'on_K'"));
                double off = TemperatureField.read(th, "off").orElseThrow(() -> th.error("missing required key 'off_K'"));
                if (!(off > on)) {
                    throw th.error("the off temperature must lie above the on temperature");
                }
                thermostats.add(new Drivers.Thermostat(heater, sensor, on, off,
                        th.field("power_W").within(Limits.HEAT_W)));
            }
        }
        return new Drivers(power, temperature, scale, env, thermostats);
    }

    /** A temperature schedule, its values in K or °C (converted to K and checked in K). */
    private static Schedule kelvin(JsonCursor s, boolean celsius, Limits.Range range) throws CaseException {
        Schedule raw = TimeReader.schedule(s, new Limits.Range("temperature", -1e4, 1e5, celsius ? "°C" : "K"));
        double[] v = raw.value().clone();
        for (int i = 0; i < v.length; i++) {
            v[i] += celsius ? 273.15 : 0;
            if (!range.contains(v[i])) {
                throw s.field("value").error("temperature " + Limits.number(v[i]) + " K outside the range: must lie "
                        + range.describe());
            }
        }
        return new Schedule(raw.timeS(), v, raw.repeatS());
    }
}
