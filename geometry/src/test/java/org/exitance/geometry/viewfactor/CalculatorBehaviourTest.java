package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Transform;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.junit.jupiter.api.Test;

class CalculatorBehaviourTest {

    /** Invented demo geometry: a box with a block inside (obstruction), 2 × 2 × 2 cells a face. */
    static Scene boxWithBlock(int n) {
        List<Surface> s = new ArrayList<>(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), n, n, n));
        s.addAll(Enclosures.box("block.", new Vec3(0.3, 0.35, 0.4), new Vec3(0.7, 0.65, 0.6), 2, 2, 1, Facing.OUTWARD));
        return Scene.of(s);
    }

    @Test
    void matrixIsIdenticalBitForBitForAnyThreadCount() {
        Scene s = boxWithBlock(4);
        ViewFactorResult one = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults().withThreads(1), ProgressListener.NONE);
        ViewFactorResult two = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults().withThreads(2), ProgressListener.NONE);
        ViewFactorResult five = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults().withThreads(5), ProgressListener.NONE);
        assertThat(one.methodCounts().partlyHidden()).isPositive();
        assertThat(two.facetMatrix()).isEqualTo(one.facetMatrix());
        assertThat(five.facetMatrix()).isEqualTo(one.facetMatrix());
        assertThat(five.surfaceMatrix()).isDeepEqualTo(one.surfaceMatrix());
        assertThat(five.maxRowErrorEstimate()).isEqualTo(one.maxRowErrorEstimate());
        assertThat(five.geometryHash()).isEqualTo(one.geometryHash());
    }

    @Test
    void facetFactorsDoNotDependOnSurfaceOrder() {
        Scene s = boxWithBlock(3);
        List<Surface> reversed = new ArrayList<>(s.surfaces());
        java.util.Collections.reverse(reversed);
        Scene r = Scene.of(reversed);
        ViewFactorResult a = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        ViewFactorResult b = ViewFactorCalculator.compute(r, ViewFactorOptions.defaults(), ProgressListener.NONE);
        // global index of each facet of s in r
        int n = s.facetCount();
        int[] map = new int[n];
        int[] startR = new int[r.surfaceCount() + 1];
        for (int k = 0; k < r.surfaceCount(); k++) {
            startR[k + 1] = startR[k] + r.surfaces().get(k).facets().size();
        }
        int g = 0;
        for (Surface surf : s.surfaces()) {
            int base = startR[r.indexOf(surf.name())];
            for (int k = 0; k < surf.facets().size(); k++) {
                map[g++] = base + k;
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                assertThat(b.facetFactor(map[i], map[j])).isEqualTo(a.facetFactor(i, j));
            }
        }
    }

    @Test
    void obstructedEnclosureClosesToWithinTheVisibilitySamplingError() {
        ViewFactorResult r = ViewFactorCalculator.compute(boxWithBlock(6), ViewFactorOptions.defaults().withVisibilityOrder(4),
                ProgressListener.NONE);
        // summation in a closed enclosure (common practice); the block's own facets are unobstructed
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-2);
        assertThat(r.surfaceClosure().maxRowSumError()).isLessThan(2e-3);
    }

    @Test
    void progressReachesOneAndCancellationStops() {
        Scene s = Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), 3, 3, 3));
        List<Double> seen = new ArrayList<>();
        ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), seen::add);
        assertThat(seen).isSortedAccordingTo(Double::compare);
        assertThat(seen.get(seen.size() - 1)).isEqualTo(1.0);
        AtomicInteger polls = new AtomicInteger();
        assertThatThrownBy(() -> ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE,
                () -> polls.incrementAndGet() > 5)).isInstanceOf(CancellationException.class);
    }

    @Test
    void hashDependsOnGeometryAndOptionsButNotOnThreads() {
        Scene a = Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), 1, 1, 1));
        Scene b = a.transformed(Transform.translation(new Vec3(0, 0, 1e-12)));
        ViewFactorOptions o = ViewFactorOptions.defaults();
        assertThat(GeometryHash.of(a, o)).hasSize(64).isEqualTo(GeometryHash.of(a, o.withThreads(3)));
        assertThat(GeometryHash.of(a, o)).isNotEqualTo(GeometryHash.of(b, o));
        assertThat(GeometryHash.of(a, o)).isNotEqualTo(GeometryHash.of(a, o.withPairTolerance(1e-5)));
    }

    @Test
    void closedSmoothingEnforcesSummationAndReportsTheChange() {
        Scene s = Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 2, 0.5), 3, 3, 2));
        // a loose tolerance leaves visible summation errors
        ViewFactorOptions loose = ViewFactorOptions.defaults().withPairTolerance(0.05);
        ViewFactorResult raw = ViewFactorCalculator.compute(s, loose, ProgressListener.NONE);
        ViewFactorResult smooth = ViewFactorCalculator.compute(s, loose.withSmoothing(Smoothing.CLOSED), ProgressListener.NONE);
        ViewFactorResult exact = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
        assertThat(raw.facetClosure().maxRowSumError()).isGreaterThan(1e-5);
        assertThat(raw.smoothing().applied()).isFalse();
        assertThat(smooth.smoothing().applied()).isTrue();
        assertThat(smooth.smoothing().maxChange()).isPositive();
        assertThat(smooth.facetClosure().maxRowSumError()).isLessThan(1e-10);
        for (int i = 0; i < smooth.facetCount(); i++) {
            for (int j = 0; j < smooth.facetCount(); j++) {
                assertThat(smooth.facetFactor(i, j)).isGreaterThanOrEqualTo(0);
            }
        }
        // smoothing moves the surface factors toward the accurate ones
        double before = 0, after = 0;
        for (int a = 0; a < 6; a++) {
            for (int b = 0; b < 6; b++) {
                before = Math.max(before, Math.abs(raw.surfaceFactor(a, b) - exact.surfaceFactor(a, b)));
                after = Math.max(after, Math.abs(smooth.surfaceFactor(a, b) - exact.surfaceFactor(a, b)));
            }
        }
        assertThat(after).isLessThan(before);
    }

    @Test
    void openSmoothingKeepsEnvironmentNonNegative() {
        Scene s = Scene.builder().add("a", org.exitance.geometry.shape.Shapes.parallelogram(Vec3.ZERO, Vec3.X, Vec3.Y, 3, 3))
                .add("b", org.exitance.geometry.shape.Shapes.parallelogram(new Vec3(0, 0, 0.3), Vec3.Y, Vec3.X, 3, 3)).build();
        ViewFactorResult r = ViewFactorCalculator.compute(s,
                ViewFactorOptions.defaults().withPairTolerance(0.05).withSmoothing(Smoothing.OPEN), ProgressListener.NONE);
        assertThat(r.smoothing().mode()).isEqualTo(Smoothing.OPEN);
        assertThat(r.facetClosure().maxNegativeRemainder()).isLessThan(1e-12);
        // Howell catalog C-11, 1 × 1 plates 0.3 apart: the environment takes the rest
        assertThat(r.environmentFactors()[0]).isCloseTo(1 - ClosedForms.parallelRectangles(1, 1, 0.3), within(2e-3));
    }

    @Test
    void farPairRuleMeetsItsStatedBound() {
        // re-measure two brackets on fresh random pairs (other seed) against the contour integral
        for (int k : new int[] {0, 4}) {
            double rho = ProximityRule.RHO[k] * 1.01;
            double[] worst = ProximityCalibration.maxError(rho, 60, 6, 777);
            ProximityRule rule = new ProximityRule(1e-7);
            int m = rule.order(rho);
            assertThat(m).isPositive();
            assertThat(worst[m]).isLessThanOrEqualTo(rule.bound(rho));
        }
    }
}
