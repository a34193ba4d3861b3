package org.exitance.geometry.external;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/**
 * Collimated incidence φ = max(0, n·d) × lit fraction (Lambert's cosine law; common practice),
 * against the cosine law, projected areas and hand-computed shadows.
 */
class CollimatedIncidenceTest {

    static Vec3 tilted(double thetaRad) {
        return new Vec3(Math.sin(thetaRad), 0, Math.cos(thetaRad));
    }

    @Test
    void flatPlateFollowsTheCosineLaw() {
        // Common practice (Lambert's cosine law): face-on 1, at angle θ cos θ, from behind 0.
        Scene s = Scene.builder().add("plate", Shapes.parallelogram(Vec3.ZERO, Vec3.X, Vec3.Y, 2, 3)).build();
        CollimatedIncidence c = new CollimatedIncidence(s);
        assertThat(c.compute(Vec3.Z).surfaceFactor("plate")).isEqualTo(1.0);
        for (double theta : new double[] {0.1, 0.7, 1.2, 1.5}) {
            assertThat(c.compute(tilted(theta)).surfaceFactor("plate")).isCloseTo(Math.cos(theta), within(1e-15));
        }
        assertThat(c.compute(tilted(2.0)).surfaceFactor("plate")).isZero();
        assertThat(c.compute(tilted(2.0)).raysCast()).isZero();
    }

    @Test
    void cubeLitAlongABodyDiagonal() {
        // Three faces at cos = 1/√3 each (angle between a face normal and the body diagonal;
        // common practice), the other three 0.
        Scene s = Scene.builder().addAll(Enclosures.box("", Vec3.ZERO, new Vec3(1, 1, 1), 2, 2, 2, Facing.OUTWARD)).build();
        IncidenceResult r = new CollimatedIncidence(s).compute(new Vec3(1, 1, 1), 4, 1);
        double c = 1 / Math.sqrt(3);
        for (String lit : List.of("top", "back", "right")) { // outward normals +z, +y, +x
            assertThat(r.surfaceFactor(lit)).as(lit).isCloseTo(c, within(1e-15));
        }
        for (String dark : List.of("bottom", "front", "left")) {
            assertThat(r.surfaceFactor(dark)).as(dark).isZero();
        }
    }

    @Property(tries = 30)
    void convexBoxInterceptsItsProjectedArea(@ForAll @DoubleRange(min = -1, max = 1) double x,
            @ForAll @DoubleRange(min = -1, max = 1) double y, @ForAll @DoubleRange(min = -1, max = 1) double z) {
        if (x * x + y * y + z * z < 1e-4) {
            return;
        }
        // A convex body casts no shadow on itself; Σ A_S φ_S = projected area of an a×b×c box
        // along d: bc|dx| + ac|dy| + ab|dz| (common practice).
        double a = 0.7, b = 1.3, cc = 0.4;
        Scene s = Scene.builder().addAll(Enclosures.box("", Vec3.ZERO, new Vec3(a, b, cc), 3, 2, 2, Facing.OUTWARD)).build();
        Vec3 d = new Vec3(x, y, z).normalized();
        IncidenceResult r = new CollimatedIncidence(s).compute(d, 2, 1);
        double intercepted = 0;
        for (int k = 0; k < s.surfaceCount(); k++) {
            intercepted += s.surfaces().get(k).area() * r.surfaceFactors()[k];
        }
        double projected = b * cc * Math.abs(d.x()) + a * cc * Math.abs(d.y()) + a * b * Math.abs(d.z());
        assertThat(intercepted).isCloseTo(projected, within(1e-12));
    }

    @Test
    void aSecondBoxInTheBeamBreaksTheConvexSum() {
        // the projected-area test can fail: two boxes stacked along the beam shade each other, so
        // together they intercept less than the sum of their projected areas
        Scene s = Scene.builder()
                .addAll(Enclosures.box("a.", Vec3.ZERO, new Vec3(1, 1, 1), 2, 2, 2, Facing.OUTWARD))
                .addAll(Enclosures.box("b.", new Vec3(0, 0, 2), new Vec3(1, 1, 3), 2, 2, 2, Facing.OUTWARD)).build();
        IncidenceResult r = new CollimatedIncidence(s).compute(Vec3.Z, 2, 1);
        double intercepted = 0;
        for (int k = 0; k < s.surfaceCount(); k++) {
            intercepted += s.surfaces().get(k).area() * r.surfaceFactors()[k];
        }
        // each unit cube alone projects 1 m² along z; shaded, the pair takes 1 m²
        assertThat(intercepted).isCloseTo(1.0, within(1e-9));
        assertThat(Math.abs(intercepted - 2.0)).isGreaterThan(0.5);
    }

    /** Smallest distance from the centre to a facet plane (radius of the inscribed ball). */
    static double inradius(List<Facet> facets, Vec3 centre) {
        double r = Double.MAX_VALUE;
        for (Facet f : facets) {
            r = Math.min(r, Math.abs(f.normal().dot(f.centroid().minus(centre))));
        }
        return r;
    }

