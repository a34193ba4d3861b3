package org.exitance.geometry.section;

import java.util.List;

/**
 * One radiating piece of a section surface and the obstacle it forms for other pairs. Used
 * internally by {@link SectionViewFactors} and {@link CrossedStrings}.
 *
 * <ul>
 * <li>FLAT: a strip p → q radiating to its left (a segment, or the chord that stands in for a
 * concave arc: everything leaving the hollow of a concave arc crosses its chord once, so
 * L_arc F_arc,j = L_chord F_chord,j; Siegel &amp; Howell, Thermal Radiation Heat Transfer,
 * 4th ed., §4.4, enclosure algebra).</li>
 * <li>ARC: a convex arc radiating outward, sweep ≤ π (longer convex arcs are split).</li>
 * <li>DISK: a full circle radiating outward (tube, rod).</li>
 * </ul>
 * As obstacles a segment blocks as a segment, a circle as its disk, and an arc (convex or
 * concave) as the region between the arc and its chord (CAP): a line crossing that region
 * between two points outside it crosses the arc.
 */
final class Piece {
    enum Kind { FLAT, ARC, DISK }

    enum Block { SEG, DISK, CAP }

    final Kind kind;
    final Block block;
    final int id, owner;
    /** FLAT: p → q; CAP: chord end points (m) */
    final double x0, y0, x1, y1;
    /** ARC, DISK, CAP: circle; ARC: start angle and sweep (rad) */
    final double cx, cy, r, a0, sweep;
    /** CAP: unit normal of the chord pointing into the region */
    final double mx, my;
    /** length of the radiating piece (m) */
    final double length;

    Piece(Kind kind, Block block, int id, int owner, double[] g) {
        this.kind = kind;
        this.block = block;
        this.id = id;
        this.owner = owner;
        x0 = g[0];
        y0 = g[1];
        x1 = g[2];
        y1 = g[3];
        cx = g[4];
        cy = g[5];
        r = g[6];
        a0 = g[7];
        sweep = g[8];
        double len = Math.hypot(x1 - x0, y1 - y0);
        if (block == Block.CAP) {
            // region side of the chord: the side holding the arc's mid point
            double midX = cx + r * Math.cos(a0 + 0.5 * sweep), midY = cy + r * Math.sin(a0 + 0.5 * sweep);
            double nx = -(y1 - y0) / len, ny = (x1 - x0) / len;
            double side = Math.signum(nx * (midX - x0) + ny * (midY - y0));
            mx = side * nx;
            my = side * ny;
        } else {
            mx = 0;
            my = 0;
        }
        length = kind == Kind.FLAT ? len : r * sweep;
    }

    double px(double u) {
        return kind == Kind.FLAT ? x0 + u * (x1 - x0) : cx + r * Math.cos(a0 + u * sweep);
    }

    double py(double u) {
        return kind == Kind.FLAT ? y0 + u * (y1 - y0) : cy + r * Math.sin(a0 + u * sweep);
    }

    /** Unit tangent along increasing u, written into t[0..1]; the unit normal into t[2..3]. Modifies t. */
    void frame(double u, double[] t) {
        if (kind == Kind.FLAT) {
            t[0] = (x1 - x0) / length;
            t[1] = (y1 - y0) / length;
            t[2] = -t[1];
            t[3] = t[0];
        } else {
            double a = a0 + u * sweep, c = Math.cos(a), s = Math.sin(a);
            t[0] = -s;
            t[1] = c;
            t[2] = c;
            t[3] = s;
        }
    }

    /**
     * The two edges of this piece's radiating face as seen from (sx, sy), as directions with
     * their features, or none when no part of the face is turned toward the point.
     *
     * @param out receives {dx1, dy1, dx2, dy2}; modified
     * @param f receives the two features; modified
     * @return whether any part of the face faces the point
     */
    boolean faceEdges(double sx, double sy, double[] out, Feature[] f) {
        if (kind == Kind.FLAT) {
            double cross = (x1 - x0) * (sy - y0) - (y1 - y0) * (sx - x0);
            if (!(cross > 0)) {
                return false;
            }
            set(out, f, 0, x0 - sx, y0 - sy, Feature.point(id, 0, x0, y0));
            set(out, f, 1, x1 - sx, y1 - sy, Feature.point(id, 1, x1, y1));
            return true;
        }
        double dx = sx - cx, dy = sy - cy, rho = Math.hypot(dx, dy);
        if (!(rho > r * (1 + 1e-12))) {
            return false;
        }
        double alpha = Math.atan2(dy, dx), beta = Math.acos(r / rho);
        double lo = -beta, hi = beta;
        boolean loTangent = true, hiTangent = true;
        if (kind == Kind.ARC) {
            double s0 = Feature.wrap(a0 - alpha);
            if (s0 > beta) {
                s0 -= 2 * Math.PI;
            }
            double s1 = s0 + sweep;
            if (s1 < -beta || s0 > beta) {
                return false;
            }
            loTangent = s0 <= -beta;
            hiTangent = s1 >= beta;
            lo = Math.max(lo, s0);
            hi = Math.min(hi, s1);
            if (!(hi > lo)) {
                return false;
            }
        }
        edge(out, f, 0, sx, sy, alpha + lo, loTangent, -1, 0);
        edge(out, f, 1, sx, sy, alpha + hi, hiTangent, +1, 1);
        return true;
    }

