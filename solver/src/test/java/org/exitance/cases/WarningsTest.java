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

    /**
     * Three surfaces that see each other by halves, one area 0.01 % too large: a reciprocity error
     * of 1e-4, between warning and rejection.
     */
    private Path slightlyUnreciprocal() {
        ObjectNode c = RepoCases.load("gray-three-surface-reradiating.json");
        c.remove("expected");
        ((ObjectNode) c.get("surfaces").get(2)).put("area_m2", 1.0001);
        return RepoCases.write(dir, "small-reciprocity-error.json", c);
    }

    @Test
    void smallReciprocityErrorIsAWarningNotAFailure() throws Exception {
        CaseDescription c = CaseReader.read(slightlyUnreciprocal());
        assertThat(c.warnings()).hasSize(2).allSatisfy(w -> assertThat(w).contains("reciprocity", "'wall'"));
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
        // the reader's two reciprocity warnings, and the repair that makes the matrix consistent
        assertThat(result.get("warnings")).hasSize(3);
        assertThat(result.get("warnings").get(2).asText()).contains("made reciprocal and closed");
        assertThat(result.get("energyBalanceCloses").asBoolean()).isTrue();
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
