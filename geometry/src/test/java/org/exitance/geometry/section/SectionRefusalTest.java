package org.exitance.geometry.section;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.exitance.geometry.GeometryException;
import org.exitance.geometry.section.SectionElement.Arc;
import org.exitance.geometry.section.SectionElement.Circle;
import org.exitance.geometry.section.SectionElement.Side;
import org.junit.jupiter.api.Test;

/** Sections outside what crossed strings support here are refused, naming the surfaces. */
class SectionRefusalTest {

    @Test
    void crossingStripsAreRefused() {
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1).segment("a", 0, 0, 2, 0)
                .segment("b", 1, -1, 1, 1).build())).isInstanceOf(GeometryException.class)
                .hasMessageContaining("'a'").hasMessageContaining("'b'").hasMessageContaining("cross");
    }

    @Test
    void aTubeThroughAStripIsRefused() {
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1).segment("a", 0, 0, 2, 0)
                .tube("t", 1, 0.1, 0.3).build())).isInstanceOf(GeometryException.class).hasMessageContaining("'t'");
    }

    @Test
    void aTubeInTheHollowOfAConcaveArcIsRefused() {
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1)
                .add("reflector", new Arc(0, 0, 1, Math.PI, Math.PI, Side.CONCAVE)).tube("tube", 0, -0.5, 0.2).build()))
                .isInstanceOf(GeometryException.class).hasMessageContaining("hollow").hasMessageContaining("'tube'");
    }

    @Test
    void aLidWithItsBackToTheHollowIsRefused() {
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1)
                .add("trough", new Arc(0, 0, 1, Math.PI, Math.PI, Side.CONCAVE)).segment("lid", -1, 0, 1, 0).build()))
                .isInstanceOf(GeometryException.class).hasMessageContaining("back to the hollow");
    }

    @Test
    void aSecondShellAndASurfaceOutsideTheShellAreRefused() {
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1).add("s1", new Circle(0, 0, 2, Side.CONCAVE))
                .add("s2", new Circle(0, 0, 3, Side.CONCAVE)).build())).isInstanceOf(GeometryException.class)
                .hasMessageContaining("shell");
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1).add("shell", new Circle(0, 0, 1, Side.CONCAVE))
                .tube("out", 3, 0, 0.5).build())).isInstanceOf(GeometryException.class).hasMessageContaining("'out'");
    }

    @Test
    void theSameCurveTwiceAndBadValuesAreRefused() {
        assertThatThrownBy(() -> SectionViewFactors.compute(Section.builder(1).tube("a", 0, 0, 1).tube("b", 0, 0, 1).build()))
                .isInstanceOf(GeometryException.class).hasMessageContaining("same curve");
        assertThatThrownBy(() -> new Arc(0, 0, 1, 0, 7, Side.CONVEX)).isInstanceOf(GeometryException.class);
        assertThatThrownBy(() -> Section.builder(0).tube("a", 0, 0, 1).build()).isInstanceOf(GeometryException.class);
        assertThatThrownBy(() -> Section.builder(1).tube("a", 0, 0, 1).tube("a", 3, 0, 1).build())
                .isInstanceOf(GeometryException.class).hasMessageContaining("twice");
    }
}
