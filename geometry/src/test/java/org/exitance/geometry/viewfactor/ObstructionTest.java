package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/** Two parallel unit plates 1 m apart with a 0.5 m plate (two-sided) half-way between them. */
class ObstructionTest {

    static Scene plates(int div) {
        return Scene.builder()
                .add("bottom", Shapes.parallelogram(Vec3.ZERO, Vec3.X, Vec3.Y, div, div))
                .add("top", Shapes.parallelogram(new Vec3(0, 0, 1), Vec3.Y, Vec3.X, div, div))
                .addTwoSided("shield", Shapes.parallelogram(new Vec3(0.25, 0.25, 0.5), new Vec3(0.5, 0, 0),
                        new Vec3(0, 0.5, 0), 2, 2))
                .build();
    }

    /**
     * Differential area to a parallel rectangle X·c × Y·c whose corner lies on the area's normal at
     * distance c: (1/2π)[X/√(1+X²) atan(Y/√(1+X²)) + Y/√(1+Y²) atan(X/√(1+Y²))] (Howell's catalog,
     * differential planar element to parallel rectangle, case B-3; Siegel &amp; Howell 4th ed.
     * Appendix C; from memory), extended to signed corners.
     */
    static double corner(double u, double v, double c) {
        double x = Math.abs(u) / c, y = Math.abs(v) / c;
        double f = (x / Math.sqrt(1 + x * x) * Math.atan(y / Math.sqrt(1 + x * x))
                + y / Math.sqrt(1 + y * y) * Math.atan(x / Math.sqrt(1 + y * y))) / (2 * Math.PI);
        return Math.signum(u) * Math.signum(v) * f;
    }

    /** Point (px, py) to the rectangle [x0, x1] × [y0, y1] at height c. */
    static double pointToRect(double px, double py, double x0, double x1, double y0, double y1, double c) {
        return corner(x1 - px, y1 - py, c) - corner(x0 - px, y1 - py, c) - corner(x1 - px, y0 - py, c)
                + corner(x0 - px, y0 - py, c);
    }

    /**
     * Independent reference written here: for each point of the bottom plate the visible part of
     * the top is the top minus the shield's shadow (the shield square scaled by 2 about the point,
     * clipped to the top), integrated exactly with the corner formula; the outer integral over the
     * bottom by the midpoint rule with m × m cells.
     */
    static double reference(int m) {
        double h = 1.0 / m, sum = 0;
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < m; b++) {
                double x = (a + 0.5) * h, y = (b + 0.5) * h;
                double sx0 = Math.max(0, 0.5 - x), sx1 = Math.min(1, 1.5 - x);
                double sy0 = Math.max(0, 0.5 - y), sy1 = Math.min(1, 1.5 - y);
                sum += pointToRect(x, y, 0, 1, 0, 1, 1) - pointToRect(x, y, sx0, sx1, sy0, sy1, 1);
            }
        }
        return sum * h * h;
    }

    @Test
    void shieldedPlatesAgreeWithBruteForceAndUnshieldedClosedForm() {
        double reference = reference(200);
        // the reference's own check: without a shield it reproduces catalog case C-11
        double unshielded = 0;
        for (int a = 0; a < 100; a++) {
            for (int b = 0; b < 100; b++) {
                unshielded += pointToRect((a + 0.5) / 100, (b + 0.5) / 100, 0, 1, 0, 1, 1) / 1e4;
            }
        }
        assertThat(unshielded).isCloseTo(ClosedForms.parallelRectangles(1, 1, 1), within(1e-4));
        // without the shield: Howell catalog C-11, 0.1998 (from memory); the shield must remove a share
        assertThat(reference).isLessThan(ClosedForms.parallelRectangles(1, 1, 1) - 0.05);
        ViewFactorResult r = ViewFactorCalculator.compute(plates(8),
                ViewFactorOptions.defaults().withVisibilityOrder(4), ProgressListener.NONE);
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(reference, within(5e-4));
        assertThat(r.methodCounts().hidden()).isPositive();
        assertThat(r.methodCounts().partlyHidden()).isPositive();
        int back = plates(1).indexOf("shield.back");
        // the shield's down-facing side (".back": normals −z) sees the bottom; its front (+z) does not
        assertThat(r.surfaceFactor(0, plates(1).indexOf("shield.front"))).isZero();
        // bottom ↔ shield underside, unobstructed: each order against its own independent integral
        Facet bottom = Facet.of(Vec3.ZERO, Vec3.X, new Vec3(1, 1, 0), Vec3.Y);
        Facet under = Facet.of(new Vec3(0.25, 0.25, 0.5), new Vec3(0.75, 0.25, 0.5), new Vec3(0.75, 0.75, 0.5),
                new Vec3(0.25, 0.75, 0.5));
        double toShield = IndependentFactor.factor(bottom, under, 24);
        double fromShield = IndependentFactor.factor(under, bottom, 24);
        assertThat(r.surfaceFactor(0, back)).isCloseTo(toShield, within(1e-6));
        assertThat(r.surfaceFactor(back, 0)).isCloseTo(fromShield, within(1e-6));
    }

    @Test
    void obstructionNoneIgnoresTheShield() {
        ViewFactorResult r = ViewFactorCalculator.compute(plates(2),
                ViewFactorOptions.defaults().withObstruction(Obstruction.NONE), ProgressListener.NONE);
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(ClosedForms.parallelRectangles(1, 1, 1), within(1e-9));
    }

    @Test
    void listsOfSurfacesKeepSceneOrder() {
        assertThat(plates(1).surfaces()).extracting(s -> s.name())
                .isEqualTo(List.of("bottom", "top", "shield.front", "shield.back"));
    }
}
