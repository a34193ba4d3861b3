package org.exitance.audit;

/**
 * One surface under the three models. Net heats are radiative (W, positive leaving); temperatures
 * in K. Where the two-band model does not apply (no external source), its values are NaN.
 *
 * @param surface             surface name
 * @param temperatureSolved   whether the temperature is an unknown (then the error shows in K)
 * @param bandNetHeatW        band-wise solution (the reference)
 * @param grayNetHeatW        gray shortcut: one band, each surface's total ε at its own temperature for
 *                            emission and absorption alike
 * @param twoBandNetHeatW     solar band + infrared band (split at {@link GrayAudit#TWO_BAND_SPLIT_UM})
 * @param bandTemperatureK    band-wise temperature
 * @param grayTemperatureK    gray temperature
 * @param twoBandTemperatureK two-band temperature
 * @param grayErrorW          gray − band net heat (W)
 * @param grayErrorK          gray − band temperature (K)
 * @param grayErrorPct        the error in percent: of |band net heat| for a fixed-temperature surface
 *                            (with a floor of 1 % of the largest |net heat| in the case, and of 1e-9 of
 *                            the power in play); for a surface
 *                            whose temperature is solved, the error of its emissive power σT⁴,
 *                            100·((T_gray/T_band)⁴ − 1), which is what its heat exchange feels
 * @param flagged             |grayErrorPct| above the threshold
 * @param cause               the explanation in numbers (also given for surfaces not flagged)
 */
public record AuditRow(String surface, boolean temperatureSolved, double bandNetHeatW, double grayNetHeatW,
                       double twoBandNetHeatW, double bandTemperatureK, double grayTemperatureK,
                       double twoBandTemperatureK, double grayErrorW, double grayErrorK, double grayErrorPct,
                       boolean flagged, GrayCause cause) {
}
