package org.exitance.model;

import java.util.Objects;

/**
 * One surface of the enclosure as the radiosity network sees it: isothermal, diffuse,
 * opaque, uniformly irradiated.
 *
 * @param name                 unique name
 * @param material             its material
 * @param areaM2               area in m², positive
 * @param boundary             what is known about its energy balance
 * @param initialTemperatureK  starting guess for an unknown temperature (K), or NaN for none
 */
public record EnclosureSurface(String name, Material material, double areaM2,
                               BoundaryCondition boundary, double initialTemperatureK) {
    public EnclosureSurface {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(boundary, "boundary");
        if (!(areaM2 > 0) || !Double.isFinite(areaM2)) {
            throw new IllegalArgumentException("area must be positive and finite: " + areaM2);
        }
    }
}
