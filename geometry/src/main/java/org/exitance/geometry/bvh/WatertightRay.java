package org.exitance.geometry.bvh;

/**
 * A ray prepared for the watertight ray/triangle test of Woop, Benthin &amp; Wald, "Watertight
 * Ray/Triangle Intersection", <i>Journal of Computer Graphics Techniques</i> 2(1), 2013,
 * Algorithm 1, in double precision.
 *
 * <p>The ray is sheared and scaled so that it becomes the +z axis; each triangle edge gets a 2D
 * edge function U, V, W computed from the same vertex coordinates whichever triangle it belongs
 * to, so two triangles sharing an edge see exactly opposite values: no ray passes between them.
 * To hit <em>exactly one</em> of them when an edge function is exactly zero, this class adds a
 * tie-break rule (an addition to the paper, as in rasterisation's fill convention): a point on an
 * edge (or vertex) belongs to a triangle if moving it by an infinitesimal step in the fixed 2D
 * direction (1, δ) (0 &lt; δ ≪ 1) moves it inside. For a fan of triangles around a vertex or two
 * triangles on either side of an edge, seen from the same side, exactly one passes.
 *
 * <p>Mutable; reuse with {@link #set}.
 */
public final class WatertightRay {

    double ox, oy, oz, dx, dy, dz;
    int kx, ky, kz;
    double sx, sy, sz;
    /** Reciprocal direction for slab tests. */
    double ix, iy, iz;

    /**
     * @param origin ray origin (m) {x, y, z}; not modified
     * @param direction non-zero direction (any length) {x, y, z}; not modified
     */
    public WatertightRay(double[] origin, double[] direction) {
        set(origin[0], origin[1], origin[2], direction[0], direction[1], direction[2]);
    }

    /** A ray with no state; call {@link #set} before use. */
    public WatertightRay() {
    }

    /**
     * Points along the ray are o + t d.
     *
     * @return this
     */
    public WatertightRay set(double ox, double oy, double oz, double dx, double dy, double dz) {
        this.ox = ox;
        this.oy = oy;
        this.oz = oz;
        this.dx = dx;
        this.dy = dy;
        this.dz = dz;
        double ax = Math.abs(dx), ay = Math.abs(dy), az = Math.abs(dz);
        kz = (ax > ay) ? (ax > az ? 0 : 2) : (ay > az ? 1 : 2);
        kx = (kz + 1) % 3;
        ky = (kx + 1) % 3;
        double dkz = comp(kz, dx, dy, dz);
        if (dkz < 0) {
            int t = kx;
            kx = ky;
            ky = t;
        }
        sx = comp(kx, dx, dy, dz) / dkz;
        sy = comp(ky, dx, dy, dz) / dkz;
        sz = 1.0 / dkz;
        ix = 1.0 / dx;
        iy = 1.0 / dy;
        iz = 1.0 / dz;
        return this;
    }

    private static double comp(int k, double x, double y, double z) {
        return k == 0 ? x : (k == 1 ? y : z);
    }

    /**
     * Intersects triangle (A, B, C) stored at {@code v[o..o+8]}.
     *
     * @param v packed vertices; not modified
     * @param o offset of A's x
     * @param tMin smallest accepted ray parameter
     * @param tMax largest accepted ray parameter
     * @return the ray parameter t of the hit, or NaN for no hit in [tMin, tMax]
     */
    public double intersect(double[] v, int o, double tMin, double tMax) {
        double ax = v[o] - ox, ay = v[o + 1] - oy, az = v[o + 2] - oz;
        double bx = v[o + 3] - ox, by = v[o + 4] - oy, bz = v[o + 5] - oz;
        double cx = v[o + 6] - ox, cy = v[o + 7] - oy, cz = v[o + 8] - oz;
        double akx = comp(kx, ax, ay, az), aky = comp(ky, ax, ay, az), akz = comp(kz, ax, ay, az);
        double bkx = comp(kx, bx, by, bz), bky = comp(ky, bx, by, bz), bkz = comp(kz, bx, by, bz);
        double ckx = comp(kx, cx, cy, cz), cky = comp(ky, cx, cy, cz), ckz = comp(kz, cx, cy, cz);
        double pax = akx - sx * akz, pay = aky - sy * akz;
        double pbx = bkx - sx * bkz, pby = bky - sy * bkz;
        double pcx = ckx - sx * ckz, pcy = cky - sy * ckz;
        double u = pcx * pby - pcy * pbx;
        double w2 = pax * pcy - pay * pcx; // V
        double w3 = pbx * pay - pby * pax; // W
        if ((u < 0 || w2 < 0 || w3 < 0) && (u > 0 || w2 > 0 || w3 > 0)) {
            return Double.NaN;
        }
        double det = u + w2 + w3;
        if (det == 0) {
            return Double.NaN;
        }
        if (u == 0 || w2 == 0 || w3 == 0) {
            double s = det > 0 ? 1 : -1;
            // inward gradients (Cy−By, Bx−Cx), (Ay−Cy, Cx−Ax), (By−Ay, Ax−Bx), oriented by s
            if (u == 0 && !accept(s * (pcy - pby), s * (pbx - pcx))) {
                return Double.NaN;
            }
            if (w2 == 0 && !accept(s * (pay - pcy), s * (pcx - pax))) {
                return Double.NaN;
            }
            if (w3 == 0 && !accept(s * (pby - pay), s * (pax - pbx))) {
                return Double.NaN;
            }
        }
        double t = (u * sz * akz + w2 * sz * bkz + w3 * sz * ckz) / det;
        if (!(t >= tMin && t <= tMax)) {
            return Double.NaN;
        }
        return t;
    }

    /** Tie-break: a step in direction (1, δ) moves inside the edge with inward gradient (gx, gy). */
    private static boolean accept(double gx, double gy) {
        return gx > 0 || (gx == 0 && gy > 0);
    }
}
