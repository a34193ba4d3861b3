package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Cases whose view factors come from geometry: end to end, the cache, and bad geometry input. */
class GeometryCasesTest {
    private static final Path DEMO = RepoCases.root().resolve("cases").resolve("demo");

    private static Path copyDemo(Path dir, String name) throws Exception {
        Path to = dir.resolve(name);
        Files.copy(DEMO.resolve(name), to);
        return to;
    }

    @Test
    void chamberFromRectanglesMatchesTheChamberFromClosedFormViewFactors(@TempDir Path dir) throws Exception {
        // The matrix case takes its view factors from the closed forms for parallel and
        // perpendicular rectangles (Incropera et al., 6th ed., Table 13.2) with view-factor algebra;
        // the geometry case computes them from the same chamber's facets.
        SolveResult closedForm = CaseSolver.solve(CaseReader.read(DEMO.resolve("heat-treating-chamber.json")).model(),
                null);
        LoadedCase g = CaseReader.read(copyDemo(dir, "heat-treating-chamber-geometry.json"));
        SolveResult fromGeometry = CaseSolver.solve(g.model(), null);
        for (SurfaceResult a : closedForm.surfaces()) {
            SurfaceResult b = fromGeometry.surface(a.name());
            assertThat(b.areaM2()).isCloseTo(a.areaM2(), within(1e-12));
            assertThat(b.netHeatW()).as(a.name()).isCloseTo(a.netHeatW(), within(1e-6 * Math.abs(a.netHeatW())));
            assertThat(b.temperatureK()).isCloseTo(a.temperatureK(), within(1e-4));
        }
        assertThat(fromGeometry.relativeEnergyBalance()).isLessThan(1e-9);
    }

    @Test
    void viewFactorsAreCachedBesideTheCaseAndReused(@TempDir Path dir) throws Exception {
        Path c = copyDemo(dir, "crucible-cavity.json");
        LoadedCase first = CaseReader.read(c);
        assertThat(first.viewFactors().fromCache()).isFalse();
        assertThat(ViewFactorStage.cacheFile(c)).exists();
        LoadedCase second = CaseReader.read(c);
        assertThat(second.viewFactors().fromCache()).isTrue();
        assertThat(second.viewFactors().matrix()).isDeepEqualTo(first.viewFactors().matrix());
        // a changed geometry has another hash: recomputed
        Files.writeString(c, Files.readString(c).replace("\"height_m\": 0.4", "\"height_m\": 0.5"));
        LoadedCase third = CaseReader.read(c);
        assertThat(third.viewFactors().fromCache()).isFalse();
        assertThat(third.viewFactors().geometryHash()).isNotEqualTo(first.viewFactors().geometryHash());
    }

    @Test
    void aCorruptCacheIsIgnoredAndReplaced(@TempDir Path dir) throws Exception {
        Path c = copyDemo(dir, "crucible-cavity.json");
        Files.writeString(ViewFactorStage.cacheFile(c), "{\"geometryHash\": \"x\", \"matrix\": [");
        LoadedCase r = CaseReader.read(c);
        assertThat(r.viewFactors().fromCache()).isFalse();
        assertThat(CaseReader.read(c).viewFactors().fromCache()).isTrue();
    }

    @Test
    void noCacheNeitherReadsNorWrites(@TempDir Path dir) throws Exception {
        Path c = copyDemo(dir, "crucible-cavity.json");
        CaseReader.read(c, new ViewFactorStage.Request(false, f -> { }, () -> false));
        assertThat(ViewFactorStage.cacheFile(c)).doesNotExist();
    }

