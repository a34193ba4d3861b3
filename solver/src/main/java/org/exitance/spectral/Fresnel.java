package org.exitance.spectral;

/**
 * Directional and hemispherical emissivity of a smooth, optically thick surface from Fresnel's
 * equations, for a complex refractive index n − ik seen from a non-absorbing medium of index 1
 * (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §3.5; Modest, Radiative Heat
 * Transfer, 3rd ed., §3.4, Eqs. 3.59–3.60 for the absorbing medium in the p, q form):
 *
 * <pre>
 *   a = n² − k² − sin²θ,  p² = ½(√(a² + 4n²k²) + a),  q² = ½(√(a² + 4n²k²) − a)
 *   ρ⊥ = ((cos θ − p)² + q²) / ((cos θ + p)² + q²)
 *   ρ∥ = ρ⊥ ((p − sin θ tan θ)² + q²) / ((p + sin θ tan θ)² + q²)
 *   ε'(θ) = 1 − (ρ⊥ + ρ∥)/2,   ε = 2 ∫₀^{π/2} ε'(θ) sin θ cos θ dθ
 * </pre>
 *
 * The hemispherical integral uses a composite 20-point Gauss–Legendre rule on {@value #PANELS}
 * panels: the grazing peak of metals is resolved to about 1e-12.
 */
public final class Fresnel {
    static final int PANELS = 64;
    private static final double[][] RULE = GaussLegendre.rule(20);
    private static final double[] X = RULE[0];
    private static final double[] W = RULE[1];

    private Fresnel() {
    }

    /**
     * Directional emissivity ε'(θ) for the index n − ik.
     *
     * @param n      real part of the refractive index, &gt; 0
     * @param k      extinction index, ≥ 0 (0 for a dielectric)
     * @param theta  polar angle from the normal, in [0, π/2] (rad)
     */
    public static double directional(double n, double k, double theta) {
        double s = Math.sin(theta);
        double c = Math.cos(theta);
        double a = n * n - k * k - s * s;
        double r = Math.sqrt(a * a + 4 * n * n * k * k);
        double p = Math.sqrt(Math.max(0, 0.5 * (r + a)));
        double q = Math.sqrt(Math.max(0, 0.5 * (r - a)));
        double perp = ((c - p) * (c - p) + q * q) / ((c + p) * (c + p) + q * q);
        if (c <= 0) {
            return 0; // grazing: everything is reflected
        }
        double st = s * s / c;
        double par = perp * ((p - st) * (p - st) + q * q) / ((p + st) * (p + st) + q * q);
        return 1 - 0.5 * (perp + par);
    }

    /** Normal emissivity 1 − ((n − 1)² + k²)/((n + 1)² + k²). */
    public static double normal(double n, double k) {
        return 4 * n / ((n + 1) * (n + 1) + k * k);
    }

    /** Hemispherical emissivity 2 ∫ ε'(θ) sin θ cos θ dθ for the index n − ik. */
    public static double hemispherical(double n, double k) {
        double sum = 0;
        double h = 0.5 * Math.PI / PANELS;
        for (int panel = 0; panel < PANELS; panel++) {
            double mid = (panel + 0.5) * h;
            for (int g = 0; g < X.length; g++) {
                double t = mid + 0.5 * h * X[g];
                sum += W[g] * directional(n, k, t) * Math.sin(2 * t);
            }
        }
        return 0.5 * h * sum;
    }

    /**
     * The index of a dielectric (k = 0) with this normal emissivity: from √ρ_n = (n − 1)/(n + 1),
     * the root n ≥ 1.
     *
     * @param normalEmissivity  in (0, 1]
     */
    public static double dielectricIndex(double normalEmissivity) {
        double root = Math.sqrt(Math.max(0, 1 - normalEmissivity));
        return (1 + root) / (1 - root);
    }

    /**
     * The index n of a metal with n = k (the Hagen–Rubens regime of good conductors in the
     * infrared; Siegel &amp; Howell, 5th ed., §3.5; common practice) with this normal emissivity:
     * the larger root of ε_n = 4n / (2n² + 2n + 1).
     *
     * @param normalEmissivity  in (0, 1)
     */
    public static double metalIndex(double normalEmissivity) {
        double e = normalEmissivity;
        double b = 4 - 2 * e;
        return (b + Math.sqrt(Math.max(0, b * b - 8 * e * e))) / (4 * e);
    }
}
