package org.exitance.geometry.bvh;

/**
 * A bounding-volume hierarchy of axis-aligned boxes over triangles, on primitive arrays.
 *
 * <p>Built top-down by object-median split along the longest axis of the centroid bounds
 * (Wald, Boulos &amp; Shirley, "Ray tracing deformable scenes using dynamic bounding volume
 * hierarchies", ACM TOG 26(1), 2007, discuss median and SAH splits; median is used for
 * simplicity and determinism), leaves of at most {@value #LEAF_SIZE} triangles, by
 * {@link BvhBuilder}. Node boxes are padded by 1e-9 of the scene size so that the slab test is
 * conservative (Ize, "Robust BVH ray traversal", JCGT 2(2), 2013, recommends the same).
 *
 * <p>Each triangle carries an owner id (the facet it came from) so queries can ignore the
 * facets a ray starts and ends on. Immutable after construction; queries are thread-safe when
 * each thread uses its own {@link WatertightRay}.
 */
public final class TriangleBvh {

    static final int LEAF_SIZE = BvhBuilder.LEAF_SIZE;

    private final double[] tri;   // 9 per triangle, reordered
    private final int[] owner;    // per triangle, reordered
    private final double[] box;   // 6 per node: min xyz, max xyz
    private final int[] first;    // leaf: first triangle; inner: index of the right child
    private final int[] count;    // leaf: number of triangles (> 0); inner: 0

    /**
     * @param triangles packed vertices, 9 doubles per triangle (m); not modified (copied)
     * @param owners owner id per triangle; not modified (copied)
     */
    public TriangleBvh(double[] triangles, int[] owners) {
        BvhBuilder b = new BvhBuilder(triangles, owners);
        this.tri = b.tri;
        this.owner = b.owner;
        this.box = b.box;
        this.first = b.first;
        this.count = b.count;
    }

    /**
     * Cheap pre-test: does the bounding box of two point sets overlap the root box?
     *
     * @param a packed points (m), first {@code na} used; not modified
     * @param b packed points (m), first {@code nb} used; not modified
     * @return false if no triangle can lie inside the hull of the points
     */
    public boolean overlapsBounds(double[] a, int na, double[] b, int nb) {
        if (owner.length == 0) {
            return false;
        }
        for (int k = 0; k < 3; k++) {
            double lo = Double.MAX_VALUE, hi = -Double.MAX_VALUE;
            for (int v = 0; v < na; v++) {
                lo = Math.min(lo, a[3 * v + k]);
                hi = Math.max(hi, a[3 * v + k]);
            }
            for (int v = 0; v < nb; v++) {
                lo = Math.min(lo, b[3 * v + k]);
                hi = Math.max(hi, b[3 * v + k]);
            }
            if (hi < box[k] || lo > box[3 + k]) {
                return false;
            }
        }
        return true;
    }

    /** @return number of triangles */
    public int size() {
        return owner.length;
    }

    /**
     * Any-hit query for the segment o + t d, t ∈ [tMin, tMax], ignoring triangles owned by
     * {@code skipA} or {@code skipB}.
     *
     * @param ray prepared ray (not modified)
     * @return true if some other triangle is hit
     */
    public boolean occluded(WatertightRay ray, double tMin, double tMax, int skipA, int skipB) {
        return occluded(ray, tMin, tMax, skipA, skipB, null);
    }

