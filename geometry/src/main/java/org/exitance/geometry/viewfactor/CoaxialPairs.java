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
 *       triangles mapped to squares (Jacobian σ), which removes both. Where a solid ends
 *       between the pair's heights, {@link RimCells} takes each region instead.</li>
 *   <li>Pairs congruent under a rotation about the axis, or a mirror through it, share one
 *       result ({@link AxialProfile}, {@link RoundSolids#results}).</li>
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
    /** a's origin and axis (m), and the profiles of a at 0 and b at {@link AxialProfile#SIZE}. */
    private final double[] axis = new double[6], prof = new double[2 * AxialProfile.SIZE];
    private static final int B = AxialProfile.SIZE;
    private RoundSolids round;
    private double tolerance;
    private final CoaxialAzimuths psi = new CoaxialAzimuths();
    private final RimCells rim = new RimCells(this);
    /** r, z0, z1 of the solids in the way in a's frame (m). */
    private final double[] frameSolids = new double[3 * MAX_SOLIDS];
    /** Whether every solid in the way spans the heights of both patches (else {@link RimCells}). */
    private boolean spans;
    private int nSolids;
    /** a0, a1, b0, b1: the azimuth ranges in a's frame (rad). */
    private final double[] azimuths = new double[4];
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
        round = rs;
        for (int k = 0; k < 3; k++) {
            axis[k] = a.frame(k);
            axis[3 + k] = a.frame(9 + k);
        }
        AxialProfile.of(a, axis, rs.grid, prof, 0);
        AxialProfile.of(b, axis, rs.grid, prof, B);
        double sB = Math.signum(b.frame(9) * axis[3] + b.frame(10) * axis[4] + b.frame(11) * axis[5]);
        double beta = Math.atan2(b.frame(3) * a.frame(6) + b.frame(4) * a.frame(7) + b.frame(5) * a.frame(8),
                b.frame(3) * a.frame(3) + b.frame(4) * a.frame(4) + b.frame(5) * a.frame(5));
        AxialProfile.azimuths(a.phi1() - a.phi0(), beta + sB * b.phi0() - a.phi0(), beta + sB * b.phi1() - a.phi0(), azimuths);
        psi.set(azimuths[0], azimuths[1], azimuths[2], azimuths[3], BUDGET);
        double zLo = Double.MAX_VALUE, zHi = -Double.MAX_VALUE, rLo = Double.MAX_VALUE;
        for (int q = 0; q <= B; q += B) {
            Patch p = q == 0 ? a : b;
            for (double u : new double[] {p.u0(), p.u1()}) {
                zLo = Math.min(zLo, AxialProfile.height(prof, q, u));
                zHi = Math.max(zHi, AxialProfile.height(prof, q, u));
                rLo = Math.min(rLo, AxialProfile.rho(prof, q, u));
            }
        }
        spans = true;
        for (int k = 0; k < n; k++) {
            int o = RoundSolids.FIELDS * solids[k];
            double[] d = rs.data;
            double s = Math.signum(d[o + 3] * axis[3] + d[o + 4] * axis[4] + d[o + 5] * axis[5]);
            double off = (d[o] - axis[0]) * axis[3] + (d[o + 1] - axis[1]) * axis[4] + (d[o + 2] - axis[2]) * axis[5];
            double za = AxialProfile.round(off + s * d[o + 7], rs.grid), zb = AxialProfile.round(off + s * d[o + 8], rs.grid);
            psi.addSolid(d[o + 6], Math.min(za, zb), Math.max(za, zb));
            frameSolids[3 * k] = d[o + 6];
            frameSolids[3 * k + 1] = Math.min(za, zb);
            frameSolids[3 * k + 2] = Math.max(za, zb);
            double eps = 1e-9 * (Math.abs(zLo) + Math.abs(zHi) + d[o + 6]);
            spans &= Math.min(za, zb) <= zLo + eps && Math.max(za, zb) >= zHi - eps && rLo >= d[o + 6] - eps;
        }
        nSolids = n;
    }


    /**
     * For a prepared pair whose solids span its heights ({@link RoundSolids#admits}): see
     * {@link CoaxialAzimuths#coverage}.
     *
     * @return SEEN, HIDDEN or PARTIAL
     */
    int coverage() {
        double ra = AxialProfile.rho(prof, 0, pa.u0()), rA = AxialProfile.rho(prof, 0, pa.u1());
        double rb = AxialProfile.rho(prof, B, pb.u0()), rB = AxialProfile.rho(prof, B, pb.u1());
        return psi.coverage(Math.min(ra, rA), Math.max(ra, rA), Math.min(rb, rB), Math.max(rb, rB), spans);
    }

    static final int SEEN = CoaxialAzimuths.SEEN, HIDDEN = CoaxialAzimuths.HIDDEN, PARTIAL = CoaxialAzimuths.PARTIAL;

    /**
     * @param tol absolute tolerance (m²)
     * @return A_a F_ab of the prepared pair (m²)
     */
    double exchangeArea(double tol) {
        tolerance = AxialProfile.tolerance(tol);
        AxialProfile.Key k = AxialProfile.key(prof, new double[] {pa.u0(), pa.u1(), pb.u0(), pb.u1(), azimuths[0],
            azimuths[1], azimuths[2], azimuths[3], tolerance}, frameSolids, 3 * nSolids);
        double[] known = round.results.get(k);
        if (known != null) {
            lastError = known[1];
            lastEvaluations = 0;
            return known[0];
        }
        double v = compute(tolerance);
        round.results.putIfAbsent(k, new double[] {v, lastError});
        return v;
    }

    private double compute(double tol) {
        Patch a = pa, b = pb;
        outerError = 0;
        rim.set(frameSolids, nSolids, azimuths[0], azimuths[1], azimuths[2], azimuths[3]);
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
        lastError = outerError + rim.error + innerTol * du * dv;
        return Math.max(0, s);
    }

    private static double[] breaks(double lo, double hi, double o0, double o1) {
        return java.util.stream.DoubleStream.of(lo, o0, o1, hi).distinct().toArray();
    }

    /** Whether a and b have the same circle at every u of [u0, u1] (two patches of one surface). */
    private boolean sameRings(double u0, double u1) {
        return meet(u0, u0) && meet(u1, u1);
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
        double r1 = AxialProfile.rho(prof, 0, u), z1 = AxialProfile.height(prof, 0, u);
        double r2 = AxialProfile.rho(prof, B, v), z2 = AxialProfile.height(prof, B, v);
        double scale = Math.abs(r1) + Math.abs(z1) + Math.abs(r2) + 1e-300;
        return Math.abs(r2 - r1) <= 1e-12 * scale && Math.abs(z2 - z1) <= 1e-12 * scale;
    }

    private double region(int m, double s0, double s1, double t0, double t1, double tol) {
        if (!spans) {
            return rim.region(m, cu, cv, hu, hv, s0, s1, t0, t1, tol);
        }
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

    /** Kernel evaluations since the pair was prepared. */
    long evaluations() {
        return psi.evaluations;
    }

    /** Writes ρ_x, z_x of a's circle u and ρ_y, z_y of b's circle v (m, a's frame) into out[0..4) (modified). */
    void radiiHeights(double u, double v, double[] out) {
        out[0] = AxialProfile.rho(prof, 0, u);
        out[1] = AxialProfile.height(prof, 0, u);
        out[2] = AxialProfile.rho(prof, B, v);
        out[3] = AxialProfile.height(prof, B, v);
    }

    /** J_a(u) J_b(v) (1/π) ∫ w A⁺ B⁺ V / R² dψ. */
    double inner(double u, double v) {
        double rhoX = AxialProfile.rho(prof, 0, u), zX = AxialProfile.height(prof, 0, u), jX = prof[6] * rhoX;
        double rhoY = AxialProfile.rho(prof, B, v), zY = AxialProfile.height(prof, B, v), jY = prof[B + 6] * rhoY;
        if (!(jX > 0 && jY > 0)) {
            return 0;
        }
        double tol = innerTol * Math.PI / (jX * jY);
        return psi.integral(rhoX, zX, prof[4], prof[5], rhoY, zY, prof[B + 4], prof[B + 5], tol) * jX * jY / Math.PI;
    }
}
