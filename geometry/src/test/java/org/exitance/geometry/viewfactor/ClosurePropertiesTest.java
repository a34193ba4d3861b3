package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;
import org.exitance.geometry.Facet;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Shapes;

/**
 * Summation Σ_j F_ij = 1 (Siegel &amp; Howell 4th ed. §4.4; common practice), and both orders
 * F_ij, F_ji of facet pairs against an independent integral over each emitter (reciprocity then
 * follows from independent numbers), on random closed convex polyhedra: frusta of random convex polygons, faces
 * subdivided, radiating inward.
 */
class ClosurePropertiesTest {

    static Scene frustum(long seed, int sides, int div) {
        Random rnd = new Random(seed);
        double[] ang = new double[sides];
        for (int k = 0; k < sides; k++) {
            ang[k] = 2 * Math.PI * (k + 0.2 + 0.6 * rnd.nextDouble()) / sides;
        }
        double ax = 0.5 + rnd.nextDouble(), ay = 0.5 + rnd.nextDouble();
        double h = 0.3 + rnd.nextDouble(), s = 0.2 + 0.7 * rnd.nextDouble();
        double ox = 0.3 * (rnd.nextDouble() - 0.5), oy = 0.3 * (rnd.nextDouble() - 0.5);
        List<Vec3> base = new ArrayList<>(), top = new ArrayList<>();
        for (int k = 0; k < sides; k++) {
            double x = ax * Math.cos(ang[k]), y = ay * Math.sin(ang[k]);
            base.add(new Vec3(x, y, 0));
            top.add(new Vec3(ox + s * x, oy + s * y, h));
        }
        Scene.Builder b = Scene.builder();
        b.add("base", Shapes.convexPolygon(base, div)); // counter-clockwise from +z: faces inward (up)
        List<Vec3> topRev = new ArrayList<>(top);
        java.util.Collections.reverse(topRev);
        b.add("top", Shapes.convexPolygon(topRev, div));
        for (int k = 0; k < sides; k++) {
            int l = (k + 1) % sides;
            // side k: base_k, top_k, top_l, base_l is counter-clockwise seen from inside
            b.add("side" + k, Shapes.convexPolygon(List.of(base.get(k), top.get(k), top.get(l), base.get(l)), div));
        }
        return b.build();
    }

