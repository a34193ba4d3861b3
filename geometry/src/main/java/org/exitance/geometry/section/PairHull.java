package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A convex polygon containing two pieces: every segment from one to the other lies inside it, so
 * an obstacle wholly outside one of its edges cannot block the pair. Circles and arcs are
 * enclosed by their circumscribed 16-gon. Andrew's monotone chain (Andrew, Inf. Process. Lett.
 * 9 (1979) 216–219). Used internally by {@link SectionViewFactors}.
 */
final class PairHull {
    private final double[] xs, ys;

    PairHull(Piece a, Piece b) {
        List<double[]> pts = new ArrayList<>();
        corners(a, pts);
        corners(b, pts);
        pts.sort((p, q) -> p[0] != q[0] ? Double.compare(p[0], q[0]) : Double.compare(p[1], q[1]));
        double[][] hull = new double[2 * pts.size()][];
        int k = 0;
        for (int pass = 0; pass < 2; pass++) {
            int start = k;
            for (int i = 0; i < pts.size(); i++) {
                double[] p = pts.get(pass == 0 ? i : pts.size() - 1 - i);
                while (k >= start + 2 && cross(hull[k - 2], hull[k - 1], p) <= 0) {
                    k--;
                }
                hull[k++] = p;
            }
            k--;
        }
        xs = new double[k];
        ys = new double[k];
        for (int i = 0; i < k; i++) {
            xs[i] = hull[i][0];
            ys[i] = hull[i][1];
        }
    }

    private static void corners(Piece p, List<double[]> pts) {
        if (p.kind == Piece.Kind.FLAT) {
            pts.add(new double[] {p.x0, p.y0});
            pts.add(new double[] {p.x1, p.y1});
            return;
        }
        double rr = p.r / Math.cos(Math.PI / 16);
        for (int k = 0; k < 16; k++) {
            double a = 2 * Math.PI * k / 16;
            pts.add(new double[] {p.cx + rr * Math.cos(a), p.cy + rr * Math.sin(a)});
        }
    }

    private static double cross(double[] o, double[] a, double[] b) {
        return (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
    }

    /** Whether the obstacle lies wholly outside one edge of the hull (then it cannot block). */
    boolean excludes(Piece o) {
        int n = xs.length;
        if (n < 3) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double ex = xs[j] - xs[i], ey = ys[j] - ys[i], len = Math.hypot(ex, ey);
            if (len == 0) {
                continue;
            }
            // the hull runs counter-clockwise: outside is to the right of each edge
            double[] dist;
            if (o.block == Piece.Block.SEG) {
                dist = new double[] {side(i, ex, ey, len, o.x0, o.y0), side(i, ex, ey, len, o.x1, o.y1)};
            } else {
                dist = new double[] {side(i, ex, ey, len, o.cx, o.cy) + o.r};
            }
            if (Arrays.stream(dist).allMatch(d -> d < 0)) {
                return true;
            }
        }
        return false;
    }

    /** Signed distance of (x, y) to the left of edge i (m). */
    private double side(int i, double ex, double ey, double len, double x, double y) {
        return (ex * (y - ys[i]) - ey * (x - xs[i])) / len;
    }
}
