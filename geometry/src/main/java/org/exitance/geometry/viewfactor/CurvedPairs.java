package org.exitance.geometry.viewfactor;

import org.exitance.geometry.Patch;

/**
 * Unobstructed exchange area of a pair in which at least one side is an exact curved or
 * circular {@link Patch}. The pair is integrated on the exact surfaces:
 * <ul>
 *   <li>far (ρ = r / (R_p + R_q) ≥ 3, R the bounding radii): product Gauss rules in each
 *       patch's parameters with the exact point, normal and area element, the kernel
 *       max(0, cos θ_p) max(0, cos θ_q) / (π r²) (definition, Siegel &amp; Howell 4th ed.
 *       eq. 4.13), order from {@link ProximityRule}; error bound as there;</li>
 *   <li>near: the larger side is halved in its parameter rectangle (along its longer extent)
 *       and the halves recurse; exchange areas add over a partition;</li>
 *   <li>at the depth limit (pieces touching along a common curve, where halving never makes them
 *       far): the contour integral of the pieces' inscribed polygons (arcs of planar pieces get
 *       {@value Piece#ARC_VERTICES} extra vertices). Their share of the pair falls like 2^−depth
 *       and their shape error like angle²/8, which is the error estimate added.</li>
 * </ul>
 * Clipping the cosines at zero is exact where the kernel's sign change is a real horizon; the
 * rule's error there is larger than the table says (the integrand has a kink), which is why near
 * pairs are halved. Mutable scratch; one instance per thread.
 */
final class CurvedPairs {

    private static final double INV_PI = 1.0 / Math.PI;
    /**
     * Planar near pairs: the coarser polygon has one chord per {@value #CHORD_ANGLE} rad of arc
     * (at least 2, at most {@value #MAX_CHORDS}); the finer twice as many.
     */
    static final double CHORD_ANGLE = 0.02;
    static final int MAX_CHORDS = 30;
    /** Extra halvings allowed for far sub-pairs cut by a horizon. */
    static final int HORIZON_DEPTH = 4;

    private final ContourIntegral contour;
    private final ProximityRule rule;
    private final int contourOrder;
    private final int maxDepth;
    private final Piece[] pool;
    private final Poly cp = new Poly(), cq = new Poly();
    private final double[] rp = new double[7 * 4 * Poly.MAX_VERTICES * 36];
    private final double[] rq = new double[7 * 4 * Poly.MAX_VERTICES * 36];
    private final double[] tmp = new double[Poly.RULE_SCRATCH];
    private final double[] scratch = new double[3 * Poly.MAX_VERTICES];
    /** Cells cut by a horizon are accepted below this size A_a A_b/(π r²) (m²): the tolerance times the pair's. */
    private double cellFloor;
    /** Error estimate of the last call (m²). */
    double lastError;
    /** Sub-pairs evaluated in the last call. */
    int lastPieces;

    CurvedPairs(ContourIntegral contour, ProximityRule rule, int contourOrder, int maxDepth) {
        this.contour = contour;
        this.rule = rule;
        this.contourOrder = contourOrder;
        this.maxDepth = maxDepth;
        pool = new Piece[2 * (maxDepth + HORIZON_DEPTH + 2) + 2];
        for (int k = 0; k < pool.length; k++) {
            pool[k] = new Piece();
        }
    }

    /**
     * @param t the facet table
     * @param i first facet
     * @param j second facet (≠ i)
     * @param p facet i's polygon (used when it has no patch; not modified)
     * @param q facet j's polygon (not modified)
     * @return A_i F_ij (m²)
     */
    double exchangeArea(FacetTable t, int i, int j, Poly p, Poly q) {
        Piece a = pool[pool.length - 2], b = pool[pool.length - 1];
        if (t.patch[i] != null) {
            a.setPatch(t.patch[i]);
        } else {
            a.setPoly(p);
        }
        if (t.patch[j] != null) {
            b.setPatch(t.patch[j]);
        } else {
            b.setPoly(q);
        }
        lastError = 0;
        lastPieces = 0;
        double r = Math.max(Math.sqrt(sq(a.cx - b.cx) + sq(a.cy - b.cy) + sq(a.cz - b.cz)), a.radius + b.radius);
        cellFloor = rule.tolerance() * a.area * b.area / (Math.PI * r * r);
        return pair(a, b, 0);
    }