    @Test
    void sphereAverageTendsToAQuarter() {
        // Sphere: projected area πr² over surface 4πr² = 1/4 (common practice). The inscribed
        // polyhedron lies between the balls of radii r_in (inradius) and r, so (convex bodies:
        // projection and surface area grow with inclusion) its average lies in
        // [r_in²/(4r²), r²/(4r_in²)]. No facet may be falsely self-shadowed: lit ⇒ φ_f = n·d.
        Vec3 centre = new Vec3(0.3, -0.2, 1.1), d = new Vec3(0.3, -0.5, 0.81).normalized();
        double r = 0.5, previous = 1;
        for (int n : new int[] {6, 12, 24, 48}) {
            List<Facet> facets = Shapes.sphere(centre, r, n, 2 * n, Facing.OUTWARD);
            Scene s = Scene.builder().add("ball", facets).build();
            IncidenceResult res = new CollimatedIncidence(s).compute(d, 3, 0);
            for (int f = 0; f < facets.size(); f++) {
                assertThat(res.facetFactor(f)).isEqualTo(Math.max(0, facets.get(f).normal().dot(d)));
            }
            double avg = res.surfaceFactor("ball");
            double q = inradius(facets, centre) / r;
            assertThat(avg).as("n=%d", n).isBetween(q * q / 4, 1 / (4 * q * q));
            double err = Math.abs(avg - 0.25);
            assertThat(err).isLessThan(previous);
            previous = err;
            System.out.printf("sphere %d x %d: average factor %.6f, |error| %.2e, bound %.2e%n", n, 2 * n, avg, err,
                    1 / (4 * q * q) - 0.25);
        }
    }

    /** Lower plate [0,1]² at z = 0 facing +z; a 1.75 m square shade at z = 1 over [−0.5, 1.25] × [0.25, 2]. */
    static Scene shadeOverPlate(int lowerDivisions, String shadeMode) {
        Scene.Builder b = Scene.builder().add("lower", Shapes.parallelogram(Vec3.ZERO, Vec3.X, Vec3.Y, lowerDivisions,
                lowerDivisions));
        List<Facet> shade = Shapes.parallelogram(new Vec3(-0.5, 0.25, 1), new Vec3(1.75, 0, 0), new Vec3(0, 1.75, 0), 2, 2);
        return switch (shadeMode) {
            case "two-sided" -> b.addTwoSided("shade", shade).build();
            case "up" -> b.add("shade", shade).build();
            default -> b.add(new Surface("shade", shade).reversed("shade")).build();
        };
    }

    @Test
    void plateShadowsASmallerPlateBelowIt() {
        // Hand geometry: sun at 45° in the x–z plane; a point (x, y) of the lower plate is hidden
        // when (x + 1, y) lies on the shade: x ≤ 0.25 and y ≥ 0.25, area 0.25 × 0.75 = 0.1875.
        // Lit fraction 0.8125, φ = cos 45° × 0.8125. The shade blocks whichever way it faces.
        Vec3 d = tilted(Math.PI / 4);
        double exact = Math.cos(Math.PI / 4) * 0.8125;
        for (String mode : List.of("two-sided", "up", "down")) {
            CollimatedIncidence c = new CollimatedIncidence(shadeOverPlate(1, mode));
            // order 4: cell sides at multiples of 0.25 contain the shadow edges: the midpoint rule is exact
            assertThat(c.compute(d, 4, 1).surfaceFactor("lower")).as(mode).isCloseTo(exact, within(1e-15));
            assertThat(c.compute(d, 8, 2).surfaceFactor("lower")).as(mode).isCloseTo(exact, within(1e-15));
        }
        IncidenceResult two = new CollimatedIncidence(shadeOverPlate(1, "two-sided")).compute(d);
        assertThat(two.surfaceFactor("shade.front")).isCloseTo(Math.cos(Math.PI / 4), within(1e-15));
        assertThat(two.surfaceFactor("shade.back")).isZero();
    }

    @Test
    void misalignedShadowEdgesConvergeWithinTheCellBound() {
        // Same hand geometry; orders whose cells do not contain the edges x = 0.25, y = 0.25.
        // Only cells cut by an edge (or with their centre on it) can be misclassified: the edge
        // x = 0.25 (length 0.75) meets at most 0.75 m + 2 cells, y = 0.25 (length 0.25) at most
        // 0.25 m + 2, each of area 1/m²: |error of the lit fraction| ≤ (m + 4)/m².
        Vec3 d = tilted(Math.PI / 4);
        CollimatedIncidence c = new CollimatedIncidence(shadeOverPlate(1, "two-sided"));
        for (int m : new int[] {3, 5, 7, 10, 33}) {
            double lit = c.compute(d, m, 1).surfaceFactor("lower") / Math.cos(Math.PI / 4);
            double err = Math.abs(lit - 0.8125);
            assertThat(err).as("m=%d", m).isLessThanOrEqualTo((m + 4.0) / (m * m));
            System.out.printf("shade over plate, order %d: lit fraction %.6f, |error| %.2e%n", m, lit, err);
        }
        // a 3 × 3 mesh of the lower plate with order 4: cells 1/12 wide, edges on cell sides: exact
        assertThat(new CollimatedIncidence(shadeOverPlate(3, "two-sided")).compute(d, 4, 1).surfaceFactor("lower"))
                .isCloseTo(Math.cos(Math.PI / 4) * 0.8125, within(1e-15));
    }

