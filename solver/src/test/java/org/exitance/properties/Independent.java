package org.exitance.properties;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * Reference computations for the property tests that share no code with the program: Planck's
 * law written from h, c, k in SI units (CODATA 2018 exact values), piecewise-linear tables by
 * Apache Commons Math's {@link LinearInterpolator}, and integrals by Commons Math Gauss–Legendre
 * rules with adaptive bisection.
 */
final class Independent {
    static final double H = 6.62607015e-34;
    static final double C = 299792458;
    static final double K = 1.380649e-23;

    private static final GaussIntegratorFactory GAUSS = new GaussIntegratorFactory();

    private Independent() {
    }

    /** E_bλ in W/(m²·µm): 2πhc²/(λ⁵(exp(hc/(λkT)) − 1)) with λ in m (Incropera 6th ed. Sec. 12.3). */
    static double planck(double lambdaUm, double t) {
        double l = lambdaUm * 1e-6;
        double x = H * C / (l * K * t);
        if (x > 700) {
            return 0.0;
        }
        return 2 * Math.PI * H * C * C / (Math.pow(l, 5) * Math.expm1(x)) * 1e-6;
    }

    /** A piecewise-linear function through the points, holding the end values outside them. */
    static DoubleUnaryOperator heldTable(double[] x, double[] y) {
        PolynomialSplineFunction f = new LinearInterpolator().interpolate(x, y);
        double lo = x[0];
        double hi = x[x.length - 1];
        return l -> l <= lo ? y[0] : l >= hi ? y[y.length - 1] : f.value(l);
    }

    /** A piecewise-linear function through the points, zero outside them. */
    static DoubleUnaryOperator zeroOutside(double[] x, double[] y) {
        PolynomialSplineFunction f = new LinearInterpolator().interpolate(x, y);
        double lo = x[0];
        double hi = x[x.length - 1];
        return l -> l < lo || l > hi ? 0.0 : f.value(l);
    }

    /**
     * ∫ f(λ) dλ from a to b (µm), integrated in u = ln λ, with panels split at every kink so each
     * panel holds a smooth integrand; on each panel 24- and 32-point Gauss–Legendre rules are
     * compared and the panel is bisected until they agree to 1e-13 relative.
     */
    static double integrate(DoubleUnaryOperator f, double a, double b, double... kinks) {
        return integrate(1e-13, 0.0, f, a, b, kinks);
    }

    /**
     * As {@link #integrate(DoubleUnaryOperator, double, double, double...)}, a panel being accepted when its two
     * rules differ by at most relTol·|value| + absTol (absTol in the integral's units).
     */
    static double integrate(double relTol, double absTol, DoubleUnaryOperator f, double a, double b, double... kinks) {
        double[] edges = Arrays.stream(kinks).filter(k -> k > a && k < b).sorted().toArray();
        double[] all = new double[edges.length + 2];
        all[0] = a;
        System.arraycopy(edges, 0, all, 1, edges.length);
        all[all.length - 1] = b;
        double sum = 0;
        for (int i = 0; i + 1 < all.length; i++) {
            double u0 = Math.log(all[i]);
            double u1 = Math.log(all[i + 1]);
            int panels = Math.max(1, (int) Math.ceil((u1 - u0) * 8));
            for (int p = 0; p < panels; p++) {
                double lo = u0 + (u1 - u0) * p / panels;
                double hi = p == panels - 1 ? u1 : u0 + (u1 - u0) * (p + 1) / panels;
                sum += adaptive(u -> f.applyAsDouble(Math.exp(u)) * Math.exp(u), lo, hi, relTol, absTol, 0);
            }
        }
        return sum;
    }

    private static double adaptive(DoubleUnaryOperator g, double lo, double hi, double relTol, double absTol, int depth) {
        double coarse = GAUSS.legendreHighPrecision(24, lo, hi).integrate(g::applyAsDouble);
        double fine = GAUSS.legendreHighPrecision(32, lo, hi).integrate(g::applyAsDouble);
        if (Math.abs(fine - coarse) <= relTol * Math.abs(fine) + absTol || Math.abs(fine - coarse) < 1e-300) {
            return fine;
        }
        if (depth > 40) {
            throw new IllegalStateException("reference quadrature did not converge on [" + lo + ", " + hi + "]");
        }
        double mid = 0.5 * (lo + hi);
        return adaptive(g, lo, mid, relTol, absTol, depth + 1) + adaptive(g, mid, hi, relTol, absTol, depth + 1);
    }
}