    @Test
    void anOpenGeometryWithoutEnvironmentIsRejectedWithItsPath(@TempDir Path dir) throws Exception {
        // one rectangle alone sends everything out of the geometry
        Path c = dir.resolve("open.json");
        Files.writeString(c, """
                {"materials": {"m": {"emissivity": 0.5}},
                 "geometry": {"parts": [{"surface": "plate", "rectangle":
                    {"origin_m": [0, 0, 0], "edgeU_m": [1, 0, 0], "edgeV_m": [0, 1, 0]}}]},
                 "surfaces": [{"name": "plate", "material": "m", "temperature_K": 400}]}
                """);
        assertThatThrownBy(() -> CaseReader.read(c)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.geometry").hasMessageContaining("open");
    }

    @Test
    void geometryMistakesNameTheirPath(@TempDir Path dir) throws Exception {
        String base = """
                {"materials": {"m": {"emissivity": 0.5}},
                 "geometry": {"parts": [%s]},
                 "surfaces": [{"name": "plate", "material": "m", "temperature_K": 400}],
                 "environment": {"name": "room", "temperature_K": 300}}
                """;
        String[][] bad = {
            {"{\"surface\": \"plate\", \"wedge\": {}}", "$.geometry.parts[0]"},
            {"{\"mesh\": {\"file\": \"missing.stl\", \"surface\": \"plate\"}}", "$.geometry.parts[0].mesh.file"},
            {"{\"surface\": \"plate\", \"rectangle\": {\"origin_m\": [0, 0], \"edgeU_m\": [1, 0, 0],"
                    + " \"edgeV_m\": [0, 1, 0]}}", "$.geometry.parts[0].rectangle.origin_m"},
            {"{\"surface\": \"other\", \"rectangle\": {\"origin_m\": [0, 0, 0], \"edgeU_m\": [1, 0, 0],"
                    + " \"edgeV_m\": [0, 1, 0]}}", "$.surfaces"},
        };
        for (String[] b : bad) {
            Path c = dir.resolve("bad.json");
            Files.writeString(c, String.format(base, b[0]));
            assertThatThrownBy(() -> CaseReader.read(c)).as(b[0]).isInstanceOf(CaseException.class)
                    .hasMessageContaining(b[1]);
        }
    }

    @Test
    void sunDirectionAndPlanetArePlacedByTheGeometry(@TempDir Path dir) throws Exception {
        // A cube lit along its body diagonal: three faces at cos θ = 1/√3, three dark (common
        // practice); its top face looking straight away from a planet below sees none of it, its
        // bottom face sees F = (R/(R + h))² (differential element facing a sphere's centre;
        // Howell's catalog, element-to-sphere case, from memory).
        Path c = dir.resolve("cube.json");
        Files.writeString(c, """
                {"materials": {"m": {"emissivity": 0.5}},
                 "geometry": {"parts": [{"box": {"min_m": [0, 0, 0], "max_m": [1, 1, 1], "facing": "outward",
                   "faces": {"bottom": "bottom", "top": "top", "front": "front", "back": "back",
                             "left": "left", "right": "right"}}}]},
                 "surfaces": [%s],
                 "environment": {"name": "space", "temperature_K": 3},
                 "sources": [
                   {"name": "sun", "spectrum": {"blackbody_K": 5772}, "irradiance_W_m2": 1361, "direction": [1, 1, 1]},
                   {"name": "planet", "spectrum": {"blackbody_K": 255}, "irradiance_W_m2": 240,
                    "planet": {"direction": [0, 0, -1], "altitude_m": 400000}}]}
                """.formatted(String.join(", ", java.util.stream.Stream.of("bottom", "top", "front", "back", "left",
                "right").map(n -> "{\"name\": \"" + n + "\", \"material\": \"m\", \"adiabatic\": true}").toList())));
        var model = CaseReader.read(c).model();
        var sun = model.sources().get(0);
        double third = 1 / Math.sqrt(3);
        assertThat(sun.incidence().get("top")).isCloseTo(third, within(1e-12));
        assertThat(sun.incidence().get("right")).isCloseTo(third, within(1e-12));
        assertThat(sun.incidence().get("back")).isCloseTo(third, within(1e-12));
        assertThat(sun.incidence().get("bottom")).isCloseTo(0, within(1e-12));
        var planet = model.sources().get(1);
        double ratio = 6.371e6 / (6.371e6 + 4e5);
        assertThat(planet.incidence().get("bottom")).isCloseTo(ratio * ratio, within(1e-9));
        assertThat(planet.incidence().get("top")).isCloseTo(0, within(1e-12));
        SolveResult r = CaseSolver.solve(model, null);
        assertThat(r.relativeEnergyBalance()).isLessThan(1e-9);
    }

    @Test
    void aSunDirectionNeedsGeometry(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("plates.json");
        String plates = Files.readString(RepoCases.root().resolve("cases/validation/gray-parallel-plates.json"));
        Files.writeString(c, plates.replaceFirst("\\{", "{\"sources\": [{\"name\": \"sun\", \"spectrum\": "
                + "{\"blackbody_K\": 5772}, \"irradiance_W_m2\": 1000, \"direction\": [0, 0, 1]}],"));
        assertThatThrownBy(() -> CaseReader.read(c)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.sources[0].direction").hasMessageContaining("geometry");
    }
}
