package org.exitance.geometry.viewfactor;

import org.apache.commons.math3.dfp.Dfp;
import org.apache.commons.math3.dfp.DfpField;
import org.apache.commons.math3.dfp.DfpMath;

/**
 * Closed-form configuration factors evaluated with 40 significant digits (Commons Math
 * {@link Dfp}), so that expected values keep full double precision where the double formula
 * cancels (very long or very thin rectangles). Same formulas as {@link ClosedForms}.
 */
final class HighPrecisionForms {

    private static final DfpField F = new DfpField(40);

    private HighPrecisionForms() {
    }

    private static Dfp d(double v) {
        return F.newDfp(v);
    }

    private static Dfp atan(Dfp x) {
        // DfpMath.atan is accurate for all arguments; keep the argument reduction explicit for |x| > 1
        if (x.abs().greaterThan(F.getOne())) {
            Dfp half = F.getPi().divide(2);
            Dfp r = half.subtract(DfpMath.atan(F.getOne().divide(x.abs())));
            return x.negativeOrNull() ? r.negate() : r;
        }
        return DfpMath.atan(x);
    }

    /** Howell's catalog C-11 (directly opposed parallel rectangles a × b at spacing c). */
    static double parallelRectangles(double a, double b, double c) {
        Dfp x = d(a).divide(d(c)), y = d(b).divide(d(c)), one = F.getOne();
        Dfp x2 = one.add(x.multiply(x)), y2 = one.add(y.multiply(y));
        Dfp sx = x2.sqrt(), sy = y2.sqrt();
        Dfp t = DfpMath.log(x2.multiply(y2).divide(one.add(x.multiply(x)).add(y.multiply(y)))).divide(2)
                .add(x.multiply(sy).multiply(atan(x.divide(sy))))
                .add(y.multiply(sx).multiply(atan(y.divide(sx))))
                .subtract(x.multiply(atan(x))).subtract(y.multiply(atan(y)));
        return t.multiply(2).divide(F.getPi().multiply(x).multiply(y)).toDouble();
    }

    /** Howell's catalog C-14 (perpendicular rectangles, common edge x, emitter width y, receiver height z). */
    static double perpendicularRectangles(double xv, double yv, double zv) {
        Dfp one = F.getOne();
        Dfp h = d(zv).divide(d(xv)), w = d(yv).divide(d(xv));
        Dfp h2 = h.multiply(h), w2 = w.multiply(w), s = h2.add(w2).sqrt();
        Dfp log = DfpMath.log(one.add(w2).multiply(one.add(h2)).divide(one.add(w2).add(h2)))
                .add(w2.multiply(DfpMath.log(w2.multiply(one.add(w2).add(h2)).divide(one.add(w2).multiply(w2.add(h2))))))
                .add(h2.multiply(DfpMath.log(h2.multiply(one.add(h2).add(w2)).divide(one.add(h2).multiply(h2.add(w2))))));
        Dfp v = w.multiply(atan(one.divide(w))).add(h.multiply(atan(one.divide(h))))
                .subtract(s.multiply(atan(one.divide(s)))).add(log.divide(4));
        return v.divide(F.getPi().multiply(w)).toDouble();
    }
}