    /**
     * Any-hit query that first tries the triangle that blocked the previous ray (coherent rays
     * between two facets mostly hit the same occluder triangle).
     *
     * @param hint one-element array holding the last blocking triangle (or −1); modified on a hit
     * @return true if some other triangle is hit
     */
    public boolean occluded(WatertightRay ray, double tMin, double tMax, int skipA, int skipB, int[] hint) {
        if (owner.length == 0) {
            return false;
        }
        if (hint != null && hint[0] >= 0) {
            int t = hint[0];
            if (owner[t] != skipA && owner[t] != skipB && !Double.isNaN(ray.intersect(tri, 9 * t, tMin, tMax))) {
                return true;
            }
        }
        int[] stack = new int[64];
        int sp = 0;
        stack[sp++] = 0;
        while (sp > 0) {
            int node = stack[--sp];
            if (!slab(ray, node, tMin, tMax)) {
                continue;
            }
            if (count[node] > 0) {
                for (int t = first[node], end = first[node] + count[node]; t < end; t++) {
                    if (owner[t] != skipA && owner[t] != skipB && !Double.isNaN(ray.intersect(tri, 9 * t, tMin, tMax))) {
                        if (hint != null) {
                            hint[0] = t;
                        }
                        return true;
                    }
                }
            } else {
                stack[sp++] = first[node];
                stack[sp++] = node + 1;
            }
        }
        return false;
    }

    /**
     * Closest-hit query.
     *
     * @param ray prepared ray (not modified)
     * @param tMin smallest accepted parameter
     * @param tMax largest accepted parameter
     * @param hit output {t, owner, triangle index in build order}; modified only on a hit
     * @return true if a triangle is hit
     */
    public boolean closest(WatertightRay ray, double tMin, double tMax, double[] hit) {
        boolean found = false;
        if (owner.length == 0) {
            return false;
        }
        int[] stack = new int[64];
        int sp = 0;
        stack[sp++] = 0;
        double best = tMax;
        while (sp > 0) {
            int node = stack[--sp];
            if (!slab(ray, node, tMin, best)) {
                continue;
            }
            if (count[node] > 0) {
                for (int t = first[node], end = first[node] + count[node]; t < end; t++) {
                    double h = ray.intersect(tri, 9 * t, tMin, best);
                    if (!Double.isNaN(h) && (!found || h < best || (h == best && owner[t] < hit[1]))) {
                        best = h;
                        hit[0] = h;
                        hit[1] = owner[t];
                        hit[2] = t;
                        found = true;
                    }
                }
            } else {
                stack[sp++] = first[node];
                stack[sp++] = node + 1;
            }
        }
        return found;
    }

    /**
     * Counts all triangles hit by the ray in [tMin, tMax] (for tests of watertightness).
     *
     * @param ray prepared ray (not modified)
     * @return number of hits
     */
    public int countHits(WatertightRay ray, double tMin, double tMax) {
        int c = 0;
        for (int t = 0; t < owner.length; t++) {
            if (!Double.isNaN(ray.intersect(tri, 9 * t, tMin, tMax))) {
                c++;
            }
        }
        return c;
    }

    private boolean slab(WatertightRay r, int node, double tMin, double tMax) {
        int b = 6 * node;
        double t0 = tMin, t1 = tMax;
        // x
        if (r.dx == 0) {
            if (r.ox < box[b] || r.ox > box[b + 3]) {
                return false;
            }
        } else {
            double a = (box[b] - r.ox) * r.ix, c = (box[b + 3] - r.ox) * r.ix;
            t0 = Math.max(t0, Math.min(a, c));
            t1 = Math.min(t1, Math.max(a, c));
        }
        if (r.dy == 0) {
            if (r.oy < box[b + 1] || r.oy > box[b + 4]) {
                return false;
            }
        } else {
            double a = (box[b + 1] - r.oy) * r.iy, c = (box[b + 4] - r.oy) * r.iy;
            t0 = Math.max(t0, Math.min(a, c));
            t1 = Math.min(t1, Math.max(a, c));
        }
        if (r.dz == 0) {
            if (r.oz < box[b + 2] || r.oz > box[b + 5]) {
                return false;
            }
        } else {
            double a = (box[b + 2] - r.oz) * r.iz, c = (box[b + 5] - r.oz) * r.iz;
            t0 = Math.max(t0, Math.min(a, c));
            t1 = Math.min(t1, Math.max(a, c));
        }
        return t0 <= t1 * (1 + 4e-16) + 1e-300;
    }

