package org.exitance.geometry.viewfactor;

import org.exitance.geometry.*;
import org.junit.jupiter.api.Test;

class ScratchAspectTest { static int ORDER = Integer.getInteger("ord", 6);
    @Test
    void aspect() {
        for (double len : new double[] {1e3, 1e4, 1e5, 1e6}) {
            Facet a = ContourIntegralTest.rect(Vec3.ZERO, new Vec3(len, 0, 0), Vec3.Y);
            Facet b = ContourIntegralTest.rect(new Vec3(0, 0, 1), Vec3.Y, new Vec3(len, 0, 0));
            double f = calc(a, b, ORDER);
            double e = HighPrecisionForms.parallelRectangles(len, 1, 1);
            System.out.printf("par len=%g f=%.17g e=%.17g dbl=%.17g rel=%.3g%n", len, f, e, ClosedForms.parallelRectangles(len,1,1), (f - e) / e);
            Facet c = ContourIntegralTest.rect(Vec3.ZERO, new Vec3(len, 0, 0), Vec3.Y);
            Facet d = ContourIntegralTest.rect(Vec3.ZERO, Vec3.Z, new Vec3(len, 0, 0));
            f = calc(c, d, ORDER);
            e = HighPrecisionForms.perpendicularRectangles(len, 1, 1);
            System.out.printf("perp long edge len=%g f=%.17g e=%.17g rel=%.3g%n", len, f, e, (f - e) / e);
            double w = 1 / len;
            c = ContourIntegralTest.rect(Vec3.ZERO, Vec3.X, new Vec3(0, w, 0));
            d = ContourIntegralTest.rect(Vec3.ZERO, new Vec3(0, 0, w), Vec3.X);
            f = calc(c, d, ORDER);
            e = HighPrecisionForms.perpendicularRectangles(1, w, w);
            System.out.printf("perp thin w=%g f=%.17g e=%.17g rel=%.3g%n", w, f, e, (f - e) / e);
            a = ContourIntegralTest.rect(Vec3.ZERO, Vec3.X, new Vec3(0, w, 0));
            b = ContourIntegralTest.rect(new Vec3(0, 0, 1), new Vec3(0, w, 0), Vec3.X);
            f = calc(a, b, ORDER);
            e = HighPrecisionForms.parallelRectangles(1, w, 1);
            System.out.printf("par thin w=%g f=%.17g e=%.17g rel=%.3g%n", w, f, e, (f - e) / e);
        }
    }

    static double calc(Facet a, Facet b, int order) {
        Scene s = Scene.builder().add(new Surface("a", java.util.List.of(a))).add(new Surface("b", java.util.List.of(b))).build();
        return ViewFactorCalculator.compute(s, new ViewFactorOptions(1, 1e-7, order, 2, Obstruction.AUTO, Smoothing.NONE), ProgressListener.NONE).facetFactor(0, 1);
    }
}
