package org.exitance.geometry.section;

import java.util.List;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Independent reference for 2-D view factors, written for the tests: from a point of the
 * emitter, dF = ½ d(sin φ) (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 4th ed.,
 * §4.4; Modest, Radiative Heat Transfer, 3rd ed., §4.7), integrated over the directions in
 * which a ray first meets the receiver's radiating face. Those directions are found by ray
 * casting (720 rays over the front half, plus rays just beside the directions to every end
 * point and tangent point, each change bisected to 1e-16 rad); the integral over
 * the emitter uses Commons Math's 8-point Gauss–Legendre rule, halving each interval until the
 * rule agrees with its two halves within 1e-12. No strings, no shared code with the
 * crossed-string calculation.
 */
final class AngularReference {

    /** A curve of the test geometry. */
    interface Shape {
        /** distance along the unit direction to the first crossing, or ∞ */
        double hit(double sx, double sy, double dx, double dy);

        /** whether a ray with direction (dx, dy) arriving at (hx, hy) meets the radiating face */
        boolean front(double hx, double hy, double dx, double dy);

        /** points where rays seen from (sx, sy) may start or stop meeting the shape (end points, tangent points) */
        default double[][] outlinePoints(double sx, double sy) {
            return new double[0][];
        }
    }

    /** The emitter: point and radiating unit normal at parameter u ∈ [0, 1], and its length. */
    interface Emitter {
        double[] pointAndNormal(double u);

        double length();
    }

    static int RAYS = 720;

    private AngularReference() {
    }

    static Shape segment(double x0, double y0, double x1, double y1) {
        return new Shape() {
            public double hit(double sx, double sy, double dx, double dy) {
                double ex = x1 - x0, ey = y1 - y0, den = dx * ey - dy * ex;
                if (den == 0) {
                    return Double.POSITIVE_INFINITY;
                }
                double wx = x0 - sx, wy = y0 - sy;
                double t = (wx * ey - wy * ex) / den, v = (wx * dy - wy * dx) / den;
                return t > 1e-12 && v >= 0 && v <= 1 ? t : Double.POSITIVE_INFINITY;
            }

            public boolean front(double hx, double hy, double dx, double dy) {
                return -(y1 - y0) * dx + (x1 - x0) * dy < 0; // arriving against the left normal
            }

            public double[][] outlinePoints(double sx, double sy) {
                return new double[][] {{x0, y0}, {x1, y1}};
            }
        };
    }

    /** An arc from angle a0 over sweep (a full circle for sweep = 2π), radiating outward or inward. */
    static Shape arc(double cx, double cy, double r, double a0, double sweep, boolean outward) {
        return new Shape() {
            public double hit(double sx, double sy, double dx, double dy) {
                double fx = sx - cx, fy = sy - cy, b = fx * dx + fy * dy, c = fx * fx + fy * fy - r * r;
                double disc = b * b - c;
                if (disc < 0) {
                    return Double.POSITIVE_INFINITY;
                }
                double q = Math.sqrt(disc);
                for (double t : new double[] {-b - q, -b + q}) {
                    if (t > 1e-12 * r && on(sx + t * dx, sy + t * dy)) {
                        return t;
                    }
                }
                return Double.POSITIVE_INFINITY;
            }

            private boolean on(double x, double y) {
                double a = Math.atan2(y - cy, x - cx) - a0;
                a -= 2 * Math.PI * Math.floor(a / (2 * Math.PI));
                return a <= sweep;
            }

            public boolean front(double hx, double hy, double dx, double dy) {
                double radial = (hx - cx) * dx + (hy - cy) * dy;
                return outward ? radial < 0 : radial > 0;
            }

            public double[][] outlinePoints(double sx, double sy) {
                double rho = Math.hypot(sx - cx, sy - cy), a = Math.atan2(sy - cy, sx - cx);
                double b = rho > r ? Math.acos(r / rho) : 0;
                double[] angles = {a0, a0 + sweep, a + b, a - b};
                double[][] p = new double[4][];
                for (int k = 0; k < 4; k++) {
                    p[k] = new double[] {cx + r * Math.cos(angles[k]), cy + r * Math.sin(angles[k])};
                }
                return p;
            }
        };
    }

    static Emitter segmentEmitter(double x0, double y0, double x1, double y1) {
        double len = Math.hypot(x1 - x0, y1 - y0);
        return new Emitter() {
            public double[] pointAndNormal(double u) {
                return new double[] {x0 + u * (x1 - x0), y0 + u * (y1 - y0), -(y1 - y0) / len, (x1 - x0) / len};
            }

            public double length() {
                return len;
            }
        };
    }

