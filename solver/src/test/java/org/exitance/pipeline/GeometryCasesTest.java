package org.exitance.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseReader;
import org.exitance.cases.RepoCases;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.support.SolveCheck;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Cases whose view factors come from geometry: end to end, the cache, and bad geometry input. */
class GeometryCasesTest {
    private static final Path DEMO = RepoCases.root().resolve("cases").resolve("demo");

    @Test
    void chamberFromRectanglesMatchesTheChamberFromClosedFormViewFactors(@TempDir Path dir) throws Exception {
        // The matrix case takes its view factors from the closed forms for parallel and
        // perpendicular rectangles (Incropera et al., 6th ed., Table 13.2) with view-factor algebra;
        // the geometry case computes them from the same chamber's facets.
        SolveResult closedForm = CaseSolver.solve(CasePipeline.prepare(DEMO.resolve("heat-treating-chamber.json")).model(),
                null);
        PreparedCase g = CasePipeline.prepare(RepoCases.copyDemo(dir, "heat-treating-chamber-geometry.json"));
        SolveResult fromGeometry = CaseSolver.solve(g.model(), null);
        for (SurfaceResult a : closedForm.surfaces()) {
            SurfaceResult b = fromGeometry.surface(a.name());
            assertThat(b.areaM2()).isCloseTo(a.areaM2(), within(1e-12));
            assertThat(b.netHeatW()).as(a.name()).isCloseTo(a.netHeatW(), within(1e-6 * Math.abs(a.netHeatW())));
            assertThat(b.temperatureK()).isCloseTo(a.temperatureK(), within(1e-4));
        }
        SolveCheck.assertSolved(g.model(), fromGeometry);
    }

    @Test
    void viewFactorsAreCachedBesideTheCaseAndReused(@TempDir Path dir) throws Exception {
        Path c = RepoCases.copyDemo(dir, "crucible-cavity.json");
        PreparedCase first = CasePipeline.prepare(c);
        assertThat(first.viewFactors().fromCache()).isFalse();
        assertThat(ViewFactorStage.cacheFile(c)).exists();
        PreparedCase second = CasePipeline.prepare(c);
        assertThat(second.viewFactors().fromCache()).isTrue();
        assertThat(second.viewFactors().matrix()).isDeepEqualTo(first.viewFactors().matrix());
        // a changed geometry has another hash: recomputed
        Files.writeString(c, Files.readString(c).replace("\"height_m\": 0.4", "\"height_m\": 0.5"));
        PreparedCase third = CasePipeline.prepare(c);
        assertThat(third.viewFactors().fromCache()).isFalse();
        assertThat(third.viewFactors().geometryHash()).isNotEqualTo(first.viewFactors().geometryHash());
    }

    @Test
    void aCorruptCacheIsIgnoredAndReplaced(@TempDir Path dir) throws Exception {
        Path c = RepoCases.copyDemo(dir, "crucible-cavity.json");
        Files.writeString(ViewFactorStage.cacheFile(c), "{\"geometryHash\": \"x\", \"matrix\": [");
        PreparedCase r = CasePipeline.prepare(c);
        assertThat(r.viewFactors().fromCache()).isFalse();
        assertThat(CasePipeline.prepare(c).viewFactors().fromCache()).isTrue();
    }

    @Test
    void noCacheNeitherReadsNorWrites(@TempDir Path dir) throws Exception {
        Path c = RepoCases.copyDemo(dir, "crucible-cavity.json");
        CasePipeline.prepare(c, new ViewFactorStage.Request(false, f -> { }, () -> false));
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
        // reading computes no view factors, so only the pipeline can tell that the geometry is open
        assertThat(CaseReader.read(c).surfaces()).singleElement().satisfies(s -> assertThat(s.areaM2()).isEqualTo(1.0));
        assertThatThrownBy(() -> CasePipeline.prepare(c)).isInstanceOf(CaseException.class)
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
            assertThatThrownBy(() -> CasePipeline.prepare(c)).as(b[0]).isInstanceOf(CaseException.class)
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
        var model = CasePipeline.prepare(c).model();
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
        SolveCheck.assertSolved(model, CaseSolver.solve(model, null));
    }

