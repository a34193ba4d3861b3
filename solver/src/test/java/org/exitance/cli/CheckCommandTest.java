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
    void checkWithoutACaseIsBadInput() {
        CliRun run = CliRun.of("check");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains("CASE.json");
    }
}
