package org.exitance.network;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The two linear strategies solve the same radiosity system; conjugate gradients is checked
 * against LU (EJML), which serves as the general-purpose library reference.
 */
class RadiositySolversTest {

    /** Random reciprocal closed enclosure: F_ij = S_ij / A_i with S symmetric. */
    private static double[][] enclosure(Random r, int n, double[] area) {
        double[][] s = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                s[i][j] = s[j][i] = r.nextDouble();
            }
        }
        double[][] f = new double[n][n];
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int j = 0; j < n; j++) {
                sum += s[i][j];
            }
            area[i] = sum;
            for (int j = 0; j < n; j++) {
                f[i][j] = s[i][j] / sum;
            }
        }
        return f;
    }

    @ParameterizedTest
    @ValueSource(ints = {2, 7, 40, 150})
    void conjugateGradientsAgreesWithLu(int n) {
        Random r = new Random(n);
        double[] area = new double[n];
        double[][] f2 = enclosure(r, n, area);
        double[] f = new double[n * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(f2[i], 0, f, i * n, n);
        }
        double[] rho = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            rho[i] = i % 5 == 0 ? 0.0 : 0.97 * r.nextDouble(); // some black rows, some highly reflective
            b[i] = 1000 * r.nextDouble();
        }
        double[] lu = new double[n];
        double[] cg = new double[n];
        new DirectRadiositySolver().prepare(f, n, rho, area).solve(b, lu);
        RadiositySolver.Prepared p = new ConjugateGradientRadiositySolver(1e-13, 10_000).prepare(f, n, rho, area);
        p.solve(b, cg);
        for (int i = 0; i < n; i++) {
            assertThat(cg[i]).isCloseTo(lu[i], within(1e-9 * Math.max(1, Math.abs(lu[i]))));
        }
        // the stopping rule bounds surface i's residual by 1e-13 (|b_i| + |J_i|) (class doc of the solver)
        double maxB = 0;
        double maxJ = 0;
        for (int i = 0; i < n; i++) {
            maxB = Math.max(maxB, Math.abs(b[i]));
            maxJ = Math.max(maxJ, Math.abs(lu[i]));
        }
        assertThat(p.lastRelativeResidual()).isLessThanOrEqualTo(1e-13 * (1 + maxJ / maxB));
    }

    @ParameterizedTest
    @ValueSource(ints = {3, 25})
    void fluxSensitivityMatchesAFiniteDifference(int n) {
        Random r = new Random(100 + n);
        double[] area = new double[n];
        double[][] f2 = enclosure(r, n, area);
        double[] f = new double[n * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(f2[i], 0, f, i * n, n);
        }
        double[] eps = new double[n];
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            eps[i] = 0.1 + 0.8 * r.nextDouble();
            e[i] = 1e4 * r.nextDouble();
        }
        BandNetwork net = new BandNetwork(f, n, area, eps, new double[n], new double[n], new DirectRadiositySolver());
        int k = n / 2;
        double[] sens = net.fluxSensitivity(k);
        double h = 1.0;
        double[] up = e.clone();
        up[k] += h;
        double[] dn = e.clone();
        dn[k] -= h;
        double[] qUp = net.solve(up).netFlux();
        double[] qDn = net.solve(dn).netFlux();
        for (int i = 0; i < n; i++) {
            // the network is linear in E, so the central difference is exact to round-off
            assertThat(sens[i]).isCloseTo((qUp[i] - qDn[i]) / (2 * h), within(1e-9));
        }
    }

    /**
     * Nearly perfectly reflecting closed enclosure (ρ = 0.999 and 0.9999 everywhere): conjugate
     * gradients still agree with LU, and the coarse correction on the constant radiosity keeps the
     * iteration count far below plain Jacobi's ~ln(tol)/ln(ρ) (about 30,000 sweeps at ρ = 0.999 and
     * tol 1e-13; methods: highly reflective enclosures converge slowly).
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.999, 0.9999})
    void conjugateGradientsConvergeWhenNearlyEverythingIsReflected(double reflectivity) {
        int n = 120;
        Random r = new Random(7);
        double[] area = new double[n];
        double[][] f2 = enclosure(r, n, area);
        double[] f = new double[n * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(f2[i], 0, f, i * n, n);
        }
        double[] rho = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            rho[i] = reflectivity;
            b[i] = (1 - reflectivity) * 1000 * r.nextDouble();
        }
        double[] lu = new double[n];
        double[] cg = new double[n];
        new DirectRadiositySolver().prepare(f, n, rho, area).solve(b, lu);
        RadiositySolver.Prepared p = new ConjugateGradientRadiositySolver(1e-13, 10_000).prepare(f, n, rho, area);
        p.solve(b, cg);
        double scale = 0;
        for (double v : lu) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int i = 0; i < n; i++) {
            assertThat(cg[i]).isCloseTo(lu[i], within(1e-9 * scale));
        }
        assertThat(p.lastIterations()).isBetween(1, 100);
    }
}
