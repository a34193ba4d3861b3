package org.exitance.spectral.source;

import org.exitance.spectral.SpectralEmissivity;

/**
 * Radiation arriving at a surface, given by its spectral distribution: a blackbody at a
 * temperature, or a tabulated spectrum. A diffuse surface absorbs the fraction
 * α = ∫ ε(λ, T_surface) G_λ dλ / ∫ G_λ dλ of it (Kirchhoff's law α_λ = ε_λ for diffuse surfaces;
 * Siegel &amp; Howell 7th ed. Ch. 3; Incropera 6th ed. Secs. 12.5–12.7).
 */
public sealed interface IrradiationSource permits BlackbodySource, SourceSpectrum {

    /** Short label for tables and legends, e.g. "5772 K blackbody". */
    String label();

    /** Total absorptivity in [0, 1] of a diffuse surface with emissivity {@code e} at {@code surfaceTemperatureK}. */
    double absorptivity(SpectralEmissivity e, double surfaceTemperatureK);

    /** Share in [0, 1] of the source's power in the band [lowerUm, upperUm] (upper may be +∞). */
    double bandFraction(double lowerUm, double upperUm);

    /**
     * Absorptivity in [0, 1] of a diffuse surface for the source's radiation within one band:
     * {@code ∫_band ε G_λ dλ / ∫_band G_λ dλ}. Where the source has no power in the band, the
     * value does not matter to any heat flow; the Planck mean at the surface temperature is
     * returned then.
     */
    double bandAbsorptivity(SpectralEmissivity e, double lowerUm, double upperUm, double surfaceTemperatureK);
}
