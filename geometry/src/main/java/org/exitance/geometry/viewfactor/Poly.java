package org.exitance.geometry.viewfactor;

/**
 * Working copy of a planar convex polygon on primitive arrays: packed vertices (m), unit normal,
 * area (m²), centroid (m) and circumradius about the centroid (m). Mutable, owned by one thread.
 */
final class Poly {

    static final int MAX_VERTICES = 128;
    /** Largest quadrature order that scratch arrays are sized for. */
    static final int MAX_RULE_ORDER = 17;
    /** Doubles needed for one rule of order ≤ MAX_RULE_ORDER on any polygon. */
    static final int RULE_SCRATCH = 4 * (MAX_VERTICES - 2) * MAX_RULE_ORDER * MAX_RULE_ORDER;

    final double[] xyz = new double[3 * MAX_VERTICES];
    int n;
    double nx, ny, nz;
    double area;
    double cx, cy, cz;
    double radius;
    /** Global facet index. */
    int facet = -1;
    /** True when this polygon is a clipped part of its facet. */
    boolean clipped;

    /** Loads facet {@code f} of the table. Modifies this. */
    void load(FacetTable t, int f) {
        int v0 = t.vertexStart[f], v1 = t.vertexStart[f + 1];
        n = v1 - v0;
        System.arraycopy(t.xyz, 3 * v0, xyz, 0, 3 * n);
        nx = t.normal[3 * f];
        ny = t.normal[3 * f + 1];
        nz = t.normal[3 * f + 2];
        area = t.area[f];
        cx = t.centroid[3 * f];
        cy = t.centroid[3 * f + 1];
        cz = t.centroid[3 * f + 2];
        radius = t.radius[f];
        facet = f;
        clipped = false;
    }

    /**
     * Loads a polygon given by packed vertices (counter-clockwise about the normal).
     *
     * @param v packed xyz (not modified)
     * @param count vertices
     */
    void set(double[] v, int count, double unx, double uny, double unz) {
        n = count;
        System.arraycopy(v, 0, xyz, 0, 3 * count);
        nx = unx;
        ny = uny;
        nz = unz;
        facet = -1;
        clipped = true;
        updateMeasures();
    }

    /** Recomputes area, centroid and radius from the vertices (normal kept). Modifies this. */
    void updateMeasures() {
        double a = 0, sx = 0, sy = 0, sz = 0;
        for (int k = 1; k + 1 < n; k++) {
            double ux = xyz[3 * k] - xyz[0], uy = xyz[3 * k + 1] - xyz[1], uz = xyz[3 * k + 2] - xyz[2];
            double vx = xyz[3 * k + 3] - xyz[0], vy = xyz[3 * k + 4] - xyz[1], vz = xyz[3 * k + 5] - xyz[2];
            double w = 0.5 * ((uy * vz - uz * vy) * nx + (uz * vx - ux * vz) * ny + (ux * vy - uy * vx) * nz);
            a += w;
            sx += w * (xyz[0] + xyz[3 * k] + xyz[3 * k + 3]) / 3;
            sy += w * (xyz[1] + xyz[3 * k + 1] + xyz[3 * k + 4]) / 3;
            sz += w * (xyz[2] + xyz[3 * k + 2] + xyz[3 * k + 5]) / 3;
        }
        area = a;
        if (a > 0) {
            cx = sx / a;
            cy = sy / a;
            cz = sz / a;
        }
        double r = 0;
        for (int k = 0; k < n; k++) {
            double dx = xyz[3 * k] - cx, dy = xyz[3 * k + 1] - cy, dz = xyz[3 * k + 2] - cz;
            r = Math.max(r, dx * dx + dy * dy + dz * dz);
        }
        radius = Math.sqrt(r);
    }

    /**
     * Clips this polygon to the closed half-space {x : m·x ≥ d} (Sutherland & Hodgman 1974,
     * one plane). Modifies this; {@code scratch} (length ≥ 3·MAX_VERTICES) is overwritten.
     */
    void clip(double mx, double my, double mz, double d, double[] scratch) {
        clipVertices(mx, my, mz, d, scratch);
        updateMeasures();
    }

