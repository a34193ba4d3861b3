package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * Exchange area of two exact patches of revolution on one axis with round solids on the same
 * axis in the way ({@link RoundSolids}: a billet, an inner tube), by the definition (Siegel &amp;
 * Howell, 4th ed., eq. 4.13, with the visibility function V) reduced by the rotational symmetry:
 * kernel and visibility depend on the two azimuths only through ψ = φ_y − φ_x, so
 *
 * <pre>  A_a F_ab = ∫∫ J_a(u) J_b(v) (1/π) ∫ w(ψ) A⁺ B⁺ V / R² dψ du dv </pre>
 *
 * with w(ψ) the length of the azimuths of a whose partner φ_x + ψ lies on b (a trapezoid), and,
 * for x = (ρ_x, 0, z_x) and y = (ρ_y cos ψ, ρ_y sin ψ, z_y) in a's axis frame, A = cos θ_x r,
 * B = cos θ_y r and R = r², each of the form α + β cos ψ.
 *
 * <ul>
 *   <li>Inner, over ψ, with exact visibility: {@link CoaxialAzimuths}. The segment x → y meets
 *       the solid cylinder (r, z0..z1) when the parameter interval where its horizontal
 *       projection lies within r overlaps the one where its height lies in [z0, z1].</li>
 *   <li>Outer, over (u, v): 6 × 6 Gauss cells halved in the direction whose halves disagree
 *       more, as in {@link PartialPairs}. Where the two patches meet (a wall on an annulus) the
 *       integrand grows like 1/d toward that corner, and two patches of one surface sharing a u
 *       range have a kink along u = v; such squares are split from the corner into two
 *       triangles mapped to squares (Jacobian σ), which removes both.</li>
 * </ul>
 * Mutable scratch; one instance per thread.
 */
final class CoaxialPairs {

    private static final int N = 6, MAX_DEPTH = 40;
    private static final double[] GN = GaussLegendre.nodes(N), WN = GaussLegendre.weights(N);
    private static final double[] GL = GaussLegendre.nodes(N - 2), WL = GaussLegendre.weights(N - 2);
    /** Kernel evaluations per pair after which cells are accepted as they are (the differences stay in the estimate). */
    static final long BUDGET = 40_000_000L;
    static final int RECT = 0, LOWER = 1, UPPER = 2;

    private Patch pa, pb;
    private double oax, oay, oaz, e3x, e3y, e3z;
    private double sB;
    private final double[] ring = new double[16];
    private final CoaxialAzimuths psi = new CoaxialAzimuths();
    private int mode;
    /** The corner and the signed sides of the current triangle pair (LOWER, UPPER). */
    private double cu, cv, hu, hv;
    private double innerTol, outerError;
    /** Error estimate of the last call (m²). */
    double lastError;
    /** Kernel evaluations of the last call. */
    long lastEvaluations;

    /** @return true for a patch this class integrates: a plane annular sector or a cone or cylinder band */
    static boolean revolution(Patch p) {
        return p != null && p.kind() != Patch.Kind.SPHERE;
    }

    /** Most round solids in the way of one pair. */
    static final int MAX_SOLIDS = 16;
    private final int[] solids = new int[MAX_SOLIDS];

    /**
     * Prepares the pair (i, j) if it is one this class takes: both exact patches of revolution,
     * every blocker a member of a round solid that {@link RoundSolids#admits} both.
     *
     * @param blockers facets that may block the pair, [0, count) (not modified)
     * @return −1 when it is not such a pair, else {@link #coverage}
     */
    int coverage(FacetTable t, int i, int j, int[] blockers, int count) {
        Patch a = t.patch[i], b = t.patch[j];
        if (t.round == null || !revolution(a) || !revolution(b)) {
            return -1;
        }
        int n = 0;
        for (int k = 0; k < count; k++) {
            int s = t.round.solidOf[blockers[k]];
            if (s < 0) {
                return -1;
            }
            boolean known = false;
            for (int m = 0; m < n; m++) {
                known |= solids[m] == s;
            }
            if (!known) {
                if (n == MAX_SOLIDS || !t.round.admits(s, a, t.sceneSize) || !t.round.admits(s, b, t.sceneSize)) {
                    return -1;
                }
                solids[n++] = s;
            }
        }
        prepare(a, b, t.round, solids, n);
        return coverage();
    }

