package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.function.DoubleUnaryOperator;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.SourceSpectrum;
import org.junit.jupiter.api.Test;

/** Absorptivity for a tabulated source spectrum: closed forms and a sampled blackbody. */
class SourceSpectrumTest {
    private static final double[] EPS_UM = {0.3, 0.45, 0.8, 1.8, 2.4, 3.0, 8, 40};
    private static final double[] EPS = {0.9, 0.12, 0.07, 0.15, 0.5, 0.9, 0.89, 0.88};
    private static final SpectralEmissivity PAINT = new TabulatedEmissivity(EPS_UM, EPS);

    @Test
    void sampledBlackbodySpectrumGivesTheBlackbodyAbsorptivityWithinItsSamplingError() {
        double t = 5772; // effective temperature of the sun (common practice)
        int n = 3001;
        double lo = 0.1;
        double hi = 100;
        double[] w = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = lo * Math.pow(hi / lo, i / (double) (n - 1));
            g[i] = Independent.planck(w[i], t);
        }
        SourceSpectrum sampled = new SourceSpectrum("sampled", w, g);
        double alphaSampled = sampled.absorptivity(PAINT, 300);
        double alphaBlackbody = new BlackbodySource(t).absorptivity(PAINT, 300);

        // |α_sampled − α_bb| = |∫ (ε − α_bb)(G − E_b) dλ| / ∫G dλ ≤ ∫|G − E_b| dλ / ∫G dλ, since |ε − α_bb| ≤ 1;
        // G is the linear interpolation of the samples (zero outside them), E_b Planck's law.
        DoubleUnaryOperator lin = Independent.zeroOutside(w, g);
        double[] kinks = w;
        // |G − E_b| has kinks where the two cross inside a sample interval, and near E_b's inflections it is
        // rounding noise: panels are accepted at 1e-6 relative or 1e-4 W/m² absolute (≈ 3000 panels: ≤ 0.3 W/m²
        // in all, against a misfit of the order of 1e3 W/m²), ample for a bound
        double misfit = Independent.integrate(1e-6, 1e-4, l -> Math.abs(lin.applyAsDouble(l) - Independent.planck(l, t)), 0.01, 1e5,
                kinks);
        double total = Independent.integrate(lin, lo, hi, kinks);
        double bound = misfit / total;

        assertThat(bound).as("the sampling error is small, so the comparison means something").isLessThan(2e-5);
        assertThat(alphaSampled).isCloseTo(alphaBlackbody, within(bound));
        assertThat(sampled.totalIrradianceWM2()).isCloseTo(total, within(1e-9 * total));
    }

    @Test
    void flatSpectrumOverAnIntervalGivesTheMeanOfALinearEmissivity() {
        // ε linear from 0.2 at 0.5 µm to 0.8 at 3 µm; G constant on [1, 2] µm.
        // Closed form: the mean of a linear function over an interval is its value at the midpoint.
        SpectralEmissivity e = new TabulatedEmissivity(new double[] {0.5, 3}, new double[] {0.2, 0.8});
        SourceSpectrum flat = new SourceSpectrum("flat", new double[] {1, 2}, new double[] {100, 100});
        double expected = 0.2 + (0.8 - 0.2) * (1.5 - 0.5) / (3 - 0.5);
        assertThat(flat.absorptivity(e, 300)).isCloseTo(expected, within(1e-14));
    }

    @Test
    void triangularSpectrumGivesTheEmissivityAtItsCentroid() {
        // G rises linearly from 0 at 1 µm to a peak at 2 µm; its centroid is at 1 + 2/3 µm (closed form,
        // the centroid of a triangle lies at 2/3 of the way to its peak). A linear ε averaged with weight G is
        // ε at that centroid.
        SpectralEmissivity e = new TabulatedEmissivity(new double[] {0.5, 3}, new double[] {0.2, 0.8});
        SourceSpectrum ramp = new SourceSpectrum("ramp", new double[] {1, 2}, new double[] {0, 50});
        double centroid = 1 + 2.0 / 3.0;
        double expected = 0.2 + (0.8 - 0.2) * (centroid - 0.5) / (3 - 0.5);
        assertThat(ramp.absorptivity(e, 300)).isCloseTo(expected, within(1e-14));
        assertThat(ramp.totalIrradianceWM2()).isCloseTo(25.0, within(1e-12)); // triangle area ½·1·50
    }

    @Test
    void spectrumAcrossEmissivityKinksMatchesQuadrature() {
        double[] w = {0.35, 0.6, 1.1, 2.0, 2.7, 4.5};
        double[] g = {300, 1900, 1200, 400, 900, 40};
        SourceSpectrum s = new SourceSpectrum("uneven", w, g);
        DoubleUnaryOperator eps = Independent.heldTable(EPS_UM, EPS);
        DoubleUnaryOperator lin = Independent.zeroOutside(w, g);
        double[] kinks = java.util.stream.DoubleStream.concat(java.util.Arrays.stream(w), java.util.Arrays.stream(EPS_UM))
                .toArray();
        double num = Independent.integrate(l -> eps.applyAsDouble(l) * lin.applyAsDouble(l), 0.35, 4.5, kinks);
        double den = Independent.integrate(lin, 0.35, 4.5, kinks);
        assertThat(s.absorptivity(PAINT, 300)).isCloseTo(num / den, within(1e-11));
    }

    @Test
    void spectrumWithoutPowerIsRefused() {
        assertThatThrownBy(() -> new SourceSpectrum("dark", new double[] {1, 2}, new double[] {0, 0}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("no power");
        assertThatThrownBy(() -> new SourceSpectrum("back", new double[] {2, 1}, new double[] {1, 1}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("increase");
    }
}
