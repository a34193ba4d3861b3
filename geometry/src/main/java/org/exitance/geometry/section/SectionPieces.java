package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.List;

import org.exitance.geometry.GeometryException;
import org.exitance.geometry.section.SectionElement.Arc;
import org.exitance.geometry.section.SectionElement.Circle;
import org.exitance.geometry.section.SectionElement.Segment;
import org.exitance.geometry.section.SectionElement.Side;

/**
 * Turns the surfaces of a section (in canonical order) into {@link Piece}s and checks what the
 * crossed-string calculation needs: surfaces may touch but not cross or overlap; nothing lies in
 * the hollow of a concave arc (between the arc and its chord); at most one inward-radiating
 * circle (a shell), with everything else strictly inside it.
 */
final class SectionPieces {
    final List<Piece> pieces = new ArrayList<>();
    /** index of the shell surface, or −1 */
    final int shell;
    /** L_arc − L_chord for concave arcs (m), 0 otherwise: the self-exchange of the hollow */
    final double[] selfExchange;
    /** per piece: the strip lying exactly on this chord and facing into the hollow (a lid), or −1 */
    final int[] lidOf;

    /**
     * @param elements surfaces in canonical order; not modified
     * @param names their names, for messages; not modified
     * @throws GeometryException if the section breaks one of the rules above
     */
    SectionPieces(List<SectionElement> elements, List<String> names) {
        int n = elements.size();
        selfExchange = new double[n];
        int shellIndex = -1;
        for (int i = 0; i < n; i++) {
            SectionElement el = elements.get(i);
            if (el instanceof Segment s) {
                add(Piece.Kind.FLAT, Piece.Block.SEG, i, s.x0(), s.y0(), s.x1(), s.y1(), 0, 0, 0, 0, 0);
            } else if (el instanceof Circle c && c.side() == Side.CONVEX) {
                add(Piece.Kind.DISK, Piece.Block.DISK, i, 0, 0, 0, 0, c.cx(), c.cy(), c.radius(), 0, 2 * Math.PI);
            } else if (el instanceof Circle c) {
                if (shellIndex >= 0) {
                    throw new GeometryException("section surfaces '" + names.get(shellIndex) + "' and '"
                            + names.get(i) + "' are both inward-radiating circles; at most one shell is supported");
                }
                shellIndex = i;
            } else {
                Arc a = (Arc) el;
                if (a.side() == Side.CONVEX) {
                    int parts = (int) Math.ceil(a.sweep() / Math.PI - 1e-12);
                    for (int k = 0; k < parts; k++) {
                        arcPiece(Piece.Kind.ARC, i, a, a.startAngle() + k * a.sweep() / parts, a.sweep() / parts);
                    }
                } else {
                    arcPiece(Piece.Kind.FLAT, i, a, a.startAngle(), a.sweep());
                    selfExchange[i] = a.length() - pieces.get(pieces.size() - 1).length;
                }
            }
        }
        shell = shellIndex;
        double scale = 0;
        for (Piece p : pieces) {
            double[] b = p.box();
            scale = Math.max(scale, Math.max(Math.max(Math.abs(b[0]), Math.abs(b[1])),
                    Math.max(Math.abs(b[2]), Math.abs(b[3]))));
            scale = Math.max(scale, p.length);
        }
        double tol = 1e-9 * scale;
        lidOf = new int[pieces.size()];
        java.util.Arrays.fill(lidOf, -1);
        for (int a = 0; a < pieces.size(); a++) {
            for (int b = a + 1; b < pieces.size(); b++) {
                if (!lid(pieces.get(a), pieces.get(b), names, tol) && !lid(pieces.get(b), pieces.get(a), names, tol)) {
                    checkApart(pieces.get(a), pieces.get(b), elements, names, tol);
                }
            }
        }
        if (shell >= 0) {
            checkInside((Circle) elements.get(shell), names, tol);
        }
    }

    private void arcPiece(Piece.Kind kind, int owner, Arc a, double start, double sweep) {
        double ax = a.cx() + a.radius() * Math.cos(start), ay = a.cy() + a.radius() * Math.sin(start);
        double bx = a.cx() + a.radius() * Math.cos(start + sweep), by = a.cy() + a.radius() * Math.sin(start + sweep);
        add(kind, Piece.Block.CAP, owner, ax, ay, bx, by, a.cx(), a.cy(), a.radius(), start, sweep);
    }

    private void add(Piece.Kind kind, Piece.Block block, int owner, double... g) {
        pieces.add(new Piece(kind, block, pieces.size(), owner, g));
    }

    /**
     * Whether strip s lies on the chord of concave arc c and faces into its hollow (a lid): then
     * the lid and the hollow see only each other through the chord. Modifies lidOf.
     *
     * @throws GeometryException if s lies along the chord otherwise (partly, or with its back to the hollow)
     */
    private boolean lid(Piece c, Piece s, List<String> names, double tol) {
        if (c.kind != Piece.Kind.FLAT || c.block != Piece.Block.CAP || s.block != Piece.Block.SEG
                || collinearOverlap(c, s, tol) == null) {
            return false;
        }
        boolean same = Math.hypot(s.x0 - c.x1, s.y0 - c.y1) < tol && Math.hypot(s.x1 - c.x0, s.y1 - c.y0) < tol;
        boolean reversed = Math.hypot(s.x0 - c.x0, s.y0 - c.y0) < tol && Math.hypot(s.x1 - c.x1, s.y1 - c.y1) < tol;
        if (same) {
            lidOf[c.id] = s.id;
            return true;
        }
        throw new GeometryException("section surface '" + names.get(s.owner) + "' lies along the chord of concave arc '"
                + names.get(c.owner) + "'" + (reversed ? " with its back to the hollow" : " but does not cover it exactly")
                + "; a strip on the chord must run from the arc's end to its start, radiating into the hollow");
    }

