package org.exitance.geometry.shape;

import org.exitance.geometry.Vec3;

/**
 * A right-handed orthonormal frame (u, v, a) about an axis a, used to place curved primitives.
 * u is chosen deterministically by {@link Vec3#anyPerpendicular}; v = a × u.
 */
record Frame(Vec3 origin, Vec3 u, Vec3 v, Vec3 a) {

    static Frame about(Vec3 origin, Vec3 axis) {
        Vec3 a = axis.normalized();
        Vec3 u = Vec3.anyPerpendicular(a);
        return new Frame(origin, u, a.cross(u), a);
    }

    /** @return origin + along·a + r (cos φ u + sin φ v) */
    Vec3 at(double r, double phiRad, double along) {
        double c = Math.cos(phiRad), s = Math.sin(phiRad);
        return new Vec3(origin.x() + along * a.x() + r * (c * u.x() + s * v.x()),
                origin.y() + along * a.y() + r * (c * u.y() + s * v.y()),
                origin.z() + along * a.z() + r * (c * u.z() + s * v.z()));
    }
}
