package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.List;
import org.locationtech.jts.algorithm.ConvexHull;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.operation.overlayng.OverlayNG;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

/**
 * Test-side reference for the view factor from a differential element to the part of a convex
 * planar polygon that a closed capped cylinder or a sphere does not hide, built by a polygonal
 * shadow and shares no code with the calculator.
 *
 * <p>Method. Points on the body's outline are projected centrally from the element onto the
 * polygon's plane; their convex hull (JTS {@link ConvexHull}) is a polygon inscribed in the true
 * shadow. Its intersection with the polygon (JTS OverlayNG, in 2-D coordinates of the plane) is
 * subtracted: F = F(q) − F(q ∩ shadow), each by the contour form for an element to a polygon,
 * F = (1/2π) Σ_k γ_k n·(a_k × a_{k+1})/|a_k × a_{k+1}| (Siegel &amp; Howell, Thermal Radiation
 * Heat Transfer, 4th ed., §4.3, from memory). The hull's area error falls like 1/N² in the
 * number N of points, so the value at N, 2N and 4N is extrapolated (Richardson, common practice):
 * R(N, 2N) = (4 F_{2N} − F_N)/3; the returned value is R(2N, 4N), its error estimate
 * |R(2N, 4N) − R(N, 2N)|.
 *
 * <p>Outline points. A capped cylinder is the convex hull of its two rim circles, so its shadow is
 * the hull of the two projected rims; the two lateral generators whose tangent planes pass
 * through the element (radial direction w with w·p = r, p the element's offset from the axis)
 * are the only straight parts of the shadow's boundary, and their angles are made nodes of the
 * sampling so that each arc of a rim between them is sampled evenly (otherwise the hull's
 * bridges would carry an error of order 1/N² that varies erratically with N). A sphere's shadow
 * is that of its circle of tangency from the element: centre c + (r²/d²)(x − c), radius
 * r √(d² − r²)/d, d = |x − c| (elementary geometry).
 *
 * <p>Scope. The polygon lies wholly in front of the element; the whole body lies strictly beyond
 * the plane through the element parallel to the polygon and not beyond the polygon's plane (so
 * the element is outside the body and every body point projects onto the plane). Anything else
 * throws {@link IllegalArgumentException}. No argument array is modified.
 */
final class RoundShadowReference {
    /** Outline points at the coarsest of the three levels (per rim, or on the tangency circle). */
    static final int BASE_POINTS = 512;

    private static final GeometryFactory JTS = new GeometryFactory();

    /** The three levels, the extrapolated value and its error estimate (all dimensionless). */
    record Estimate(double coarse, double middle, double fine, double value, double errorEstimate) {
    }

    private RoundShadowReference() {
    }

    /**
     * F from the element at x (unit normal n) to the part of q not hidden by the cylinder with base
     * centre b, unit axis a, radius r (m) and length (m). q: vertices x0,y0,z0,x1,..., convex and
     * planar. No array is modified.
     */
    static double visiblePastCylinder(double[] x, double[] n, double[] q, double[] b, double[] a, double r,
            double length) {
        return cylinderEstimate(x, n, q, b, a, r, length, BASE_POINTS).value();
    }

    /** F from the element at x (unit normal n) to the part of q not hidden by the sphere (c, r). */
    static double visiblePastSphere(double[] x, double[] n, double[] q, double[] c, double r) {
        return sphereEstimate(x, n, q, c, r, BASE_POINTS).value();
    }

    /** As {@link #visiblePastCylinder}, with the levels; base = outline points per rim at the coarsest. */
    static Estimate cylinderEstimate(double[] x, double[] n, double[] q, double[] b, double[] a, double r,
            double length, int base) {
        Receiver rec = new Receiver(x, n, q);
        checkUnit(a, "axis");
        if (!(r > 0) || !(length > 0) || !finite(b)) {
            throw new IllegalArgumentException("cylinder needs a finite base, radius > 0 and length > 0");
        }
        double[] top = add(b, scale(a, length));
        double spread = r * Math.sqrt(Math.max(0, 1 - dot(rec.toward, a) * dot(rec.toward, a)));
        rec.checkDepths(Math.min(rec.depth(b), rec.depth(top)) - spread,
                Math.max(rec.depth(b), rec.depth(top)) + spread);
        double[] offset = sub(x, b);
        double[] p = sub(offset, scale(a, dot(offset, a)));
        double rho = norm(p);
        double[] e = rho > r * (1 + 1e-12) ? scale(p, 1 / rho) : anyPerpendicular(a);
        double[] f = cross(a, e);
        double half = rho > r * (1 + 1e-12) ? Math.acos(r / rho) : 0;
        int near = half > 0 ? Math.max(2, (int) Math.round(base * half / Math.PI)) : 0;
        int far = base - near;
        double[] levels = new double[3];
        for (int level = 0; level < 3; level++) {
            int k = 1 << level;
            double[] angles = arcAngles(half, near * k, far * k);
            List<Coordinate> pts = new ArrayList<>(2 * angles.length);
            for (double[] centre : new double[][] {b, top}) {
                for (double psi : angles) {
                    double[] w = add(scale(e, Math.cos(psi)), scale(f, Math.sin(psi)));
                    pts.add(rec.project(add(centre, scale(w, r))));
                }
            }
            levels[level] = rec.visible(pts);
        }
        return extrapolate(levels);
    }

