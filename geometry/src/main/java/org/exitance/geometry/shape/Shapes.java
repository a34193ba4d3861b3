package org.exitance.geometry.shape;

import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Patch;
import org.exitance.geometry.Vec3;

/**
 * Primitive shapes meshed into planar convex facets at a resolution chosen by the caller.
 * Lengths in m, angles in rad.
 *
 * <p>Curved shapes are meshed into inscribed polygons (chords), and each polygon carries the exact
 * piece of the round shape it stands for ({@link Patch}): view factors and areas use the exact
 * pieces ({@link Facet#exactArea()}); the polygons serve rays, drawing and export.
 *
 * <p>Orientation: every facet lists its vertices counter-clockwise seen from the radiating side
 * (see {@link Facet}). Azimuth φ is measured in the frame of {@link Frame#about}.
 */
public final class Shapes {

    private Shapes() {
    }

    private static void positive(int n, String what) {
        if (n < 1) {
            throw new GeometryException(what + " must be at least 1, got " + n);
        }
    }

    /**
     * A parallelogram with corners o, o+u, o+u+v, o+v, radiating along u × v, divided into
     * nu × nv equal parallelograms.
     *
     * @param origin corner o (m)
     * @param edgeU first edge u (m)
     * @param edgeV second edge v (m)
     * @param nu divisions along u (≥ 1)
     * @param nv divisions along v (≥ 1)
     * @return nu·nv facets, row by row along u
     */
    public static List<Facet> parallelogram(Vec3 origin, Vec3 edgeU, Vec3 edgeV, int nu, int nv) {
        positive(nu, "nu");
        positive(nv, "nv");
        List<Facet> out = new ArrayList<>(nu * nv);
        for (int b = 0; b < nv; b++) {
            for (int a = 0; a < nu; a++) {
                Vec3 p00 = corner(origin, edgeU, edgeV, (double) a / nu, (double) b / nv);
                Vec3 p10 = corner(origin, edgeU, edgeV, (double) (a + 1) / nu, (double) b / nv);
                Vec3 p11 = corner(origin, edgeU, edgeV, (double) (a + 1) / nu, (double) (b + 1) / nv);
                Vec3 p01 = corner(origin, edgeU, edgeV, (double) a / nu, (double) (b + 1) / nv);
                out.add(Facet.of(p00, p10, p11, p01));
            }
        }
        return out;
    }

    private static Vec3 corner(Vec3 o, Vec3 u, Vec3 v, double s, double t) {
        return new Vec3(o.x() + s * u.x() + t * v.x(), o.y() + s * u.y() + t * v.y(), o.z() + s * u.z() + t * v.z());
    }

    /**
     * A rectangle: a parallelogram whose edges are perpendicular.
     *
     * @see #parallelogram
     * @throws GeometryException if u · v is not 0 (to 1e-9 |u||v|)
     */
    public static List<Facet> rectangle(Vec3 origin, Vec3 edgeU, Vec3 edgeV, int nu, int nv) {
        if (Math.abs(edgeU.dot(edgeV)) > 1e-9 * edgeU.length() * edgeV.length()) {
            throw new GeometryException("rectangle edges are not perpendicular: " + edgeU + ", " + edgeV);
        }
        return parallelogram(origin, edgeU, edgeV, nu, nv);
    }

    /**
     * A convex polygon, either as one facet ({@code divisions} = 1) or split into a fan of
     * triangles about its centroid, each divided into divisions² similar triangles.
     *
     * @param vertices counter-clockwise seen from the radiating side (m)
     * @param divisions ≥ 1
     * @return the facets
     */
    public static List<Facet> convexPolygon(List<Vec3> vertices, int divisions) {
        positive(divisions, "divisions");
        Facet whole = Facet.of(vertices);
        if (divisions == 1) {
            return List.of(whole);
        }
        Vec3 c = whole.centroid();
        List<Facet> out = new ArrayList<>();
        int n = vertices.size();
        for (int k = 0; k < n; k++) {
            Vec3 a = vertices.get(k), b = vertices.get((k + 1) % n);
            if (Facet.of(c, a, b).area() <= 0) {
                continue;
            }
            subdivideTriangle(c, a, b, divisions, out);
        }
        return out;
    }

    /** Splits triangle (p, q, r) into d² similar triangles; appends to {@code out} (modified). */
    static void subdivideTriangle(Vec3 p, Vec3 q, Vec3 r, int d, List<Facet> out) {
        Vec3 eq = q.minus(p).times(1.0 / d), er = r.minus(p).times(1.0 / d);
        for (int i = 0; i < d; i++) {
            for (int j = 0; i + j < d; j++) {
                Vec3 a = p.plus(eq.times(i)).plus(er.times(j));
                out.add(Facet.of(a, a.plus(eq), a.plus(er)));
                if (i + j + 1 < d) {
                    out.add(Facet.of(a.plus(eq), a.plus(eq).plus(er), a.plus(er)));
                }
            }
        }
    }

