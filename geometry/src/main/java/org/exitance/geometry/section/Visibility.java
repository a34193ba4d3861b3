package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The directions in which a point s of an emitter sees a receiver's radiating face directly:
 * the face's angular range, cut to the emitter's front half (φ ∈ [−π/2, π/2] from the normal),
 * minus the angular shadows of the obstacles that lie in front of the face. Every obstacle is
 * convex (segment, disk, arc region) and disjoint from the face, so along the overlap of the two
 * ranges one of them is nearer throughout; one ray at the middle of the overlap decides which.
 * The result lists each visible interval with the {@link Feature}s that fix its edges.
 */
final class Visibility {

    /** The visible intervals at one point: features of the low and high edge of each. */
    static final class Signature {
        final List<Feature> lo = new ArrayList<>(), hi = new ArrayList<>();

        boolean sameAs(Signature o) {
            if (lo.size() != o.lo.size()) {
                return false;
            }
            for (int k = 0; k < lo.size(); k++) {
                if (lo.get(k).id != o.lo.get(k).id || hi.get(k).id != o.hi.get(k).id) {
                    return false;
                }
            }
            return true;
        }
    }

    private record Shadow(double lo, double hi, Feature loF, Feature hiF) {
    }

    private static final Comparator<Shadow> ORDER = Comparator.comparingDouble(Shadow::lo)
            .thenComparingDouble(Shadow::hi).thenComparingLong(s -> s.loF().id);
    private static final double HALF_PI = 0.5 * Math.PI;

    private Visibility() {
    }

    /**
     * @param e emitter
     * @param u parameter of the point on the emitter, in [0, 1]
     * @param rcv receiver
     * @param obstacles pieces that may block (neither e nor rcv); not modified
     * @return the visible intervals
     */
    static Signature at(Piece e, double u, Piece rcv, List<Piece> obstacles) {
        Signature sig = new Signature();
        double sx = e.px(u), sy = e.py(u);
        double[] fr = new double[4];
        e.frame(u, fr);
        double[] d = new double[4];
        Feature[] f = new Feature[2];
        if (!rcv.faceEdges(sx, sy, d, f)) {
            return sig;
        }
        double p1 = phi(d[0], d[1], fr), p2 = phi(d[2], d[3], fr), w = Feature.wrap(p2 - p1);
        double lo = w >= 0 ? p1 : p2, hi = lo + Math.abs(w);
        Feature loF = w >= 0 ? f[0] : f[1], hiF = w >= 0 ? f[1] : f[0];
        if (lo > HALF_PI) {
            lo -= 2 * Math.PI;
            hi -= 2 * Math.PI;
        }
        if (lo < -HALF_PI - 1e-12) {
            lo = -HALF_PI;
            loF = Feature.horizon(-1);
        }
        if (hi > HALF_PI + 1e-12) {
            hi = HALF_PI;
            hiF = Feature.horizon(+1);
        }
        if (!(hi > lo)) {
            return sig;
        }
        List<Shadow> shadows = new ArrayList<>();
        List<double[]> dirs = new ArrayList<>();
        List<Feature> feats = new ArrayList<>();
        for (Piece b : obstacles) {
            dirs.clear();
            feats.clear();
            b.obstacleEdges(sx, sy, dirs, feats);
            if (dirs.isEmpty()) {
                continue;
            }
            double ref = phi(dirs.get(0)[0], dirs.get(0)[1], fr), min = 0, max = 0;
            Feature minF = feats.get(0), maxF = feats.get(0);
            for (int k = 1; k < dirs.size(); k++) {
                double off = Feature.wrap(phi(dirs.get(k)[0], dirs.get(k)[1], fr) - ref);
                if (off < min) {
                    min = off;
                    minF = feats.get(k);
                } else if (off > max) {
                    max = off;
                    maxF = feats.get(k);
                }
            }
            for (int k = -1; k <= 1; k++) {
                double bl = ref + min + 2 * Math.PI * k, bh = ref + max + 2 * Math.PI * k;
                double ol = Math.max(bl, lo), oh = Math.min(bh, hi);
                if (oh - ol > 1e-13) {
                    double pm = 0.5 * (ol + oh), c = Math.cos(pm), s = Math.sin(pm);
                    double dx = c * fr[2] + s * fr[0], dy = c * fr[3] + s * fr[1];
                    if (b.obstacleEntry(sx, sy, dx, dy) < rcv.faceHit(sx, sy, dx, dy)) {
                        shadows.add(new Shadow(bl, bh, minF, maxF));
                    }
                }
            }
        }
        shadows.sort(ORDER);
        double cur = lo;
        Feature curF = loF;
        for (Shadow s : shadows) {
            if (s.lo() > cur) {
                boolean inside = s.lo() < hi;
                sig.lo.add(curF);
                sig.hi.add(inside ? s.loF() : hiF);
                if (!inside) {
                    return sig;
                }
            }
            if (s.hi() > cur) {
                cur = s.hi();
                curF = s.hiF();
            }
            if (cur >= hi) {
                return sig;
            }
        }
        sig.lo.add(curF);
        sig.hi.add(hiF);
        return sig;
    }

    /**
     * Whether the line through the emitter point at u with direction (dx, dy), taken toward the
     * emitter's front, falls within the receiver's face as seen from there (within tol, rad),
     * before obstacles. Used to skip candidate cuts that cannot change the visible set.
     */
    static boolean withinFace(Piece e, double u, Piece rcv, double dx, double dy, double tol) {
        double sx = e.px(u), sy = e.py(u);
        double[] fr = new double[4];
        e.frame(u, fr);
        double[] d = new double[4];
        Feature[] f = new Feature[2];
        if (!rcv.faceEdges(sx, sy, d, f)) {
            return false;
        }
        if (dx * fr[2] + dy * fr[3] < 0) {
            dx = -dx;
            dy = -dy;
        }
        double p1 = phi(d[0], d[1], fr), p2 = phi(d[2], d[3], fr), w = Feature.wrap(p2 - p1);
        double lo = w >= 0 ? p1 : p2, hi = lo + Math.abs(w), p = phi(dx, dy, fr);
        for (int k = -1; k <= 1; k++) {
            double q = p + 2 * Math.PI * k;
            if (q >= lo - tol && q <= hi + tol) {
                return true;
            }
        }
        return false;
    }

    /** Angle (rad) of direction (dx, dy) from the normal fr[2..3], positive toward the tangent fr[0..1]. */
    private static double phi(double dx, double dy, double[] fr) {
        return Math.atan2(dx * fr[0] + dy * fr[1], dx * fr[2] + dy * fr[3]);
    }
}
