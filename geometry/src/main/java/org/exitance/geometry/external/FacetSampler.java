package org.exitance.geometry.external;

/**
 * Deterministic stratified points on a planar convex facet, each the centre of a cell of equal
 * parameter measure (the midpoint rule on a stratification; no randomness):
 * <ul>
 *   <li>quadrilaterals: the bilinear map of the unit square cut into m × m cells, a point at each
 *       cell centre with weight = Jacobian there / m² (exact area sum: the Jacobian of a planar
 *       bilinear map is affine);</li>
 *   <li>triangles: the m² congruent sub-triangles of the regular subdivision, a point at each
 *       sub-triangle's centroid, weight = area / m²;</li>
 *   <li>other polygons: a fan of triangles about vertex 0, each subdivided as above.</li>
 * </ul>
 * Points are stored as (x, y, z, w), w in m². The weights sum to the facet area.
 */
final class FacetSampler {

    private FacetSampler() {
    }

    /** @return number of points of order m on an n-gon */
    static int pointCount(int n, int m) {
        return n == 4 ? m * m : (n - 2) * m * m;
    }

    /**
     * @param t packed facets (not modified)
     * @param f facet index
     * @param m order (cells per direction), ≥ 1
     * @param out destination; modified at [0, 4 · pointCount)
     * @return number of points written
     */
    static int sample(PackedFacets t, int f, int m, double[] out) {
        double[] v = t.xyz;
        int o = 3 * t.vertexStart[f];
        int n = t.vertexCount(f);
        double nx = t.normal[3 * f], ny = t.normal[3 * f + 1], nz = t.normal[3 * f + 2];
        int k = 0;
        if (n == 4) {
            double inv = 1.0 / m;
            for (int a = 0; a < m; a++) {
                double u = (a + 0.5) * inv;
                for (int b = 0; b < m; b++) {
                    double s = (b + 0.5) * inv;
                    double c0 = (1 - u) * (1 - s), c1 = u * (1 - s), c2 = u * s, c3 = (1 - u) * s;
                    double xu0 = (1 - s) * (v[o + 3] - v[o]) + s * (v[o + 6] - v[o + 9]);
                    double xu1 = (1 - s) * (v[o + 4] - v[o + 1]) + s * (v[o + 7] - v[o + 10]);
                    double xu2 = (1 - s) * (v[o + 5] - v[o + 2]) + s * (v[o + 8] - v[o + 11]);
                    double xv0 = (1 - u) * (v[o + 9] - v[o]) + u * (v[o + 6] - v[o + 3]);
                    double xv1 = (1 - u) * (v[o + 10] - v[o + 1]) + u * (v[o + 7] - v[o + 4]);
                    double xv2 = (1 - u) * (v[o + 11] - v[o + 2]) + u * (v[o + 8] - v[o + 5]);
                    double jac = (xu1 * xv2 - xu2 * xv1) * nx + (xu2 * xv0 - xu0 * xv2) * ny + (xu0 * xv1 - xu1 * xv0) * nz;
                    int p = 4 * k++;
                    out[p] = c0 * v[o] + c1 * v[o + 3] + c2 * v[o + 6] + c3 * v[o + 9];
                    out[p + 1] = c0 * v[o + 1] + c1 * v[o + 4] + c2 * v[o + 7] + c3 * v[o + 10];
                    out[p + 2] = c0 * v[o + 2] + c1 * v[o + 5] + c2 * v[o + 8] + c3 * v[o + 11];
                    out[p + 3] = jac * inv * inv;
                }
            }
            return k;
        }
        for (int t3 = 1; t3 + 1 < n; t3++) {
            int ia = o, ib = o + 3 * t3, ic = o + 3 * t3 + 3;
            double ux = v[ib] - v[ia], uy = v[ib + 1] - v[ia + 1], uz = v[ib + 2] - v[ia + 2];
            double wx = v[ic] - v[ia], wy = v[ic + 1] - v[ia + 1], wz = v[ic + 2] - v[ia + 2];
            double w = 0.5 * ((uy * wz - uz * wy) * nx + (uz * wx - ux * wz) * ny + (ux * wy - uy * wx) * nz) / ((double) m * m);
            for (int i = 0; i < m; i++) {
                for (int j = 0; i + j < m; j++) {
                    k = put(out, k, v, ia, ux, uy, uz, wx, wy, wz, (i + 1.0 / 3) / m, (j + 1.0 / 3) / m, w);
                    if (i + j <= m - 2) {
                        k = put(out, k, v, ia, ux, uy, uz, wx, wy, wz, (i + 2.0 / 3) / m, (j + 2.0 / 3) / m, w);
                    }
                }
            }
        }
        return k;
    }

    private static int put(double[] out, int k, double[] v, int ia, double ux, double uy, double uz,
            double wx, double wy, double wz, double a, double b, double w) {
        int p = 4 * k;
        out[p] = v[ia] + a * ux + b * wx;
        out[p + 1] = v[ia + 1] + a * uy + b * wy;
        out[p + 2] = v[ia + 2] + a * uz + b * wz;
        out[p + 3] = w;
        return k + 1;
    }
}
