package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * Unobstructed exchange area of a pair with an exact curved side where a horizon or a silhouette
 * crosses the pair (so the contour form does not hold), by the definition (Siegel &amp; Howell,
 * 4th ed., eq. 4.13) integrated over the exact shapes:
 *
 * <pre>  A_a F_ab = ∫_a F_{dx→b} dA_x,  F_{dx→b} = ∫_b max(0, cos θ_x) max(0, cos θ_y) / (π r²) dA_y </pre>
 *
 * <ul>
 *   <li>Outer: a curved patch a in its parameters (u, φ), 6 × 6 Gauss–Legendre cells (a 4 × 4 rule
 *       on the whole patch settles far, smooth pairs), halved in the direction whose halves
 *       disagree more with the whole until they agree within the cell's share of the tolerance.</li>
 *   <li>Inner, polygon b: F_{dx→b} exactly, the polygon clipped to the front of x's tangent plane
 *       and the closed-form point-to-polygon factor ({@link PointFactor}).</li>
 *   <li>Inner, plane patch b: F_{dx→b} by the contour form over its exact boundary cut to the
 *       front of x's tangent plane ({@link PlaneRegionFactor}).</li>
 *   <li>Inner, curved patch b: on each circle of constant u both cosines times r, and r², are sinusoids
 *       α + β cos φ + γ sin φ in the azimuth, so the horizon (cos θ_x = 0) and the silhouette
 *       (cos θ_y = 0) are found exactly as their roots. The circle is split there and at the azimuth
 *       nearest x, and only arcs where both are positive are integrated (adaptive Gauss, so
 *       that the kernel's kinks are all at panel ends); then adaptive Gauss over u.</li>
 * </ul>
 * The error estimate adds the outer differences and the inner tolerances. Mutable scratch; one
 * instance per thread.
 */
final class PartialPairs {

    private static final int N = 6, K = 6, M = 8;
    private static final double[] GN = GaussLegendre.nodes(N), WN = GaussLegendre.weights(N);
    private static final double[] GL = GaussLegendre.nodes(N - 2), WL = GaussLegendre.weights(N - 2);
    private static final double[] GK = GaussLegendre.nodes(K), WK = GaussLegendre.weights(K);
    private static final double[] GM = GaussLegendre.nodes(M), WM = GaussLegendre.weights(M);
    private static final int MAX_DEPTH = 40;
    /** Relative size of an inner difference treated as rounding, not as an error to halve away. */
    private static final double NOISE = 1e-11;
    /** Kernel evaluations per pair after which cells are accepted as they are (their differences stay in the estimate). */
    static final long BUDGET = 60_000_000L;
    private static final double INV_PI = 1 / Math.PI;

    private Patch outer, inner;
    private Poly innerPoly;
    private final Poly clipped = new Poly();
    private final PlaneRegionFactor plane = new PlaneRegionFactor();
    private final double[] e = new double[7], ring = new double[16], cuts = new double[8];
    private final double[] clipScratch = new double[3 * Poly.MAX_VERTICES];
    private double x, y, z, nx, ny, nz;
    private double a1, b1, g1, a2, b2, g2, a3, b3, g3, jac, peak;
    private double outerError, innerTolerance, ringTolerance;
    private long evaluations;
    /** Error estimate of the last call (m²). */
    double lastError;

    /**
     * @param a the outer side, a curved patch (not modified)
     * @param bPatch the inner side's patch, or null for the polygon {@code bPoly} (not modified)
     * @param tol absolute tolerance on the exchange area (m²)
     * @return A_a F_ab (m²)
     */
    double exchangeArea(Patch a, Patch bPatch, Poly bPoly, double tol) {
        outer = a;
        inner = bPatch;
        innerPoly = bPoly;
        outerError = 0;
        evaluations = 0;
        // the inner factor is dimensionless; its error times the outer area adds at most this much
        innerTolerance = 0.1 * tol / a.area();
        double whole = cell(a.u0(), a.u1(), a.phi0(), a.phi1(), GN, WN);
        // a far, smooth pair is settled by a lower rule on the same cell
        double lower = cell(a.u0(), a.u1(), a.phi0(), a.phi1(), GL, WL);
        double s;
        if (Math.abs(whole - lower) <= 0.1 * tol) {
            outerError = Math.abs(whole - lower);
            s = whole;
        } else {
            s = adapt(a.u0(), a.u1(), a.phi0(), a.phi1(), whole, 0.9 * tol, 0);
        }
        lastError = outerError + innerTolerance * a.area();
        return s;
    }

    private double adapt(double u0, double u1, double f0, double f1, double whole, double tol, int depth) {
        // halve in the direction whose halves disagree more with the whole: a kink along a line
        // of constant φ (or u) is then followed by thin cells, not by a doubling number of squares
        double um = 0.5 * (u0 + u1), fm = 0.5 * (f0 + f1);
        double u1h = cell(u0, um, f0, f1), u2h = cell(um, u1, f0, f1);
        double f1h = cell(u0, u1, f0, fm), f2h = cell(u0, u1, fm, f1);
        double du = Math.abs(u1h + u2h - whole), df = Math.abs(f1h + f2h - whole);
        boolean splitU = du >= df;
        double h1 = splitU ? u1h : f1h, h2 = splitU ? u2h : f2h;
        double diff = Math.max(du, df);
        if (diff <= tol || depth >= MAX_DEPTH || evaluations > BUDGET) {
            outerError += diff;
            return h1 + h2;
        }
        return splitU
                ? adapt(u0, um, f0, f1, h1, 0.5 * tol, depth + 1) + adapt(um, u1, f0, f1, h2, 0.5 * tol, depth + 1)
                : adapt(u0, u1, f0, fm, h1, 0.5 * tol, depth + 1) + adapt(u0, u1, fm, f1, h2, 0.5 * tol, depth + 1);
    }

    private double cell(double u0, double u1, double f0, double f1) {
        return cell(u0, u1, f0, f1, GN, WN);
    }

    /** Tensor Gauss rule (nodes g, weights w on [0, 1]) of ∫∫ F_{dx→b} dA_x over one outer cell. */
    private double cell(double u0, double u1, double f0, double f1, double[] g, double[] wt) {
        double s = 0, hu = u1 - u0, hf = f1 - f0;
        for (int i = 0; i < g.length; i++) {
            double u = u0 + hu * g[i];
            for (int k = 0; k < g.length; k++) {
                outer.evaluate(u, f0 + hf * g[k], e, 0);
                x = e[0];
                y = e[1];
                z = e[2];
                nx = e[3];
                ny = e[4];
                nz = e[5];
                double w = e[6];
                s += wt[i] * wt[k] * w * pointFactor();
            }
        }
        return s * hu * hf;
    }

    /** F from the current outer point (x, y, z; n) to the inner side. */
    private double pointFactor() {
        evaluations++;
        if (inner == null) {
            Poly q = innerPoly;
            double d = q.nx * (x - q.cx) + q.ny * (y - q.cy) + q.nz * (z - q.cz);
            if (d <= 0) {
                return 0;
            }
            clipped.set(q.xyz, q.n, q.nx, q.ny, q.nz);
            clipped.clip(nx, ny, nz, nx * x + ny * y + nz * z, clipScratch);
            return clipped.n < 3 ? 0 : Math.max(0, PointFactor.toPolygon(x, y, z, nx, ny, nz, clipped));
        }
        if (inner.kind() == Patch.Kind.PLANE) {
            double side = inner.sign() * (inner.frame(9) * (x - inner.frame(0)) + inner.frame(10) * (y - inner.frame(1))
                    + inner.frame(11) * (z - inner.frame(2)));
            if (side <= 0) {
                return 0;
            }
            double f = plane.factor(inner, x, y, z, nx, ny, nz, innerTolerance);
            evaluations += plane.evaluations;
            return f;
        }
        double u0 = inner.u0(), u1 = inner.u1();
        ringTolerance = innerTolerance / (u1 - u0);
        double whole = ringRule(u0, u1);
        return adaptU(u0, u1, whole, innerTolerance, 0);
    }

    private double adaptU(double u0, double u1, double whole, double tol, int depth) {
        double m = 0.5 * (u0 + u1);
        double a = ringRule(u0, m), b = ringRule(m, u1);
        // a relative floor: the closed form's rounding near the circle must not drive the halving on
        if (Math.abs(a + b - whole) <= Math.max(tol, NOISE * Math.abs(a + b)) || depth >= MAX_DEPTH || evaluations > BUDGET) {
            return a + b;
        }
        return adaptU(u0, m, a, 0.5 * tol, depth + 1) + adaptU(m, u1, b, 0.5 * tol, depth + 1);
    }

    private double ringRule(double u0, double u1) {
        double s = 0, h = u1 - u0;
        for (int k = 0; k < K; k++) {
            s += WK[k] * ringIntegral(u0 + h * GK[k]);
        }
        return s * h;
    }

    /** ∫ over φ of the clipped kernel on the inner circle at u, times its area element. */
    private double ringIntegral(double u) {
        inner.ring(u, ring, 0);
        double rho = ring[3], nr = ring[4], na = ring[5];
        jac = ring[6];
        if (jac <= 0) {
            return 0;
        }
        double wx = ring[0] - x, wy = ring[1] - y, wz = ring[2] - z;
        double we1 = wx * ring[7] + wy * ring[8] + wz * ring[9];
        double we2 = wx * ring[10] + wy * ring[11] + wz * ring[12];
        double we3 = wx * ring[13] + wy * ring[14] + wz * ring[15];
        double ne1 = nx * ring[7] + ny * ring[8] + nz * ring[9];
        double ne2 = nx * ring[10] + ny * ring[11] + nz * ring[12];
        // cos θ_x r, cos θ_y r and r² as α + β cos φ + γ sin φ
        a1 = nx * wx + ny * wy + nz * wz;
        b1 = rho * ne1;
        g1 = rho * ne2;
        a2 = -nr * rho - na * we3;
        b2 = -nr * we1;
        g2 = -nr * we2;
        a3 = wx * wx + wy * wy + wz * wz + rho * rho;
        b3 = 2 * rho * we1;
        g3 = 2 * rho * we2;
        peak = Math.atan2(-g3, -b3);
        double f0 = inner.phi0(), f1 = inner.phi1();
        int n = 0;
        cuts[n++] = f0;
        n = roots(a1, b1, g1, f0, f1, n);
        n = roots(a2, b2, g2, f0, f1, n);
        n = inside(peak, f0, f1, n);
        cuts[n++] = f1;
        java.util.Arrays.sort(cuts, 0, n);
        double s = 0;
        for (int k = 0; k + 1 < n; k++) {
            double lo = cuts[k], hi = cuts[k + 1];
            if (hi - lo <= 1e-15) {
                continue;
            }
            double mid = 0.5 * (lo + hi), c = Math.cos(mid), sn = Math.sin(mid);
            if (a1 + b1 * c + g1 * sn > 0 && a2 + b2 * c + g2 * sn > 0) {
                s += arc(lo, hi, we1, we2, we3, rho);
            }
        }
        return s * jac * INV_PI;
    }

    /**
     * ∫ (cos θ_x r)(cos θ_y r) / r⁴ dφ over an arc where both cosines are positive: in closed
     * form ({@link ArcIntegral}) unless the r² sinusoid is nearly flat (x near the circle's axis
     * and far from it, where the closed form divides by its small amplitude), then adaptive Gauss.
     */
    private double arc(double lo, double hi, double we1, double we2, double we3, double rho) {
        double amp = Math.hypot(b3, g3);
        evaluations++;
        // A − R, the squared distance from x to the circle, without cancellation
        double perp = Math.hypot(we1, we2);
        double amr = we3 * we3 + (perp - rho) * (perp - rho);
        if (!(amp > ArcIntegral.SMALL_AMPLITUDE * a3) || amr < ArcIntegral.NEAR * a3) {
            double whole = arcRule(lo, hi);
            return adaptPhi(lo, hi, whole, Math.PI * ringTolerance / jac, 0);
        }
        return ArcIntegral.closed(a1, b1, g1, a2, b2, g2, a3, b3, g3, amr, lo, hi);
    }

    private double adaptPhi(double lo, double hi, double whole, double tol, int depth) {
        double m = 0.5 * (lo + hi);
        double a = arcRule(lo, m), b = arcRule(m, hi);
        if (Math.abs(a + b - whole) <= Math.max(tol, NOISE * Math.abs(a + b)) || depth >= MAX_DEPTH || evaluations > BUDGET) {
            return a + b;
        }
        return adaptPhi(lo, m, a, 0.5 * tol, depth + 1) + adaptPhi(m, hi, b, 0.5 * tol, depth + 1);
    }

    private double arcRule(double lo, double hi) {
        evaluations += M;
        double s = 0, h = hi - lo;
        for (int k = 0; k < M; k++) {
            double f = lo + h * GM[k], c = Math.cos(f), sn = Math.sin(f);
            double p = (a1 + b1 * c + g1 * sn) * (a2 + b2 * c + g2 * sn), r2 = a3 + b3 * c + g3 * sn;
            s += WM[k] * Math.max(0, p) / (r2 * r2);
        }
        return s * h;
    }

    /** Appends the roots of α + β cos φ + γ sin φ in (f0, f1) to {@link #cuts}. */
    private int roots(double alpha, double beta, double gamma, double f0, double f1, int n) {
        double amp = Math.hypot(beta, gamma);
        if (!(amp > Math.abs(alpha))) {
            return n;
        }
        double base = Math.atan2(gamma, beta), off = Math.acos(-alpha / amp);
        n = inside(base + off, f0, f1, n);
        return inside(base - off, f0, f1, n);
    }

    /** Appends the angle φ (shifted by whole turns) to {@link #cuts} if it lies in (f0, f1). */
    private int inside(double phi, double f0, double f1, int n) {
        double k = Math.ceil((f0 - phi) / (2 * Math.PI));
        double v = phi + 2 * Math.PI * k;
        if (v > f0 && v < f1) {
            cuts[n++] = v;
        }
        return n;
    }
}
