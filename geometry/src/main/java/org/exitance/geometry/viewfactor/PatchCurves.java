package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * The exact boundary of a {@link Patch} (or of a plain polygon) as {@link Curve}s,
 * counter-clockwise about the radiating normal, for {@link CurvedContour}.
 *
 * <p>In parameter order the boundary runs (u₀ → u₁ at φ₀), (φ₀ → φ₁ at u₁), (u₁ → u₀ at φ₁),
 * (φ₁ → φ₀ at u₀). That is counter-clockwise about ∂x/∂u × ∂x/∂φ, which is +e3 on a plane, the
 * inward normal on a cone and the outward normal on a sphere; where the radiating normal is the
 * other one, every curve is reversed. Circles of constant u are arcs about the axis; meridians are
 * segments (plane, cone) or great-circle arcs (sphere). Meridians of a patch that goes all the way
 * round cancel and are left out; circles of radius 0 (a disc's centre, an apex, a pole) are
 * degenerate and dropped by the contour sum.
 */
final class PatchCurves {

    private PatchCurves() {
    }

    /**
     * @param p the patch (not modified)
     * @param out receives up to 4 curves, in order along the boundary (modified: its first four
     *        instances are filled and may be permuted; must hold 4 instances)
     * @return number of curves written
     */
    static int of(Patch p, Curve[] out) {
        double[] f = p.frame();
        double u0 = p.u0(), u1 = p.u1(), f0 = p.phi0(), f1 = p.phi1();
        boolean full = f1 - f0 >= 2 * Math.PI - 1e-12;
        int n = 0;
        if (!full) {
            meridian(p, f, u0, u1, f0, out[n++]);
        }
        circle(p, f, u1, f0, f1 - f0, out[n++]);
        if (!full) {
            meridian(p, f, u1, u0, f1, out[n++]);
        }
        circle(p, f, u0, f1, f0 - f1, out[n++]);
        int orientation = p.sign() * (p.kind() == Patch.Kind.CONE ? -1 : 1);
        if (orientation < 0) {
            reverse(out, n);
        }
        return n;
    }

    /**
     * The edges of a polygon as segments, in its own (counter-clockwise) order.
     *
     * @param q the polygon (not modified)
     * @param out receives q.n curves (modified)
     * @return q.n
     */
    static int of(Poly q, Curve[] out) {
        for (int k = 0; k < q.n; k++) {
            int l = (k + 1) % q.n;
            out[k].line(q.xyz[3 * k], q.xyz[3 * k + 1], q.xyz[3 * k + 2], q.xyz[3 * l], q.xyz[3 * l + 1], q.xyz[3 * l + 2]);
        }
        return q.n;
    }

    private static void circle(Patch p, double[] f, double u, double from, double sweep, Curve c) {
        double h, rho;
        switch (p.kind()) {
            case PLANE -> {
                h = 0;
                rho = u;
            }
            case CONE -> {
                h = u;
                rho = p.shapeA() + p.shapeB() * u;
            }
            default -> {
                h = p.shapeA() * Math.cos(u);
                rho = p.shapeA() * Math.sin(u);
            }
        }
        double[] centre = {f[0] + h * f[9], f[1] + h * f[10], f[2] + h * f[11]};
        c.arc(centre, 0, f, 3, f, 6, Math.max(0, rho), from, sweep);
    }

    private static void meridian(Patch p, double[] f, double ua, double ub, double phi, Curve c) {
        if (p.kind() == Patch.Kind.SPHERE) {
            double[] er = {Math.cos(phi) * f[3] + Math.sin(phi) * f[6], Math.cos(phi) * f[4] + Math.sin(phi) * f[7],
                Math.cos(phi) * f[5] + Math.sin(phi) * f[8]};
            // o + R (cos θ e3 + sin θ e_r), θ from ua to ub
            c.arc(f, 0, f, 9, er, 0, p.shapeA(), ua, ub - ua);
            return;
        }
        org.exitance.geometry.Vec3 a = p.point(ua, phi), b = p.point(ub, phi);
        c.line(a.x(), a.y(), a.z(), b.x(), b.y(), b.z());
    }

    /** Reverses the loop: each curve's direction and their order (so that it stays one walk). */
    private static void reverse(Curve[] out, int n) {
        for (int a = 0, b = n - 1; a < b; a++, b--) {
            Curve swap = out[a];
            out[a] = out[b];
            out[b] = swap;
        }
        for (int k = 0; k < n; k++) {
            Curve c = out[k];
            if (c.kind == Curve.LINE) {
                c.line(c.g[0] + c.g[3], c.g[1] + c.g[4], c.g[2] + c.g[5], c.g[0], c.g[1], c.g[2]);
            } else {
                c.theta0 += c.sweep;
                c.sweep = -c.sweep;
            }
        }
    }
}
