package org.exitance.geometry.section;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.exitance.geometry.section.SectionElement.Circle;
import org.exitance.geometry.section.SectionElement.Side;
import org.junit.jupiter.api.Test;

/** Tubes and rods: seen from strips, from each other, inside a shell, and as obstacles. */
class TubeViewFactorsTest {

    @Test
    void stripToAParallelTubeMatchesTheClosedForm() {
        // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.1, cylinder
        // and parallel rectangle (from memory): F = r/(s1 − s2) [atan(s1/L) − atan(s2/L)], the
        // strip from s2 to s1 across, at distance L from the tube's axis. r = 0.3, L = 1, s2 = −0.5, s1 = 2.
        double expected = 0.3 / 2.5 * (Math.atan(2) - Math.atan(-0.5));
        SectionResult r = SectionViewFactors.compute(Section.builder(1).segment("strip", -0.5, 0, 2, 0)
                .tube("tube", 0, 1, 0.3).build());
        assertThat(r.viewFactor(0, 1)).isCloseTo(expected, within(1e-13));
        double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(-0.5, 0, 2, 0), 0,
                List.of(AngularReference.arc(0, 1, 0.3, 0, 2 * Math.PI, true)));
        assertThat(reference).isCloseTo(expected, within(1e-8));
        assertThat(r.viewFactor(1, 1)).isZero(); // a convex tube does not see itself (common practice)
    }

    @Test
    void twoEqualParallelTubesMatchTheClosedForm() {
        // Incropera et al., 6th ed., Table 13.1, parallel cylinders of equal diameter (from memory):
        // F = (1/π)[√(X² − 1) + asin(1/X) − X], X = 1 + s/D, s the gap. D = 1, s = 0.8.
        double x = 1.8;
        double expected = (Math.sqrt(x * x - 1) + Math.asin(1 / x) - x) / Math.PI;
        SectionResult r = SectionViewFactors.compute(Section.builder(1).tube("a", 0, 0, 0.5).tube("b", 1.8, 0, 0.5)
                .build());
        assertThat(r.viewFactor(0, 1)).isCloseTo(expected, within(1e-13));
        assertThat(r.viewFactor(1, 0)).isCloseTo(expected, within(1e-13));
        double reference = AngularReference.viewFactor(AngularReference.arcEmitter(0, 0, 0.5, 0, 2 * Math.PI, true),
                0, List.of(AngularReference.arc(1.8, 0, 0.5, 0, 2 * Math.PI, true)));
        assertThat(reference).isCloseTo(expected, within(1e-8));
    }

    @Test
    void concentricTubesExchangeByTheRadiusRatio() {
        // Incropera et al., 6th ed., Table 13.1, concentric cylinders: F_12 = 1, F_21 = r1/r2,
        // F_22 = 1 − r1/r2. The inner tube is off centre, which changes none of these.
        SectionResult r = SectionViewFactors.compute(Section.builder(2.5).tube("inner", 0.1, -0.05, 0.4)
                .add("outer", new Circle(0, 0, 1, Side.CONCAVE)).build());
        assertThat(r.viewFactor(0, 1)).isCloseTo(1, within(1e-15));
        assertThat(r.viewFactor(0, 0)).isZero();
        assertThat(r.viewFactor(1, 0)).isCloseTo(0.4, within(1e-15));
        assertThat(r.viewFactor(1, 1)).isCloseTo(0.6, within(1e-15));
        assertThat(r.perimeter_m(1)).isCloseTo(2 * Math.PI, within(1e-15));
        assertThat(r.area_m2(0)).isCloseTo(2 * Math.PI * 0.4 * 2.5, within(1e-14));
        assertThat(r.exchangeArea_m2(0, 1)).isCloseTo(r.exchangeArea_m2(1, 0), within(1e-14));
    }

    @Test
    void hottelsTubeRowFormulaMatchesTheAngularIntegrationOfAnInfiniteRow() {
        // Hottel's plane-to-tube-row factor (Hottel & Sarofim, Radiative Transfer, 1967; from memory):
        // F = 1 − √(1 − (D/s)²) + (D/s) atan √((s/D)² − 1). Checked here against the angular
        // integration over one pitch of the plane, rays cast against an unbounded row.
        for (double pitch : new double[] {1.2, 2, 3.5}) {
            double d = 1, c = 1.5;
            double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(0, 0, pitch, 0), 0,
                    List.of(TubeRow.infinite(pitch, c, d / 2)));
            // the reference misses gaps narrower than its ray spacing (π/720) seen at grazing angles
            assertThat(reference).as("pitch %s", pitch).isCloseTo(TubeRow.hottel(d, pitch), within(3e-5));
        }
    }

    @Test
    void planeToATubeRowMatchesHottelsFormula() {
        // Reciprocity over one pitch: s F_plane→row = πD F_tube→plane, with the neighbours of the
        // middle tube in place (tubes further out cannot shade it; two more on each side anyway).
        // The plane is 2W wide: the middle tube's rays that pass under its neighbours and miss
        // it leave within about c/W of grazing from its bottom, a fraction of order (c/W)².
        // (Hottel's form is also (πD/s)(½ − F_tube,tube) with the two-tube closed form above.)
        double w = 1e6;
        for (double pitch : new double[] {1.2, 2, 3.5}) {
            double d = 1, c = 1.5;
            Section.Builder b = Section.builder(1).segment("wall", -w, 0, w, 0);
            for (int k = -2; k <= 2; k++) {
                b.tube("tube" + k, k * pitch, c, d / 2);
            }
            SectionResult r = SectionViewFactors.compute(b.build());
            double toPlane = r.viewFactor(r.indexOf("tube0"), r.indexOf("wall"));
            assertThat(Math.PI * d * toPlane / pitch).as("pitch %s", pitch).isCloseTo(TubeRow.hottel(d, pitch),
                    within(1e-10));
        }
    }

    @Test
    void stripsWithATubeBetweenThemMatchTheIntegrationWithItsShadow() {
        // Wrapped strings around the tube against the angular integration with the tube's shadow
        // (reference in this package). Off-centre tube, so the two gaps differ.
        SectionResult r = SectionViewFactors.compute(Section.builder(1).segment("floor", -1, 0, 1, 0)
                .segment("roof", 1.4, 2, -0.6, 2).tube("tube", 0.2, 1, 0.4).build());
        double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(-1, 0, 1, 0), 0,
                List.of(AngularReference.segment(1.4, 2, -0.6, 2), AngularReference.arc(0.2, 1, 0.4, 0, 2 * Math.PI, true)));
        double unobstructed = SectionViewFactors.compute(Section.builder(1).segment("floor", -1, 0, 1, 0)
                .segment("roof", 1.4, 2, -0.6, 2).build()).viewFactor(0, 1);
        assertThat(reference).isLessThan(unobstructed - 0.1);
        assertThat(r.viewFactor(0, 1)).isCloseTo(reference, within(1e-8));
        // the tube, seen from the floor through the same geometry
        double toTube = AngularReference.viewFactor(AngularReference.segmentEmitter(-1, 0, 1, 0), 1,
                List.of(AngularReference.segment(1.4, 2, -0.6, 2), AngularReference.arc(0.2, 1, 0.4, 0, 2 * Math.PI, true)));
        assertThat(r.viewFactor(0, 2)).isCloseTo(toTube, within(1e-8));
    }

    @Test
    void twoTubesBetweenTwoStripsMatchTheIntegrationWithTheirShadows() {
        // Two obstacles of different size side by side; reference in this package.
        SectionResult r = SectionViewFactors.compute(Section.builder(1).segment("floor", -2, 0, 2, 0)
                .segment("roof", 2, 1.5, -2, 1.5).tube("a", -0.6, 0.7, 0.3).tube("b", 0.5, 0.9, 0.45).build());
        double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(-2, 0, 2, 0), 0,
                List.of(AngularReference.segment(2, 1.5, -2, 1.5), AngularReference.arc(-0.6, 0.7, 0.3, 0, 2 * Math.PI, true),
                        AngularReference.arc(0.5, 0.9, 0.45, 0, 2 * Math.PI, true)));
        assertThat(r.viewFactor(0, 1)).isCloseTo(reference, within(1e-8));
    }
}