    /** As {@link #visiblePastSphere}, with the levels; base = points on the tangency circle at the coarsest. */
    static Estimate sphereEstimate(double[] x, double[] n, double[] q, double[] c, double r, int base) {
        Receiver rec = new Receiver(x, n, q);
        if (!(r > 0) || !finite(c)) {
            throw new IllegalArgumentException("sphere needs a finite centre and radius > 0");
        }
        rec.checkDepths(rec.depth(c) - r, rec.depth(c) + r);
        double[] toX = sub(x, c);
        double d2 = dot(toX, toX);
        double[] centre = add(c, scale(toX, r * r / d2));
        double radius = r * Math.sqrt(d2 - r * r) / Math.sqrt(d2);
        double[] axis = scale(toX, 1 / Math.sqrt(d2));
        double[] e = anyPerpendicular(axis);
        double[] f = cross(axis, e);
        double[] levels = new double[3];
        for (int level = 0; level < 3; level++) {
            int m = base << level;
            List<Coordinate> pts = new ArrayList<>(m);
            for (int j = 0; j < m; j++) {
                double psi = 2 * Math.PI * j / m;
                double[] w = add(scale(e, Math.cos(psi)), scale(f, Math.sin(psi)));
                pts.add(rec.project(add(centre, scale(w, radius))));
            }
            levels[level] = rec.visible(pts);
        }
        return extrapolate(levels);
    }

    static Estimate extrapolate(double[] levels) {
        double r1 = (4 * levels[1] - levels[0]) / 3;
        double r2 = (4 * levels[2] - levels[1]) / 3;
        return new Estimate(levels[0], levels[1], levels[2], r2, Math.abs(r2 - r1));
    }

    /** Angles of the rim nodes: near arc [−half, half] in {@code near} steps, the rest in {@code far}. */
    private static double[] arcAngles(double half, int near, int far) {
        double[] out = new double[near + far];
        for (int j = 0; j < near; j++) {
            out[j] = -half + 2 * half * j / near;
        }
        for (int j = 0; j < far; j++) {
            out[near + j] = half + (2 * Math.PI - 2 * half) * j / far;
        }
        return out;
    }

    /** F from an element at x (unit normal n) to a polygon wholly in front of it; contour form. */
    static double elementToPolygon(double[] x, double[] n, List<double[]> polygon) {
        double sum = 0;
        int m = polygon.size();
        for (int k = 0; k < m; k++) {
            double[] p = sub(polygon.get(k), x);
            double[] s = sub(polygon.get((k + 1) % m), x);
            double[] c = cross(p, s);
            double len = norm(c);
            if (len > 0) {
                sum += Math.atan2(len, dot(p, s)) * dot(n, c) / len;
            }
        }
        return Math.abs(sum) / (2 * Math.PI);
    }

    /** The element, the receiving polygon and its plane (orthonormal 2-D frame at the centroid). */
    private static final class Receiver {
        final double[] x;
        final double[] n;
        final List<double[]> vertices = new ArrayList<>();
        final double[] origin = new double[3];
        final double[] toward;
        final double[] e1;
        final double[] e2;
        final double height;
        final Polygon outline;
        final double full;

