package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class BoxEnclosureTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 5})
    void subdividedUnitCubeMatchesCatalogFactorsAndCloses(int div) {
        Scene s = Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), div, div, div));
        ViewFactorResult r = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        int bottom = s.indexOf("bottom"), top = s.indexOf("top"), front = s.indexOf("front");
        // Howell catalog C-11 (parallel, directly opposed squares); 0.1998 from memory
        assertThat(r.surfaceFactor(bottom, top)).isCloseTo(ClosedForms.parallelRectangles(1, 1, 1), within(2e-7));
        // Howell catalog C-14 (perpendicular squares, common edge); 0.2000 from memory
        assertThat(r.surfaceFactor(bottom, front)).isCloseTo(ClosedForms.perpendicularRectangles(1, 1, 1), within(2e-7));
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-6);
    }
}
