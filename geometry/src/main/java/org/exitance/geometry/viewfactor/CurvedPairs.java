package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * Pairs in which at least one facet stands for an exact curved or circular {@link Patch}.
 *
 * <p>Each pair is classified from exact bounds ({@link PatchBounds}):
 * <ul>
 *   <li>ZERO: one side lies entirely on or behind every tangent plane of the other (a plane's
 *       back, the outside of a convex surface seen from itself);</li>
 *   <li>FULL: each side lies entirely in front of every tangent plane of the other. Then the
 *       kernel cos θ_p cos θ_q / (π r²) never changes sign on the pair and, with nothing in the
 *       way, the double contour integral over the exact boundaries ({@link CurvedContour}) is
 *       exact: this is where the contour form is proved to hold for non-planar surfaces;</li>
 *   <li>PARTIAL: anything else (a horizon crosses the pair); handled elsewhere.</li>
 * </ul>
 * A facet lying on the boundary of a region that contains both sides (in front of its plane, or
 * inside the convex solid of its inward-facing curved surface) cannot block the pair:
 * {@link #cannotBlock}. Mutable scratch; one instance per thread.
 */
final class CurvedPairs {

    static final int ZERO = 0, FULL = 1, PARTIAL = 2;

    private final FacetTable t;
    private final double relativeTolerance;
    private final ProximityRule rule;
    private final double[] ea = new double[7 * 36], eb = new double[7 * 36];
    private final CurvedContour contour = new CurvedContour();
    private final Curve[] cp = curves(Poly.MAX_VERTICES), cq = curves(Poly.MAX_VERTICES);
    private final Poly scratch = new Poly();
    private final PartialPairs partial = new PartialPairs();
    private final double[] centre = new double[7];
    /** Error estimate of the last {@link #exchangeArea} (m²). */
    double lastError;

    /**
     * @param relativeTolerance target error of a pair relative to the smaller exact area
     */
    CurvedPairs(FacetTable t, double relativeTolerance, ProximityRule rule) {
        this.t = t;
        this.relativeTolerance = relativeTolerance;
        this.rule = rule;
    }

    private static Curve[] curves(int n) {
        Curve[] c = new Curve[n];
        for (int k = 0; k < n; k++) {
            c[k] = new Curve();
        }
        return c;
    }

    /** @return the target error of a pair relative to the smaller exact area */
    double relativeTolerance() {
        return relativeTolerance;
    }

    /** @return true if facet i or j carries an exact patch */
    boolean involved(int i, int j) {
        return t.patch[i] != null || t.patch[j] != null;
    }

    /**
     * @param p facet i's polygon (not modified)
     * @param q facet j's polygon (not modified)
     * @return ZERO, FULL or PARTIAL
     */
    int classify(int i, Poly p, int j, Poly q) {
        double tol = 1e-9 * (t.radius[i] + t.radius[j] + distance(i, j));
        int a = front(i, p, j, q, tol), b = front(j, q, i, p, tol);
        if (a < 0 || b < 0) {
            return ZERO;
        }
        return a > 0 && b > 0 ? FULL : PARTIAL;
    }

    /**
     * A_i F_ij of a FULL pair (i = j allowed: a concave patch with itself) over the exact shapes.
     *
     * @return the exchange area (m²), or NaN when the contour integral ran out of its budget
     *         ({@link CurvedContour#BUDGET}); sets {@link #lastError}
     */
    double exchangeArea(int i, Poly p, int j, Poly q) {
        if (i != j && t.patch[i] != null && t.patch[j] != null) {
            double r = distance(i, j), rho = r / (t.radius[i] + t.radius[j] + t.sagitta[i] + t.sagitta[j]);
            int order = rule.order(rho);
            if (order > 0) {
                lastError = rule.bound(rho) * t.exactArea[i] * t.exactArea[j] / (Math.PI * r * r);
                return farQuadrature(t.patch[i], t.patch[j], order);
            }
        }
        int np = t.patch[i] != null ? PatchCurves.of(t.patch[i], cp) : PatchCurves.of(p, cp);
        int nq = t.patch[j] != null ? PatchCurves.of(t.patch[j], cq) : PatchCurves.of(q, cq);
        double scale = Math.max(t.radius[i], t.radius[j]);
        double tol = relativeTolerance * Math.min(t.exactArea[i], t.exactArea[j]);
        double s = contour.exchangeArea(cp, np, cq, nq, i == j ? t.exactArea[i] : 0, scale, tol);
        if (contour.exhausted) {
            return Double.NaN;
        }
        // rounding: the terms' sum loses about 1e-15 of their magnitude
        lastError = contour.lastError + 1e-14 * contour.lastMagnitude;
        return Math.max(0, s);
    }

    /**
     * A far FULL pair by the product Gauss rule of the proximity rule's order in each patch's
     * parameters, on the exact points, normals and area elements (the kernel keeps its sign on a
     * FULL pair, so it is smooth there; error bound as {@link ProximityRule} states it, with the
     * sagittas added to the radii that define ρ).
     */
    private double farQuadrature(Patch a, Patch b, int order) {
        double[] g = GaussLegendre.nodes(order), w = GaussLegendre.weights(order);
        int n = fill(a, g, w, ea);
        int m = fill(b, g, w, eb);
        double s = 0;
        for (int k = 0; k < n; k++) {
            int o = 7 * k;
            double x = ea[o], y = ea[o + 1], z = ea[o + 2];
            for (int l = 0; l < m; l++) {
                int v = 7 * l;
                double dx = eb[v] - x, dy = eb[v + 1] - y, dz = eb[v + 2] - z;
                double r2 = dx * dx + dy * dy + dz * dz;
                double ca = ea[o + 3] * dx + ea[o + 4] * dy + ea[o + 5] * dz;
                double cb = -(eb[v + 3] * dx + eb[v + 4] * dy + eb[v + 5] * dz);
                s += ea[o + 6] * eb[v + 6] * Math.max(0, ca) * Math.max(0, cb) / (r2 * r2);
            }
        }
        return s / Math.PI;
    }

    /** Rule points of a patch: x, n, weight × dA (7 numbers each) into {@code out} (modified). @return count */
    private static int fill(Patch a, double[] g, double[] w, double[] out) {
        int n = 0;
        double hu = a.u1() - a.u0(), hf = a.phi1() - a.phi0();
        for (int i = 0; i < g.length; i++) {
            for (int k = 0; k < g.length; k++) {
                a.evaluate(a.u0() + hu * g[i], a.phi0() + hf * g[k], out, 7 * n);
                out[7 * n + 6] *= w[i] * w[k] * hu * hf;
                n++;
            }
        }
        return n;
    }

    /**
     * A_i F_ij of an unobstructed PARTIAL pair, by {@link PartialPairs} with a curved side outside.
     *
     * @return the exchange area (m²); sets {@link #lastError}
     */
    double partialExchangeArea(int i, Poly p, int j, Poly q) {
        double tol = relativeTolerance * Math.min(t.exactArea[i], t.exactArea[j]);
        // outside: a patch, curved rather than plane (polygons and plane patches are best inside,
        // where their factor from a point is exact)
        boolean iOutside = t.patch[j] == null
                || t.patch[i] != null && (t.patch[i].kind() != Patch.Kind.PLANE || t.patch[j].kind() == Patch.Kind.PLANE);
        double s = iOutside
                ? partial.exchangeArea(t.patch[i], t.patch[j], q, tol)
                : partial.exchangeArea(t.patch[j], t.patch[i], p, tol);
        lastError = partial.lastError;
        return s;
    }

    /**
     * @return true if facet f cannot block a segment between facets i and j that counts (one
     *         leaving each side in front of its tangent plane): either both lie in front of every
     *         tangent plane of f, which then bounds a region holding every such segment, or f lies
     *         behind every tangent plane of i (or of j), where no such segment goes
     */
    boolean cannotBlock(int f, int i, Poly p, int j, Poly q) {
        scratch.load(t, f);
        double tol = 1e-9 * (t.radius[i] + t.radius[j] + distance(i, j));
        return front(f, scratch, i, p, tol) > 0 && front(f, scratch, j, q, tol) > 0
                || front(i, p, f, scratch, tol) < 0 || front(j, q, f, scratch, tol) < 0;
    }

    /**
     * Where facet b lies relative to every tangent plane of facet a: +1 in front (on allowed),
     * −1 behind (on allowed), 0 both or not proved.
     */
    private int front(int a, Poly pa, int b, Poly pb, double tol) {
        Patch A = t.patch[a], B = t.patch[b];
        if (A == null || A.kind() == Patch.Kind.PLANE) {
            double nx = t.normal[3 * a], ny = t.normal[3 * a + 1], nz = t.normal[3 * a + 2];
            double d = nx * t.centroid[3 * a] + ny * t.centroid[3 * a + 1] + nz * t.centroid[3 * a + 2];
            double lo, hi;
            if (B == null) {
                lo = Double.MAX_VALUE;
                hi = -Double.MAX_VALUE;
                for (int v = 0; v < pb.n; v++) {
                    double s = nx * pb.xyz[3 * v] + ny * pb.xyz[3 * v + 1] + nz * pb.xyz[3 * v + 2] - d;
                    lo = Math.min(lo, s);
                    hi = Math.max(hi, s);
                }
            } else {
                lo = PatchBounds.minLinear(B, nx, ny, nz, -d);
                hi = PatchBounds.maxLinear(B, nx, ny, nz, -d);
            }
            if (hi <= tol) {
                return -1;
            }
            return lo >= -tol ? 1 : 0;
        }
        int cone = normalCone(A, a, b, pb, tol);
        if (cone != 0) {
            return cone;
        }
        if (PatchBounds.insideSolid(A, B, pb, tol)) {
            return A.sign() < 0 ? 1 : -1;
        }
        return 0;
    }

    /**
     * The front test of a curved facet a by its cone of normals. On a cone, cylinder or sphere,
     * n·(x − o) is the same constant C for every point x (c/√(1 + k²) or R, times the side's
     * sign), so b is in front of every tangent plane of a when n(x)·(y − o) ≥ C for all x and y;
     * with n₀ the normal at a's centre, |n(x) − n₀| ≤ δ and |y − o| ≤ d, that holds when
     * min_y n₀·(y − o) − δ d ≥ C (and behind when max_y n₀·(y − o) + δ d ≤ C).
     *
     * @return +1, −1, or 0 when the bound decides nothing
     */
    private int normalCone(Patch A, int a, int b, Poly pb, double tol) {
        double um = 0.5 * (A.u0() + A.u1()), fm = 0.5 * (A.phi0() + A.phi1());
        A.evaluate(um, fm, centre, 0);
        double nx = centre[3], ny = centre[4], nz = centre[5];
        double ox = A.frame(0), oy = A.frame(1), oz = A.frame(2);
        double k = A.shapeB(), w = Math.sqrt(1 + k * k);
        double c, delta;
        if (A.kind() == Patch.Kind.CONE) {
            c = A.sign() * A.shapeA() / w;
            delta = 2 * Math.sin(0.25 * (A.phi1() - A.phi0())) / w;
        } else {
            c = A.sign() * A.shapeA();
            delta = 0.5 * (A.u1() - A.u0()) + 0.5 * (A.phi1() - A.phi0()) * A.maxRadius() / A.shapeA();
        }
        double d0 = nx * ox + ny * oy + nz * oz;
        double lo, hi, reach;
        Patch B = t.patch[b];
        if (B == null) {
            lo = Double.MAX_VALUE;
            hi = -Double.MAX_VALUE;
            reach = 0;
            for (int v = 0; v < pb.n; v++) {
                double px = pb.xyz[3 * v], py = pb.xyz[3 * v + 1], pz = pb.xyz[3 * v + 2];
                double sv = nx * px + ny * py + nz * pz - d0;
                lo = Math.min(lo, sv);
                hi = Math.max(hi, sv);
                reach = Math.max(reach, Math.sqrt(sq(px - ox) + sq(py - oy) + sq(pz - oz)));
            }
        } else {
            lo = PatchBounds.minLinear(B, nx, ny, nz, -d0);
            hi = PatchBounds.maxLinear(B, nx, ny, nz, -d0);
            reach = Math.sqrt(sq(t.centroid[3 * b] - ox) + sq(t.centroid[3 * b + 1] - oy) + sq(t.centroid[3 * b + 2] - oz))
                    + t.radius[b] + t.sagitta[b];
        }
        if (lo - delta * reach >= c - tol) {
            return 1;
        }
        if (hi + delta * reach <= c + tol) {
            return -1;
        }
        return 0;
    }

    private static double sq(double v) {
        return v * v;
    }

    private double distance(int i, int j) {
        double dx = t.centroid[3 * i] - t.centroid[3 * j], dy = t.centroid[3 * i + 1] - t.centroid[3 * j + 1];
        double dz = t.centroid[3 * i + 2] - t.centroid[3 * j + 2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
