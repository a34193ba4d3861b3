package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/** The contour kernel at its limits: touching clipped facets, extreme aspect ratios, oblique common edges. */
class KernelNumericsTest {

    private static final IterativeLegendreGaussIntegrator QUAD = new IterativeLegendreGaussIntegrator(24, 1e-15, 1e-300);

    static double factor(Facet a, Facet b) {
        Scene s = Scene.builder().add(new Surface("a", List.of(a))).add(new Surface("b", List.of(b))).build();
        return ViewFactorCalculator.compute(s, ViewFactorOptions.defaults().withThreads(1), ProgressListener.NONE)
                .facetFactor(0, 1);
    }

    static Facet rect(Vec3 o, Vec3 u, Vec3 v) {
        return Facet.of(o, o.plus(u), o.plus(u).plus(v), o.plus(v));
    }

    static Facet facing(Facet f, Vec3 toward) {
        return f.normal().dot(toward.minus(f.centroid())) > 0 ? f : f.reversed();
    }

    /** The same polygons without their exact patches (plain facets, as from a mesh file). */
    static List<Facet> plain(List<Facet> f) {
        List<Facet> out = new java.util.ArrayList<>();
        f.forEach(x -> out.add(Facet.ofCoordinates(x.coordinates())));
        return out;
    }

