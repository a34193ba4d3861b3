package org.exitance.cases;

import java.util.List;
import org.exitance.geometry.Vec3;

/**
 * The numbers of a {@code geometry} object, read against their ranges ({@link Limits}): points,
 * directions, edge vectors, division counts, and the count of facets a shape will make, so that
 * a case asking for more facets than a geometry may hold is refused before any is built.
 */
final class GeometryNumbers {
    private GeometryNumbers() {
    }

    /** Three numbers [x, y, z]. */
    private static double[] three(JsonCursor c) throws CaseException {
        List<JsonCursor> el = c.elements();
        if (el.size() != 3) {
            throw c.error("expected three numbers [x, y, z], got " + el.size());
        }
        double[] v = new double[3];
        for (int i = 0; i < 3; i++) {
            v[i] = el.get(i).number();
        }
        return v;
    }

    /** A point (m), each coordinate in {@link Limits#COORDINATE_M}. */
    static Vec3 point(JsonCursor c) throws CaseException {
        List<JsonCursor> el = c.elements();
        double[] v = three(c);
        for (int i = 0; i < 3; i++) {
            if (!Limits.COORDINATE_M.contains(v[i])) {
                throw el.get(i).outOfRange(v[i], Limits.COORDINATE_M);
            }
        }
        return new Vec3(v[0], v[1], v[2]);
    }

    /** A direction (a normal, an axis): any length in {@link Limits#DIRECTION_LENGTH}, not normalized. */
    static Vec3 direction(JsonCursor c) throws CaseException {
        double[] v = three(c);
        double length = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        if (length == 0) {
            throw c.error("a direction must not be zero, got [" + Limits.number(v[0]) + ", " + Limits.number(v[1])
                    + ", " + Limits.number(v[2]) + "]");
        }
        if (!Limits.DIRECTION_LENGTH.contains(length)) {
            throw c.error("the length of a direction must lie " + Limits.DIRECTION_LENGTH.describe()
                    + " (it need not be 1; see Limits in docs/case-format.md), got " + Limits.number(length));
        }
        return new Vec3(v[0], v[1], v[2]);
    }

    /** An edge or a displacement (m) whose length lies in {@link Limits#LENGTH_M}. */
    static Vec3 edge(JsonCursor c) throws CaseException {
        double[] v = three(c);
        double length = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        if (!Limits.LENGTH_M.contains(length)) {
            throw c.error("the length of this edge must lie " + Limits.LENGTH_M.describe()
                    + " (see Limits in docs/case-format.md), got " + Limits.number(length) + " m");
        }
        return new Vec3(v[0], v[1], v[2]);
    }

    /** A translation (m), each component in {@link Limits#COORDINATE_M}. */
    static Vec3 translation(JsonCursor c) throws CaseException {
        return point(c);
    }

    /** A size (radius, height) in {@link Limits#LENGTH_M}. */
    static double length(JsonCursor s, String key) throws CaseException {
        return s.field(key).positiveWithin(Limits.LENGTH_M);
    }

    /** A radius that may be zero, in {@link Limits#RADIUS_OR_ZERO_M}. */
    static double radiusOrZero(JsonCursor s, String key) throws CaseException {
        return s.field(key).nonNegativeWithin(Limits.RADIUS_OR_ZERO_M);
    }

    /** The division counts of a shape (each in {@link Limits#DIVISIONS}), or the defaults. */
    static int[] divisions(JsonCursor s, int count, int[] defaults) throws CaseException {
        if (!s.has("divisions")) {
            return defaults;
        }
        JsonCursor d = s.field("divisions");
        List<JsonCursor> el = d.elements();
        if (el.size() != count) {
            throw d.error("needs " + count + " whole numbers, got " + el.size());
        }
        int[] out = new int[count];
        for (int i = 0; i < count; i++) {
            out[i] = el.get(i).wholeWithin(Limits.DIVISIONS);
        }
        return out;
    }

    /**
     * Adds the facets a shape will make to those of the geometry so far and refuses a total above
     * {@link Limits#FACETS}, before the shape is built.
     *
     * @param at     where the error points (the shape's divisions, or the shape)
     * @param before facets of the parts read so far
     * @param facets facets of this shape (may be far beyond an int)
     * @return the new total
     */
    static long addFacets(JsonCursor at, long before, double facets) throws CaseException {
        double total = before + facets;
        if (total > Limits.FACETS.max()) {
            throw at.error("the geometry would have " + Limits.number(Math.rint(total)) + " facets; at most "
                    + Limits.number(Limits.FACETS.max()) + " are allowed (see Limits in docs/case-format.md):"
                    + " use fewer divisions");
        }
        return (long) total;
    }
}
