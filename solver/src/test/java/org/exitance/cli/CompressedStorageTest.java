package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A geometry solved on facets with its view factors held compressed
 * ({@code geometry.options.storage}: hierarchical low-rank blocks, never the N×N matrix), end to
 * end through the command line: a closed cube of 1,176 facets (14 × 14 per face, so that far
 * blocks are compressed by cross approximation), a third of the facets at unknown temperature.
 */
class CompressedStorageTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final int DIVISIONS = 14;

    @TempDir
    static Path dir;
    private static JsonNode dense, compressed;

    @BeforeAll
    static void solveBoth() throws Exception {
        dense = solve(write("dense.json", cube("dense", 0, false)), "--no-audit");
        compressed = solve(write("compressed.json", cube("compressed", 0, false)), "--no-audit");
    }

    /** The cube's case: floor hot, roof, front, back fixed, the side walls adiabatic (a third of the facets). */
    static ObjectNode cube(String storage, int threads, boolean reversedSurfaces) throws Exception {
        return cube(storage, threads, reversedSurfaces, 0.6);
    }

    /** @param coldEmissivity ε of roof, front and back (0.02: nearly perfectly reflecting, ρ → 1) */
    static ObjectNode cube(String storage, int threads, boolean reversedSurfaces, double coldEmissivity)
            throws Exception {
        String surfaces = "{\"name\": \"floor\", \"material\": \"hot\", \"temperature_K\": 1200},"
                + "{\"name\": \"roof\", \"material\": \"cold\", \"temperature_K\": 500},"
                + "{\"name\": \"front\", \"material\": \"cold\", \"temperature_K\": 700},"
                + "{\"name\": \"back\", \"material\": \"cold\", \"temperature_K\": 800},"
                + "{\"name\": \"side_walls\", \"material\": \"refractory\", \"adiabatic\": true,"
                + " \"initialTemperature_K\": 900}";
        ObjectNode c = (ObjectNode) JSON.readTree("{\"title\": \"cube on facets (invented test data)\","
                + "\"materials\": {\"hot\": {\"emissivity\": 0.85}, \"cold\": {\"emissivity\": " + coldEmissivity + "},"
                + " \"refractory\": {\"emissivity\": 0.45}},"
                + "\"geometry\": {\"parts\": [{\"box\": {\"min_m\": [0, 0, 0], \"max_m\": [1, 1, 1], \"divisions\": ["
                + DIVISIONS + ", " + DIVISIONS + ", " + DIVISIONS + "], \"facing\": \"inward\", \"faces\": {\"bottom\":"
                + " \"floor\", \"top\": \"roof\", \"left\": \"side_walls\", \"right\": \"side_walls\", \"front\":"
                + " \"front\", \"back\": \"back\"}}}], \"options\": {\"resolution\": \"facets\", \"storage\": \""
                + storage + "\", \"threads\": " + threads + "}},"
                + "\"surfaces\": [" + surfaces + "]}");
        if (reversedSurfaces) {
            var list = new java.util.ArrayList<JsonNode>();
            c.withArray("surfaces").forEach(list::add);
            java.util.Collections.reverse(list);
            c.putArray("surfaces").addAll(list);
        }
        return c;
    }

    static Path write(String name, ObjectNode c) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, JSON.writeValueAsString(c));
        return p;
    }

    static JsonNode solve(Path file, String... more) throws Exception {
        String[] args = new String[more.length + 3];
        args[0] = "solve";
        args[1] = "--json";
        args[2] = file.toString();
        System.arraycopy(more, 0, args, 3, more.length);
        CliRun run = CliRun.of(args);
        assertThat(run.exitCode()).as(run.toString()).isZero();
        return JSON.readTree(run.out());
    }

    static JsonNode surface(JsonNode r, String name) {
        for (JsonNode s : r.get("surfaces")) {
            if (s.get("name").asText().equals(name)) {
                return s;
            }
        }
        throw new AssertionError(name);
    }

    /**
     * The compressed operator states a row error ε (ℓ1 over a row, sampled against exact rows):
     * |(F'v)_i − (Fv)_i| ≤ ε max|v|, so every surface's heat differs from the dense path's by a
     * small multiple of ε times the heat crossing the enclosure. Measured: 1e-8 relative, against
     * ε ≈ 2e-6; the paths are not identical (a different operator was solved).
     */
    @Test
    void theCompressedSolveGivesTheDenseAnswerWithinItsStatedRowError() {
        agreeWithinTheStatedRowError(dense, compressed);
    }

    /** The same with walls that reflect 98 % (ρ → 1: conjugate gradients converge slowly, and must still). */
    @Test
    void nearlyPerfectReflectorsToo() throws Exception {
        JsonNode d = solve(write("dense-shiny.json", cube("dense", 0, false, 0.02)), "--no-audit");
        JsonNode c = solve(write("compressed-shiny.json", cube("compressed", 0, false, 0.02)), "--no-audit");
        agreeWithinTheStatedRowError(d, c);
        assertThat(c.get("solver").get("maxLinearIterations").asInt())
                .isGreaterThan(compressed.get("solver").get("maxLinearIterations").asInt());
    }

    private static void agreeWithinTheStatedRowError(JsonNode dense, JsonNode compressed) {
        assertThat(compressed.get("solver").get("strategy").asText()).isEqualTo("iterative");
        double estimate = compressed.get("viewFactorAccuracy").get("maxRowErrorEstimate").asDouble();
        assertThat(estimate).isPositive().isLessThan(1e-5);
        assertThat(compressed.get("viewFactorAccuracy").get("toleranceMet").asBoolean()).isTrue();
        double crossing = dense.get("crossingHeat_W").asDouble();
        boolean differs = false;
        for (JsonNode d : dense.get("surfaces")) {
            JsonNode c = surface(compressed, d.get("name").asText());
            double q = d.get("netHeat_W").asDouble();
            assertThat(c.get("netHeat_W").asDouble()).as(d.get("name").asText()).isCloseTo(q,
                    within(estimate * crossing));
            differs |= c.get("netHeat_W").asDouble() != q;
            double t = d.get("temperature_K").asDouble();
            assertThat(c.get("temperature_K").asDouble()).isCloseTo(t, within(estimate * t));
        }
        assertThat(differs).as("the compressed path solved its own operator").isTrue();
        JsonNode dFacets = dense.get("facets"), cFacets = compressed.get("facets");
        assertThat(cFacets.size()).isEqualTo(dFacets.size()).isGreaterThan(1_000);
        for (int i = 0; i < dFacets.size(); i++) {
            double t = dFacets.get(i).get("temperature_K").asDouble();
            assertThat(cFacets.get(i).get("temperature_K").asDouble()).isCloseTo(t, within(estimate * t));
        }
        // the energy balance is judged by the solve's own residual, not by Σ Q (which closes for any radiosity)
        assertThat(compressed.get("solver").get("residual_W").asDouble()).isLessThan(1e-9 * crossing);
    }

    /**
     * The cube's surface view factors, formed from the compressed operator by products with the
     * surfaces' indicator vectors, against the closed forms for a unit cube: opposite faces
     * (Howell's catalogue, C-11; Incropera et al., 6th ed., Table 13.2, aligned parallel
     * rectangles) and adjacent faces (C-14; the same table, perpendicular rectangles with a
     * common edge), within the view-factor tolerance 1e-5.
     */
    @Test
    void theSurfaceFactorsFromTheOperatorMeetTheCubesClosedForms() throws Exception {
        CliRun run = CliRun.of("view-factors", "--no-cache", "--json", dir.resolve("compressed.json").toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        JsonNode v = JSON.readTree(run.out());
        JsonNode names = v.get("surfaces");
        int floor = -1, roof = -1, front = -1;
        for (int i = 0; i < names.size(); i++) {
            String n = names.get(i).isTextual() ? names.get(i).asText() : names.get(i).get("name").asText();
            floor = n.equals("floor") ? i : floor;
            roof = n.equals("roof") ? i : roof;
            front = n.equals("front") ? i : front;
        }
        JsonNode m = v.get("matrix");
        double opposite = parallelSquares(1), adjacent = (1 - opposite) / 4;
        assertThat(m.get(floor).get(roof).asDouble()).isCloseTo(opposite, within(1e-5));
        assertThat(m.get(floor).get(front).asDouble()).isCloseTo(adjacent, within(1e-5));
        assertThat(v.toString()).contains("compressed");
    }

    /** F between opposed unit squares 1/ratio apart (Howell C-11, X = Y = ratio). */
    private static double parallelSquares(double ratio) {
        double x = ratio, y = ratio, x2 = 1 + x * x, y2 = 1 + y * y;
        return 2 / (Math.PI * x * y) * (0.5 * Math.log(x2 * y2 / (1 + x * x + y * y))
                + x * Math.sqrt(y2) * Math.atan(x / Math.sqrt(y2)) + y * Math.sqrt(x2) * Math.atan(y / Math.sqrt(x2))
                - x * Math.atan(x) - y * Math.atan(y));
    }

    /** Results do not depend on the thread count, nor on the order the case lists its surfaces in. */
    @Test
    void resultsDoNotDependOnThreadsOrSurfaceOrder() throws Exception {
        JsonNode one = solve(write("one.json", cube("compressed", 1, false)), "--no-audit");
        JsonNode reversed = solve(write("reversed.json", cube("compressed", 2, true)), "--no-audit");
        for (JsonNode c : compressed.get("surfaces")) {
            String name = c.get("name").asText();
            assertThat(surface(one, name).get("netHeat_W").asDouble()).isEqualTo(c.get("netHeat_W").asDouble());
            double q = c.get("netHeat_W").asDouble();
            assertThat(surface(reversed, name).get("netHeat_W").asDouble()).isCloseTo(q, within(1e-10 * 66_000));
            double t = c.get("temperature_K").asDouble();
            assertThat(surface(reversed, name).get("temperature_K").asDouble()).isCloseTo(t, within(1e-10 * t));
        }
    }

    /**
     * An open geometry: two parallel squares 24 × 24 facets each, 0.5 m apart, the rest of their
     * view to surroundings at 300 K. Not closed, so the compressed operator is not scaled and the
     * rows' remainder goes to the environment; the heats agree with the dense path's within the
     * stated row error, and the plate-to-plate factor meets the closed form (Howell's catalogue,
     * C-11; Incropera et al., 6th ed., Table 13.2) within the tolerance.
     */
    @Test
    void anOpenGeometryKeepsItsRemainderForTheEnvironment() throws Exception {
        JsonNode d = solve(write("open-dense.json", plates("dense")), "--no-audit");
        JsonNode c = solve(write("open-compressed.json", plates("compressed")), "--no-audit");
        agreeWithinTheStatedRowError(d, c);
        CliRun run = CliRun.of("view-factors", "--no-cache", "--json", dir.resolve("open-compressed.json").toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        JsonNode v = JSON.readTree(run.out());
        assertThat(v.get("diagnostics").get("methods").asText()).contains("compressed operator")
                .doesNotContain(" 0 far blocks");
        assertThat(v.get("matrix").get(0).get(1).asDouble()).isCloseTo(parallelSquares(2), within(1e-5));
        assertThat(v.get("surfaces").get(0).get("leaving").asDouble()).isCloseTo(1 - parallelSquares(2), within(1e-5));
    }

    private static ObjectNode plates(String storage) throws Exception {
        String lower = "\"origin_m\": [0, 0, 0], \"edgeU_m\": [1, 0, 0], \"edgeV_m\": [0, 1, 0], \"divisions\": [24, 24]";
        String upper = "\"origin_m\": [0, 0, 0.5], \"edgeU_m\": [0, 1, 0], \"edgeV_m\": [1, 0, 0], \"divisions\": [24, 24]";
        return (ObjectNode) JSON.readTree("{\"title\": \"two plates in the open (invented test data)\","
                + "\"materials\": {\"hot\": {\"emissivity\": 0.8}, \"cold\": {\"emissivity\": 0.5}},"
                + "\"environment\": {\"name\": \"surroundings\", \"temperature_K\": 300},"
                + "\"geometry\": {\"parts\": ["
                + "{\"surface\": \"lower\", \"rectangle\": {" + lower + "}},"
                + "{\"surface\": \"upper\", \"rectangle\": {" + upper + "}}"
                + "], \"options\": {\"resolution\": \"facets\", \"storage\": \"" + storage + "\"}},"
                + "\"surfaces\": [{\"name\": \"lower\", \"material\": \"hot\", \"temperature_K\": 1000},"
                + " {\"name\": \"upper\", \"material\": \"cold\", \"netHeat_W\": 0,"
                + " \"initialTemperature_K\": 700}]}");
    }

    /** What needs the dense facet matrix is refused in one line with exit 2, before any solve. */
    @ParameterizedTest
    @ValueSource(strings = {"--solver=direct", "--solver=newton-krylov", "--exchange=on", "--exchange=facets",
        "--conductance"})
    void whatNeedsTheDenseMatrixIsOneLineAndExitTwo(String option) {
        CliRun run = CliRun.of("solve", option, dir.resolve("compressed.json").toString());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.errLines()).as(run.toString()).hasSize(1);
        assertThat(run.err()).contains("compressed");
    }

    /** The shipped 50,000-facet benchmark reads as a compressed facet case (docs/performance.md solves it). */
    @Test
    void theLargeBenchmarkCaseReads() throws Exception {
        Path large = org.exitance.support.ShippedCases.large().get(0);
        org.exitance.cases.CaseGeometry g = org.exitance.cases.CaseReader.read(large).geometry();
        assertThat(g.scene().facetCount()).isEqualTo(6 * 91 * 91);
        assertThat(g.solveOnFacets()).isTrue();
        assertThat(g.storage()).isEqualTo(org.exitance.cases.CaseGeometry.Storage.COMPRESSED);
    }

    @Test
    void anUnknownStorageNamesItsPath() throws Exception {
        ObjectNode c = cube("sparse", 0, false);
        CliRun run = CliRun.of("solve", write("bad.json", c).toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("$.geometry.options.storage").contains("\"auto\", \"dense\" or \"compressed\"");
    }
}
