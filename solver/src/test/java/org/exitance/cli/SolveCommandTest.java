package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;

/** {@code exitance solve} on the shipped gray parallel plates: table and JSON output. */
class SolveCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    private static String plates() {
        return RepoCases.validationCase("gray-parallel-plates.json").toString();
    }

    private static JsonNode solveJson(String... options) throws Exception {
        String[] args = new String[options.length + 3];
        args[0] = "solve";
        args[1] = "--json";
        System.arraycopy(options, 0, args, 2, options.length);
        args[args.length - 1] = plates();
        CliRun run = CliRun.of(args);
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.err()).isEmpty();
        return JSON.readTree(run.out());
    }

    private static JsonNode surface(JsonNode result, String name) {
        for (JsonNode s : result.get("surfaces")) {
            if (s.get("name").asText().equals(name)) {
                return s;
            }
        }
        throw new AssertionError("no surface " + name + " in " + result);
    }

    @Test
    void tableListsBothSurfacesAndAClosingEnergyBalance() {
        CliRun run = CliRun.of("solve", plates());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.err()).isEmpty();
        assertThat(run.out().lines()).anyMatch(l -> l.trim().startsWith("hot "))
                .anyMatch(l -> l.trim().startsWith("cold "));
        assertThat(run.out().lines().filter(l -> l.startsWith("Energy balance")))
                .singleElement().asString().contains("closes").doesNotContain("NOT");
    }

    @Test
    void jsonOutputHasTheDocumentedFields() throws Exception {
        JsonNode r = solveJson();
        assertThat(r.get("surfaces")).hasSize(2);
        for (JsonNode s : r.get("surfaces")) {
            assertThat(s.get("name").isTextual()).isTrue();
            for (String field : new String[] {"area_m2", "temperature_K", "netHeat_W", "netFlux_W_m2"}) {
                assertThat(s.get(field)).as(field).isNotNull();
                assertThat(s.get(field).isNumber()).as(field).isTrue();
            }
            assertThat(s.get("bands")).isNotEmpty();
            for (JsonNode b : s.get("bands")) {
                assertThat(b.get("lower_um").isNumber()).isTrue();
                assertThat(b.has("upper_um")).isTrue();
                assertThat(b.get("netHeat_W").isNumber()).isTrue();
            }
        }
        assertThat(r.get("bands")).isNotEmpty();
        assertThat(r.get("energyBalance_W").isNumber()).isTrue();
        assertThat(r.get("solver").get("iterations").isIntegralNumber()).isTrue();
        assertThat(r.get("solver").get("residual_W").isNumber()).isTrue();
    }

    /** The hot plate loses heat, the cold one gains it, and the two are equal and opposite (closed enclosure). */
    @Test
    void hotSurfaceHasPositiveNetHeat() throws Exception {
        JsonNode r = solveJson();
        double hot = surface(r, "hot").get("netHeat_W").asDouble();
        double cold = surface(r, "cold").get("netHeat_W").asDouble();
        assertThat(hot).isPositive();
        assertThat(cold).isCloseTo(-hot, within(1e-9 * hot));
    }

    /** Against the case's own reference (Incropera et al., 6th ed., Table 13.3, as cited in the file). */
    @Test
    void jsonNetHeatMatchesTheCasesPublishedReference() throws Exception {
        JsonNode expected = RepoCases.plates().get("expected").get("surfaces").get("hot").get("netHeat_W");
        double hot = surface(solveJson(), "hot").get("netHeat_W").asDouble();
        assertThat(hot).isCloseTo(expected.asDouble(), within(1e-9 * expected.asDouble()));
    }

    @Test
    void bandEdgesOptionSetsTheBands() throws Exception {
        JsonNode r = solveJson("--band-edges", "1,2");
        assertThat(r.get("bands")).hasSize(3);
        assertThat(r.get("bands").get(1).get("lower_um").asDouble()).isEqualTo(1.0);
        assertThat(r.get("bands").get(2).get("lower_um").asDouble()).isEqualTo(2.0);
    }

    @Test
    void grayOptionSolvesWithOneBand() throws Exception {
        assertThat(solveJson("--gray").get("bands")).hasSize(1);
    }

    /** Gray surfaces give the same exchange however the spectrum is split (common practice: the band sum is exact). */
    @Test
    void grayCaseGivesTheSameNetHeatWithAnyBands() throws Exception {
        double gray = surface(solveJson("--gray"), "hot").get("netHeat_W").asDouble();
        double split = surface(solveJson("--band-edges", "1,2"), "hot").get("netHeat_W").asDouble();
        assertThat(split).isCloseTo(gray, within(1e-8 * gray));
    }

    @Test
    void decreasingBandEdgesAreBadInput() {
        CliRun run = CliRun.of("solve", "--band-edges", "2,1", plates());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains("--band-edges").doesNotContain("Exception");
    }

    @Test
    void nonNumericBandEdgeIsBadInput() {
        CliRun run = CliRun.of("solve", "--band-edges", "1,two", plates());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.errLines()).singleElement().asString().contains("'two'");
    }

    @Test
    void grayAndBandEdgesTogetherAreBadInput() {
        CliRun run = CliRun.of("solve", "--gray", "--band-edges", "1,2", plates());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
    }

    @Test
    void solvedTemperatureIsReportedInJson() throws Exception {
        Path file = RepoCases.validationCase("gray-parallel-plates-unknown-temperature.json");
        CliRun run = CliRun.of("solve", "--json", file.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        JsonNode cold = surface(JSON.readTree(run.out()), "cold");
        // the case's own reference (the inverted two-plate closed form; source cited in the file)
        double expected = JSON.readTree(file.toFile()).at("/expected/surfaces/cold/temperature_K").asDouble();
        assertThat(expected).isPositive();
        assertThat(cold.get("temperature_K").asDouble()).isCloseTo(expected, within(1e-6 * expected));
        assertThat(cold.get("temperatureSolved").asBoolean()).isTrue();
    }
}
