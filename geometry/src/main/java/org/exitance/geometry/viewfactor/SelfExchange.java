package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * Self exchange area A_i F_ii of a patch that is concave toward its radiating side.
 * <ul>
 *   <li>Planar, or convex (radiating outward): 0.</li>
 *   <li>Inside of a sphere: every element of the inside of a sphere of radius R sees any part
 *       A_j of it with F = A_j / (4πR²) (Siegel &amp; Howell 4th ed., §4, enclosure of a sphere;
 *       common practice), so A_i F_ii = A_i² / (4πR²).</li>
 *   <li>Inside of a cone or cylinder band: by closure. The band a, its chord plane t (the planar
 *       trapezoid through its four corners) and the two circular segments c0, c1 between its arcs
 *       and their chords bound a convex region, so every surface sees all of every other and
 *       Σ_j F_kj = 1 for each. With reciprocity this gives
 *       <pre>A_a F_aa = A_a − A_t − A_c0 − A_c1 + 2 A_t F_t,c0 + 2 A_t F_t,c1 + 2 A_c0 F_c0,c1</pre>
 *       whose right side only has planar pairs (contour integral). The segments are polygons of
 *       k and 2k chords; the error falls like k^−2, and Richardson's extrapolation
 *       (4 Q(2k) − Q(k)) / 3 removes that term.</li>
 * </ul>
 */
final class SelfExchange {

    /** Chords per segment arc in the coarse of the two evaluations. */
    static final int ARC_CHORDS = 16;

    private final ContourIntegral contour;
    private final int order;
    private final Poly t = new Poly(), c0 = new Poly(), c1 = new Poly();
    private final double[] buf = new double[3 * Poly.MAX_VERTICES];
    private final double[] e = new double[7];

    SelfExchange(ContourIntegral contour, int order) {
        this.contour = contour;
        this.order = order;
    }

    /** @return A F_ii (m²) of the patch; 0 unless it is concave toward its radiating side */
    double of(Patch p) {
        if (p == null || !p.concave()) {
            return 0;
        }
        double a = p.area();
        if (p.kind() == Patch.Kind.SPHERE) {
            double r = radiusOf(p);
            return a * a / (4 * Math.PI * r * r);
        }
        double q1 = closure(p, ARC_CHORDS), q2 = closure(p, 2 * ARC_CHORDS);
        return Math.max(0, (4 * q2 - q1) / 3);
    }

    private static double radiusOf(Patch p) {
        return p.parameters()[13];
    }

    private double closure(Patch p, int k) {
        double z0 = p.u0(), z1 = p.u1();
        // chord trapezoid, radiating away from the axis (against the band's inward normal at its middle)
        int n = 0;
        n = put(p, z0, p.phi0(), n);
        n = put(p, z1, p.phi0(), n);
        n = put(p, z1, p.phi1(), n);
        n = put(p, z0, p.phi1(), n);
        p.evaluate(0.5 * (z0 + z1), 0.5 * (p.phi0() + p.phi1()), e, 0);
        set(t, n, -e[3], -e[4], -e[5]);
        double[] par = p.parameters();
        double ax = par[10], ay = par[11], az = par[12]; // e3
        double aT = t.area;
        double s = p.area() - aT;
        boolean has0 = segment(p, z0, k, c0, ax, ay, az);
        boolean has1 = segment(p, z1, k, c1, -ax, -ay, -az);
        if (has0) {
            s += -c0.area + 2 * contour.exchangeArea(t, c0, order);
        }
        if (has1) {
            s += -c1.area + 2 * contour.exchangeArea(t, c1, order);
        }
        if (has0 && has1) {
            s += 2 * contour.exchangeArea(c0, c1, order);
        }
        return s;
    }

    /** Circular segment at axial position z: k chords of the arc, closed by its chord; false if the arc has zero radius. */
    private boolean segment(Patch p, double z, int k, Poly out, double wx, double wy, double wz) {
        p.evaluate(z, p.phi0(), e, 0);
        double[] par = p.parameters();
        double rho = par[13] + par[14] * z;
        if (!(rho > 1e-12 * p.maxRadius())) {
            return false;
        }
        int n = 0;
        for (int m = 0; m <= k; m++) {
            n = put(p, z, p.phi0() + (p.phi1() - p.phi0()) * m / k, n);
        }
        set(out, n, wx, wy, wz);
        return true;
    }

    private int put(Patch p, double u, double phi, int n) {
        p.evaluate(u, phi, e, 0);
        if (n > 0 && Math.abs(e[0] - buf[3 * n - 3]) + Math.abs(e[1] - buf[3 * n - 2]) + Math.abs(e[2] - buf[3 * n - 1])
                <= 1e-12 * p.maxRadius()) {
            return n;
        }
        buf[3 * n] = e[0];
        buf[3 * n + 1] = e[1];
        buf[3 * n + 2] = e[2];
        return n + 1;
    }

    /** Sets {@code out} from buf[0..n), reversed if its normal is against (wx, wy, wz). */
    private void set(Poly out, int n, double wx, double wy, double wz) {
        out.setVertices(buf, n);
        if (out.nx * wx + out.ny * wy + out.nz * wz < 0) {
            for (int k = 0; k < n / 2; k++) {
                for (int c = 0; c < 3; c++) {
                    double v = buf[3 * k + c];
                    buf[3 * k + c] = buf[3 * (n - 1 - k) + c];
                    buf[3 * (n - 1 - k) + c] = v;
                }
            }
            out.setVertices(buf, n);
        }
    }
}