    private void edge(double[] out, Feature[] f, int k, double sx, double sy, double angle, boolean tangent,
            int kappa, int end) {
        double qx = cx + r * Math.cos(angle), qy = cy + r * Math.sin(angle);
        // the tangent at angle alpha + beta has the centre on the left of the direction (κ = +1)
        Feature feature = tangent ? Feature.tangent(id, cx, cy, r, kappa) : Feature.point(id, end, qx, qy);
        set(out, f, k, qx - sx, qy - sy, feature);
    }

    private static void set(double[] out, Feature[] f, int k, double dx, double dy, Feature feature) {
        out[2 * k] = dx;
        out[2 * k + 1] = dy;
        f[k] = feature;
    }

    /** Distance (m) along the unit direction to the first point of the radiating face's circle or line, or ∞. */
    double faceHit(double sx, double sy, double dx, double dy) {
        return kind == Kind.FLAT ? segmentHit(sx, sy, dx, dy) : circleEntry(sx, sy, dx, dy)[0];
    }

    /**
     * Directions from (sx, sy) to the extreme points of this piece as an obstacle, with their
     * features.
     *
     * @param dirs receives dx, dy pairs; modified
     * @param feats receives the features; modified
     */
    void obstacleEdges(double sx, double sy, List<double[]> dirs, List<Feature> feats) {
        if (block != Block.DISK) {
            dirs.add(new double[] {x0 - sx, y0 - sy});
            feats.add(Feature.point(id, 0, x0, y0));
            dirs.add(new double[] {x1 - sx, y1 - sy});
            feats.add(Feature.point(id, 1, x1, y1));
        }
        if (block == Block.SEG) {
            return;
        }
        double dx = sx - cx, dy = sy - cy, rho = Math.hypot(dx, dy);
        if (!(rho > r)) {
            return;
        }
        double alpha = Math.atan2(dy, dx), beta = Math.acos(r / rho);
        for (int kappa = -1; kappa <= 1; kappa += 2) {
            double a = alpha + kappa * beta, qx = cx + r * Math.cos(a), qy = cy + r * Math.sin(a);
            if (block == Block.DISK || mx * (qx - x0) + my * (qy - y0) >= 0) {
                dirs.add(new double[] {qx - sx, qy - sy});
                feats.add(Feature.tangent(id, cx, cy, r, kappa));
            }
        }
    }

    /** Distance (m) along the unit direction to where the ray enters this obstacle, or ∞. */
    double obstacleEntry(double sx, double sy, double dx, double dy) {
        if (block == Block.SEG) {
            return segmentHit(sx, sy, dx, dy);
        }
        double[] in = circleEntry(sx, sy, dx, dy);
        double lo = Math.max(0, in[0]), hi = in[1];
        if (block == Block.CAP) {
            double h = mx * (sx - x0) + my * (sy - y0), rate = mx * dx + my * dy;
            if (rate > 0) {
                lo = Math.max(lo, -h / rate);
            } else if (rate < 0) {
                hi = Math.min(hi, -h / rate);
            } else if (h < 0) {
                return Double.POSITIVE_INFINITY;
            }
        }
        return lo <= hi ? lo : Double.POSITIVE_INFINITY;
    }

    private double segmentHit(double sx, double sy, double dx, double dy) {
        double ex = x1 - x0, ey = y1 - y0, den = dx * ey - dy * ex;
        if (den == 0) {
            return Double.POSITIVE_INFINITY;
        }
        double wx = x0 - sx, wy = y0 - sy;
        double t = (wx * ey - wy * ex) / den, v = (wx * dy - wy * dx) / den;
        return t > 0 && v >= 0 && v <= 1 ? t : Double.POSITIVE_INFINITY;
    }

    /** {entry, exit} distances of the ray through the circle, {∞, −∞} when it misses. */
    private double[] circleEntry(double sx, double sy, double dx, double dy) {
        double fx = sx - cx, fy = sy - cy, b = fx * dx + fy * dy, c = fx * fx + fy * fy - r * r;
        double disc = b * b - c;
        if (disc < 0) {
            return new double[] {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        }
        double root = Math.sqrt(disc);
        double t0 = -b - root, t1 = -b + root;
        return new double[] {t0 > 0 ? t0 : (t1 > 0 ? 0 : Double.POSITIVE_INFINITY), t1};
    }

    /** Whether (x, y) lies inside this obstacle by more than tol (m); segments have no inside. */
    boolean containsStrictly(double x, double y, double tol) {
        if (block == Block.SEG) {
            return false;
        }
        boolean inCircle = Math.hypot(x - cx, y - cy) < r - tol;
        return inCircle && (block == Block.DISK || mx * (x - x0) + my * (y - y0) > tol);
    }

    /** Point k of n on the outline of this obstacle (m), written into p. Modifies p. */
    void outline(int k, int n, double[] p) {
        double u = (k + 0.5) / n;
        if (block == Block.SEG || (block == Block.CAP && k % 2 == 1)) {
            p[0] = x0 + u * (x1 - x0);
            p[1] = y0 + u * (y1 - y0);
            return;
        }
        double a = block == Block.DISK ? 2 * Math.PI * u : a0 + u * sweep;
        p[0] = cx + r * Math.cos(a);
        p[1] = cy + r * Math.sin(a);
    }

    /** Bounding box {minX, minY, maxX, maxY} of the obstacle (m). */
    double[] box() {
        if (block == Block.SEG) {
            return new double[] {Math.min(x0, x1), Math.min(y0, y1), Math.max(x0, x1), Math.max(y0, y1)};
        }
        return new double[] {cx - r, cy - r, cx + r, cy + r};
    }
}
