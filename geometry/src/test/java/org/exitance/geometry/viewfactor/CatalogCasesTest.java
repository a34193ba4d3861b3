package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/** Surface view factors of meshed shapes against closed forms. */
class CatalogCasesTest {

    static ViewFactorResult compute(Scene s) {
        return ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
    }

    static List<Facet> reversed(List<Facet> f) {
        List<Facet> r = new ArrayList<>();
        f.forEach(x -> r.add(x.reversed()));
        return r;
    }

    @Test
    void coaxialDiscsOfRadiusEqualToSpacingExchangeTheGoldenRatioValue() {
        int n = 120; // single 120-gon facets: area within 5e-4 of the circle
        List<Vec3> ring = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            ring.add(new Vec3(Math.cos(2 * Math.PI * k / n), Math.sin(2 * Math.PI * k / n), 0));
        }
        List<Facet> bottom = Shapes.convexPolygon(ring, 1);
        List<Facet> top = new ArrayList<>();
        for (Facet f : bottom) {
            top.add(f.transformed(org.exitance.geometry.Transform.translation(Vec3.Z)).reversed());
        }
        ViewFactorResult r = compute(Scene.builder().add("a", bottom).add("b", top).build());
        // Incropera 6th ed. Table 13.2 coaxial parallel disks; (3 − √5)/2 = 0.38197 from memory
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(ClosedForms.coaxialDiscs(1, 1, 1), within(1e-3));
        assertThat(r.surfaceFactor(0, 1)).isCloseTo((3 - Math.sqrt(5)) / 2, within(1e-3));
        // unequal discs, meshed: ri = 0.5, rj = 1, spacing 0.5
        List<Facet> small = Shapes.disc(Vec3.ZERO, Vec3.Z, 0.5, 3, 48);
        List<Facet> big = reversed(Shapes.disc(new Vec3(0, 0, 0.5), Vec3.Z, 1, 3, 48));
        ViewFactorResult r2 = compute(Scene.builder().add("a", small).add("b", big).build());
        assertThat(r2.surfaceFactor(0, 1)).isCloseTo(ClosedForms.coaxialDiscs(0.5, 1, 0.5), within(3e-3));
    }

    @Test
    void sphereToCoaxialDiscMatchesClosedForm() {
        double h = 2, a = 1.5;
        List<Facet> sphere = Shapes.sphere(Vec3.ZERO, 0.5, 24, 48, Facing.OUTWARD);
        List<Facet> disc = reversed(Shapes.disc(new Vec3(0, 0, h), Vec3.Z, a, 6, 48));
        ViewFactorResult r = compute(Scene.builder().add("sphere", sphere).add("disc", disc).build());
        // sphere to coaxial disc: F = ½ [1 − 1/√(1 + (a/h)²)] (Siegel & Howell 4th ed. Appendix C / Howell's catalog, from memory)
        double exact = 0.5 * (1 - 1 / Math.sqrt(1 + (a / h) * (a / h)));
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(exact, within(0.01 * exact));
    }

    @Test
    void concentricPrismsApproachTheTwoDimensionalValueAndOuterSeesItself() {
        int n = 12;
        double r1 = 0.5, r2 = 1, len = 30;
        // exact cylinder patches: the divisions need not resolve the shape, only keep the run short
        List<Facet> inner = Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, r1, len, n, 5, Facing.OUTWARD);
        List<Facet> outer = Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, r2, len, n, 5, Facing.INWARD);
        ViewFactorResult r = compute(Scene.builder().add("inner", inner).add("outer", outer).build());
        // long concentric cylinders: F_21 = r1/r2, F_22 = 1 − r1/r2 (Incropera 6th ed. Table 13.1);
        // open ends lose O(r/len)
        assertThat(r.surfaceFactor(1, 0)).isCloseTo(r1 / r2, within(0.03));
        assertThat(r.surfaceFactor(1, 1)).isCloseTo(1 - r1 / r2, within(0.03));
        assertThat(r.surfaceFactor(1, 1)).isPositive();
        assertThat(r.surfaceFactor(0, 0)).isZero();
        // the other order on its own: the convex inner prism sees only the outer, F_12 = 1 (same
        // table), less what leaves through the open ends
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(1, within(0.03));
    }

    @Test
    void closedCylindricalCavityClosesAndItsWallSeesItself() {
        List<Surface> cav = Enclosures.cylindricalCavity(Vec3.ZERO, Vec3.Z, 1, 1, 16, 4, 2);
        ViewFactorResult r = compute(Scene.of(cav));
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-6);
        assertThat(r.surfaceFactor(0, 0)).isPositive();
        assertThat(r.methodCounts().partlyHidden() + r.methodCounts().hidden()).isZero();
        // base to lid: coaxial discs of radius = spacing, 0.38197 for the round shape (from memory);
        // the 16-gon differs by a few percent
        assertThat(r.surfaceFactor(1, 2)).isCloseTo((3 - Math.sqrt(5)) / 2, within(0.03));
    }

    @Test
    void rectangularBoxesOfSeveralAspectRatiosConvergeToCatalogFactors() {
        double[][] dims = {{1, 2, 0.25}, {3, 1, 1}, {0.2, 0.2, 4}};
        for (double[] d : dims) {
            Scene s = Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(d[0], d[1], d[2]), 3, 3, 3));
            ViewFactorResult r = compute(s);
            // bottom (d0 × d1) to top at spacing d2: catalog C-11; bottom to front (common edge along x): C-14
            assertThat(r.surfaceFactor(s.indexOf("bottom"), s.indexOf("top")))
                    .isCloseTo(ClosedForms.parallelRectangles(d[0], d[1], d[2]), within(1e-7));
            assertThat(r.surfaceFactor(s.indexOf("bottom"), s.indexOf("front")))
                    .isCloseTo(ClosedForms.perpendicularRectangles(d[0], d[1], d[2]), within(1e-7));
            assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-6);
        }
    }
}
