package org.exitance.geometry.viewfactor;

/**
 * The inner integral of {@link CoaxialPairs}: over the azimuth difference ψ between a point x of
 * one patch of revolution and the circle of another on the same axis, with round solids on that
 * axis in the way,
 *
 * <pre>  ∫ w(ψ) A⁺ B⁺ V / R² dψ </pre>
 *
 * (w the overlap length of the two azimuth ranges at offset ψ; A = cos θ_x r, B = cos θ_y r,
 * R = r², each α + β cos ψ). The range is cut at w's kinks, at ψ = 0 (mod 2π) with panels graded
 * geometrically from it where the points come close, at the horizons A = 0 and B = 0, and where
 * the visibility through a solid can change (in closed form: the line touching the circle r, or
 * passing through a rim at an end height); one point per piece decides whether it is seen, and
 * seen pieces get adaptive Gauss. Also the pair-level test {@link #coverage}. Mutable scratch;
 * one instance per {@link CoaxialPairs}.
 */
final class CoaxialAzimuths {

    private static final int M = 8, MAX_DEPTH = 40;
    private static final double[] GM = GaussLegendre.nodes(M), WM = GaussLegendre.weights(M);
    private static final double TWO_PI = 2 * Math.PI, NOISE = 1e-12;
    static final int SEEN = 0, HIDDEN = 1, PARTIAL = 2;

    /** Azimuth ranges of the two patches in a's frame (rad). */
    private double a0, a1, b0, b1;
    /** Per solid in the way: r, z0, z1 in a's frame (m); at most {@link CoaxialPairs#MAX_SOLIDS}. */
    private final double[] sol = new double[3 * CoaxialPairs.MAX_SOLIDS];
    private int ns;
    private final double[] cuts = new double[256], cosines = new double[64];
    private double rhoX, zX, rhoY, zY;
    /** A = pA − bA (1 − cos ψ), B = pB − bB (1 − cos ψ): their values at ψ = 0 and slopes in cos ψ. */
    private double pA, bA, pB, bB, dRho, dz2;
    /** Kernel evaluations since {@link #set}. */
    long evaluations;
    /** Evaluations after which pieces are accepted as they are. */
    long budget;

    /** Sets the azimuth ranges (rad) and forgets the solids and the count of evaluations. */
    void set(double a0In, double a1In, double b0In, double b1In, long budgetIn) {
        a0 = a0In;
        a1 = a1In;
        b0 = b0In;
        b1 = b1In;
        ns = 0;
        evaluations = 0;
        budget = budgetIn;
    }

    /** Adds a solid of radius r (m) over heights [z0, z1] in a's frame (m). */
    void addSolid(double r, double z0, double z1) {
        sol[3 * ns] = r;
        sol[3 * ns + 1] = z0;
        sol[3 * ns + 2] = z1;
        ns++;
    }

    /**
     * @param tolIn absolute tolerance on the integral
     * @return ∫ w(ψ) A⁺ B⁺ V / R² dψ for x = (ρ_x, 0, z_x) with normal n_r e_r + n_z e3 and y on
     *         the circle ρ_y at height z_y (a's axis frame)
     */
    double integral(double rhoXIn, double zXIn, double nrX, double nzX, double rhoYIn, double zYIn, double nrY, double nzY,
            double tolIn) {
        rhoX = rhoXIn;
        zX = zXIn;
        rhoY = rhoYIn;
        zY = zYIn;
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
        double total = 0, tol = tolIn / (hi - lo);
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
        return total;
    }


    /**
     * For solids that span the heights of both patches: a segment between points at radii ρ_x,
     * ρ_y outside the circle r and azimuths ψ apart misses it exactly when |ψ| (mod 2π, in [0, π])
     * ≤ acos(r/ρ_x) + acos(r/ρ_y) (tangent lines from both points), which grows with both radii;
     * so comparing the pair's range of |ψ| with that limit at the smallest and largest radii
     * decides the whole pair when it can.
     *
     * Where a solid does not span those heights, only SEEN can be decided so (both patches
     * outside the circle r, every horizontal projection missing it).
     *
     * @param ra smallest and {@code rA} largest radius of a (m), likewise rb, rB of b
     * @param spans whether every solid spans the heights of both patches
     * @return SEEN (nothing in the way anywhere), HIDDEN (every segment blocked) or PARTIAL
     */
    int coverage(double ra, double rA, double rb, double rB, boolean spans) {
        double lo = b0 - a1, hi = b1 - a0;
        double dLo = contains(lo, hi, 0) ? 0 : Math.min(wrapped(lo), wrapped(hi));
        double dHi = contains(lo, hi, Math.PI) ? Math.PI : Math.max(wrapped(lo), wrapped(hi));
        boolean seen = true, hidden = false;
        for (int k = 0; k < ns; k++) {
            double r = sol[3 * k];
            double least = Math.acos(Math.min(1, r / ra)) + Math.acos(Math.min(1, r / rb));
            double most = Math.acos(Math.min(1, r / rA)) + Math.acos(Math.min(1, r / rB));
            seen &= ra >= r && rb >= r && dHi <= least;
            hidden |= spans && dLo >= most;
        }
        return hidden ? HIDDEN : seen ? SEEN : PARTIAL;
    }

    /** |ψ| reduced to [0, π] (rad). */
    private static double wrapped(double psi) {
        return Math.abs(psi - TWO_PI * Math.rint(psi / TWO_PI));
    }

    /** Whether [lo, hi] holds c + 2πk for some integer k. */
    private static boolean contains(double lo, double hi, double c) {
        return Math.floor((hi - c) / TWO_PI) >= Math.ceil((lo - c) / TWO_PI);
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
                || evaluations > budget) {
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
