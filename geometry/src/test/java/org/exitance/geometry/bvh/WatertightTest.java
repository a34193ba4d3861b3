package org.exitance.geometry.bvh;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Random;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/**
 * Watertightness (Woop, Benthin &amp; Wald, JCGT 2(1) 2013): a ray through a shared edge or vertex
 * of a mesh hits exactly one triangle.
 */
class WatertightTest {

    static TriangleBvh triangulate(List<Facet> facets) {
        int n = 0;
        for (Facet f : facets) {
            n += f.vertexCount() - 2;
        }
        double[] t = new double[9 * n];
        int[] owner = new int[n];
        int k = 0;
        for (int i = 0; i < facets.size(); i++) {
            Facet f = facets.get(i);
            for (int a = 1; a + 1 < f.vertexCount(); a++) {
                Vec3[] v = {f.vertex(0), f.vertex(a), f.vertex(a + 1)};
                for (int c = 0; c < 3; c++) {
                    t[9 * k + 3 * c] = v[c].x();
                    t[9 * k + 3 * c + 1] = v[c].y();
                    t[9 * k + 3 * c + 2] = v[c].z();
                }
                owner[k++] = i;
            }
        }
        return new TriangleBvh(t, owner);
    }

    @Test
    void raysDownExactlyOntoGridEdgesAndVerticesHitOneTriangle() {
        // 4 × 4 unit squares, each split into 2 triangles: exact zeros in the edge functions
        TriangleBvh bvh = triangulate(Shapes.parallelogram(Vec3.ZERO, new Vec3(4, 0, 0), new Vec3(0, 4, 0), 4, 4));
        WatertightRay ray = new WatertightRay();
        for (double x = 0.5; x <= 3.5; x += 0.5) {
            for (double y = 0.5; y <= 3.5; y += 0.5) {
                for (double dz : new double[] {-1, 1}) {
                    ray.set(x, y, -3 * dz, 0, 0, dz);
                    assertThat(bvh.countHits(ray, 0, 10)).as("x=%s y=%s dz=%s", x, y, dz).isEqualTo(1);
                }
                // oblique ray through the same point (diagonal edges included)
                ray.set(x - 0.3, y - 0.2, 1, 0.3, 0.2, -1);
                assertThat(bvh.countHits(ray, 0, 10)).as("oblique x=%s y=%s", x, y).isEqualTo(1);
            }
        }
    }

    @Test
    void raysAtSphereMeshEdgesAndVerticesHitOneTrianglePerCrossing() {
        List<Facet> sphere = Shapes.sphere(Vec3.ZERO, 1, 10, 16, Facing.OUTWARD);
        TriangleBvh bvh = triangulate(sphere);
        Random rnd = new Random(3);
        WatertightRay ray = new WatertightRay();
        int checked = 0;
        for (Facet f : sphere) {
            for (int k = 0; k < f.vertexCount(); k++) {
                Vec3 a = f.vertex(k), b = f.vertex((k + 1) % f.vertexCount());
                for (Vec3 target : new Vec3[] {a, Vec3.lerp(a, b, 0.5), Vec3.lerp(a, b, rnd.nextDouble())}) {
                    // from a point outside, straight at the target: the first crossing is at t = 1
                    Vec3 o = target.times(3).plus(new Vec3(rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5));
                    Vec3 d = target.minus(o);
                    ray.set(o.x(), o.y(), o.z(), d.x(), d.y(), d.z());
                    assertThat(bvh.countHits(ray, 0.99, 1.01)).isEqualTo(1);
                    double[] hit = new double[3];
                    assertThat(bvh.closest(ray, 0, 10, hit)).isTrue();
                    assertThat(hit[0]).isBetween(0.999, 1.001);
                    checked++;
                }
            }
        }
        assertThat(checked).isGreaterThan(400);
    }

    @Test
    void bvhClosestHitAgreesWithBruteForceAndSkipsOwners() {
        List<Facet> sphere = Shapes.sphere(Vec3.ZERO, 1, 12, 20, Facing.OUTWARD);
        TriangleBvh bvh = triangulate(sphere);
        Random rnd = new Random(9);
        WatertightRay ray = new WatertightRay();
        double[] hit = new double[3];
        for (int k = 0; k < 500; k++) {
            Vec3 o = new Vec3(rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5, rnd.nextDouble() - 0.5); // inside
            ray.set(o.x(), o.y(), o.z(), rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian());
            // from inside a closed mesh every ray leaves exactly once (watertight)
            assertThat(bvh.countHits(ray, 0, 1e9)).isEqualTo(1);
            assertThat(bvh.closest(ray, 0, 1e9, hit)).isTrue();
            assertThat(bvh.occluded(ray, 0, 1e9, -1, -1)).isTrue();
            assertThat(bvh.occluded(ray, 0, 1e9, (int) hit[1], -1)).isFalse();
        }
    }
}