    @Test
    void aSunDirectionNeedsGeometry(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("plates.json");
        String plates = Files.readString(RepoCases.root().resolve("cases/validation/gray-parallel-plates.json"));
        Files.writeString(c, plates.replaceFirst("\\{", "{\"sources\": [{\"name\": \"sun\", \"spectrum\": "
                + "{\"blackbody_K\": 5772}, \"irradiance_W_m2\": 1000, \"direction\": [0, 0, 1]}],"));
        assertThatThrownBy(() -> CasePipeline.prepare(c)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.sources[0].direction").hasMessageContaining("geometry");
    }

    private static final String CAVITY = """
            {"materials": {"black": {"emissivity": 1.0}, "grey": {"emissivity": 0.6}},
             "geometry": {"parts": [{"cylindricalCavity": {"baseCenter_m": [0, 0, 0], "axis": [0, 0, 1],
                "radius_m": 0.2, "height_m": 0.3, "divisions": [12, 3, 2],
                "faces": {"wall": "wall", "base": "base", "lid": "lid"}}}],
                "options": {"resolution": "%s"}},
             "surfaces": [
               {"name": "wall", "material": "%s", "temperature_K": 900},
               {"name": "base", "material": "%s", "temperature_K": 500},
               {"name": "lid", "material": "%s", %s}]}
            """;

    /** The cavity solved, and checked against the independent solve of its band equations. */
    private static SolveResult cavity(Path dir, String resolution, String material, String lid) throws Exception {
        Path c = dir.resolve(resolution + material + ".json");
        Files.writeString(c, CAVITY.formatted(resolution, material, material, material, lid));
        var model = CasePipeline.prepare(c).model();
        SolveResult r = CaseSolver.solve(model, null);
        SolveCheck.assertSolved(model, r);
        return r;
    }

    @Test
    void blackSurfacesGiveTheSameHeatsOnFacetsAsOnSurfaces(@TempDir Path dir) throws Exception {
        // Black isothermal surfaces: Q_I = Σ_J A_I F_IJ σ (T_I⁴ − T_J⁴) with F_IJ the area-weighted sum
        // of the facet factors (view-factor algebra; common practice), so both resolutions agree.
        SolveResult s = cavity(dir, "surfaces", "black", "\"temperature_K\": 300");
        SolveResult f = cavity(dir, "facets", "black", "\"temperature_K\": 300");
        assertThat(f.facets()).hasSizeGreaterThan(3);
        for (SurfaceResult a : s.surfaces()) {
            assertThat(f.surface(a.name()).netHeatW()).isCloseTo(a.netHeatW(), within(1e-9 * Math.abs(a.netHeatW())));
        }
    }

    @Test
    void anAdiabaticSurfaceOnFacetsBalancesFacetByFacet(@TempDir Path dir) throws Exception {
        SolveResult f = cavity(dir, "facets", "grey", "\"adiabatic\": true");
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (SurfaceResult x : f.facets()) {
            if (x.name().startsWith("lid#")) {
                // every facet of a reradiating wall has zero net radiative heat (common practice)
                assertThat(x.netHeatW()).isCloseTo(0, within(1e-9 * f.energyScaleW()));
                min = Math.min(min, x.temperatureK());
                max = Math.max(max, x.temperatureK());
            }
        }
        assertThat(max - min).as("the lid's facets see the hot wall differently").isGreaterThan(1.0);
        assertThat(f.surface("lid").temperatureK()).isBetween(min, max);
    }

    @Test
    void conductiveLinksNeedSurfaceResolution(@TempDir Path dir) throws Exception {
        Path c = dir.resolve("links.json");
        String text = CAVITY.formatted("facets", "grey", "grey", "grey", "\"adiabatic\": true")
                .replaceFirst("\"surfaces\": \\[", "\"conductiveLinks\": [{\"between\": [\"lid\", \"base\"],"
                        + " \"conductance_W_K\": 1}], \"surfaces\": [");
        Files.writeString(c, text);
        assertThatThrownBy(() -> CasePipeline.prepare(c)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.geometry.options.resolution");
    }
}
