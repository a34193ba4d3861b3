package org.exitance.geometry.viewfactor;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

class ScratchJTest {
    @Test
    void j() {
        IterativeLegendreGaussIntegrator in = new IterativeLegendreGaussIntegrator(20, 1e-13, 1e-14);
        for (double[] d : new double[][] {{1, 1, 0.5}, {1, 1, -0.5}, {2, 0.3, 0.2}, {0.3, 2, -0.9}}) {
            double a = d[0], b = d[1], c = d[2];
            double num = in.integrate(Integer.MAX_VALUE, s -> ContourIntegral.inner(s, 0, 0,
                    new double[] {0, 0, 0}, 0, c, Math.sqrt(1 - c * c), 0, b), 0, a);
            System.out.printf("a=%g b=%g c=%g J=%.15g num=%.15g%n", a, b, c, ContourIntegral.commonVertex(a, b, c), num / 2);
        }
    }
}