    /** Unit cube radiating inward with the top removed: an open box (concave). */
    static Scene openBox() {
        List<Surface> faces = new ArrayList<>(Enclosures.box("", Vec3.ZERO, new Vec3(1, 1, 1), 1, 1, 1, Facing.INWARD));
        faces.removeIf(f -> f.name().equals("top"));
        return Scene.of(faces);
    }

    @Test
    void openBoxShadowsItself() {
        // Hand geometry, d = (1, 1, 2)/√6. Bottom (n = +z, cos 2/√6): the ray from (x, y, 0)
        // reaches the wall x = 1 or y = 1 at height 2(1 − max(x, y)); lit iff max(x, y) ≤ 1/2:
        // lit fraction 1/4. Left wall x = 0 (n = +x, cos 1/√6): from (0, y, z) the ray meets the
        // back wall y = 1 at height z + 2(1 − y); hidden iff z < 2y − 1, a triangle of area 1/4:
        // lit fraction 3/4; the front wall y = 0 likewise. Right and back walls face away: 0.
        Vec3 d = new Vec3(1, 1, 2);
        double s6 = Math.sqrt(6);
        CollimatedIncidence c = new CollimatedIncidence(openBox());
        for (int m : new int[] {4, 5, 7, 8, 16, 33, 64}) {
            IncidenceResult r = c.compute(d, m, 0);
            double bottom = r.surfaceFactor("bottom") * s6 / 2;
            if (m % 2 == 0) {
                assertThat(bottom).isCloseTo(0.25, within(1e-15)); // edges x, y = 1/2 on cell sides: exact
            } else {
                assertThat(Math.abs(bottom - 0.25)).isLessThanOrEqualTo((m + 4.0) / (m * m)); // ≤ 2 (m/2 + 2) cells cut
            }
            assertThat(r.surfaceFactor("right")).isZero();
            assertThat(r.surfaceFactor("back")).isZero();
            // the edge z = 2y − 1 (Δy = 1/2, Δz = 1) crosses ≤ 0.5 m + 1 column and ≤ m + 1 row
            // lines, so it meets at most 1.5 m + 3 of the m² cells
            double bound = (1.5 * m + 3) / ((double) m * m);
            for (String wall : List.of("left", "front")) {
                double lit = r.surfaceFactor(wall) * s6;
                assertThat(Math.abs(lit - 0.75)).as("%s m=%d", wall, m).isLessThanOrEqualTo(bound);
                System.out.printf("open box %s, order %d: lit fraction %.6f, |error| %.2e (bound %.2e)%n", wall, m,
                        lit, Math.abs(lit - 0.75), bound);
            }
        }
    }

    @Test
    void resultsDoNotDependOnThreadsOrSurfaceOrder() {
        List<Surface> parts = new ArrayList<>();
        parts.add(new Surface("ball", Shapes.sphere(new Vec3(0.5, 0.5, 0.4), 0.3, 12, 24, Facing.OUTWARD)));
        parts.addAll(openBox().surfaces());
        parts.add(new Surface("shade", Shapes.parallelogram(new Vec3(-0.3, 0.1, 1.3), new Vec3(0.9, 0, 0),
                new Vec3(0, 0.7, 0.1), 3, 3)));
        Scene scene = Scene.of(parts);
        Vec3 d = new Vec3(0.4, 0.3, 1);
        CollimatedIncidence c = new CollimatedIncidence(scene);
        IncidenceResult one = c.compute(d, 5, 1);
        assertThat(c.compute(d, 5, 2)).isEqualTo(one);
        assertThat(c.compute(d, 5, 3)).isEqualTo(one);
        assertThat(one.raysCast()).isPositive();
        List<Surface> reversed = new ArrayList<>(parts);
        java.util.Collections.reverse(reversed);
        IncidenceResult other = new CollimatedIncidence(Scene.of(reversed)).compute(d, 5, 2);
        for (Surface s : parts) {
            assertThat(other.surfaceFactor(s.name())).as(s.name()).isEqualTo(one.surfaceFactor(s.name()));
        }
        // something is actually shadowed, and something lit
        assertThat(one.surfaceFactor("bottom")).isGreaterThan(0).isLessThan(new Vec3(0, 0, 1).dot(d.normalized()));
    }

    @Test
    void rejectsBadInput() {
        CollimatedIncidence c = new CollimatedIncidence(openBox());
        assertThatThrownBy(() -> c.compute(Vec3.Z, 0, 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> c.compute(Vec3.ZERO)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> c.compute(Vec3.Z, 2, -1)).isInstanceOf(IllegalArgumentException.class);
    }
}