    /**
     * A disc radiating along {@code normal}: {@code radial} rings (the innermost a fan of
     * triangles) of {@code azimuthal} facets each.
     *
     * @param center centre (m)
     * @param normal radiating direction (any length)
     * @param radius radius (m), &gt; 0
     * @param radial rings (≥ 1)
     * @param azimuthal divisions around (≥ 3)
     * @return the facets
     */
    public static List<Facet> disc(Vec3 center, Vec3 normal, double radius, int radial, int azimuthal) {
        return annulus(center, normal, 0, radius, radial, azimuthal);
    }

    /**
     * An annulus (a disc when the inner radius is 0) radiating along {@code normal}.
     *
     * @param center centre (m)
     * @param normal radiating direction
     * @param innerRadius inner radius (m), ≥ 0
     * @param outerRadius outer radius (m), &gt; innerRadius
     * @param radial rings (≥ 1)
     * @param azimuthal divisions around (≥ 3)
     * @return the facets
     */
    public static List<Facet> annulus(Vec3 center, Vec3 normal, double innerRadius, double outerRadius,
            int radial, int azimuthal) {
        positive(radial, "radial");
        if (azimuthal < 3) {
            throw new GeometryException("azimuthal divisions must be at least 3, got " + azimuthal);
        }
        if (!(innerRadius >= 0 && outerRadius > innerRadius)) {
            throw new GeometryException("need 0 <= inner radius < outer radius, got " + innerRadius + ", " + outerRadius);
        }
        Frame f = Frame.about(center, normal);
        List<Facet> out = new ArrayList<>();
        for (int k = 0; k < radial; k++) {
            double r0 = innerRadius + (outerRadius - innerRadius) * k / radial;
            double r1 = innerRadius + (outerRadius - innerRadius) * (k + 1) / radial;
            for (int m = 0; m < azimuthal; m++) {
                double p0 = 2 * Math.PI * m / azimuthal, p1 = 2 * Math.PI * ((m + 1) % azimuthal) / azimuthal; // seam shares exact vertices
                Patch exact = Patch.plane(center, f.u(), f.v(), f.a(), r0, r1, 2 * Math.PI * m / azimuthal,
                        2 * Math.PI * (m + 1) / azimuthal, 1);
                if (r0 == 0) {
                    out.add(Facet.of(center, f.at(r1, p0, 0), f.at(r1, p1, 0)).withPatch(exact));
                } else {
                    out.add(Facet.of(f.at(r0, p0, 0), f.at(r1, p0, 0), f.at(r1, p1, 0), f.at(r0, p1, 0))
                            .withPatch(exact));
                }
            }
        }
        return out;
    }

    /**
     * The lateral wall of a right circular cylinder.
     *
     * @param baseCenter centre of the base circle (m)
     * @param axis direction from base to top
     * @param radius radius (m)
     * @param height length along the axis (m)
     * @param azimuthal divisions around (≥ 3)
     * @param axial divisions along the axis (≥ 1)
     * @param facing radiating side
     * @return the facets (planar rectangles)
     */
    public static List<Facet> cylinderWall(Vec3 baseCenter, Vec3 axis, double radius, double height,
            int azimuthal, int axial, Facing facing) {
        return coneFrustum(baseCenter, axis, radius, radius, height, azimuthal, axial, facing);
    }

    /**
     * The lateral wall of a frustum of a right circular cone (radius varying linearly along the
     * axis; one radius may be 0 for a full cone).
     *
     * @param baseCenter centre of the base circle (m)
     * @param axis direction from base to top
     * @param baseRadius radius at the base (m)
     * @param topRadius radius at the top (m)
     * @param height length along the axis (m), &gt; 0
     * @param azimuthal divisions around (≥ 3)
     * @param axial divisions along the axis (≥ 1)
     * @param facing radiating side
     * @return the facets (planar isosceles trapezoids, triangles at an apex)
     */
    public static List<Facet> coneFrustum(Vec3 baseCenter, Vec3 axis, double baseRadius, double topRadius,
            double height, int azimuthal, int axial, Facing facing) {
        positive(axial, "axial");
        if (azimuthal < 3) {
            throw new GeometryException("azimuthal divisions must be at least 3, got " + azimuthal);
        }
        if (!(height > 0 && baseRadius >= 0 && topRadius >= 0 && baseRadius + topRadius > 0)) {
            throw new GeometryException("bad frustum dimensions r0=" + baseRadius + " r1=" + topRadius + " h=" + height);
        }
        Frame f = Frame.about(baseCenter, axis);
        List<Facet> out = new ArrayList<>();
        for (int k = 0; k < axial; k++) {
            double z0 = height * k / axial, z1 = height * (k + 1) / axial;
            double r0 = baseRadius + (topRadius - baseRadius) * k / axial;
            double r1 = baseRadius + (topRadius - baseRadius) * (k + 1) / axial;
            for (int m = 0; m < azimuthal; m++) {
                double p0 = 2 * Math.PI * m / azimuthal, p1 = 2 * Math.PI * ((m + 1) % azimuthal) / azimuthal; // seam shares exact vertices
                List<Vec3> v = new ArrayList<>(4);
                v.add(f.at(r0, p0, z0));
                if (r0 > 0) {
                    v.add(f.at(r0, p1, z0));
                }
                v.add(f.at(r1, p1, z1));
                if (r1 > 0) {
                    v.add(f.at(r1, p0, z1));
                }
                Patch exact = Patch.cone(baseCenter, f.u(), f.v(), f.a(), baseRadius, (topRadius - baseRadius) / height,
                        z0, z1, 2 * Math.PI * m / azimuthal, 2 * Math.PI * (m + 1) / azimuthal,
                        facing == Facing.OUTWARD ? 1 : -1);
                out.add(oriented(v, facing == Facing.OUTWARD).withPatch(exact));
            }
        }
        return out;
    }

