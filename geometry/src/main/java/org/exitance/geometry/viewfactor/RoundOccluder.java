package org.exitance.geometry.viewfactor;

/**
 * A closed convex round body in the way of a pair, held as its exact shape: a cylinder closed at
 * both ends (the convex hull of its two rim circles) or a sphere. Its silhouette from a point x
 * outside it is a closed curve of circular arcs and straight segments ({@link ConeContour}):
 *
 * <ul>
 *   <li>cylinder (base centre b, unit axis a, radius r, length L; x at height h above the base
 *       and distance ρ ≥ r from the axis): the two generators where the planes through x touch
 *       the wall, at azimuths φ_x ± acos(r/ρ), and between them on each rim the arc on the
 *       silhouette: the near arc (through φ_x) of a rim that x does not look onto (h &lt; L for
 *       the top rim, h &gt; 0 for the base) and the far arc of one it does. The convex hull of
 *       the two circles' images is bounded by exactly these pieces, the generators being the
 *       common tangents;</li>
 *   <li>cylinder seen from inside the wall's infinite extension (ρ &lt; r, beyond an end): the rim
 *       of that end, whole (its image contains the other rim's);</li>
 *   <li>sphere (centre c, radius r, x at distance D &gt; r): the circle where the cone from x
 *       touches it, centred at c + (r/D)² (x − c) with radius r √(D² − r²)/D (common
 *       practice: the tangent cone of a sphere).</li>
 * </ul>
 *
 * Immutable; shared by threads.
 */
final class RoundOccluder {

    /** Codes of the silhouette's pieces (for signatures); joins of cuts use codes from 16 on. */
    static final int RIM0 = 1, RIM1 = 2, GENERATOR_PLUS = 3, GENERATOR_MINUS = 4, CIRCLE = 5;
    /**
     * Added to a rim's code for its far arc: the outline's area goes like |h − L| where x crosses
     * an end plane (the near arc gives way to the far one), a kink with no other change of make-up.
     */
    static final int FAR = 8;

    private final boolean sphere;
    /** Base centre or sphere centre (m). */
    private final double[] b;
    /** Axis and two unit vectors across it. */
    private final double[] a, e1, e2;
    private final double r, length;

    private RoundOccluder(boolean sphere, double[] b, double[] a, double r, double length) {
        this.sphere = sphere;
        this.b = b.clone();
        this.a = a.clone();
        this.r = r;
        this.length = length;
        double ax = Math.abs(a[0]) < 0.6 ? 1 : 0, ay = ax == 1 ? 0 : 1;
        double d = ax * a[0] + ay * a[1];
        double[] u = {ax - d * a[0], ay - d * a[1], -d * a[2]};
        double nu = Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
        e1 = new double[] {u[0] / nu, u[1] / nu, u[2] / nu};
        e2 = new double[] {a[1] * e1[2] - a[2] * e1[1], a[2] * e1[0] - a[0] * e1[2], a[0] * e1[1] - a[1] * e1[0]};
    }

    /**
     * @param base centre of the base disc (m; not modified)
     * @param axis unit axis from the base toward the top (not modified)
     * @param radius m
     * @param length m
     */
    static RoundOccluder cylinder(double[] base, double[] axis, double radius, double length) {
        return new RoundOccluder(false, base, axis, radius, length);
    }

    /** @param centre m (not modified) @param radius m */
    static RoundOccluder sphere(double[] centre, double radius) {
        return new RoundOccluder(true, centre, new double[] {0, 0, 1}, radius, 0);
    }

    /**
     * Whether the whole body lies on the inner side m·p ≥ d − tol of a plane (m a unit normal).
     */
    boolean inside(double mx, double my, double mz, double d, double tol) {
        double mb = mx * b[0] + my * b[1] + mz * b[2];
        if (sphere) {
            return mb - r >= d - tol;
        }
        double ma = mx * a[0] + my * a[1] + mz * a[2];
        double across = Math.sqrt(Math.max(0, 1 - ma * ma));
        return mb + Math.min(0, length * ma) - r * across >= d - tol;
    }

