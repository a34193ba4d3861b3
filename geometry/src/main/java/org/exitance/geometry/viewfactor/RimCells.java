package org.exitance.geometry.viewfactor;

/**
 * The outer (u, v) integral of {@link CoaxialPairs} where a round solid ends between the pair's
 * heights (a billet between two wall bands): nested one-dimensional adaptive Gauss, an inner
 * line over the second variable for each node of the outer one, both cut where the ψ-integrated
 * integrand is not smooth.
 *
 * <p>A rim at height z_k is crossed by the segment from x (ρ_x, z_x) to y (ρ_y, z_y) at the
 * fraction t = (z_k − z_x)/(z_y − z_x), at a point of signed horizontal distance (1 − t) ρ_x
 * ± t ρ_y from the axis when ψ = 0 (+) or ψ = π (−). Where that distance is ±r the rim's
 * visibility event reaches ψ = 0 or π, and the blocked ψ range it bounds grows from nothing like
 * √ of the distance to that curve: the integrand behaves like a square root there. Multiplied
 * by z_y − z_x each such condition reads
 *
 * <pre>  F = (z_y − z_k) ρ_x ± (z_k − z_x) ρ_y ∓ r (z_y − z_x) = 0, </pre>
 *
 * affine along a line where only one of the two points moves (the inner lines; ρ and z are affine
 * in u on planes and cones). Other places where the visibility pattern changes: a point crossing
 * the radius r (ρ − r = 0: the tangent event appears, again like a square root), a point at a rim
 * height (z − z_k = 0: that rim's crossing leaves the segment), and the segment touching the
 * circle r exactly at a rim height, G = (z_k − z_x) b − a (z_y − z_k) = 0 with a = √(ρ_x² − r²),
 * b = √(ρ_y² − r²) (there the rim's event runs into the tangent event: a jump of the second
 * derivative only). Their zeros along each inner line, and along the two edges of the outer
 * range, are found from sign changes at 17 samples refined by the Illinois method, and cut the
 * lines into pieces. Each piece is mapped by τ = p + (q − p)(3σ² − 2σ³), whose derivative
 * vanishes at both ends, which makes √-type end behaviour smooth in σ, and integrated by 8-point
 * Gauss against 6-point (the difference is the piece's error estimate), halved until it meets its
 * share of the tolerance or the pair's budget of kernel evaluations is spent (the differences
 * then stay in the estimate). Mutable scratch; one instance per {@link CoaxialPairs}.
 */
final class RimCells {

    private static final int SAMPLES = 16, MAX_DEPTH = 30, PER_SOLID = 30;
    private static final double[] G8 = GaussLegendre.nodes(8), W8 = GaussLegendre.weights(8);
    private static final double[] G6 = GaussLegendre.nodes(6), W6 = GaussLegendre.weights(6);

    private final CoaxialPairs host;
    /** Solids in the way: r, z0, z1 per solid in a's frame (m); [0, 3 ns) used, not modified. */
    private double[] sol;
    private int ns;
    private int mode;
    private double cu, cv, hu, hv;
    /** Error estimate accumulated since {@link #set} (m²). */
    double error;
    private double lineError, ruleError;
    /** cos ψ at the kinks and ends of the weight w(ψ). */
    private final double[] kinks = new double[4];
    private final double[] pt = new double[4], fa = new double[PER_SOLID * CoaxialPairs.MAX_SOLIDS],
            fb = new double[PER_SOLID * CoaxialPairs.MAX_SOLIDS], fc = new double[PER_SOLID * CoaxialPairs.MAX_SOLIDS];
    private final double[] outerCuts = new double[4096], innerCuts = new double[4096];
    private final double[] samples = new double[(SAMPLES + 1) * PER_SOLID * CoaxialPairs.MAX_SOLIDS];

    RimCells(CoaxialPairs host) {
        this.host = host;
    }

    /**
     * @param solids r, z0, z1 per solid in a's axis frame (m), [0, 3 n) (not modified; kept)
     * @param a0 azimuth range of a and {@code b0, b1} of b in a's frame (rad), as in
     *        {@link CoaxialAzimuths#set}: the weight w(ψ) has its kinks and ends at b0 − a0,
     *        b1 − a1, b0 − a1 and b1 − a0
     */
    void set(double[] solids, int n, double a0, double a1, double b0, double b1) {
        kinks[0] = Math.cos(b0 - a0);
        kinks[1] = Math.cos(b1 - a1);
        kinks[2] = Math.cos(b0 - a1);
        kinks[3] = Math.cos(b1 - a0);
        sol = solids;
        ns = n;
        error = 0;
    }

