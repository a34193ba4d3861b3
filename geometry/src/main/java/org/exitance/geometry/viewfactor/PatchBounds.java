package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * Exact extremes over a curved {@link Patch}, and the tests built on them that decide where
 * the contour form of {@link CurvedContour} holds.
 *
 * <p>A linear function a·y + b over a patch of revolution is, on each circle of constant u, a
 * sinusoid in φ whose amplitude is the circle's radius, so its extreme over the azimuth range μ
 * is found in closed form and the remaining dependence on u is linear (plane, cone) or a sinusoid
 * in θ (sphere): {@link #minLinear} is exact, not sampled.
 *
 * <p>"Inside the solid" of a curved patch means inside the convex solid its whole surface bounds:
 * the infinite solid cylinder or one nappe of the solid cone (ρ ≤ c + kz), or the ball. Every
 * tangent plane of the surface supports that solid, so a point inside it is in front of every
 * point of an inward-facing patch and behind every point of an outward-facing one.
 */
final class PatchBounds {

    private PatchBounds() {
    }

    /**
     * @return min over the patch of a·y + b (a = (ax, ay, az))
     */
    static double minLinear(Patch p, double ax, double ay, double az, double b) {
        double ao = ax * p.frame(0) + ay * p.frame(1) + az * p.frame(2) + b;
        double a1 = ax * p.frame(3) + ay * p.frame(4) + az * p.frame(5);
        double a2 = ax * p.frame(6) + ay * p.frame(7) + az * p.frame(8);
        double a3 = ax * p.frame(9) + ay * p.frame(10) + az * p.frame(11);
        double mu = minSinusoid(0, a1, a2, p.phi0(), p.phi1());
        double u0 = p.u0(), u1 = p.u1();
        return switch (p.kind()) {
            case PLANE -> ao + Math.min(u0 * mu, u1 * mu);
            case CONE -> {
                double c = p.shapeA(), k = p.shapeB();
                yield ao + Math.min(u0 * a3 + (c + k * u0) * mu, u1 * a3 + (c + k * u1) * mu);
            }
            case SPHERE -> ao + p.shapeA() * minSinusoid(0, a3, mu, u0, u1);
        };
    }

    /** @return min over t ∈ [t0, t1] of c0 + ca cos t + cb sin t */
    static double minSinusoid(double c0, double ca, double cb, double t0, double t1) {
        double m = Math.min(ca * Math.cos(t0) + cb * Math.sin(t0), ca * Math.cos(t1) + cb * Math.sin(t1));
        double amp = Math.hypot(ca, cb);
        if (amp > 0) {
            double low = Math.atan2(cb, ca) + Math.PI; // where the sinusoid is −amp
            double k = Math.ceil((t0 - low) / (2 * Math.PI));
            if (low + 2 * Math.PI * k <= t1) {
                m = -amp;
            }
        }
        return c0 + m;
    }

    /** @return max over the patch of a·y + b */
    static double maxLinear(Patch p, double ax, double ay, double az, double b) {
        return -minLinear(p, -ax, -ay, -az, -b);
    }

    /**
     * Whether every point of q lies inside the solid of curved patch p (to {@code tol}, m). Exact
     * when q is coaxial with p (its ρ and z in p's frame are then linear or sinusoidal in u) and for
     * a polygon (the solid is convex); otherwise answers false (not proved).
     *
     * @param qPatch q's patch, or null for the polygon {@code qPoly}
     */
    static boolean insideSolid(Patch p, Patch qPatch, Poly qPoly, double tol) {
        if (qPatch == null) {
            for (int v = 0; v < qPoly.n; v++) {
                if (excess(p, qPoly.xyz[3 * v], qPoly.xyz[3 * v + 1], qPoly.xyz[3 * v + 2]) > tol) {
                    return false;
                }
            }
            return true;
        }
        if (!coaxial(p, qPatch, tol)) {
            return false;
        }
        // the excess is linear or convex in u on planes and cones, and a sinusoid in θ (or
        // monotone) on spheres: its ends and the sinusoid's interior extreme bound it
        double[] us = qPatch.kind() == Patch.Kind.SPHERE ? sphereCandidates(p, qPatch) : new double[] {qPatch.u0(), qPatch.u1()};
        for (double u : us) {
            org.exitance.geometry.Vec3 y = qPatch.point(u, qPatch.phi0());
            if (excess(p, y.x(), y.y(), y.z()) > tol) {
                return false;
            }
        }
        return true;
    }

    /**
     * u values where the excess of a coaxial sphere patch q over p's solid can be largest: its
     * ends and, in a cone or cylinder, the interior extreme of R sin θ − k s R cos θ (a sinusoid
     * in θ; s = ±1 the relative direction of the axes). In a ball the distance is monotone in θ.
     */
    private static double[] sphereCandidates(Patch p, Patch q) {
        if (p.kind() != Patch.Kind.CONE) {
            return new double[] {q.u0(), q.u1()};
        }
        double s = Math.signum(p.frame(9) * q.frame(9) + p.frame(10) * q.frame(10) + p.frame(11) * q.frame(11));
        double peak = Math.atan2(1, -p.shapeB() * s);
        if (peak > q.u0() && peak < q.u1()) {
            return new double[] {q.u0(), q.u1(), peak};
        }
        return new double[] {q.u0(), q.u1()};
    }

    /** @return how far (x, y, z) lies outside p's solid (m; ≤ 0 inside) */
    static double excess(Patch p, double x, double y, double z) {
        double vx = x - p.frame(0), vy = y - p.frame(1), vz = z - p.frame(2);
        double h = vx * p.frame(9) + vy * p.frame(10) + vz * p.frame(11);
        double rx = vx - h * p.frame(9), ry = vy - h * p.frame(10), rz = vz - h * p.frame(11);
        double rho = Math.sqrt(rx * rx + ry * ry + rz * rz);
        return switch (p.kind()) {
            case SPHERE -> Math.sqrt(rho * rho + h * h) - p.shapeA();
            case CONE -> {
                double k = p.shapeB(), c = p.shapeA();
                double lim = c + k * h;
                // distance-like: outside the nappe when ρ > c + kz or c + kz < 0
                yield Math.max(rho - lim, -lim) / Math.sqrt(1 + k * k);
            }
            case PLANE -> Double.POSITIVE_INFINITY;
        };
    }

    /** @return true if q's axis is p's axis line (either direction) */
    static boolean coaxial(Patch p, Patch q, double tol) {
        double dot = p.frame(9) * q.frame(9) + p.frame(10) * q.frame(10) + p.frame(11) * q.frame(11);
        if (Math.abs(Math.abs(dot) - 1) > 1e-12) {
            return false;
        }
        double vx = q.frame(0) - p.frame(0), vy = q.frame(1) - p.frame(1), vz = q.frame(2) - p.frame(2);
        double h = vx * p.frame(9) + vy * p.frame(10) + vz * p.frame(11);
        double rx = vx - h * p.frame(9), ry = vy - h * p.frame(10), rz = vz - h * p.frame(11);
        return rx * rx + ry * ry + rz * rz <= tol * tol;
    }
}