    @Property(tries = 12)
    void randomConvexPolyhedraCloseAndBothOrdersMatchAnIndependentIntegral(
            @ForAll @IntRange(min = 3, max = 7) int sides, @ForAll @IntRange(min = 1, max = 2) int div,
            @ForAll long seed) {
        Scene s;
        try {
            s = frustum(seed, sides, div);
        } catch (GeometryException e) {
            return; // rare random polygon with a too-short edge
        }
        ViewFactorResult r = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-6);
        // The calculator evaluates each pair once and writes both orders from it, so its matrix is
        // reciprocal by construction. Reciprocity checked instead: F_ij integrated over facet i and
        // F_ji over facet j, independently (IndependentFactor), each against the calculator's entry.
        List<Facet> f = s.facets();
        List<int[]> pairs = new ArrayList<>();
        for (int i = 0; i < f.size(); i++) {
            for (int j = i + 1; j < f.size(); j++) {
                if (!IndependentFactor.touch(f.get(i), f.get(j))) {
                    pairs.add(new int[] {i, j}); // facets of the base and the top never touch
                }
            }
        }
        java.util.Collections.shuffle(pairs, new Random(seed));
        int checked = 0;
        for (int[] pair : pairs) {
            if (checked == 6) {
                break;
            }
            int i = pair[0];
            int j = pair[1];
            // the reference is used only where it has converged: its 24- and 32-point rules agree
            // to 1e-9 (a close random pair can leave the 24-point rule 1e-5 off, seen once)
            double fij = IndependentFactor.factor(f.get(i), f.get(j), 24);
            double fji = IndependentFactor.factor(f.get(j), f.get(i), 24);
            if (Math.abs(IndependentFactor.factor(f.get(i), f.get(j), 32) - fij) > 1e-9 * Math.max(fij, 1e-3)
                    || Math.abs(IndependentFactor.factor(f.get(j), f.get(i), 32) - fji) > 1e-9 * Math.max(fji, 1e-3)) {
                continue;
            }
            // both orders by the independent integration: reciprocity to 1e-7 checks the reference
            assertThat(f.get(i).area() * fij).isCloseTo(f.get(j).area() * fji,
                    within(1e-7 * f.get(i).area() * Math.max(fij, 1e-3)));
            assertThat(r.facetFactor(i, j)).as("F[%d][%d]", i, j).isCloseTo(fij, within(1e-6 * Math.max(fij, 1e-3)));
            assertThat(r.facetFactor(j, i)).as("F[%d][%d]", j, i).isCloseTo(fji, within(1e-6 * Math.max(fji, 1e-3)));
            checked++;
        }
        assertThat(checked).isPositive();
        assertThat(r.surfaceClosure().maxRowSumError()).isLessThan(1e-6);
        assertThat(r.methodCounts().partlyHidden() + r.methodCounts().hidden()).isZero();
        for (int i = 0; i < r.facetCount(); i++) {
            assertThat(r.facetFactor(i, i)).isZero();
        }
    }

    @Property(tries = 6)
    void theIndependentIntegralTellsAPairFromTheSamePairMovedByOnePercent(@ForAll long seed) {
        // the check above can fail: the calculator's F_ij of a frustum's base and top against the
        // independent integral for the same top raised by 1 % of the height
        Scene s = frustum(seed, 4, 1);
        ViewFactorResult r = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        int t = s.surfaces().get(0).facets().size(); // the top's first facet follows the base's
        Facet base = s.facets().get(0);
        Facet top = s.facets().get(t);
        double height = top.centroid().minus(base.centroid()).z();
        assertThat(height).isPositive();
        Facet raised = top.transformed(org.exitance.geometry.Transform.translation(new Vec3(0, 0, 0.01 * height)));
        double same = IndependentFactor.factor(base, top, 24);
        double moved = IndependentFactor.factor(base, raised, 24);
        assertThat(same).isPositive();
        assertThat(r.facetFactor(0, t)).isCloseTo(same, within(1e-6 * same));
        assertThat(Math.abs(r.facetFactor(0, t) - moved)).isGreaterThan(100 * 1e-6 * same);
    }

    @Test
    void aTetrahedronWithOneFaceTurnedOutwardDoesNotClose() {
        // the summation test can fail: face d radiating away from the others leaves a gap in every row
        Vec3[] p = {Vec3.ZERO, Vec3.X, Vec3.Y, Vec3.Z};
        // as in the property below (inward), except face d, whose vertex order is reversed
        Scene s = Scene.builder().add("a", Shapes.convexPolygon(List.of(p[0], p[1], p[2]), 2))
                .add("b", Shapes.convexPolygon(List.of(p[0], p[3], p[1]), 2))
                .add("c", Shapes.convexPolygon(List.of(p[1], p[3], p[2]), 2))
                .add("d", Shapes.convexPolygon(List.of(p[0], p[3], p[2]), 2)).build();
        ViewFactorResult r = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        double row = 0;
        for (int j = 0; j < r.facetCount(); j++) {
            row += r.facetFactor(0, j);
        }
        assertThat(1 - row).isGreaterThan(0.05);
    }

    @Property(tries = 8)
    void randomTetrahedraClose(@ForAll long seed) {
        Random rnd = new Random(seed);
        Vec3[] p = new Vec3[4];
        for (int k = 0; k < 4; k++) {
            p[k] = new Vec3(rnd.nextDouble(), rnd.nextDouble(), rnd.nextDouble());
        }
        double vol = p[1].minus(p[0]).cross(p[2].minus(p[0])).dot(p[3].minus(p[0]));
        if (Math.abs(vol) < 1e-3) {
            return;
        }
        if (vol < 0) {
            Vec3 t = p[1];
            p[1] = p[2];
            p[2] = t;
        }
        // with positive orientation, face (0,1,2) normal points toward vertex 3: inward
        Scene s = Scene.builder().add("a", Shapes.convexPolygon(List.of(p[0], p[1], p[2]), 2))
                .add("b", Shapes.convexPolygon(List.of(p[0], p[3], p[1]), 2))
                .add("c", Shapes.convexPolygon(List.of(p[1], p[3], p[2]), 2))
                .add("d", Shapes.convexPolygon(List.of(p[0], p[2], p[3]), 2)).build();
        for (Facet f : s.facets()) {
            assertThat(f.normal().dot(p[0].plus(p[1]).plus(p[2]).plus(p[3]).times(0.25).minus(f.centroid())))
                    .isPositive();
        }
        ViewFactorResult r = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-6);
    }
}
