package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * One side of a pair in {@link CurvedPairs}: an exact {@link Patch} (or a parameter sub-rectangle
 * of one) or a plain planar polygon. Knows its bounding sphere, its quadrature rule with
 * per-point normals, how to halve itself and its inscribed (chord) polygon. Mutable; owned by
 * one thread.
 */
final class Piece {

    /** Vertices added along each arc of a planar patch's chord polygon. */
    static final int ARC_VERTICES = 4;

    Patch patch;
    final Poly poly = new Poly();
    double cx, cy, cz, radius, area;
    /** Radiating normal at the centre. */
    double nx, ny, nz;
    private final double[] e = new double[7];
    private final double[] axis = new double[3];
    private final double[] scratch = new double[3 * Poly.MAX_VERTICES];

    void setPatch(Patch p) {
        patch = p;
        area = p.area();
        p.evaluate(0.5 * (p.u0() + p.u1()), 0.5 * (p.phi0() + p.phi1()), e, 0);
        cx = e[0];
        cy = e[1];
        cz = e[2];
        nx = e[3];
        ny = e[4];
        nz = e[5];
        double r2 = 0;
        for (int i = 0; i <= 4; i++) {
            for (int j = 0; j <= 4; j++) {
                p.evaluate(p.u0() + (p.u1() - p.u0()) * i / 4, p.phi0() + (p.phi1() - p.phi0()) * j / 4, e, 0);
                r2 = Math.max(r2, sq(e[0] - cx) + sq(e[1] - cy) + sq(e[2] - cz));
            }
        }
        // the 5 × 5 samples miss the farthest point by at most the sagitta of a quarter cell
        radius = Math.sqrt(r2) * 1.02;
    }

    void setPoly(Poly p) {
        patch = null;
        poly.copyFrom(p);
        area = p.area;
        cx = p.cx;
        cy = p.cy;
        cz = p.cz;
        radius = p.radius;
        nx = p.nx;
        ny = p.ny;
        nz = p.nz;
    }

    /** @return the largest angle (rad) spanned by a curved direction: the chord error is ~ angle²/8 */
    double angle() {
        if (patch == null) {
            return 0;
        }
        double d = patch.phi1() - patch.phi0();
        return patch.kind() == Patch.Kind.SPHERE ? Math.max(d, patch.u1() - patch.u0()) : d;
    }

