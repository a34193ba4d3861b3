package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.locationtech.jts.algorithm.ConvexHull;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.operation.union.UnaryUnionOp;

/**
 * A proof that a pair is entirely hidden: occluder facets that lie in one plane are merged into
 * one region (their union, by the JTS Topology Suite); if that plane separates the two polygons
 * of a pair and the region covers the cross-section of the pair's convex hull with the plane,
 * every segment from one polygon to the other passes through the region, so the pair sees
 * nothing of each other. The cross-section of the hull of P ∪ Q with a plane that separates P
 * and Q is the convex hull of the points where the segments between their vertices cross it.
 *
 * <p>The merged regions are built once and shared; each worker thread uses its own
 * {@link Prepared} view (prepared geometries for fast covering tests).
 */
final class CoplanarOccluders {

    private final FacetTable t;
    /** Group of each facet, or −1 for facets that are not occluders. */
    private final int[] groupOf;
    /** Per group: unit normal and offset (n·x = d), and a 2-D basis u, v of the plane. */
    private final double[][] frame;
    private final Geometry[] region;
    /** Per group: the convex outline of the merged face (packed xyz), or null. */
    private final double[][] merged;
    /** Per group: the same outline in the plane's (u, v) coordinates, or null. */
    private final double[][] mergedUv;
    /** Per group: which way its facets face (see {@link #facing}). */
    private final int[] facing;
    private final GeometryFactory factory = new GeometryFactory();

    /**
     * @param t the facets
     * @param occluder which facets are occluders (not modified)
     */
    CoplanarOccluders(FacetTable t, boolean[] occluder) {
        this.t = t;
        groupOf = new int[t.count];
        java.util.Arrays.fill(groupOf, -1);
        Map<List<Long>, Integer> ids = new HashMap<>();
        List<double[]> frames = new ArrayList<>();
        List<List<Polygon>> members = new ArrayList<>();
        double lengthStep = 1e-9 * t.sceneSize;
        for (int f = 0; f < t.count; f++) {
            if (!occluder[f]) {
                continue;
            }
            double nx = t.normal[3 * f], ny = t.normal[3 * f + 1], nz = t.normal[3 * f + 2];
            // unoriented plane: the first non-zero component positive
            double sign = nx > 1e-12 || (Math.abs(nx) <= 1e-12 && (ny > 1e-12 || (Math.abs(ny) <= 1e-12 && nz > 0)))
                    ? 1 : -1;
            nx *= sign;
            ny *= sign;
            nz *= sign;
            double d = nx * t.centroid[3 * f] + ny * t.centroid[3 * f + 1] + nz * t.centroid[3 * f + 2];
            List<Long> key = List.of(Math.round(nx * 1e9), Math.round(ny * 1e9), Math.round(nz * 1e9),
                    Math.round(d / lengthStep));
            Integer id = ids.get(key);
            if (id == null) {
                id = frames.size();
                ids.put(key, id);
                frames.add(frameOf(nx, ny, nz, d));
                members.add(new ArrayList<>());
            }
            groupOf[f] = id;
            members.get(id).add(polygon(f, frames.get(id)));
        }
        frame = frames.toArray(new double[0][]);
        region = new Geometry[frame.length];
        merged = new double[frame.length][];
        mergedUv = new double[frame.length][];
        for (int g = 0; g < region.length; g++) {
            region[g] = UnaryUnionOp.union(members.get(g));
            merged[g] = convexOutline(region[g], frame[g], 1e-9 * t.sceneSize);
            if (merged[g] != null) {
                double[] m3 = merged[g], fr = frame[g];
                double[] uv = new double[2 * (m3.length / 3)];
                for (int k = 0; k < uv.length / 2; k++) {
                    Coordinate c = project(fr, m3[3 * k], m3[3 * k + 1], m3[3 * k + 2]);
                    uv[2 * k] = c.x;
                    uv[2 * k + 1] = c.y;
                }
                mergedUv[g] = uv;
            }
        }
        facing = new int[frame.length];
        for (int f = 0; f < t.count; f++) {
            int g = groupOf[f];
            if (g < 0) {
                continue;
            }
            double[] fr = frame[g];
            int side = fr[0] * t.normal[3 * f] + fr[1] * t.normal[3 * f + 1] + fr[2] * t.normal[3 * f + 2] > 0 ? 1 : -1;
            facing[g] = facing[g] == 0 ? side : (facing[g] == side ? side : 2);
        }
    }

