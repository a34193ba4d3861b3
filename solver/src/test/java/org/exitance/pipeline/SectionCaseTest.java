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

/** Cases given as a 2-D section: areas from perimeter × length, view factors by crossed strings. */
class SectionCaseTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    @TempDir
    Path dir;

    /**
     * Two black parallel strips of width w, h apart, facing each other, 10 m long, the rest to 0 K
     * surroundings: Q = σ(T₁⁴ − T₂⁴) w L F₁₂ with F₁₂ = √(1 + (h/w)²) − h/w (crossed strings;
     * Incropera et al., 6th ed., Table 13.1, parallel plates with midlines connected by a perpendicular).
     */
    @Test
    void twoParallelStripsExchangeTheCrossedStringsHeat() throws Exception {
        String json = """
                {"title": "two strips (test)",
                 "materials": {"black": {"emissivity": 1.0}},
                 "surfaces": [{"name": "top", "material": "black", "temperature_K": 800},
                              {"name": "bottom", "material": "black", "temperature_K": 400}],
                 "environment": {"name": "cold", "temperature_K": 0},
                 "section": {"length_m": 10,
                             "parts": [{"surface": "top", "segment": {"from_m": [2, 0.5], "to_m": [0, 0.5]}},
                                       {"surface": "bottom", "segment": {"from_m": [0, 0], "to_m": [2, 0]}}]}}
                """;
        Path f = dir.resolve("strips.json");
        Files.writeString(f, json);
        RadiationCase c = CasePipeline.prepare(f).model();
        SolveResult r = CaseSolver.solve(c, null);
        double w = 2;
        double h = 0.5;
        double f12 = Math.sqrt(1 + (h / w) * (h / w)) - h / w;
        assertThat(c.enclosure().surface(0).areaM2()).isEqualTo(20.0);
        assertThat(c.enclosure().viewFactor(0, 1)).isCloseTo(f12, within(1e-12));
        // net exchange top → bottom, plus each strip's loss to the 0 K surroundings
        double qTop = SIGMA * w * 10 * (Math.pow(800, 4) - f12 * Math.pow(400, 4));
        assertThat(r.surface("top").netHeatW()).isCloseTo(qTop, within(1e-9 * qTop));
        SolveCheck.assertSolved(c, r);
    }

    /** Several parts make one surface: the row's perimeter adds and its view factors aggregate. */
    @Test
    void aRowOfTubesIsOneSurface() throws Exception {
        String json = """
                {"title": "tube row over a floor (test)",
                 "materials": {"black": {"emissivity": 1.0}},
                 "surfaces": [{"name": "tubes", "material": "black", "temperature_K": 1000},
                              {"name": "floor", "material": "black", "temperature_K": 300}],
                 "environment": {"name": "room", "temperature_K": 300},
                 "section": {"length_m": 2,
                             "parts": [{"surface": "tubes", "circle": {"center_m": [0, 1], "radius_m": 0.1}},
                                       {"surface": "tubes", "circle": {"center_m": [0.5, 1], "radius_m": 0.1}},
                                       {"surface": "floor", "segment": {"from_m": [-1, 0], "to_m": [1.5, 0]}}]}}
                """;
        Path f = dir.resolve("row.json");
        Files.writeString(f, json);
        RadiationCase c = CasePipeline.prepare(f).model();
        assertThat(c.enclosure().surface(0).areaM2()).isCloseTo(2 * 2 * Math.PI * 0.1 * 2, within(1e-12));
        // reciprocity of the aggregated matrix (built from perimeter-weighted rows)
        double a0 = c.enclosure().surface(0).areaM2();
        double a1 = c.enclosure().surface(1).areaM2();
        assertThat(a0 * c.enclosure().viewFactor(0, 1)).isCloseTo(a1 * c.enclosure().viewFactor(1, 0), within(1e-12));
    }
}
