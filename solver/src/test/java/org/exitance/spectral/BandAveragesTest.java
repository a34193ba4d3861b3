package org.exitance.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

class BandAveragesTest {

    static final double INF = Double.POSITIVE_INFINITY;

    /** A made-up oxidised-metal-like table, ε falling with λ (values illustrative, not a material). */
    static final TabulatedEmissivity METAL = new TabulatedEmissivity(
            new double[] {0.3, 0.5, 1, 2, 4, 8, 15, 30},
            new double[] {0.8, 0.7, 0.55, 0.4, 0.3, 0.2, 0.15, 0.1});

    /** Step-like selective surface: 0.9 below 2 µm, 0.1 above, linear ramp 1.995–2.005 µm. */
    static final TabulatedEmissivity SELECTIVE = new TabulatedEmissivity(
            new double[] {1.995, 2.005}, new double[] {0.9, 0.1});

    /** Three tables with different node sets. */
    static final TemperatureTabulatedEmissivity T_TAB = new TemperatureTabulatedEmissivity(
            new double[] {300, 800, 1500},
            new TabulatedEmissivity[] {
                new TabulatedEmissivity(new double[] {0.5, 3, 10}, new double[] {0.3, 0.5, 0.9}),
                new TabulatedEmissivity(new double[] {1, 2, 6, 20}, new double[] {0.2, 0.6, 0.7, 0.95}),
                new TabulatedEmissivity(new double[] {0.4, 2.5}, new double[] {0.1, 0.8}),
            });

    static final double[][] BANDS = {
        {0, INF}, {0, 0.5}, {0.4, 1.3}, {1.3, 3}, {3, 10}, {10, INF}, {1.05, 1.06}, {2.0, 2.0005},
        {1.99, 2.01}, {0.1, 0.35}, {25, 40}, {0, 2}, {2, INF},
    };

    /** Compare with quadrature (Reference.bandMeanParts) or, for negligible bands, the fallback rule. */
    static double check(SpectralEmissivity e, double[] b, double tw, double tp) {
        double mean = BandAverages.planckMean(e, b[0], b[1], tw, tp);
        double fraction = Planck.bandFraction(b[0], b[1], tw);
        String what = String.format("%s band %s Tw=%s Tp=%s", e.getClass().getSimpleName(), Arrays.toString(b), tw, tp);
        if (fraction < BandAverages.NEGLIGIBLE_FRACTION) {
            double expected = b[1] == INF ? e.at(1e300, tp) : plainAverage(e, b[0], b[1], tp);
            assertThat(mean).as(what).isCloseTo(expected, within(1e-12));
            return 0;
        }
        double ref = Reference.bandMean(e, b[0], b[1], tw, tp);
        double rel = Math.abs(mean - ref) / ref;
        assertThat(rel).as(what + " mean " + mean + " ref " + ref).isLessThan(1e-10);
        return rel;
    }

    /** Independent plain λ-average by Commons Math quadrature, split at breakpoints. */
    static double plainAverage(SpectralEmissivity e, double l, double u, double tp) {
        double sum = 0;
        double x = l;
        double[] bp = e.breakpointsUm();
        for (int i = 0; i <= bp.length; i++) {
            double next = i < bp.length ? Math.min(bp[i], u) : u;
            if (next > x) {
                double from = x;
                sum += Reference.integrate(v -> e.at(v, tp), from, next, 1);
                x = next;
            }
        }
        return sum / (u - l);
    }

    @Test
    void tabulatedMeansMatchQuadrature() {
        double worst = 0;
        for (SpectralEmissivity e : new SpectralEmissivity[] {METAL, SELECTIVE}) {
            for (double tw : new double[] {300, 1000, 5800}) {
                for (double[] b : BANDS) {
                    worst = Math.max(worst, check(e, b, tw, 300));
                }
            }
        }
        System.out.printf("tabulated band means vs quadrature: worst relative error %.2e%n", worst);
    }

