package org.exitance.model;

import java.util.Objects;

/**
 * One surface of the enclosure as the radiosity network sees it: isothermal, diffuse,
 * uniformly irradiated. An opaque surface is one node of the network. A node with two faces is
 * two surfaces that name each other in {@code otherFace}: each face is a row and column of the
 * view-factor matrix and sees its own side, but both share one temperature and one energy
 * balance. It is a window when its material is semi-transparent (what one face receives and
 * transmits leaves the other; both faces use the same material), and otherwise a two-sided opaque
 * plate (a shield, a baffle, a radiator fin, an oven shelf), whose faces may carry different
 * coatings. The boundary condition is carried by one face; the other face has
 * {@link BoundaryCondition.OnOtherFace}.
 *
 * @param name                 unique name
 * @param material             its material
 * @param areaM2               area in m², positive
 * @param boundary             what is known about its energy balance
 * @param initialTemperatureK  starting guess for an unknown temperature (K), or NaN for none
 * @param convection           convection to a fluid, or null for none
 * @param otherFace            name of the other face of a window or two-sided plate, or null for a
 *                             surface with one face
 */
public record EnclosureSurface(String name, Material material, double areaM2,
                               BoundaryCondition boundary, double initialTemperatureK, Convection convection,
                               String otherFace) {

    /** A surface without convection. */
    public EnclosureSurface(String name, Material material, double areaM2, BoundaryCondition boundary,
                            double initialTemperatureK) {
        this(name, material, areaM2, boundary, initialTemperatureK, null, null);
    }

    /** An opaque surface (no other face). */
    public EnclosureSurface(String name, Material material, double areaM2, BoundaryCondition boundary,
                            double initialTemperatureK, Convection convection) {
        this(name, material, areaM2, boundary, initialTemperatureK, convection, null);
    }

    public EnclosureSurface {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(boundary, "boundary");
        if (!(areaM2 > 0) || !Double.isFinite(areaM2)) {
            throw new IllegalArgumentException("area must be positive and finite: " + areaM2);
        }
        if (otherFace != null && otherFace.equals(name)) {
            throw new IllegalArgumentException("surface '" + name + "' names itself as its other face");
        }
    }

    /** True for a face of a window (a semi-transparent node with two faces). */
    public boolean isWindowFace() {
        return otherFace != null && material.semiTransparent();
    }

    /** True for a face of a node with two faces: a window or a two-sided opaque plate. */
    public boolean hasOtherFace() {
        return otherFace != null;
    }

    /** The same surface with another boundary condition (and initial temperature). */
    public EnclosureSurface withBoundary(BoundaryCondition bc, double initialK) {
        return new EnclosureSurface(name, material, areaM2, bc, initialK, convection, otherFace);
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
