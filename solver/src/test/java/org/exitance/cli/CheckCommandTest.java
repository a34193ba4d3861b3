package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.exitance.cases.RepoCases;
import org.exitance.support.ShippedCases;
import org.junit.jupiter.api.Test;

/** {@code exitance check} accepts every shipped case. */
class CheckCommandTest {

    /** The shipped cases, demo and validation, as pinned in {@link ShippedCases}. */
    private static List<Path> shippedCases() {
        return ShippedCases.all();
    }

    @Test
    void everyShippedCaseChecksClean() throws IOException {
        List<Path> files = shippedCases();
        assertThat(files).isNotEmpty();
        for (Path f : files) {
            CliRun run = CliRun.of("check", f.toString());
            assertThat(run.exitCode()).as(run.toString()).isZero();
            assertThat(run.err()).as(f.toString()).isEmpty();
            assertThat(run.out()).as(f.toString()).startsWith("Valid: ");
        }
    }

    @Test
    void checkReportsSurfacesAndSource() {
        Path f = RepoCases.validationCase("gray-three-surface-reradiating.json");
        CliRun run = CliRun.of("check", f.toString());
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("surfaces: 3 (1 with unknown temperature)", "- heater", "- sink", "- wall",
                "validation case:");
    }

    @Test
    void checkListsTwoSidedPlatesAndWindowsByTheirFacePairs() {
        CliRun plate = CliRun.of("check", RepoCases.root().resolve("cases/demo/vacuum-furnace-shield-pack.json").toString());
        assertThat(plate.exitCode()).as(plate.toString()).isZero();
        assertThat(plate.out()).contains("two-sided plates (one node, two faces): hot_zone_inner + hot_zone_outer")
                .doesNotContain("windows (one node");
        CliRun window = CliRun.of("check", RepoCases.root().resolve("cases/demo/furnace-sight-window.json").toString());
        assertThat(window.out()).contains("windows (one node, two faces): window_inner + window_outer")
                .doesNotContain("two-sided plates");
    }

    @Test
    void checkWithoutACaseIsBadInput() {
        CliRun run = CliRun.of("check");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains("CASE.json");
    }
}
