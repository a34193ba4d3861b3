package org.exitance.geometry.viewfactor;

import org.exitance.geometry.bvh.TriangleBvh;
import org.exitance.geometry.bvh.WatertightRay;
import java.util.SplittableRandom;

/**
 * Partly hidden pairs: the visible fraction of the kernel, estimated by area quadrature with one
 * ray per point pair, times the unobstructed exchange area computed by the proximity rule:
 *
 * <pre>  A_p F_pq ≈ (A_p F_pq)_unobstructed · Σ w_a w_b K_ab V_ab / Σ w_a w_b K_ab </pre>
 *
 * with K the point kernel cos θ_a cos θ_b / (π r²) and V_ab ∈ {0, 1} the visibility of the segment
 * from point a to point b (any-hit test in a {@link TriangleBvh} with the watertight test of Woop,
 * Benthin &amp; Wald 2013, ignoring the two facets' own triangles and the parameter range
 * [1e-9, 1 − 1e-9]). The visibility-weighted area integral is the definition of the view factor
 * with obstruction (Siegel &amp; Howell, 4th ed., eq. 4.13 with the visibility function); taking
 * the ratio makes the result exact when all rays are visible or all hidden.
 *
 * <p>The points are stratified random points (m × m cells per polygon, one uniformly placed point per cell, seed derived from
 * the pair indices so the result is independent of threads): stratified sampling is unbiased, so
 * the errors of the many partly hidden pairs in one row cancel instead of adding up as the
 * aliasing errors of a fixed grid do (measured in docs/performance.md: a fixed Gauss grid, and a
 * screening stage that accepted unanimous 2 × 2-point outcomes, both gave row-sum errors that did
 * not fall with the order).
 *
 * <p>Error estimate: treats the M ray outcomes as Bernoulli samples of the visible
 * fraction v, standard error (A_p F_pq)_unobstructed · √(v (1 − v) / M) (an overestimate for
 * stratified sampling; zero when every ray agrees).
 */
final class VisibilityQuadrature {

    private final TriangleBvh bvh;
    private final FacetTable table;
    private final WatertightRay ray = new WatertightRay();
    private final double[] rp;
    private final double[] rq;
    /** Standard-error estimate of the last call (m²). */
    double lastStandardError;
    /** Visible fraction of the last call. */
    double lastVisibleFraction;

    VisibilityQuadrature(FacetTable table, TriangleBvh bvh) {
        this.table = table;
        this.bvh = bvh;
        int max = Poly.RULE_SCRATCH;
        rp = new double[max];
        rq = new double[max];
    }

    /**
     * @param p first polygon (not modified)
     * @param q second polygon (not modified)
     * @param order points per direction on each polygon (cells of the stratification)
     * @param unobstructed exchange area without obstruction (m²)
     * @param seed seed of the stratified points (derived from the pair, not the thread)
     * @return the exchange area with obstruction (m²)
     */
    double exchangeArea(Poly p, Poly q, int order, double unobstructed, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        visibleFraction(p, q, AreaRules.build(p, order, rp, 0, rnd), AreaRules.build(q, order, rq, 0, rnd));
        double v = lastVisibleFraction;
        lastStandardError = unobstructed * Math.sqrt(v * (1 - v) / Math.max(1, lastRays));
        return unobstructed * v;
    }

    private int lastRays;
    private final int[] hint = {-1};

    /** Sets lastVisibleFraction and lastRays from the point sets in rp (np) and rq (nq). */
    private void visibleFraction(Poly p, Poly q, int np, int nq) {
        double all = 0, seen = 0;
        int rays = 0;
        hint[0] = -1;
        for (int a = 0; a < np; a++) {
            double x = rp[4 * a], y = rp[4 * a + 1], z = rp[4 * a + 2], wa = rp[4 * a + 3];
            for (int b = 0; b < nq; b++) {
                double dx = rq[4 * b] - x, dy = rq[4 * b + 1] - y, dz = rq[4 * b + 2] - z;
                double ci = p.nx * dx + p.ny * dy + p.nz * dz;
                double cj = -(q.nx * dx + q.ny * dy + q.nz * dz);
                if (ci <= 0 || cj <= 0) {
                    continue;
                }
                double r2 = dx * dx + dy * dy + dz * dz;
                double k = wa * rq[4 * b + 3] * ci * cj / (r2 * r2);
                all += k;
                rays++;
                ray.set(x, y, z, dx, dy, dz);
                if (!bvh.occluded(ray, 1e-9, 1 - 1e-9, p.facet, q.facet, hint)) {
                    seen += k;
                }
            }
        }
        lastRays = rays;
        lastVisibleFraction = all > 0 ? seen / all : 0;
    }

    FacetTable table() {
        return table;
    }
}
