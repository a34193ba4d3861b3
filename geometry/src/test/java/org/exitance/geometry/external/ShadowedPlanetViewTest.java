package org.exitance.geometry.external;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/** Planet view with shadowing by the scene, against closed forms (invented demo geometry, 400 km orbit). */
class ShadowedPlanetViewTest {

    static final double ALT = 400e3, R = PlanetViewFactor.EARTH_RADIUS_M;
    static final Vec3 DOWN = new Vec3(0, 0, -1);

    /**
     * Directly opposed parallel rectangles a × b at distance c: Howell's catalog, case C-11;
     * Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.2.
     */
    static double parallelRectangles(double a, double b, double c) {
        double x = a / c, y = b / c;
        double x2 = 1 + x * x, y2 = 1 + y * y;
        return 2 / (Math.PI * x * y) * (0.5 * Math.log(x2 * y2 / (1 + x * x + y * y))
                + x * Math.sqrt(y2) * Math.atan(x / Math.sqrt(y2)) + y * Math.sqrt(x2) * Math.atan(y / Math.sqrt(x2))
                - x * Math.atan(x) - y * Math.atan(y));
    }

    @Test
    void unobstructedConvexBodyKeepsTheClosedForm() {
        Scene s = Scene.builder().addAll(Enclosures.box("", Vec3.ZERO, new Vec3(1, 2, 0.5), 2, 2, 2, Facing.OUTWARD)).build();
        Vec3 toward = new Vec3(0.2, -0.3, -1);
        IncidenceResult shadowed = new ShadowedPlanetView(s).compute(toward, ALT, R, 2, 6, 0);
        IncidenceResult closed = PlanetViewFactor.compute(s, toward, ALT, R);
        assertThat(shadowed.facetFactors()).containsExactly(closed.facetFactors());
        assertThat(shadowed.raysCast()).isPositive();
    }

    @Test
    void panelBetweenFacetAndPlanetHidesItCompletely() {
        // The planet fills a cone of half-angle asin(R/h) ≈ 70.2° about nadir; a 40 m panel 0.1 m
        // under a 1 m plate covers every direction of that cone from every point of the plate.
        Scene s = Scene.builder()
                .add("plate", Shapes.parallelogram(Vec3.ZERO, Vec3.Y, Vec3.X, 2, 2)) // faces −z
                .addTwoSided("panel", Shapes.parallelogram(new Vec3(-20, -20, -0.1), new Vec3(40, 0, 0),
                        new Vec3(0, 40, 0), 1, 1))
                .build();
        IncidenceResult r = new ShadowedPlanetView(s).compute(DOWN, ALT, R);
        assertThat(r.surfaceFactor("plate")).isZero();
        assertThat(r.surfaceFactor("panel.back")).isCloseTo(PlanetViewFactor.differentialElement((R + ALT) / R, 1),
                within(1e-15));
    }

    @Test
    void bottomOfATubeSeesThePlanetThroughItsOpening() {
        // Unit square tube, 1 m deep, open toward the planet. Every line of sight through the
        // opening lies within atan(√2) = 54.7° of nadir, inside the planet's 70.2° cone, so the
        // closed end sees the planet exactly through the opening: F = C-11 for 1 × 1 at 1
        // (0.19982; Howell's catalog).
        List<Surface> faces = new ArrayList<>(Enclosures.box("", new Vec3(0, 0, -1), new Vec3(1, 1, 0), 1, 1, 1,
                Facing.INWARD));
        faces.removeIf(f -> f.name().equals("bottom")); // the opening at z = −1
        Scene s = Scene.of(faces);
        ShadowedPlanetView view = new ShadowedPlanetView(s);
        double expected = parallelRectangles(1, 1, 1);
        double previous = 1;
        for (int[] orders : new int[][] {{2, 8}, {4, 16}, {8, 32}}) {
            IncidenceResult r = view.compute(DOWN, ALT, R, orders[0], orders[1], 0);
            double err = Math.abs(r.surfaceFactor("top") - expected);
            System.out.printf("tube end to planet, points %d², cone %d x %d: F = %.6f (C-11 %.6f), |error| %.2e%n",
                    orders[0], orders[1], 2 * orders[1], r.surfaceFactor("top"), expected, err);
            assertThat(err).isLessThan(previous);
            previous = err;
        }
        assertThat(previous).isLessThan(2e-3);
        assertThat(view.compute(DOWN, ALT, R, 4, 16, 1)).isEqualTo(view.compute(DOWN, ALT, R, 4, 16, 3));
    }
}
