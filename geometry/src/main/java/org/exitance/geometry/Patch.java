package org.exitance.geometry;

/**
 * The exact shape behind a facet of a curved primitive: a piece of a surface of revolution about
 * the axis e3 of a right-handed frame (origin o, e1, e2, e3), over a parameter rectangle
 * [u0, u1] × [φ0, φ1] (φ the azimuth about e3, rad):
 * <ul>
 *   <li>{@link Kind#PLANE}: annular sector of the plane through o normal to e3, u = radius (m);
 *       x = o + u (cos φ e1 + sin φ e2), dA = u du dφ;</li>
 *   <li>{@link Kind#CONE}: cone frustum (a cylinder when the slope k = 0), u = axial position
 *       z (m), radius ρ(z) = c + k z; x = o + z e3 + ρ e_r, dA = ρ √(1 + k²) dz dφ;</li>
 *   <li>{@link Kind#SPHERE}: sphere of radius R about o, u = polar angle θ from e3 (rad);
 *       x = o + R (sin θ e_r + cos θ e3), dA = R² sin θ dθ dφ.</li>
 * </ul>
 * The radiating normal is {@code sign} × (e3 for PLANE, the outward surface normal otherwise):
 * sign = −1 for a surface that radiates inward (toward the axis or centre). The area is exact
 * (elementary integrals of dA above). View factors between patches integrate over these exact
 * surfaces (docs/view-factors.md); the facet carrying the patch is its inscribed polygon, used
 * for rays and drawing only. Immutable.
 */
public final class Patch {

    /** Surface family. */
    public enum Kind { PLANE, CONE, SPHERE }

    final Kind kind;
    /** o, e1, e2, e3 packed (12 doubles). */
    final double[] frame;
    /** CONE: c, k; SPHERE: R; PLANE: unused. */
    final double a, b;
    final double u0, u1, phi0, phi1;
    final int sign;

    Patch(Kind kind, double[] frame, double a, double b, double u0, double u1, double phi0, double phi1, int sign) {
        this.kind = kind;
        this.frame = frame;
        this.a = a;
        this.b = b;
        this.u0 = u0;
        this.u1 = u1;
        this.phi0 = phi0;
        this.phi1 = phi1;
        this.sign = sign;
        if (!(u1 > u0 && phi1 > phi0 && phi1 - phi0 <= 2 * Math.PI + 1e-12)) {
            throw new GeometryException("bad patch ranges u " + u0 + ".." + u1 + ", azimuth " + phi0 + ".." + phi1);
        }
    }

    private static double[] frameOf(Vec3 o, Vec3 e1, Vec3 e2, Vec3 e3) {
        return new double[] {o.x(), o.y(), o.z(), e1.x(), e1.y(), e1.z(), e2.x(), e2.y(), e2.z(), e3.x(), e3.y(), e3.z()};
    }

    /**
     * Annular sector of a plane (a disc sector when r0 = 0) radiating along {@code sign}·e3.
     *
     * @param o centre (m); e1, e2, e3 a right-handed orthonormal frame
     * @param r0 inner radius (m) ≥ 0
     * @param r1 outer radius (m) &gt; r0
     * @param phi0 first azimuth (rad)
     * @param phi1 second azimuth (rad) &gt; phi0
     * @param sign +1 radiates along e3, −1 against
     * @return the patch
     */
    public static Patch plane(Vec3 o, Vec3 e1, Vec3 e2, Vec3 e3, double r0, double r1, double phi0, double phi1, int sign) {
        return new Patch(Kind.PLANE, frameOf(o, e1, e2, e3), 0, 0, r0, r1, phi0, phi1, sign);
    }

    /**
     * Band of a cone frustum, radius c + k z at axial position z ∈ [z0, z1] (m).
     *
     * @param sign +1 radiates away from the axis (outward), −1 toward it
     * @return the patch
     */
    public static Patch cone(Vec3 o, Vec3 e1, Vec3 e2, Vec3 e3, double c, double k, double z0, double z1,
            double phi0, double phi1, int sign) {
        return new Patch(Kind.CONE, frameOf(o, e1, e2, e3), c, k, z0, z1, phi0, phi1, sign);
    }

