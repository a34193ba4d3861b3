package org.exitance.spectral;

import static org.exitance.spectral.PhysicalConstants.C1_W_UM4_PER_M2;
import static org.exitance.spectral.PhysicalConstants.C2_UM_K;
import static org.exitance.spectral.PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
import static org.exitance.spectral.PhysicalConstants.WIEN_UM_K;

/**
 * Planck's law for a blackbody in vacuum (refractive index 1) and the blackbody radiation
 * functions.
 *
 * <ul>
 *   <li>Spectral emissive power E_bλ = C1 / (λ⁵ (e^{C2/(λT)} − 1)) — Incropera 6th ed. Sec. 12.3;
 *       Siegel &amp; Howell 7th ed. Ch. 1; Modest 3rd ed. Ch. 1.</li>
 *   <li>Fraction of blackbody emission below λ, F(0→λT) = (1/σT⁴) ∫_0^λ E_bλ dλ — Incropera
 *       Sec. 12.3 and its table of blackbody radiation functions (Table 12.1 in the 6th ed.,
 *       numbering from memory); Siegel &amp; Howell Ch. 1; Modest Ch. 1. Evaluated with the Chang &amp; Rhee (1984) series pair, see
 *       {@link BlackbodyIntegrals}; absolute error &lt; 1e-14 measured in {@code PlanckTest}
 *       against adaptive quadrature for 100 ≤ λT ≤ 1e6 µm·K.</li>
 * </ul>
 * All methods are allocation-free and thread-safe.
 */
public final class Planck {

    private Planck() {
    }

    /**
     * Spectral (hemispherical) emissive power of a blackbody, E_bλ(λ, T), in W/(m²·µm).
     *
     * @param wavelengthUm  λ ≥ 0 in µm (0 and +∞ give 0)
     * @param temperatureK  T &gt; 0 in K
     */
    public static double spectralEmissivePower(double wavelengthUm, double temperatureK) {
        requireTemperature(temperatureK, "temperatureK");
        if (!(wavelengthUm >= 0.0)) {
            throw new IllegalArgumentException("wavelengthUm must be >= 0 µm, got " + wavelengthUm);
        }
        if (wavelengthUm == 0.0 || wavelengthUm == Double.POSITIVE_INFINITY) {
            return 0.0;
        }
        double zeta = C2_UM_K / (wavelengthUm * temperatureK);
        double l2 = wavelengthUm * wavelengthUm;
        double l5 = l2 * l2 * wavelengthUm;
        if (zeta > 700.0) {
            // Wien tail: e^ζ would overflow; 1/(e^ζ − 1) = e^{−ζ} to double precision here.
            if (l5 < Double.MIN_NORMAL) {
                // λ⁵ underflows: log form avoids 0·∞ (result is 0 for any physical T).
                return Math.exp(Math.log(C1_W_UM4_PER_M2) - 5.0 * Math.log(wavelengthUm) - zeta);
            }
            return C1_W_UM4_PER_M2 / l5 * Math.exp(-zeta);
        }
        return C1_W_UM4_PER_M2 / (l5 * Math.expm1(zeta));
    }

    /**
     * Blackbody radiation function F(0→λT): fraction of σT⁴ emitted at wavelengths below λ.
     * Returns exactly 0 for λT = 0 (and when the value underflows, λT ≲ 18 µm·K) and exactly 1
     * for λT = +∞.
     *
     * @param lambdaTUmK λ·T in µm·K, ≥ 0
     */
    public static double fractionBelow(double lambdaTUmK) {
        if (!(lambdaTUmK >= 0.0)) {
            throw new IllegalArgumentException("lambdaTUmK must be >= 0 µm·K, got " + lambdaTUmK);
        }
        if (lambdaTUmK == 0.0) {
            return 0.0;
        }
        if (lambdaTUmK == Double.POSITIVE_INFINITY) {
            return 1.0;
        }
        double zeta = C2_UM_K / lambdaTUmK;
        if (zeta >= BlackbodyIntegrals.SWITCH_ZETA) {
            return BlackbodyIntegrals.FIFTEEN_OVER_PI4 * BlackbodyIntegrals.tailSeries(zeta, 3);
        }
        return 1.0 - BlackbodyIntegrals.FIFTEEN_OVER_PI4 * BlackbodyIntegrals.head3Series(zeta);
    }

