package org.exitance.model;

/**
 * What is known about a surface's energy balance. Net heat is the net radiative power
 * leaving the surface (W), positive when the surface loses heat by radiation.
 *
 * <p>Two kinds of condition leave the temperature unknown. {@link FixedNetHeat} and
 * {@link FixedNetFlux} fix the <em>radiative</em> net heat; convection and conductive links of
 * such a surface are computed and reported but do not enter its balance. {@link HeatInput} and
 * {@link Adiabatic} fix the <em>total</em> energy balance: heat supplied from outside the model
 * (dissipation, electric power; zero for adiabatic) leaves by radiation, convection and
 * conductive links.
 */
public sealed interface BoundaryCondition {

    /** The temperature is known; the net heat is computed. */
    record FixedTemperature(double temperatureK) implements BoundaryCondition { }

    /** The net radiative heat leaving the surface is known (W); the temperature is computed. */
    record FixedNetHeat(double netHeatW) implements BoundaryCondition { }

    /** The net radiative flux leaving the surface is known (W/m²); the temperature is computed. */
    record FixedNetFlux(double netFluxWPerM2) implements BoundaryCondition { }

    /**
     * No heat supplied from outside the model: radiation, convection and conductive links
     * balance. Without convection or links this is a reradiating surface (net radiative heat zero).
     */
    record Adiabatic() implements BoundaryCondition { }

    /**
     * Heat supplied to the surface from outside the model (W), e.g. electrical dissipation; it
     * leaves by radiation, convection and conductive links. The temperature is computed.
     */
    record HeatInput(double powerW) implements BoundaryCondition { }

    /**
     * The second face of a window: the window's condition is given on its other face, and both
     * faces share that face's temperature (see {@link EnclosureSurface#otherFace()}).
     */
    record OnOtherFace() implements BoundaryCondition { }

    /**
     * Whether the surface temperature is an unknown of the solve, counted once per thermal node:
     * false for {@link OnOtherFace}, whose temperature is the other face's (unknown or not).
     */
    default boolean temperatureUnknown() {
        return !(this instanceof FixedTemperature) && !(this instanceof OnOtherFace);
    }

    /**
     * Target (W) for a surface of the given area, for conditions with an unknown temperature: the
     * radiative net heat for {@link FixedNetHeat} and {@link FixedNetFlux}, the heat supplied for
     * {@link HeatInput} and {@link Adiabatic} (see {@link #balancesAllPaths()}).
     */
    default double targetNetHeatW(double areaM2) {
        if (this instanceof FixedNetHeat h) {
            return h.netHeatW();
        }
        if (this instanceof FixedNetFlux f) {
            return f.netFluxWPerM2() * areaM2;
        }
        if (this instanceof HeatInput p) {
            return p.powerW();
        }
        if (this instanceof Adiabatic) {
            return 0.0;
        }
        throw new IllegalStateException("a fixed-temperature surface (or a window face whose condition is on its"
                + " other face) has no target heat");
    }

    /**
     * True when the target counts radiation, convection and conductive links together
     * ({@link HeatInput}, {@link Adiabatic}); false when it counts radiation only.
     */
    default boolean balancesAllPaths() {
        return this instanceof HeatInput || this instanceof Adiabatic;
    }

    /** A short label for tables: "fixed T", "fixed Q", "fixed q", "dissipation", "adiabatic". */
    default String label() {
        if (this instanceof FixedTemperature) {
            return "fixed T";
        }
        if (this instanceof FixedNetHeat) {
            return "fixed Q";
        }
        if (this instanceof FixedNetFlux) {
            return "fixed q";
        }
        if (this instanceof HeatInput) {
            return "dissipation";
        }
        if (this instanceof OnOtherFace) {
            return "other face";
        }
        return "adiabatic";
    }
}
