package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Findings below the rejection threshold are reported but do not fail a run. */
class WarningsTest {
    @TempDir
    Path dir;

    /** Parallel plates whose areas differ by 0.01 %: a reciprocity error of 1e-4, between warning and rejection. */
    private Path slightlyUnreciprocal() {
        ObjectNode c = RepoCases.plates();
        ((ObjectNode) c.get("surfaces").get(1)).put("area_m2", 1.0001);
        return RepoCases.write(dir, "small-reciprocity-error.json", c);
    }

    @Test
    void smallReciprocityErrorIsAWarningNotAFailure() throws Exception {
        CaseDescription c = CaseReader.read(slightlyUnreciprocal());
        assertThat(c.warnings()).singleElement().asString().contains("reciprocity", "'hot'", "'cold'");
    }

    @Test
    void solveWithASmallReciprocityErrorSucceedsAndShowsTheWarning() {
        CliRun run = CliRun.of("solve", slightlyUnreciprocal().toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("Warning:", "reciprocity");
    }

    @Test
    void jsonSolveWithASmallReciprocityErrorSucceedsAndListsTheWarning() throws Exception {
        CliRun run = CliRun.of("solve", "--json", slightlyUnreciprocal().toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        JsonNode result = RepoCases.JSON.readTree(run.out());
        assertThat(result.get("warnings")).hasSize(1);
        assertThat(run.err()).contains("warning", "reciprocity");
    }

    @Test
    void checkWithASmallReciprocityErrorSucceedsAndShowsTheWarning() {
        CliRun run = CliRun.of("check", slightlyUnreciprocal().toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("warning:", "reciprocity");
    }

    @Test
    void exactCaseHasNoWarnings() throws Exception {
        assertThat(CaseReader.read(RepoCases.validationCase("gray-parallel-plates.json")).warnings()).isEmpty();
    }
}
