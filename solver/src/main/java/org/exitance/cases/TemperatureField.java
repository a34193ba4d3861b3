package org.exitance.cases;

import java.util.Optional;

/** A temperature given as {@code <prefix>_K} or {@code <prefix>_C} (docs/case-format.md); read in K. */
final class TemperatureField {
    private TemperatureField() {
    }

    /**
     * @param allowZero whether exactly 0 K is allowed (an environment may be at 0 K, a surface not)
     * @return the temperature in K, or empty when neither key is given
     */
    static Optional<Double> read(JsonCursor obj, String prefix, boolean allowZero) throws CaseException {
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
            throw v.error("temperature below absolute zero (" + value + (k ? " K" : " °C") + ")");
        }
        if (kelvin == 0 && !allowZero) {
            throw v.error("a surface temperature must be above 0 K");
        }
        return Optional.of(kelvin);
    }
}
