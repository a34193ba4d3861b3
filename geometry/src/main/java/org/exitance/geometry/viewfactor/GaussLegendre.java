package org.exitance.geometry.viewfactor;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Gauss–Legendre rules mapped to [0, 1], taken from Apache Commons Math
 * ({@link GaussIntegratorFactory#legendreHighPrecision}) once and cached as primitive arrays.
 * An n-point rule integrates polynomials of degree 2n − 1 exactly (Abramowitz & Stegun 25.4.29).
 */
final class GaussLegendre {

    static final int MAX_POINTS = 32;
    private static final double[][] NODES = new double[MAX_POINTS + 1][];
    private static final double[][] WEIGHTS = new double[MAX_POINTS + 1][];

    static {
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        for (int n = 1; n <= MAX_POINTS; n++) {
            GaussIntegrator g = factory.legendreHighPrecision(n, 0, 1);
            NODES[n] = new double[n];
            WEIGHTS[n] = new double[n];
            for (int k = 0; k < n; k++) {
                NODES[n][k] = g.getPoint(k);
                WEIGHTS[n][k] = g.getWeight(k);
            }
        }
    }

    private GaussLegendre() {
    }

    /** @return the n nodes on [0, 1] (shared array: do not modify) */
    static double[] nodes(int n) {
        return NODES[n];
    }

    /** @return the n weights on [0, 1], summing to 1 (shared array: do not modify) */
    static double[] weights(int n) {
        return WEIGHTS[n];
    }
}
