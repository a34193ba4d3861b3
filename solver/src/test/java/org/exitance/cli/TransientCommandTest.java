package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code exitance transient}: outputs, and one-line failures with their exit codes. */
class TransientCommandTest {
    private static final String CASE = """
            {"title": "cooling plate (test)",
             "materials": {"m": {"emissivity": 0.8}},
             "surfaces": [{"name": "plate", "material": "m", "area_m2": 0.05, "adiabatic": true,
                           "thermalMass": {"heatCapacity_J_K": 4000}}],
             "environment": {"name": "sink", "temperature_K": 300},
             "viewFactors": {"matrix": [[0]]},
             "time": {"duration_s": 3000, "initialTemperature_K": 900, "output": {"every_s": 300},
                      "targets": [{"surface": "plate", "temperature_K": 600}] %s}}
            """;

    private static Path write(Path dir, String extra) throws Exception {
        Path f = dir.resolve("cool.json");
        Files.writeString(f, String.format(CASE, extra));
        return f;
    }

    @Test
    void writesTableJsonCsvAndPlot(@TempDir Path dir) throws Exception {
        Path f = write(dir, "");
        CliRun table = CliRun.of("transient", f.toString(), "--csv", dir.resolve("t.csv").toString(),
                "--plot", dir.resolve("t.png").toString());
        assertThat(table.exitCode()).as(table.toString()).isZero();
        assertThat(table.out()).contains("Target: plate reaches 600.00 K at").contains("Energy: supplied");
        assertThat(Files.readAllLines(dir.resolve("t.csv"))).hasSize(12).first().asString().startsWith("time_s,stored_J");
        byte[] png = Files.readAllBytes(dir.resolve("t.png"));
        assertThat(png[1]).isEqualTo((byte) 'P');
        CliRun json = CliRun.of("transient", f.toString(), "--json");
        JsonNode root = new ObjectMapper().readTree(json.out());
        assertThat(root.get("samples")).hasSize(11);
        assertThat(root.get("samples").get(10).get("time_s").asDouble()).isEqualTo(3000);
        assertThat(root.get("energy").get("driftRelative").asDouble()).isLessThan(1e-3);
        // files are never overwritten without --force
        CliRun again = CliRun.of("transient", f.toString(), "--csv", dir.resolve("t.csv").toString());
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.errLines()).hasSize(1);
    }

    @Test
    void aCaseWithoutATimeBlockIsBadInput(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("steady.json");
        String c = String.format(CASE, "");
        Files.writeString(f, c.substring(0, c.lastIndexOf(',', c.indexOf("\"time\""))) + "}");
        CliRun r = CliRun.of("transient", f.toString());
        assertThat(r.exitCode()).as(r.toString()).isEqualTo(2);
        assertThat(r.errLines()).hasSize(1);
        assertThat(r.err()).contains("no \"time\" block");
    }

    @Test
    void aStepBelowItsFloorEndsTheRunWithExitThree(@TempDir Path dir) throws Exception {
        // a floor above the only step the error control can accept near the start
        Path f = write(dir, ", \"tolerance_K\": 1e-8, \"firstStep_s\": 1, \"minStep_s\": 1");
        CliRun r = CliRun.of("transient", f.toString());
        assertThat(r.exitCode()).as(r.toString()).isEqualTo(3);
        assertThat(r.errLines()).hasSize(1);
        assertThat(r.err()).contains("below its floor");
    }

    @Test
    void solveGivesTheSteadyStateOfACaseWithATimeBlock(@TempDir Path dir) throws Exception {
        CliRun r = CliRun.of("solve", write(dir, "").toString(), "--json", "--no-audit");
        assertThat(r.exitCode()).as(r.toString()).isZero();
        JsonNode root = new ObjectMapper().readTree(r.out());
        // adiabatic plate in black surroundings at 300 K: steady at 300 K (capacity ignored)
        assertThat(root.get("surfaces").get(0).get("temperature_K").asDouble()).isCloseTo(300,
                org.assertj.core.api.Assertions.within(1e-6));
    }

    @Test
    void shieldSheetsWithThermalMassSettleAtTheSteadySolution(@TempDir Path dir) throws Exception {
        // the shield-pack demo with a mass on the load, the inner sheet and every sheet of its cover;
        // integrated far beyond its time constants it must end where solve puts it
        com.fasterxml.jackson.databind.node.ObjectNode c = (com.fasterxml.jackson.databind.node.ObjectNode)
                new ObjectMapper().readTree(RepoCasesPath.demo("vacuum-furnace-shield-pack.json").toFile());
        var surfaces = c.withArray("surfaces");
        for (JsonNode s : surfaces) {
            var o = (com.fasterxml.jackson.databind.node.ObjectNode) s;
            if (o.get("name").asText().equals("load") || o.get("name").asText().equals("hot_zone_inner")) {
                o.putObject("thermalMass").put("heatCapacity_J_K", 5000);
            }
            if (o.has("coveredBy")) {
                ((com.fasterxml.jackson.databind.node.ObjectNode) o.get("coveredBy")).putObject("layerThermalMass")
                        .put("mass_kg", 3).put("specificHeat_J_kgK", 250);
            }
        }
        c.putObject("time").put("duration_s", 2e5).put("initialTemperature_K", 300).put("tolerance_K", 1e-3);
        Path f = dir.resolve("pack.json");
        Files.writeString(f, c.toString());
        // the same bands for both (solve alone would refine its bands adaptively)
        CliRun run = CliRun.of("transient", f.toString(), "--json", "--band-edges", "1,2,4,8");
        assertThat(run.exitCode()).as(run.toString()).isZero();
        JsonNode t = new ObjectMapper().readTree(run.out());
        JsonNode last = t.get("samples").get(t.get("samples").size() - 1);
        CliRun steady = CliRun.of("solve", f.toString(), "--json", "--no-audit", "--band-edges", "1,2,4,8");
        JsonNode sr = new ObjectMapper().readTree(steady.out()).get("surfaces");
        int checked = 0;
        for (int i = 0; i < t.get("surfaces").size(); i++) {
            String name = t.get("surfaces").get(i).asText();
            for (JsonNode s : sr) {
                if (s.get("name").asText().equals(name)) {
                    assertThat(last.get("temperature_K").get(i).asDouble()).as(name)
                            .isCloseTo(s.get("temperature_K").asDouble(), org.assertj.core.api.Assertions.within(0.01));
                    checked++;
                }
            }
        }
        assertThat(checked).isGreaterThanOrEqualTo(10);
        // the sheets do store heat: the stored energy rose from the start
        assertThat(t.get("energy").get("storedEnd_J").asDouble()).isGreaterThan(t.get("energy").get("storedStart_J")
                .asDouble() + 1e6);
    }

    /** The shipped demo cases. */
    static final class RepoCasesPath {
        static Path demo(String name) {
            Path p = Path.of("").toAbsolutePath();
            while (p != null && !Files.isDirectory(p.resolve("cases").resolve("demo"))) {
                p = p.getParent();
            }
            return p.resolve("cases").resolve("demo").resolve(name);
        }
    }
}
