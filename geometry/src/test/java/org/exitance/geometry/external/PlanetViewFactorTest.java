package org.exitance.geometry.external;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.junit.jupiter.api.Test;

/**
 * Checks of the closed forms for a differential planar element to a sphere against a direct
 * quadrature of the definition F = ∫ cos θ₁ cos θ₂ / (π r²) dA (Siegel &amp; Howell, 4th ed.,
 * eq. 4.13 with dA₁ → 0) over the sphere's visible cap, with Apache Commons Math.
 */
class PlanetViewFactorTest {

    /**
     * Reference by quadrature. Unit sphere at the origin, element at (0, 0, H) with normal
     * n = (sin β, 0, −cos β). Sphere point P(α, ψ), α ∈ [0, acos(1/H)] (cap seen from the element,
     * cos θ₂ &gt; 0); cos θ₁ = (a + b cos ψ)/r with a = cos β (H − cos α), b = sin β sin α; the
     * integrand is kept where cos θ₁ &gt; 0, i.e. |ψ| &lt; ψ₀(α). Inner ψ-integral and outer
     * α-integral by Commons Math iterative Gauss–Legendre; the α range is split at the kinks of
     * ψ₀ (a = ±b, found by Brent's method) and each piece smoothed by a polynomial substitution.
     */
    static double quadrature(double hh, double beta) {
        double cb = Math.cos(beta), sb = Math.sin(beta);
        double alphaH = Math.acos(1 / hh);
        List<Double> cuts = new ArrayList<>(List.of(0.0, alphaH));
        BrentSolver brent = new BrentSolver(1e-15, 1e-15);
        int grid = 400;
        for (int sign = -1; sign <= 1; sign += 2) {
            final int sg = sign;
            org.apache.commons.math3.analysis.UnivariateFunction g =
                    al -> cb * (hh - Math.cos(al)) + sg * sb * Math.sin(al);
            for (int k = 0; k < grid; k++) {
                double lo = alphaH * k / grid, hi = alphaH * (k + 1) / grid;
                if (g.value(lo) * g.value(hi) < 0) {
                    cuts.add(brent.solve(200, g, lo, hi));
                }
            }
        }
        cuts.sort(Double::compare);
        IterativeLegendreGaussIntegrator outer = new IterativeLegendreGaussIntegrator(10, 1e-12, 1e-14);
        double total = 0;
        for (int k = 0; k + 1 < cuts.size(); k++) {
            double lo = cuts.get(k), hi = cuts.get(k + 1);
            if (hi - lo < 1e-15) {
                continue;
            }
            // smooth-step substitution α = lo + (hi − lo)(3u² − 2u³) flattens the (b − a)^{3/2} kinks at the ends
            total += outer.integrate(1000000, u -> {
                double al = lo + (hi - lo) * u * u * (3 - 2 * u), jac = (hi - lo) * 6 * u * (1 - u);
                double a = cb * (hh - Math.cos(al)), b = sb * Math.sin(al);
                double psi0 = a >= b ? Math.PI : (a <= -b ? 0 : Math.acos(-a / b));
                if (psi0 <= 0) {
                    return 0;
                }
                double r2 = hh * hh + 1 - 2 * hh * Math.cos(al);
                double r = Math.sqrt(r2);
                double cos2 = (hh * Math.cos(al) - 1) / r;
                IterativeLegendreGaussIntegrator inner = new IterativeLegendreGaussIntegrator(8, 1e-14, 1e-16);
                double in = 2 * inner.integrate(100000, ps -> Math.max(0, (a + b * Math.cos(ps)) / r), 0, psi0);
                return in * cos2 / (Math.PI * r2) * Math.sin(al) * jac;
            }, 0, 1);
        }
        return total;
    }

    @Test
    void fullyVisibleClosedFormMatchesQuadrature() {
        // Howell's catalog / Siegel & Howell App. C (from memory): F = cos β / H² while H cos β ≥ 1.
        for (double hh : new double[] {1.1, 1.5, 3, 10}) {
            double limit = Math.acos(1 / hh);
            for (double frac : new double[] {0, 0.3, 0.7, 0.99}) {
                double beta = frac * limit;
                double closed = PlanetViewFactor.differentialElement(hh, Math.cos(beta));
                assertThat(closed).isEqualTo(Math.cos(beta) / (hh * hh), within(1e-15));
                assertThat(closed).as("H=%s β=%s", hh, beta).isCloseTo(quadrature(hh, beta), within(2e-9));
            }
        }
    }

    @Test
    void facingTheCentreIsSineSquaredOfTheHalfAngle() {
        // A sphere seen under the half-angle γ, sin γ = R/h, from an element facing its centre:
        // F = sin² γ (projected solid angle of a cone; Siegel & Howell 4th ed., from memory).
        for (double hh : new double[] {1, 1.0627, 2, 7}) {
            assertThat(PlanetViewFactor.differentialElement(hh, 1)).isCloseTo(1 / (hh * hh), within(1e-15));
        }
    }

    @Test
    void planeCutClosedFormMatchesQuadrature() {
        double worst = 0;
        for (double hh : new double[] {1.02, 1.0627, 1.3, 2, 5}) {
            double lo = Math.acos(1 / hh), hi = Math.PI / 2 + Math.asin(1 / hh);
            for (int k = 1; k < 10; k++) {
                double beta = lo + (hi - lo) * k / 10;
                double closed = PlanetViewFactor.differentialElement(hh, Math.cos(beta));
                double ref = quadrature(hh, beta);
                worst = Math.max(worst, Math.abs(closed - ref));
                assertThat(closed).as("H=%s β=%s", hh, beta).isCloseTo(ref, within(2e-9));
            }
        }
        System.out.printf("planet factor, plane-cut case: max |closed form − quadrature| = %.2e%n", worst);
    }

