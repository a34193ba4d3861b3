package org.exitance.properties;

/**
 * One surface temperature of a {@link MaterialSurvey}: total hemispherical emissivity and the
 * total absorptivity for each source, in the survey's source order.
 *
 * @param temperatureK    surface temperature, K
 * @param totalEmissivity ε(T) = ∫ ε_λ E_bλ(T) dλ / σT⁴
 * @param absorptivity    α for source k at this surface temperature (copied)
 * @param totalTransmissivity  for a window: τ(T) = ∫ τ_λ E_bλ(T) dλ / σT⁴, the share of a blackbody
 *                             at the surface's own temperature that passes; NaN for an opaque material
 * @param transmissivity  for a window: τ for source k (copied; empty for an opaque material)
 */
public record SurveyRow(double temperatureK, double totalEmissivity, double[] absorptivity,
                        double totalTransmissivity, double[] transmissivity) {
    public SurveyRow {
        absorptivity = absorptivity.clone();
        transmissivity = transmissivity.clone();
    }

    /** An opaque material's row. */
    public SurveyRow(double temperatureK, double totalEmissivity, double[] absorptivity) {
        this(temperatureK, totalEmissivity, absorptivity, Double.NaN, new double[0]);
    }

    @Override
    public double[] transmissivity() {
        return transmissivity.clone();
    }

    /** Whether the row belongs to a window (semi-transparent material). */
    public boolean window() {
        return !Double.isNaN(totalTransmissivity);
    }

    /**
     * Total reflectivity for a blackbody at the surface's temperature: ρ(T) = 1 − ε(T) − τ(T) for a
     * window, 1 − ε(T) for an opaque material (α = ε, Kirchhoff; α + ρ + τ = 1).
     */
    public double totalReflectivity() {
        return 1 - totalEmissivity - (window() ? totalTransmissivity : 0);
    }

    @Override
    public double[] absorptivity() {
        return absorptivity.clone();
    }

    /** α for source k. */
    public double absorptivity(int k) {
        return absorptivity[k];
    }

    /**
     * α/ε for source k: the ratio that sets a sunlit surface's equilibrium temperature. +∞ when
     * ε = 0 and α &gt; 0; NaN when both are 0.
     */
    public double alphaOverEpsilon(int k) {
        return absorptivity[k] / totalEmissivity;
    }
}