    @Test
    void temperatureTabulatedMeansMatchQuadrature() {
        double worst = 0;
        for (double tp : new double[] {250, 300, 500, 1200, 2000}) {
            for (double tw : new double[] {300, 1000, 5800}) {
                for (double[] b : BANDS) {
                    worst = Math.max(worst, check(T_TAB, b, tw, tp));
                }
            }
        }
        System.out.printf("T-tabulated band means vs quadrature: worst relative error %.2e%n", worst);
    }

    @Test
    void grayModelsReturnTheirValueExactly() {
        GrayEmissivity g = new GrayEmissivity(0.63);
        for (double[] b : BANDS) {
            assertThat(BandAverages.planckMean(g, b[0], b[1], 700, 400)).isEqualTo(0.63);
        }
        assertThat(BandAverages.totalEmissivity(g, 1234)).isEqualTo(0.63);
        assertThat(BandAverages.totalAbsorptivity(g, 300, 5800)).isEqualTo(0.63);
        // A spectrally flat table is gray too; the general path must agree to 1e-10 as well.
        TabulatedEmissivity flat = new TabulatedEmissivity(new double[] {1, 2, 5}, new double[] {0.4, 0.4, 0.4});
        assertThat(BandAverages.totalEmissivity(flat, 900)).isCloseTo(0.4, within(1e-10));
        SpectralEmissivity flatNonGray = new SpectralEmissivity() {
            public double at(double l, double t) { return 0.4; }
            public double[] breakpointsUm() { return new double[] {1, 2, 5}; }
            public boolean isGray() { return false; }
            public boolean dependsOnTemperature() { return false; }
        };
        for (double[] b : BANDS) {
            if (Planck.bandFraction(b[0], b[1], 900) > 1e-15) {
                assertThat(BandAverages.planckMean(flatNonGray, b[0], b[1], 900)).isCloseTo(0.4, within(1e-14));
            }
        }
    }

    @Test
    void selectiveSurfaceSolarAbsorptivityVersusThermalEmissivity() {
        double alphaSolar = BandAverages.totalAbsorptivity(SELECTIVE, 300, 5800);
        double eps300 = BandAverages.totalEmissivity(SELECTIVE, 300);
        double alphaRef = Reference.bandMean(SELECTIVE, 0, INF, 5800, 300);
        double epsRef = Reference.bandMean(SELECTIVE, 0, INF, 300, 300);
        System.out.printf("selective surface: α(5800 K source) = %.12f (ref %.12f), ε(300 K) = %.12f (ref %.12f)%n",
                alphaSolar, alphaRef, eps300, epsRef);
        assertThat(alphaSolar).isCloseTo(alphaRef, within(1e-10 * alphaRef));
        assertThat(eps300).isCloseTo(epsRef, within(1e-10 * epsRef));
        // Step idealisation (the textbook band-fraction calculation, Incropera 6th ed. Sec. 12.5): α ≈ 0.1 + 0.8 F(0→2 µm·5800 K).
        assertThat(alphaSolar).isCloseTo(0.1 + 0.8 * Planck.fractionBelow(2 * 5800), within(1e-3));
        assertThat(eps300).isCloseTo(0.1 + 0.8 * Planck.fractionBelow(2 * 300), within(1e-6));
        assertThat(alphaSolar).isBetween(0.84, 0.86);
        assertThat(eps300).isBetween(0.1, 0.1001);
    }

    @Test
    void tinyEnergyBandsStayPlanckWeighted() {
        // [0.1, 0.4] µm at 300 K: fraction ≈ e^{-120}, tiny but a normal double: the Planck weight,
        // steep towards long wavelengths, pulls the mean to ε near the upper edge, 0.75 at 0.4 µm
        // (METAL is linear 0.8 → 0.75 over [0.2, 0.4] µm, see above).
        // Laplace's method: with ζ = C2/(λT) the weight falls off below the upper edge like
        // exp(−k (0.4 − λ)), k = C2/(0.4² · 300) per µm, so the mean ≈ ε(0.4) + |dε/dλ| / k
        // with dε/dλ = −0.5 per µm (standard asymptotics; error O(1/k²)).
        double k = PhysicalConstants.C2_UM_K / (0.4 * 0.4 * 300);
        double avg = BandAverages.planckMean(METAL, 0.1, 0.4, 300);
        assertThat(avg).isCloseTo(0.75 + 0.5 / k, within(2e-5));
    }