    /**
     * Writes the order-m rule (x, y, z, w, nx, ny, nz per point) into {@code out} (modified).
     *
     * @param rule scratch of length ≥ {@link Poly#RULE_SCRATCH} (overwritten)
     * @return number of points
     */
    int rule(int m, double[] out, double[] rule) {
        if (patch == null) {
            int np = AreaRules.build(poly, m, rule, 0);
            for (int k = 0; k < np; k++) {
                System.arraycopy(rule, 4 * k, out, 7 * k, 4);
                out[7 * k + 4] = poly.nx;
                out[7 * k + 5] = poly.ny;
                out[7 * k + 6] = poly.nz;
            }
            return np;
        }
        double[] g = GaussLegendre.nodes(m), w = GaussLegendre.weights(m);
        double du = patch.u1() - patch.u0(), dp = patch.phi1() - patch.phi0();
        int k = 0;
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                patch.evaluate(patch.u0() + du * g[i], patch.phi0() + dp * g[j], e, 0);
                out[7 * k] = e[0];
                out[7 * k + 1] = e[1];
                out[7 * k + 2] = e[2];
                out[7 * k + 3] = w[i] * w[j] * du * dp * e[6];
                out[7 * k + 4] = e[3];
                out[7 * k + 5] = e[4];
                out[7 * k + 6] = e[5];
                k++;
            }
        }
        return k;
    }

    /** Splits this piece in two halves a and b (both modified). */
    void split(Piece a, Piece b) {
        if (patch != null) {
            Patch p = patch;
            double lu = p.lengthU(), lp = p.maxRadius() * (p.phi1() - p.phi0());
            if (lu >= lp) {
                double mid = 0.5 * (p.u0() + p.u1());
                a.setPatch(p.sub(p.u0(), mid, p.phi0(), p.phi1()));
                b.setPatch(p.sub(mid, p.u1(), p.phi0(), p.phi1()));
            } else {
                double mid = 0.5 * (p.phi0() + p.phi1());
                a.setPatch(p.sub(p.u0(), p.u1(), p.phi0(), mid));
                b.setPatch(p.sub(p.u0(), p.u1(), mid, p.phi1()));
            }
            return;
        }
        poly.longAxis(axis);
        double d = axis[0] * poly.cx + axis[1] * poly.cy + axis[2] * poly.cz;
        a.setPoly(poly);
        b.setPoly(poly);
        a.poly.clip(axis[0], axis[1], axis[2], d, scratch);
        b.poly.clip(-axis[0], -axis[1], -axis[2], -d, scratch);
        a.setPoly(a.poly);
        b.setPoly(b.poly);
    }

    /**
     * The inscribed polygon: the patch's corners (a degenerate corner at a centre, apex or pole
     * dropped), with {@value #ARC_VERTICES} more vertices along each arc of a planar patch;
     * counter-clockwise about the radiating normal. Writes {@code out} (modified).
     */
    void chord(Poly out) {
        chord(out, patch != null && patch.kind() == Patch.Kind.PLANE ? ARC_VERTICES : 0);
    }

    /** @return true for a planar piece (a plain polygon or a planar patch) */
    boolean planar() {
        return patch == null || patch.kind() == Patch.Kind.PLANE;
    }

    /**
     * The inscribed polygon with {@code arc} extra vertices along each arc of a planar patch
     * (arc + 1 chords per arc); as {@link #chord(Poly)} otherwise. Writes {@code out} (modified).
     */
    void chord(Poly out, int arc) {
        if (patch == null) {
            out.copyFrom(poly);
            return;
        }
        Patch p = patch;
        int n = 0;
        if (p.kind() != Patch.Kind.PLANE) {
            arc = 0;
        }
        n = addCorner(p, p.u0(), p.phi0(), n);
        n = addCorner(p, p.u1(), p.phi0(), n);
        for (int k = 1; k <= arc; k++) {
            n = addCorner(p, p.u1(), p.phi0() + (p.phi1() - p.phi0()) * k / (arc + 1), n);
        }
        n = addCorner(p, p.u1(), p.phi1(), n);
        n = addCorner(p, p.u0(), p.phi1(), n);
        if (p.u0() > 0) {
            for (int k = arc; k >= 1; k--) {
                n = addCorner(p, p.u0(), p.phi0() + (p.phi1() - p.phi0()) * k / (arc + 1), n);
            }
        }
        // drop a repeated last vertex (degenerate closing corner)
        if (n > 3 && same(scratch, 0, 3 * (n - 1))) {
            n--;
        }
        out.setVertices(scratch, n);
        p.evaluate(0.5 * (p.u0() + p.u1()), 0.5 * (p.phi0() + p.phi1()), e, 0);
        if (out.nx * e[3] + out.ny * e[4] + out.nz * e[5] < 0) {
            for (int k = 0; k < n / 2; k++) {
                for (int c = 0; c < 3; c++) {
                    double t = scratch[3 * k + c];
                    scratch[3 * k + c] = scratch[3 * (n - 1 - k) + c];
                    scratch[3 * (n - 1 - k) + c] = t;
                }
            }
            out.setVertices(scratch, n);
        }
    }

    private int addCorner(Patch p, double u, double phi, int n) {
        p.evaluate(u, phi, e, 0);
        if (n > 0 && Math.abs(e[0] - scratch[3 * n - 3]) + Math.abs(e[1] - scratch[3 * n - 2])
                + Math.abs(e[2] - scratch[3 * n - 1]) <= 1e-12 * radius) {
            return n;
        }
        scratch[3 * n] = e[0];
        scratch[3 * n + 1] = e[1];
        scratch[3 * n + 2] = e[2];
        return n + 1;
    }

    private boolean same(double[] v, int i, int j) {
        return Math.abs(v[i] - v[j]) + Math.abs(v[i + 1] - v[j + 1]) + Math.abs(v[i + 2] - v[j + 2]) <= 1e-12 * radius;
    }

    private static double sq(double v) {
        return v * v;
    }
}
