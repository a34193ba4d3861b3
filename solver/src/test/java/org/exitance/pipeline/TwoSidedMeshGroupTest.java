package org.exitance.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cases.CaseException;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.support.SolveCheck;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * One group of an OBJ mesh (one solid of an STL) marked two-sided with {@code twoSidedGroups}: a
 * square plate above a hot black square of the same mesh, with black surroundings at 300 K. The
 * plate is one node (its faces name each other with otherFace); its front sees the hot square with
 * the aligned-parallel-rectangles view factor (Incropera et al., 6th ed., Table 13.2) and the room
 * with the rest, its back only the room. Adiabatic: ε_f(σT⁴ − G_f) + ε_b(σT⁴ − G_b) = 0, each face's
 * net heat ε_i A(σT⁴ − G_i) (two-surface exchange with black partners, Incropera 6th ed., eq. 13.19
 * with ε₂ = 1, from memory).
 */
class TwoSidedMeshGroupTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018

    @TempDir
    Path dir;

    /** The hot square at z = 0 facing +z, the plate at z = 0.5 wound to face −z (toward it). */
    private void meshes() throws Exception {
        Files.writeString(dir.resolve("shelf.obj"), """
                v 0 0 0
                v 1 0 0
                v 1 1 0
                v 0 1 0
                v 0 0 0.5
                v 0 1 0.5
                v 1 1 0.5
                v 1 0 0.5
                g floor
                f 1 2 3 4
                g shelf
                f 5 6 7 8
                """);
        Files.writeString(dir.resolve("shelf.stl"), """
                solid floor
                facet normal 0 0 1
                outer loop
                vertex 0 0 0
                vertex 1 0 0
                vertex 1 1 0
                endloop
                endfacet
                facet normal 0 0 1
                outer loop
                vertex 0 0 0
                vertex 1 1 0
                vertex 0 1 0
                endloop
                endfacet
                endsolid floor
                solid shelf
                facet normal 0 0 -1
                outer loop
                vertex 0 0 0.5
                vertex 0 1 0.5
                vertex 1 1 0.5
                endloop
                endfacet
                facet normal 0 0 -1
                outer loop
                vertex 0 0 0.5
                vertex 1 1 0.5
                vertex 1 0 0.5
                endloop
                endfacet
                endsolid shelf
                """);
    }

    private Path write(String mesh) throws Exception {
        meshes();
        String json = """
                {"title": "two-sided mesh group (test)",
                 "materials": {"black": {"emissivity": 1.0}, "oxidised": {"emissivity": 0.8}, "polished": {"emissivity": 0.3}},
                 "surfaces": [
                   {"name": "hot", "material": "black", "temperature_K": 1000},
                   {"name": "plate.front", "material": "oxidised", "adiabatic": true, "otherFace": "plate.back"},
                   {"name": "plate.back", "material": "polished", "otherFace": "plate.front"}],
                 "environment": {"name": "room", "temperature_K": 300},
                 "geometry": {"parts": [{"mesh": %s}]}}
                """.formatted(mesh);
        Path f = dir.resolve("shelf.json");
        Files.writeString(f, json);
        return f;
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"shelf.obj", "shelf.stl"})
    void aTwoSidedGroupIsOneNodeWithTheClosedFormFaceHeats(String file) throws Exception {
        RadiationCase c = CasePipeline.prepare(write("{\"file\": \"" + file + "\", \"groups\": {\"floor\": \"hot\","
                + " \"shelf\": \"plate\"}, \"twoSidedGroups\": [\"shelf\"]}")).model();
        SolveResult r = CaseSolver.solve(c, null);
        double f = TwoSidedGeometryTest.alignedRectangles(1.0, 1.0, 0.5);
        double gFront = f * Math.pow(1000, 4) + (1 - f) * Math.pow(300, 4); // × σ
        double gBack = Math.pow(300, 4);
        double tp4 = (0.8 * gFront + 0.3 * gBack) / (0.8 + 0.3);
        double qFront = 0.8 * SIGMA * (tp4 - gFront);
        assertThat(r.surface("plate.front").temperatureK()).isCloseTo(Math.pow(tp4, 0.25), within(1e-4));
        assertThat(r.surface("plate.back").temperatureK()).isEqualTo(r.surface("plate.front").temperatureK());
        assertThat(r.surface("plate.front").netHeatW()).isCloseTo(qFront, within(1e-5 * Math.abs(qFront)));
        assertThat(r.surface("plate.back").netHeatW()).isCloseTo(-qFront, within(1e-5 * Math.abs(qFront)));
        assertThat(r.twoSided()).singleElement().satisfies(p -> assertThat(p.face()).isEqualTo("plate.front"));
        // the floor group stays one-sided: it radiates toward +z only and is not split
        assertThat(r.surface("hot").areaM2()).isCloseTo(1.0, within(1e-12));
        SolveCheck.assertSolved(c, r);
    }

    @Test
    void aMeshWhoseGroupsAreItsSurfacesTakesTheGroupNames() throws Exception {
        meshes();
        String json = """
                {"materials": {"black": {"emissivity": 1.0}, "grey": {"emissivity": 0.5}},
                 "surfaces": [
                   {"name": "floor", "material": "black", "temperature_K": 1000},
                   {"name": "shelf.front", "material": "grey", "adiabatic": true, "otherFace": "shelf.back"},
                   {"name": "shelf.back", "material": "grey", "otherFace": "shelf.front"}],
                 "environment": {"name": "room", "temperature_K": 300},
                 "geometry": {"parts": [{"mesh": {"file": "shelf.obj", "twoSidedGroups": ["shelf"]}}]}}
                """;
        Path f = dir.resolve("plain.json");
        Files.writeString(f, json);
        SolveResult r = CaseSolver.solve(CasePipeline.prepare(f).model(), null);
        double fv = TwoSidedGeometryTest.alignedRectangles(1.0, 1.0, 0.5);
        // equal emissivities: T⁴ is the mean of the two faces' irradiations
        double tp4 = 0.5 * (fv * Math.pow(1000, 4) + (1 - fv) * Math.pow(300, 4) + Math.pow(300, 4));
        assertThat(r.surface("shelf.back").temperatureK()).isCloseTo(Math.pow(tp4, 0.25), within(1e-4));
    }

    @Test
    void badTwoSidedGroupsAreInputErrorsNamingTheirPath() throws Exception {
        CaseException unknown = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"file\": \"shelf.obj\", \"groups\": {\"floor\": \"hot\", \"shelf\": \"plate\"}, \"twoSidedGroups\": [\"rack\"]}")));
        assertThat(unknown.getMessage()).contains("$.geometry.parts[0].mesh.twoSidedGroups[0]", "no group 'rack'",
                "floor, shelf");
        CaseException whole = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"file\": \"shelf.obj\", \"surface\": \"plate\", \"twoSidedGroups\": [\"shelf\"]}")));
        assertThat(whole.getMessage()).contains("$.geometry.parts[0].mesh.twoSidedGroups", "\"twoSided\": true");
        CaseException mixed = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"file\": \"shelf.obj\", \"groups\": {\"floor\": \"plate\", \"shelf\": \"plate\"}, \"twoSidedGroups\": [\"shelf\"]}")));
        assertThat(mixed.getMessage()).contains("twoSidedGroups", "same surface 'plate'");
    }
}
