package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.exitance.pipeline.CasePipeline;
import org.exitance.pipeline.ViewFactorStage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading a case is for library users who want what the file says: it computes no view factors,
 * writes no cache and casts no rays; the pipeline does that afterwards (and runs the checks that
 * need computed view factors: see GeometryCasesTest for an open geometry that reads but does
 * not prepare).
 */
class ReadingComputesNothingTest {
    @Test
    void readingAGeometryCaseWritesNoCacheAndHoldsTheSceneButNoMatrix(@TempDir Path dir) throws Exception {
        Path c = RepoCases.copyDemo(dir, "crucible-cavity.json");
        CaseDescription d = CaseReader.read(c);
        assertThat(ViewFactorStage.cacheFile(c)).doesNotExist();
        assertThat(d.geometry().scene().surfaces()).hasSameSizeAs(d.surfaces());
        assertThat(d.viewFactors()).isNull();
        // the pipeline is what computes them, and caches them beside the case
        CasePipeline.prepare(d, ViewFactorStage.Request.DEFAULT);
        assertThat(ViewFactorStage.cacheFile(c)).exists();
    }

    @Test
    void aSourcePlacedByTheGeometryIsReadWithoutItsIncidence(@TempDir Path dir) throws Exception {
        RepoCases.copyDemo(dir, "white-paint.csv"); // a property file the case names
        CaseDescription d = CaseReader.read(RepoCases.copyDemo(dir, "spacecraft-box-geometry.json"));
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
