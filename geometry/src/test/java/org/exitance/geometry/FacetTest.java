package org.exitance.geometry;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class FacetTest {

    @Test
    void triangleAreaNormalAndCentroidFollowElementaryGeometry() {
        Facet f = Facet.of(Vec3.ZERO, new Vec3(2, 0, 0), new Vec3(0, 3, 0));
        // area = base · height / 2; centroid = mean of vertices; normal by the right-hand rule (common practice)
        assertThat(f.area()).isCloseTo(3.0, within(1e-15));
        assertThat(f.normal()).isEqualTo(Vec3.Z);
        assertThat(f.centroid().x()).isCloseTo(2.0 / 3, within(1e-15));
        assertThat(f.centroid().y()).isCloseTo(1.0, within(1e-15));
    }

    @Test
    void reversedFacetRadiatesTheOtherWay() {
        Facet f = Facet.of(Vec3.ZERO, Vec3.X, new Vec3(1, 1, 0), Vec3.Y);
        assertThat(f.reversed().normal().z()).isEqualTo(-1.0);
        assertThat(f.reversed().area()).isCloseTo(f.area(), within(1e-15));
    }

    @Test
    void degenerateNonPlanarAndNonConvexPolygonsAreRejected() {
        assertThatThrownBy(() -> Facet.of(Vec3.ZERO, Vec3.X, new Vec3(2, 0, 0))).isInstanceOf(GeometryException.class)
                .hasMessageContaining("zero area");
        assertThatThrownBy(() -> Facet.of(Vec3.ZERO, Vec3.X, Vec3.X)).hasMessageContaining("repeated vertex");
        assertThatThrownBy(() -> Facet.of(Vec3.ZERO, Vec3.X, new Vec3(1, 1, 0.1), Vec3.Y))
                .hasMessageContaining("non-planar");
        assertThatThrownBy(() -> Facet.of(Vec3.ZERO, new Vec3(2, 0, 0), new Vec3(1, 0.2, 0), new Vec3(1, 2, 0)))
                .hasMessageContaining("non-convex");
    }

    @Test
    void rotationAboutZByQuarterTurnMapsXToY() {
        // Commons Math Rotation, vector-operator convention: right-hand rule (common practice)
        Vec3 p = Transform.rotation(Vec3.Z, Math.PI / 2).apply(Vec3.X);
        assertThat(p.x()).isCloseTo(0, within(1e-15));
        assertThat(p.y()).isCloseTo(1, within(1e-15));
        Vec3 q = Transform.rotation(new Vec3(1, 1, 0), Vec3.Z, Math.PI).then(Transform.translation(Vec3.Z)).apply(Vec3.ZERO);
        assertThat(q.x()).isCloseTo(2, within(1e-14));
        assertThat(q.y()).isCloseTo(2, within(1e-14));
        assertThat(q.z()).isCloseTo(1, within(1e-14));
    }

    @Test
    void twoSidedSurfaceGivesFrontAndBackWithOppositeNormals() {
        Scene s = Scene.builder().addTwoSided("window", java.util.List.of(Facet.of(Vec3.ZERO, Vec3.X, Vec3.Y))).build();
        assertThat(s.surfaces()).extracting(Surface::name).containsExactly("window.front", "window.back");
        assertThat(s.surfaces().get(1).facets().get(0).normal().z()).isEqualTo(-1.0);
        assertThatThrownBy(() -> Scene.builder().add("a", s.facets()).add("a", s.facets()))
                .hasMessageContaining("duplicate");
    }
}
