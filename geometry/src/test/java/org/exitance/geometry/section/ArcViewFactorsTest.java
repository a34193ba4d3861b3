package org.exitance.geometry.section;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.exitance.geometry.section.SectionElement.Arc;
import org.exitance.geometry.section.SectionElement.Side;
import org.junit.jupiter.api.Test;

/** Circular arcs radiating on their convex or concave side. */
class ArcViewFactorsTest {

    private static final Arc TROUGH = new Arc(0, 0, 1, Math.PI, Math.PI, Side.CONCAVE);

    @Test
    void aSemicircularTroughSeesItselfByClosure() {
        // Closure of the hollow with its opening (Siegel & Howell, Thermal Radiation Heat Transfer,
        // 4th ed., §4.4, enclosure algebra; common practice): F_arc,arc = 1 − L_chord/L_arc = 1 − 2/π.
        SectionResult r = SectionViewFactors.compute(Section.builder(1).add("trough", TROUGH).build());
        assertThat(r.viewFactor(0, 0)).isCloseTo(1 - 2 / Math.PI, within(1e-15));
        assertThat(r.environmentFactor(0)).isCloseTo(2 / Math.PI, within(1e-15));
    }

    @Test
    void aTroughClosedByALidSendsTheRestToTheLid() {
        // The lid across the opening sees only the trough: F_lid,trough = 1, and by reciprocity
        // F_trough,lid = L_lid / L_arc = 2/π (common practice).
        SectionResult r = SectionViewFactors.compute(Section.builder(1).add("trough", TROUGH)
                .segment("lid", 1, 0, -1, 0).build());
        int t = r.indexOf("trough"), l = r.indexOf("lid");
        assertThat(r.viewFactor(l, t)).isCloseTo(1, within(1e-14));
        assertThat(r.viewFactor(t, l)).isCloseTo(2 / Math.PI, within(1e-14));
        assertThat(r.diagnostics().maxRowSumError()).isLessThan(1e-14);
    }

    @Test
    void aTroughFacingAStripMatchesTheAngularIntegration() {
        // The trough's hollow seen through its chord, against rays cast from the curved surface
        // itself (reference in this package; the trough may block its own rays).
        SectionResult r = SectionViewFactors.compute(Section.builder(1).add("trough", TROUGH)
                .segment("strip", 1.5, 0.7, -0.5, 1.2).build());
        double reference = AngularReference.viewFactor(AngularReference.arcEmitter(0, 0, 1, Math.PI, Math.PI, false), 0,
                List.of(AngularReference.segment(1.5, 0.7, -0.5, 1.2), AngularReference.arc(0, 0, 1, Math.PI, Math.PI, false)));
        assertThat(r.viewFactor(r.indexOf("trough"), r.indexOf("strip"))).isCloseTo(reference, within(1e-8));
    }

    @Test
    void aHalfTubeAboveAStripMatchesTheAngularIntegration() {
        // Convex arc: strings wrapped on the arc itself; reference in this package.
        SectionResult r = SectionViewFactors.compute(Section.builder(1).segment("strip", -2, 0, 2, 0)
                .add("cap", new Arc(0.3, 1, 0.5, -0.4, Math.PI, Side.CONVEX)).build());
        double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(-2, 0, 2, 0), 0,
                List.of(AngularReference.arc(0.3, 1, 0.5, -0.4, Math.PI, true)));
        assertThat(r.viewFactor(0, 1)).isCloseTo(reference, within(1e-8));
    }

    @Test
    void aSlottedTubeLongerThanHalfATurnMatchesTheAngularIntegration() {
        // A convex arc of 1.6π (split internally in two): the slot lets the strip look at the
        // arc's back, which does not count; reference in this package.
        Arc slotted = new Arc(0, 1, 0.5, Math.PI / 2 + 0.2 * Math.PI, 1.6 * Math.PI, Side.CONVEX);
        SectionResult r = SectionViewFactors.compute(Section.builder(1).segment("strip", -2, 0, 2, 0)
                .add("slotted", slotted).build());
        double reference = AngularReference.viewFactor(AngularReference.segmentEmitter(-2, 0, 2, 0), 0,
                List.of(AngularReference.arc(0, 1, 0.5, Math.PI / 2 + 0.2 * Math.PI, 1.6 * Math.PI, true)));
        assertThat(r.viewFactor(0, 1)).isCloseTo(reference, within(1e-8));
        assertThat(r.viewFactor(1, 1)).isZero();
    }

    @Test
    void aFullTurnOfArcBehavesAsATube() {
        // Strip to tube closed form (Incropera et al., 6th ed., Table 13.1, from memory) for a
        // convex arc of almost a full turn whose gap faces away from the strip.
        Arc nearlyFull = new Arc(0, 1, 0.3, Math.PI / 2 - 1e-9, 2 * Math.PI - 2e-9, Side.CONVEX);
        SectionResult r = SectionViewFactors.compute(Section.builder(1).segment("strip", -0.5, 0, 2, 0)
                .add("arc", nearlyFull).build());
        assertThat(r.viewFactor(0, 1)).isCloseTo(0.3 / 2.5 * (Math.atan(2) - Math.atan(-0.5)), within(1e-12));
    }
}
