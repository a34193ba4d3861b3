package org.exitance.conduction;

/**
 * The heat capacity of a lumped node: a mass times a specific heat c(T), or a heat capacity
 * given directly (then {@code massKg} is 1 and the table holds J/K). The stored energy is
 * counted from 0 K, {@code E(T) = m ∫₀^T c dT'}, so that c(T) stores exactly what a temperature
 * change takes (Incropera et al., 6th ed., §5.2: the lumped capacitance ρVc).
 *
 * @param massKg        mass (kg), positive
 * @param specificHeat  c(T) (J/(kg·K))
 */
public record HeatCapacity(double massKg, PropertyTable specificHeat) {
    public HeatCapacity {
        if (!(massKg > 0) || !Double.isFinite(massKg)) {
            throw new IllegalArgumentException("mass must be positive and finite: " + massKg);
        }
    }

    /** A heat capacity given in J/K. */
    public static HeatCapacity ofJPerK(double c) {
        return new HeatCapacity(1.0, PropertyTable.constant(c));
    }

    /** dE/dT at t (J/K). */
    public double jPerK(double t) {
        return massKg * specificHeat.at(t);
    }

    /** E(T) from 0 K (J). */
    public double energyJ(double t) {
        return massKg * specificHeat.integralFromZero(t);
    }
}
