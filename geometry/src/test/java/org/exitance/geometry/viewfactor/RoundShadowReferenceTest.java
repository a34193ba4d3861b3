package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** {@link RoundShadowReference} against closed forms; each check names its source. */
class RoundShadowReferenceTest {

    private static final double[] UP = {0, 0, 1};
    /** Square [−1, 1]² at height 1 above the origin. */
    private static final double[] SQUARE = {-1, -1, 1, 1, -1, 1, 1, 1, 1, -1, 1, 1};

    /**
     * Element to a parallel rectangle with one corner above it, sides u and v, height c: Howell,
     * A Catalog of Radiation Heat Transfer Configuration Factors, case B-3 (from memory),
     * F = (1/2π)[X/√(1+X²) atan(Y/√(1+X²)) + Y/√(1+Y²) atan(X/√(1+Y²))], X = u/c, Y = v/c; odd in u
     * and in v, so signed sides give superposition of corners.
     */
    static double corner(double u, double v, double c) {
        double x = u / c, y = v / c;
        double sx = Math.sqrt(1 + x * x), sy = Math.sqrt(1 + y * y);
        return (x / sx * Math.atan(y / sx) + y / sy * Math.atan(x / sy)) / (2 * Math.PI);
    }

    /** Element at (px, py, 0) facing up to [x0, x1] × [y0, y1] at height c, by superposition of B-3. */
    static double rectangle(double px, double py, double x0, double x1, double y0, double y1, double c) {
        return corner(x1 - px, y1 - py, c) - corner(x0 - px, y1 - py, c) - corner(x1 - px, y0 - py, c)
                + corner(x0 - px, y0 - py, c);
    }

    /**
     * Element to a coaxial parallel disc of radius r at distance h: F = r²/(h² + r²) (Howell's
     * catalog, plane element to a parallel coaxial disc, case B-13, from memory; also Siegel &amp;
     * Howell, Thermal Radiation Heat Transfer, 4th ed., Appendix C).
     */
    static double coaxialDisc(double r, double h) {
        return r * r / (h * h + r * r);
    }

    @Test
    void bodiesOutsideThePyramidLeaveTheRectangleOfTheCatalogue() {
        double[] x = {0.3, 0.2, 0};
        double[] q = {0, 0, 1, 1, 0, 1, 1, 1.5, 1, 0, 1.5, 1};
        double expected = rectangle(0.3, 0.2, 0, 1, 0, 1.5, 1);
        assertThat(RoundShadowReference.visiblePastCylinder(x, UP, q, new double[] {2, 0.5, 0.5},
                new double[] {1, 0, 0}, 0.1, 0.6)).isCloseTo(expected, within(1e-14));
        assertThat(RoundShadowReference.visiblePastSphere(x, UP, q, new double[] {-1, 0.5, 0.5}, 0.1))
                .isCloseTo(expected, within(1e-14));
    }

    /**
     * Element on the axis below a cylinder (base 0.3, length 0.4, radius 0.1) under the square at
     * height 1: every ray into the solid enters through the near cap, so the shadow is the disc of
     * radius R = r·H/h0 = 1/3 (similar triangles); hidden part by the coaxial disc (B-13), square
     * by B-3. The element is off the square's centre, so the four corners differ.
     */
    @Test
    void cylinderOnTheAxisHidesTheDiscOfItsNearRim() {
        double px = 0.2, py = -0.1;
        double[] x = {px, py, 0};
        double got = RoundShadowReference.visiblePastCylinder(x, UP, SQUARE, new double[] {px, py, 0.3}, UP,
                0.1, 0.4);
        double expected = rectangle(px, py, -1, 1, -1, 1, 1) - coaxialDisc(0.1 / 0.3, 1);
        assertThat(got).isCloseTo(expected, within(1e-11));
        // the far rim's disc (radius 0.1/0.7) would leave a clearly different value: the check can fail
        double farRim = rectangle(px, py, -1, 1, -1, 1, 1) - coaxialDisc(0.1 / 0.7, 1);
        assertThat(Math.abs(got - farRim)).isGreaterThan(0.05);
    }

