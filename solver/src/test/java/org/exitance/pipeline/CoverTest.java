package org.exitance.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.support.SolveCheck;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Insulation blankets and shield packs on a panel that radiates to black surroundings. Layer by
 * layer, the heat through a series of gray infinite parallel sheets is
 * {@code q = σ(T_w⁴ − T_env⁴) / [1/ε_w + 1/ε_l − 1 + (N − 1)(2/ε_l − 1) + 1/ε_o]}: the gap from the
 * wall to the first layer, N − 1 gaps between layers, and the outer face to black surroundings
 * (Incropera et al., 6th ed., Table 13.3 and the shield series form, from memory; Siegel &amp; Howell, 5th ed., §6.3).
 */
class CoverTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    @TempDir
    Path dir;

    private RadiationCase panel(String cover) throws Exception {
        String json = """
                {"title": "covered panel (test)",
                 "materials": {"paint": {"emissivity": 0.85}, "film": {"emissivity": 0.04},
                               "outer_film": {"emissivity": 0.6}},
                 "surfaces": [{"name": "panel", "material": "paint", "area_m2": 2.0, "temperature_K": 300,
                               "coveredBy": %s}],
                 "environment": {"name": "space", "temperature_K": 3},
                 "viewFactors": {"matrix": [[0]]}}
                """.formatted(cover);
        Path f = dir.resolve("panel.json");
        Files.writeString(f, json);
        return CasePipeline.prepare(f).model();
    }

    @ParameterizedTest(name = "N = {0}")
    @ValueSource(ints = {1, 2, 10, 40})
    void aBlanketOfLayersCarriesTheSeriesClosedFormHeat(int n) throws Exception {
        RadiationCase c = panel("{\"layers\": " + n + ", \"layerMaterial\": \"film\", \"outerMaterial\": \"outer_film\"}");
        SolveResult r = CaseSolver.solve(c, null);
        double resistance = 1 / 0.85 + 1 / 0.04 - 1 + (n - 1) * (2 / 0.04 - 1) + 1 / 0.6;
        double q = SIGMA * (Math.pow(300, 4) - Math.pow(3, 4)) / resistance;
        assertThat(r.surface("panel").netHeatW()).isCloseTo(2 * q, within(1e-9 * 2 * q));
        // the outer face radiates it to space: ε_o σ(T_o⁴ − T_env⁴) = q
        double to = Math.pow(q / (0.6 * SIGMA) + Math.pow(3, 4), 0.25);
        assertThat(r.surface("panel.outer").temperatureK()).isCloseTo(to, within(1e-8));
        assertThat(r.twoSided()).hasSize(n);
        SolveCheck.assertSolved(c, r);
    }

    /** An effective emittance ε*: q = σ(T_w⁴ − T_env⁴)/(1/ε* + 1/ε_o) through one outer sheet. */
    @Test
    void anEffectiveEmittanceCarriesItsStatedHeat() throws Exception {
        RadiationCase c = panel("{\"effectiveEmittance\": 0.01, \"outerMaterial\": \"outer_film\"}");
        SolveResult r = CaseSolver.solve(c, null);
        double q = SIGMA * (Math.pow(300, 4) - Math.pow(3, 4)) / (1 / 0.01 + 1 / 0.6);
        assertThat(r.surface("panel").netHeatW()).isCloseTo(2 * q, within(1e-9 * 2 * q));
    }

    /** Sunlight aimed at a covered panel lands on its outer face. */
    @Test
    void externalIrradiationLandsOnTheOuterFace() throws Exception {
        String json = """
                {"title": "sunlit covered panel (test)",
                 "materials": {"paint": {"emissivity": 0.85}, "film": {"emissivity": 0.04},
                               "outer_film": {"emissivity": 0.6}},
                 "surfaces": [{"name": "panel", "material": "paint", "area_m2": 1.0, "temperature_K": 300,
                               "coveredBy": {"layers": 3, "layerMaterial": "film", "outerMaterial": "outer_film"}}],
                 "environment": {"name": "space", "temperature_K": 3},
                 "viewFactors": {"matrix": [[0]]},
                 "sources": [{"name": "sun", "spectrum": {"blackbody_K": 5772}, "irradiance_W_m2": 1361,
                              "incidence": {"panel": 1.0}}]}
                """;
        Path f = dir.resolve("sunlit.json");
        Files.writeString(f, json);
        RadiationCase c = CasePipeline.prepare(f).model();
        assertThat(c.sources().get(0).irradianceOn("panel.outer")).isEqualTo(1361.0);
        assertThat(c.sources().get(0).irradianceOn("panel")).isZero();
    }

    @Test
    void aCoverOnAWindowFaceOrWithAnUnknownMaterialIsAnInputError() throws Exception {
        org.exitance.cases.CaseException e = org.junit.jupiter.api.Assertions.assertThrows(
                org.exitance.cases.CaseException.class,
                () -> panel("{\"layers\": 2, \"layerMaterial\": \"nothing\", \"outerMaterial\": \"outer_film\"}"));
        assertThat(e.getMessage()).contains("$.surfaces[0].coveredBy.layerMaterial", "unknown material");
    }
}
