package org.exitance.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A planar convex polygon (a triangle or more vertices) that radiates from one side.
 *
 * <p>Convention: the vertices are listed counter-clockwise when seen from the radiating side, so
 * the unit normal (right-hand rule, computed by Newell's method) points into the half-space the
 * facet radiates into. Coordinates in m, area in m².
 *
 * <p>Validation (tolerances relative to the facet diameter D): every edge longer than 1e-12 D,
 * area larger than 1e-12 D², every vertex within 1e-6 D of the mean plane (planarity), and every
 * turn at a vertex counter-clockwise about the normal up to 1e-9 (convexity; collinear vertices
 * are allowed). Newell's method: e.g. Sutherland, Sproull & Schumacker (1974), also common
 * practice in graphics texts.
 *
 * <p>Immutable; the coordinate array is private and copied on access.
 */
public final class Facet {

    /** Relative planarity tolerance (vertex distance from plane / diameter). */
    public static final double PLANARITY_TOLERANCE = 1e-6;

    private final double[] xyz;
    private final Vec3 normal;
    private final double area;
    private final Vec3 centroid;
    /** Exact curved shape this polygon stands for, or null for a plain planar facet. */
    private final Patch patch;

    private Facet(double[] xyz) {
        this(xyz, null);
    }

    private Facet(double[] xyz, Patch patch) {
        this.xyz = xyz;
        this.patch = patch;
        int n = xyz.length / 3;
        if (n < 3) {
            throw new GeometryException("a facet needs at least 3 vertices, got " + n);
        }
        double diameter = 0;
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n; b++) {
                diameter = Math.max(diameter, dist(a, b));
            }
        }
        if (!(diameter > 0)) {
            throw new GeometryException("degenerate facet: all vertices coincide at " + vertex(0));
        }
        for (int a = 0; a < n; a++) {
            if (dist(a, (a + 1) % n) <= 1e-12 * diameter) {
                throw new GeometryException("degenerate facet: repeated vertex " + vertex(a));
            }
        }
        // Newell normal: twice the vector area.
        double nx = 0, ny = 0, nz = 0;
        for (int a = 0; a < n; a++) {
            int b = (a + 1) % n;
            double ax = xyz[3 * a], ay = xyz[3 * a + 1], az = xyz[3 * a + 2];
            double bx = xyz[3 * b], by = xyz[3 * b + 1], bz = xyz[3 * b + 2];
            nx += (ay - by) * (az + bz);
            ny += (az - bz) * (ax + bx);
            nz += (ax - bx) * (ay + by);
        }
        double len = Math.sqrt(nx * nx + ny * ny + nz * nz);
        if (!(len > 2e-12 * diameter * diameter)) {
            throw new GeometryException("degenerate facet: zero area (collinear vertices) starting at " + vertex(0));
        }
        this.area = 0.5 * len;
        nx /= len;
        ny /= len;
        nz /= len;
        this.normal = new Vec3(nx, ny, nz);
        // Area-weighted centroid from a fan about vertex 0.
        double cx = 0, cy = 0, cz = 0, wsum = 0;
        for (int a = 1; a + 1 < n; a++) {
            double w = triangleSignedArea(0, a, a + 1, nx, ny, nz);
            cx += w * (xyz[0] + xyz[3 * a] + xyz[3 * a + 3]) / 3;
            cy += w * (xyz[1] + xyz[3 * a + 1] + xyz[3 * a + 4]) / 3;
            cz += w * (xyz[2] + xyz[3 * a + 2] + xyz[3 * a + 5]) / 3;
            wsum += w;
        }
        this.centroid = new Vec3(cx / wsum, cy / wsum, cz / wsum);
        double d0 = nx * centroid.x() + ny * centroid.y() + nz * centroid.z();
        for (int a = 0; a < n; a++) {
            double d = nx * xyz[3 * a] + ny * xyz[3 * a + 1] + nz * xyz[3 * a + 2] - d0;
            if (Math.abs(d) > PLANARITY_TOLERANCE * diameter) {
                throw new GeometryException("non-planar facet: vertex " + a + " " + vertex(a) + " is "
                        + Math.abs(d) + " m off the plane (diameter " + diameter + " m)");
            }
        }
        for (int a = 0; a < n; a++) {
            int b = (a + 1) % n, c = (a + 2) % n;
            double ux = xyz[3 * b] - xyz[3 * a], uy = xyz[3 * b + 1] - xyz[3 * a + 1], uz = xyz[3 * b + 2] - xyz[3 * a + 2];
            double vx = xyz[3 * c] - xyz[3 * b], vy = xyz[3 * c + 1] - xyz[3 * b + 1], vz = xyz[3 * c + 2] - xyz[3 * b + 2];
            double turn = (uy * vz - uz * vy) * nx + (uz * vx - ux * vz) * ny + (ux * vy - uy * vx) * nz;
            double scale = Math.sqrt((ux * ux + uy * uy + uz * uz) * (vx * vx + vy * vy + vz * vz));
            if (turn < -1e-9 * scale) {
                throw new GeometryException("non-convex facet: reflex turn at vertex " + b + " " + vertex(b));
            }
        }
    }

    private double dist(int a, int b) {
        double dx = xyz[3 * a] - xyz[3 * b], dy = xyz[3 * a + 1] - xyz[3 * b + 1], dz = xyz[3 * a + 2] - xyz[3 * b + 2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    private double triangleSignedArea(int a, int b, int c, double nx, double ny, double nz) {
        double ux = xyz[3 * b] - xyz[3 * a], uy = xyz[3 * b + 1] - xyz[3 * a + 1], uz = xyz[3 * b + 2] - xyz[3 * a + 2];
        double vx = xyz[3 * c] - xyz[3 * a], vy = xyz[3 * c + 1] - xyz[3 * a + 1], vz = xyz[3 * c + 2] - xyz[3 * a + 2];
        return 0.5 * ((uy * vz - uz * vy) * nx + (uz * vx - ux * vz) * ny + (ux * vy - uy * vx) * nz);
    }

    /**
     * Builds a facet from its vertices, counter-clockwise seen from the radiating side.
     *
     * @param vertices at least three vertices (m); the array is not modified
     * @return the validated facet
     * @throws GeometryException if degenerate, non-planar or non-convex
     */
    public static Facet of(Vec3... vertices) {
        double[] c = new double[3 * vertices.length];
        for (int k = 0; k < vertices.length; k++) {
            c[3 * k] = vertices[k].x();
            c[3 * k + 1] = vertices[k].y();
            c[3 * k + 2] = vertices[k].z();
        }
        return new Facet(c);
    }

    /**
     * @param vertices at least three vertices (m), counter-clockwise seen from the radiating side
     * @return the validated facet
     * @throws GeometryException if degenerate, non-planar or non-convex
     */
    public static Facet of(List<Vec3> vertices) {
        return of(vertices.toArray(new Vec3[0]));
    }

    /**
     * Builds a facet from packed coordinates (x0, y0, z0, x1, ...).
     *
     * @param xyz packed coordinates (m); not modified (copied)
     * @return the validated facet
     */
    public static Facet ofCoordinates(double[] xyz) {
        if (xyz.length % 3 != 0) {
            throw new GeometryException("coordinate count " + xyz.length + " is not a multiple of 3");
        }
        return new Facet(xyz.clone());
    }

    /**
     * The same polygon standing for an exact curved (or circular) patch: view factors and
     * {@link #exactArea()} then use the patch; the polygon remains for rays and drawing.
     *
     * @param p the exact shape (its radiating side must agree with this polygon's normal)
     * @return a new facet
     */
    public Facet withPatch(Patch p) {
        return new Facet(xyz, p);
    }

    /** @return the exact shape behind this facet, or null for a plain planar facet */
    public Patch patch() {
        return patch;
    }

    /** @return the exact area (m²): the patch's if there is one, else the polygon's */
    public double exactArea() {
        return patch == null ? area : patch.area();
    }

    /** @return number of vertices */
    public int vertexCount() {
        return xyz.length / 3;
    }

    /** @return vertex k (m) */
    public Vec3 vertex(int k) {
        return new Vec3(xyz[3 * k], xyz[3 * k + 1], xyz[3 * k + 2]);
    }

    /** @return the vertices in order (m) */
    public List<Vec3> vertices() {
        List<Vec3> v = new ArrayList<>(vertexCount());
        for (int k = 0; k < vertexCount(); k++) {
            v.add(vertex(k));
        }
        return List.copyOf(v);
    }

    /** @return a copy of the packed coordinates (m) */
    public double[] coordinates() {
        return xyz.clone();
    }

    /**
     * Copies the packed coordinates into {@code dest}.
     *
     * @param dest destination; modified at [offset, offset + 3 · vertexCount)
     * @param offset first index written
     */
    public void copyCoordinates(double[] dest, int offset) {
        System.arraycopy(xyz, 0, dest, offset, xyz.length);
    }

    /** @return the unit normal, pointing to the radiating side */
    public Vec3 normal() {
        return normal;
    }

    /** @return area of the polygon (m²); see {@link #exactArea()} for curved facets */
    public double area() {
        return area;
    }

    /** @return area centroid (m) */
    public Vec3 centroid() {
        return centroid;
    }

    /** @return the largest distance from the centroid to a vertex (m) */
    public double circumradius() {
        double r = 0;
        for (int k = 0; k < vertexCount(); k++) {
            r = Math.max(r, vertex(k).distance(centroid));
        }
        return r;
    }

    /** @return the same polygon radiating from the other side (vertex order reversed) */
    public Facet reversed() {
        int n = vertexCount();
        double[] r = new double[xyz.length];
        for (int k = 0; k < n; k++) {
            System.arraycopy(xyz, 3 * (n - 1 - k), r, 3 * k, 3);
        }
        return new Facet(r, patch == null ? null : patch.reversed());
    }

    /** @return this facet moved by {@code t} */
    public Facet transformed(Transform t) {
        double[] r = new double[xyz.length];
        for (int k = 0; k < vertexCount(); k++) {
            Vec3 p = t.apply(vertex(k));
            r[3 * k] = p.x();
            r[3 * k + 1] = p.y();
            r[3 * k + 2] = p.z();
        }
        return new Facet(r, patch == null ? null : patch.transformed(t));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Facet f && Arrays.equals(xyz, f.xyz) && java.util.Objects.equals(patch, f.patch);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(xyz);
    }

    @Override
    public String toString() {
        return "facet " + vertices();
    }
}