    /**
     * Sphere (radius r, centre at distance d on the element's normal): the tangent cone from the
     * element cuts the plane at height H in a disc of radius R = r·H/√(d² − r²) (elementary
     * geometry), so by the coaxial disc (B-13) the hidden factor is R²/(H² + R²) = (r/d)², the
     * catalog's element-to-sphere factor (Howell's catalog, sphere on the element's normal, from
     * memory): both closed forms agree, independent of H.
     */
    @Test
    void sphereOnTheAxisHidesTheSquareOfItsAngularRadius() {
        double r = 0.1, d = 0.5;
        double got = RoundShadowReference.visiblePastSphere(new double[] {0, 0, 0}, UP, SQUARE,
                new double[] {0, 0, d}, r);
        double discRadius = r / Math.sqrt(d * d - r * r);
        assertThat(coaxialDisc(discRadius, 1)).isCloseTo(r * r / (d * d), within(1e-15));
        assertThat(got).isCloseTo(rectangle(0, 0, -1, 1, -1, 1, 1) - r * r / (d * d), within(1e-11));
    }

    /**
     * A bar parallel to the square, long enough that both ends project outside it: the shadow
     * within the square is the band between the two tangent lines from the element to the bar's
     * cross-section circle (centre (yc, h0), radius r; tangents at angles θc ± asin(r/D) from the
     * y-axis, elementary geometry), met by the plane at y = H·cot(θ); the band by B-3 superposition.
     */
    @Test
    void longBarAcrossTheSquareHidesTheBandBetweenItsTangentLines() {
        double yc = 0.15, h0 = 0.4, r = 0.1;
        double got = RoundShadowReference.visiblePastCylinder(new double[] {0, 0, 0}, UP, SQUARE,
                new double[] {-5, yc, h0}, new double[] {1, 0, 0}, r, 10);
        double thetaC = Math.atan2(h0, yc), beta = Math.asin(r / Math.hypot(yc, h0));
        double yLow = 1 / Math.tan(thetaC + beta), yHigh = 1 / Math.tan(thetaC - beta);
        double expected = rectangle(0, 0, -1, 1, -1, 1, 1) - rectangle(0, 0, -1, 1, yLow, yHigh, 1);
        assertThat(got).isCloseTo(expected, within(1e-12));
    }

    /**
     * The inscribed hull's error falls like 1/N² (chords of a smooth curve, common practice), so
     * the successive differences of N, 2N, 4N have ratio 4 and the extrapolated value's error is
     * below |R(2N, 4N) − R(N, 2N)|; both are checked against the on-axis closed form above and on
     * an off-axis bar whose end cap is in view.
     */
    @Test
    void levelsConvergeAsTheSquareOfThePointCountAndTheEstimateBoundsTheError() {
        double[] x = {0, 0, 0};
        RoundShadowReference.Estimate e = RoundShadowReference.cylinderEstimate(x, UP, SQUARE,
                new double[] {0, 0, 0.3}, UP, 0.1, 0.4, RoundShadowReference.BASE_POINTS);
        double exact = rectangle(0, 0, -1, 1, -1, 1, 1) - coaxialDisc(0.1 / 0.3, 1);
        assertThat((e.coarse() - e.middle()) / (e.middle() - e.fine())).isCloseTo(4, within(0.01));
        assertThat(Math.abs(e.fine() - exact)).isGreaterThan(1e-8);
        assertThat(Math.abs(e.value() - exact)).isLessThanOrEqualTo(e.errorEstimate());
        assertThat(e.errorEstimate()).isLessThan(1e-10);

        double[] row = RoundShadowConfigurations.configurations()[4];
        RoundShadowReference.Estimate cap = RoundShadowConfigurations.estimate(row);
        assertThat((cap.coarse() - cap.middle()) / (cap.middle() - cap.fine())).isCloseTo(4, within(0.01));
        assertThat(cap.errorEstimate()).isLessThan(1e-10);
    }