    /**
     * A full sphere.
     *
     * @see #spherePatch
     */
    public static List<Facet> sphere(Vec3 center, double radius, int polar, int azimuthal, Facing facing) {
        return spherePatch(center, Vec3.Z, radius, 0, Math.PI, polar, azimuthal, facing);
    }

    /**
     * A zone of a sphere between two polar angles measured from {@code axis} (a cap when the
     * first is 0), meshed in polar × azimuthal cells (triangles at a pole).
     *
     * @param center centre (m)
     * @param axis polar axis
     * @param radius radius (m)
     * @param polarMinRad first polar angle (rad), ≥ 0
     * @param polarMaxRad second polar angle (rad), ≤ π
     * @param polar divisions in polar angle (≥ 1)
     * @param azimuthal divisions around (≥ 3)
     * @param facing radiating side
     * @return the facets (planar isosceles trapezoids and triangles)
     */
    public static List<Facet> spherePatch(Vec3 center, Vec3 axis, double radius, double polarMinRad,
            double polarMaxRad, int polar, int azimuthal, Facing facing) {
        positive(polar, "polar");
        if (azimuthal < 3) {
            throw new GeometryException("azimuthal divisions must be at least 3, got " + azimuthal);
        }
        if (!(radius > 0 && polarMinRad >= 0 && polarMaxRad <= Math.PI && polarMinRad < polarMaxRad)) {
            throw new GeometryException("bad sphere patch: r=" + radius + " polar " + polarMinRad + ".." + polarMaxRad);
        }
        Frame f = Frame.about(center, axis);
        List<Facet> out = new ArrayList<>();
        double poleTol = 1e-12;
        for (int k = 0; k < polar; k++) {
            double t0 = polarMinRad + (polarMaxRad - polarMinRad) * k / polar;
            double t1 = polarMinRad + (polarMaxRad - polarMinRad) * (k + 1) / polar;
            for (int m = 0; m < azimuthal; m++) {
                double p0 = 2 * Math.PI * m / azimuthal, p1 = 2 * Math.PI * ((m + 1) % azimuthal) / azimuthal; // seam shares exact vertices
                List<Vec3> v = new ArrayList<>(4);
                boolean pole0 = t0 < poleTol, pole1 = Math.PI - t1 < poleTol;
                // exact zero ring radius at a pole, so every pole triangle shares one vertex
                double s0 = pole0 ? 0 : Math.sin(t0), s1 = pole1 ? 0 : Math.sin(t1);
                v.add(f.at(radius * s0, p0, radius * Math.cos(t0)));
                v.add(f.at(radius * s1, p0, radius * Math.cos(t1)));
                if (!pole1) {
                    v.add(f.at(radius * s1, p1, radius * Math.cos(t1)));
                }
                if (!pole0) {
                    v.add(f.at(radius * s0, p1, radius * Math.cos(t0)));
                }
                // (θ down, φ around) is right-handed with the outward radius: order is outward.
                Patch exact = Patch.sphere(center, f.u(), f.v(), f.a(), radius, t0, t1, 2 * Math.PI * m / azimuthal,
                        2 * Math.PI * (m + 1) / azimuthal, facing == Facing.OUTWARD ? 1 : -1);
                out.add(oriented(v, facing == Facing.OUTWARD).withPatch(exact));
            }
        }
        return out;
    }

    private static Facet oriented(List<Vec3> v, boolean keep) {
        if (keep) {
            return Facet.of(v);
        }
        List<Vec3> r = new ArrayList<>(v);
        java.util.Collections.reverse(r);
        return Facet.of(r);
    }
}
