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
    private final CurvedContour contour = new CurvedContour();
    private final Curve[] cp = curves(Poly.MAX_VERTICES), cq = curves(Poly.MAX_VERTICES);
    private final Poly scratch = new Poly();
    private final PartialPairs partial = new PartialPairs();
    /** Error estimate of the last {@link #exchangeArea} (m²). */
    double lastError;

    /**
     * @param relativeTolerance target error of a pair relative to the smaller exact area
     */
    CurvedPairs(FacetTable t, double relativeTolerance) {
        this.t = t;
        this.relativeTolerance = relativeTolerance;
    }

    private static Curve[] curves(int n) {
        Curve[] c = new Curve[n];
        for (int k = 0; k < n; k++) {
            c[k] = new Curve();
        }
        return c;
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
     * @return the exchange area (m²); sets {@link #lastError}
     */
    double exchangeArea(int i, Poly p, int j, Poly q) {
        int np = t.patch[i] != null ? PatchCurves.of(t.patch[i], cp) : PatchCurves.of(p, cp);
        int nq = t.patch[j] != null ? PatchCurves.of(t.patch[j], cq) : PatchCurves.of(q, cq);
        double scale = Math.max(t.radius[i], t.radius[j]);
        double tol = relativeTolerance * Math.min(t.exactArea[i], t.exactArea[j]);
        double s = contour.exchangeArea(cp, np, cq, nq, i == j ? t.exactArea[i] : 0, scale, tol);
        // rounding: the terms' sum loses about 1e-15 of their magnitude
        lastError = contour.lastError + 1e-14 * contour.lastMagnitude;
        return Math.max(0, s);
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
        if (PatchBounds.insideSolid(A, B, pb, tol)) {
            return A.sign() < 0 ? 1 : -1;
        }
        return 0;
    }

    private double distance(int i, int j) {
        double dx = t.centroid[3 * i] - t.centroid[3 * j], dy = t.centroid[3 * i + 1] - t.centroid[3 * j + 1];
        double dz = t.centroid[3 * i + 2] - t.centroid[3 * j + 2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
