package org.exitance.properties;

/**
 * One surface temperature of a {@link MaterialSurvey}: total hemispherical emissivity and the
 * total absorptivity for each source, in the survey's source order.
 *
 * @param temperatureK    surface temperature, K
 * @param totalEmissivity ε(T) = ∫ ε_λ E_bλ(T) dλ / σT⁴
 * @param absorptivity    α for source k at this surface temperature (copied)
 */
public record SurveyRow(double temperatureK, double totalEmissivity, double[] absorptivity) {
    public SurveyRow {
        absorptivity = absorptivity.clone();
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
