package org.exitance.geometry.shape;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.junit.jupiter.api.Test;

class ShapesTest {

    static double area(List<Facet> f) {
        return f.stream().mapToDouble(Facet::area).sum();
    }

    @Test
    void meshedDiscHasTheAreaOfTheInscribedPolygon() {
        int n = 24;
        // regular n-gon inscribed in radius R: (n/2) R² sin(2π/n) (elementary geometry, common practice)
        List<Facet> d = Shapes.disc(Vec3.ZERO, new Vec3(1, 2, 3), 0.5, 4, n);
        assertThat(area(d)).isCloseTo(n / 2.0 * 0.25 * Math.sin(2 * Math.PI / n), within(1e-14));
        Vec3 axis = new Vec3(1, 2, 3).normalized();
        assertThat(d).allSatisfy(f -> assertThat(f.normal().dot(axis)).isCloseTo(1, within(1e-12)));
        List<Facet> a = Shapes.annulus(Vec3.ZERO, Vec3.Z, 0.2, 0.5, 3, n);
        assertThat(area(a)).isCloseTo(n / 2.0 * (0.25 - 0.04) * Math.sin(2 * Math.PI / n), within(1e-14));
    }

    @Test
    void cylinderConeAndSphereFaceTheRequestedSide() {
        List<Facet> in = Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, 1, 2, 16, 3, Facing.INWARD);
        // prism of chords: perimeter 2 n R sin(π/n) times height
        assertThat(area(in)).isCloseTo(2 * 16 * Math.sin(Math.PI / 16) * 2, within(1e-13));
        for (Facet f : in) {
            Vec3 radial = new Vec3(f.centroid().x(), f.centroid().y(), 0);
            assertThat(f.normal().dot(radial)).isNegative();
        }
        for (Facet f : Shapes.coneFrustum(Vec3.ZERO, Vec3.Z, 1, 0, 1, 12, 2, Facing.OUTWARD)) {
            assertThat(f.normal().dot(new Vec3(f.centroid().x(), f.centroid().y(), 0))).isPositive();
        }
        List<Facet> s = Shapes.sphere(new Vec3(1, 1, 1), 2, 8, 12, Facing.OUTWARD);
        for (Facet f : s) {
            assertThat(f.normal().dot(f.centroid().minus(new Vec3(1, 1, 1)))).isPositive();
        }
        assertThat(area(s)).isLessThan(4 * Math.PI * 4).isGreaterThan(0.9 * 4 * Math.PI * 4);
        assertThat(Shapes.spherePatch(Vec3.ZERO, Vec3.Z, 1, 0, Math.PI / 2, 4, 8, Facing.INWARD)).hasSize(32);
    }

    @Test
    void boxFacesPointInwardAndBlockFacesOutward() {
        List<Surface> box = Enclosures.box(Vec3.ZERO, new Vec3(2, 3, 4), 2, 3, 4);
        assertThat(box).extracting(Surface::name).containsExactlyElementsOf(Enclosures.BOX_FACES);
        Vec3 c = new Vec3(1, 1.5, 2);
        for (Surface s : box) {
            for (Facet f : s.facets()) {
                assertThat(f.normal().dot(c.minus(f.centroid()))).isPositive();
            }
        }
        assertThat(box.stream().mapToDouble(Surface::area).sum()).isCloseTo(2 * (6 + 8 + 12), within(1e-12));
        for (Surface s : Enclosures.box("b.", Vec3.ZERO, new Vec3(2, 3, 4), 1, 1, 1, Facing.OUTWARD)) {
            assertThat(s.name()).startsWith("b.");
            assertThat(s.facets().get(0).normal().dot(c.minus(s.facets().get(0).centroid()))).isNegative();
        }
        assertThat(Shapes.convexPolygon(List.of(Vec3.ZERO, Vec3.X, new Vec3(1, 1, 0), Vec3.Y), 3))
                .hasSize(36).extracting(Facet::area).allSatisfy(a -> assertThat(a).isCloseTo(1.0 / 36, within(1e-15)));
    }
}
