package org.exitance.geometry.viewfactor;

import org.exitance.geometry.bvh.TriangleBvh;

/**
 * The round bodies among a pair's occluders ({@link RoundBodies}), for {@link ShadowIntegral}:
 * their facets are collected from the hull widened by the largest sagitta (the exact body may
 * reach into the hull where its polygons do not; other facets come from the hull itself only),
 * and the first body that may be held exactly is taken out of the polygon list.
 *
 * <p>Mutable scratch; one instance per thread.
 */
final class BodyOccluders {

    private final FacetTable t;
    private final TriangleBvh bvh;
    private final int[] widened;
    /** After {@link #separate}: the body held exactly, or null. */
    RoundOccluder body;
    /** After {@link #separate}: the largest relative shape error of the bodies left on polygons. */
    double shapeError;

    BodyOccluders(FacetTable t, TriangleBvh bvh, int maxOccluders) {
        this.t = t;
        this.bvh = bvh;
        this.widened = new int[maxOccluders];
    }

    /**
     * Adds to the occluders [0, count) the facets of round bodies in the widened hull.
     *
     * @param occluders the list (modified)
     * @return the new count, or −1 if the list is full
     */
    int addFacets(Shaft hull, Poly p, Poly q, int[] occluders, int count) {
        if (t.bodyBulge == 0) {
            return count;
        }
        int extra = bvh.collect(hull.planes, hull.count, hull.tolerance - t.bodyBulge, p.facet, q.facet, widened);
        if (extra < 0) {
            return -1;
        }
        for (int k = 0; k < extra; k++) {
            int f = widened[k];
            if (t.bodies.bodyOf[f] < 0) {
                continue;
            }
            boolean seen = false;
            for (int m = 0; m < count && !seen; m++) {
                seen = occluders[m] == f;
            }
            if (!seen) {
                if (count == occluders.length) {
                    return -1;
                }
                occluders[count++] = f;
            }
        }
        return count;
    }

    /**
     * Takes out of the occluders [0, count) the facets of the first body that lies wholly on
     * p's side of q's plane and that neither p nor q bounds (p's polygon lies inside its own exact
     * body): {@link #body}. The other bodies stay as polygons, their shape error in
     * {@link #shapeError}.
     *
     * @param root the emitter (not modified)
     * @param q the receiver (not modified)
     * @param occluders the list (modified)
     * @return the new count
     */
    int separate(Poly root, Poly q, int[] occluders, int count) {
        body = null;
        shapeError = 0;
        RoundBodies rb = t.bodies;
        if (rb == null) {
            return count;
        }
        int chosen = -1;
        double qd = q.nx * q.cx + q.ny * q.cy + q.nz * q.cz;
        int own = root.facet >= 0 ? rb.bodyOf[root.facet] : -1, ownQ = q.facet >= 0 ? rb.bodyOf[q.facet] : -1;
        for (int k = 0; k < count && chosen < 0; k++) {
            int b = rb.bodyOf[occluders[k]];
            if (b >= 0 && b != own && b != ownQ && rb.bodies[b].inside(q.nx, q.ny, q.nz, qd, 1e-9 * t.sceneSize)) {
                chosen = b;
            }
        }
        int m = 0;
        for (int k = 0; k < count; k++) {
            int b = rb.bodyOf[occluders[k]];
            if (b >= 0 && b == chosen) {
                continue;
            }
            if (b >= 0) {
                shapeError = Math.max(shapeError, rb.shapeError[b]);
            }
            occluders[m++] = occluders[k];
        }
        body = chosen < 0 ? null : rb.bodies[chosen];
        return m;
    }
}