    /**
     * Zone sector of a sphere of radius r about o, polar angle θ ∈ [t0, t1] from e3 (rad).
     *
     * @param sign +1 radiates outward, −1 inward
     * @return the patch
     */
    public static Patch sphere(Vec3 o, Vec3 e1, Vec3 e2, Vec3 e3, double r, double t0, double t1, double phi0,
            double phi1, int sign) {
        return new Patch(Kind.SPHERE, frameOf(o, e1, e2, e3), r, 0, t0, t1, phi0, phi1, sign);
    }

    /** @return a copy of the frame o, e1, e2, e3 (12 numbers) */
    public double[] frame() {
        return frame.clone();
    }

    /** @return frame number k (0..11: o, e1, e2, e3) */
    public double frame(int k) {
        return frame[k];
    }

    /** @return CONE: the radius c at z = 0 (m); SPHERE: the radius R (m); PLANE: 0 */
    public double shapeA() {
        return a;
    }

    /** @return CONE: the slope k = dρ/dz; otherwise 0 */
    public double shapeB() {
        return b;
    }

    /** @return the surface family */
    public Kind kind() {
        return kind;
    }

    /** @return first u (m, or rad for SPHERE) */
    public double u0() {
        return u0;
    }

    /** @return second u */
    public double u1() {
        return u1;
    }

    /** @return first azimuth (rad) */
    public double phi0() {
        return phi0;
    }

    /** @return second azimuth (rad) */
    public double phi1() {
        return phi1;
    }

    /** @return +1 (radiates along e3 / outward) or −1 */
    public int sign() {
        return sign;
    }

    /** @return the exact area (m²) */
    public double area() {
        double dphi = phi1 - phi0;
        return switch (kind) {
            case PLANE -> 0.5 * dphi * (u1 * u1 - u0 * u0);
            case CONE -> dphi * Math.sqrt(1 + b * b) * (a * (u1 - u0) + 0.5 * b * (u1 * u1 - u0 * u0));
            case SPHERE -> dphi * a * a * (Math.cos(u0) - Math.cos(u1));
        };
    }

    /**
     * @return a bound on the distance between the patch and the polygon through its corners (m):
     *         the sagitta ρ (1 − cos(Δφ/2)) of its widest circle, plus, on a sphere, that of its
     *         meridian
     */
    public double sagitta() {
        double half = 0.5 * (phi1 - phi0);
        double s = maxRadius() * (1 - Math.cos(half));
        if (kind == Kind.SPHERE) {
            s += a * (1 - Math.cos(0.5 * (u1 - u0)));
        }
        return s;
    }

    /** @return true if the surface is concave toward its radiating side (it can see itself) */
    public boolean concave() {
        return kind != Kind.PLANE && sign < 0;
    }

    /**
     * Point, radiating unit normal and area element at (u, φ).
     *
     * @param out receives x, y, z, nx, ny, nz, dA/(du dφ) at [off, off + 7); modified
     */
    public void evaluate(double u, double phi, double[] out, int off) {
        double c = Math.cos(phi), s = Math.sin(phi);
        double[] f = frame;
        double erx = c * f[3] + s * f[6], ery = c * f[4] + s * f[7], erz = c * f[5] + s * f[8];
        double px, py, pz, nx, ny, nz, jac;
        switch (kind) {
            case PLANE -> {
                px = u * erx;
                py = u * ery;
                pz = u * erz;
                nx = f[9];
                ny = f[10];
                nz = f[11];
                jac = u;
            }
            case CONE -> {
                double rho = a + b * u, w = Math.sqrt(1 + b * b);
                px = u * f[9] + rho * erx;
                py = u * f[10] + rho * ery;
                pz = u * f[11] + rho * erz;
                nx = (erx - b * f[9]) / w;
                ny = (ery - b * f[10]) / w;
                nz = (erz - b * f[11]) / w;
                jac = rho * w;
            }
            default -> {
                double st = Math.sin(u), ct = Math.cos(u);
                nx = st * erx + ct * f[9];
                ny = st * ery + ct * f[10];
                nz = st * erz + ct * f[11];
                px = a * nx;
                py = a * ny;
                pz = a * nz;
                jac = a * a * st;
            }
        }
        out[off] = f[0] + px;
        out[off + 1] = f[1] + py;
        out[off + 2] = f[2] + pz;
        out[off + 3] = sign * nx;
        out[off + 4] = sign * ny;
        out[off + 5] = sign * nz;
        out[off + 6] = jac;
    }

