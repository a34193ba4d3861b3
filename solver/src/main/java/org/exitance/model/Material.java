package org.exitance.model;

import java.util.Objects;
import org.exitance.spectral.SpectralEmissivity;

/**
 * A named surface material: diffuse, opaque, with a spectral hemispherical emissivity.
 * By Kirchhoff's law for diffuse surfaces the spectral absorptivity equals the spectral
 * emissivity and the spectral reflectivity is {@code 1 − ε_λ}.
 *
 * @param name        the material's name as written in the case
 * @param emissivity  spectral hemispherical emissivity model
 * @param description free text from the case, may be empty
 */
public record Material(String name, SpectralEmissivity emissivity, String description) {
    public Material {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(emissivity, "emissivity");
        description = description == null ? "" : description;
    }
}
