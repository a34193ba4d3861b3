package org.exitance.report;

import java.util.Locale;

/** Number formats shared by the human-readable writers (always '.' as decimal separator). */
public final class Numbers {
    private Numbers() {
    }

    /**
     * Heat in W, fluxes in W/m²: enough digits to compare, no exponent for everyday sizes; below
     * 1 nW (round-off of a balance that closes) shown as 0.00.
     */
    public static String power(double w) {
        double a = Math.abs(w);
        if (a < 1e-9) {
            return "0.00";
        }
        if (a != 0 && (a < 1e-3 || a >= 1e9)) {
            return String.format(Locale.ROOT, "%.4e", w);
        }
        return String.format(Locale.ROOT, "%.2f", w);
    }

    /** Temperatures in K or °C to 0.01. */
    public static String temperature(double t) {
        return String.format(Locale.ROOT, "%.2f", t);
    }

    /** Areas in m². */
    public static String area(double a) {
        return a >= 0.01 && a < 1e6 ? String.format(Locale.ROOT, "%.4f", a) : String.format(Locale.ROOT, "%.4e", a);
    }

    /** Dimensionless ratios (emissivities, fractions). */
    public static String ratio(double r) {
        return String.format(Locale.ROOT, "%.4f", r);
    }

    /** Small diagnostics: residuals, relative errors. */
    public static String small(double v) {
        return String.format(Locale.ROOT, "%.2e", v);
    }

    /** Wavelengths in µm. */
    public static String wavelength(double um) {
        if (Double.isInfinite(um)) {
            return "∞";
        }
        return String.format(Locale.ROOT, "%.4g", um).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "");
    }
}