    /**
     * As {@link #clip}, but updates only the area, not the centroid and radius (which keep
     * their old values): for the many cuts of shadow projection. Modifies this.
     */
    void clipAreaOnly(double mx, double my, double mz, double d, double[] scratch) {
        clipVertices(mx, my, mz, d, scratch);
        double a = 0;
        for (int k = 1; k + 1 < n; k++) {
            double ux = xyz[3 * k] - xyz[0], uy = xyz[3 * k + 1] - xyz[1], uz = xyz[3 * k + 2] - xyz[2];
            double vx = xyz[3 * k + 3] - xyz[0], vy = xyz[3 * k + 4] - xyz[1], vz = xyz[3 * k + 5] - xyz[2];
            a += (uy * vz - uz * vy) * nx + (uz * vx - ux * vz) * ny + (ux * vy - uy * vx) * nz;
        }
        area = 0.5 * a;
    }

    private void clipVertices(double mx, double my, double mz, double d, double[] scratch) {
        int out = 0;
        for (int k = 0; k < n; k++) {
            int l = (k + 1) % n;
            double ak = mx * xyz[3 * k] + my * xyz[3 * k + 1] + mz * xyz[3 * k + 2] - d;
            double al = mx * xyz[3 * l] + my * xyz[3 * l + 1] + mz * xyz[3 * l + 2] - d;
            if (ak >= 0) {
                System.arraycopy(xyz, 3 * k, scratch, 3 * out++, 3);
            }
            if ((ak > 0 && al < 0) || (ak < 0 && al > 0)) {
                double t = ak / (ak - al);
                scratch[3 * out] = xyz[3 * k] + t * (xyz[3 * l] - xyz[3 * k]);
                scratch[3 * out + 1] = xyz[3 * k + 1] + t * (xyz[3 * l + 1] - xyz[3 * k + 1]);
                scratch[3 * out + 2] = xyz[3 * k + 2] + t * (xyz[3 * l + 2] - xyz[3 * k + 2]);
                out++;
            }
        }
        // drop vertices that (nearly) repeat their predecessor: a vertex on the plane can come
        // back as an intersection point a rounding error away, and a zero-length edge has no tangent
        double tol2 = sqDist(1e-12 * radius);
        int kept = 0;
        for (int k = 0; k < out; k++) {
            int prev = kept == 0 ? out - 1 : -1;
            double px, py, pz;
            if (prev >= 0) {
                px = scratch[3 * prev];
                py = scratch[3 * prev + 1];
                pz = scratch[3 * prev + 2];
            } else {
                px = xyz[3 * (kept - 1)];
                py = xyz[3 * (kept - 1) + 1];
                pz = xyz[3 * (kept - 1) + 2];
            }
            double dx = scratch[3 * k] - px, dy = scratch[3 * k + 1] - py, dz = scratch[3 * k + 2] - pz;
            if (dx * dx + dy * dy + dz * dz > tol2 || out == 1) {
                System.arraycopy(scratch, 3 * k, xyz, 3 * kept, 3);
                kept++;
            }
        }
        n = kept;
        clipped = true;
    }

    private static double sqDist(double d) {
        return d * d;
    }

    /** Copies {@code o} into this. Modifies this. */
    void copyFrom(Poly o) {
        n = o.n;
        System.arraycopy(o.xyz, 0, xyz, 0, 3 * n);
        nx = o.nx;
        ny = o.ny;
        nz = o.nz;
        area = o.area;
        cx = o.cx;
        cy = o.cy;
        cz = o.cz;
        radius = o.radius;
        facet = o.facet;
        clipped = o.clipped;
    }

    /**
     * Bisects this polygon by the plane through its centroid across its long axis: this keeps
     * one half, {@code other} (overwritten with a copy first) the other. Modifies this, other,
     * {@code axis} (3) and {@code scratch}.
     */
    void bisectLongAxis(Poly other, double[] axis, double[] scratch) {
        other.copyFrom(this);
        longAxis(axis);
        double d = axis[0] * cx + axis[1] * cy + axis[2] * cz;
        clip(axis[0], axis[1], axis[2], d, scratch);
        other.clip(-axis[0], -axis[1], -axis[2], -d, scratch);
    }

    /**
     * Direction of the largest extent: from the centroid to the farthest vertex (unit). Writes
     * {@code dir[0..2]} (modified).
     */
    void longAxis(double[] dir) {
        double best = -1;
        for (int k = 0; k < n; k++) {
            double dx = xyz[3 * k] - cx, dy = xyz[3 * k + 1] - cy, dz = xyz[3 * k + 2] - cz;
            double d2 = dx * dx + dy * dy + dz * dz;
            if (d2 > best) {
                best = d2;
                dir[0] = dx;
                dir[1] = dy;
                dir[2] = dz;
            }
        }
        double len = Math.sqrt(best);
        dir[0] /= len;
        dir[1] /= len;
        dir[2] /= len;
    }
}