        Receiver(double[] x, double[] n, double[] q) {
            if (x.length != 3 || !finite(x) || q.length % 3 != 0 || q.length < 9 || !finite(q)) {
                throw new IllegalArgumentException("element point needs 3 finite numbers, polygon 3 per vertex, >= 3");
            }
            checkUnit(n, "element normal");
            this.x = x.clone();
            this.n = n.clone();
            double[] newell = new double[3];
            for (int k = 0; k < q.length / 3; k++) {
                vertices.add(new double[] {q[3 * k], q[3 * k + 1], q[3 * k + 2]});
            }
            int m = vertices.size();
            for (int k = 0; k < m; k++) {
                double[] v = vertices.get(k);
                double[] w = vertices.get((k + 1) % m);
                newell = add(newell, cross(v, w));
                for (int i = 0; i < 3; i++) {
                    origin[i] += v[i] / m;
                }
            }
            double twiceArea = norm(newell);
            double size = 0;
            for (double[] v : vertices) {
                size = Math.max(size, norm(sub(v, origin)));
            }
            if (!(twiceArea > 1e-12 * size * size)) {
                throw new IllegalArgumentException("polygon has no area");
            }
            double[] normal = scale(newell, 1 / twiceArea);
            double side = dot(normal, sub(origin, x));
            toward = side > 0 ? normal : scale(normal, -1);
            height = Math.abs(side);
            double scale = Math.max(size, height);
            if (!(height > 1e-9 * scale)) {
                throw new IllegalArgumentException("element lies in the polygon's plane");
            }
            for (int k = 0; k < m; k++) {
                double[] v = vertices.get(k);
                double[] edge = sub(vertices.get((k + 1) % m), v);
                double[] next = sub(vertices.get((k + 2) % m), vertices.get((k + 1) % m));
                if (Math.abs(dot(normal, sub(v, origin))) > 1e-9 * scale) {
                    throw new IllegalArgumentException("polygon is not planar");
                }
                if (dot(cross(edge, next), normal) < -1e-12 * scale * scale) {
                    throw new IllegalArgumentException("polygon is not convex");
                }
                if (dot(n, sub(v, x)) < -1e-12 * scale) {
                    throw new IllegalArgumentException("polygon is not wholly in front of the element");
                }
            }
            double[] first = sub(vertices.get(1), vertices.get(0));
            if (!(norm(first) > 1e-12 * scale)) {
                throw new IllegalArgumentException("polygon's first two vertices coincide");
            }
            e1 = scale(first, 1 / norm(first));
            e2 = cross(normal, e1);
            Coordinate[] ring = new Coordinate[m + 1];
            for (int k = 0; k <= m; k++) {
                ring[k] = plane(vertices.get(k % m));
            }
            outline = JTS.createPolygon(ring);
            full = elementToPolygon(this.x, this.n, vertices);
        }

        /** Distance (m) of a point beyond the plane through the element parallel to the polygon. */
        double depth(double[] y) {
            return dot(toward, sub(y, x));
        }

        /** The body's depth range must lie in (0, height]: in front of the element, not beyond q. */
        void checkDepths(double min, double max) {
            if (!(min > 1e-6 * height)) {
                throw new IllegalArgumentException(
                        "body reaches the plane through the element parallel to the polygon");
            }
            if (max > height * (1 + 1e-12)) {
                throw new IllegalArgumentException("body reaches beyond the polygon's plane");
            }
        }

        Coordinate plane(double[] z) {
            double[] d = sub(z, origin);
            return new Coordinate(dot(d, e1), dot(d, e2));
        }

        Coordinate project(double[] y) {
            double[] d = sub(y, x);
            return plane(add(x, scale(d, height / dot(toward, d))));
        }

        /** F(q) − F(q ∩ hull of the projected points). */
        double visible(List<Coordinate> shadowPoints) {
            Geometry hull = new ConvexHull(shadowPoints.toArray(new Coordinate[0]), JTS).getConvexHull();
            Geometry cut = OverlayNGRobust.overlay(outline, hull, OverlayNG.INTERSECTION);
            double hidden = 0;
            for (int g = 0; g < cut.getNumGeometries(); g++) {
                if (cut.getGeometryN(g) instanceof Polygon piece && piece.getArea() > 0) {
                    Coordinate[] ring = piece.getExteriorRing().getCoordinates();
                    List<double[]> pts = new ArrayList<>(ring.length - 1);
                    for (int k = 0; k + 1 < ring.length; k++) {
                        pts.add(add(origin, add(scale(e1, ring[k].x), scale(e2, ring[k].y))));
                    }
                    hidden += elementToPolygon(x, n, pts);
                }
            }
            return full - hidden;
        }
    }

    private static void checkUnit(double[] v, String what) {
        if (v.length != 3 || !finite(v) || Math.abs(norm(v) - 1) > 1e-9) {
            throw new IllegalArgumentException(what + " must be a unit 3-vector");
        }
    }

    private static boolean finite(double[] v) {
        for (double d : v) {
            if (!Double.isFinite(d)) {
                return false;
            }
        }
        return true;
    }

    private static double[] anyPerpendicular(double[] a) {
        double[] t = Math.abs(a[0]) < 0.6 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
        double[] p = cross(a, t);
        return scale(p, 1 / norm(p));
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    static double[] add(double[] a, double[] b) {
        return new double[] {a[0] + b[0], a[1] + b[1], a[2] + b[2]};
    }

    static double[] sub(double[] a, double[] b) {
        return new double[] {a[0] - b[0], a[1] - b[1], a[2] - b[2]};
    }

    static double[] scale(double[] a, double s) {
        return new double[] {a[0] * s, a[1] * s, a[2] * s};
    }

    static double norm(double[] a) {
        return Math.sqrt(dot(a, a));
    }
}
