package org.exitance.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Hemispherical emissivity from directional and normal data, against closed forms and Commons Math. */
class DirectionalEmissivityTest {
    private static final IterativeLegendreGaussIntegrator GAUSS = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15);

    /** ε' = ε_n cos θ gives ε = ⅔ ε_n (Siegel & Howell, 5th ed., §3.3; methods: common check). */
    @Test
    void aCosineDirectionalTableGivesTwoThirdsOfTheNormalValue() {
        int m = 91;
        double[] deg = new double[m];
        double[] e = new double[m];
        for (int i = 0; i < m; i++) {
            deg[i] = i;
            e[i] = 0.9 * Math.cos(Math.toRadians(i));
        }
        // linear interpolation between 1° samples of cos θ: error below 1e-4 (h²/8 × max|ε''|)
        assertThat(DirectionalEmissivity.hemispherical(deg, e)).isCloseTo(0.6, within(1e-4));
    }

    /** The piecewise-linear integral is exact: any table against Commons Math quadrature of 2∫ε' sinθ cosθ dθ. */
    @Test
    void tablesIntegrateExactlyAgainstIndependentQuadrature() {
        Random r = new Random(11);
        for (int trial = 0; trial < 20; trial++) {
            int m = 2 + r.nextInt(6);
            double[] deg = new double[m];
            double[] e = new double[m];
            double t = 0;
            for (int i = 0; i < m; i++) {
                t += 1 + r.nextDouble() * (85.0 / m);
                deg[i] = Math.min(t, 90);
                e[i] = r.nextDouble();
            }
            if (deg[m - 1] == deg[Math.max(0, m - 2)]) {
                continue;
            }
            java.util.function.DoubleUnaryOperator f = th -> {
                double d = Math.toDegrees(th);
                if (d <= deg[0]) {
                    return e[0];
                }
                for (int i = 1; i < m; i++) {
                    if (d <= deg[i]) {
                        return e[i - 1] + (e[i] - e[i - 1]) * (d - deg[i - 1]) / (deg[i] - deg[i - 1]);
                    }
                }
                return e[m - 1];
            };
            double ref = 0;
            double[] cuts = new double[m + 2];
            cuts[0] = 0;
            for (int i = 0; i < m; i++) {
                cuts[i + 1] = Math.toRadians(deg[i]);
            }
            cuts[m + 1] = Math.PI / 2;
            for (int i = 0; i + 1 < cuts.length; i++) {
                if (cuts[i + 1] > cuts[i]) {
                    ref += GAUSS.integrate(100000, x -> 2 * f.applyAsDouble(x) * Math.sin(x) * Math.cos(x), cuts[i], cuts[i + 1]);
                }
            }
            assertThat(DirectionalEmissivity.hemispherical(deg, e)).isCloseTo(ref, within(1e-12));
        }
    }

    /**
     * A smooth dielectric against Dunkle's closed form for the hemispherical emissivity of a
     * non-absorbing dielectric (Siegel &amp; Howell, 5th ed., §3.5, from Dunkle; recalled from memory and
     * checked here against the Fresnel integral).
     */
    @ParameterizedTest
    @ValueSource(doubles = {1.2, 1.5, 2.0, 3.0, 5.0})
    void aSmoothDielectricMatchesDunklesClosedForm(double n) {
        double dunkle = 0.5 - (3 * n + 1) * (n - 1) / (6 * (n + 1) * (n + 1))
                - n * n * Math.pow(n * n - 1, 2) / Math.pow(n * n + 1, 3) * Math.log((n - 1) / (n + 1))
                + 2 * Math.pow(n, 3) * (n * n + 2 * n - 1) / ((n * n + 1) * (Math.pow(n, 4) - 1))
                - 8 * Math.pow(n, 4) * (Math.pow(n, 4) + 1) / ((n * n + 1) * Math.pow(Math.pow(n, 4) - 1, 2)) * Math.log(n);
        assertThat(Fresnel.hemispherical(n, 0)).isCloseTo(dunkle, within(1e-11));
        double en = 4 * n / ((n + 1) * (n + 1)); // normal emissivity of a dielectric (Fresnel at θ = 0)
        assertThat(DirectionalEmissivity.fromNormal(en, DirectionalEmissivity.Conversion.DIELECTRIC))
                .isCloseTo(dunkle, within(1e-10));
    }

    /** At Brewster's angle tan θ = n the parallel reflectivity vanishes (Fresnel; Modest, 3rd ed., §3.4). */
    @Test
    void atBrewstersAngleOnlyThePerpendicularComponentIsReflected() {
        double n = 1.7;
        double tb = Math.atan(n);
        double c = Math.cos(tb);
        double p = Math.sqrt(n * n - Math.sin(tb) * Math.sin(tb));
        double perp = Math.pow((c - p) / (c + p), 2);
        assertThat(Fresnel.directional(n, 0, tb)).isCloseTo(1 - perp / 2, within(1e-14));
    }

    /**
     * A metal (n = k) from its normal emittance: the quadrature against Commons Math's, and the
     * ratio ε/ε_n inside the usual 1.0–1.3 for metals (common practice).
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.02, 0.05, 0.1, 0.2, 0.4})
    void aMetalsHemisphericalEmissivityExceedsItsNormalOne(double en) {
        double n = Fresnel.metalIndex(en);
        assertThat(Fresnel.normal(n, n)).isCloseTo(en, within(1e-14));
        double ref = GAUSS.integrate(1000000, t -> 2 * Fresnel.directional(n, n, t) * Math.sin(t) * Math.cos(t), 0, Math.PI / 2);
        double h = DirectionalEmissivity.fromNormal(en, DirectionalEmissivity.Conversion.METAL);
        assertThat(h).isCloseTo(ref, within(1e-10));
        assertThat(h / en).isBetween(1.0, 1.32);
    }

    @Test
    void aMetalAboveItsLimitIsRefused() {
        assertThatThrownBy(() -> DirectionalEmissivity.fromNormal(0.9, DirectionalEmissivity.Conversion.METAL))
                .hasMessageContaining("at most 0.8284");
    }
}
