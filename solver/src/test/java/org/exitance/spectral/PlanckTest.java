package org.exitance.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.stream.Stream;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Size;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class PlanckTest {

    static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    static final double INF = Double.POSITIVE_INFINITY;

    /**
     * Blackbody radiation functions, Incropera, DeWitt, Bergman &amp; Lavine, Fundamentals of Heat and
     * Mass Transfer, 6th ed. (Wiley 2007), Table 12.1 (Table 12.2 in the 7th ed.), values quoted FROM
     * MEMORY, not copied from a book at hand. The table is systematically high by up to 5e-5 at large
     * λT (its asymptote is ≈ 1.00005 instead of 1: it was generated with older, mutually
     * inconsistent values of C1, C2, σ), so the tolerance is 6e-5. At λT ≤ 1400 the agreement is
     * better than 5e-7.
     */
    static Stream<Arguments> incroperaTable() {
        return Stream.of(
                Arguments.of(1000.0, 0.000321),
                Arguments.of(1400.0, 0.007790),
                Arguments.of(2000.0, 0.066728),
                Arguments.of(2898.0, 0.250108),
                Arguments.of(4000.0, 0.480877),
                Arguments.of(5000.0, 0.633747),
                Arguments.of(6000.0, 0.737818),
                Arguments.of(8000.0, 0.856288),
                Arguments.of(10000.0, 0.914199),
                Arguments.of(20000.0, 0.985602),
                Arguments.of(50000.0, 0.998953));
    }

    @ParameterizedTest(name = "F(0→{0} µm·K) ≈ {1} (Incropera 6th ed. Table 12.1, from memory)")
    @MethodSource("incroperaTable")
    void fractionMatchesTextbookTable(double lambdaT, double tabulated) {
        assertThat(Planck.fractionBelow(lambdaT)).isCloseTo(tabulated, within(6e-5));
    }

    @Test
    void fractionMatchesTextbookTableClosely_atShortLambdaT() {
        // Incropera 6th ed. Table 12.1 (from memory): 800 → 0.000016, 1200 → 0.002134.
        assertThat(Planck.fractionBelow(800)).isCloseTo(0.000016, within(1e-6));
        assertThat(Planck.fractionBelow(1200)).isCloseTo(0.002134, within(1e-6));
    }

    /**
     * High-precision values of F(0→λT) = (15/π⁴)∫_ζ^∞ x³/(e^x−1)dx, ζ = C2/(λT) with CODATA 2018
     * C2, computed with mpmath 1.3.0 {@code quad} at 40 significant digits (printed to 20).
     */
    @ParameterizedTest(name = "F(0→{0} µm·K) = {1} (mpmath, 40 digits)")
    @MethodSource("mpmathValues")
    void fractionMatchesHighPrecisionValues(double lambdaT, double expected) {
        // Relative error bound ~ ζ·ε: the rounding of ζ = C2/(λT) is amplified by e^{−ζ}.
        double zeta = PhysicalConstants.C2_UM_K / lambdaT;
        assertThat(Planck.fractionBelow(lambdaT)).isCloseTo(expected, within(Math.max(2, zeta) * 2.3e-16 * expected));
    }

    static Stream<Arguments> mpmathValues() {
        return Stream.of(
                Arguments.of(300.0, 2.6860708489485033593e-17),
                Arguments.of(1000.0, 0.00032076978404488972166),
                Arguments.of(2898.0, 0.25010629365729487611),
                Arguments.of(5000.0, 0.63372587191591024588),
                Arguments.of(7193.88, 0.81885508147045528699),
                Arguments.of(20000.0, 0.98555383866606544659),
                Arguments.of(1e6, 0.99999984794320240041));
    }

    @Test
    void fractionMatchesNumericalIntegrationFrom100To1e6() {
        // Reference: Commons Math adaptive Gauss–Legendre of (15/π⁴)∫x³/(e^x−1)dx (Reference.fractionBelow).
        // Requirement 1e-9 absolute; measured max |error| ≈ 2e-16 (printed), asserted at 1e-14.
        double maxErr = 0;
        double worst = 0;
        for (int i = 0; i <= 400; i++) {
            double lt = 100 * Math.pow(1e4, i / 400.0);
            double err = Math.abs(Planck.fractionBelow(lt) - Reference.fractionBelow(lt));
            if (err > maxErr) {
                maxErr = err;
                worst = lt;
            }
        }
        // Both sides of the series switch at ζ = 2 (λT = C2/2 ≈ 7193.9).
        double sw = PhysicalConstants.C2_UM_K / 2;
        for (double lt : new double[] {sw * (1 - 1e-12), sw, sw * (1 + 1e-12)}) {
            maxErr = Math.max(maxErr, Math.abs(Planck.fractionBelow(lt) - Reference.fractionBelow(lt)));
        }
        System.out.printf("fractionBelow vs quadrature: max abs error %.2e at λT = %.1f µm·K%n", maxErr, worst);
        assertThat(maxErr).isLessThan(1e-14);
    }

    @Test
    void seriesCoefficientsMatchBernoulliExpansion() {
        // ∫_0^ζ x³/(e^x−1) dx = Σ B_k ζ^{k+3}/(k!(k+3)) (Abramowitz & Stegun Eq. 23.1.1 for x/(e^x−1)):
        // ζ³(1/3 − ζ/8 + ζ²/60 − ζ⁴/5040 + ζ⁶/272160 − ζ⁸/13305600 + …) — the coefficients quoted in
        // Siegel & Howell 7th ed. Ch. 1 / Chang & Rhee (1984).
        double[] quoted = {0, 1.0 / 60, -1.0 / 5040, 1.0 / 272160, -1.0 / 13305600, 1.0 / 622702080};
        for (int j = 1; j < quoted.length; j++) {
            assertThat(BlackbodyIntegrals.HEAD3[j]).isCloseTo(quoted[j], within(1e-15 * Math.abs(quoted[j])));
        }
        // Independent check of every tabulated Bernoulli number: B_2j/(2j)! = (−1)^{j+1} 2ζ(2j)/(2π)^{2j}.
        for (int j = 1; j < BlackbodyIntegrals.HEAD3.length; j++) {
            double zeta2j = 0;
            for (int k = 100000; k >= 1; k--) {
                zeta2j += Math.pow(k, -2.0 * j);
            }
            if (j == 1) {
                zeta2j = Math.PI * Math.PI / 6; // slow tail of the direct sum
            }
            double expected = (j % 2 == 1 ? 2 : -2) * zeta2j / Math.pow(2 * Math.PI, 2 * j) / (2 * j + 3);
            assertThat(BlackbodyIntegrals.HEAD3[j]).as("j=%d", j).isCloseTo(expected, within(1e-14 * Math.abs(expected)));
        }
    }

    @Test
    void headAndTailSeriesAgreeAcrossTheirOverlap() {
        // On 1 ≤ ζ ≤ 2 both series (as truncated: Bernoulli terms up to B_30) converge to machine
        // precision; P(ζ) + Q(ζ) must equal the complete integral. (The truncated head series is
        // used only below ζ = 2; at ζ = 3 its truncation error would already be 7e-11.)
        for (double z = 1.0; z <= 2.0; z += 0.01) {
            assertThat(BlackbodyIntegrals.head3Series(z) + BlackbodyIntegrals.tailSeries(z, 3))
                    .isCloseTo(BlackbodyIntegrals.TOTAL3, within(1e-14));
            assertThat(BlackbodyIntegrals.head2Series(z) + BlackbodyIntegrals.tailSeries(z, 2))
                    .isCloseTo(BlackbodyIntegrals.TOTAL2, within(1e-14));
        }
    }

    @Test
    void limitsAndUnderflowAreClean() {
        assertThat(Planck.fractionBelow(0)).isZero();
        assertThat(Planck.fractionBelow(INF)).isEqualTo(1.0);
        assertThat(Planck.fractionBelow(1.0)).isZero();          // ζ ≈ 14388: underflows to exactly 0
        assertThat(Planck.fractionBelow(1e-300)).isZero();
        assertThat(Planck.fractionBelow(Double.MIN_VALUE)).isZero();
        assertThat(Planck.fractionBelow(1e300)).isEqualTo(1.0);
        assertThat(Planck.fractionBelow(Double.MAX_VALUE)).isEqualTo(1.0);
        assertThat(Planck.fractionBelow(20.0)).isBetween(0.0, 1e-300); // deep Wien tail, still finite
        assertThat(Planck.spectralEmissivePower(1e-30, 300)).isZero();
        assertThat(Planck.spectralEmissivePower(0, 300)).isZero();
        assertThat(Planck.spectralEmissivePower(INF, 300)).isZero();
        assertThat(Planck.spectralEmissivePower(1e30, 300)).isFinite().isPositive();
        assertThat(Planck.bandFraction(0, INF, 1e-3)).isCloseTo(1.0, within(1e-15));
        assertThat(Planck.bandFraction(0, 1e-9, 300)).isZero();
        assertThat(Planck.bandEmissivePowerDerivative(0, 1e-9, 300)).isZero();
        assertThat(Planck.bandEmissivePowerDerivative(1e12, INF, 300)).isFinite();
    }

    @Test
    void argumentsAreValidated() {
        assertThatThrownBy(() -> Planck.fractionBelow(-1)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("lambdaTUmK");
        assertThatThrownBy(() -> Planck.fractionBelow(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Planck.spectralEmissivePower(1, 0)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("> 0 K");
        assertThatThrownBy(() -> Planck.spectralEmissivePower(-1, 300)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Planck.bandFraction(2, 1, 300)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("lower < upper");
        assertThatThrownBy(() -> Planck.bandFraction(1, 1, 300)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Planck.bandFraction(-1, 1, 300)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining(">= 0");
        assertThatThrownBy(() -> Planck.bandFraction(0, 1, -5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Planck.bandFraction(0, 1, Double.NaN)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Planck.peakWavelengthUm(0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void spectralEmissivePowerMatchesSiFormula() {
        // Planck's law written independently in SI (Reference.planckSi), Incropera 6th ed. Sec. 12.3.
        for (double t : new double[] {77, 300, 1000, 5800}) {
            for (double l = 0.05; l < 1e4; l *= 1.37) {
                double ref = Reference.planckSi(l, t);
                // exp(−ζ) has condition number ζ, so ζ·ε relative differences are unavoidable
                double zeta = PhysicalConstants.C2_UM_K / (l * t);
                double tol = 1e-13 * Math.max(1, zeta / 50);
                if (ref > 0) {
                    assertThat(Planck.spectralEmissivePower(l, t)).as("λ=%s T=%s", l, t).isCloseTo(ref, within(tol * ref));
                }
            }
        }
    }

    @Test
    void stefanBoltzmannRecoveredByIntegratingPlanckLaw() {
        // σ = ∫_0^∞ E_bλ dλ / T⁴ (Stefan–Boltzmann law, Incropera 6th ed. Sec. 12.3); quadrature in ln λ over λT ∈ [30, 1e12] µm·K.
        for (double t : new double[] {300, 1000, 5800}) {
            double integral = Reference.integrateLog(l -> Reference.planckSi(l, t), 30 / t, 1e12 / t);
            double sigma = integral / Math.pow(t, 4);
            System.out.printf("σ from quadrature at %.0f K: %.12e (rel. dev. %.1e)%n", t, sigma, sigma / SIGMA - 1);
            assertThat(sigma).isCloseTo(SIGMA, within(1e-8 * SIGMA));
        }
    }

    @Test
    void peakOfPlanckLawIsWiensDisplacement() {
        for (double t : new double[] {300, 1000, 5800}) {
            double guess = PhysicalConstants.WIEN_UM_K / t;
            // (a) Commons Math Brent optimizer on E_bλ itself: location limited to ~√ε by the flat maximum.
            double lmax = new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(1000),
                    new UnivariateObjectiveFunction(l -> Reference.planckSi(l, t)), GoalType.MAXIMIZE,
                    new SearchInterval(0.3 * guess, 3 * guess)).getPoint();
            assertThat(lmax).isCloseTo(Planck.peakWavelengthUm(t), within(1e-6 * guess));
            // (b) Brent root of the analytic dE_bλ/dλ (∝ 5(1 − e^{−x}) − x), in λ directly.
            double c2 = Reference.H * Reference.C / Reference.K * 1e6;
            double root = new BrentSolver(1e-16, 1e-15).solve(200, l -> {
                double x = c2 / (l * t);
                return 5 * (1 - Math.exp(-x)) - x;
            }, 0.3 * guess, 3 * guess);
            assertThat(root).isCloseTo(Planck.peakWavelengthUm(t), within(1e-9 * guess));
        }
    }

    @Property(tries = 200)
    void bandFractionsOfAPartitionSumToOne(
            @ForAll @Size(min = 1, max = 12) double[] cuts,
            @ForAll @DoubleRange(min = 50, max = 20000) double t) {
        double[] edges = Arrays.stream(cuts).map(c -> Math.abs(c) % 1000 + 1e-3).sorted().distinct().toArray();
        double sum = Planck.bandFraction(0, edges[0], t);
        for (int i = 0; i + 1 < edges.length; i++) {
            sum += Planck.bandFraction(edges[i], edges[i + 1], t);
        }
        sum += Planck.bandFraction(edges[edges.length - 1], INF, t);
        assertThat(sum).isCloseTo(1.0, within(1e-14));
    }

    @Test
    void aPartitionWithOneBandLeftOutDoesNotSumToOne() {
        // the partition test can fail: 1–20 µm at 1000 K without its 3–5 µm band misses ~20 %
        // of the emission (F(0→5000 µm·K) − F(0→3000 µm·K) ≈ 0.634 − 0.273, Incropera 6th ed. Table 12.2, from memory)
        double t = 1000;
        double sum = Planck.bandFraction(0, 1, t) + Planck.bandFraction(1, 3, t) + Planck.bandFraction(5, 20, t)
                + Planck.bandFraction(20, INF, t);
        assertThat(1 - sum).isCloseTo(0.634 - 0.273, within(0.002));
    }

    @Test
    void bandFractionAgreesWithDifferenceOfFractionsAndQuadrature() {
        double[][] bands = {{0, 1}, {1, 3}, {3, 10}, {10, INF}, {2.5, 2.5001}, {0.2, 0.21}, {500, 600}};
        for (double t : new double[] {300, 1000, 5800}) {
            for (double[] b : bands) {
                double f = Planck.bandFraction(b[0], b[1], t);
                double diff = Planck.fractionBelow(b[1] * t) - Planck.fractionBelow(b[0] * t);
                assertThat(f).isCloseTo(diff, within(1e-15));
                double q = Reference.bandMeanParts(new GrayEmissivity(1), b[0], b[1], t, t)[1];
                double ref = q / (Reference.SIGMA_DERIVED * Math.pow(t, 4));
                // relative agreement wherever the band holds a non-negligible fraction
                if (ref > 1e-200) {
                    assertThat(f).as("band %s at %s K", Arrays.toString(b), t).isCloseTo(ref, within(2e-11 * ref + 1e-300));
                }
                assertThat(Planck.bandEmissivePower(b[0], b[1], t)).isCloseTo(f * SIGMA * Math.pow(t, 4),
                        within(1e-14 * SIGMA * Math.pow(t, 4)));
            }
        }
    }

    @Test
    void bandPowerDerivativeMatchesCentralDifferences() {
        double[][] bands = {{0, 1}, {1, 3}, {3, 10}, {10, INF}, {0, INF}, {2.5, 2.6}, {0.3, 0.4}, {40, 1000}};
        for (double t : new double[] {300, 1000, 5800}) {
            for (double[] b : bands) {
                double d = Planck.bandEmissivePowerDerivative(b[0], b[1], t);
                // step scaled so that ζ_upper·h/T ≤ 1e-3 (Wien-side bands vary like e^{−ζ})
                double zu = b[1] == INF ? 0 : PhysicalConstants.C2_UM_K / (b[1] * t);
                double h = 1e-3 * t / Math.max(1, zu);
                // 4th-order central difference (Abramowitz & Stegun 25.3.6), error ~ h⁴.
                double fd = (-Planck.bandEmissivePower(b[0], b[1], t + 2 * h)
                        + 8 * Planck.bandEmissivePower(b[0], b[1], t + h)
                        - 8 * Planck.bandEmissivePower(b[0], b[1], t - h)
                        + Planck.bandEmissivePower(b[0], b[1], t - 2 * h)) / (12 * h);
                assertThat(d).isPositive();
                assertThat(d).as("band %s at %s K", Arrays.toString(b), t).isCloseTo(fd, within(1e-8 * d));
            }
        }
        assertThat(Planck.bandEmissivePowerDerivative(0, INF, 700))
                .isCloseTo(4 * SIGMA * Math.pow(700, 3), within(1e-15 * 4 * SIGMA * Math.pow(700, 3)));
    }
}
