package org.exitance.timeline;

/**
 * The local error of a BDF2 step by Milne's device: the difference between the corrector and
 * the quadratic extrapolation of the three previous points, times
 * {@code κ = D / (D + P)}, where, for a smooth solution with third derivative y‴,
 * {@code D = y‴/6 · h²(h+h₁)²/(2h+h₁)} is the BDF2 error and
 * {@code P = y‴/6 · h(h+h₁)(h+h₁+h₂)} the extrapolation's (h the step, h₁ and h₂ the two before;
 * for equal steps κ = 2/11; Hairer, Nørsett and Wanner, Solving ODEs I, 2nd ed., §III.7, the
 * error of the interpolation polynomial). With only two previous points (the step after a
 * restart) the linear extrapolation is used with κ = 1, which overestimates the error (its
 * difference is of lower order) and so only keeps the step small.
 */
final class ErrorEstimate {
    private ErrorEstimate() {
    }

    /**
     * The largest estimated local error (K).
     *
     * @param y   the new values; not modified
     * @param y0  the values at the last point (time t0); not modified
     * @param y1  at the point before (t1), or null; not modified
     * @param y2  at the one before that (t2), or null; not modified
     */
    static double of(double[] y, double t, double[] y0, double t0, double[] y1, double t1, double[] y2, double t2) {
        double h = t - t0;
        if (y1 == null) {
            return 0;
        }
        double h1 = t0 - t1;
        double worst = 0;
        if (y2 == null || y2.length != y.length) {
            for (int i = 0; i < y.length; i++) {
                double pred = y0[i] + (y0[i] - y1[i]) * h / h1;
                worst = Math.max(worst, Math.abs(y[i] - pred));
            }
            return worst;
        }
        double h2 = t1 - t2;
        // Lagrange weights of the extrapolation to t through t0, t1, t2
        double l0 = (t - t1) * (t - t2) / ((t0 - t1) * (t0 - t2));
        double l1 = (t - t0) * (t - t2) / ((t1 - t0) * (t1 - t2));
        double l2 = (t - t0) * (t - t1) / ((t2 - t0) * (t2 - t1));
        double d = h * h * (h + h1) * (h + h1) / (2 * h + h1);
        double p = h * (h + h1) * (h + h1 + h2);
        double kappa = d / (d + p);
        for (int i = 0; i < y.length; i++) {
            double pred = l0 * y0[i] + l1 * y1[i] + l2 * y2[i];
            worst = Math.max(worst, kappa * Math.abs(y[i] - pred));
        }
        return worst;
    }
}
