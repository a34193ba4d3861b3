package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.exitance.model.Material;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.junit.jupiter.api.Test;

/**
 * The survey of a window: total transmissivity and reflectivity against an independent
 * quadrature of Planck's law (Independent), and ε + ρ + τ = 1 (energy conservation for a
 * semi-transparent diffuse sheet; Siegel &amp; Howell, 5th ed., §3.2).
 */
class WindowSurveyTest {
    @Test
    void aWindowsTotalTransmissivityIsItsPlanckWeightedMean() {
        double[] nodes = {0.4, 2.0, 3.0, 6.0};
        double[] tau = {0.9, 0.88, 0.4, 0.0};
        double[] eps = {0.05, 0.07, 0.5, 0.9};
        Material quartz = new Material("q", new TabulatedEmissivity(nodes, eps), new TabulatedEmissivity(nodes, tau), "");
        MaterialSurvey s = MaterialSurvey.of(quartz, new double[] {500, 1200}, List.of(new BlackbodySource(5772)));
        var tauOf = Independent.heldTable(nodes, tau);
        var epsOf = Independent.heldTable(nodes, eps);
        for (SurveyRow r : s.rows()) {
            double t = r.temperatureK();
            double all = Independent.integrate(l -> Independent.planck(l, t), 0.05, 2000, nodes);
            double passed = Independent.integrate(l -> tauOf.applyAsDouble(l) * Independent.planck(l, t), 0.05, 2000, nodes);
            double emitted = Independent.integrate(l -> epsOf.applyAsDouble(l) * Independent.planck(l, t), 0.05, 2000, nodes);
            assertThat(r.totalTransmissivity()).isCloseTo(passed / all, within(1e-6));
            assertThat(r.totalEmissivity() + r.totalReflectivity() + r.totalTransmissivity()).isCloseTo(1, within(1e-15));
            assertThat(r.totalReflectivity()).isCloseTo(1 - emitted / all - passed / all, within(1e-6));
        }
        // sunlight passes almost as the short-wave τ says
        assertThat(s.rows().get(0).transmissivity()[0]).isBetween(0.8, 0.9);
    }
}
