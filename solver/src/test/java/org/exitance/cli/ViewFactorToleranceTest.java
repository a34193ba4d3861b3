package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The view-factor tolerance: met by default on a small obstructed box, missed (exit 3, results
 * still printed, the shortfall named on standard error) when a baffle has more facets than
 * shadow projection takes and its pairs fall back to rays, and settable by case key and option.
 */
class ViewFactorToleranceTest {

    /** A 1 m box (walls at 500 K) with a 0.5 m two-sided baffle of n × n facets at half height (invented test data). */
    static String caseText(int n, String options) {
        return """
                {"title": "box with a baffle (invented test data)",
                 "materials": {"grey": {"emissivity": 0.8}},
                 "geometry": {"parts": [
                   {"box": {"min_m": [0, 0, 0], "max_m": [1, 1, 1], "divisions": [2, 2, 2], "facing": "inward",
                            "faces": {"bottom": "floor", "top": "roof", "front": "walls", "back": "walls",
                                      "left": "walls", "right": "walls"}}},
                   {"surface": "baffle", "twoSided": true, "rectangle": {"origin_m": [0.25, 0.25, 0.5],
                     "edgeU_m": [0.5, 0, 0], "edgeV_m": [0, 0.5, 0], "divisions": [N, N]}}]%s},
                 "surfaces": [
                   {"name": "floor", "material": "grey", "temperature_K": 900},
                   {"name": "roof", "material": "grey", "temperature_K": 500},
                   {"name": "walls", "material": "grey", "temperature_K": 500},
                   {"name": "baffle.front", "material": "grey", "temperature_K": 600},
                   {"name": "baffle.back", "material": "grey", "temperature_K": 600}]}
                """.replace("N, N", n + ", " + n).formatted(options);
    }

    @Test
    void aSmallObstructedBoxMeetsTheDefault(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("baffle.json");
        Files.writeString(c, caseText(2, ""));
        CliRun r = CliRun.of("view-factors", "--no-cache", c.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.err()).doesNotContain("tolerance");
        assertThat(r.out()).contains("Tolerance 1.00e-05 on facet rows: met");
        CliRun solve = CliRun.of("solve", c.toString());
        assertThat(solve.exitCode()).isZero();
        assertThat(solve.out()).contains("View factors: within the tolerance 1.00e-05 on facet rows");
        CliRun json = CliRun.of("solve", "--json", c.toString());
        com.fasterxml.jackson.databind.JsonNode acc = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(json.out()).get("viewFactorAccuracy");
        assertThat(acc.get("toleranceMet").asBoolean()).isTrue();
        assertThat(acc.get("maxRowErrorEstimate").asDouble()).isLessThan(1e-5);
    }

    @Test
    void raySampledPairsMissItAndSayso(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("fine-baffle.json");
        Files.writeString(c, caseText(12, "")); // 288 occluder facets: more than shadow projection takes
        CliRun vf = CliRun.of("view-factors", "--no-cache", c.toString());
        assertThat(vf.exitCode()).isEqualTo(3);
        assertThat(vf.out()).contains("floor", "roof", "Error estimate", "on facet rows: NOT met");
        assertThat(vf.err()).contains("fine-baffle.json", "view-factor tolerance 1.00e-05 not met").hasLineCount(1);
        CliRun solve = CliRun.of("solve", c.toString());
        assertThat(solve.exitCode()).isEqualTo(3);
        assertThat(solve.out()).contains("view-factor tolerance 1.00e-05 not met");
        // a looser tolerance, by option or by case key, is met
        assertThat(CliRun.of("view-factors", "--vf-tolerance", "0.1", c.toString()).exitCode()).isZero();
        Files.writeString(c, caseText(12, ", \"options\": {\"tolerance\": 0.1}"));
        assertThat(CliRun.of("solve", c.toString()).exitCode()).isZero();
    }

    /**
     * The obstructed box solved at the default tolerance and at one ten times tighter: the heat of
     * the hot floor (fixed temperature) moves by less than 0.1 % (the check of issue [2/7];
     * measured: a few parts in 1e8).
     */
    @Test
    void tighteningTheToleranceTenfoldHardlyMovesTheHeat(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("baffle.json");
        Files.writeString(c, caseText(3, ""));
        double[] q = new double[2];
        String[][] args = {{"solve", "--json", "--no-audit", c.toString()},
            {"solve", "--json", "--no-audit", "--vf-tolerance", "1e-6", c.toString()}};
        for (int k = 0; k < 2; k++) {
            CliRun r = CliRun.of(args[k]);
            assertThat(r.exitCode()).as(r.err()).isZero();
            for (com.fasterxml.jackson.databind.JsonNode s : new com.fasterxml.jackson.databind.ObjectMapper()
                    .readTree(r.out()).get("surfaces")) {
                if (s.get("name").asText().equals("floor")) {
                    q[k] = s.get("netHeat_W").asDouble();
                }
            }
        }
        assertThat(q[0]).isPositive();
        assertThat(Math.abs(q[1] - q[0])).isLessThan(1e-3 * q[0]);
        System.out.printf("floor heat %.9g W, tenfold tighter %.9g W (relative change %.2e)%n", q[0], q[1],
                Math.abs(q[1] - q[0]) / q[0]);
    }

    @Test
    void aToleranceOutOfRangeIsBadInput(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("baffle.json");
        Files.writeString(c, caseText(2, ""));
        CliRun r = CliRun.of("solve", "--vf-tolerance", "2", c.toString());
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err()).contains("--vf-tolerance").hasLineCount(1);
        Files.writeString(c, caseText(2, ", \"options\": {\"tolerance\": -1}"));
        CliRun k = CliRun.of("solve", c.toString());
        assertThat(k.exitCode()).isEqualTo(2);
        assertThat(k.err()).contains("$.geometry.options.tolerance").hasLineCount(1);
    }
}
