package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.exitance.model.Material;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.junit.jupiter.api.Test;

/**
 * A spectrally selective surface (high ε below about 2 µm, low beyond; invented demo data)
 * against the defining integrals of total absorptivity and emissivity (Incropera 6th ed.
 * Secs. 12.4–12.5; Siegel &amp; Howell 7th ed. Ch. 3), evaluated by Commons Math quadrature of an
 * independently written Planck's law ({@link Independent}).
 */
class SelectiveSurfaceTest {
    private static final double[] WAVELENGTH_UM = {0.3, 1.2, 1.8, 2.5, 4, 10, 30};
    private static final double[] EMISSIVITY = {0.95, 0.93, 0.8, 0.3, 0.1, 0.07, 0.06};
    private static final Material SELECTIVE = new Material("selective",
            new TabulatedEmissivity(WAVELENGTH_UM, EMISSIVITY), "invented demo data");

    /** ∫ ε E_bλ(T_w) dλ / ∫ E_bλ(T_w) dλ over 0.01–1e5 µm (the rest of the spectrum carries < 1e-11 of σT⁴ here). */
    private static double reference(double weightK) {
        DoubleUnaryOperator eps = Independent.heldTable(WAVELENGTH_UM, EMISSIVITY);
        double num = Independent.integrate(l -> eps.applyAsDouble(l) * Independent.planck(l, weightK), 0.01, 1e5,
                WAVELENGTH_UM);
        double den = Independent.integrate(l -> Independent.planck(l, weightK), 0.01, 1e5, WAVELENGTH_UM);
        return num / den;
    }

    @Test
    void absorptivityForA5800KSourceAndEmissivityAt300KMatchTheirDefiningIntegrals() {
        MaterialSurvey s = MaterialSurvey.of(SELECTIVE, new double[] {300}, List.of(new BlackbodySource(5800)));
        SurveyRow row = s.rows().get(0);
        double alphaRef = reference(5800);
        double epsRef = reference(300);

        assertThat(row.absorptivity(0)).isCloseTo(alphaRef, within(1e-9 * alphaRef));
        assertThat(row.totalEmissivity()).isCloseTo(epsRef, within(1e-9 * epsRef));
        assertThat(row.alphaOverEpsilon(0)).isCloseTo(alphaRef / epsRef, within(2e-9 * alphaRef / epsRef));
        // the point of a selective surface: it absorbs sunlight well and emits little at room temperature
        assertThat(alphaRef).isGreaterThan(0.85);
        assertThat(epsRef).isLessThan(0.1);
    }

    @Test
    void totalEmissivityFollowsTheDefiningIntegralAcrossTheRange() {
        double[] temps = new TemperatureRange(300, 1500, 300).temperaturesK();
        MaterialSurvey s = MaterialSurvey.of(SELECTIVE, temps, List.of());
        assertThat(s.rows()).hasSize(5);
        for (SurveyRow r : s.rows()) {
            double ref = reference(r.temperatureK());
            assertThat(r.totalEmissivity()).as("ε at %s K", r.temperatureK()).isCloseTo(ref, within(1e-9 * ref));
        }
    }
}
