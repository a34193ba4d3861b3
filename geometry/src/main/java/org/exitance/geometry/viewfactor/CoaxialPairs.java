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
 *   <li>Inner, over ψ, exact visibility: the segment x → y meets the solid cylinder (r, z0..z1)
 *       when the parameter interval where its horizontal projection lies within r overlaps the
 *       one where its height lies in [z0, z1]. That changes only where the line touches the circle
 *       r (cos ψ = [r² ± √((ρ_x² − r²)(ρ_y² − r²))]/(ρ_x ρ_y)) or passes through the rim of an end
 *       (|p(t_k)| = r at the fixed t_k of the end's height, linear in cos ψ). The ψ range is cut
 *       there, at the horizons (A = 0, B = 0), at w's kinks and at ψ = 0 (mod 2π), one point per
 *       piece decides whether it is seen, and seen pieces are integrated by adaptive Gauss.</li>
 *   <li>Outer, over (u, v): 6 × 6 Gauss cells halved in the direction whose halves disagree
 *       more, as in {@link PartialPairs}. Two patches of one surface sharing a u range have a kink
 *       along u = v (points meet there), so that square is split into two triangles mapped to
 *       squares with the diagonal on an edge.</li>
 * </ul>
 * Mutable scratch; one instance per thread.
 */
final class CoaxialPairs {

    private static final int N = 6, M = 8, MAX_DEPTH = 40;
    private static final double[] GN = GaussLegendre.nodes(N), WN = GaussLegendre.weights(N);
    private static final double[] GL = GaussLegendre.nodes(N - 2), WL = GaussLegendre.weights(N - 2);
    private static final double[] GM = GaussLegendre.nodes(M), WM = GaussLegendre.weights(M);
    private static final double TWO_PI = 2 * Math.PI, NOISE = 1e-12;
    /** Kernel evaluations per pair after which cells are accepted as they are (the differences stay in the estimate). */
    static final long BUDGET = 40_000_000L;
    static final int RECT = 0, LOWER = 1, UPPER = 2;

    private Patch pa, pb;
    private double oax, oay, oaz, e3x, e3y, e3z;
    private double sB, a0, a1, b0, b1;
    private final double[] sol = new double[3 * 16];
    private int ns;
    private final double[] ring = new double[16], cuts = new double[256], cosines = new double[64];
    private double rhoX, zX, nrX, nzX, jX, rhoY, zY, nrY, nzY, jY;
    /** A = pA − bA (1 − cos ψ), B = pB − bB (1 − cos ψ): their values at ψ = 0 and slopes in cos ψ. */
    private double pA, bA, pB, bB, dRho, dz2;
    private int mode;
    /** The corner and the signed sides of the current triangle pair (LOWER, UPPER). */
    private double cu, cv, hu, hv;
    private double innerTol, outerError;
    private long evaluations;
    /** Error estimate of the last call (m²). */
    double lastError;
    /** Kernel evaluations of the last call. */
    long lastEvaluations;

    /** @return true for a patch this class integrates: a plane annular sector or a cone or cylinder band */
    static boolean revolution(Patch p) {
        return p != null && p.kind() != Patch.Kind.SPHERE;
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
        a0 = a.phi0();
        a1 = a.phi1();
        double beta = Math.atan2(b.frame(3) * a.frame(6) + b.frame(4) * a.frame(7) + b.frame(5) * a.frame(8),
                b.frame(3) * a.frame(3) + b.frame(4) * a.frame(4) + b.frame(5) * a.frame(5));
        double g0 = beta + sB * b.phi0(), g1 = beta + sB * b.phi1();
        b0 = Math.min(g0, g1);
        b1 = Math.max(g0, g1);
        ns = 0;
        for (int k = 0; k < n; k++) {
            int o = RoundSolids.FIELDS * solids[k];
            double[] d = rs.data;
            double s = Math.signum(d[o + 3] * e3x + d[o + 4] * e3y + d[o + 5] * e3z);
            double off = (d[o] - oax) * e3x + (d[o + 1] - oay) * e3y + (d[o + 2] - oaz) * e3z;
            double za = off + s * d[o + 7], zb = off + s * d[o + 8];
            sol[3 * ns] = d[o + 6];
            sol[3 * ns + 1] = Math.min(za, zb);
            sol[3 * ns + 2] = Math.max(za, zb);
            ns++;
        }
    }

    /**
     * For a prepared pair whose solids span its heights ({@link RoundSolids#admits}): a segment
     * between points at radii ρ_x, ρ_y outside the circle r and azimuths ψ apart misses it exactly
     * when |ψ| (mod 2π, in [0, π]) ≤ acos(r/ρ_x) + acos(r/ρ_y) (tangent lines from both points),
     * which grows with both radii; so comparing the pair's range of |ψ| with that limit at the
     * smallest and largest radii decides the whole pair when it can.
     *
     * @return SEEN (nothing in the way anywhere), HIDDEN (every segment blocked) or PARTIAL
     */
    int coverage() {
        double lo = b0 - a1, hi = b1 - a0;
        double dLo = contains(lo, hi, 0) ? 0 : Math.min(wrapped(lo), wrapped(hi));
        double dHi = contains(lo, hi, Math.PI) ? Math.PI : Math.max(wrapped(lo), wrapped(hi));
        double ra = Math.min(radius(pa, pa.u0()), radius(pa, pa.u1())), rA = Math.max(radius(pa, pa.u0()), radius(pa, pa.u1()));
        double rb = Math.min(radius(pb, pb.u0()), radius(pb, pb.u1())), rB = Math.max(radius(pb, pb.u0()), radius(pb, pb.u1()));
        boolean seen = true, hidden = false;
        for (int k = 0; k < ns; k++) {
            double r = sol[3 * k];
            double least = Math.acos(Math.min(1, r / ra)) + Math.acos(Math.min(1, r / rb));
            double most = Math.acos(Math.min(1, r / rA)) + Math.acos(Math.min(1, r / rB));
            seen &= dHi <= least;
            hidden |= dLo >= most;
        }
        return hidden ? HIDDEN : seen ? SEEN : PARTIAL;
    }

    static final int SEEN = 0, HIDDEN = 1, PARTIAL = 2;

    private static double radius(Patch p, double u) {
        return p.kind() == Patch.Kind.PLANE ? u : p.shapeA() + p.shapeB() * u;
    }

    /** |ψ| reduced to [0, π] (rad). */
    private static double wrapped(double psi) {
        return Math.abs(psi - TWO_PI * Math.rint(psi / TWO_PI));
    }

    /** Whether [lo, hi] holds c + 2πk for some integer k. */
    private static boolean contains(double lo, double hi, double c) {
        return Math.floor((hi - c) / TWO_PI) >= Math.ceil((lo - c) / TWO_PI);
    }

    /**
     * @param tol absolute tolerance (m²)
     * @return A_a F_ab of the prepared pair (m²)
     */
    double exchangeArea(double tol) {
        Patch a = pa, b = pb;
        evaluations = 0;
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
        lastEvaluations = evaluations;
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
        if (diff <= tol || depth >= MAX_DEPTH || evaluations > BUDGET) {
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
        rhoX = ring[3];
        nrX = ring[4];
        nzX = ring[5];
        jX = ring[6];
        zX = height();
        pb.ring(v, ring, 0);
        rhoY = ring[3];
        nrY = ring[4];
        nzY = sB * ring[5];
        jY = ring[6];
        zY = height();
        if (!(jX > 0 && jY > 0)) {
            return 0;
        }
        double dz = zY - zX;
        dRho = rhoX - rhoY;
        dz2 = dz * dz;
        pA = nrX * (rhoY - rhoX) + nzX * dz;
        bA = nrX * rhoY;
        pB = nrY * (rhoX - rhoY) - nzY * dz;
        bB = nrY * rhoX;
        double lo = b0 - a1, hi = b1 - a0;
        int n = 0;
        cuts[n++] = lo;
        cuts[n++] = hi;
        n = add(b0 - a0, lo, hi, n);
        n = add(b1 - a1, lo, hi, n);
        for (int k = -2; k <= 2; k++) {
            n = add(Math.PI * k, lo, hi, n);
        }
        // where the points come close, the kernel peaks at ψ = 0 (mod 2π) with a width of about
        // δ: panels graded geometrically from there, so that no Gauss rule steps over the peak
        double q2 = rhoX * rhoY, delta = Math.sqrt(dRho * dRho + dz2) / Math.sqrt(Math.max(q2, 1e-300));
        if (delta < 0.1) {
            for (int k = -1; k <= 1; k++) {
                for (double g = Math.max(delta, 1e-12); g < 0.5; g *= 4) {
                    n = add(TWO_PI * k + g, lo, hi, n);
                    n = add(TWO_PI * k - g, lo, hi, n);
                }
            }
        }
        int nc = 0;
        if (bA != 0) {
            cosines[nc++] = 1 - pA / bA;
        }
        if (bB != 0) {
            cosines[nc++] = 1 - pB / bB;
        }
        nc = events(nc, dz);
        for (int c = 0; c < nc; c++) {
            double cv = cosines[c];
            if (cv > -1 && cv < 1) {
                double th = Math.acos(cv);
                for (int k = -2; k <= 2; k++) {
                    n = add(th + TWO_PI * k, lo, hi, n);
                    n = add(-th + TWO_PI * k, lo, hi, n);
                }
            }
        }
        java.util.Arrays.sort(cuts, 0, n);
        double total = 0, tol = innerTol * Math.PI / (jX * jY) / (hi - lo);
        for (int k = 0; k + 1 < n; k++) {
            double p = cuts[k], q = cuts[k + 1];
            if (q - p <= 1e-14) {
                continue;
            }
            double mid = 0.5 * (p + q), c = Math.cos(mid);
            if (pA - bA * (1 - c) > 0 && pB - bB * (1 - c) > 0 && weight(mid) > 0 && visible(mid, dz)) {
                double whole = rule(p, q);
                total += adaptPsi(p, q, whole, tol * (q - p), 0);
            }
        }
        return total * jX * jY / Math.PI;
    }

    private int add(double v, double lo, double hi, int n) {
        if (v > lo && v < hi && n < cuts.length) {
            cuts[n++] = v;
        }
        return n;
    }

    /** Appends the cosines of ψ where the visibility through each solid can change. @return new count */
    private int events(int nc, double dz) {
        double q = rhoX * rhoY;
        for (int k = 0; k < ns; k++) {
            double r = sol[3 * k];
            if (rhoX > r && rhoY > r && q > 0) {
                double root = Math.sqrt((rhoX * rhoX - r * r) * (rhoY * rhoY - r * r));
                cosines[nc++] = (r * r + root) / q;
                cosines[nc++] = (r * r - root) / q;
            }
            if (dz != 0 && q > 0) {
                for (int e = 1; e <= 2; e++) {
                    double t = (sol[3 * k + e] - zX) / dz;
                    if (t > 0 && t < 1) {
                        double u = 1 - t;
                        cosines[nc++] = (r * r - u * u * rhoX * rhoX - t * t * rhoY * rhoY) / (2 * t * u * q);
                    }
                }
            }
        }
        return nc;
    }

    /** Whether the segment from x (azimuth 0) to y at azimuth ψ misses every solid. */
    private boolean visible(double psi, double dz) {
        double c = Math.cos(psi), s = Math.sin(psi);
        double dx = rhoY * c - rhoX, dy = rhoY * s;
        double a2 = dx * dx + dy * dy, b2 = rhoX * dx;
        for (int k = 0; k < ns; k++) {
            double r = sol[3 * k], c2 = rhoX * rhoX - r * r;
            double lo, hi;
            if (a2 <= 1e-300) {
                if (c2 >= 0) {
                    continue;
                }
                lo = 0;
                hi = 1;
            } else {
                double disc = b2 * b2 - a2 * c2;
                if (disc <= 0) {
                    continue;
                }
                double sq = Math.sqrt(disc);
                lo = Math.max(0, (-b2 - sq) / a2);
                hi = Math.min(1, (-b2 + sq) / a2);
            }
            double zlo, zhi;
            if (dz == 0) {
                if (!(zX > sol[3 * k + 1] && zX < sol[3 * k + 2])) {
                    continue;
                }
                zlo = 0;
                zhi = 1;
            } else {
                double ta = (sol[3 * k + 1] - zX) / dz, tb = (sol[3 * k + 2] - zX) / dz;
                zlo = Math.max(0, Math.min(ta, tb));
                zhi = Math.min(1, Math.max(ta, tb));
            }
            if (Math.min(hi, zhi) - Math.max(lo, zlo) > 1e-12) {
                return false;
            }
        }
        return true;
    }

    /** Length of a's azimuths φ whose partner φ + ψ lies on b (rad). */
    private double weight(double psi) {
        return Math.max(0, Math.min(a1, b1 - psi) - Math.max(a0, b0 - psi));
    }

    private double adaptPsi(double p, double q, double whole, double tol, int depth) {
        double m = 0.5 * (p + q);
        double x = rule(p, m), y = rule(m, q);
        if (Math.abs(x + y - whole) <= Math.max(tol, NOISE * Math.abs(x + y)) || depth >= MAX_DEPTH
                || evaluations > BUDGET) {
            return x + y;
        }
        return adaptPsi(p, m, x, 0.5 * tol, depth + 1) + adaptPsi(m, q, y, 0.5 * tol, depth + 1);
    }

    /** Gauss rule of w A B / R² on [p, q] (a piece where A, B > 0 and everything is seen). */
    private double rule(double p, double q) {
        evaluations += M;
        double s = 0, len = q - p;
        double cross = 4 * rhoX * rhoY;
        for (int k = 0; k < M; k++) {
            double psi = p + len * GM[k];
            double half = Math.sin(0.5 * psi), vers = 2 * half * half;
            // 1 − cos ψ = 2 sin²(ψ/2) and R = (ρx − ρy)² + Δz² + 4 ρx ρy sin²(ψ/2): no
            // cancellation where the points meet
            double r2 = dRho * dRho + dz2 + cross * half * half;
            double f = (pA - bA * vers) * (pB - bB * vers);
            s += WM[k] * weight(psi) * Math.max(0, f) / (r2 * r2);
        }
        return s * len;
    }
}
