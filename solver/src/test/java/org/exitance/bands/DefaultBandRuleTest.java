package org.exitance.bands;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

class DefaultBandRuleTest {

    private static BandSet rule(SpectralEmissivity a, SpectralEmissivity b, double t1, double t2) {
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("a", new Material("a", a, ""), 1, new BoundaryCondition.FixedTemperature(t1), Double.NaN),
                new EnclosureSurface("b", new Material("b", b, ""), 1, new BoundaryCondition.FixedTemperature(t2), Double.NaN));
        return DefaultBandRule.derive(Cases.of(new Enclosure(s, new double[][] {{0, 1}, {1, 0}}, null), null));
    }

    @Test
    void allGrayCaseGetsOneBand() {
        assertThat(rule(new GrayEmissivity(0.3), new GrayEmissivity(0.9), 300, 1200).size()).isEqualTo(1);
    }

    @Test
    void spectralCaseGetsPlanckAndPropertyEdges() {
        SpectralEmissivity step = new TabulatedEmissivity(new double[] {2.5, Math.nextUp(2.5)}, new double[] {0.9, 0.1});
        BandSet b = rule(step, new GrayEmissivity(0.5), 300, 1500);
        double[] e = b.interiorEdgesUm();
        assertThat(e).contains(2.5);
        // Wien's peak region of both temperatures is split: λT = 4000 µm·K edges (common practice)
        assertThat(java.util.Arrays.stream(e).anyMatch(x -> x * 1500 > 3500 && x * 1500 < 4500)).isTrue();
        assertThat(java.util.Arrays.stream(e).anyMatch(x -> x * 300 > 3500 && x * 300 < 4500)).isTrue();
        for (int i = 1; i < e.length; i++) {
            assertThat(e[i] / e[i - 1]).isGreaterThanOrEqualTo(1.08 - 1e-9);
        }
        assertThat(e.length).isLessThanOrEqualTo(DefaultBandRule.MAX_EDGES);
    }
}
