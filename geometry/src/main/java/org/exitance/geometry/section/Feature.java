package org.exitance.geometry.section;

/**
 * What fixes one edge of a visible angular interval seen from a point s of an emitter, and
 * the length G(s) of the taut string that goes with it (m). Every G satisfies
 * dG/ds = −sin φ, with φ the angle of the edge direction from the emitter's normal, measured
 * toward its parameter tangent; so ½ ∫ (sin φ_hi − sin φ_lo) ds = ½ [ΔG_lo − ΔG_hi] over any
 * stretch where the same features fix the edges (Hottel's crossed strings; Modest, Radiative
 * Heat Transfer, 3rd ed., §4.7).
 *
 * <ul>
 * <li>POINT (an end point P): G = |P − s|, a straight string.</li>
 * <li>TANGENT (tangent to a circle, centre c, radius r, the centre on side κ = ±1 of the
 * direction, +1 = left): the string runs from s to the tangent point T and on around the circle,
 * G = √(|s − c|² − r²) − κ r θ_T, θ_T = angle of T about c, unwrapped along the stretch
 * (tangent segment plus arc).</li>
 * <li>HORIZON (the emitter's own tangent, φ = ±π/2, a string wrapped on a convex emitter):
 * G = ∓(arc length of s).</li>
 * </ul>
 */
final class Feature {
    static final int POINT = 0, TANGENT = 1, HORIZON = 2;

    /** identity for comparing the interval structure at two points: owner piece × 8 + code */
    final long id;
    final int kind;
    /** point, or circle centre (m) */
    final double x, y;
    /** circle radius (m), TANGENT only */
    final double r;
    /** κ for TANGENT, the sign of φ for HORIZON */
    final int sign;

    private Feature(long id, int kind, double x, double y, double r, int sign) {
        this.id = id;
        this.kind = kind;
        this.x = x;
        this.y = y;
        this.r = r;
        this.sign = sign;
    }

    static Feature point(int owner, int end, double x, double y) {
        return new Feature(owner * 8L + end, POINT, x, y, 0, 0);
    }

    static Feature tangent(int owner, double cx, double cy, double r, int kappa) {
        return new Feature(owner * 8L + (kappa > 0 ? 2 : 3), TANGENT, cx, cy, r, kappa);
    }

    static Feature horizon(int sign) {
        return new Feature(-1 - (sign > 0 ? 1 : 0), HORIZON, 0, 0, 0, sign);
    }

    /** Angle (rad) of the tangent point about the centre for a point (sx, sy) outside the circle. */
    double tangentAngle(double sx, double sy) {
        double dx = sx - x, dy = sy - y;
        double rho = Math.hypot(dx, dy);
        return Math.atan2(dy, dx) + sign * Math.acos(Math.min(1, r / rho));
    }

    /**
     * Change of G between two parameters of the emitter.
     *
     * @param e the emitter
     * @param ua start parameter in [0, 1]
     * @param ub end parameter in [0, 1]
     * @return G(ub) − G(ua) (m)
     */
    double deltaG(Piece e, double ua, double ub) {
        double ax = e.px(ua), ay = e.py(ua), bx = e.px(ub), by = e.py(ub);
        switch (kind) {
            case POINT:
                return Math.hypot(x - bx, y - by) - Math.hypot(x - ax, y - ay);
            case HORIZON:
                return -sign * (ub - ua) * e.length;
            default:
                double ta = Math.sqrt(Math.max(0, sq(ax - x) + sq(ay - y) - r * r));
                double tb = Math.sqrt(Math.max(0, sq(bx - x) + sq(by - y) - r * r));
                return tb - ta - sign * r * unwrapped(e, ua, ub, 0);
        }
    }

    /** Continuous change of the tangent angle over [ua, ub], halving until each step is small. */
    private double unwrapped(Piece e, double ua, double ub, int depth) {
        double d = wrap(tangentAngle(e.px(ub), e.py(ub)) - tangentAngle(e.px(ua), e.py(ua)));
        if (Math.abs(d) < 0.5 || depth > 40) {
            return d;
        }
        double m = 0.5 * (ua + ub);
        return unwrapped(e, ua, m, depth + 1) + unwrapped(e, m, ub, depth + 1);
    }

    static double wrap(double a) {
        return a - 2 * Math.PI * Math.rint(a / (2 * Math.PI));
    }

    private static double sq(double v) {
        return v * v;
    }
}
