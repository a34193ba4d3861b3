package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.model.BandSet;
import org.exitance.model.RadiationCase;
import org.exitance.support.Cases;
import org.exitance.support.RandomEnclosures;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The solve reports every Newton step to the installed monitor and stops, without a result, when
 * the monitor asks it to (common practice for an interruptible iteration).
 */
class SolveMonitorTest {

    @ParameterizedTest
    @EnumSource(SolverChoice.class)
    void everyStepIsReportedAndACancelStopsTheSolve(SolverChoice choice) {
        RadiationCase c = Cases.of(RandomEnclosures.random(new Random(3), 30, false, 0.4),
                new BandSet(new double[] {2.0, 5.0, 12.0}, "test"));
        List<double[]> seen = new ArrayList<>();
        SolveMonitor old = SolveMonitor.install(new SolveMonitor() {
            @Override
            public void newtonStep(int bands, int step, double largestResidualW) {
                seen.add(new double[] {bands, step, largestResidualW});
            }

            @Override
            public boolean cancelled() {
                return seen.size() >= 2;
            }
        });
        try {
            assertThatThrownBy(() -> new TemperatureSolver(c, choice, ExternalAbsorption.SOURCE_SPECTRUM)
                    .solve(c.bands())).isInstanceOf(SolveCancelledException.class);
        } finally {
            SolveMonitor.install(old);
        }
        assertThat(seen).hasSize(2);
        assertThat(seen.get(0)[0]).isEqualTo(1); // the one-band gray start comes first
        assertThat(seen.get(1)[1]).isEqualTo(2);
        assertThat(seen.get(1)[2]).isFinite().isNotNegative();
    }
}