    /**
     * Shaft query: is some triangle (not owned by {@code skipA}/{@code skipB}) possibly inside
     * the convex region bounded by the given planes? A triangle or box is ruled out when it lies
     * entirely on the outer side of one plane, on it included (within {@code tol}).
     *
     * @param planes packed (nx, ny, nz, d); outside means n·x − d &gt; 0; not modified
     * @param planeCount number of planes
     * @param tol distance tolerance (m)
     * @return true if some triangle may intersect the region
     */
    public boolean mayIntersect(double[] planes, int planeCount, double tol, int skipA, int skipB) {
        return gather(planes, planeCount, tol, skipA, skipB, null) != 0;
    }

    /**
     * The owners of every triangle that may intersect the convex region bounded by the planes
     * (same test as {@link #mayIntersect}), each owner once, in the order found.
     *
     * @param planes packed (nx, ny, nz, d); outside means n·x − d &gt; 0; not modified
     * @param planeCount number of planes
     * @param tol distance tolerance (m)
     * @param skipA owner to ignore
     * @param skipB another owner to ignore
     * @param out receives the owners (modified); its length limits how many are returned
     * @return the number of owners written, or −1 if there were more than {@code out.length}
     */
    public int collect(double[] planes, int planeCount, double tol, int skipA, int skipB, int[] out) {
        return gather(planes, planeCount, tol, skipA, skipB, out);
    }

    /**
     * The traversal behind {@link #mayIntersect} (out null: stop at the first triangle, return 1)
     * and {@link #collect} (out given: distinct owners into it, −1 past its length).
     */
    private int gather(double[] planes, int planeCount, double tol, int skipA, int skipB, int[] out) {
        int found = 0;
        if (owner.length == 0) {
            return 0;
        }
        int[] stack = new int[64];
        int sp = 0;
        stack[sp++] = 0;
        while (sp > 0) {
            int node = stack[--sp];
            if (boxOutside(node, planes, planeCount, tol)) {
                continue;
            }
            if (count[node] > 0) {
                for (int t = first[node], end = first[node] + count[node]; t < end; t++) {
                    int o = owner[t];
                    if (o == skipA || o == skipB || triangleOutside(9 * t, planes, planeCount, tol)) {
                        continue;
                    }
                    if (out == null) {
                        return 1;
                    }
                    boolean seen = false;
                    for (int k = 0; k < found && !seen; k++) {
                        seen = out[k] == o;
                    }
                    if (!seen) {
                        if (found == out.length) {
                            return -1;
                        }
                        out[found++] = o;
                    }
                }
            } else {
                stack[sp++] = first[node];
                stack[sp++] = node + 1;
            }
        }
        return found;
    }

    private boolean boxOutside(int node, double[] pl, int n, double tol) {
        int b = 6 * node;
        for (int k = 0; k < n; k++) {
            double nx = pl[4 * k], ny = pl[4 * k + 1], nz = pl[4 * k + 2], d = pl[4 * k + 3];
            double x = nx > 0 ? box[b] : box[b + 3];
            double y = ny > 0 ? box[b + 1] : box[b + 4];
            double z = nz > 0 ? box[b + 2] : box[b + 5];
            if (nx * x + ny * y + nz * z - d >= -tol) {
                return true;
            }
        }
        return false;
    }

    private boolean triangleOutside(int o, double[] pl, int n, double tol) {
        for (int k = 0; k < n; k++) {
            double nx = pl[4 * k], ny = pl[4 * k + 1], nz = pl[4 * k + 2], d = pl[4 * k + 3];
            if (nx * tri[o] + ny * tri[o + 1] + nz * tri[o + 2] - d >= -tol
                    && nx * tri[o + 3] + ny * tri[o + 4] + nz * tri[o + 5] - d >= -tol
                    && nx * tri[o + 6] + ny * tri[o + 7] + nz * tri[o + 8] - d >= -tol) {
                return true;
            }
        }
        return false;
    }
}
