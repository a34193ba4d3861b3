package org.exitance.timeline;

import java.util.List;
import java.util.Map;

/**
 * What changes with time in a transient case.
 *
 * @param power        dissipation (W) against time, by surface name (surfaces with a dissipation condition)
 * @param temperature  temperature (K) against time, by surface name (surfaces with a fixed temperature)
 * @param sourceScale  factor on a source's irradiance against time, by source name (0 in eclipse)
 * @param environmentK the environment's temperature (K) against time, or null when it is constant
 * @param thermostats  heaters switched on and off by a sensed temperature
 */
public record Drivers(Map<String, Schedule> power, Map<String, Schedule> temperature,
                      Map<String, Schedule> sourceScale, Schedule environmentK, List<Thermostat> thermostats) {
    public Drivers {
        power = Map.copyOf(power);
        temperature = Map.copyOf(temperature);
        sourceScale = Map.copyOf(sourceScale);
        thermostats = List.copyOf(thermostats);
    }

    /** Nothing changes. */
    public static Drivers none() {
        return new Drivers(Map.of(), Map.of(), Map.of(), null, List.of());
    }

    /**
     * A heater switched by a sensed temperature with hysteresis: it switches on when the sensor
     * falls to {@code onBelowK} and off when it rises to {@code offAboveK}; between them it keeps
     * its state. It starts on when the sensor starts at or below {@code onBelowK}, and off otherwise.
     *
     * @param heater     the surface that dissipates (a dissipation condition); its power replaces the condition's
     * @param sensor     the surface whose temperature is sensed
     * @param onBelowK   switch-on temperature (K)
     * @param offAboveK  switch-off temperature (K), above onBelowK
     * @param powerW     dissipation while on (W); 0 while off
     */
    public record Thermostat(String heater, String sensor, double onBelowK, double offAboveK, double powerW) {
        public Thermostat {
            if (!(offAboveK > onBelowK)) {
                throw new IllegalArgumentException("a thermostat's off temperature must lie above its on temperature");
            }
        }
    }
}