    /**
     * A radius 0.1 % too large (0.1001 instead of 0.1) moves the on-axis value by −1.8·10⁻⁴
     * (measured while writing this test), so the 10⁻¹¹ check above fails with such an input.
     */
    @Test
    void aRadiusOffByATenthOfAPercentIsSeen() {
        double wrong = RoundShadowReference.visiblePastCylinder(new double[] {0, 0, 0}, UP, SQUARE,
                new double[] {0, 0, 0.3}, UP, 0.1001, 0.4);
        double exact = rectangle(0, 0, -1, 1, -1, 1, 1) - coaxialDisc(0.1 / 0.3, 1);
        assertThat(Math.abs(wrong - exact)).isGreaterThan(1e-4);
    }

    /** Reversing the axis or the polygon's vertex order changes nothing; the arrays stay as given. */
    @Test
    void axisDirectionAndVertexOrderDoNotMatterAndArraysAreNotModified() {
        double[][] rows = RoundShadowConfigurations.configurations();
        double[] row = rows[2];
        double[] x = {1.2, 0.85, 0};
        double[] q = {0, 0, 1.2, 0, 2, 1.2, 2, 2, 1.2, 2, 0, 1.2};
        double[] reversed = {2, 0, 1.2, 2, 2, 1.2, 0, 2, 1.2, 0, 0, 1.2};
        double[] b = {0.7, 1.0, 0.25};
        double[] a = {1, 0, 0};
        double forward = RoundShadowReference.visiblePastCylinder(x, UP, q, b, a, 0.08, 0.6);
        double backward = RoundShadowReference.visiblePastCylinder(x, UP, reversed, new double[] {1.3, 1.0, 0.25},
                new double[] {-1, 0, 0}, 0.08, 0.6);
        assertThat(backward).isCloseTo(forward, within(1e-11));
        assertThat(forward).isCloseTo(RoundShadowConfigurations.reference(row), within(1e-15));
        assertThat(x).containsExactly(1.2, 0.85, 0);
        assertThat(q).containsExactly(0, 0, 1.2, 0, 2, 1.2, 2, 2, 1.2, 2, 0, 1.2);
        assertThat(b).containsExactly(0.7, 1.0, 0.25);
        assertThat(a).containsExactly(1, 0, 0);
        assertThat(row).containsExactly(RoundShadowConfigurations.configurations()[2]);
    }

    @Test
    void geometryOutsideTheScopeIsRefused() {
        double[] x = {0, 0, 0};
        // body reaching beyond the polygon's plane
        assertThatThrownBy(() -> RoundShadowReference.visiblePastCylinder(x, UP, SQUARE, new double[] {0, 0, 0.8},
                UP, 0.1, 0.4)).isInstanceOf(IllegalArgumentException.class);
        // element inside the body
        assertThatThrownBy(() -> RoundShadowReference.visiblePastSphere(x, UP, SQUARE, new double[] {0, 0, 0.05},
                0.1)).isInstanceOf(IllegalArgumentException.class);
        // body crossing the plane through the element parallel to the polygon (its shadow unbounded)
        assertThatThrownBy(() -> RoundShadowReference.visiblePastCylinder(x, UP, SQUARE, new double[] {0.5, 0, 0.05},
                new double[] {1, 0, 0}, 0.1, 0.4)).isInstanceOf(IllegalArgumentException.class);
        // polygon behind the element
        assertThatThrownBy(() -> RoundShadowReference.visiblePastSphere(x, new double[] {0, 0, -1}, SQUARE,
                new double[] {0, 0, 0.5}, 0.1)).isInstanceOf(IllegalArgumentException.class);
        // a normal that is not a unit vector
        assertThatThrownBy(() -> RoundShadowReference.visiblePastSphere(x, new double[] {0, 0, 2}, SQUARE,
                new double[] {0, 0, 0.5}, 0.1)).isInstanceOf(IllegalArgumentException.class);
    }
}
