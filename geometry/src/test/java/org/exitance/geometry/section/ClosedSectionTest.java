package org.exitance.geometry.section;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;

import org.exitance.geometry.section.SectionElement.Arc;
import org.exitance.geometry.section.SectionElement.Side;
import org.junit.jupiter.api.Test;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

/** Closed sections (polygons), laws over all rows, and independence of the surface order. */
class ClosedSectionTest {

    private static Section polygon(double... xy) {
        Section.Builder b = Section.builder(1);
        int n = xy.length / 2;
        for (int k = 0; k < n; k++) {
            int m = (k + 1) % n;
            b.segment("side" + k, xy[2 * k], xy[2 * k + 1], xy[2 * m], xy[2 * m + 1]);
        }
        return b.build();
    }

    @Test
    void aTriangleFollowsTheThreeSideFormula() {
        // Three-surface enclosure of flat sides (Siegel & Howell, Thermal Radiation Heat Transfer,
        // 4th ed., §4.4; common practice): F_12 = (L1 + L2 − L3) / (2 L1).
        SectionResult r = SectionViewFactors.compute(polygon(0, 0, 3, 0, 1, 2));
        double l1 = 3, l2 = Math.hypot(2, 2), l3 = Math.hypot(1, 2);
        assertThat(r.viewFactor(0, 1)).isCloseTo((l1 + l2 - l3) / (2 * l1), within(1e-14));
        assertThat(r.viewFactor(0, 2)).isCloseTo((l1 + l3 - l2) / (2 * l1), within(1e-14));
        assertThat(r.viewFactor(1, 2)).isCloseTo((l2 + l3 - l1) / (2 * l2), within(1e-14));
    }

    @Test
    void aConvexPolygonClosesWithFlatSidesSeeingNothingOfThemselves() {
        // Summation rule and F_ii = 0 for flat surfaces (Siegel & Howell 4th ed. §4.3; common practice).
        SectionResult r = SectionViewFactors.compute(polygon(0, 0, 2, -0.3, 3.1, 1, 2.2, 2.4, 0.3, 1.9));
        for (int i = 0; i < r.size(); i++) {
            assertThat(r.viewFactor(i, i)).isZero();
            assertThat(r.environmentFactor(i)).isCloseTo(0, within(1e-14));
        }
        assertThat(r.diagnostics().maxRowSumError()).isLessThan(1e-14);
        assertThat(r.diagnostics().maxReciprocityError()).isLessThan(1e-14);
    }

    @Test
    void anLShapedRoomClosesAndItsCornerHidesPartOfTheFarWall() {
        // Summation rule in a non-convex enclosure, where the re-entrant corner blocks; the hidden
        // pair against the angular integration in this package.
        double[] xy = {0, 0, 2, 0, 2, 1, 1, 1, 1, 2, 0, 2};
        SectionResult r = SectionViewFactors.compute(polygon(xy));
        for (int i = 0; i < r.size(); i++) {
            assertThat(r.environmentFactor(i)).as("row %d", i).isCloseTo(0, within(1e-12));
        }
        List<AngularReference.Shape> others = new ArrayList<>();
        for (int k = 1; k < 6; k++) {
            int m = (k + 1) % 6;
            others.add(AngularReference.segment(xy[2 * k], xy[2 * k + 1], xy[2 * m], xy[2 * m + 1]));
        }
        // side0 = floor (0,0)-(2,0); side4 = top wall (1,2)-(0,2), index 3 among the others
        double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(0, 0, 2, 0), 3, others);
        assertThat(r.viewFactor(0, 4)).isCloseTo(reference, within(1e-8));
        // without the corner, plain strings: [√5 + √8 − 2 − √5] / (2·2); the corner hides part of it
        assertThat(r.viewFactor(0, 4)).isLessThan((Math.sqrt(8) - 2) / 4 - 0.02);
    }

    @Test
    void aClosedKilnSectionWithRollersAndRadiantTubesClosesRowByRow() {
        // Summation rule (Siegel & Howell 4th ed. §4.3) in a closed box holding 10 rollers and
        // 5 radiant tubes (invented geometry): every tube is seen partly past the others, so
        // each row tests the wrapped strings and the shadows.
        Section.Builder b = Section.builder(2).segment("floor", 0, 0, 10, 0).segment("roof", 10, 3, 0, 3)
                .segment("left", 0, 3, 0, 0).segment("right", 10, 0, 10, 3);
        for (int k = 0; k < 10; k++) {
            b.tube("roller" + k, k + 0.5, 0.8, 0.2);
        }
        for (int k = 0; k < 5; k++) {
            b.tube("radiant" + k, 2 * k + 1, 2.4, 0.15);
        }
        SectionResult r = SectionViewFactors.compute(b.build());
        assertThat(r.diagnostics().maxRowSumError()).isLessThan(1e-12);
        assertThat(r.diagnostics().maxReciprocityError()).isLessThan(1e-13);
    }

    private static final List<Section.NamedElement> MIXED = List.of(
            new Section.NamedElement("floor", new SectionElement.Segment(-2, 0, 2, 0)),
            new Section.NamedElement("roof", new SectionElement.Segment(2, 2.5, -2, 2.5)),
            new Section.NamedElement("left", new SectionElement.Segment(-2, 2.5, -2, 0)),
            new Section.NamedElement("tube1", new SectionElement.Circle(-0.8, 1.2, 0.3, Side.CONVEX)),
            new Section.NamedElement("tube2", new SectionElement.Circle(0.4, 1.0, 0.25, Side.CONVEX)),
            new Section.NamedElement("reflector", new Arc(-0.2, 2.0, 0.35, Math.PI + 0.3, 2.4, Side.CONCAVE)),
            new Section.NamedElement("rod", new Arc(1.4, 0.5, 0.2, -1, 4.5, Side.CONVEX)));

    @Property(tries = 8)
    void resultsDoNotDependOnTheSurfaceOrder(@ForAll long seed) {
        // A law (common practice): reordering the surfaces permutes the matrix, bit for bit.
        SectionResult base = SectionViewFactors.compute(new Section(MIXED, 1));
        List<Section.NamedElement> shuffled = new ArrayList<>(MIXED);
        Collections.shuffle(shuffled, new Random(seed));
        SectionResult r = SectionViewFactors.compute(new Section(shuffled, 1));
        for (int i = 0; i < MIXED.size(); i++) {
            for (int j = 0; j < MIXED.size(); j++) {
                int a = r.indexOf(MIXED.get(i).name()), b = r.indexOf(MIXED.get(j).name());
                assertThat(r.viewFactor(a, b)).isEqualTo(base.viewFactor(i, j));
            }
        }
    }

    @Test
    void aMixedOpenSectionKeepsReciprocityAndNoRowExceedsOne() {
        // Reciprocity L_i F_ij = L_j F_ji and Σ_j F_ij ≤ 1 (Siegel & Howell 4th ed. §4.3).
        SectionResult r = SectionViewFactors.compute(new Section(MIXED, 3));
        assertThat(r.diagnostics().maxReciprocityError()).isLessThan(1e-14);
        assertThat(r.diagnostics().maxNegativeRemainder()).isLessThan(1e-12);
        for (int i = 0; i < r.size(); i++) {
            for (int j = 0; j < r.size(); j++) {
                assertThat(r.viewFactor(i, j)).isGreaterThanOrEqualTo(-1e-15);
            }
        }
        // the right side is open: the floor loses some radiation to the environment
        assertThat(r.environmentFactor(r.indexOf("floor"))).isGreaterThan(0.01);
    }
}