    /**
     * Sets the pair and the solids in the way; call before {@link #coverage} and
     * {@link #exchangeArea}.
     *
     * @param a first patch, PLANE or CONE (not modified)
     * @param b second patch on the same axis (a itself for a concave patch seeing itself)
     * @param rs the scene's round solids
     * @param solids indices of the solids in the way, [0, n) (not modified)
     */
    void prepare(Patch a, Patch b, RoundSolids rs, int[] solids, int n) {
        pa = a;
        pb = b;
        oax = a.frame(0);
        oay = a.frame(1);
        oaz = a.frame(2);
        e3x = a.frame(9);
        e3y = a.frame(10);
        e3z = a.frame(11);
        sB = Math.signum(b.frame(9) * e3x + b.frame(10) * e3y + b.frame(11) * e3z);
        double beta = Math.atan2(b.frame(3) * a.frame(6) + b.frame(4) * a.frame(7) + b.frame(5) * a.frame(8),
                b.frame(3) * a.frame(3) + b.frame(4) * a.frame(4) + b.frame(5) * a.frame(5));
        double g0 = beta + sB * b.phi0(), g1 = beta + sB * b.phi1();
        psi.set(a.phi0(), a.phi1(), Math.min(g0, g1), Math.max(g0, g1), BUDGET);
        for (int k = 0; k < n; k++) {
            int o = RoundSolids.FIELDS * solids[k];
            double[] d = rs.data;
            double s = Math.signum(d[o + 3] * e3x + d[o + 4] * e3y + d[o + 5] * e3z);
            double off = (d[o] - oax) * e3x + (d[o + 1] - oay) * e3y + (d[o + 2] - oaz) * e3z;
            double za = off + s * d[o + 7], zb = off + s * d[o + 8];
            psi.addSolid(d[o + 6], Math.min(za, zb), Math.max(za, zb));
        }
    }

    /**
     * For a prepared pair whose solids span its heights ({@link RoundSolids#admits}): see
     * {@link CoaxialAzimuths#coverage}.
     *
     * @return SEEN, HIDDEN or PARTIAL
     */
    int coverage() {
        double ra = radius(pa, pa.u0()), rA = radius(pa, pa.u1()), rb = radius(pb, pb.u0()), rB = radius(pb, pb.u1());
        return psi.coverage(Math.min(ra, rA), Math.max(ra, rA), Math.min(rb, rB), Math.max(rb, rB));
    }

    static final int SEEN = CoaxialAzimuths.SEEN, HIDDEN = CoaxialAzimuths.HIDDEN, PARTIAL = CoaxialAzimuths.PARTIAL;

    private static double radius(Patch p, double u) {
        return p.kind() == Patch.Kind.PLANE ? u : p.shapeA() + p.shapeB() * u;
    }

    /**
     * @param tol absolute tolerance (m²)
     * @return A_a F_ab of the prepared pair (m²)
     */
    double exchangeArea(double tol) {
        Patch a = pa, b = pb;
        outerError = 0;
        double du = a.u1() - a.u0(), dv = b.u1() - b.u0();
        innerTol = 0.1 * tol / (du * dv);
        double s = 0;
        double ov0 = Math.max(a.u0(), b.u0()), ov1 = Math.min(a.u1(), b.u1());
        double share = 0.9 * tol / (du * dv);
        if (ov1 > ov0 && sameRings(ov0, ov1)) {
            double[] xs = breaks(a.u0(), a.u1(), ov0, ov1), ys = breaks(b.u0(), b.u1(), ov0, ov1);
            for (int i = 0; i + 1 < xs.length; i++) {
                for (int k = 0; k + 1 < ys.length; k++) {
                    double area = (xs[i + 1] - xs[i]) * (ys[k + 1] - ys[k]);
                    if (xs[i] == ov0 && ys[k] == ov0) {
                        // the diagonal u = v on the edge τ = 1 of both triangles
                        s += duffy(ov0, ov0, ov1 - ov0, ov1 - ov0, share * area);
                    } else {
                        s += rectangle(xs[i], xs[i + 1], ys[k], ys[k + 1], share * area);
                    }
                }
            }
        } else {
            s = rectangle(a.u0(), a.u1(), b.u0(), b.u1(), 0.9 * tol);
        }
        lastEvaluations = psi.evaluations;
        lastError = outerError + innerTol * du * dv;
        return Math.max(0, s);
    }

    private static double[] breaks(double lo, double hi, double o0, double o1) {
        return java.util.stream.DoubleStream.of(lo, o0, o1, hi).distinct().toArray();
    }

    /** Whether a and b have the same circle at every u of [u0, u1] (two patches of one surface). */
    private boolean sameRings(double u0, double u1) {
        for (double u : new double[] {u0, u1}) {
            pa.ring(u, ring, 0);
            double r1 = ring[3], z1 = height();
            pb.ring(u, ring, 0);
            double scale = Math.abs(r1) + Math.abs(z1) + 1e-300;
            if (Math.abs(ring[3] - r1) > 1e-12 * scale || Math.abs(height() - z1) > 1e-12 * scale) {
                return false;
            }
        }
        return true;
    }

    private double height() {
        return (ring[0] - oax) * e3x + (ring[1] - oay) * e3y + (ring[2] - oaz) * e3z;
    }

