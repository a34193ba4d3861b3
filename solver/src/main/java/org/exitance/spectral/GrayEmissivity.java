package org.exitance.spectral;

/**
 * Gray diffuse surface: ε independent of wavelength and temperature
 * (Incropera 6th ed. Sec. 12.7; Siegel &amp; Howell 7th ed. Ch. 3).
 *
 * @param value emissivity in [0, 1]
 */
public record GrayEmissivity(double value) implements SpectralEmissivity {

    private static final double[] NO_BREAKPOINTS = new double[0];

    public GrayEmissivity {
        if (!(value >= 0.0 && value <= 1.0)) {
            throw new IllegalArgumentException("gray emissivity must be in [0, 1], got " + value);
        }
    }

    @Override
    public double at(double wavelengthUm, double temperatureK) {
        return value;
    }

    @Override
    public double[] breakpointsUm() {
        return NO_BREAKPOINTS.clone();
    }

    @Override
    public boolean isGray() {
        return true;
    }

    @Override
    public boolean dependsOnTemperature() {
        return false;
    }
}
