package org.exitance.geometry.viewfactor;

import java.util.Arrays;

/**
 * Fixed configurations of a floor element, a round body and a wall, ceiling or roof rectangle, for
 * comparing the calculator's exact partly-hidden factor with {@link RoundShadowReference}. The
 * scene is invented: a box [0, 2] × [0, 2] × [0, 1.2] m, floor elements facing up (n = +z), a bar
 * (capped cylinder, radius 0.08 m, length 0.6 m, axis along +x from (0.7, 1.0, 0.25)) or a ball
 * (sphere, radius 0.1 m, centre (0.5, 0.5, 0.4)).
 *
 * <p>Row layout of {@link #configurations()} (lengths in m):
 * <pre>
 *   [0..2]   x, the element's point
 *   [3..5]   n, the element's unit normal
 *   [6..17]  q, four vertices x0,y0,z0,...,x3,y3,z3 (convex, planar; order as listed)
 *   [18]     body kind: 0 = capped cylinder, 1 = sphere
 *   cylinder: [19..21] base centre b, [22..24] unit axis a, [25] radius r, [26] length L  (27 numbers)
 *   sphere:   [19..21] centre c, [22] radius r                                        (23 numbers)
 * </pre>
 * The reference values are computed on demand by {@link #reference(double[])}, never stored.
 */
final class RoundShadowConfigurations {
    static final int KIND = 18;
    static final int BODY = 19;
    static final double CYLINDER = 0;
    static final double SPHERE = 1;

    private static final double[] UP = {0, 0, 1};
    /** Ceiling z = 1.2, vertices ordered so that the normal faces down into the box. */
    private static final double[] CEILING = {0, 0, 1.2, 0, 2, 1.2, 2, 2, 1.2, 2, 0, 1.2};
    /** Wall y = 0, normal facing +y into the box. */
    private static final double[] WALL_Y0 = {0, 0, 0, 0, 0, 1.2, 2, 0, 1.2, 2, 0, 0};
    /** Sloped roof panel rising from z = 1.0 at y = 0 to z = 1.4 at y = 2, normal facing down into the box. */
    private static final double[] ROOF = {0, 0, 1.0, 0, 2, 1.4, 2, 2, 1.4, 2, 0, 1.0};
    private static final double[] BAR = {0.7, 1.0, 0.25, 1, 0, 0, 0.08, 0.6};
    private static final double[] BALL = {0.5, 0.5, 0.4, 0.1};

    private RoundShadowConfigurations() {
    }

    /** One line per row of {@link #configurations()}, saying what the row shows. */
    static String[] names() {
        return new String[] {
            "near: element under the bar, its shadow a band across the ceiling over two opposite edges",
            "far: element at the far side, the bar's shadow wholly inside the wall y = 0",
            "corner: the bar's shadow covers the ceiling's corner (0, 2, 1.2) and crosses two edges",
            "edge: the bar's shadow crosses the edge x = 2 of the wall y = 0",
            "cap: element beyond the bar's end x = 1.3, end cap in view, shadow end inside the ceiling",
            "sloped: the bar under a sloped roof panel, element near the bar's end",
            "sphere: the ball's shadow wholly inside the ceiling",
            "sphere sloped: the ball under the sloped roof panel",
        };
    }

    /** The rows, fresh arrays on every call (layout in the class doc). */
    static double[][] configurations() {
        return new double[][] {
            row(new double[] {1.0, 1.05, 0}, CEILING, CYLINDER, BAR),
            row(new double[] {1.0, 1.9, 0}, WALL_Y0, CYLINDER, BAR),
            row(new double[] {1.2, 0.85, 0}, CEILING, CYLINDER, BAR),
            row(new double[] {0.3, 1.9, 0}, WALL_Y0, CYLINDER, BAR),
            row(new double[] {1.45, 0.9, 0}, CEILING, CYLINDER, BAR),
            row(new double[] {1.2, 0.85, 0}, ROOF, CYLINDER, BAR),
            row(new double[] {0.8, 0.7, 0}, CEILING, SPHERE, BALL),
            row(new double[] {0.8, 0.7, 0}, ROOF, SPHERE, BALL),
        };
    }

    /** The visible factor of a row by {@link RoundShadowReference} (extrapolated value). Row not modified. */
    static double reference(double[] row) {
        return estimate(row).value();
    }

    /** The reference's three levels, value and error estimate for a row. Row not modified. */
    static RoundShadowReference.Estimate estimate(double[] row) {
        double[] x = Arrays.copyOfRange(row, 0, 3);
        double[] n = Arrays.copyOfRange(row, 3, 6);
        double[] q = Arrays.copyOfRange(row, 6, 18);
        double[] centre = Arrays.copyOfRange(row, BODY, BODY + 3);
        if (row[KIND] == CYLINDER) {
            return RoundShadowReference.cylinderEstimate(x, n, q, centre, Arrays.copyOfRange(row, BODY + 3, BODY + 6),
                    row[BODY + 6], row[BODY + 7], RoundShadowReference.BASE_POINTS);
        }
        return RoundShadowReference.sphereEstimate(x, n, q, centre, row[BODY + 3], RoundShadowReference.BASE_POINTS);
    }

    private static double[] row(double[] x, double[] q, double kind, double[] body) {
        double[] out = new double[BODY + body.length];
        System.arraycopy(x, 0, out, 0, 3);
        System.arraycopy(UP, 0, out, 3, 3);
        System.arraycopy(q, 0, out, 6, 12);
        out[KIND] = kind;
        System.arraycopy(body, 0, out, BODY, body.length);
        return out;
    }
}
