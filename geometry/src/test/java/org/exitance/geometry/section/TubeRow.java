package org.exitance.geometry.section;

/** A row of tubes before a plane, for the tests: Hottel's closed form and an unbounded row to cast rays at. */
final class TubeRow {

    private TubeRow() {
    }

    /**
     * Fraction of the radiation of a plane that reaches a row of tubes in front of it (Hottel &amp;
     * Sarofim, Radiative Transfer, 1967; from memory): F = 1 − √(1 − (D/s)²) + (D/s) atan √((s/D)² − 1).
     */
    static double hottel(double d, double s) {
        double x = d / s;
        return 1 - Math.sqrt(1 - x * x) + x * Math.atan(Math.sqrt(1 / (x * x) - 1));
    }

    /** Tubes of radius r at (k·pitch, c) for every integer k, radiating outward. */
    static AngularReference.Shape infinite(double pitch, double c, double r) {
        return new AngularReference.Shape() {
            public double hit(double sx, double sy, double dx, double dy) {
                if (dy <= 0) {
                    return Double.POSITIVE_INFINITY;
                }
                double tIn = Math.max(0, (c - r - sy) / dy);
                double xIn = sx + tIn * dx;
                int step = dx >= 0 ? 1 : -1;
                long k = (long) Math.floor(xIn / pitch) - step;
                for (int n = 0; n < 1_000_000; n++, k += step) {
                    double fx = sx - k * pitch, fy = sy - c, b = fx * dx + fy * dy;
                    double disc = b * b - (fx * fx + fy * fy - r * r);
                    if (disc >= 0 && -b - Math.sqrt(disc) > 0) {
                        return -b - Math.sqrt(disc);
                    }
                    double nearEdge = (k + step) * pitch - step * r;
                    if (dx != 0 && (nearEdge - sx) / dx > 0 && sy + (nearEdge - sx) / dx * dy > c + r) {
                        return Double.POSITIVE_INFINITY; // the ray has left the band above the row
                    }
                }
                return Double.POSITIVE_INFINITY;
            }

            public boolean front(double hx, double hy, double dx, double dy) {
                return true;
            }
        };
    }
}