    @Test
    void underflowingBandsFallBackWithoutNaN() {
        // Underflowing band (λT ≈ 0.3 µm·K): the blackbody integral is 0 in double precision.
        assertThat(BandAverages.planckMean(METAL, 1e-4, 1e-3, 300)).isCloseTo(0.8, within(1e-15));
    }

    @Test
    void bandsBeyondTheTableAverageTheHeldEndValue() {
        // Constant extrapolation beyond the last node: any weighting gives the held value.
        assertThat(BandAverages.planckMean(METAL, 1e6, INF, 5800)).isCloseTo(0.1, within(1e-15));
        assertThat(BandAverages.planckMean(T_TAB, 1e7, INF, 3000, 300)).isCloseTo(0.9, within(1e-15));
        // Extreme temperatures remain finite.
        assertThat(BandAverages.totalEmissivity(METAL, 1e-3)).isEqualTo(0.1);
        assertThat(BandAverages.totalEmissivity(METAL, 1e9)).isCloseTo(0.8, within(1e-12));
    }

    @Test
    void argumentsAreValidated() {
        assertThatThrownBy(() -> BandAverages.planckMean(METAL, 2, 1, 300)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("lower < upper");
        assertThatThrownBy(() -> BandAverages.planckMean(METAL, -1, 1, 300)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> BandAverages.planckMean(METAL, 0, 1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> BandAverages.planckMean(METAL, 0, 1, 300, -2)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("propertyTemperatureK");
        assertThatThrownBy(() -> BandAverages.planckMean(METAL, 0, 1, Double.NaN, 300)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("weightTemperatureK");
        assertThatThrownBy(() -> BandAverages.planckMean(null, 0, 1, 300)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> BandAverages.totalAbsorptivity(METAL, 300, 0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void meansWeightedAtTheWrongTemperatureAreNotAdditive() {
        // the additivity test can fail: band means weighted at 1000 K summed with the fractions at 600 K
        double[] edges = {0, 2, 6, INF};
        double[] means = BandAverages.planckMeans(T_TAB, edges, 1000, 700);
        double sum = 0;
        for (int k = 0; k < 3; k++) {
            sum += means[k] * Planck.bandFraction(edges[k], edges[k + 1], 600);
        }
        assertThat(Math.abs(sum - BandAverages.totalAbsorptivity(T_TAB, 700, 600))).isGreaterThan(1e-3);
    }

    @Property(tries = 300)
    void bandMeansAreAdditiveAndBounded(
            @ForAll @DoubleRange(min = 0.05, max = 50) double a,
            @ForAll @DoubleRange(min = 0.05, max = 50) double b,
            @ForAll @DoubleRange(min = 200, max = 6000) double tw,
            @ForAll @DoubleRange(min = 200, max = 2000) double tp) {
        double l = Math.min(a, b);
        double u = Math.max(a, b);
        if (!(u > l)) {
            return;
        }
        // Σ over [0,l],[l,u],[u,∞) of mean·fraction = total absorptivity (the weights are the fractions).
        double[] edges = {0, l, u, INF};
        double[] means = BandAverages.planckMeans(T_TAB, edges, tw, tp);
        double sum = 0;
        for (int k = 0; k < 3; k++) {
            assertThat(means[k]).isBetween(0.1 - 1e-15, 0.95 + 1e-15);
            sum += means[k] * Planck.bandFraction(edges[k], edges[k + 1], tw);
        }
        assertThat(sum).isCloseTo(BandAverages.totalAbsorptivity(T_TAB, tp, tw), within(1e-13));
    }
}
