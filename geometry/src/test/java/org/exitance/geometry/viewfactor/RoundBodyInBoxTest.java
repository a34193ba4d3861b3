package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;

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

/**
 * Round bodies off any pair's axis in a closed box (a bar lying in a box furnace, a spherical
 * tank in an equipment box; invented scenes): their shadows on the walls are exact
 * ({@link RoundBodies}, {@link EmitterLines}), so the raw facet rows close to the default
 * tolerance with no smoothing. Closure of a closed enclosure, Σ_j F_ij = 1, is the summation
 * rule (common practice; Siegel &amp; Howell 4th ed. eq. 4.20): with the exact body the rows
 * hold it, with its polygons standing in they miss it by the shape error (7e-3 measured).
 */
class RoundBodyInBoxTest {

    /** The box 1 × 0.8 × 0.6 m (5 × 4 × 3 facets per face) with a bar along x, or a spherical tank. */
    static List<Surface> scene(boolean tank) {
        List<Surface> s = new ArrayList<>(Enclosures.box(new Vec3(0, 0, 0), new Vec3(1, 0.8, 0.6), 5, 4, 3));
        if (tank) {
            s.add(new Surface("tank", Shapes.sphere(new Vec3(0.5, 0.4, 0.3), 0.12, 4, 8, Facing.OUTWARD)));
            return s;
        }
        List<Facet> bar = new ArrayList<>(Shapes.cylinderWall(new Vec3(0.2, 0.4, 0.25), new Vec3(1, 0, 0), 0.08, 0.6, 8, 2,
                Facing.OUTWARD));
        bar.addAll(Shapes.disc(new Vec3(0.2, 0.4, 0.25), new Vec3(-1, 0, 0), 0.08, 1, 8));
        bar.addAll(Shapes.disc(new Vec3(0.8, 0.4, 0.25), new Vec3(1, 0, 0), 0.08, 1, 8));
        s.add(new Surface("bar", bar));
        return s;
    }

    private static ViewFactorResult compute(boolean tank, double pairTolerance) {
        return ViewFactorCalculator.compute(Scene.of(scene(tank)),
                ViewFactorOptions.defaults().withPairTolerance(pairTolerance).withSmoothing(Smoothing.NONE), ProgressListener.NONE);
    }

    private static double worstRow(ViewFactorResult r) {
        int n = r.facetCount();
        double[] row = new double[n];
        double worst = 0;
        for (int i = 0; i < n; i++) {
            r.copyFacetRow(i, row);
            double sum = 0;
            for (double v : row) {
                sum += v;
            }
            worst = Math.max(worst, Math.abs(1 - sum));
        }
        return worst;
    }

    @Test
    void aBarLyingInABoxClosesItsRowsWithoutSmoothing() {
        ViewFactorResult r = compute(false, ViewFactorOptions.defaults().pairTolerance());
        assertThat(r.methodCounts().curvedOnPolygons()).isZero();
        assertThat(r.maxRowErrorEstimate()).isLessThan(1e-5);
        assertThat(worstRow(r)).isLessThan(1e-5).isLessThan(2 * r.maxRowErrorEstimate());
    }

    @Test
    void aTankClosesItsRowsAndATighterToleranceMovesThemLessThanTheEstimate() {
        ViewFactorResult def = compute(true, ViewFactorOptions.defaults().pairTolerance());
        ViewFactorResult tight = compute(true, ViewFactorOptions.defaults().pairTolerance() / 10);
        assertThat(worstRow(def)).isLessThan(1e-5);
        assertThat(worstRow(tight)).isLessThan(worstRow(def) + 1e-7);
        int n = def.facetCount();
        double[] a = new double[n], b = new double[n];
        double change = 0;
        for (int i = 0; i < n; i++) {
            def.copyFacetRow(i, a);
            tight.copyFacetRow(i, b);
            double d = 0;
            for (int j = 0; j < n; j++) {
                d += Math.abs(a[j] - b[j]);
            }
            change = Math.max(change, d);
        }
        assertThat(change).isLessThan(def.maxRowErrorEstimate());
    }
}
