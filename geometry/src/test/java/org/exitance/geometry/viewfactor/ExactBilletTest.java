package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.exitance.geometry.Scene;
import org.junit.jupiter.api.Test;

/**
 * The billet between two wall bands of a cylindrical hot zone, built from exact shapes
 * ({@link ShadowProjectionTest#billetInHotZone}: cavity r = 0.5, h = 1, billet r = 0.15 from
 * z = 0.3 to 0.7 with both end discs), whose rims end between the heights of the pairs it hides
 * in part ({@link RimCells}), against references computed here by other means: the unobstructed
 * closed form minus the shadowed part, integrated from the definition (Siegel &amp; Howell, 4th
 * ed., eq. 4.13) with this test's own visibility test.
 */
class ExactBilletTest {

    private static final double R = 0.5, H = 1, RB = 0.15, Z0 = 0.3, Z1 = 0.7;
    private static final GaussIntegrator G10 = new GaussIntegratorFactory().legendreHighPrecision(10, 0, 1);
    private static final GaussIntegrator G24 = new GaussIntegratorFactory().legendreHighPrecision(24, 0, 1);
    private static ViewFactorResult defaults;

    private static synchronized ViewFactorResult defaults() {
        if (defaults == null) {
            defaults = ViewFactorCalculator.compute(Scene.of(ShadowProjectionTest.billetInHotZone(false)),
                    ViewFactorOptions.defaults(), ProgressListener.NONE);
        }
        return defaults;
    }

    private static int surface(ViewFactorResult r, String name) {
        return r.surfaceNames().indexOf(name);
    }

    /**
     * Lid to base past the billet: coaxial parallel discs (Howell's catalogue C-41; Incropera et
     * al., 6th ed., Table 13.2) less what the billet hides, ∫∫ over both discs of H²/(π S⁴) on the
     * blocked segments.
     */
    @Test
    void lidToBaseIsTheDiscClosedFormLessTheBilletsShadow() {
        ViewFactorResult r = defaults();
        double area = Math.PI * R * R;
        double hidden = 2 * Math.PI * integrate(rx -> rx * integrate(ry -> ry * 2 * blockedAzimuths(rx, ry, H, 0,
                psi -> H * H / (Math.PI * Math.pow(rx * rx + ry * ry - 2 * rx * ry * Math.cos(psi) + H * H, 2))),
                0, R, 1e-10), 0, R, 1e-9);
        double reference = ClosedForms.coaxialDiscs(R, R, H) - hidden / area;
        assertThat(hidden / area).as("the shadow matters").isGreaterThan(1e-2);
        double f = r.surfaceFactor(surface(r, "lid"), surface(r, "base"));
        System.out.printf("lid→base %.12f reference %.12f difference %.2e%n", f, reference, f - reference);
        assertThat(Math.abs(f - reference)).as("F lid→base %.10f, reference %.10f", f, reference).isLessThan(1e-6);
    }

    /**
     * Wall to base past the billet: by reciprocity and the summation rule from the base, A_w
     * F_w→base = π R² (1 − F_base→lid) unobstructed (Howell C-41 again), less the shadow, which
     * falls only from wall points above the billet's bottom.
     */
    @Test
    void wallToBaseIsTheClosedFormLessTheBilletsShadow() {
        ViewFactorResult r = defaults();
        double wall = 2 * Math.PI * R * H;
        double hidden = 2 * Math.PI * R * integrate(zx -> integrate(ry -> ry * 2 * blockedAzimuths(R, ry, zx, 0,
                psi -> (R - ry * Math.cos(psi)) * zx
                        / (Math.PI * Math.pow(R * R + ry * ry - 2 * R * ry * Math.cos(psi) + zx * zx, 2))),
                0, R, 1e-10), Z0, H, 1e-9);
        double reference = (Math.PI * R * R * (1 - ClosedForms.coaxialDiscs(R, R, H)) - hidden) / wall;
        assertThat(hidden / wall).isGreaterThan(1e-3);
        double f = r.surfaceFactor(surface(r, "wall"), surface(r, "base"));
        System.out.printf("wall→base %.12f reference %.12f difference %.2e%n", f, reference, f - reference);
        assertThat(Math.abs(f - reference)).as("F wall→base %.10f, reference %.10f", f, reference).isLessThan(1e-6);
    }

    /**
     * The wall to itself past the billet: unobstructed 1 − 2 F_w→disc (summation rule, common
     * practice, with the disc factor from Howell C-41), less the shadow of segments between two
     * wall points, including those from one band to the other that pass a rim.
     */
    @Test
    void wallToItselfIsTheClosedFormLessTheBilletsShadow() {
        ViewFactorResult r = defaults();
        double wall = 2 * Math.PI * R * H;
        double toDisc = Math.PI * R * R * (1 - ClosedForms.coaxialDiscs(R, R, H)) / wall;
        double hidden = 2 * Math.PI * R * R * integrate(zx -> integrate(zy -> 2 * blockedAzimuths(R, R, zx, zy,
                psi -> R * R * Math.pow(1 - Math.cos(psi), 2)
                        / (Math.PI * Math.pow(2 * R * R * (1 - Math.cos(psi)) + (zx - zy) * (zx - zy), 2))),
                0, H, 1e-9), 0, H, 1e-8);
        double reference = 1 - 2 * toDisc - hidden / wall;
        assertThat(hidden / wall).isGreaterThan(1e-3);
        double f = r.surfaceFactor(surface(r, "wall"), surface(r, "wall"));
        System.out.printf("wall→wall %.12f reference %.12f difference %.2e%n", f, reference, f - reference);
        assertThat(Math.abs(f - reference)).as("F wall→wall %.10f, reference %.10f", f, reference).isLessThan(1e-6);
    }

