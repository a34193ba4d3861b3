package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/**
 * The closed-form arc integral against Apache Commons Math's adaptive Gauss–Legendre on the
 * same integrand (a general-purpose library as the reference), for kernels that come from real
 * geometry: a point x with a unit normal, a circle of radius ρ about the z axis in the plane
 * z = 0, the circle's normal n_r e_r + n_a e_z, x at a distance from the circle between 0.05 ρ and
 * 3 ρ (closer than that the callers integrate numerically).
 */
class ArcIntegralTest {

    @Test
    void closedFormAgreesWithAdaptiveGaussOnGeometricKernels() {
        SplittableRandom rnd = new SplittableRandom(11);
        int checked = 0;
        for (int k = 0; k < 200 && checked < 60; k++) {
            double rho = rnd.nextDouble(0.2, 2);
            double px = rnd.nextDouble(-3, 3), py = rnd.nextDouble(-3, 3), pz = rnd.nextDouble(-2, 2);
            double perp = Math.hypot(px, py), amr = pz * pz + (perp - rho) * (perp - rho);
            if (Math.sqrt(amr) < 0.05 * rho || Math.sqrt(amr) > 3 * rho) {
                continue;
            }
            double[] n = unit(rnd);
            double beta = rnd.nextDouble(0, Math.PI), nr = Math.sin(beta), na = Math.cos(beta);
            // w = c − x with c at the origin; the sinusoids exactly as PartialPairs forms them
            double wx = -px, wy = -py, wz = -pz;
            double a1 = n[0] * wx + n[1] * wy + n[2] * wz, b1 = rho * n[0], g1 = rho * n[1];
            double a2 = -nr * rho - na * wz, b2 = -nr * wx, g2 = -nr * wy;
            double a3 = wx * wx + wy * wy + wz * wz + rho * rho, b3 = 2 * rho * wx, g3 = 2 * rho * wy;
            if (!(Math.hypot(b3, g3) > ArcIntegral.SMALL_AMPLITUDE * a3)) {
                continue;
            }
            double lo = rnd.nextDouble(-4, 4), hi = lo + rnd.nextDouble(0.05, 2 * Math.PI);
            double expected = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-14).integrate(Integer.MAX_VALUE, t -> {
                double c = Math.cos(t), s = Math.sin(t), w = a3 + b3 * c + g3 * s;
                return (a1 + b1 * c + g1 * s) * (a2 + b2 * c + g2 * s) / (w * w);
            }, lo, hi);
            double closed = ArcIntegral.closed(a1, b1, g1, a2, b2, g2, a3, b3, g3, amr, lo, hi);
            double scale = Math.abs(expected) + (hi - lo) * Math.hypot(a1, Math.hypot(b1, g1))
                    * Math.hypot(a2, Math.hypot(b2, g2)) / (amr * amr);
            assertThat(closed).as("case %d", k).isCloseTo(expected, within(1e-9 * scale));
            checked++;
        }
        assertThat(checked).isGreaterThanOrEqualTo(40);
    }

    /** A check that can fail: a wrong numerator coefficient moves the closed form off the reference. */
    @Test
    void aPerturbedCoefficientIsNoticed() {
        double rho = 1, px = 1.8, py = 0.4, pz = 0.7;
        double wx = -px, wy = -py, wz = -pz, perp = Math.hypot(px, py), amr = pz * pz + (perp - rho) * (perp - rho);
        double a1 = 0.3, b1 = 0.2, g1 = -0.1, a2 = 0.9, b2 = -0.4, g2 = 0.25;
        double a3 = wx * wx + wy * wy + wz * wz + rho * rho, b3 = 2 * rho * wx, g3 = 2 * rho * wy;
        double good = ArcIntegral.closed(a1, b1, g1, a2, b2, g2, a3, b3, g3, amr, 0, 2);
        double bad = ArcIntegral.closed(a1, b1 * 1.001, g1, a2, b2, g2, a3, b3, g3, amr, 0, 2);
        double expected = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-14).integrate(Integer.MAX_VALUE, t -> {
            double c = Math.cos(t), s = Math.sin(t), w = a3 + b3 * c + g3 * s;
            return (a1 + b1 * c + g1 * s) * (a2 + b2 * c + g2 * s) / (w * w);
        }, 0, 2);
        assertThat(good).isCloseTo(expected, within(1e-10));
        assertThat(Math.abs(bad - expected)).isGreaterThan(1e-6);
    }

    private static double[] unit(SplittableRandom rnd) {
        double x = rnd.nextGaussian(), y = rnd.nextGaussian(), z = rnd.nextGaussian(), l = Math.sqrt(x * x + y * y + z * z);
        return new double[] {x / l, y / l, z / l};
    }
}
