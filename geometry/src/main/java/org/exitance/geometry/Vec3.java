package org.exitance.geometry;

/**
 * A point or a direction in three-dimensional space; coordinates in metres (m).
 *
 * <p>Immutable value. All operations return new instances.
 *
 * @param x first coordinate (m)
 * @param y second coordinate (m)
 * @param z third coordinate (m)
 */
public record Vec3(double x, double y, double z) {

    /** The origin. */
    public static final Vec3 ZERO = new Vec3(0, 0, 0);
    /** Unit vector along x. */
    public static final Vec3 X = new Vec3(1, 0, 0);
    /** Unit vector along y. */
    public static final Vec3 Y = new Vec3(0, 1, 0);
    /** Unit vector along z. */
    public static final Vec3 Z = new Vec3(0, 0, 1);

    /** @throws IllegalArgumentException if a coordinate is NaN or infinite */
    public Vec3 {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("non-finite coordinate (" + x + ", " + y + ", " + z + ")");
        }
    }

    /** @return this + o */
    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    /** @return this − o */
    public Vec3 minus(Vec3 o) {
        return new Vec3(x - o.x, y - o.y, z - o.z);
    }

    /** @return s · this */
    public Vec3 times(double s) {
        return new Vec3(s * x, s * y, s * z);
    }

    /** @return the scalar product this · o */
    public double dot(Vec3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    /** @return the vector product this × o */
    public Vec3 cross(Vec3 o) {
        return new Vec3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    /** @return the Euclidean length |this| */
    public double length() {
        return Math.sqrt(x * x + y * y + z * z);
    }

    /** @return the distance |this − o| (m) */
    public double distance(Vec3 o) {
        return minus(o).length();
    }

    /**
     * @return this / |this|
     * @throws IllegalArgumentException for the zero vector
     */
    public Vec3 normalized() {
        double l = length();
        if (l == 0) {
            throw new IllegalArgumentException("cannot normalize the zero vector");
        }
        return times(1.0 / l);
    }

    /** Written as a case writes a point, {@code [x, y, z]} (m), so that messages show the user's own form. */
    @Override
    public String toString() {
        return "[" + coordinate(x) + ", " + coordinate(y) + ", " + coordinate(z) + "]";
    }

    private static String coordinate(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /** @return coordinate {@code axis} (0 = x, 1 = y, 2 = z) */
    public double get(int axis) {
        return switch (axis) {
            case 0 -> x;
            case 1 -> y;
            case 2 -> z;
            default -> throw new IndexOutOfBoundsException("axis " + axis);
        };
    }

    /** @return (1 − t) a + t b */
    public static Vec3 lerp(Vec3 a, Vec3 b, double t) {
        return new Vec3(a.x + t * (b.x - a.x), a.y + t * (b.y - a.y), a.z + t * (b.z - a.z));
    }

    /**
     * A unit vector perpendicular to {@code n}, chosen deterministically (Frisvad-style branch on
     * the smallest component; common practice).
     *
     * @param n a non-zero vector
     * @return a unit vector u with u · n = 0
     */
    public static Vec3 anyPerpendicular(Vec3 n) {
        Vec3 a = n.normalized();
        double ax = Math.abs(a.x), ay = Math.abs(a.y), az = Math.abs(a.z);
        Vec3 helper = (ax <= ay && ax <= az) ? X : (ay <= az ? Y : Z);
        return helper.minus(a.times(helper.dot(a))).normalized();
    }
}