    private double pair(Piece a, Piece b, int depth) {
        lastPieces++;
        horizon = false;
        double r = Math.sqrt(sq(a.cx - b.cx) + sq(a.cy - b.cy) + sq(a.cz - b.cz));
        double rho = r / (a.radius + b.radius);
        int order = rule.order(rho);
        if (order == 0 && rho >= ProximityRule.RHO[0] && depth >= maxDepth) {
            order = ProximityRule.MAX_ORDER; // far but beyond the table at this tolerance
        }
        if (order > 0 && !horizon && depth < maxDepth + HORIZON_DEPTH) {
            // may a horizon cross the pair? the centre cosines, widened by how much the normal
            // turns over each piece (half its angle) and the direction over both (≤ (R_a + R_b)/r)
            double dx = b.cx - a.cx, dy = b.cy - a.cy, dz = b.cz - a.cz;
            double ca = (a.nx * dx + a.ny * dy + a.nz * dz) / r, cb = -(b.nx * dx + b.ny * dy + b.nz * dz) / r;
            double spread = (a.radius + b.radius) / r;
            double wa = spread + 0.5 * a.angle(), wb = spread + 0.5 * b.angle();
            horizon = (Math.abs(ca) < wa && a.angle() > 0) || (Math.abs(cb) < wb && b.angle() > 0);
            if (horizon && (ca < -wa || cb < -wb)) {
                horizon = false; // entirely behind: the rule gives 0 anyway
            }
        }
        if (order > 0) {
            int na = a.rule(order, rp, tmp), nb = b.rule(order, rq, tmp);
            boolean suspect = horizon;
            double s = kernel(na, nb) * INV_PI;
            horizon |= suspect;
            double cell = a.area * b.area / (Math.PI * r * r);
            if (!horizon || depth >= maxDepth + HORIZON_DEPTH || cell <= cellFloor) {
                // a horizon (cosine changing sign) inside the pair makes the integrand kink: halve instead
                // a cell cut by a horizon: the rule's error is a fraction of the cell's size
                lastError += horizon ? 0.1 * cell : rule.bound(rho) * cell;
                return s;
            }
        }
        if (a.planar() && b.planar()) {
            // planar pieces: contour over inscribed polygons of k and 2k chords per arc; the
            // error of an inscribed polygon falls like k^-2, Richardson's step removes that term
            int k = (int) Math.min(MAX_CHORDS, Math.max(2, Math.ceil(Math.max(a.angle(), b.angle()) / CHORD_ANGLE)));
            double s1 = leaf(a, b, k - 1), e1 = contour.lastMagnitude;
            double s2 = leaf(a, b, 2 * k - 1);
            double s = (4 * s2 - s1) / 3;
            lastError += Math.abs(s2 - s1) / 15 + ContourIntegral.relativeError(contourOrder) * Math.max(e1, contour.lastMagnitude);
            return s;
        }
        if (depth >= maxDepth && order == 0) {
            double s = leaf(a, b, Piece.ARC_VERTICES);
            double ang = Math.max(a.angle(), b.angle());
            lastError += Math.abs(s) * ang * ang / 8 + ContourIntegral.relativeError(contourOrder) * contour.lastMagnitude;
            return s;
        }
        // a horizon lies across the curved side (its normal turns): halve that one; else the larger
        boolean kink = order > 0 && horizon;
        Piece big = kink && a.angle() * a.radius != b.angle() * b.radius
                ? (a.angle() * a.radius > b.angle() * b.radius ? a : b)
                : (a.radius >= b.radius ? a : b);
        Piece h0 = pool[2 * depth], h1 = pool[2 * depth + 1];
        big.split(h0, h1);
        if (big == a) {
            return pair(h0, b, depth + 1) + pair(h1, b, depth + 1);
        }
        return pair(a, h0, depth + 1) + pair(a, h1, depth + 1);
    }

    /** Contour integral of the two inscribed polygons, each clipped to the front of the other. */
    private double leaf(Piece a, Piece b, int arcVertices) {
        a.chord(cp, arcVertices);
        b.chord(cq, arcVertices);
        double dq = cq.nx * cq.cx + cq.ny * cq.cy + cq.nz * cq.cz;
        double dp = cp.nx * cp.cx + cp.ny * cp.cy + cp.nz * cp.cz;
        double pnx = cp.nx, pny = cp.ny, pnz = cp.nz;
        cq.clip(pnx, pny, pnz, dp + 1e-12 * cp.radius, scratch);
        if (cq.n < 3 || !(cq.area > 0)) {
            return 0;
        }
        cp.clip(cq.nx, cq.ny, cq.nz, dq + 1e-12 * cq.radius, scratch);
        if (cp.n < 3 || !(cp.area > 0)) {
            return 0;
        }
        return contour.exchangeArea(cp, cq, contourOrder);
    }

    /** Set by {@link #kernel}: some point pairs had a non-positive cosine and some a positive one. */
    private boolean horizon;

    /** Σ_a Σ_b w_a w_b max(0, n_a·d) max(0, −n_b·d) / |d|⁴ over the rules in rp, rq; sets {@link #horizon}. */
    private double kernel(int na, int nb) {
        double sum = 0;
        int seen = 0, total = na * nb;
        for (int x = 0; x < na; x++) {
            int ia = 7 * x;
            double px = rp[ia], py = rp[ia + 1], pz = rp[ia + 2], nx = rp[ia + 4], ny = rp[ia + 5], nz = rp[ia + 6];
            double row = 0;
            for (int y = 0; y < nb; y++) {
                int ib = 7 * y;
                double dx = rq[ib] - px, dy = rq[ib + 1] - py, dz = rq[ib + 2] - pz;
                double ci = nx * dx + ny * dy + nz * dz;
                double cj = -(rq[ib + 4] * dx + rq[ib + 5] * dy + rq[ib + 6] * dz);
                if (ci > 0 && cj > 0) {
                    double r2 = dx * dx + dy * dy + dz * dz;
                    row += rq[ib + 3] * ci * cj / (r2 * r2);
                    seen++;
                }
            }
            sum += rp[ia + 3] * row;
        }
        horizon = seen > 0 && seen < total;
        return sum;
    }

    private static double sq(double v) {
        return v * v;
    }
}