    /**
     * ∫∫ of {@link CoaxialPairs#inner} over one region: the rectangle [s0, s1] × [t0, t1] of
     * (u, v) (mode RECT), or the unit square of a triangle mapped from the corner (cu, cv) with
     * signed sides hu, hv (LOWER: u = cu + hu s, v = cv + hv s t; UPPER: u = cu + hu s t,
     * v = cv + hv s; Jacobian |hu hv| s).
     *
     * @param tol absolute tolerance (m²)
     * @return the integral (m²); its estimate is added to {@link #error}
     */
    double region(int m, double cuIn, double cvIn, double huIn, double hvIn, double s0, double s1, double t0, double t1,
            double tol) {
        mode = m;
        cu = cuIn;
        cv = cvIn;
        hu = huIn;
        hv = hvIn;
        int n = cuts(true, 0, s0, s1, t0, t1, outerCuts);
        double total = 0, len = s1 - s0, lineTol = 0.4 * tol / len;
        for (int k = 0; k + 1 < n; k++) {
            double p = outerCuts[k], q = outerCuts[k + 1];
            double share = 0.5 * tol * (q - p) / len;
            total += adapt(true, 0, p, q, 0, 1, t0, t1, lineTol, share, 0);
        }
        return total;
    }

    /** ∫ over [t0, t1] of the integrand on the line of outer value s; sets {@link #lineError}. */
    private double line(double s, double t0, double t1, double tol) {
        int n = cuts(false, s, t0, t1, 0, 0, innerCuts);
        double[] c = innerCuts;
        double total = 0, err = 0, len = t1 - t0;
        for (int k = 0; k + 1 < n; k++) {
            double p = c[k], q = c[k + 1];
            double before = error;
            total += adapt(false, s, p, q, 0, 1, 0, 0, 0, tol * (q - p) / len, 0);
            err += error - before;
            error = before;
        }
        lineError = err;
        return total;
    }

    /**
     * Adaptive mapped Gauss over σ ∈ [a, b] of the piece [p, q] (outer: of s, with lines over
     * [t0, t1] at tolerance lineTol; inner: of t on the line s).
     */
    private double adapt(boolean outer, double s, double p, double q, double a, double b, double t0, double t1,
            double lineTol, double tol, int depth) {
        double whole = rule(outer, s, p, q, a, b, t0, t1, lineTol, G8, W8);
        double inner8 = ruleError;
        double lower = rule(outer, s, p, q, a, b, t0, t1, lineTol, G6, W6);
        double diff = Math.abs(whole - lower);
        if (diff <= Math.max(tol, 2 * inner8) || depth >= MAX_DEPTH || host.evaluations() > CoaxialPairs.BUDGET) {
            error += diff + inner8;
            return whole;
        }
        double m = 0.5 * (a + b);
        return adapt(outer, s, p, q, a, m, t0, t1, lineTol, 0.5 * tol, depth + 1)
                + adapt(outer, s, p, q, m, b, t0, t1, lineTol, 0.5 * tol, depth + 1);
    }

    /** One Gauss rule over σ ∈ [a, b] of the piece [p, q] under the map; sets {@link #ruleError}. */
    private double rule(boolean outer, double s, double p, double q, double a, double b, double t0, double t1,
            double lineTol, double[] g, double[] w) {
        double sum = 0, err = 0, h = q - p, len = b - a;
        for (int k = 0; k < g.length; k++) {
            double sg = a + len * g[k];
            double x = p + h * sg * sg * (3 - 2 * sg), dx = 6 * h * sg * (1 - sg);
            if (outer) {
                sum += w[k] * dx * line(x, t0, t1, lineTol);
                err += w[k] * dx * lineError;
            } else {
                sum += w[k] * dx * value(s, x);
            }
        }
        ruleError = err * len;
        return sum * len;
    }

    /** The mapped integrand at (s, t) of the current region. */
    private double value(double s, double t) {
        if (mode == CoaxialPairs.RECT) {
            return host.inner(s, t);
        }
        double u = cu + hu * s * (mode == CoaxialPairs.LOWER ? 1 : t);
        double v = cv + hv * s * (mode == CoaxialPairs.LOWER ? t : 1);
        return Math.abs(hu * hv) * s * host.inner(u, v);
    }

    /** ρ_x, z_x, ρ_y, z_y at (s, t) of the current region, into {@link #pt}. */
    private void point(double s, double t) {
        double u = s, v = t;
        if (mode != CoaxialPairs.RECT) {
            u = cu + hu * s * (mode == CoaxialPairs.LOWER ? 1 : t);
            v = cv + hv * s * (mode == CoaxialPairs.LOWER ? t : 1);
        }
        host.radiiHeights(u, v, pt);
    }

