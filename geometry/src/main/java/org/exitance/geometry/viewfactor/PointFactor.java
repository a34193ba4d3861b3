package org.exitance.geometry.viewfactor;

/**
 * View factor from a differential element to a planar polygon, in closed form (the contour
 * form for a differential area; Siegel &amp; Howell, <i>Thermal Radiation Heat Transfer</i>,
 * 4th ed., §4.3; Modest, <i>Radiative Heat Transfer</i>, 3rd ed., eq. 4.39):
 *
 * <pre>  F_{dx→A} = −(1/2π) Σ_k γ_k n_x · (a_k × a_{k+1}) / |a_k × a_{k+1}| </pre>
 *
 * with a_k the vectors from x to the vertices, γ_k ∈ [0, π] the angle between a_k and a_{k+1},
 * and the vertices counter-clockwise about the polygon's normal, which faces x (hence the
 * minus sign). Valid when the whole polygon is on or in front of the element's plane.
 */
final class PointFactor {

    private static final double INV_TWO_PI = 0.5 / Math.PI;

    private PointFactor() {
    }

    /**
     * @param x element position (m)
     * @param y element position (m)
     * @param z element position (m)
     * @param nx element unit normal
     * @param ny element unit normal
     * @param nz element unit normal
     * @param poly polygon (not modified)
     * @return the view factor from the element to the polygon
     */
    static double toPolygon(double x, double y, double z, double nx, double ny, double nz, Poly poly) {
        double sum = 0;
        int n = poly.n;
        double[] v = poly.xyz;
        double ax = v[3 * (n - 1)] - x, ay = v[3 * (n - 1) + 1] - y, az = v[3 * (n - 1) + 2] - z;
        for (int k = 0; k < n; k++) {
            double bx = v[3 * k] - x, by = v[3 * k + 1] - y, bz = v[3 * k + 2] - z;
            double cx = ay * bz - az * by, cy = az * bx - ax * bz, cz = ax * by - ay * bx;
            double len = Math.sqrt(cx * cx + cy * cy + cz * cz);
            if (len > 0) {
                double gamma = Math.atan2(len, ax * bx + ay * by + az * bz);
                sum += gamma * (nx * cx + ny * cy + nz * cz) / len;
            }
            ax = bx;
            ay = by;
            az = bz;
        }
        return -sum * INV_TWO_PI;
    }
}
