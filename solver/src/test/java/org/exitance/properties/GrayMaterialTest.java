package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.exitance.spectral.source.SourceSpectrum;
import org.junit.jupiter.api.Test;

/**
 * A gray surface absorbs the same fraction of every spectrum: α = ε = its value, so α/ε = 1
 * (Incropera 6th ed. Sec. 12.7, the gray surface; Kirchhoff's law for diffuse surfaces).
 */
class GrayMaterialTest {
    private static final List<IrradiationSource> SOURCES = List.of(new BlackbodySource(5772), new BlackbodySource(800),
            new SourceSpectrum("uneven", new double[] {0.3, 0.9, 2.5, 7}, new double[] {20, 1500, 300, 2}));

    @Test
    void grayMaterialHasAlphaEqualToEpsilonEqualToItsValue() {
        MaterialSurvey s = MaterialSurvey.of(new Material("gray", new GrayEmissivity(0.37), ""),
                new TemperatureRange(200, 1400, 400).temperaturesK(), SOURCES);
        assertThat(s.gray()).isTrue();
        for (SurveyRow r : s.rows()) {
            assertThat(r.totalEmissivity()).isEqualTo(0.37);
            for (int k = 0; k < SOURCES.size(); k++) {
                assertThat(r.absorptivity(k)).isEqualTo(0.37);
                assertThat(r.alphaOverEpsilon(k)).isEqualTo(1.0);
            }
        }
    }

    @Test
    void spectrallyFlatTableBehavesAsGray() {
        Material flat = new Material("flat", new TabulatedEmissivity(new double[] {0.5, 3, 20}, new double[] {0.6, 0.6, 0.6}), "");
        MaterialSurvey s = MaterialSurvey.of(flat, new double[] {300, 1000}, SOURCES);
        for (SurveyRow r : s.rows()) {
            assertThat(r.totalEmissivity()).isCloseTo(0.6, within(1e-12));
            for (int k = 0; k < SOURCES.size(); k++) {
                assertThat(r.absorptivity(k)).isCloseTo(0.6, within(1e-12));
            }
        }
    }
}
