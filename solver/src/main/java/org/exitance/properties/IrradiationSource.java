package org.exitance.properties;

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
}
