package org.exitance.cases;

import java.util.Optional;

/**
 * A temperature given as {@code <prefix>_K} or {@code <prefix>_C} (docs/case-format.md); read in K
 * and checked against its range ({@link Limits}), which a message states in the unit the key uses.
 */
final class TemperatureField {
    private TemperatureField() {
    }

    /** As {@link #read(JsonCursor, String, Limits.Range)} for a surface, fluid or table temperature. */
    static Optional<Double> read(JsonCursor obj, String prefix) throws CaseException {
        return read(obj, prefix, Limits.TEMPERATURE_K);
    }

    /**
     * @param range the range in K ({@link Limits#ENVIRONMENT_TEMPERATURE_K} allows 0 K, a surface
     *              temperature does not)
     * @return the temperature in K, or empty when neither key is given
     */
    static Optional<Double> read(JsonCursor obj, String prefix, Limits.Range range) throws CaseException {
        boolean k = obj.has(prefix + "_K");
        boolean c = obj.has(prefix + "_C");
        if (k && c) {
            throw obj.error("give " + prefix + "_K or " + prefix + "_C, not both");
        }
        if (!k && !c) {
            return Optional.empty();
        }
        JsonCursor v = obj.field(prefix + (k ? "_K" : "_C"));
        double value = v.number();
        double kelvin = k ? value : value + 273.15;
        if (kelvin < 0) {
            throw v.error("temperature below absolute zero (" + Limits.number(value) + (k ? " K" : " °C") + ")");
        }
        if (kelvin == 0 && range.min() > 0) {
            throw v.error("a surface temperature must be above 0 K");
        }
        if (!range.contains(kelvin)) {
            String allowed = k ? range.describe() : "between " + Limits.number(range.min() - 273.15) + " °C and "
                    + Limits.number(range.max() - 273.15) + " °C";
            throw v.error("must lie " + allowed + " (see Limits in docs/case-format.md), got " + Limits.number(value)
                    + (k ? " K" : " °C"));
        }
        return Optional.of(kelvin);
    }
}
