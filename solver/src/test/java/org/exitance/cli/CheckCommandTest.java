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

    /**
     * A geometry held compressed (the shipped 49,686-facet benchmark) is checked as read, in
     * seconds; the view factors are left to {@code --view-factors}, which computes them (shown on
     * a small cube held compressed).
     */
    @Test
    void aCompressedGeometryIsCheckedAsReadUnlessItsViewFactorsAreAskedFor(@org.junit.jupiter.api.io.TempDir Path dir)
            throws Exception {
        CliRun large = CliRun.of("check", ShippedCases.large().get(0).toString());
        assertThat(large.exitCode()).as(large.toString()).isZero();
        assertThat(large.out()).startsWith("Valid: ").contains("surfaces: 5 (1 with unknown temperature) on 49,686 facets",
                "not computed by check", "- side_walls");
        com.fasterxml.jackson.databind.node.ObjectNode cube = (com.fasterxml.jackson.databind.node.ObjectNode)
                new com.fasterxml.jackson.databind.ObjectMapper().readTree(ShippedCases.large().get(0).toFile());
        ((com.fasterxml.jackson.databind.node.ArrayNode) cube.at("/geometry/parts/0/box/divisions")).removeAll().add(6)
                .add(6).add(6);
        Path small = RepoCases.write(dir, "small-cube.json", cube);
        assertThat(CliRun.of("check", small.toString()).out()).contains("not computed by check");
        CliRun full = CliRun.of("check", "--view-factors", small.toString());
        assertThat(full.exitCode()).as(full.toString()).isZero();
        assertThat(full.out()).contains("view factors: compressed operator of 216 facets", "bands: 1",
                "facet factors are not cached");
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