    /**
     * The circle of constant u, on which every quantity of the patch is a sinusoid in φ. Writes
     * into {@code out[off .. off + 16)} (modified): centre c(u) (3, m), radius ρ(u) (m), the
     * radiating normal's radial and axial parts (n = n_r e_r(φ) + n_a e3, sign included), the
     * area element dA/(du dφ), then e1, e2, e3 (9); a point of the circle is c + ρ (cos φ e1 +
     * sin φ e2).
     */
    public void ring(double u, double[] out, int off) {
        double[] f = frame;
        double h, rho, nr, na, jac;
        switch (kind) {
            case PLANE -> {
                h = 0;
                rho = u;
                nr = 0;
                na = 1;
                jac = u;
            }
            case CONE -> {
                double w = Math.sqrt(1 + b * b);
                h = u;
                rho = a + b * u;
                nr = 1 / w;
                na = -b / w;
                jac = rho * w;
            }
            default -> {
                h = a * Math.cos(u);
                rho = a * Math.sin(u);
                nr = Math.sin(u);
                na = Math.cos(u);
                jac = a * a * Math.sin(u);
            }
        }
        out[off] = f[0] + h * f[9];
        out[off + 1] = f[1] + h * f[10];
        out[off + 2] = f[2] + h * f[11];
        out[off + 3] = rho;
        out[off + 4] = sign * nr;
        out[off + 5] = sign * na;
        out[off + 6] = jac;
        System.arraycopy(f, 3, out, off + 7, 9);
    }

    /** @return the point at (u, φ) (m) */
    public Vec3 point(double u, double phi) {
        double[] o = new double[7];
        evaluate(u, phi, o, 0);
        return new Vec3(o[0], o[1], o[2]);
    }

    /** @return the largest radius from the axis (m) */
    public double maxRadius() {
        return switch (kind) {
            case PLANE -> u1;
            case CONE -> Math.max(a + b * u0, a + b * u1);
            case SPHERE -> a * ((u0 <= Math.PI / 2 && u1 >= Math.PI / 2) ? 1 : Math.max(Math.sin(u0), Math.sin(u1)));
        };
    }

    /** @return the same surface radiating from its other side */
    public Patch reversed() {
        return new Patch(kind, frame, a, b, u0, u1, phi0, phi1, -sign);
    }

    /** @return this patch moved by the rigid transform {@code t} */
    public Patch transformed(Transform t) {
        Vec3 o = t.apply(new Vec3(frame[0], frame[1], frame[2]));
        Vec3 e1 = t.applyLinear(new Vec3(frame[3], frame[4], frame[5]));
        Vec3 e2 = t.applyLinear(new Vec3(frame[6], frame[7], frame[8]));
        Vec3 e3 = t.applyLinear(new Vec3(frame[9], frame[10], frame[11]));
        return new Patch(kind, frameOf(o, e1, e2, e3), a, b, u0, u1, phi0, phi1, sign);
    }

    /**
     * @return every number defining the patch (kind ordinal, frame, shape, ranges, sign), for
     *         hashing and equality
     */
    public double[] parameters() {
        double[] p = new double[20];
        p[0] = kind.ordinal();
        System.arraycopy(frame, 0, p, 1, 12);
        p[13] = a;
        p[14] = b;
        p[15] = u0;
        p[16] = u1;
        p[17] = phi0;
        p[18] = phi1;
        p[19] = sign;
        return p;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Patch p && java.util.Arrays.equals(parameters(), p.parameters());
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(parameters());
    }
}
