package org.exitance.conduction;

/** What the outer face of a wall meets. */
public sealed interface OuterBoundary {

    /**
     * Convection and radiation to an ambient at one temperature: the outer face loses
     * {@code h (T_o − T_a) + ε σ (T_o⁴ − T_a⁴)} W/m² (a small gray surface in large surroundings,
     * Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., eq. 1.7).
     *
     * @param convectionWPerM2K  h (W/(m²·K)), ≥ 0
     * @param emissivity         ε of the outer face, in [0, 1]
     * @param ambientK           T_a (K)
     */
    record Exposed(double convectionWPerM2K, double emissivity, double ambientK) implements OuterBoundary { }

    /** The outer face held at a temperature (K), e.g. a water-cooled shell. */
    record Held(double temperatureK) implements OuterBoundary { }

    /** No heat crosses the outer face (a plane of symmetry, or perfect insulation). */
    record Insulated() implements OuterBoundary { }
}
