package org.exitance.spectral.source;

import java.util.Arrays;
import org.exitance.spectral.SpectralEmissivity;

/**
 * Total absorptivity of a diffuse surface for a tabulated source spectrum,
 * <pre>
 *   α(T) = ∫ ε(λ, T) G_λ(λ) dλ / ∫ G_λ(λ) dλ
 * </pre>
 * (Kirchhoff's law α_λ = ε_λ for diffuse surfaces; Siegel &amp; Howell 7th ed. Ch. 3; Incropera
 * 6th ed. Sec. 12.5, definition of the total absorptivity for an arbitrary irradiation).
 *
 * <p><b>Exact evaluation.</b> G_λ is linear between its samples and ε (at fixed T) is linear
 * between its {@code breakpointsUm()} ({@link SpectralEmissivity}'s contract). On every
 * interval between consecutive nodes of the merged set their product is a quadratic, which
 * Simpson's rule integrates exactly: ∫_a^b f = (b − a)/6 · (f(a) + 4 f(m) + f(b))
 * (Abramowitz &amp; Stegun, Eq. 25.4.5). The denominator is the trapezoid sum, exact for the
 * linear G_λ. Outside the sampled range G_λ = 0, so nothing there counts.
 */
public final class SpectrumAbsorptivity {

    private SpectrumAbsorptivity() {
    }

    /** α in [0, 1] of emissivity {@code e} at {@code surfaceTemperatureK} (K, &gt; 0) for {@code spectrum}. */
    public static double of(SpectralEmissivity e, double surfaceTemperatureK, SourceSpectrum spectrum) {
        requireTemperature(surfaceTemperatureK);
        if (e.isGray()) {
            return e.at(1.0, surfaceTemperatureK);
        }
        double[] parts = bandIntegrals(e, surfaceTemperatureK, spectrum, 0.0, Double.POSITIVE_INFINITY);
        double alpha = parts[0] / spectrum.totalIrradianceWM2();
        return Math.min(1.0, Math.max(0.0, alpha));
    }

    /**
     * The two integrals of a band [lowerUm, upperUm] (upper may be +∞): {@code ∫ ε G_λ dλ} and
     * {@code ∫ G_λ dλ}, both in W/m², exact by Simpson's rule on the merged nodes.
     *
     * @return a new array {∫ε G dλ, ∫G dλ}
     */
    public static double[] bandIntegrals(SpectralEmissivity e, double surfaceTemperatureK, SourceSpectrum spectrum,
                                         double lowerUm, double upperUm) {
        requireTemperature(surfaceTemperatureK);
        double lo = Math.max(lowerUm, spectrum.firstUm());
        double hi = Math.min(upperUm, spectrum.lastUm());
        if (!(hi > lo)) {
            return new double[] {0.0, 0.0};
        }
        double[] nodes = mergedNodes(spectrum, e.breakpointsUm(), lo, hi);
        double num = 0;
        double den = 0;
        double prevG = spectrum.irradianceAt(nodes[0]);
        double prevEg = e.at(nodes[0], surfaceTemperatureK) * prevG;
        for (int i = 1; i < nodes.length; i++) {
            double a = nodes[i - 1];
            double b = nodes[i];
            double m = 0.5 * (a + b);
            double gm = spectrum.irradianceAt(m);
            double gb = spectrum.irradianceAt(b);
            double mid = e.at(m, surfaceTemperatureK) * gm;
            double end = e.at(b, surfaceTemperatureK) * gb;
            num += (b - a) / 6.0 * (prevEg + 4.0 * mid + end);
            den += (b - a) / 6.0 * (prevG + 4.0 * gm + gb);
            prevEg = end;
            prevG = gb;
        }
        return new double[] {num, den};
    }

    private static void requireTemperature(double surfaceTemperatureK) {
        if (!(surfaceTemperatureK > 0) || !Double.isFinite(surfaceTemperatureK)) {
            throw new IllegalArgumentException("surface temperature must be finite and above 0 K, got "
                    + surfaceTemperatureK);
        }
    }

    /** lo, hi, and the spectrum's samples and emissivity breakpoints strictly inside (lo, hi), sorted. */
    private static double[] mergedNodes(SourceSpectrum s, double[] breakpoints, double lo, double hi) {
        double[] w = s.wavelengthUm();
        double[] all = new double[w.length + breakpoints.length + 2];
        int n = 0;
        all[n++] = lo;
        all[n++] = hi;
        for (double x : w) {
            if (x > lo && x < hi) {
                all[n++] = x;
            }
        }
        for (double b : breakpoints) {
            if (b > lo && b < hi) {
                all[n++] = b;
            }
        }
        all = Arrays.copyOf(all, n);
        Arrays.sort(all);
        int k = 0;
        for (int i = 0; i < n; i++) {
            if (k == 0 || all[i] > all[k - 1]) {
                all[k++] = all[i];
            }
        }
        return Arrays.copyOf(all, k);
    }
}
