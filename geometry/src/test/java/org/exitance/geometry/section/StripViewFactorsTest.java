package org.exitance.geometry.section;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Two strips (infinitely long plates) in several relative positions. */
class StripViewFactorsTest {

    private static SectionResult pair(double[] a, double[] b) {
        return SectionViewFactors.compute(Section.builder(1).segment("a", a[0], a[1], a[2], a[3])
                .segment("b", b[0], b[1], b[2], b[3]).build());
    }

    private static double reference(double[] a, double[] b) {
        return AngularReference.viewFactor(AngularReference.segmentEmitter(a[0], a[1], a[2], a[3]), 0,
                List.of(AngularReference.segment(b[0], b[1], b[2], b[3])));
    }

    @Test
    void parallelStripsOnACommonMidlineMatchTheClosedForm() {
        // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.1, parallel
        // plates with midlines connected by a perpendicular: F_ij = [√((Wi+Wj)²+4) − √((Wj−Wi)²+4)]/(2Wi),
        // W = w/L. Widths 1 and 2 m, spacing 0.5 m.
        double wi = 1 / 0.5, wj = 2 / 0.5;
        double expected = (Math.sqrt((wi + wj) * (wi + wj) + 4) - Math.sqrt((wj - wi) * (wj - wi) + 4)) / (2 * wi);
        double[] a = {-0.5, 0, 0.5, 0}, b = {1, 0.5, -1, 0.5};
        SectionResult r = pair(a, b);
        assertThat(r.viewFactor(0, 1)).isCloseTo(expected, within(1e-13));
        assertThat(r.viewFactor(1, 0)).isCloseTo(expected * 1 / 2, within(1e-13));
        assertThat(reference(a, b)).isCloseTo(expected, within(1e-8));
        assertThat(r.environmentFactor(0)).isCloseTo(1 - expected, within(1e-13));
    }

    @Test
    void perpendicularStripsWithACommonEdgeMatchTheClosedForm() {
        // Incropera et al., 6th ed., Table 13.1, perpendicular plates with a common edge:
        // F_ij = [1 + wj/wi − √(1 + (wj/wi)²)] / 2. wi = 1 m (floor), wj = 3 m (wall).
        double ratio = 3;
        double expected = (1 + ratio - Math.sqrt(1 + ratio * ratio)) / 2;
        double[] a = {0, 0, 1, 0}, b = {0, 3, 0, 0};
        assertThat(pair(a, b).viewFactor(0, 1)).isCloseTo(expected, within(1e-13));
        assertThat(reference(a, b)).isCloseTo(expected, within(1e-8));
    }

    @Test
    void inclinedStripsOfEqualWidthWithACommonEdgeMatchTheClosedForm() {
        // Incropera et al., 6th ed., Table 13.1, inclined parallel plates of equal width and a
        // common edge: F_ij = 1 − sin(α/2). α = 40°, width 2 m.
        double alpha = Math.toRadians(40), w = 2;
        double expected = 1 - Math.sin(alpha / 2);
        double[] a = {0, 0, w, 0}, b = {w * Math.cos(alpha), w * Math.sin(alpha), 0, 0};
        assertThat(pair(a, b).viewFactor(0, 1)).isCloseTo(expected, within(1e-13));
        assertThat(reference(a, b)).isCloseTo(expected, within(1e-8));
    }

    @Test
    void offsetParallelStripsMatchTheStringFormulaAndTheAngularIntegration() {
        // Howell, A Catalog of Radiation Heat Transfer Configuration Factors, strip to parallel
        // offset strip (from memory), written out: F = [d(a1,b2) + d(b1,a2) − d(a1,a2) − d(b1,b2)]/(2 L1)
        // for a1 = (0,0), b1 = (1,0) and the receiver from a2 = (1.5, 0.8) to b2 = (3, 0.8).
        double[] a = {0, 0, 1, 0}, b = {3, 0.8, 1.5, 0.8};
        double expected = (Math.hypot(3, 0.8) + Math.hypot(0.5, 0.8) - Math.hypot(1.5, 0.8) - Math.hypot(2, 0.8)) / 2;
        assertThat(pair(a, b).viewFactor(0, 1)).isCloseTo(expected, within(1e-13));
        assertThat(reference(a, b)).isCloseTo(expected, within(1e-8));
    }

    @Test
    void aStripPartlyBehindTheOtherMatchesTheAngularIntegration() {
        // The receiver crosses the emitter's plane: only what lies in front counts. Reference:
        // the angular integration in this package.
        double[] a = {0, 0, 1, 0}, b = {2, -0.7, 1.2, 1.5};
        double expected = reference(a, b);
        assertThat(expected).isGreaterThan(0.05);
        assertThat(pair(a, b).viewFactor(0, 1)).isCloseTo(expected, within(1e-8));
        // By hand (strings from the emitter's points to the receiver's top end and the emitter's
        // own horizon): F = ½[1 − (√(1.2² + 1.5²) − √(0.2² + 1.5²))].
        assertThat(expected).isCloseTo(0.5 * (1 - Math.sqrt(3.69) + Math.sqrt(2.29)), within(1e-10));
        // In the other direction the reference misses the points of b that see a within less
        // than its ray spacing (π/720) near the crossing, an error of order 1e-6.
        double lb = Math.hypot(0.8, 2.2);
        assertThat(reference(b, a) * lb).isCloseTo(expected, within(5e-6));
    }

    @Test
    void stripsFacingAwayExchangeNothing() {
        // Common practice: a strip behind another's plane, or facing away, receives nothing.
        assertThat(pair(new double[] {0, 0, 1, 0}, new double[] {0, 1, 1, 1}).viewFactor(0, 1)).isZero();
        assertThat(pair(new double[] {0, 0, 1, 0}, new double[] {1, -1, 0, -1}).viewFactor(0, 1)).isZero();
    }
}
