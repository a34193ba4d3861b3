package org.exitance.geometry.viewfactor;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.exitance.geometry.*;
import org.junit.jupiter.api.Test;

class ScratchAngleTest { static int ORDER = Integer.getInteger("ord", 6);
    static double ref(double len, double w1, double w2, double phi) {
        double cp = Math.cos(phi), s2 = Math.sin(phi) * Math.sin(phi);
        double split = Math.atan2(w2, w1);
        org.apache.commons.math3.analysis.UnivariateFunction f1 = al -> term(al, len, cp, w1 / Math.cos(al));
        org.apache.commons.math3.analysis.UnivariateFunction f2 = al -> term(al, len, cp, w2 / Math.sin(al));
        IterativeLegendreGaussIntegrator in = new IterativeLegendreGaussIntegrator(24, 1e-15, 1e-300);
        double v = in.integrate(Integer.MAX_VALUE, f1, 0, split) + in.integrate(Integer.MAX_VALUE, f2, split, Math.PI / 2);
        return len * s2 / Math.PI * v / (len * w1);
    }
    static double term(double al, double len, double cp, double r) {
        double g = Math.sqrt(1 - Math.sin(2 * al) * cp);
        double a = len / g;
        return Math.cos(al) * Math.sin(al) / (g * g * g) * (r * Math.atan(a / r) + 0.5 * a * Math.log1p(r * r / (a * a)));
    }
    static Facet oriented(Facet f, Vec3 toward) {
        return f.normal().dot(toward.minus(f.centroid())) > 0 ? f : f.reversed();
    }
    @Test
    void angle() {
        System.out.printf("check C-14 %.17g %.17g%n", ref(1, 1, 1, Math.PI / 2), HighPrecisionForms.perpendicularRectangles(1, 1, 1));
        System.out.printf("check C-14 %.17g %.17g%n", ref(2, 0.3, 5, Math.PI / 2), HighPrecisionForms.perpendicularRectangles(2, 0.3, 5));
        double phi = Math.toRadians(120);
        for (double[] d : new double[][] {{20, 0.1, 0.1}, {0.1, 20, 20}, {20, 0.1, 20}, {0.1, 20, 0.1}, {1, 1, 1}}) {
            double len = d[0], w1 = d[1], w2 = d[2];
            Vec3 e2 = new Vec3(0, Math.cos(phi), Math.sin(phi)).times(w2);
            Facet a = ContourIntegralTest.rect(Vec3.ZERO, new Vec3(len, 0, 0), new Vec3(0, w1, 0));
            Facet b = ContourIntegralTest.rect(Vec3.ZERO, e2, new Vec3(len, 0, 0));
            a = oriented(a, b.centroid());
            b = oriented(b, a.centroid());
            double f = calc(a, b, ORDER);
            double e = ref(len, w1, w2, phi);
            System.out.printf("L=%g w1=%g w2=%g f=%.17g e=%.17g rel=%.3g%n", len, w1, w2, f, e, (f - e) / e);
        }
    }

    static double calc(Facet a, Facet b, int order) {
        Scene s = Scene.builder().add(new Surface("a", java.util.List.of(a))).add(new Surface("b", java.util.List.of(b))).build();
        return ViewFactorCalculator.compute(s, new ViewFactorOptions(1, 1e-7, order, 2, Obstruction.AUTO, Smoothing.NONE), ProgressListener.NONE).facetFactor(0, 1);
    }
}
