package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.junit.jupiter.api.Test;

class ContourIntegralTest {

    static double contour(Facet a, Facet b, int order) {
        Scene s = Scene.builder().add(new Surface("a", List.of(a))).add(new Surface("b", List.of(b))).build();
        FacetTable t = new FacetTable(s, 2);
        Poly p = new Poly(), q = new Poly();
        p.load(t, 0);
        q.load(t, 1);
        return new ContourIntegral().exchangeArea(p, q, order) / a.area();
    }

    static Facet rect(Vec3 o, Vec3 u, Vec3 v) {
        return Facet.of(o, o.plus(u), o.plus(u).plus(v), o.plus(v));
    }

    @Test
    void parallelUnitSquaresOneApart() {
        Facet a = rect(Vec3.ZERO, Vec3.X, Vec3.Y);
        Facet b = rect(new Vec3(0, 0, 1), Vec3.Y, Vec3.X);
        double f = contour(a, b, 8);
        // Howell catalog C-11; check value 0.1998 (from memory)
        assertThat(f).isCloseTo(ClosedForms.parallelRectangles(1, 1, 1), within(1e-10));
        assertThat(f).isCloseTo(0.1998, within(1e-4));
    }

    @Test
    void perpendicularUnitSquaresCommonEdge() {
        Facet a = rect(Vec3.ZERO, Vec3.X, Vec3.Y);          // z = 0, normal +z
        Facet b = rect(Vec3.ZERO, Vec3.Z, Vec3.X);          // y = 0, normal +y
        double f = contour(a, b, 8);
        assertThat(f).isCloseTo(ClosedForms.perpendicularRectangles(1, 1, 1), within(1e-10));
        assertThat(f).isCloseTo(0.2000, within(1e-4));
    }

    @Test
    void parallelRectanglesFromNearToFarMatchCatalogCaseC11() {
        for (double c : new double[] {1e-3, 0.01, 0.1, 0.5, 1, 3, 10}) {
            Facet a = rect(Vec3.ZERO, new Vec3(2, 0, 0), Vec3.Y);
            Facet b = rect(new Vec3(0, 0, c), Vec3.Y, new Vec3(2, 0, 0));
            // Howell catalog C-11 / Incropera 6th ed. Table 13.2
            assertThat(contour(a, b, 6)).as("c=%s", c).isCloseTo(ClosedForms.parallelRectangles(2, 1, c), within(1e-9));
        }
    }

    @Test
    void perpendicularRectanglesOverManyAspectRatiosMatchCatalogCaseC14() {
        for (double z : new double[] {1e-3, 0.01, 0.1, 1, 10}) {
            for (double y : new double[] {0.01, 1, 10}) {
                Facet a = rect(Vec3.ZERO, Vec3.X, new Vec3(0, y, 0));
                Facet b = rect(Vec3.ZERO, new Vec3(0, 0, z), Vec3.X);
                // Howell catalog C-14 / Incropera 6th ed. Table 13.2
                double e = ClosedForms.perpendicularRectangles(1, y, z);
                // strips down to 1:1000 aspect: relative error below 2e-8
                assertThat(contour(a, b, 6)).as("y=%s z=%s", y, z).isCloseTo(e, within(2e-8 * e));
            }
        }
    }

    @Test
    void longStripsApproachHottelsCrossedStrings() {
        double len = 200;
        // parallel opposed strips of width 1 at spacing 1: sqrt(2) − 1 (Hottel's crossed strings;
        // Siegel & Howell 4th ed. §5.5); the finite-length formula converges to it as 1/len
        Facet a = rect(Vec3.ZERO, new Vec3(len, 0, 0), Vec3.Y);
        Facet b = rect(new Vec3(0, 0, 1), Vec3.Y, new Vec3(len, 0, 0));
        double f = contour(a, b, 6);
        assertThat(f).isCloseTo(ClosedForms.parallelRectangles(len, 1, 1), within(1e-9));
        assertThat(f).isCloseTo(Math.sqrt(2) - 1, within(2.0 / len));
        // perpendicular strips sharing an edge: (1 + 1 − √2)/2 = 1 − √2/2 (crossed strings)
        Facet c = rect(Vec3.ZERO, new Vec3(len, 0, 0), Vec3.Y);
        Facet d = rect(Vec3.ZERO, Vec3.Z, new Vec3(len, 0, 0));
        assertThat(contour(c, d, 6)).isCloseTo(1 - Math.sqrt(0.5), within(2.0 / len));
    }

    @Test
    void collinearLogIntegralClosedFormMatchesQuadrature() {
        // ∫_0^1 ∫_{0.5}^{2} ln|x − y| dy dx by G(u) = u² ln|u|/2 − 3u²/4 against Commons Math
        double exact = ContourIntegral.g(1 - 0.5) - ContourIntegral.g(0 - 0.5) - ContourIntegral.g(1 - 2) + ContourIntegral.g(0 - 2);
        double num = integrate(x -> {
            if (x <= 0.5) {
                return integrate(y -> Math.log(Math.abs(x - y)), 0.5, 2);
            }
            return integrate(y -> Math.log(Math.abs(x - y)), 0.5, x) + integrate(y -> Math.log(Math.abs(x - y)), x, 2);
        }, 0, 1);
        assertThat(exact).isCloseTo(num, within(1e-6));
    }

    private static double integrate(org.apache.commons.math3.analysis.UnivariateFunction f, double lo, double hi) {
        return new org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator(16, 1e-8, 1e-8)
                .integrate(Integer.MAX_VALUE, f, lo, hi);
    }
}