    /**
     * The outline of a merged face as packed 3-D vertices, counter-clockwise about the group's
     * normal, when it is one convex polygon without holes of at most 120 corners (collinear
     * vertices dropped); else null.
     */
    private static double[] convexOutline(Geometry g, double[] fr, double tol) {
        if (g.getNumGeometries() != 1 || !(g.getGeometryN(0) instanceof Polygon poly) || poly.getNumInteriorRing() > 0) {
            return null;
        }
        double hull = poly.convexHull().getArea();
        if (!(hull > 0) || hull - poly.getArea() > 1e-9 * hull) {
            return null;
        }
        Coordinate[] c = poly.getExteriorRing().getCoordinates(); // closed ring
        int n = c.length - 1;
        boolean ccw = org.locationtech.jts.algorithm.Orientation.isCCW(c);
        List<double[]> kept = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            Coordinate prev = c[(k + n - 1) % n], here = c[k], next = c[(k + 1) % n];
            double cross = (here.x - prev.x) * (next.y - here.y) - (here.y - prev.y) * (next.x - here.x);
            double scale = Math.hypot(here.x - prev.x, here.y - prev.y) * Math.hypot(next.x - here.x, next.y - here.y);
            if (Math.abs(cross) > 1e-12 * scale && scale > tol * tol) {
                kept.add(new double[] {here.x, here.y});
            }
        }
        if (kept.size() < 3 || kept.size() > 120) {
            return null;
        }
        if (!ccw) {
            java.util.Collections.reverse(kept);
        }
        double[] out = new double[3 * kept.size()];
        for (int k = 0; k < kept.size(); k++) {
            double u = kept.get(k)[0], v = kept.get(k)[1];
            for (int a = 0; a < 3; a++) {
                out[3 * k + a] = fr[3] * fr[a] + u * fr[4 + a] + v * fr[7 + a];
            }
        }
        return out;
    }

    /** @return the convex outline of facet f's merged face (packed xyz, shared: not to be modified), or null */
    double[] outline(int f) {
        return groupOf[f] < 0 ? null : merged[groupOf[f]];
    }

    /**
     * @return +1 or −1 when every facet of group g faces the positive (negative) side of its
     *         plane, 2 when they face both ways
     */
    int facing(int g) {
        return facing[g];
    }

    private static double[] frameOf(double nx, double ny, double nz, double d) {
        // u: a unit vector perpendicular to n; v = n × u
        double ax = Math.abs(nx) < 0.9 ? 1 : 0, ay = ax == 1 ? 0 : 1;
        double ux = ay * nz, uy = -ax * nz, uz = ax * ny - ay * nx;
        double len = Math.sqrt(ux * ux + uy * uy + uz * uz);
        ux /= len;
        uy /= len;
        uz /= len;
        double vx = ny * uz - nz * uy, vy = nz * ux - nx * uz, vz = nx * uy - ny * ux;
        return new double[] {nx, ny, nz, d, ux, uy, uz, vx, vy, vz};
    }

    private Polygon polygon(int f, double[] fr) {
        int v0 = t.vertexStart[f], n = t.vertexStart[f + 1] - v0;
        Coordinate[] c = new Coordinate[n + 1];
        for (int k = 0; k < n; k++) {
            c[k] = project(fr, t.xyz[3 * (v0 + k)], t.xyz[3 * (v0 + k) + 1], t.xyz[3 * (v0 + k) + 2]);
        }
        c[n] = c[0];
        return factory.createPolygon(c);
    }

    private static Coordinate project(double[] fr, double x, double y, double z) {
        return new Coordinate(fr[4] * x + fr[5] * y + fr[6] * z, fr[7] * x + fr[8] * y + fr[9] * z);
    }

    /** @return the coplanar group of facet f, or −1 if it is not an occluder */
    int group(int f) {
        return groupOf[f];
    }

    /** @return unit normal and offset (n·x = d) of group g, in a new array */
    double[] plane(int g) {
        return java.util.Arrays.copyOf(frame[g], 4);
    }

    /** @return the number of groups */
    int groups() {
        return frame.length;
    }

    /** @return a view for one thread */
    Prepared prepared() {
        return new Prepared();
    }

    /** One thread's view: prepared regions, built on first use. Not thread-safe. */
    final class Prepared {

        private final PreparedGeometry[] prepared = new PreparedGeometry[region.length];

        /** @return the shared merged faces this view belongs to */
        CoplanarOccluders owner() {
            return CoplanarOccluders.this;
        }
        private final int[] seen = new int[region.length];
        private int stamp;
        private final Coordinate[] points = new Coordinate[Poly.MAX_VERTICES * Poly.MAX_VERTICES];

        /**
         * @param p one polygon (not modified)
         * @param q the other (not modified)
         * @param occ occluder facets in the pair's hull (not modified)
         * @param count entries of {@code occ} used
         * @return true if one merged region provably hides q from p entirely
         */
        boolean hides(Poly p, Poly q, int[] occ, int count) {
            stamp++;
            for (int k = 0; k < count; k++) {
                int g = groupOf[occ[k]];
                if (g < 0 || seen[g] == stamp) {
                    continue;
                }
                seen[g] = stamp;
                if (covers(g, p, q)) {
                    return true;
                }
            }
            return false;
        }

        private boolean covers(int g, Poly p, Poly q) {
            double[] fr = frame[g];
            double tol = 1e-9 * t.sceneSize;
            int sp = side(p, fr, tol), sq = side(q, fr, tol);
            if (sp == 0 || sq == 0 || sp == sq || p.n * q.n > points.length) {
                return false;
            }
            int m = 0;
            for (int a = 0; a < p.n; a++) {
                double ax = p.xyz[3 * a], ay = p.xyz[3 * a + 1], az = p.xyz[3 * a + 2];
                double da = fr[0] * ax + fr[1] * ay + fr[2] * az - fr[3];
                for (int b = 0; b < q.n; b++) {
                    double bx = q.xyz[3 * b], by = q.xyz[3 * b + 1], bz = q.xyz[3 * b + 2];
                    double db = fr[0] * bx + fr[1] * by + fr[2] * bz - fr[3];
                    double s = da / (da - db);
                    points[m++] = project(fr, ax + s * (bx - ax), ay + s * (by - ay), az + s * (bz - az));
                }
            }
            double[] uv = mergedUv[g];
            if (uv != null) {
                // a convex face: the hull of the points is inside it if every point is
                return insideConvex(uv, points, m, 1e-12 * t.sceneSize);
            }
            Geometry hull = new ConvexHull(java.util.Arrays.copyOf(points, m), factory).getConvexHull();
            if (prepared[g] == null) {
                prepared[g] = PreparedGeometryFactory.prepare(region[g]);
            }
            return prepared[g].covers(hull);
        }

        /** @return whether every point lies inside (or on) the counter-clockwise convex outline uv */
        private boolean insideConvex(double[] uv, Coordinate[] pts, int m, double tol) {
            int n = uv.length / 2;
            for (int k = 0; k < m; k++) {
                double x = pts[k].x, y = pts[k].y;
                for (int e = 0; e < n; e++) {
                    int f = (e + 1) % n;
                    double ex = uv[2 * f] - uv[2 * e], ey = uv[2 * f + 1] - uv[2 * e + 1];
                    double cross = ex * (y - uv[2 * e + 1]) - ey * (x - uv[2 * e]);
                    if (cross < -tol * Math.hypot(ex, ey)) {
                        return false;
                    }
                }
            }
            return true;
        }

        /** @return +1 all vertices beyond tol above the plane, −1 all below, 0 otherwise */
        private int side(Poly poly, double[] fr, double tol) {
            boolean above = false, below = false;
            for (int k = 0; k < poly.n; k++) {
                double s = fr[0] * poly.xyz[3 * k] + fr[1] * poly.xyz[3 * k + 1] + fr[2] * poly.xyz[3 * k + 2] - fr[3];
                if (s > tol) {
                    above = true;
                } else {
                    below |= s < -tol;
                    if (s >= -tol) {
                        return 0;
                    }
                }
            }
            return above && below ? 0 : (above ? 1 : -1);
        }
    }
}
