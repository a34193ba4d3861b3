package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.exitance.cases.RepoCases;
import org.exitance.pipeline.PreparedCase;
import org.exitance.thermal.SolveCancelledException;
import org.exitance.thermal.SolveMonitor;
import org.junit.jupiter.api.Test;

/**
 * Progress and Ctrl-C of solves, as far as they can be checked without a terminal and a signal:
 * the progress line, its delay and clearing, the interrupt's one line, and the exit code 130 of an
 * interrupted solve (common practice: shells report a process ended by SIGINT as 128 + 2).
 */
class SolveProgressTest {

    @Test
    void theLineNamesBandsStepAndResidualInWatts() {
        assertThat(SolveProgress.line(8, 5, 3.2e-4)).isEqualTo("solve: 8 bands, Newton step 5, largest heat residual 3.20e-04 W");
        assertThat(SolveProgress.line(1, 1, 12.5)).isEqualTo("solve: 1 band, Newton step 1, largest heat residual 1.25e+01 W");
    }

    @Test
    void aShortSolvePrintsNothingALongOneALineThatIsClearedAtTheEnd() throws Exception {
        StringWriter sw = new StringWriter();
        SolveProgress p = new SolveProgress(true, new PrintWriter(sw, true), false, 0);
        try (p) {
            assertThat(SolveMonitor.current()).isSameAs(p);
            p.newtonStep(8, 1, 1.0);
            assertThat(sw.toString()).isEmpty();
            Thread.sleep((long) (1000 * SolveProgress.QUIET_SECONDS) + 100);
            p.newtonStep(8, 2, 1e-3);
            assertThat(sw.toString()).startsWith("\rsolve: 8 bands, Newton step 2");
        }
        assertThat(SolveMonitor.current()).isNotSameAs(p);
        assertThat(sw.toString()).endsWith("\r");
    }

    @Test
    void anInterruptCancelsAndSaysSoOnceWhenTheCommandDoesNot() {
        StringWriter sw = new StringWriter();
        try (SolveProgress p = new SolveProgress(false, new PrintWriter(sw, true), false, 50)) {
            assertThat(p.cancelled()).isFalse();
            p.interrupted();
            assertThat(p.cancelled()).isTrue();
            assertThatThrownBy(SolveMonitor::checkCancelled).isInstanceOf(SolveCancelledException.class);
        }
        assertThat(sw.toString().lines().toList()).containsExactly("exitance: interrupted (Ctrl-C); no result written");
    }

    @Test
    void anInterruptedSolveIsOneLineAndExitCode130() throws Exception {
        Path file = RepoCases.root().resolve("cases/demo/heat-treating-chamber.json");
        PreparedCase c = Runs.load(file);
        assertThatThrownBy(() -> Runs.guarded(c, () -> {
            throw new SolveCancelledException();
        })).isInstanceOfSatisfying(UserError.class, e -> {
            assertThat(e.exitCode()).isEqualTo(130).isEqualTo(ExitCodes.INTERRUPTED);
            assertThat(e.getMessage()).doesNotContain("\n").contains("interrupted (Ctrl-C)").contains(file.toString());
        });
    }
}
