package org.exitance.spectral;

/**
 * Hemispherical emissivity from measured directional or normal emittance.
 *
 * <p>From a table ε'(θ), linear in θ between the measured angles and held at the last value up
 * to 90°: {@code ε = 2 ∫₀^{π/2} ε'(θ) sin θ cos θ dθ = ∫ ε'(θ) sin 2θ dθ} (Siegel &amp; Howell,
 * Thermal Radiation Heat Transfer, 5th ed., §3.3; Modest, 3rd ed., §3.2), integrated exactly on
 * each linear piece: ∫ (a + bθ) sin 2θ dθ = −(a + bθ) cos 2θ / 2 + b sin 2θ / 4. A table of
 * ε' = ε_n cos θ gives ⅔ ε_n.
 *
 * <p>From the normal emittance alone, by a stated model of the surface ({@link Conversion}):
 * a smooth dielectric, or a metal with n = k, whose index is found from ε_n and whose
 * hemispherical emissivity then follows from Fresnel's equations ({@link Fresnel}). Rule of thumb
 * for the results (common practice): metals ε/ε_n ≈ 1.1–1.3, non-conductors slightly below 1.
 */
public final class DirectionalEmissivity {

    /** How a normal emittance is converted to hemispherical. */
    public enum Conversion {
        /** A smooth dielectric (k = 0), index from ε_n. */
        DIELECTRIC,
        /** A metal with n = k (good conductor in the infrared), index from ε_n. */
        METAL
    }

    /** The largest normal emissivity of a smooth metal with n = k: 4/(2 + 2√2), at n = k = 1/√2. */
    public static final double METAL_LIMIT = 4 / (2 + 2 * Math.sqrt(2));

    private DirectionalEmissivity() {
    }

    /**
     * Hemispherical emissivity of a table ε'(θ).
     *
     * @param angleDeg     polar angles in degrees, strictly increasing, in [0, 90]; not modified
     * @param emissivity   ε' at those angles, each in [0, 1]; not modified
     * @throws IllegalArgumentException naming the offending entry
     */
    public static double hemispherical(double[] angleDeg, double[] emissivity) {
        if (angleDeg.length == 0 || angleDeg.length != emissivity.length) {
            throw new IllegalArgumentException("directional table: " + angleDeg.length + " angles for "
                    + emissivity.length + " emissivities");
        }
        for (int i = 0; i < angleDeg.length; i++) {
            if (!(angleDeg[i] >= 0 && angleDeg[i] <= 90) || i > 0 && !(angleDeg[i] > angleDeg[i - 1])) {
                throw new IllegalArgumentException("directional table: angle[" + i + "] = " + angleDeg[i]
                        + "° must increase within 0–90°");
            }
            if (!(emissivity[i] >= 0 && emissivity[i] <= 1)) {
                throw new IllegalArgumentException("directional table: emissivity[" + i + "] = " + emissivity[i]
                        + " must lie in [0, 1]");
            }
        }
        double sum = 0;
        // held at the first value from 0° to the first angle, and at the last value up to 90°
        double[] t = new double[angleDeg.length + 2];
        double[] e = new double[angleDeg.length + 2];
        t[0] = 0;
        e[0] = emissivity[0];
        for (int i = 0; i < angleDeg.length; i++) {
            t[i + 1] = Math.toRadians(angleDeg[i]);
            e[i + 1] = emissivity[i];
        }
        t[t.length - 1] = 0.5 * Math.PI;
        e[e.length - 1] = emissivity[emissivity.length - 1];
        for (int i = 0; i + 1 < t.length; i++) {
            if (t[i + 1] > t[i]) {
                double b = (e[i + 1] - e[i]) / (t[i + 1] - t[i]);
                double a = e[i] - b * t[i];
                sum += piece(a, b, t[i + 1]) - piece(a, b, t[i]);
            }
        }
        return Math.min(1, Math.max(0, sum));
    }

    /** Antiderivative of (a + bθ) sin 2θ. */
    private static double piece(double a, double b, double theta) {
        return -(a + b * theta) * Math.cos(2 * theta) / 2 + b * Math.sin(2 * theta) / 4;
    }

    /**
     * Hemispherical emissivity from a normal emittance by a stated surface model.
     *
     * @param normalEmissivity  ε_n in (0, 1]
     */
    public static double fromNormal(double normalEmissivity, Conversion model) {
        if (!(normalEmissivity > 0 && normalEmissivity <= 1)) {
            throw new IllegalArgumentException("normal emissivity " + normalEmissivity + " must lie in (0, 1]");
        }
        if (model == Conversion.DIELECTRIC) {
            return normalEmissivity == 1 ? 1 : Fresnel.hemispherical(Fresnel.dielectricIndex(normalEmissivity), 0);
        }
        if (normalEmissivity > METAL_LIMIT) {
            throw new IllegalArgumentException("a metal with n = k has a normal emissivity of at most "
                    + String.format(java.util.Locale.ROOT, "%.4f", METAL_LIMIT) + ", got " + normalEmissivity
                    + "; use the dielectric conversion or give the hemispherical emissivity");
        }
        double n = Fresnel.metalIndex(normalEmissivity);
        return Fresnel.hemispherical(n, n);
    }
}