    /**
     * One rectangle of (u, v); where a corner is a place where the two patches meet (their circles
     * coincide: a wall standing on a floor, two bands of one wall), the integrand grows like 1/d
     * toward it, so the rectangle is split from that corner into two triangles, each mapped to a
     * square by u = uc + σ Δu, v = vc + σ τ Δv (and u, v swapped), which cancels the singularity
     * with the Jacobian σ.
     */
    private double rectangle(double u0, double u1, double v0, double v1, double tol) {
        for (double u : new double[] {u0, u1}) {
            for (double v : new double[] {v0, v1}) {
                if (meet(u, v)) {
                    return duffy(u, v, (u == u0 ? u1 : u0) - u, (v == v0 ? v1 : v0) - v, tol);
                }
            }
        }
        return region(RECT, u0, u1, v0, v1, tol);
    }

    private double duffy(double uc, double vc, double du, double dv, double tol) {
        cu = uc;
        cv = vc;
        hu = du;
        hv = dv;
        return region(LOWER, 0, 1, 0, 1, 0.5 * tol) + region(UPPER, 0, 1, 0, 1, 0.5 * tol);
    }

    /** Whether a's circle at u and b's at v coincide. */
    private boolean meet(double u, double v) {
        pa.ring(u, ring, 0);
        double r1 = ring[3], z1 = height();
        pb.ring(v, ring, 0);
        double scale = Math.abs(r1) + Math.abs(z1) + Math.abs(ring[3]) + 1e-300;
        return Math.abs(ring[3] - r1) <= 1e-12 * scale && Math.abs(height() - z1) <= 1e-12 * scale;
    }

    private double region(int m, double s0, double s1, double t0, double t1, double tol) {
        mode = m;
        double whole = cell(s0, s1, t0, t1, GN, WN);
        double lower = cell(s0, s1, t0, t1, GL, WL);
        if (Math.abs(whole - lower) <= 0.1 * tol) {
            outerError += Math.abs(whole - lower);
            return whole;
        }
        return adapt(s0, s1, t0, t1, whole, tol, 0);
    }

    private double adapt(double s0, double s1, double t0, double t1, double whole, double tol, int depth) {
        double sm = 0.5 * (s0 + s1), tm = 0.5 * (t0 + t1);
        double s1h = cell(s0, sm, t0, t1, GN, WN), s2h = cell(sm, s1, t0, t1, GN, WN);
        double t1h = cell(s0, s1, t0, tm, GN, WN), t2h = cell(s0, s1, tm, t1, GN, WN);
        double ds = Math.abs(s1h + s2h - whole), dt = Math.abs(t1h + t2h - whole);
        boolean splitS = ds >= dt;
        double h1 = splitS ? s1h : t1h, h2 = splitS ? s2h : t2h;
        double diff = Math.max(ds, dt);
        if (diff <= tol || depth >= MAX_DEPTH || psi.evaluations > BUDGET) {
            outerError += diff;
            return h1 + h2;
        }
        return splitS
                ? adapt(s0, sm, t0, t1, h1, 0.5 * tol, depth + 1) + adapt(sm, s1, t0, t1, h2, 0.5 * tol, depth + 1)
                : adapt(s0, s1, t0, tm, h1, 0.5 * tol, depth + 1) + adapt(s0, s1, tm, t1, h2, 0.5 * tol, depth + 1);
    }

    /** Tensor Gauss rule over a cell of the current region's (s, t) square. */
    private double cell(double s0, double s1, double t0, double t1, double[] g, double[] w) {
        double sum = 0, hs = s1 - s0, ht = t1 - t0;
        for (int i = 0; i < g.length; i++) {
            double s = s0 + hs * g[i];
            for (int k = 0; k < g.length; k++) {
                double t = t0 + ht * g[k];
                double u, v, jac;
                if (mode == RECT) {
                    u = s;
                    v = t;
                    jac = 1;
                } else {
                    u = cu + hu * s * (mode == LOWER ? 1 : t);
                    v = cv + hv * s * (mode == LOWER ? t : 1);
                    jac = Math.abs(hu * hv) * s;
                }
                sum += w[i] * w[k] * jac * inner(u, v);
            }
        }
        return sum * hs * ht;
    }

    /** J_a(u) J_b(v) (1/π) ∫ w A⁺ B⁺ V / R² dψ. */
    private double inner(double u, double v) {
        pa.ring(u, ring, 0);
        double rhoX = ring[3], nrX = ring[4], nzX = ring[5], jX = ring[6], zX = height();
        pb.ring(v, ring, 0);
        double rhoY = ring[3], nrY = ring[4], nzY = sB * ring[5], jY = ring[6], zY = height();
        if (!(jX > 0 && jY > 0)) {
            return 0;
        }
        double tol = innerTol * Math.PI / (jX * jY);
        return psi.integral(rhoX, zX, nrX, nzX, rhoY, zY, nrY, nzY, tol) * jX * jY / Math.PI;
    }
}
