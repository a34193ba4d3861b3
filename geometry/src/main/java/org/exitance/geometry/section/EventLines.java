package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.List;

/**
 * Where along an emitter the set of strings can change. Seen from a point s, two features (end
 * points, circles of arcs, tubes and obstacles) swap order or start to hide each other only where
 * s lies on a line tangent to both (a point is a circle of radius 0); a feature crosses the
 * horizon of a curved emitter only where the emitter's tangent line touches it. The emitter
 * parameters of those lines' crossings and touching points are returned as candidate cuts, so
 * the cuts of {@link CrossedStrings} do not depend on sampling finely enough. Cost: O(K²) lines
 * for K features. Used internally by {@link CrossedStrings}.
 */
final class EventLines {

    private EventLines() {
    }

    /**
     * @param e emitter
     * @param rcv receiver
     * @param obstacles obstacles of the pair; not modified
     * @return candidate parameters in (0, 1), unsorted
     */
    static List<Double> candidates(Piece e, Piece rcv, List<Piece> obstacles) {
        List<double[]> circles = new ArrayList<>();
        features(rcv, circles);
        int own = circles.size();
        for (Piece o : obstacles) {
            features(o, circles);
        }
        List<Double> out = new ArrayList<>();
        boolean curved = e.kind != Piece.Kind.FLAT;
        for (int a = 0; a < circles.size(); a++) {
            for (int b = a + 1; b < circles.size(); b++) {
                for (double[] line : tangents(circles.get(a), circles.get(b))) {
                    cross(e, rcv, line, a >= own, out);
                }
            }
            if (curved) {
                for (double[] line : tangents(new double[] {e.cx, e.cy, e.r}, circles.get(a))) {
                    // the touching point on the emitter circle: centre − r n
                    add(e, rcv, e.cx - e.r * line[0], e.cy - e.r * line[1], line, a >= own, out);
                }
            }
        }
        return out;
    }

    private static void features(Piece p, List<double[]> circles) {
        if (p.kind != Piece.Kind.DISK && p.block != Piece.Block.DISK) {
            circles.add(new double[] {p.x0, p.y0, 0});
            circles.add(new double[] {p.x1, p.y1, 0});
        }
        if (p.kind != Piece.Kind.FLAT || p.block == Piece.Block.CAP) {
            circles.add(new double[] {p.cx, p.cy, p.r});
        }
    }

    /**
     * Lines n·x + c = 0 (unit n) at signed distance r1 from the first centre and ±r2 from the
     * second: the common tangents of two circles (radius 0 for a point).
     *
     * @return {nx, ny, c} for each line
     */
    static List<double[]> tangents(double[] c1, double[] c2) {
        List<double[]> lines = new ArrayList<>();
        double dx = c2[0] - c1[0], dy = c2[1] - c1[1], d = Math.hypot(dx, dy);
        if (!(d > 0)) {
            return lines;
        }
        double ux = dx / d, uy = dy / d;
        for (int s2 = -1; s2 <= 1; s2 += 2) {
            double k = (s2 * c2[2] - c1[2]) / d;
            if (Math.abs(k) > 1 + 1e-12) {
                continue;
            }
            k = Math.max(-1, Math.min(1, k));
            double h = Math.sqrt(1 - k * k);
            for (int s = -1; s <= 1; s += 2) {
                double nx = k * ux - s * h * uy, ny = k * uy + s * h * ux;
                lines.add(new double[] {nx, ny, c1[2] - (nx * c1[0] + ny * c1[1])});
                if (h == 0) {
                    break;
                }
            }
            if (c2[2] == 0) {
                break;
            }
        }
        return lines;
    }

    /** Adds where the line crosses the emitter. Modifies out. */
    private static void cross(Piece e, Piece rcv, double[] line, boolean prune, List<Double> out) {
        double nx = line[0], ny = line[1], c = line[2];
        if (e.kind == Piece.Kind.FLAT) {
            double f0 = nx * e.x0 + ny * e.y0 + c, f1 = nx * e.x1 + ny * e.y1 + c;
            if (f0 != f1 && f0 * f1 < 0) {
                double u = f0 / (f0 - f1);
                if (!prune || Visibility.withinFace(e, u, rcv, -ny, nx, 1e-9)) {
                    out.add(u);
                }
            }
            return;
        }
        double dist = nx * e.cx + ny * e.cy + c;
        if (Math.abs(dist) >= e.r) {
            return;
        }
        double h = Math.sqrt(e.r * e.r - dist * dist);
        double fx = e.cx - dist * nx, fy = e.cy - dist * ny;
        add(e, rcv, fx - h * ny, fy + h * nx, line, prune, out);
        add(e, rcv, fx + h * ny, fy - h * nx, line, prune, out);
    }

    /**
     * Adds the parameter of a point of the emitter's circle if it lies on the emitter and, when
     * pruning (lines between obstacle features only), if the line falls within the receiver's
     * face there. Modifies out.
     */
    private static void add(Piece e, Piece rcv, double x, double y, double[] line, boolean prune, List<Double> out) {
        double a = Math.atan2(y - e.cy, x - e.cx) - e.a0;
        a -= 2 * Math.PI * Math.floor(a / (2 * Math.PI));
        double u = a / e.sweep;
        if (u > 0 && u < 1 && (!prune || Visibility.withinFace(e, u, rcv, -line[1], line[0], 1e-9))) {
            out.add(u);
        }
    }
}
