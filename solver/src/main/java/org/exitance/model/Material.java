package org.exitance.model;

import java.util.Objects;
import org.exitance.spectral.SpectralEmissivity;

/**
 * A named surface material: diffuse, with a spectral hemispherical emissivity and, for a
 * semi-transparent material (a window of glass, quartz or a polymer film), a spectral
 * hemispherical transmissivity. By Kirchhoff's law for diffuse surfaces the spectral absorptivity
 * equals the spectral emissivity, and energy conservation gives the spectral reflectivity
 * {@code ρ_λ = 1 − ε_λ − τ_λ} (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed.,
 * ch. 3 and the treatment of partially transparent windows in enclosures; Modest, Radiative
 * Heat Transfer, 3rd ed., §3.2 and §5.4, from memory). An opaque material has τ = 0.
 *
 * @param name            the material's name as written in the case
 * @param emissivity      spectral hemispherical emissivity model (= absorptivity)
 * @param transmissivity  spectral hemispherical transmissivity model, or null for an opaque material;
 *                        ε_λ + τ_λ ≤ 1 at every wavelength (checked where the material is read)
 * @param description     free text from the case, may be empty
 * @param emissivityUncertainty  ± bound on ε (absolute, every wavelength), or NaN when not given;
 *                        used to propagate property uncertainty into results
 */
public record Material(String name, SpectralEmissivity emissivity, SpectralEmissivity transmissivity,
                       String description, double emissivityUncertainty) {

    /** An opaque material (τ = 0, ρ = 1 − ε). */
    public Material(String name, SpectralEmissivity emissivity, String description) {
        this(name, emissivity, null, description);
    }

    /** A material without a stated uncertainty. */
    public Material(String name, SpectralEmissivity emissivity, SpectralEmissivity transmissivity, String description) {
        this(name, emissivity, transmissivity, description, Double.NaN);
    }

    /** The same material with a ± bound on ε. */
    public Material withEmissivityUncertainty(double plusMinus) {
        return new Material(name, emissivity, transmissivity, description, plusMinus);
    }

    public Material {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(emissivity, "emissivity");
        description = description == null ? "" : description;
        if (!Double.isNaN(emissivityUncertainty) && !(emissivityUncertainty >= 0 && emissivityUncertainty <= 1)) {
            throw new IllegalArgumentException("emissivity uncertainty must lie in [0, 1]: " + emissivityUncertainty);
        }
    }

    /** True when the material passes radiation (it then belongs on a window: two faces, one temperature). */
    public boolean semiTransparent() {
        return transmissivity != null;
    }

    /** True when ε and τ are both independent of wavelength. */
    public boolean isGray() {
        return emissivity.isGray() && (transmissivity == null || transmissivity.isGray());
    }
}
