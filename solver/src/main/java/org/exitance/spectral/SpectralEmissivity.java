package org.exitance.spectral;

/**
 * Diffuse hemispherical spectral emissivity model ε(λ, T). For a diffuse surface Kirchhoff's law
 * gives the spectral hemispherical absorptivity α(λ, T) = ε(λ, T) for any irradiation
 * (Siegel &amp; Howell 7th ed. Ch. 3; Modest 3rd ed. Ch. 3; Incropera 6th ed. Secs. 12.6–12.7).
 *
 * <p>Contract used by {@link BandAverages}: at every fixed temperature, ε is piecewise linear in
 * λ with nodes only at {@link #breakpointsUm()}, and constant below the first and above the last
 * node (for a gray model: constant everywhere). Band averages are exact for models honouring it.
 */
public interface SpectralEmissivity {

    /** ε(λ, T) in [0, 1]; λ in µm (≥ 0, +∞ allowed), T in K (&gt; 0). */
    double at(double wavelengthUm, double temperatureK);

    /**
     * Wavelengths (µm) where the piecewise-linear model has nodes, sorted and distinct; empty for
     * a gray model. Returns a fresh copy.
     */
    double[] breakpointsUm();

    /** True if ε does not depend on wavelength (at any temperature). */
    boolean isGray();

    /** True if ε depends on temperature. */
    boolean dependsOnTemperature();
}
