package org.exitance.model;

/**
 * A wavelength band [lowerUm, upperUm) in µm. The lower edge may be 0 and the upper edge
 * {@link Double#POSITIVE_INFINITY}.
 */
public record Band(double lowerUm, double upperUm) {
    public Band {
        if (!(lowerUm >= 0) || !(upperUm > lowerUm)) {
            throw new IllegalArgumentException("band edges must satisfy 0 <= lower < upper: " + lowerUm + ", " + upperUm);
        }
    }

    /** "0–1.5 µm", "6–∞ µm". */
    public String label() {
        return format(lowerUm) + "–" + format(upperUm) + " µm";
    }

    static String format(double um) {
        if (Double.isInfinite(um)) {
            return "∞";
        }
        if (um == Math.rint(um) && Math.abs(um) < 1e6) {
            return Long.toString((long) um);
        }
        return String.format(java.util.Locale.ROOT, "%.4g", um).replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
