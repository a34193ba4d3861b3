package org.exitance.spectral;

/**
 * Gauss–Legendre rules on [−1, 1]: nodes by Newton's method on the Legendre polynomial P_n
 * (three-term recurrence), weights 2/((1 − x²) P_n'(x)²) (Abramowitz &amp; Stegun, Handbook of
 * Mathematical Functions, §25.4.29). Exact for polynomials of degree 2n − 1.
 */
final class GaussLegendre {
    private GaussLegendre() {
    }

    /**
     * The n-point rule.
     *
     * @return {nodes, weights}, two new arrays of length n
     */
    static double[][] rule(int n) {
        double[] xs = new double[n];
        double[] ws = new double[n];
        for (int i = 0; i < n; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double dp = 0;
            for (int it = 0; it < 100; it++) {
                double p0 = 1.0;
                double p1 = x;
                for (int k = 2; k <= n; k++) {
                    double p2 = ((2.0 * k - 1.0) * x * p1 - (k - 1.0) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                dp = n * (x * p1 - p0) / (x * x - 1.0);
                double dx = p1 / dp;
                x -= dx;
                if (Math.abs(dx) < 1e-16) {
                    break;
                }
            }
            xs[i] = x;
            ws[i] = 2.0 / ((1.0 - x * x) * dp * dp);
        }
        return new double[][] {xs, ws};
    }
}
