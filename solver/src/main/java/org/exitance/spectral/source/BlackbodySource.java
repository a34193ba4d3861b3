package org.exitance.spectral.source;

import java.util.Locale;
import org.exitance.spectral.BandAverages;
import org.exitance.spectral.SpectralEmissivity;

/**
 * A blackbody source at a temperature. The sun seen from outside the atmosphere is commonly
 * approximated by a blackbody near 5772 K (its effective temperature; common practice).
 * Absorptivity: {@link BandAverages#totalAbsorptivity}, evaluated exactly for piecewise-linear
 * tables (Siegel &amp; Howell 7th ed. Ch. 3; Incropera 6th ed. Sec. 12.5).
 *
 * @param temperatureK source temperature in K, finite and &gt; 0
 */
public record BlackbodySource(double temperatureK) implements IrradiationSource {

    public BlackbodySource {
        if (!(temperatureK > 0) || !Double.isFinite(temperatureK)) {
            throw new IllegalArgumentException("source temperature must be finite and above 0 K, got " + temperatureK);
        }
    }

    @Override
    public String label() {
        return kelvin(temperatureK) + " K blackbody";
    }

    /** A temperature for labels: whole kelvins without decimals, others to 6 significant digits. */
    public static String kelvin(double t) {
        if (t == Math.rint(t) && Math.abs(t) < 1e15) {
            return Long.toString((long) t);
        }
        String s = String.format(Locale.ROOT, "%.6g", t);
        return s.contains("e") ? s : s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }

    @Override
    public double absorptivity(SpectralEmissivity e, double surfaceTemperatureK) {
        return BandAverages.totalAbsorptivity(e, surfaceTemperatureK, temperatureK);
    }

    @Override
    public double bandFraction(double lowerUm, double upperUm) {
        return org.exitance.spectral.Planck.bandFraction(lowerUm, upperUm, temperatureK);
    }

    @Override
    public double bandAbsorptivity(SpectralEmissivity e, double lowerUm, double upperUm, double surfaceTemperatureK) {
        return BandAverages.planckMean(e, lowerUm, upperUm, temperatureK, surfaceTemperatureK);
    }
}
