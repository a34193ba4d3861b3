package org.exitance.geometry;

import org.apache.commons.math3.geometry.euclidean.threed.Rotation;
import org.apache.commons.math3.geometry.euclidean.threed.RotationConvention;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;

/**
 * A rigid motion p ↦ R p + t: a rotation R followed by a translation t (m).
 *
 * <p>Rotations are built from an axis and an angle (right-hand rule, radians) with Apache Commons
 * Math's {@link Rotation} in the vector-operator convention. Immutable.
 */
public final class Transform {

    private static final Transform IDENTITY = new Transform(new double[] {1, 0, 0, 0, 1, 0, 0, 0, 1}, Vec3.ZERO);

    private final double[] r; // row-major 3×3
    private final Vec3 t;

    private Transform(double[] r, Vec3 t) {
        this.r = r;
        this.t = t;
    }

    /** @return the identity */
    public static Transform identity() {
        return IDENTITY;
    }

    /**
     * @param offset translation (m)
     * @return p ↦ p + offset
     */
    public static Transform translation(Vec3 offset) {
        return new Transform(IDENTITY.r.clone(), offset);
    }

    /**
     * Rotation about an axis through the origin.
     *
     * @param axis rotation axis (any non-zero length)
     * @param angleRad angle (rad), counter-clockwise looking down the axis toward the origin
     * @return p ↦ R p
     */
    public static Transform rotation(Vec3 axis, double angleRad) {
        Rotation rot = new Rotation(new Vector3D(axis.x(), axis.y(), axis.z()), angleRad,
                RotationConvention.VECTOR_OPERATOR);
        double[][] m = rot.getMatrix();
        return new Transform(new double[] {m[0][0], m[0][1], m[0][2], m[1][0], m[1][1], m[1][2], m[2][0], m[2][1], m[2][2]},
                Vec3.ZERO);
    }

    /**
     * Rotation about an axis through a given point.
     *
     * @param pivot a point on the axis (m)
     * @param axis axis direction
     * @param angleRad angle (rad)
     * @return p ↦ R (p − pivot) + pivot
     */
    public static Transform rotation(Vec3 pivot, Vec3 axis, double angleRad) {
        return translation(pivot.times(-1)).then(rotation(axis, angleRad)).then(translation(pivot));
    }

    /**
     * @param next the motion applied after this one
     * @return the composition: first this, then {@code next}
     */
    public Transform then(Transform next) {
        double[] m = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double s = 0;
                for (int k = 0; k < 3; k++) {
                    s += next.r[3 * i + k] * r[3 * k + j];
                }
                m[3 * i + j] = s;
            }
        }
        return new Transform(m, next.applyLinear(t).plus(next.t));
    }

    /** @return R p + t for a point p (m) */
    public Vec3 apply(Vec3 p) {
        return applyLinear(p).plus(t);
    }

    /** @return R d for a direction d (no translation) */
    public Vec3 applyLinear(Vec3 d) {
        return new Vec3(r[0] * d.x() + r[1] * d.y() + r[2] * d.z(),
                r[3] * d.x() + r[4] * d.y() + r[5] * d.z(),
                r[6] * d.x() + r[7] * d.y() + r[8] * d.z());
    }
}