    /**
     * Tightening the pair tolerance tenfold moves every facet row (the sum of |ΔF_ij| over j) by
     * less than the default computation's estimate of its row error.
     */
    @Test
    void aTenfoldTighterToleranceStaysWithinTheEstimate() {
        ViewFactorResult r = defaults();
        ViewFactorResult tight = ViewFactorCalculator.compute(Scene.of(ShadowProjectionTest.billetInHotZone(false)),
                ViewFactorOptions.defaults().withPairTolerance(1e-8), ProgressListener.NONE);
        assertThat(tight.methodCounts().curvedOnPolygons()).isZero();
        int n = r.facetCount();
        double worst = 0;
        for (int i = 0; i < n; i++) {
            double row = 0;
            for (int j = 0; j < n; j++) {
                row += Math.abs(r.facetFactor(i, j) - tight.facetFactor(i, j));
            }
            worst = Math.max(worst, row);
        }
        System.out.printf("tenfold tighter: largest row change %.2e, estimate %.2e%n", worst, r.maxRowErrorEstimate());
        assertThat(worst).isPositive().isLessThan(r.maxRowErrorEstimate());
    }

    /**
     * Congruent pairs share one computed result across threads: the matrix must still be the same
     * to the last bit on one thread as on two (the results-independent-of-threads rule of this
     * project, common practice for parallel numerics).
     */
    @Test
    void oneThreadAndTwoGiveTheSameMatrixBitForBit() {
        ViewFactorResult one = ViewFactorCalculator.compute(Scene.of(ShadowProjectionTest.billetInHotZone(false)),
                ViewFactorOptions.defaults().withThreads(1), ProgressListener.NONE);
        ViewFactorResult two = ViewFactorCalculator.compute(Scene.of(ShadowProjectionTest.billetInHotZone(false)),
                ViewFactorOptions.defaults().withThreads(2), ProgressListener.NONE);
        int n = one.facetCount();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                assertThat(two.facetFactor(i, j)).as("F[%d][%d]", i, j).isEqualTo(one.facetFactor(i, j));
            }
        }
        assertThat(two.maxRowErrorEstimate()).isEqualTo(one.maxRowErrorEstimate());
    }

    /**
     * ∫ over the blocked azimuths ψ ∈ [0, π] of the kernel for x at radius ρ_x, height z_x and y
     * at ρ_y, z_y (the caller doubles it for ψ ∈ [−π, 0]). Visibility by this test's own
     * rule: the segment is blocked when its point nearest the axis among those at the billet's
     * heights lies within RB. That distance falls as ψ grows (every point's |(1 − t) x + t y|²
     * does), so the blocked azimuths are [ψ*, π], ψ* by bisection.
     */
    private static double blockedAzimuths(double rx, double ry, double zx, double zy, DoubleUnaryOperator kernel) {
        if (!blocked(rx, ry, zx, zy, Math.PI)) {
            return 0;
        }
        double lo = 0, hi = Math.PI;
        if (!blocked(rx, ry, zx, zy, 0)) {
            for (int it = 0; it < 100 && hi - lo > 1e-15; it++) {
                double mid = 0.5 * (lo + hi);
                if (blocked(rx, ry, zx, zy, mid)) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
        } else {
            hi = 0;
        }
        double a = hi, len = Math.PI - a, s = 0;
        for (int k = 0; k < G24.getNumberOfPoints(); k++) {
            s += G24.getWeight(k) * kernel.applyAsDouble(a + len * G24.getPoint(k));
        }
        return s * len;
    }

    private static boolean blocked(double rx, double ry, double zx, double zy, double psi) {
        double ta, tb;
        if (zy == zx) {
            if (!(zx > Z0 && zx < Z1)) {
                return false;
            }
            ta = 0;
            tb = 1;
        } else {
            double t0 = (Z0 - zx) / (zy - zx), t1 = (Z1 - zx) / (zy - zx);
            ta = Math.max(0, Math.min(t0, t1));
            tb = Math.min(1, Math.max(t0, t1));
            if (ta >= tb) {
                return false;
            }
        }
        double px = rx, py = 0, dx = ry * Math.cos(psi) - rx, dy = ry * Math.sin(psi);
        double d2 = dx * dx + dy * dy;
        double t = d2 > 0 ? Math.max(ta, Math.min(tb, -(px * dx + py * dy) / d2)) : ta;
        double qx = px + t * dx, qy = py + t * dy;
        return qx * qx + qy * qy < RB * RB;
    }

    /** Adaptive 10-point Gauss–Legendre (Commons Math nodes): halves until the halves agree within tol. */
    private static double integrate(DoubleUnaryOperator f, double a, double b, double tol) {
        return adapt(f, a, b, rule(f, a, b), tol, 0);
    }

    private static double adapt(DoubleUnaryOperator f, double a, double b, double whole, double tol, int depth) {
        double m = 0.5 * (a + b), x = rule(f, a, m), y = rule(f, m, b);
        if (Math.abs(x + y - whole) <= tol || depth > 40) {
            return x + y;
        }
        return adapt(f, a, m, x, 0.5 * tol, depth + 1) + adapt(f, m, b, y, 0.5 * tol, depth + 1);
    }

    private static double rule(DoubleUnaryOperator f, double a, double b) {
        double s = 0;
        for (int k = 0; k < G10.getNumberOfPoints(); k++) {
            s += G10.getWeight(k) * f.applyAsDouble(a + (b - a) * G10.getPoint(k));
        }
        return s * (b - a);
    }
}