    /**
     * The event functions at the current {@link #pt}, into out: per solid and rim F (three signs),
     * G, E (four), z_y − z_k, z_x − z_k; then ρ_x − r, ρ_y − r and T (eight).
     *
     * @return their count
     */
    private int events(double[] out) {
        double rx = pt[0], zx = pt[1], ry = pt[2], zy = pt[3];
        int n = 0;
        for (int k = 0; k < ns; k++) {
            double r = sol[3 * k];
            double ax = rx > r ? Math.sqrt((rx - r) * (rx + r)) : Double.NaN;
            double by = ry > r ? Math.sqrt((ry - r) * (ry + r)) : Double.NaN;
            double d = zy - zx;
            for (int e = 1; e <= 2; e++) {
                double zk = sol[3 * k + e], p = zy - zk, q = zk - zx;
                out[n++] = p * rx + q * ry - r * d;
                out[n++] = p * rx - q * ry - r * d;
                out[n++] = p * rx - q * ry + r * d;
                out[n++] = q * by - ax * p;
                for (int w = 0; w < 4; w++) {
                    out[n++] = p * p * rx * rx + q * q * ry * ry + 2 * p * q * rx * ry * kinks[w] - r * r * d * d;
                }
                out[n++] = p;
                out[n++] = -q;
            }
            out[n++] = rx - r;
            out[n++] = ry - r;
            for (int w = 0; w < 4; w++) {
                out[n++] = r * r + ax * by - rx * ry * kinks[w];
                out[n++] = r * r - ax * by - rx * ry * kinks[w];
            }
        }
        return n;
    }

    /**
     * The cuts of an outer range [lo, hi] (zeros of the event functions along the edges t = t0
     * and t = t1) or of the inner line at s over [lo, hi], sorted, ends included.
     *
     * @param out receives the cuts (modified) @return their count
     */
    private int cuts(boolean outer, double s, double lo, double hi, double t0, double t1, double[] out) {
        int n = 0;
        out[n++] = lo;
        out[n++] = hi;
        for (int edge = 0; edge < (outer ? 2 : 1); edge++) {
            double te = edge == 0 ? t0 : t1;
            int nf = 0;
            for (int i = 0; i <= SAMPLES; i++) {
                double x = lo + (hi - lo) * i / SAMPLES;
                at(outer, s, te, x);
                nf = events(fa);
                System.arraycopy(fa, 0, samples, i * nf, nf);
            }
            for (int f = 0; f < nf; f++) {
                for (int i = 0; i < SAMPLES; i++) {
                    double ya = samples[i * nf + f], yb = samples[(i + 1) * nf + f];
                    if (ya * yb < 0 && n < out.length) {
                        double xa = lo + (hi - lo) * i / SAMPLES, xb = lo + (hi - lo) * (i + 1) / SAMPLES;
                        double x = root(outer, s, te, f, xa, ya, xb, yb);
                        if (real(f)) {
                            out[n++] = x;
                        }
                    }
                }
            }
        }
        java.util.Arrays.sort(out, 0, n);
        int m = 1;
        double eps = 1e-12 * (hi - lo);
        for (int k = 1; k < n; k++) {
            if (out[k] - out[m - 1] > eps) {
                out[m++] = out[k];
            }
        }
        out[m - 1] = hi;
        return m;
    }

    /**
     * Whether the zero of event function f just found (at {@link #pt}) is a real change: a rim
     * crossing (F) or a tangency at a rim (G) only where the rim's height lies strictly between
     * the two points', so that the segment passes it.
     */
    private boolean real(int f) {
        int e = f % PER_SOLID;
        if (e >= 20 || e % 10 >= 8) {
            return true;
        }
        double zk = sol[3 * (f / PER_SOLID) + (e < 10 ? 1 : 2)];
        return (pt[1] - zk) * (pt[3] - zk) < 0;
    }

    /** Loads {@link #pt} at the outer value x on edge te (outer) or at t = x on the line s. */
    private void at(boolean outer, double s, double te, double x) {
        if (outer) {
            point(x, te);
        } else {
            point(s, x);
        }
    }

    /** Zero of event function f between xa and xb (values ya, yb of opposite signs), Illinois method. */
    private double root(boolean outer, double s, double te, int f, double xa, double ya, double xb, double yb) {
        int side = 0;
        double x = xa, scale = Math.abs(xa) + Math.abs(xb) + 1e-300;
        for (int it = 0; it < 60; it++) {
            double prev = x;
            x = (ya * xb - yb * xa) / (ya - yb);
            if (!(x >= Math.min(xa, xb) && x <= Math.max(xa, xb))) {
                x = 0.5 * (xa + xb);
            }
            at(outer, s, te, x);
            events(fc);
            double y = fc[f];
            if (y * yb > 0) {
                xb = x;
                yb = y;
                if (side == -1) {
                    ya *= 0.5;
                }
                side = -1;
            } else if (y * ya > 0) {
                xa = x;
                ya = y;
                if (side == 1) {
                    yb *= 0.5;
                }
                side = 1;
            } else {
                return x;
            }
            if (Math.abs(x - prev) <= 1e-15 * scale) {
                return x;
            }
        }
        return x;
    }
}
