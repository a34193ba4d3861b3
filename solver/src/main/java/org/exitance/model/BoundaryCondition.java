package org.exitance.model;

/**
 * What is known about a surface's energy balance. Net heat is the net radiative power
 * leaving the surface (W), positive when the surface loses heat by radiation.
 */
public sealed interface BoundaryCondition {

    /** The temperature is known; the net heat is computed. */
    record FixedTemperature(double temperatureK) implements BoundaryCondition { }

    /** The net radiative heat leaving the surface is known (W); the temperature is computed. */
    record FixedNetHeat(double netHeatW) implements BoundaryCondition { }

    /** The net radiative flux leaving the surface is known (W/m²); the temperature is computed. */
    record FixedNetFlux(double netFluxWPerM2) implements BoundaryCondition { }

    /** A reradiating surface: net radiative heat zero; the temperature is computed. */
    record Adiabatic() implements BoundaryCondition { }

    /** Whether the surface temperature is an unknown of the solve. */
    default boolean temperatureUnknown() {
        return !(this instanceof FixedTemperature);
    }

    /**
     * Target net heat (W) for a surface of the given area; only for conditions with an
     * unknown temperature.
     */
    default double targetNetHeatW(double areaM2) {
        if (this instanceof FixedNetHeat h) {
            return h.netHeatW();
        }
        if (this instanceof FixedNetFlux f) {
            return f.netFluxWPerM2() * areaM2;
        }
        if (this instanceof Adiabatic) {
            return 0.0;
        }
        throw new IllegalStateException("a fixed-temperature surface has no target heat");
    }

    /** A short label for tables: "fixed T", "fixed Q", "fixed q", "adiabatic". */
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
        return "adiabatic";
    }
}
