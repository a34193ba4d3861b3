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
 * @param convection           convection to a fluid, or null for none
 */
public record EnclosureSurface(String name, Material material, double areaM2,
                               BoundaryCondition boundary, double initialTemperatureK, Convection convection) {

    /** A surface without convection. */
    public EnclosureSurface(String name, Material material, double areaM2, BoundaryCondition boundary,
                            double initialTemperatureK) {
        this(name, material, areaM2, boundary, initialTemperatureK, null);
    }

    public EnclosureSurface {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(boundary, "boundary");
        if (!(areaM2 > 0) || !Double.isFinite(areaM2)) {
            throw new IllegalArgumentException("area must be positive and finite: " + areaM2);
        }
    }

    /** Heat leaving by convection at temperature t (W); 0 without convection. */
    public double convectionW(double temperatureK) {
        return convection == null ? 0.0 : convection.heatW(areaM2, temperatureK);
    }

    /** d(convection heat)/dT (W/K). */
    public double convectionConductanceWPerK() {
        return convection == null ? 0.0 : convection.coefficientWPerM2K() * areaM2;
    }
}
