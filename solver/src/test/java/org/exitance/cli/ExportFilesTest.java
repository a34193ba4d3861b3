package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.exitance.cases.CaseReader;
import org.exitance.cases.RepoCases;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Surface;
import org.exitance.pipeline.CasePipeline;
import org.exitance.pipeline.PreparedCase;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code solve --csv DIR} and {@code --vtk FILE}: the files read back, with the values of the solve. */
class ExportFilesTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    /** Rows of a CSV file, header first, parsed by Jackson's CSV module (RFC 4180). */
    static List<String[]> csv(Path file) throws Exception {
        CsvMapper m = new CsvMapper();
        m.enable(CsvParser.Feature.WRAP_AS_ARRAY);
        List<String[]> rows = new ArrayList<>();
        try (MappingIterator<String[]> it = m.readerFor(String[].class).readValues(file.toFile())) {
            it.forEachRemaining(rows::add);
        }
        return rows;
    }

    private CliRun solve(String... args) {
        CliRun run = CliRun.of(args);
        assertThat(run.exitCode()).as(run.toString()).isZero();
        return run;
    }

    @Test
    void surfaceBandAndPairCsvHoldTheNumbersOfTheJsonResult() throws Exception {
        Path json = dir.resolve("r.json");
        Path out = dir.resolve("csv");
        solve("solve", RepoCases.validationCase("two-band-parallel-plates.json").toString(), "--json", "-o",
                json.toString(), "--csv", out.toString(), "--create-dirs", "--conductance");
        JsonNode r = JSON.readTree(json.toFile());
        List<String[]> surfaces = csv(out.resolve("surfaces.csv"));
        assertThat(surfaces.get(0)).startsWith("loadCase", "name", "area_m2");
        assertThat(surfaces).hasSize(1 + r.get("surfaces").size());
        for (int i = 0; i < r.get("surfaces").size(); i++) {
            JsonNode s = r.get("surfaces").get(i);
            String[] row = surfaces.get(i + 1);
            assertThat(row[1]).isEqualTo(s.get("name").asText());
            // exactly the same doubles: the CSV writes the shortest form that reads back bit for bit
            assertThat(Double.parseDouble(row[4])).isEqualTo(s.get("temperature_K").asDouble());
            assertThat(Double.parseDouble(row[6])).isEqualTo(s.get("netHeat_W").asDouble());
        }
        List<String[]> bands = csv(out.resolve("bands.csv"));
        int nb = r.get("bands").size();
        assertThat(bands).hasSize(1 + nb * r.get("surfaces").size());
        for (int k = 0; k < nb; k++) {
            assertThat(Double.parseDouble(bands.get(1 + k)[4]))
                    .isEqualTo(r.get("surfaces").get(0).get("bands").get(k).get("netHeat_W").asDouble());
        }
        List<String[]> pairs = csv(out.resolve("pair-exchange.csv"));
        assertThat(pairs.get(0)).endsWith("conductance_W_K");
        JsonNode q = r.get("pairExchange").get("netHeat_W");
        for (String[] row : pairs.subList(1, pairs.size())) {
            if (row[3].equals("all")) {
                int i = index(r, row[1]);
                int j = index(r, row[2]);
                assertThat(Double.parseDouble(row[6])).isEqualTo(q.get(i).get(j).asDouble());
            }
        }
    }

    private static int index(JsonNode r, String node) {
        JsonNode nodes = r.get("pairExchange").get("nodes");
        for (int i = 0; i < nodes.size(); i++) {
            if (nodes.get(i).get("name").asText().equals(node)) {
                return i;
            }
        }
        throw new AssertionError(node);
    }

    @Test
    void theViewFactorCsvPastesBackIntoAMatrixCase() throws Exception {
        // A geometry case's surface matrix, exported, becomes the "viewFactors.matrix" of the same
        // case with areas from surfaces.csv: the reader accepts it unchanged and the solve agrees.
        Path geometryCase = RepoCases.copyDemo(dir, "heat-treating-chamber-geometry.json");
        Path out = dir.resolve("csv");
        Path json = dir.resolve("g.json");
        solve("solve", geometryCase.toString(), "--csv", out.toString(), "--create-dirs", "--json", "-o", json.toString(),
                "--no-audit");
        List<String[]> vf = csv(out.resolve("view-factors.csv"));
        List<String[]> surfaces = csv(out.resolve("surfaces.csv"));
        ObjectNode c = (ObjectNode) JSON.readTree(geometryCase.toFile());
        c.remove("geometry");
        ArrayNode matrix = c.putObject("viewFactors").putArray("matrix");
        int n = vf.size() - 1;
        double[][] f = new double[n][n];
        for (int i = 0; i < n; i++) {
            assertThat(vf.get(i + 1)[0]).isEqualTo(vf.get(0)[i + 1]).isEqualTo(c.get("surfaces").get(i).get("name").asText());
            ArrayNode row = matrix.addArray();
            for (int j = 0; j < n; j++) {
                f[i][j] = Double.parseDouble(vf.get(i + 1)[j + 1]);
                row.add(f[i][j]);
            }
            ((ObjectNode) c.get("surfaces").get(i)).put("area_m2", Double.parseDouble(surfaces.get(i + 1)[2]));
        }
        Path matrixCase = dir.resolve("as-matrix.json");
        JSON.writeValue(matrixCase.toFile(), c);
        var read = CaseReader.read(matrixCase);
        for (int i = 0; i < n; i++) {
            assertThat(read.viewFactors()[i]).containsExactly(f[i]);
        }
        // consistent to 1e-9 (reciprocal, rows closed), so the solve uses it as it is (the reader may
        // still note rows that miss 1 by more than 1e-12)
        PreparedCase prepared = CasePipeline.prepare(matrixCase);
        for (int i = 0; i < n; i++) {
            assertThat(prepared.model().enclosure().viewFactors()[i]).containsExactly(f[i]);
        }
        Path json2 = dir.resolve("m.json");
        solve("solve", matrixCase.toString(), "--json", "-o", json2.toString(), "--no-audit");
        JsonNode a = JSON.readTree(json.toFile()).get("surfaces");
        JsonNode b = JSON.readTree(json2.toFile()).get("surfaces");
        for (int i = 0; i < n; i++) {
            double qa = a.get(i).get("netHeat_W").asDouble();
            assertThat(b.get(i).get("netHeat_W").asDouble()).isCloseTo(qa, within(1e-9 * Math.abs(qa)));
        }
    }

    /** A legacy VTK polydata file, read token by token: counts, field strings and cell scalars. */
    record Vtk(int points, int cells, int[] verticesPerCell, List<String> surfaceNames, Map<String, double[]> scalars) {
        static Vtk read(Path file) throws Exception {
            List<String> lines = Files.readAllLines(file);
            assertThat(lines.get(0)).startsWith("# vtk DataFile Version");
            assertThat(lines.get(2)).isEqualTo("ASCII");
            assertThat(lines.get(3)).isEqualTo("DATASET POLYDATA");
            int at = 4;
            List<String> names = new ArrayList<>();
            int points = -1;
            int cells = -1;
            int[] per = null;
            Map<String, double[]> scalars = new HashMap<>();
            while (at < lines.size()) {
                String[] t = lines.get(at).trim().split("\\s+");
                switch (t[0]) {
                    case "FIELD" -> at++;
                    case "surface_name" -> {
                        int count = Integer.parseInt(t[2]);
                        for (int k = 0; k < count; k++) {
                            names.add(java.net.URLDecoder.decode(lines.get(at + 1 + k), java.nio.charset.StandardCharsets.UTF_8));
                        }
                        at += 1 + count;
                    }
                    case "band_edges_um" -> at += 1 + Integer.parseInt(t[2]);
                    case "POINTS" -> {
                        points = Integer.parseInt(t[1]);
                        for (int k = 0; k < points; k++) {
                            assertThat(lines.get(at + 1 + k).trim().split(" ")).hasSize(3);
                        }
                        at += 1 + points;
                    }
                    case "POLYGONS" -> {
                        cells = Integer.parseInt(t[1]);
                        per = new int[cells];
                        int size = 0;
                        for (int k = 0; k < cells; k++) {
                            String[] c = lines.get(at + 1 + k).trim().split(" ");
                            per[k] = Integer.parseInt(c[0]);
                            assertThat(c).hasSize(per[k] + 1);
                            size += c.length;
                        }
                        assertThat(size).isEqualTo(Integer.parseInt(t[2]));
                        at += 1 + cells;
                    }
                    case "CELL_DATA" -> {
                        assertThat(Integer.parseInt(t[1])).isEqualTo(cells);
                        at++;
                    }
                    case "SCALARS" -> {
                        assertThat(lines.get(at + 1)).isEqualTo("LOOKUP_TABLE default");
                        double[] v = new double[cells];
                        for (int k = 0; k < cells; k++) {
                            v[k] = Double.parseDouble(lines.get(at + 2 + k));
                        }
                        scalars.put(t[1], v);
                        at += 2 + cells;
                    }
                    default -> throw new AssertionError("unexpected line " + (at + 1) + ": " + lines.get(at));
                }
            }
            return new Vtk(points, cells, per, names, scalars);
        }
    }

    @Test
    void vtkOfASurfaceCaseCarriesEachSurfacesValuesOnItsFacets() throws Exception {
        Path c = RepoCases.copyDemo(dir, "oven-shelf-two-sided.json");
        Path vtk = dir.resolve("oven.vtk");
        Path json = dir.resolve("oven.json");
        solve("solve", c.toString(), "--vtk", vtk.toString(), "--json", "-o", json.toString(), "--no-audit");
        Vtk v = Vtk.read(vtk);
        List<Surface> scene = CaseReader.read(c).geometry().scene().surfaces();
        int facets = scene.stream().mapToInt(s -> s.facets().size()).sum();
        int vertices = scene.stream().flatMap(s -> s.facets().stream()).mapToInt(Facet::vertexCount).sum();
        assertThat(v.cells()).isEqualTo(facets);
        assertThat(v.points()).isEqualTo(vertices);
        JsonNode r = JSON.readTree(json.toFile());
        assertThat(v.surfaceNames()).hasSize(r.get("surfaces").size());
        int cell = 0;
        for (Surface s : scene) {
            for (int k = 0; k < s.facets().size(); k++, cell++) {
                int id = (int) v.scalars().get("surface_id")[cell];
                assertThat(v.surfaceNames().get(id)).isEqualTo(s.name());
                JsonNode sr = r.get("surfaces").get(id);
                assertThat(v.scalars().get("temperature_K")[cell]).isEqualTo(sr.get("temperature_K").asDouble());
                assertThat(v.scalars().get("netFlux_W_m2")[cell]).isEqualTo(sr.get("netFlux_W_m2").asDouble());
                double bandFlux = sr.get("bands").get(2).get("netHeat_W").asDouble() / sr.get("area_m2").asDouble();
                assertThat(v.scalars().get("bandNetFlux_W_m2_3")[cell]).isCloseTo(bandFlux, within(1e-12 * Math.abs(bandFlux) + 1e-300));
            }
        }
        assertThat(v.scalars()).containsKey("bandNetFlux_W_m2_" + r.get("bands").size());
    }

    @Test
    void vtkOfACaseSolvedOnFacetsCarriesEachFacetsOwnValues() throws Exception {
        Path c = RepoCases.copyDemo(dir, "heat-treating-chamber-facets.json");
        Path vtk = dir.resolve("f.vtk");
        Path json = dir.resolve("f.json");
        solve("solve", c.toString(), "--vtk", vtk.toString(), "--json", "-o", json.toString(), "--no-audit");
        Vtk v = Vtk.read(vtk);
        JsonNode facets = JSON.readTree(json.toFile()).get("facets");
        assertThat(v.cells()).isEqualTo(facets.size());
        Map<String, Double> t = new HashMap<>();
        facets.forEach(f -> t.put(f.get("name").asText(), f.get("temperature_K").asDouble()));
        List<Surface> scene = CaseReader.read(c).geometry().scene().surfaces();
        int cell = 0;
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (Surface s : scene) {
            for (int k = 1; k <= s.facets().size(); k++, cell++) {
                assertThat(v.scalars().get("temperature_K")[cell]).isEqualTo(t.get(s.name() + "#" + k));
                min = Math.min(min, v.scalars().get("temperature_K")[cell]);
                max = Math.max(max, v.scalars().get("temperature_K")[cell]);
            }
        }
        assertThat(max - min).as("facets differ in temperature").isGreaterThan(1);
    }

    @Test
    void exportsNeverOverwriteNorCreateDirectoriesUnasked() throws Exception {
        String plates = RepoCases.validationCase("gray-parallel-plates.json").toString();
        CliRun missing = CliRun.of("solve", plates, "--csv", dir.resolve("nope").toString());
        assertThat(missing.exitCode()).isEqualTo(2);
        assertThat(missing.errLines()).singleElement().asString().contains("--create-dirs");
        Files.writeString(dir.resolve("surfaces.csv"), "keep\n");
        CliRun exists = CliRun.of("solve", plates, "--csv", dir.toString());
        assertThat(exists.exitCode()).isEqualTo(2);
        assertThat(exists.errLines()).singleElement().asString().contains("--force");
        assertThat(Files.readString(dir.resolve("surfaces.csv"))).isEqualTo("keep\n");
        assertThat(CliRun.of("solve", plates, "--csv", dir.toString(), "--force").exitCode()).isZero();
        assertThat(Files.readString(dir.resolve("surfaces.csv"))).startsWith("loadCase,");
        CliRun vtk = CliRun.of("solve", plates, "--vtk", dir.resolve("x.vtk").toString());
        assertThat(vtk.exitCode()).isEqualTo(2);
        assertThat(vtk.errLines()).singleElement().asString().contains("geometry");
        CliRun bad = CliRun.of("solve", plates, "--exchange", "sometimes");
        assertThat(bad.exitCode()).isEqualTo(2);
        assertThat(bad.errLines()).singleElement().asString().contains("--exchange");
        assertThat(CliRun.of("solve", plates, "--exchange", "off", "--conductance").exitCode()).isEqualTo(2);
        CliRun off = CliRun.of("solve", plates, "--exchange", "off", "--json");
        assertThat(JSON.readTree(off.out()).has("pairExchange")).isFalse();
    }
}