    static Emitter arcEmitter(double cx, double cy, double r, double a0, double sweep, boolean outward) {
        return new Emitter() {
            public double[] pointAndNormal(double u) {
                double a = a0 + u * sweep, c = Math.cos(a), s = Math.sin(a), o = outward ? 1 : -1;
                return new double[] {cx + r * c, cy + r * s, o * c, o * s};
            }

            public double length() {
                return r * sweep;
            }
        };
    }

    /**
     * @param e the emitter
     * @param receiver index of the receiver in shapes
     * @param shapes every other curve of the geometry (the emitter excluded); not modified
     * @return F from the emitter to the receiver
     */
    static double viewFactor(Emitter e, int receiver, List<Shape> shapes) {
        UnivariateFunction g = u -> pointFactor(e.pointAndNormal(u), receiver, shapes);
        double sum = 0;
        int parts = 16;
        for (int k = 0; k < parts; k++) {
            double a = (double) k / parts, b = (double) (k + 1) / parts;
            sum += adaptive(g, a, b, gauss(g, a, b), 0);
        }
        return sum;
    }

    private static final GaussIntegratorFactory GAUSS = new GaussIntegratorFactory();

    private static double gauss(UnivariateFunction g, double a, double b) {
        return GAUSS.legendre(8, a, b).integrate(g);
    }

    private static double adaptive(UnivariateFunction g, double a, double b, double whole, int depth) {
        double m = 0.5 * (a + b), left = gauss(g, a, m), right = gauss(g, m, b);
        if (Math.abs(left + right - whole) < 1e-12 || depth > 40) {
            return left + right;
        }
        return adaptive(g, a, m, left, depth + 1) + adaptive(g, m, b, right, depth + 1);
    }

    /** F from a point (p[0], p[1]) with normal (p[2], p[3]) to the receiver: ½ Σ Δ sin φ over hit intervals. */
    static double pointFactor(double[] p, int receiver, List<Shape> shapes) {
        int rays = RAYS;
        java.util.TreeSet<Double> angles = new java.util.TreeSet<>();
        for (int k = 0; k <= rays; k++) {
            angles.add(-0.5 * Math.PI + Math.PI * k / rays);
        }
        // probe on both sides of the directions to every outline point, so narrow gaps are not missed
        for (Shape sh : shapes) {
            for (double[] q : sh.outlinePoints(p[0], p[1])) {
                double dx = q[0] - p[0], dy = q[1] - p[1];
                double phi = Math.atan2(dx * p[3] - dy * p[2], dx * p[2] + dy * p[3]);
                for (double off : new double[] {-1e-9, 1e-9}) {
                    if (Math.abs(phi + off) < 0.5 * Math.PI) {
                        angles.add(phi + off);
                    }
                }
            }
        }
        double f = 0, prevPhi = -0.5 * Math.PI + 1e-12;
        boolean prev = sees(p, prevPhi, receiver, shapes);
        double start = prev ? -0.5 * Math.PI : Double.NaN;
        for (double a : angles) {
            double phi = Math.max(-0.5 * Math.PI + 1e-12, Math.min(0.5 * Math.PI - 1e-12, a));
            boolean now = sees(p, phi, receiver, shapes);
            if (now != prev) {
                double lo = prevPhi, hi = phi;
                for (int it = 0; it < 60; it++) {
                    double m = 0.5 * (lo + hi);
                    if (sees(p, m, receiver, shapes) == prev) {
                        lo = m;
                    } else {
                        hi = m;
                    }
                }
                double edge = 0.5 * (lo + hi);
                if (now) {
                    start = edge;
                } else {
                    f += 0.5 * (Math.sin(edge) - Math.sin(start));
                }
            }
            prev = now;
            prevPhi = phi;
        }
        if (prev) {
            f += 0.5 * (1 - Math.sin(start));
        }
        return f;
    }

    private static boolean sees(double[] p, double phi, int receiver, List<Shape> shapes) {
        double c = Math.cos(phi), s = Math.sin(phi);
        // tangent = normal turned clockwise; either orientation covers the same half
        double dx = c * p[2] + s * p[3], dy = c * p[3] - s * p[2];
        int best = -1;
        double bestT = Double.POSITIVE_INFINITY;
        for (int k = 0; k < shapes.size(); k++) {
            double t = shapes.get(k).hit(p[0], p[1], dx, dy);
            if (t < bestT) {
                bestT = t;
                best = k;
            }
        }
        return best == receiver && shapes.get(best).front(p[0] + bestT * dx, p[1] + bestT * dy, dx, dy);
    }
}
