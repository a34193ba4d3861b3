package org.exitance.geometry.viewfactor;

/** Closed-form configuration factors used as expected values in tests, each with its source. */
public final class ClosedForms {

    private ClosedForms() {
    }

    /**
     * Directly opposed parallel rectangles a × b at distance c. Howell, <i>A Catalog of Radiation
     * Heat Transfer Configuration Factors</i>, case C-11; Incropera et al., <i>Fundamentals of Heat
     * and Mass Transfer</i>, 6th ed., Table 13.2 (aligned parallel rectangles).
     */
    public static double parallelRectangles(double a, double b, double c) {
        double x = a / c, y = b / c;
        double x2 = 1 + x * x, y2 = 1 + y * y;
        return 2 / (Math.PI * x * y) * (0.5 * Math.log(x2 * y2 / (1 + x * x + y * y))
                + x * Math.sqrt(y2) * Math.atan(x / Math.sqrt(y2)) + y * Math.sqrt(x2) * Math.atan(y / Math.sqrt(x2))
                - x * Math.atan(x) - y * Math.atan(y));
    }

    /**
     * Perpendicular rectangles with a common edge of length x; the emitter has width y, the
     * receiver height z. Howell's catalog, case C-14; Incropera et al., 6th ed., Table 13.2
     * (H = Z/X, W = Y/X).
     */
    public static double perpendicularRectangles(double x, double y, double z) {
        double h = z / x, w = y / x;
        double h2 = h * h, w2 = w * w, s = Math.sqrt(h2 + w2);
        double log = Math.log((1 + w2) * (1 + h2) / (1 + w2 + h2))
                + w2 * Math.log(w2 * (1 + w2 + h2) / ((1 + w2) * (w2 + h2)))
                + h2 * Math.log(h2 * (1 + h2 + w2) / ((1 + h2) * (h2 + w2)));
        return 1 / (Math.PI * w) * (w * Math.atan(1 / w) + h * Math.atan(1 / h) - s * Math.atan(1 / s) + 0.25 * log);
    }

    /**
     * Coaxial parallel discs, emitter radius ri, receiver radius rj, spacing l. Incropera et al.,
     * 6th ed., Table 13.2 (coaxial parallel disks); Howell's catalog, case C-41.
     */
    static double coaxialDiscs(double ri, double rj, double l) {
        double a = ri / l, b = rj / l;
        double s = 1 + (1 + b * b) / (a * a);
        return 0.5 * (s - Math.sqrt(s * s - 4 * (rj / ri) * (rj / ri)));
    }
}
