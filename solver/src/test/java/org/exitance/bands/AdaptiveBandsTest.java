package org.exitance.bands;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.exitance.pipeline.CasePipeline;
import org.exitance.model.BandSet;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.thermal.TemperatureSolver;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Adaptive bands against a fixed fine set: 200 log-spaced bands from 0.05 to 2,000 µm plus every
 * property-table node (so a step in a table is a band edge in both). The band-mean method converges
 * to the spectral integral as bands narrow (Modest, Radiative Heat Transfer, 3rd ed., non-gray
 * surfaces by bands), so the fine set stands for the converged answer.
 */
class AdaptiveBandsTest {

    static BandSet fine(RadiationCase c) {
        TreeSet<Double> edges = new TreeSet<>();
        for (int i = 0; i <= 200; i++) {
            edges.add(0.05 * Math.pow(2000 / 0.05, i / 200.0));
        }
        for (EnclosureSurface s : c.enclosure().surfaces()) {
            for (SpectralEmissivity e : new SpectralEmissivity[] {s.material().emissivity(), s.material().transmissivity()}) {
                if (e != null) {
                    for (double w : e.breakpointsUm()) {
                        edges.add(w);
                    }
                }
            }
        }
        return new BandSet(edges.stream().mapToDouble(Double::doubleValue).toArray(), "fine");
    }

    @TestFactory
    Stream<DynamicTest> adaptiveBandsAgreeWithAFineFixedSetOnEveryShippedCase() throws IOException {
        return org.exitance.validation.ShippedCasesTestAccess.shippedCases().stream()
                .map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
                    RadiationCase base = CasePipeline.prepare(f).model();
                    var variants = base.loadCases().isEmpty() ? java.util.List.of(base)
                            : base.loadCases().stream().map(lc -> lc.applyTo(base)).toList();
                    for (RadiationCase c : variants) {
                        AdaptiveBands.Outcome a = AdaptiveBands.refine(c, AdaptiveBands.DEFAULT_TOLERANCE,
                                b -> new TemperatureSolver(c).solve(b));
                        SolveResult fineResult = new TemperatureSolver(c).solve(fine(c));
                        double scale = fineResult.surfaces().stream().mapToDouble(s -> Math.abs(s.netHeatW())).max()
                                .orElse(0);
                        double diff = AdaptiveBands.difference(a.result(), fineResult);
                        // the stated tolerance, 0.1 % of the largest |net heat|, with the fine set's own
                        // band error allowed for by a factor of two
                        assertThat(diff).as("%s: adaptive %d bands vs fine %d bands", c.title(), a.bands().size(),
                                fineResult.bands().size()).isLessThanOrEqualTo(2 * AdaptiveBands.DEFAULT_TOLERANCE * scale);
                    }
                }));
    }
}
