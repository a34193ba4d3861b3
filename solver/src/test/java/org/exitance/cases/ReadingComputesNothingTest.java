package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.pipeline.CasePipeline;
import org.exitance.pipeline.ViewFactorStage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading a case is for library users who want what the file says: it computes no view factors,
 * writes no cache and casts no rays; the pipeline does that afterwards.
 */
class ReadingComputesNothingTest {
    private static final Path DEMO = RepoCases.root().resolve("cases").resolve("demo");

    private static Path copyDemo(Path dir, String name) throws Exception {
        Path to = dir.resolve(name);
        Files.copy(DEMO.resolve(name), to);
        return to;
    }

    @Test
    void readingAGeometryCaseWritesNoCacheAndHoldsTheSceneButNoMatrix(@TempDir Path dir) throws Exception {
        Path c = copyDemo(dir, "crucible-cavity.json");
        CaseDescription d = CaseReader.read(c);
        assertThat(ViewFactorStage.cacheFile(c)).doesNotExist();
        assertThat(d.geometry().scene().surfaces()).hasSameSizeAs(d.surfaces());
        assertThat(d.viewFactors()).isNull();
        // the pipeline is what computes them, and caches them beside the case
        CasePipeline.prepare(d, ViewFactorStage.Request.DEFAULT);
        assertThat(ViewFactorStage.cacheFile(c)).exists();
    }

    @Test
    void anOpenGeometryReadsBecauseOnlyComputedViewFactorsShowThatItIsOpen(@TempDir Path dir) throws Exception {
        // one rectangle alone sends all its radiation out of the geometry (F to itself is 0: a
        // plane surface does not see itself, common practice)
        Path c = dir.resolve("open.json");
        Files.writeString(c, """
                {"materials": {"m": {"emissivity": 0.5}},
                 "geometry": {"parts": [{"surface": "plate", "rectangle":
                    {"origin_m": [0, 0, 0], "edgeU_m": [1, 0, 0], "edgeV_m": [0, 1, 0]}}]},
                 "surfaces": [{"name": "plate", "material": "m", "temperature_K": 400}]}
                """);
        CaseDescription d = CaseReader.read(c);
        assertThat(d.surfaces()).singleElement().satisfies(s -> assertThat(s.areaM2()).isEqualTo(1.0));
        assertThatThrownBy(() -> CasePipeline.prepare(d, ViewFactorStage.Request.DEFAULT))
                .isInstanceOf(CaseException.class).hasMessageContaining("$.geometry").hasMessageContaining("open");
    }

    @Test
    void aSourcePlacedByTheGeometryIsReadWithoutItsIncidence(@TempDir Path dir) throws Exception {
        copyDemo(dir, "white-paint.csv"); // a property file the case names
        CaseDescription d = CaseReader.read(copyDemo(dir, "spacecraft-box-geometry.json"));
        assertThat(d.sources()).anySatisfy(s -> {
            assertThat(s.placement()).isInstanceOf(SourcePlacement.Collimated.class);
            assertThat(s.source().incidence()).isEmpty();
        });
        // the pipeline casts the rays: a lit box has some surface with a positive factor
        var model = CasePipeline.prepare(d, ViewFactorStage.Request.DEFAULT).model();
        String lit = d.sources().stream().filter(s -> s.placement() instanceof SourcePlacement.Collimated)
                .findFirst().orElseThrow().name();
        assertThat(model.sources().stream().filter(s -> s.name().equals(lit)).findFirst().orElseThrow()
                .incidence().values()).anyMatch(f -> f > 0);
    }
}
