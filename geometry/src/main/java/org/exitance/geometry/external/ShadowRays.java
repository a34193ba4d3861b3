package org.exitance.geometry.external;

import org.exitance.geometry.Scene;
import org.exitance.geometry.bvh.TriangleBvh;
import org.exitance.geometry.bvh.WatertightRay;

/**
 * Rays from points of a facet toward infinity, tested against every facet of the scene (a
 * {@link TriangleBvh} over all fan triangles; the watertight test of Woop, Benthin &amp; Wald,
 * JCGT 2(1), 2013, is two-sided, so facets block whichever way they face).
 *
 * <p>Origin offset: the ray starts at the point moved along the facet's normal by
 * ε = 1e-9 · (scene bounding-box diagonal) + 16 ulp(largest |coordinate|), parameter range
 * [0, ∞), and the facet's own triangles are skipped. A ray that leaves the facet's side
 * (n · d &gt; 0) cannot re-hit the facet's plane, so coplanar neighbours and the twin face of a
 * two-sided plate are never hit by mistake; an occluder closer than ε is missed.
 *
 * <p>Immutable; one {@link Probe} per thread.
 */
final class ShadowRays {

    final PackedFacets table;
    final TriangleBvh bvh;
    final double offset;

    ShadowRays(Scene scene) {
        table = new PackedFacets(scene);
        bvh = table.allFacetsBvh();
        offset = 1e-9 * table.size + 16 * Math.ulp(table.magnitude);
    }

    /** Per-thread ray state and sample scratch. */
    final class Probe {
        private final WatertightRay ray = new WatertightRay();
        private final int[] hint = {-1};
        /** Sample points (x, y, z, w) of the last {@link #sample} call. */
        double[] pts = new double[0];

        /**
         * Fills {@link #pts} with the stratified points of facet f.
         *
         * @return number of points
         */
        int sample(int f, int order) {
            int need = 4 * FacetSampler.pointCount(table.vertexCount(f), order);
            if (pts.length < need) {
                pts = new double[need];
            }
            return FacetSampler.sample(table, f, order, pts);
        }

        /**
         * @param f facet the point lies on
         * @param k index of the point in {@link #pts}
         * @return true if the ray from point k in direction (dx, dy, dz) escapes the scene
         */
        boolean escapes(int f, int k, double dx, double dy, double dz) {
            double e = offset;
            ray.set(pts[4 * k] + e * table.normal[3 * f], pts[4 * k + 1] + e * table.normal[3 * f + 1],
                    pts[4 * k + 2] + e * table.normal[3 * f + 2], dx, dy, dz);
            return !bvh.occluded(ray, 0, Double.POSITIVE_INFINITY, f, f, hint);
        }
    }
}
