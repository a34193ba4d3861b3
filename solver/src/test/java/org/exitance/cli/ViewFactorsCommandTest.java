package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ViewFactorsCommandTest {
    private static final Path DEMO = RepoCases.root().resolve("cases").resolve("demo");

    private static Path crucible(Path dir) throws Exception {
        Path c = dir.resolve("crucible-cavity.json");
        Files.copy(DEMO.resolve("crucible-cavity.json"), c);
        return c;
    }

    @Test
    void printsTheMatrixWithClosureDiagnostics(@TempDir Path dir) throws Exception {
        CliRun r = CliRun.of("view-factors", "--no-cache", crucible(dir).toString());
        assertThat(r.exitCode()).isEqualTo(0);
        assertThat(r.out()).contains("heater_wall", "crucible", "lid", "Closure (facet rows)", "Methods:");
    }

    @Test
    void jsonRowsCloseAndCsvIsWrittenOnce(@TempDir Path dir) throws Exception {
        Path c = crucible(dir);
        Path csv = dir.resolve("f.csv");
        CliRun r = CliRun.of("view-factors", "--json", "--csv", csv.toString(), c.toString());
        assertThat(r.exitCode()).isEqualTo(0);
        JsonNode j = new ObjectMapper().readTree(r.out());
        for (JsonNode row : j.get("matrix")) {
            double sum = 0;
            for (JsonNode x : row) {
                sum += x.asDouble();
            }
            // summation rule of a closed cavity (common practice)
            assertThat(sum).isCloseTo(1.0, within(1e-6));
        }
        assertThat(Files.readAllLines(csv).get(0)).isEqualTo("from,heater_wall,crucible,lid,leaving");
        CliRun again = CliRun.of("view-factors", "--csv", csv.toString(), c.toString());
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.err()).contains("exists");
    }

    @Test
    void aMatrixCaseHasNoGeometryToCompute() {
        CliRun r = CliRun.of("view-factors",
                RepoCases.root().resolve("cases/validation/gray-parallel-plates.json").toString());
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err().lines().count()).isEqualTo(1);
        assertThat(r.err()).contains("geometry");
    }
}