    /**
     * Fraction of blackbody emission at T in the band [lower, upper]:
     * F(0→upper·T) − F(0→lower·T), computed directly as one integral (no cancellation for narrow
     * or far-tail bands; relative accuracy ~1e-15 wherever the value does not underflow).
     *
     * @param lowerUm       ≥ 0 (may be 0)
     * @param upperUm       &gt; lowerUm (may be +∞)
     * @param temperatureK  &gt; 0
     */
    public static double bandFraction(double lowerUm, double upperUm, double temperatureK) {
        requireBand(lowerUm, upperUm);
        requireTemperature(temperatureK, "temperatureK");
        return BlackbodyIntegrals.FIFTEEN_OVER_PI4
                * BlackbodyIntegrals.integral3(zeta(upperUm, temperatureK), zeta(lowerUm, temperatureK));
    }

    /** Blackbody emissive power in the band, F·σT⁴, in W/m². Arguments as {@link #bandFraction}. */
    public static double bandEmissivePower(double lowerUm, double upperUm, double temperatureK) {
        double t2 = temperatureK * temperatureK;
        return bandFraction(lowerUm, upperUm, temperatureK) * STEFAN_BOLTZMANN_W_M2_K4 * t2 * t2;
    }

    /**
     * Analytic temperature derivative of {@link #bandEmissivePower}, in W/(m²·K):
     * <pre>
     *   d/dT [ΔF σT⁴] = 4σT³ ΔF + σT⁴ Δ(dF/dT),
     *   dF(0→λT)/dT = (dF/dζ)(dζ/dT) = (15/π⁴) ζ⁴ / (T (e^ζ − 1)),   ζ = C2/(λT)
     * </pre>
     * (Leibniz rule on the definition of F); so the result is
     * σT³ [4ΔF + (15/π⁴)(g(ζ_upper) − g(ζ_lower))] with g(ζ) = ζ⁴/(e^ζ − 1), g(0) = g(∞) = 0.
     */
    public static double bandEmissivePowerDerivative(double lowerUm, double upperUm, double temperatureK) {
        double fraction = bandFraction(lowerUm, upperUm, temperatureK);
        double g = derivativeKernel(zeta(upperUm, temperatureK)) - derivativeKernel(zeta(lowerUm, temperatureK));
        double t3 = temperatureK * temperatureK * temperatureK;
        return STEFAN_BOLTZMANN_W_M2_K4 * t3 * (4.0 * fraction + BlackbodyIntegrals.FIFTEEN_OVER_PI4 * g);
    }

    /** Wavelength of maximum E_bλ, Wien's displacement law λ_max = b/T (Incropera 6th ed. Sec. 12.3), µm. */
    public static double peakWavelengthUm(double temperatureK) {
        requireTemperature(temperatureK, "temperatureK");
        return WIEN_UM_K / temperatureK;
    }

    // ---------------------------------------------------------------------------------------

    /** ζ = C2/(λT); λ = 0 → +∞, λ = +∞ → 0. */
    static double zeta(double wavelengthUm, double temperatureK) {
        if (wavelengthUm == 0.0) {
            return Double.POSITIVE_INFINITY;
        }
        return C2_UM_K / (wavelengthUm * temperatureK);
    }

    /** g(ζ) = ζ⁴/(e^ζ − 1), with g(0) = g(∞) = 0. */
    static double derivativeKernel(double zeta) {
        if (zeta <= 0.0 || zeta > BlackbodyIntegrals.UNDERFLOW_ZETA) {
            return 0.0;
        }
        double z2 = zeta * zeta;
        return z2 * z2 / Math.expm1(zeta);
    }

    static void requireTemperature(double temperatureK, String name) {
        if (!(temperatureK > 0.0) || temperatureK == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException(name + " must be a finite temperature > 0 K, got " + temperatureK);
        }
    }

    static void requireBand(double lowerUm, double upperUm) {
        if (!(lowerUm >= 0.0) || lowerUm == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException("band lower bound must be finite and >= 0 µm, got " + lowerUm);
        }
        if (Double.isNaN(upperUm)) {
            throw new IllegalArgumentException("band upper bound is NaN");
        }
        if (!(upperUm > lowerUm)) {
            throw new IllegalArgumentException("band bounds must satisfy lower < upper, got ["
                    + lowerUm + ", " + upperUm + "] µm");
        }
    }
}