    @Test
    void elementOnTheSurfaceSeesTheGroundAsATiltedPlane() {
        // H → 1: the sphere fills the half-space below the tangent plane; a plane tilted so its
        // normal makes β with the nadir sees the ground with F = (1 + cos β)/2 (the ground view
        // factor (1 − cos Σ)/2 for tilt Σ = π − β from the horizontal; Duffie & Beckman, Solar
        // Engineering of Thermal Processes, from memory; common practice).
        for (double beta : new double[] {0, 0.4, Math.PI / 2, 2.2, Math.PI}) {
            double expected = (1 + Math.cos(beta)) / 2;
            assertThat(PlanetViewFactor.differentialElement(1, Math.cos(beta))).isCloseTo(expected, within(1e-12));
            assertThat(PlanetViewFactor.differentialElement(1 + 1e-10, Math.cos(beta))).isCloseTo(expected, within(1e-4));
        }
    }

    @Test
    void facingAwayIsZeroAndThePiecesJoinContinuously() {
        for (double hh : new double[] {1.05, 2, 20}) {
            double away = Math.PI / 2 + Math.asin(1 / hh);
            assertThat(PlanetViewFactor.differentialElement(hh, Math.cos(away + 1e-6))).isZero();
            assertThat(PlanetViewFactor.differentialElement(hh, -1)).isZero();
            assertThat(PlanetViewFactor.differentialElement(hh, Math.cos(away - 1e-9))).isCloseTo(0, within(1e-7));
            double edge = Math.acos(1 / hh);
            double inside = PlanetViewFactor.differentialElement(hh, Math.cos(edge - 1e-9));
            double outside = PlanetViewFactor.differentialElement(hh, Math.cos(edge + 1e-9));
            assertThat(outside).isCloseTo(inside, within(1e-7));
            assertThat(inside).isCloseTo(1 / (hh * hh * hh), within(1e-7));
        }
    }

    @Property(tries = 200)
    void boundedAndNonIncreasingAsTheElementTurnsAway(@ForAll @DoubleRange(min = 1, max = 30) double hh,
            @ForAll @DoubleRange(min = 0, max = 3.1) double beta) {
        // Rotating the element away from the sphere can only lose view (definition; common practice).
        double f = PlanetViewFactor.differentialElement(hh, Math.cos(beta));
        double g = PlanetViewFactor.differentialElement(hh, Math.cos(beta + 0.04));
        assertThat(f).isBetween(0.0, 1.0);
        assertThat(g).isLessThanOrEqualTo(f + 1e-15);
    }

    @Test
    void turningTowardThePlanetFailsTheMonotoneTest() {
        // the test above can fail: turned 0.04 rad toward the sphere, an element at h/R = 2, 1 rad off
        // the nadir, sees more of it
        double f = PlanetViewFactor.differentialElement(2, Math.cos(1.0));
        double toward = PlanetViewFactor.differentialElement(2, Math.cos(1.0 - 0.04));
        assertThat(toward).isGreaterThan(f + 1e-6);
    }

    @Test
    void boxInLowOrbitGetsPerFaceAndAreaWeightedFactors() {
        // Invented demo geometry: a 1 m cube 400 km above the Earth, planet straight below (−z).
        double alt = 400e3, rr = PlanetViewFactor.EARTH_RADIUS_M, hh = (rr + alt) / rr;
        Scene scene = Scene.builder()
                .addAll(Enclosures.box("cube.", Vec3.ZERO, new Vec3(1, 1, 1), 1, 1, 1, Facing.OUTWARD))
                .add("roof", List.of(
                        Facet.of(new Vec3(0, 0, 2), new Vec3(1, 0, 2), new Vec3(1, 1, 3), new Vec3(0, 1, 3)),
                        Facet.of(new Vec3(0, 0, 2), new Vec3(-1, 2, 2), new Vec3(0, 2, 2))))
                .build();
        IncidenceResult r = PlanetViewFactor.compute(scene, new Vec3(0, 0, -5), alt, rr);
        assertThat(r.raysCast()).isZero();
        assertThat(r.surfaceFactor("cube.bottom")).isCloseTo(1 / (hh * hh), within(1e-15));
        assertThat(r.surfaceFactor("cube.top")).isZero();
        double side = quadrature(hh, Math.PI / 2);
        for (String s : List.of("cube.front", "cube.back", "cube.left", "cube.right")) {
            assertThat(r.surfaceFactor(s)).as(s).isCloseTo(side, within(2e-9));
        }
        // roof: a 45°-tilted facet facing up (area √2) and a horizontal triangle facing −z (area 1)
        double tilted = quadrature(hh, Math.PI - Math.PI / 4);
        double expected = (Math.sqrt(2) * tilted + 1 * (1 / (hh * hh))) / (Math.sqrt(2) + 1);
        assertThat(r.surfaceFactor("roof")).isCloseTo(expected, within(2e-9));
    }

    @Test
    void rejectsBadInput() {
        assertThatThrownBy(() -> PlanetViewFactor.differentialElement(0.99, 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> PlanetViewFactor.distanceRatio(-1, 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> PlanetViewFactor.distanceRatio(1, 0)).isInstanceOf(IllegalArgumentException.class);
    }
}
