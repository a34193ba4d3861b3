package org.exitance.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.support.SolveCheck;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A geometry part marked two-sided becomes one thermal node when its faces {@code NAME.front} and
 * {@code NAME.back} name each other with {@code otherFace}: a square plate above a hot black square
 * (aligned parallel squares, Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
 * Table 13.2, aligned parallel rectangles), with black surroundings. Every face sees only black
 * partners, so face i's irradiation is σ Σ_j F_ij T_j⁴ and its net heat ε_i A σ(T_p⁴ − Σ_j F_ij T_j⁴)
 * (the two-surface exchange with a black partner, Incropera 6th ed., eq. 13.19 with ε₂ = 1, from memory).
 */
class TwoSidedGeometryTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    private static final double SIDE = 1.0;
    private static final double GAP = 0.5;

    @TempDir
    Path dir;

    /** Aligned parallel rectangles a × b at distance c (Incropera 6th ed., Table 13.2). */
    static double alignedRectangles(double a, double b, double c) {
        double x = a / c;
        double y = b / c;
        double x2 = 1 + x * x;
        double y2 = 1 + y * y;
        return 2 / (Math.PI * x * y) * (Math.log(Math.sqrt(x2 * y2 / (x2 + y2 - 1)))
                + x * Math.sqrt(y2) * Math.atan(x / Math.sqrt(y2)) + y * Math.sqrt(x2) * Math.atan(y / Math.sqrt(x2))
                - x * Math.atan(x) - y * Math.atan(y));
    }

    private RadiationCase plate(String condition, String extraSurfaceKeys) throws Exception {
        String json = """
                {"title": "two-sided plate over a hot square (test)",
                 "materials": {"black": {"emissivity": 1.0}, "oxidised": {"emissivity": 0.8}, "polished": {"emissivity": 0.3}},
                 "surfaces": [
                   {"name": "hot", "material": "black", "temperature_K": 1000},
                   {"name": "plate.front", "material": "oxidised", %s, "otherFace": "plate.back"%s},
                   {"name": "plate.back", "material": "polished", "otherFace": "plate.front"}],
                 "environment": {"name": "room", "temperature_K": 300},
                 "geometry": {"parts": [
                   {"surface": "hot", "rectangle": {"origin_m": [0, 0, 0], "edgeU_m": [1, 0, 0], "edgeV_m": [0, 1, 0],
                                                    "divisions": [2, 2]}},
                   {"surface": "plate", "twoSided": true,
                    "rectangle": {"origin_m": [0, 0, 0.5], "edgeU_m": [0, 1, 0], "edgeV_m": [1, 0, 0], "divisions": [2, 2]}}]}}
                """.formatted(condition, extraSurfaceKeys);
        Path f = dir.resolve("plate.json");
        Files.writeString(f, json);
        return CasePipeline.prepare(f).model();
    }

    @Test
    void anAdiabaticTwoSidedRectangleIsOneNodeWithTheClosedFormFaceHeats() throws Exception {
        RadiationCase c = plate("\"adiabatic\": true", "");
        SolveResult r = CaseSolver.solve(c, null);
        double f = alignedRectangles(SIDE, SIDE, GAP);
        double gFront = f * Math.pow(1000, 4) + (1 - f) * Math.pow(300, 4); // front sees the hot square and the room
        double gBack = Math.pow(300, 4); // back sees only the room
        double tp4 = (0.8 * gFront + 0.3 * gBack) / (0.8 + 0.3);
        double qFront = 0.8 * SIGMA * (tp4 - gFront);
        assertThat(r.surface("plate.front").temperatureK()).isCloseTo(Math.pow(tp4, 0.25), within(1e-4));
        assertThat(r.surface("plate.back").temperatureK()).isEqualTo(r.surface("plate.front").temperatureK());
        assertThat(r.surface("plate.front").netHeatW()).isCloseTo(qFront, within(1e-5 * Math.abs(qFront)));
        assertThat(r.surface("plate.back").netHeatW()).isCloseTo(-qFront, within(1e-5 * Math.abs(qFront)));
        assertThat(r.twoSided()).singleElement().satisfies(p -> {
            assertThat(p.face()).isEqualTo("plate.front");
            assertThat(p.otherFace()).isEqualTo("plate.back");
            assertThat(p.netHeatW()).isCloseTo(0, within(1e-9 * Math.abs(qFront)));
        });
        assertThat(c.enclosure().surface(1).areaM2()).isEqualTo(c.enclosure().surface(2).areaM2());
        SolveCheck.assertSolved(c, r);
    }

    @Test
    void aDissipatingTwoSidedRectangleWithConvectionBalancesAllItsPaths() throws Exception {
        // 2000 W into the plate, leaving by both faces' radiation and by convection on the front
        RadiationCase c = plate("\"dissipation_W\": 2000",
                ", \"convection\": {\"coefficient_W_m2K\": 10, \"fluidTemperature_K\": 300}");
        SolveResult r = CaseSolver.solve(c, null);
        double f = alignedRectangles(SIDE, SIDE, GAP);
        double gFront = f * Math.pow(1000, 4) + (1 - f) * Math.pow(300, 4);
        java.util.function.DoubleUnaryOperator balance = t -> 0.8 * SIGMA * (Math.pow(t, 4) - gFront)
                + 0.3 * SIGMA * (Math.pow(t, 4) - Math.pow(300, 4)) + 10 * (t - 300) - 2000;
        double t = new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-12, 1e-10)
                .solve(200, balance::applyAsDouble, 300, 2000);
        assertThat(r.surface("plate.back").temperatureK()).isCloseTo(t, within(1e-4));
        double qBack = 0.3 * SIGMA * (Math.pow(t, 4) - Math.pow(300, 4));
        assertThat(r.surface("plate.back").netHeatW()).isCloseTo(qBack, within(1e-5 * qBack));
        assertThat(r.twoSided()).singleElement().satisfies(p ->
                assertThat(p.heatSuppliedW()).isCloseTo(2000, within(1e-6)));
        SolveCheck.assertSolved(c, r);
    }
}
