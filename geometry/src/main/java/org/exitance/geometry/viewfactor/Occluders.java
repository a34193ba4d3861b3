package org.exitance.geometry.viewfactor;

import org.exitance.geometry.bvh.TriangleBvh;

/**
 * Finds the facets that can block a line of sight and puts their triangles in a BVH.
 *
 * <p>Rule: a facet whose plane has every scene vertex on one closed side cannot block any open
 * segment between two scene points (such a segment stays on that side and meets the plane at
 * most at an end point). Only facets with vertices strictly on both sides (beyond 1e-9 of the
 * scene size) are occluder candidates. A convex enclosure (box, meshed cylinder or sphere seen
 * from inside) has none, so all its pairs are unobstructed.
 */
final class Occluders {

    private Occluders() {
    }

    /** @return the BVH over occluder facets' fan triangles, or null when there are none */
    static TriangleBvh build(FacetTable t) {
        return build(t, candidates(t));
    }

    /** @return per facet: may it block a line of sight (vertices strictly on both sides of its plane) */
    static boolean[] candidates(FacetTable t) {
        double tol = 1e-9 * t.sceneSize;
        int nv = t.vertexStart[t.count];
        boolean[] occ = new boolean[t.count];
        int triangles = 0;
        for (int f = 0; f < t.count; f++) {
            double nx = t.normal[3 * f], ny = t.normal[3 * f + 1], nz = t.normal[3 * f + 2];
            double d = nx * t.centroid[3 * f] + ny * t.centroid[3 * f + 1] + nz * t.centroid[3 * f + 2];
            boolean above = false, below = false;
            for (int v = 0; v < nv && !(above && below); v++) {
                double s = nx * t.xyz[3 * v] + ny * t.xyz[3 * v + 1] + nz * t.xyz[3 * v + 2] - d;
                if (s > tol) {
                    above = true;
                } else if (s < -tol) {
                    below = true;
                }
            }
            occ[f] = above && below;
        }
        return occ;
    }

    /**
     * @param occ per facet: is it an occluder (not modified)
     * @return the BVH over those facets' fan triangles, or null when there are none
     */
    static TriangleBvh build(FacetTable t, boolean[] occ) {
        int triangles = 0;
        for (int f = 0; f < t.count; f++) {
            if (occ[f]) {
                triangles += t.vertexCount(f) - 2;
            }
        }
        if (triangles == 0) {
            return null;
        }
        double[] tri = new double[9 * triangles];
        int[] owner = new int[triangles];
        int k = 0;
        for (int f = 0; f < t.count; f++) {
            if (!occ[f]) {
                continue;
            }
            int v0 = t.vertexStart[f];
            for (int a = 1; a + 1 < t.vertexCount(f); a++) {
                System.arraycopy(t.xyz, 3 * v0, tri, 9 * k, 3);
                System.arraycopy(t.xyz, 3 * (v0 + a), tri, 9 * k + 3, 3);
                System.arraycopy(t.xyz, 3 * (v0 + a + 1), tri, 9 * k + 6, 3);
                owner[k++] = f;
            }
        }
        return new TriangleBvh(tri, owner);
    }
}
