package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Cases that read cleanly but cannot be solved: ill-posed (exit 2) or impossible (exit 3). */
class UnsolvableCaseTest {
    @TempDir
    Path dir;

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    @Test
    void allAdiabaticWithoutEnvironmentIsIllPosedAndExitsTwo() {
        ObjectNode c = RepoCases.plates();
        c.remove("expected");
        for (int i = 0; i < 2; i++) {
            surface(c, i).remove("temperature_K");
            surface(c, i).put("adiabatic", true);
        }
        Path file = RepoCases.write(dir, "all-adiabatic.json", c);
        String line = BadInput.oneLineError(CliRun.of("solve", file.toString()), 2);
        assertThat(line).contains(file.toString(), "no surface has a fixed temperature");
    }

    /**
     * The cold plate must absorb 1 MW per m² from a plate at 1000 K. Between parallel plates it can
     * absorb at most σ·1000⁴/(1/0.8 + 1/0.5 − 1) ≈ 25 kW even at 0 K (two-plate closed form,
     * Incropera et al., 6th ed., Table 13.3), so no temperature meets the demand.
     */
    @Test
    void impossibleDemandIsNoConvergenceAndExitsThree() {
        ObjectNode c = RepoCases.plates();
        c.remove("expected");
        surface(c, 1).remove("temperature_K");
        surface(c, 1).put("netHeat_W", -1.0e6);
        Path file = RepoCases.write(dir, "impossible-demand.json", c);
        CliRun run = CliRun.of("solve", file.toString());
        String line = BadInput.oneLineError(run, 3);
        assertThat(line).contains(file.toString(), "no convergence", "'cold'");
    }

    @Test
    void impossibleDemandReportsNoNumberInJsonModeEither() {
        ObjectNode c = RepoCases.plates();
        c.remove("expected");
        surface(c, 1).remove("temperature_K");
        surface(c, 1).put("netHeat_W", -1.0e6);
        Path file = RepoCases.write(dir, "impossible-demand.json", c);
        Path output = dir.resolve("result.json");
        CliRun run = CliRun.of("solve", "--json", "--output", output.toString(), file.toString());
        BadInput.oneLineError(run, 3);
        assertThat(output).doesNotExist();
    }

    /** Control for the test above: a demand the hot plate can meet (half the maximum) solves. */
    @Test
    void reachableDemandSolves() {
        ObjectNode c = RepoCases.plates();
        c.remove("expected");
        surface(c, 1).remove("temperature_K");
        surface(c, 1).put("netHeat_W", -12000.0);
        Path file = RepoCases.write(dir, "reachable-demand.json", c);
        CliRun run = CliRun.of("solve", file.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
    }
}