    private static void checkApart(Piece p, Piece q, List<SectionElement> elements, List<String> names,
            double tol) {
        double[] pt = new double[2];
        String where = null;
        for (int k = 0; k < 256 && where == null; k++) {
            p.outline(k, 256, pt);
            if (q.containsStrictly(pt[0], pt[1], tol)) {
                where = at(pt);
            }
            q.outline(k, 256, pt);
            if (where == null && p.containsStrictly(pt[0], pt[1], tol)) {
                where = at(pt);
            }
        }
        if (where == null && p.block == Piece.Block.SEG && q.block == Piece.Block.SEG) {
            where = segmentsCross(p, q, tol);
        }
        if (where == null && (p.block == Piece.Block.SEG) != (q.block == Piece.Block.SEG)) {
            Piece s = p.block == Piece.Block.SEG ? p : q, c = s == p ? q : p;
            double[][] ends = {{s.x0, s.y0}, {s.x1, s.y1}};
            for (double[] e : ends) {
                if (c.containsStrictly(e[0], e[1], tol)) {
                    where = at(e);
                }
            }
            if (where == null && c.block == Piece.Block.DISK && distanceToSegment(s, c.cx, c.cy) < c.r - tol) {
                where = "a chord of circle (" + c.cx + ", " + c.cy + ")";
            }
        }
        if (where == null) {
            return;
        }
        String a = names.get(p.owner), b = names.get(q.owner);
        if (p.owner == q.owner) {
            throw new GeometryException("section surface '" + a + "' crosses itself near " + where);
        }
        for (Piece hollow : new Piece[] {p, q}) {
            SectionElement el = elements.get(hollow.owner);
            if (el instanceof Arc arc && arc.side() == Side.CONCAVE) {
                String other = hollow == p ? b : a;
                throw new GeometryException("section surface '" + other + "' reaches into the hollow of concave arc '"
                        + names.get(hollow.owner) + "' (between the arc and its chord) near " + where
                        + "; crossed strings are not supported there: make the arc of segments or move the surface");
            }
        }
        throw new GeometryException("section surfaces '" + a + "' and '" + b + "' overlap near " + where
                + "; surfaces may touch but not cross");
    }

    private static String segmentsCross(Piece p, Piece q, double tol) {
        double ex = p.x1 - p.x0, ey = p.y1 - p.y0, fx = q.x1 - q.x0, fy = q.y1 - q.y0;
        double den = ex * fy - ey * fx;
        double wx = q.x0 - p.x0, wy = q.y0 - p.y0;
        if (Math.abs(den) <= 1e-14 * p.length * q.length) {
            return collinearOverlap(p, q, tol);
        }
        double t = (wx * fy - wy * fx) / den, v = (wx * ey - wy * ex) / den;
        double et = tol / p.length, ev = tol / q.length;
        return t > et && t < 1 - et && v > ev && v < 1 - ev ? "(" + (p.x0 + t * ex) + ", " + (p.y0 + t * ey) + ")" : null;
    }

    /** Where two segments on one line overlap by more than a point, or null. */
    private static String collinearOverlap(Piece p, Piece q, double tol) {
        double ex = p.x1 - p.x0, ey = p.y1 - p.y0, wx = q.x0 - p.x0, wy = q.y0 - p.y0;
        double vx = q.x1 - p.x0, vy = q.y1 - p.y0;
        if (Math.abs(ex * wy - ey * wx) > tol * p.length || Math.abs(ex * vy - ey * vx) > tol * p.length) {
            return null;
        }
        double t0 = (wx * ex + wy * ey) / (p.length * p.length), t1 = (vx * ex + vy * ey) / (p.length * p.length);
        double lo = Math.max(0, Math.min(t0, t1)), hi = Math.min(1, Math.max(t0, t1));
        return hi - lo > tol / p.length ? "(" + (p.x0 + lo * ex) + ", " + (p.y0 + lo * ey) + ")" : null;
    }

    private static double distanceToSegment(Piece s, double x, double y) {
        double ex = s.x1 - s.x0, ey = s.y1 - s.y0;
        double t = Math.max(0, Math.min(1, ((x - s.x0) * ex + (y - s.y0) * ey) / (ex * ex + ey * ey)));
        return Math.hypot(x - s.x0 - t * ex, y - s.y0 - t * ey);
    }

    private void checkInside(Circle c, List<String> names, double tol) {
        double[] pt = new double[2];
        for (Piece p : pieces) {
            for (int k = 0; k < 258; k++) {
                if (k < 256) {
                    p.outline(k, 256, pt);
                } else if (p.block == Piece.Block.DISK) {
                    continue;
                } else {
                    pt[0] = k == 256 ? p.x0 : p.x1;
                    pt[1] = k == 256 ? p.y0 : p.y1;
                }
                if (!(Math.hypot(pt[0] - c.cx(), pt[1] - c.cy()) < c.radius() - tol)) {
                    throw new GeometryException("section surface '" + names.get(p.owner) + "' is not inside the shell '"
                            + names.get(shell) + "' (near " + at(pt) + "); an inward-radiating circle must enclose "
                            + "every other surface");
                }
            }
        }
    }

    private static String at(double[] p) {
        return "(" + p[0] + ", " + p[1] + ")";
    }
}
