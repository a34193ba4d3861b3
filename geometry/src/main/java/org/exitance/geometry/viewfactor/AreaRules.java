package org.exitance.geometry.viewfactor;

/**
 * Area quadrature rules on planar convex polygons, built from Gauss–Legendre products:
 * <ul>
 *   <li>order 1: the centroid with weight = area (exact for linear integrands);</li>
 *   <li>triangles: the collapsed (Duffy) product rule, x = (1−u)A + u((1−v)B + vC),
 *       Jacobian 2·area·u, m × m points (Stroud, <i>Approximate Calculation of Multiple
 *       Integrals</i>, 1971, product rules on the simplex);</li>
 *   <li>quadrilaterals: the bilinear map of the unit square, m × m points;</li>
 *   <li>other polygons: a fan of triangles about vertex 0, each with the triangle rule.</li>
 * </ul>
 * Each point is stored as (x, y, z, w) with w in m². Rules for orders 1..maxOrder are
 * precomputed for every facet of a {@link FacetTable}.
 */
final class AreaRules {

    final int maxOrder;
    /** start[m][f]: first point index of facet f's order-m rule; start[m][count] = total. */
    final int[][] start;
    /** data[m]: packed (x, y, z, w) for all facets' order-m rules. */
    final double[][] data;

    AreaRules(FacetTable t, int maxOrder) {
        this.maxOrder = maxOrder;
        start = new int[maxOrder + 1][];
        data = new double[maxOrder + 1][];
        Poly p = new Poly();
        for (int m = 1; m <= maxOrder; m++) {
            start[m] = new int[t.count + 1];
            for (int f = 0; f < t.count; f++) {
                start[m][f + 1] = start[m][f] + pointCount(t.vertexCount(f), m);
            }
            data[m] = new double[4 * start[m][t.count]];
            for (int f = 0; f < t.count; f++) {
                p.load(t, f);
                build(p, m, data[m], 4 * start[m][f]);
            }
        }
    }

    /** @return the number of points of the order-m rule on an n-gon */
    static int pointCount(int n, int m) {
        if (m == 1) {
            return 1;
        }
        return n == 4 ? m * m : (n - 2) * m * m;
    }

    /**
     * Writes the order-m rule of polygon p into {@code out} from index {@code off}.
     *
     * @param p polygon (not modified)
     * @param m order (points per direction)
     * @param out destination; modified at [off, off + 4·pointCount)
     * @param off first index
     * @return number of points written
     */
    static int build(Poly p, int m, double[] out, int off) {
        return build(p, m, out, off, null);
    }

    /**
     * Stratified (jittered) variant: the m × m cells of the parameter square each get one point at
     * a uniformly random position, weight = cell size × Jacobian. Unbiased for any integrand;
     * used for visibility so that sampling errors of neighbouring pairs do not add up coherently.
     *
     * @param rnd random source (advanced); null for the Gauss–Legendre rule
     */
    static int build(Poly p, int m, double[] out, int off, java.util.SplittableRandom rnd) {
        double[] v = p.xyz;
        if (m == 1) {
            out[off] = p.cx;
            out[off + 1] = p.cy;
            out[off + 2] = p.cz;
            out[off + 3] = p.area;
            return 1;
        }
        double[] g = GaussLegendre.nodes(m), w = GaussLegendre.weights(m);
        if (rnd != null) {
            g = new double[2 * m * m];
            w = new double[m];
            java.util.Arrays.fill(w, 1.0 / m);
        }
        int k = 0;
        if (p.n == 4) {
            for (int a = 0; a < m; a++) {
                for (int b = 0; b < m; b++) {
                    double u = rnd == null ? g[a] : (a + rnd.nextDouble()) / m;
                    double s = rnd == null ? g[b] : (b + rnd.nextDouble()) / m;
                    double c0 = (1 - u) * (1 - s), c1 = u * (1 - s), c2 = u * s, c3 = (1 - u) * s;
                    double xu0 = (1 - s) * (v[3] - v[0]) + s * (v[6] - v[9]);
                    double xu1 = (1 - s) * (v[4] - v[1]) + s * (v[7] - v[10]);
                    double xu2 = (1 - s) * (v[5] - v[2]) + s * (v[8] - v[11]);
                    double xv0 = (1 - u) * (v[9] - v[0]) + u * (v[6] - v[3]);
                    double xv1 = (1 - u) * (v[10] - v[1]) + u * (v[7] - v[4]);
                    double xv2 = (1 - u) * (v[11] - v[2]) + u * (v[8] - v[5]);
                    double jac = (xu1 * xv2 - xu2 * xv1) * p.nx + (xu2 * xv0 - xu0 * xv2) * p.ny
                            + (xu0 * xv1 - xu1 * xv0) * p.nz;
                    int o = off + 4 * k++;
                    out[o] = c0 * v[0] + c1 * v[3] + c2 * v[6] + c3 * v[9];
                    out[o + 1] = c0 * v[1] + c1 * v[4] + c2 * v[7] + c3 * v[10];
                    out[o + 2] = c0 * v[2] + c1 * v[5] + c2 * v[8] + c3 * v[11];
                    out[o + 3] = w[a] * w[b] * jac;
                }
            }
            return k;
        }
        for (int t = 1; t + 1 < p.n; t++) {
            int ia = 0, ib = 3 * t, ic = 3 * t + 3;
            double ux = v[ib] - v[ia], uy = v[ib + 1] - v[ia + 1], uz = v[ib + 2] - v[ia + 2];
            double wx = v[ic] - v[ia], wy = v[ic + 1] - v[ia + 1], wz = v[ic + 2] - v[ia + 2];
            double twiceArea = (uy * wz - uz * wy) * p.nx + (uz * wx - ux * wz) * p.ny + (ux * wy - uy * wx) * p.nz;
            for (int a = 0; a < m; a++) {
                for (int b = 0; b < m; b++) {
                    double u = rnd == null ? g[a] : (a + rnd.nextDouble()) / m;
                    double s = rnd == null ? g[b] : (b + rnd.nextDouble()) / m;
                    double ca = 1 - u, cb = u * (1 - s), cc = u * s;
                    int o = off + 4 * k++;
                    out[o] = ca * v[ia] + cb * v[ib] + cc * v[ic];
                    out[o + 1] = ca * v[ia + 1] + cb * v[ib + 1] + cc * v[ic + 1];
                    out[o + 2] = ca * v[ia + 2] + cb * v[ib + 2] + cc * v[ic + 2];
                    out[o + 3] = w[a] * w[b] * twiceArea * u;
                }
            }
        }
        return k;
    }
}
