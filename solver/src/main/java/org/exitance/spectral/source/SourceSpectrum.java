package org.exitance.spectral.source;

import java.util.Arrays;
import org.exitance.spectral.SpectralEmissivity;

/**
 * A tabulated source spectrum: spectral irradiance G_λ in W/(m²·µm) at increasing wavelengths in
 * µm, linear between the samples and <b>zero outside</b> the sampled range (a measured spectrum
 * says nothing beyond its ends). Absorptivity for it: {@link SpectrumAbsorptivity}.
 *
 * @param label              short name for tables and legends (e.g. the CSV file's name)
 * @param wavelengthUm       at least two wavelengths, finite, &gt; 0, strictly increasing (µm)
 * @param irradianceWM2PerUm G_λ at those wavelengths, finite, ≥ 0, not all zero (W/(m²·µm))
 */
public record SourceSpectrum(String label, double[] wavelengthUm, double[] irradianceWM2PerUm)
        implements IrradiationSource {

    /** @throws IllegalArgumentException naming the offending index */
    public SourceSpectrum {
        if (label == null || wavelengthUm == null || irradianceWM2PerUm == null) {
            throw new IllegalArgumentException("label, wavelengths and irradiances must not be null");
        }
        if (wavelengthUm.length != irradianceWM2PerUm.length) {
            throw new IllegalArgumentException(wavelengthUm.length + " wavelengths but " + irradianceWM2PerUm.length
                    + " irradiance values");
        }
        if (wavelengthUm.length < 2) {
            throw new IllegalArgumentException("a source spectrum needs at least two samples, got " + wavelengthUm.length);
        }
        for (int i = 0; i < wavelengthUm.length; i++) {
            double l = wavelengthUm[i];
            if (!(l > 0) || !Double.isFinite(l)) {
                throw new IllegalArgumentException("wavelength[" + i + "] = " + l + " µm must be finite and > 0");
            }
            if (i > 0 && !(l > wavelengthUm[i - 1])) {
                throw new IllegalArgumentException("wavelengths must increase: wavelength[" + i + "] = " + l
                        + " µm after " + wavelengthUm[i - 1] + " µm");
            }
            double g = irradianceWM2PerUm[i];
            if (!(g >= 0) || !Double.isFinite(g)) {
                throw new IllegalArgumentException("irradiance[" + i + "] = " + g + " W/(m²·µm) must be finite and >= 0");
            }
        }
        wavelengthUm = wavelengthUm.clone();
        irradianceWM2PerUm = irradianceWM2PerUm.clone();
        if (!(trapezoid(wavelengthUm, irradianceWM2PerUm) > 0)) {
            throw new IllegalArgumentException("the spectrum carries no power (all irradiance values are zero)");
        }
    }

    @Override
    public double[] wavelengthUm() {
        return wavelengthUm.clone();
    }

    @Override
    public double[] irradianceWM2PerUm() {
        return irradianceWM2PerUm.clone();
    }

    /** Total irradiance ∫ G_λ dλ in W/m² (exact for the piecewise-linear spectrum). */
    public double totalIrradianceWM2() {
        return trapezoid(wavelengthUm, irradianceWM2PerUm);
    }

    /** G_λ(λ) in W/(m²·µm): linear between samples, 0 outside [first, last]. */
    public double irradianceAt(double lambdaUm) {
        int n = wavelengthUm.length;
        if (!(lambdaUm >= wavelengthUm[0]) || lambdaUm > wavelengthUm[n - 1]) {
            return 0.0;
        }
        int i = Arrays.binarySearch(wavelengthUm, lambdaUm);
        if (i >= 0) {
            return irradianceWM2PerUm[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double h = (lambdaUm - wavelengthUm[lo]) / (wavelengthUm[hi] - wavelengthUm[lo]);
        return irradianceWM2PerUm[lo] + h * (irradianceWM2PerUm[hi] - irradianceWM2PerUm[lo]);
    }

    /** First sampled wavelength, µm. */
    public double firstUm() {
        return wavelengthUm[0];
    }

    /** Last sampled wavelength, µm. */
    public double lastUm() {
        return wavelengthUm[wavelengthUm.length - 1];
    }

    /** The largest sampled G_λ, W/(m²·µm) (the maximum of the piecewise-linear spectrum). */
    public double peakWM2PerUm() {
        double m = 0;
        for (double g : irradianceWM2PerUm) {
            m = Math.max(m, g);
        }
        return m;
    }

    @Override
    public double absorptivity(SpectralEmissivity e, double surfaceTemperatureK) {
        return SpectrumAbsorptivity.of(e, surfaceTemperatureK, this);
    }

    @Override
    public double bandFraction(double lowerUm, double upperUm) {
        double[] parts = SpectrumAbsorptivity.bandIntegrals(new org.exitance.spectral.GrayEmissivity(1.0), 300.0, this,
                lowerUm, upperUm);
        return Math.min(1.0, parts[1] / totalIrradianceWM2());
    }

    @Override
    public double bandAbsorptivity(SpectralEmissivity e, double lowerUm, double upperUm, double surfaceTemperatureK) {
        double[] parts = SpectrumAbsorptivity.bandIntegrals(e, surfaceTemperatureK, this, lowerUm, upperUm);
        if (!(parts[1] > 0)) {
            return org.exitance.spectral.BandAverages.planckMean(e, lowerUm, upperUm, surfaceTemperatureK);
        }
        return Math.min(1.0, Math.max(0.0, parts[0] / parts[1]));
    }

    /** A spectrum of the same shape scaled to a total irradiance (W/m²). */
    public SourceSpectrum scaledTo(double totalWM2) {
        double k = totalWM2 / totalIrradianceWM2();
        double[] g = irradianceWM2PerUm.clone();
        for (int i = 0; i < g.length; i++) {
            g[i] *= k;
        }
        return new SourceSpectrum(label, wavelengthUm, g);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SourceSpectrum s && label.equals(s.label) && Arrays.equals(wavelengthUm, s.wavelengthUm)
                && Arrays.equals(irradianceWM2PerUm, s.irradianceWM2PerUm);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * label.hashCode() + Arrays.hashCode(wavelengthUm)) + Arrays.hashCode(irradianceWM2PerUm);
    }

    @Override
    public String toString() {
        return "SourceSpectrum[" + label + ", " + wavelengthUm.length + " samples, " + firstUm() + "–" + lastUm() + " µm]";
    }

    private static double trapezoid(double[] x, double[] y) {
        double s = 0;
        for (int i = 1; i < x.length; i++) {
            s += 0.5 * (y[i - 1] + y[i]) * (x[i] - x[i - 1]);
        }
        return s;
    }
}
