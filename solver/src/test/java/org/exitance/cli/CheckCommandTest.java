package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;

/** {@code exitance check} accepts every shipped case. */
class CheckCommandTest {

    /** Every *.json under cases/, skipping directories named materials (property data, not cases). */
    private static List<Path> shippedCases() throws IOException {
        Path cases = RepoCases.root().resolve("cases");
        try (Stream<Path> s = Files.walk(cases)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json"))
                    .filter(p -> Files.isRegularFile(p))
                    .filter(p -> {
                        for (Path part : cases.relativize(p)) {
                            if (part.toString().equals("materials")) {
                                return false;
                            }
                        }
                        return true;
                    })
                    .sorted().toList();
        }
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