    @Test
    void cylinderStandingOnAWideAnnulusGivesFiniteFactors() {
        // formerly NaN: clipping a polygonal wall facet's neighbour left a zero-length edge
        for (double outer : new double[] {30, 50, 100}) {
            for (int az : new int[] {8, 16, 32}) {
                Scene s = Scene.builder()
                        .add("cylinder", plain(Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, 1, 1, az, 2, Facing.OUTWARD)))
                        .add("annulus", plain(Shapes.annulus(Vec3.ZERO, Vec3.Z, 1, outer, 2, az))).build();
                checkFinite(ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE), outer, az);
            }
        }
        // and the exact curved shapes of the builders
        Scene s = Scene.builder().add("cylinder", Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, 1, 1, 8, 1, Facing.OUTWARD))
                .add("annulus", Shapes.annulus(Vec3.ZERO, Vec3.Z, 1, 30, 1, 8)).build();
        checkFinite(ViewFactorCalculator.compute(s, ViewFactorOptions.defaults().withCurvedPatches(true), ProgressListener.NONE), 30, 8);
    }

    private static void checkFinite(ViewFactorResult r, double outer, int az) {
        int n = r.facetCount();
        double[] area = r.facetAreas();
        for (int i = 0; i < n; i++) {
            double row = 0;
            for (int j = 0; j < n; j++) {
                double f = r.facetFactor(i, j);
                assertThat(Double.isFinite(f)).as("F[%d][%d] outer=%s az=%d", i, j, outer, az).isTrue();
                assertThat(f).isGreaterThanOrEqualTo(0);
                // reciprocity A_i F_ij = A_j F_ji (common practice)
                assertThat(area[i] * f).isCloseTo(area[j] * r.facetFactor(j, i), within(1e-12 * area[i]));
                row += f;
            }
            assertThat(row).isLessThanOrEqualTo(1 + 1e-9);
        }
        // the wall faces sideways: it sees less than half of the plane at its foot
        assertThat(r.surfaceFactor(0, 1)).isBetween(0.0, 0.5);
    }

    @Test
    void rectanglesOfAspectRatioOneMillionKeepTheirPrecision() {
        double len = 1e6, w = 1e-6;
        // Howell's catalog C-11 / C-14, evaluated with 40 digits (HighPrecisionForms)
        Facet a = rect(Vec3.ZERO, new Vec3(len, 0, 0), Vec3.Y);
        Facet b = rect(new Vec3(0, 0, 1), Vec3.Y, new Vec3(len, 0, 0));
        double e = HighPrecisionForms.parallelRectangles(len, 1, 1);
        assertThat(factor(a, b)).isCloseTo(e, within(1e-9 * e));
        Facet c = rect(Vec3.ZERO, new Vec3(len, 0, 0), Vec3.Y);
        Facet d = rect(Vec3.ZERO, Vec3.Z, new Vec3(len, 0, 0));
        e = HighPrecisionForms.perpendicularRectangles(len, 1, 1);
        assertThat(factor(c, d)).isCloseTo(e, within(1e-9 * e));
        Facet g = rect(Vec3.ZERO, Vec3.X, new Vec3(0, w, 0));
        Facet h = rect(Vec3.ZERO, new Vec3(0, 0, w), Vec3.X);
        e = HighPrecisionForms.perpendicularRectangles(1, w, w);
        assertThat(factor(g, h)).isCloseTo(e, within(1e-9 * e));
        // thin strips 1 × 1e-6 facing each other at spacing 1: the contour sum would cancel to
        // 2e-4; the pair is split until its parts are far, then integrated by area
        Facet k = rect(Vec3.ZERO, Vec3.X, new Vec3(0, w, 0));
        Facet m = rect(new Vec3(0, 0, 1), new Vec3(0, w, 0), Vec3.X);
        e = HighPrecisionForms.parallelRectangles(1, w, 1);
        assertThat(factor(k, m)).isCloseTo(e, within(1e-8 * e));
    }

    /**
     * Two rectangles with a common edge of length L and widths w1, w2 at an included angle φ.
     * Reference derived here, independently of the code: with s, t the distances from the common
     * edge, cos θ1 cos θ2 / r² = s t sin²φ / r⁴ and r² = u² + c², c² = s² + t² − 2st cos φ; the
     * integral over both edge coordinates is ∫∫ du/(u² + c²)² = L atan(L/c)/c³ (elementary); in
     * polar coordinates s = ρ cos α, t = ρ sin α the ρ-integral is elementary too, leaving one
     * integral over α done by Commons Math Gauss–Legendre to 1e-15. Checked against C-14 at 90°.
     */
    static double angledRectangles(double len, double w1, double w2, double phi) {
        double cp = Math.cos(phi), s2 = Math.sin(phi) * Math.sin(phi);
        double split = Math.atan2(w2, w1);
        UnivariateFunction f1 = al -> alphaTerm(al, len, cp, w1 / Math.cos(al));
        UnivariateFunction f2 = al -> alphaTerm(al, len, cp, w2 / Math.sin(al));
        double v = QUAD.integrate(Integer.MAX_VALUE, f1, 0, split) + QUAD.integrate(Integer.MAX_VALUE, f2, split, Math.PI / 2);
        return s2 / Math.PI * v / w1;
    }

    private static double alphaTerm(double al, double len, double cp, double rmax) {
        double g = Math.sqrt(1 - Math.sin(2 * al) * cp);
        double a = len / g;
        // ∫_0^R atan(a/ρ) dρ = R atan(a/R) + (a/2) ln(1 + R²/a²)
        return Math.cos(al) * Math.sin(al) / (g * g * g) * (rmax * Math.atan(a / rmax) + 0.5 * a * Math.log1p(rmax * rmax / (a * a)));
    }

    @Test
    void referenceForAngledRectanglesReproducesCatalogCaseC14() {
        // Howell's catalog C-14 (perpendicular, common edge), 40-digit evaluation
        assertThat(angledRectangles(1, 1, 1, Math.PI / 2)).isCloseTo(HighPrecisionForms.perpendicularRectangles(1, 1, 1), within(1e-14));
        assertThat(angledRectangles(2, 0.3, 5, Math.PI / 2)).isCloseTo(HighPrecisionForms.perpendicularRectangles(2, 0.3, 5), within(1e-14));
    }

    @Test
    void rectanglesWithACommonEdgeAt120DegreesMatchTheIntegral() {
        double phi = Math.toRadians(120);
        // {common edge, width 1, width 2}: 0.1 m × 20 m both ways round, and mixed
        for (double[] d : new double[][] {{20, 0.1, 0.1}, {0.1, 20, 20}, {20, 0.1, 20}, {0.1, 20, 0.1}, {1, 1, 1}}) {
            Vec3 e2 = new Vec3(0, Math.cos(phi), Math.sin(phi)).times(d[2]);
            Facet a = rect(Vec3.ZERO, new Vec3(d[0], 0, 0), new Vec3(0, d[1], 0));
            Facet b = rect(Vec3.ZERO, e2, new Vec3(d[0], 0, 0));
            a = facing(a, b.centroid());
            b = facing(b, a.centroid());
            double e = angledRectangles(d[0], d[1], d[2], phi);
            assertThat(factor(a, b)).as("L=%s w1=%s w2=%s", d[0], d[1], d[2]).isCloseTo(e, within(1e-9 * e));
        }
    }

    @Test
    void edgeIntegralsInClosedFormMatchQuadrature() {
        // segments from one point at angle φ: J(a, b, cos φ) against Commons Math over the
        // closed-form inner integral
        for (double[] d : new double[][] {{1, 1, 0.5}, {1, 1, -0.5}, {2, 0.3, 0.2}, {0.3, 2, -0.9}}) {
            double a = d[0], b = d[1], c = d[2];
            // s = a u³ removes the s ln s end behaviour for the quadrature
            IterativeLegendreGaussIntegrator in = new IterativeLegendreGaussIntegrator(24, 1e-13, 1e-15);
            double num = in.integrate(Integer.MAX_VALUE, u -> 3 * a * u * u * ContourIntegral.inner(a * u * u * u, 0, 0,
                    new double[] {0, 0, 0}, 0, c, Math.sqrt(1 - c * c), 0, b), 0, 1);
            assertThat(ContourIntegral.commonVertex(a, b, c)).isCloseTo(num, within(1e-11));
        }
        // parallel segments [0, 1] and [0.3, 2.5] at distance 0.4: F(u; h) four-term form
        double h = 0.4;
        double exact = ContourIntegral.f(1 - 0.3, h) - ContourIntegral.f(-0.3, h) - ContourIntegral.f(1 - 2.5, h)
                + ContourIntegral.f(-2.5, h);
        // inner integral by the antiderivative H of ln(u² + h²) (tested above through J), outer numerically
        IterativeLegendreGaussIntegrator outer = new IterativeLegendreGaussIntegrator(24, 1e-13, 1e-15);
        double num = outer.integrate(Integer.MAX_VALUE,
                x -> 0.5 * (ContourIntegral.bigH(2.5 - x, h) - ContourIntegral.bigH(0.3 - x, h)), 0, 1);
        assertThat(exact).isCloseTo(num, within(1e-12));
    }
}
