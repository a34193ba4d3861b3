package org.exitance.geometry.viewfactor;

/**
 * Exchange area by product quadrature of the point-to-point kernel over both polygons:
 *
 * <pre>  A_p F_pq ≈ Σ_a Σ_b w_a w_b cos θ_a cos θ_b / (π r_ab²) </pre>
 *
 * (definition of the configuration factor, Siegel &amp; Howell, 4th ed., eq. 4.13; Modest, 3rd ed.,
 * eq. 4.13), with the rules of {@link AreaRules} of the same order m on both polygons. The kernel is
 * analytic on two separated polygons, so the error falls roughly like (R/r)^{2m}; the measured
 * error and the orders used by distance are in {@link ProximityRule}. Unclipped facets use the
 * rules precomputed in the {@link FacetTable}; clipped polygons get rules built on the fly.
 */
final class AreaQuadrature implements PairMethod {

    private static final double INV_PI = 1.0 / Math.PI;
    private final FacetTable table;
    private final double[] scratchP;
    private final double[] scratchQ;

    AreaQuadrature(FacetTable table) {
        this.table = table;
        int max = Poly.RULE_SCRATCH;
        scratchP = new double[max];
        scratchQ = new double[max];
    }

    @Override
    public double exchangeArea(Poly p, Poly q, int order) {
        double[] rp, rq;
        int op, oq, np, nq;
        if (!p.clipped && order <= table.rules.maxOrder) {
            rp = table.rules.data[order];
            op = 4 * table.rules.start[order][p.facet];
            np = table.rules.start[order][p.facet + 1] - table.rules.start[order][p.facet];
        } else {
            rp = scratchP;
            op = 0;
            np = AreaRules.build(p, order, scratchP, 0);
        }
        if (!q.clipped && order <= table.rules.maxOrder) {
            rq = table.rules.data[order];
            oq = 4 * table.rules.start[order][q.facet];
            nq = table.rules.start[order][q.facet + 1] - table.rules.start[order][q.facet];
        } else {
            rq = scratchQ;
            oq = 0;
            nq = AreaRules.build(q, order, scratchQ, 0);
        }
        return kernelSum(rp, op, np, p.nx, p.ny, p.nz, rq, oq, nq, q.nx, q.ny, q.nz) * INV_PI;
    }

    /**
     * Σ_a Σ_b w_a w_b (n_p·d)(−n_q·d) / |d|⁴ with d = x_b − x_a, negative cosines clipped to 0.
     * Arrays not modified.
     */
    static double kernelSum(double[] rp, int op, int np, double pnx, double pny, double pnz,
            double[] rq, int oq, int nq, double qnx, double qny, double qnz) {
        double sum = 0;
        for (int a = 0; a < np; a++) {
            int ia = op + 4 * a;
            double x = rp[ia], y = rp[ia + 1], z = rp[ia + 2], wa = rp[ia + 3];
            double row = 0;
            for (int b = 0; b < nq; b++) {
                int ib = oq + 4 * b;
                double dx = rq[ib] - x, dy = rq[ib + 1] - y, dz = rq[ib + 2] - z;
                double ci = pnx * dx + pny * dy + pnz * dz;
                double cj = -(qnx * dx + qny * dy + qnz * dz);
                if (ci > 0 && cj > 0) {
                    double r2 = dx * dx + dy * dy + dz * dz;
                    row += rq[ib + 3] * ci * cj / (r2 * r2);
                }
            }
            sum += wa * row;
        }
        return sum;
    }
}