    /**
     * Writes the silhouette seen from x into {@code out} (cleared first).
     *
     * @return false when x lies inside the body or on it within {@code tol} of its inside (all
     *         it could see is hidden); true when {@code out} holds the silhouette
     */
    boolean silhouette(double x, double y, double z, ConeContour out, double tol) {
        out.clear();
        double dx = x - b[0], dy = y - b[1], dz = z - b[2];
        if (sphere) {
            double dd = dx * dx + dy * dy + dz * dz, big = Math.sqrt(dd);
            if (big <= r + tol) {
                return false;
            }
            double s = r * r / dd, rad = r * Math.sqrt(dd - r * r) / big;
            double[] c = {b[0] + s * dx, b[1] + s * dy, b[2] + s * dz};
            double[] w1 = new double[3], w2 = new double[3];
            across(dx / big, dy / big, dz / big, w1, w2);
            scale(w1, rad);
            scale(w2, rad);
            out.arc(c, w1, w2, 0, Math.PI, CIRCLE);
            out.arc(c, w1, w2, Math.PI, 2 * Math.PI, CIRCLE);
            return true;
        }
        double h = dx * a[0] + dy * a[1] + dz * a[2];
        double p1 = dx * e1[0] + dy * e1[1] + dz * e1[2], p2 = dx * e2[0] + dy * e2[1] + dz * e2[2];
        double rho = Math.hypot(p1, p2);
        double[] c0 = {b[0], b[1], b[2]};
        double[] c1 = {b[0] + length * a[0], b[1] + length * a[1], b[2] + length * a[2]};
        double[] u = {r * e1[0], r * e1[1], r * e1[2]}, w = {r * e2[0], r * e2[1], r * e2[2]};
        if (rho <= r * (1 + 1e-12)) {
            if (h > length + tol) {
                fullCircle(out, c1, u, w, RIM1);
                return true;
            }
            if (h < -tol) {
                fullCircle(out, c0, u, w, RIM0);
                return true;
            }
            return false;
        }
        double phx = Math.atan2(p2, p1), delta = Math.acos(r / rho);
        double fp = phx + delta, fm = phx - delta;
        double[] p = new double[3], q = new double[3];
        rimPoint(c0, u, w, fp, p);
        rimPoint(c1, u, w, fp, q);
        out.segment(p[0], p[1], p[2], q[0], q[1], q[2], GENERATOR_PLUS);
        arcs(out, c1, u, w, fp, h < length ? fm : fm + 2 * Math.PI, h < length ? RIM1 : RIM1 + FAR);
        rimPoint(c1, u, w, fm, p);
        rimPoint(c0, u, w, fm, q);
        out.segment(p[0], p[1], p[2], q[0], q[1], q[2], GENERATOR_MINUS);
        arcs(out, c0, u, w, fm, h > 0 ? fp : fp - 2 * Math.PI, h > 0 ? RIM0 : RIM0 + FAR);
        return true;
    }

    /** The arc from f0 to f1, in pieces of at most π. */
    private static void arcs(ConeContour out, double[] c, double[] u, double[] w, double f0, double f1, int code) {
        if (Math.abs(f1 - f0) <= Math.PI) {
            out.arc(c, u, w, f0, f1, code);
            return;
        }
        double mid = 0.5 * (f0 + f1);
        out.arc(c, u, w, f0, mid, code);
        out.arc(c, u, w, mid, f1, code);
    }

    private static void fullCircle(ConeContour out, double[] c, double[] u, double[] w, int code) {
        out.arc(c, u, w, 0, Math.PI, code);
        out.arc(c, u, w, Math.PI, 2 * Math.PI, code);
    }

    private static void rimPoint(double[] c, double[] u, double[] w, double f, double[] out) {
        double cs = Math.cos(f), sn = Math.sin(f);
        for (int k = 0; k < 3; k++) {
            out[k] = c[k] + cs * u[k] + sn * w[k];
        }
    }

    /** Two unit vectors perpendicular to the unit vector (x, y, z) and to each other (out, modified). */
    private static void across(double x, double y, double z, double[] o1, double[] o2) {
        double ax = Math.abs(x) < 0.6 ? 1 : 0, ay = ax == 1 ? 0 : 1;
        double d = ax * x + ay * y;
        double ux = ax - d * x, uy = ay - d * y, uz = -d * z;
        double nu = Math.sqrt(ux * ux + uy * uy + uz * uz);
        o1[0] = ux / nu;
        o1[1] = uy / nu;
        o1[2] = uz / nu;
        o2[0] = y * o1[2] - z * o1[1];
        o2[1] = z * o1[0] - x * o1[2];
        o2[2] = x * o1[1] - y * o1[0];
    }

    private static void scale(double[] v, double s) {
        v[0] *= s;
        v[1] *= s;
        v[2] *= s;
    }

    /** @return a length typical of the body (m), for tolerances */
    double size() {
        return sphere ? r : Math.max(r, length);
    }
}
