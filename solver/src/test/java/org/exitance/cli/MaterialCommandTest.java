package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.exitance.report.Caution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code exitance material}: table, JSON, plot file, and one-line errors with exit code 2. */
class MaterialCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** The eight signature bytes every PNG file starts with (PNG specification, ISO/IEC 15948, Sec. 5.2). */
    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    @TempDir
    Path dir;

    private static Path shipped(String file) {
        Path p = Path.of("").toAbsolutePath().getParent().resolve("cases").resolve("materials").resolve(file);
        assertThat(p).isRegularFile();
        return p;
    }

    private Path write(String name, String text) throws Exception {
        return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    }

    private static void assertOneLineError(CliRun run, String... parts) {
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).as(run.toString()).singleElement().asString().startsWith("exitance: ").contains(parts);
        assertThat(run.err()).doesNotContain("\tat ", "Exception");
    }

    @Test
    void tableListsTemperaturesEmissivityAbsorptivityAndTheCaution() {
        CliRun run = CliRun.of("material", shipped("white-paint.json").toString(), "--from-K", "250", "--to-K", "400",
                "--step-K", "50");
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("white_paint", "T K", "ε", "α 5772 K", "α/ε 5772 K", "250.00", "400.00",
                "blackbody at 5772.00 K", Caution.SHORT);
        assertThat(run.err()).isEmpty();
    }

    @Test
    void jsonParsesWithTheDocumentedKeysAndConsistentValues() throws Exception {
        Path m = write("two.json", """
                {"title": "test materials (invented)",
                 "materials": {"grey": {"emissivity": 0.4},
                               "sel": {"spectralEmissivity": {"bandEdges_um": [2], "emissivity": [0.9, 0.1]}}}}
                """);
        Path csv = write("lamp.csv", "# invented\nwavelength_um,irradiance_W_m2_um\n0.5,100\n1.5,300\n3,0\n");
        CliRun run = CliRun.of("material", m.toString(), "--json", "--from-K", "300", "--to-K", "500", "--step-K", "100",
                "--source-K", "5772,1000", "--source-spectrum", csv.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        JsonNode root = JSON.readTree(run.out());
        assertThat(root.get("caution").asText()).isEqualTo(Caution.SHORT);
        assertThat(root.get("fileKind").asText()).isEqualTo("materials");
        assertThat(root.get("sources")).hasSize(3);
        assertThat(root.get("sources").get(0).get("sourceTemperature_K").asDouble()).isEqualTo(5772.0);
        // lamp.csv: trapezoids ½(100+300)·1 + ½(300+0)·1.5 = 425 W/m² (closed form of the linear spectrum)
        assertThat(root.get("sources").get(2).get("sourceIrradiance_W_m2").asDouble()).isCloseTo(425.0, within(1e-9));
        JsonNode materials = root.get("materials");
        assertThat(materials).hasSize(2);
        for (JsonNode mat : materials) {
            JsonNode rows = mat.get("temperatures");
            assertThat(rows).hasSize(3);
            for (JsonNode r : rows) {
                assertThat(r.get("temperature_K").isNumber()).isTrue();
                double eps = r.get("totalEmissivity").asDouble();
                assertThat(r.get("absorptivity")).hasSize(3);
                for (JsonNode a : r.get("absorptivity")) {
                    assertThat(a.has("source")).isTrue();
                    double alpha = a.get("totalAbsorptivity").asDouble();
                    assertThat(a.get("alphaOverEpsilon").asDouble()).isCloseTo(alpha / eps, within(1e-12 * alpha / eps));
                    if (mat.get("name").asText().equals("grey")) {
                        // a gray surface: α = ε (Incropera 6th ed. Sec. 12.7)
                        assertThat(alpha).isEqualTo(0.4);
                        assertThat(eps).isEqualTo(0.4);
                    }
                }
            }
        }
        // the step surface with the lamp spectrum (0.5–3 µm): ε = 0.9 below 2 µm, 0.1 above. G = 200 at 2 µm, so
        // the power below 2 µm is ½(100+300)·1 + ½(300+200)·0.5 = 325 W/m², above ½(200+0)·1 = 100 W/m², and
        // α = (0.9·325 + 0.1·100)/425 (closed form).
        JsonNode sel = materials.get(1).get("temperatures").get(0).get("absorptivity").get(2);
        assertThat(sel.get("sourceFile").asText()).isEqualTo("lamp.csv");
        assertThat(sel.get("totalAbsorptivity").asDouble()).isCloseTo((0.9 * 325 + 0.1 * 100) / 425, within(1e-12));
    }

    @Test
    void plotIsAPngFileAndTheTableStillGoesToStandardOutput() throws Exception {
        Path png = dir.resolve("paint.png");
        CliRun run = CliRun.of("material", shipped("polished-aluminium.json").toString(), "--plot", png.toString(),
                "--source-spectrum", shipped("heater-lamp-spectrum.csv").toString(), "--source-K", "5772");
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("polished_aluminium", "α spectrum");
        byte[] bytes = Files.readAllBytes(png);
        assertThat(bytes.length).isGreaterThan(10_000);
        assertThat(Arrays.copyOf(bytes, 8)).containsExactly(PNG_SIGNATURE);
    }

    @Test
    void anExistingPlotFileIsNotOverwrittenWithoutForce() throws Exception {
        Path png = write("keep.png", "keep me\n");
        CliRun run = CliRun.of("material", shipped("black-paint.json").toString(), "--plot", png.toString());
        assertOneLineError(run, png.toString(), "--force");
        assertThat(Files.readString(png)).isEqualTo("keep me\n");
        try (var files = Files.list(dir)) {
            assertThat(files).as("no temporary file left behind").containsExactly(png);
        }

        CliRun forced = CliRun.of("material", shipped("black-paint.json").toString(), "--plot", png.toString(), "--force");
        assertThat(forced.exitCode()).as(forced.toString()).isZero();
        assertThat(Arrays.copyOf(Files.readAllBytes(png), 8)).containsExactly(PNG_SIGNATURE);
    }

    @Test
    void anExistingOutputFileIsNotOverwrittenWithoutForce() throws Exception {
        Path out = write("table.txt", "keep me\n");
        assertOneLineError(CliRun.of("material", shipped("black-paint.json").toString(), "-o", out.toString()),
                out.toString(), "--force");
        assertThat(Files.readString(out)).isEqualTo("keep me\n");
    }

    @Test
    void svgPlotIsRefusedOnOneLineBecauseOnlyPngIsAvailable() {
        Path svg = dir.resolve("x.svg");
        assertOneLineError(CliRun.of("material", shipped("black-paint.json").toString(), "--plot", svg.toString()),
                "SVG", ".png");
        assertThat(svg).doesNotExist();
    }

    @Test
    void aCaseFileListsAllItsMaterialsAndNamePicksOne() {
        Path box = Path.of("").toAbsolutePath().getParent().resolve("cases").resolve("demo").resolve("electronics-box.json");
        CliRun all = CliRun.of("material", box.toString(), "--from-K", "300", "--to-K", "300");
        assertThat(all.exitCode()).as(all.toString()).isZero();
        assertThat(all.out()).contains("(case)", "solder_mask");
        long blocks = all.out().lines().filter(l -> l.startsWith("Material ")).count();
        assertThat(blocks).isGreaterThan(1);

        CliRun one = CliRun.of("material", box.toString(), "--name", "solder_mask", "--from-K", "300", "--to-K", "300");
        assertThat(one.exitCode()).as(one.toString()).isZero();
        assertThat(one.out().lines().filter(l -> l.startsWith("Material ")).count()).isEqualTo(1);
    }

    @Test
    void unknownMaterialNameNamesTheFileAndPath() {
        String f = shipped("gold-film.json").toString();
        assertOneLineError(CliRun.of("material", f, "--name", "silver"), f, "$.materials", "silver", "gold_film");
    }

    @Test
    void unknownKeyInAMaterialFileNamesItsPath() throws Exception {
        Path m = write("bad.json", "{\"materials\": {\"a\": {\"emissivity\": 0.5}}, \"colour\": \"red\"}");
        assertOneLineError(CliRun.of("material", m.toString()), m.toString(), "$.colour", "unknown key");
        Path range = write("range.json", "{\"materials\": {\"a\": {\"emissivity\": 1.5}}}");
        assertOneLineError(CliRun.of("material", range.toString()), range.toString(), "$.materials.a.emissivity");
    }

    @Test
    void badSpectrumCsvNamesTheFileAndLine() throws Exception {
        Path csv = write("sun.csv", "# comment\nwavelength_um,irradiance_W_m2_um\n0.5,100\n0.7,lots\n");
        assertOneLineError(CliRun.of("material", shipped("black-paint.json").toString(), "--source-spectrum", csv.toString()),
                csv.toString(), "line 4", "irradiance_W_m2_um");
        Path header = write("head.csv", "wavelength,irradiance\n0.5,100\n0.7,10\n");
        assertOneLineError(CliRun.of("material", shipped("black-paint.json").toString(), "--source-spectrum",
                header.toString()), header.toString(), "line 1", "header");
        Path order = write("order.csv", "wavelength_um,irradiance_W_m2_um\n0.5,100\n0.4,10\n");
        assertOneLineError(CliRun.of("material", shipped("black-paint.json").toString(), "--source-spectrum",
                order.toString()), order.toString(), "line 3", "increase");
    }

    @Test
    void badOptionsAreOneLineErrors() {
        String f = shipped("black-paint.json").toString();
        assertOneLineError(CliRun.of("material", f, "--step-K", "0"), "step");
        assertOneLineError(CliRun.of("material", f, "--source-K", "-5"), "--source-K");
        assertOneLineError(CliRun.of("material", f, "--from-K", "900", "--to-K", "300"), "900");
    }

    @Test
    void plottingSeveralMaterialsAsksForName() throws Exception {
        Path m = write("two.json", "{\"materials\": {\"a\": {\"emissivity\": 0.5}, \"b\": {\"emissivity\": 0.2}}}");
        Path png = dir.resolve("p.png");
        assertOneLineError(CliRun.of("material", m.toString(), "--plot", png.toString()), "--name", "a, b");
        assertThat(png).doesNotExist();
    }
}
