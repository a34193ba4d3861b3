package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;

/** Curved primitives keep their exact area and shape: closed forms, each verified by an independent integration. */
class CurvedShapesTest {

    private static final IterativeLegendreGaussIntegrator QUAD = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15);

    static List<Facet> reversed(List<Facet> f) {
        List<Facet> r = new ArrayList<>();
        f.forEach(x -> r.add(x.reversed()));
        return r;
    }

    static ViewFactorResult compute(Scene s) {
        return ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
    }

    static double exactArea(List<Facet> f) {
        double a = 0;
        for (Facet x : f) {
            a += x.exactArea();
        }
        return a;
    }

    @Test
    void everyCurvedPrimitiveHasItsExactArea() {
        // common practice: π r², π (r1² − r0²), 2π r h, π (r0 + r1) √((r0 − r1)² + h²), 4π r²
        assertThat(exactArea(Shapes.disc(Vec3.ZERO, Vec3.Z, 1.3, 3, 7))).isCloseTo(Math.PI * 1.69, within(1e-13));
        assertThat(exactArea(Shapes.annulus(Vec3.ZERO, new Vec3(1, 2, 3), 0.4, 2, 2, 5)))
                .isCloseTo(Math.PI * (4 - 0.16), within(1e-12));
        assertThat(exactArea(Shapes.cylinderWall(Vec3.ZERO, Vec3.X, 0.7, 2, 5, 3, Facing.INWARD)))
                .isCloseTo(2 * Math.PI * 0.7 * 2, within(1e-12));
        assertThat(exactArea(Shapes.coneFrustum(Vec3.ZERO, Vec3.Y, 1, 0.25, 1.5, 6, 4, Facing.OUTWARD)))
                .isCloseTo(Math.PI * 1.25 * Math.sqrt(0.75 * 0.75 + 2.25), within(1e-12));
        assertThat(exactArea(Shapes.sphere(new Vec3(1, 1, 1), 0.8, 5, 7, Facing.INWARD)))
                .isCloseTo(4 * Math.PI * 0.64, within(1e-12));
        // the surface reports the same, reversed and moved
        Surface s = new Surface("s", Shapes.sphere(Vec3.ZERO, 2, 4, 6, Facing.OUTWARD)).reversed("r");
        assertThat(s.exactArea()).isCloseTo(16 * Math.PI, within(1e-12));
        assertThat(s.transformed(org.exitance.geometry.Transform.rotation(Vec3.X, 0.3)).exactArea()).isCloseTo(16 * Math.PI, within(1e-12));
    }

    /**
     * Element to a parallel coaxial-or-not disc by direct integration: in polar coordinates about
     * the disc centre, ∫_0^{2π} dψ / (A − B cos ψ)² = 2πA / (A² − B²)^{3/2} (elementary), then
     * Commons Math over the radius. F = ∫∫ L² / (π r⁴) dA (definition).
     */
    static double elementToDiscByIntegration(double offset, double l, double radius) {
        // a fresh integrator: Commons Math integrators keep state and must not be nested
        return new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15).integrate(Integer.MAX_VALUE, s -> {
            double a = l * l + offset * offset + s * s, b = 2 * offset * s;
            return l * l * s * 2 * a / Math.pow(a * a - b * b, 1.5);
        }, 0, radius);
    }

    @Test
    void coaxialDiscsMatchTheirClosedForm() {
        // Howell's catalog / Incropera 6th ed. Table 13.2: F12 = ½[X − √(X² − 4(R2/R1)²)],
        // X = 1 + (1 + R2²)/R1², Ri = ri/L (from memory; verified here by integrating the
        // element-to-disc factor over disc 1: F12 = (2/r1²) ∫ ρ F(ρ) dρ)
        for (double[] d : new double[][] {{1, 1, 1}, {0.5, 1, 0.5}, {2, 1, 0.3}}) {
            double r1 = d[0], r2 = d[1], l = d[2];
            double formula = ClosedForms.coaxialDiscs(r1, r2, l);
            double integrated = 2 / (r1 * r1) * QUAD.integrate(Integer.MAX_VALUE,
                    rho -> rho * elementToDiscByIntegration(rho, l, r2), 0, r1);
            assertThat(formula).isCloseTo(integrated, within(1e-9));
            Scene s = Scene.builder().add("a", Shapes.disc(Vec3.ZERO, Vec3.Z, r1, 2, 16))
                    .add("b", reversed(Shapes.disc(new Vec3(0, 0, l), Vec3.Z, r2, 2, 16))).build();
            assertThat(compute(s).surfaceFactor(0, 1)).as("r1=%s r2=%s L=%s", r1, r2, l)
                    .isCloseTo(formula, within(1e-8 * formula));
        }
    }

    @Test
    void smallElementToParallelDiscOnAndOffItsAxis() {
        double l = 1, radius = 0.8, e = 1e-4;
        for (double offset : new double[] {0, 0.5, 1.5}) {
            // on axis r²/(h² + r²); off axis ½[1 − (L² + ρ² − r²)/√((L² + ρ² + r²)² − 4ρ²r²)]
            // (Howell's catalog, element to parallel disc; from memory, verified by integration)
            double a = l * l + offset * offset + radius * radius;
            double formula = 0.5 * (1 - (l * l + offset * offset - radius * radius) / Math.sqrt(a * a - 4 * offset * offset * radius * radius));
            assertThat(formula).isCloseTo(elementToDiscByIntegration(offset, l, radius), within(1e-11));
            if (offset == 0) {
                assertThat(formula).isCloseTo(radius * radius / (l * l + radius * radius), within(1e-14));
            }
            Facet element = Facet.of(new Vec3(offset - e, -e, 0), new Vec3(offset + e, -e, 0), new Vec3(offset + e, e, 0),
                    new Vec3(offset - e, e, 0));
            Scene s = Scene.builder().add("element", List.of(element))
                    .add("disc", reversed(Shapes.disc(new Vec3(0, 0, l), Vec3.Z, radius, 2, 16))).build();
            // a 2e-4 m square differs from a point by O((e/L)²) = 1e-8
            assertThat(compute(s).surfaceFactor(0, 1)).as("offset %s", offset).isCloseTo(formula, within(1e-6 * formula));
        }
    }

    @Test
    void sphereToCoaxialDiscMatchesClosedForm() {
        double h = 2, a = 1.5, radius = 0.5;
        // F = ½[1 − 1/√(1 + (a/h)²)] (Siegel & Howell 4th ed. Appendix C / Howell's catalog, from
        // memory). Check: by reciprocity F = (1/4πR²) ∫_disc F_dA→sphere dA with the element factor
        // h R²/d³ of a fully visible sphere (PlanetViewFactor's closed form, tested there)
        double exact = 0.5 * (1 - 1 / Math.sqrt(1 + (a / h) * (a / h)));
        double integrated = QUAD.integrate(Integer.MAX_VALUE,
                rho -> 2 * Math.PI * rho * h * radius * radius / Math.pow(h * h + rho * rho, 1.5), 0, a) / (4 * Math.PI * radius * radius);
        assertThat(exact).isCloseTo(integrated, within(1e-12));
        Scene s = Scene.builder().add("sphere", Shapes.sphere(Vec3.ZERO, radius, 4, 8, Facing.OUTWARD))
                .add("disc", reversed(Shapes.disc(new Vec3(0, 0, h), Vec3.Z, a, 2, 16))).build();
        assertThat(compute(s).surfaceFactor(0, 1)).isCloseTo(exact, within(1e-6 * exact));
    }

    @Test
    void cylinderSeesItsOwnBaseAndItself() {
        // closed cylinder r = h = 1: base to lid = coaxial discs (0.381966, verified above), so by
        // closure base to wall = 1 − F_bl and by reciprocity wall to base = (A_b/A_w)(1 − F_bl);
        // the wall sees itself F_ww = 1 − 2 F_wb (Siegel & Howell 4th ed., §4, closure and reciprocity)
        ViewFactorResult r = compute(Scene.of(Enclosures.cylindricalCavity(Vec3.ZERO, Vec3.Z, 1, 1, 16, 4, 2)));
        double fbl = ClosedForms.coaxialDiscs(1, 1, 1), fwb = 0.5 * (1 - fbl);
        assertThat(r.surfaceAreas()[0]).isCloseTo(2 * Math.PI, within(1e-12));
        assertThat(r.surfaceFactor(1, 2)).isCloseTo(fbl, within(1e-8));
        assertThat(r.surfaceFactor(1, 0)).isCloseTo(1 - fbl, within(1e-6 * (1 - fbl)));
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(fwb, within(1e-6 * fwb));
        assertThat(r.surfaceFactor(0, 0)).isCloseTo(1 - 2 * fwb, within(1e-6 * (1 - 2 * fwb)));
        assertThat(r.surfaceFactor(0, 0)).isPositive();
    }

    @Test
    void coneBaseSeesOnlyTheWall() {
        // a closed right circular cone: the planar base sees only the wall, F_bw = 1, and
        // F_wb = A_b/A_w = r/s, s the slant height (closure and reciprocity; Siegel & Howell 4th ed. §4)
        double r0 = 1, h = 1.5, slant = Math.sqrt(r0 * r0 + h * h);
        Scene s = Scene.builder().add("wall", Shapes.coneFrustum(Vec3.ZERO, Vec3.Z, r0, 0, h, 12, 2, Facing.INWARD))
                .add("base", Shapes.disc(Vec3.ZERO, Vec3.Z, r0, 2, 12)).build();
        ViewFactorResult r = compute(s);
        assertThat(r.surfaceAreas()[0]).isCloseTo(Math.PI * r0 * slant, within(1e-12));
        assertThat(r.surfaceFactor(1, 0)).isCloseTo(1, within(1e-6));
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(r0 / slant, within(1e-6 * r0 / slant));
    }

    /**
     * Inner to outer of concentric cylinders of equal length, without the open ends, by the
     * definition reduced to one integral: with x on the inner at azimuth 0 and y on the outer at
     * azimuth φ, cos θ_x r = r2 cos φ − r1, cos θ_y r = r2 − r1 cos φ, r² = D + t² with
     * D = r1² + r2² − 2 r1 r2 cos φ and t the axial offset; the double axial integral is
     * ∫∫ dz dz'/(D + (z − z')²)² = 2 ∫_0^L (L − t)/(D + t²)² dt (elementary antiderivatives).
     * F_12 = (r2 / (π L)) ∫ (r2 cos φ − r1)(r2 − r1 cos φ) G(D) dφ over |φ| &lt; acos(r1/r2).
     */
    static double innerToOuterByIntegration(double r1, double r2, double len) {
        double lim = Math.acos(r1 / r2);
        return new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-15).integrate(Integer.MAX_VALUE, phi -> {
            double d = r1 * r1 + r2 * r2 - 2 * r1 * r2 * Math.cos(phi), sd = Math.sqrt(d);
            double g = 2 * (len * (len / (2 * d * (d + len * len)) + Math.atan(len / sd) / (2 * d * sd))
                    - (1 / (2 * d) - 1 / (2 * (d + len * len))));
            return (r2 * Math.cos(phi) - r1) * (r2 - r1 * Math.cos(phi)) * g;
        }, -lim, lim) * r2 / (Math.PI * len);
    }

    /**
     * Outer surface of a cylinder to the inner surface of a coaxial one of equal length, R = r2/r1,
     * H = L/r1, A = H² + R² − 1, B = H² − R² + 1 (Howell's catalog; Siegel &amp; Howell 4th ed.
     * Appendix C; from memory, hence verified by {@link #innerToOuterByIntegration}):
     * F_21 = 1/R − (1/πR){acos(B/A) − (1/2H)[√((A + 2)² − (2R)²) acos(B/(RA)) + B asin(1/R) − πA/2]}.
     */
    static double outerToInner(double r1, double r2, double len) {
        double rr = r2 / r1, hh = len / r1, a = hh * hh + rr * rr - 1, b = hh * hh - rr * rr + 1;
        return 1 / rr - 1 / (Math.PI * rr) * (Math.acos(b / a) - 1 / (2 * hh)
                * (Math.sqrt((a + 2) * (a + 2) - 4 * rr * rr) * Math.acos(b / (rr * a)) + b * Math.asin(1 / rr) - Math.PI * a / 2));
    }

    /**
     * The outer of two concentric cylinders of equal length to itself, the inner one in the way,
     * by the definition reduced to one integral as in {@link #innerToOuterByIntegration}: for two
     * points of the outer at azimuths 0 and φ, cos θ r = r2 (1 − cos φ) at both ends and
     * D = 2 r2² (1 − cos φ); the chord misses the inner cylinder when |φ| &lt; 2 acos(r1/r2), so
     * F_22 = (r2³ / (π L)) ∫ (1 − cos φ)² G(D) dφ over that range.
     */
    static double outerToItselfByIntegration(double r1, double r2, double len) {
        double lim = 2 * Math.acos(r1 / r2);
        return new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-15).integrate(Integer.MAX_VALUE, phi -> {
            double d = 2 * r2 * r2 * (1 - Math.cos(phi)), sd = Math.sqrt(d);
            double g = 2 * (len * (len / (2 * d * (d + len * len)) + Math.atan(len / sd) / (2 * d * sd))
                    - (1 / (2 * d) - 1 / (2 * (d + len * len))));
            return Math.pow(1 - Math.cos(phi), 2) * g;
        }, -lim, lim) * r2 * r2 * r2 / (Math.PI * len);
    }

    /**
     * Inner surface of the outer of two concentric cylinders of equal length to itself, R = r2/r1,
     * H = L/r1 (Howell's catalog; Siegel &amp; Howell 4th ed. Appendix C; from memory, hence verified
     * by {@link #outerToItselfByIntegration}): F_22 = 1 − 1/R + (2/πR) atan(2√(R² − 1)/H)
     * − (H/2πR){(√(4R² + H²)/H) asin[(4(R² − 1) + (H²/R²)(R² − 2))/(H² + 4(R² − 1))]
     * − asin((R² − 2)/R²) + (π/2)(√(4R² + H²)/H − 1)}.
     */
    static double outerToItself(double r1, double r2, double len) {
        double rr = r2 / r1, hh = len / r1, q = rr * rr, s = Math.sqrt(4 * q + hh * hh);
        return 1 - 1 / rr + 2 / (Math.PI * rr) * Math.atan(2 * Math.sqrt(q - 1) / hh) - hh / (2 * Math.PI * rr)
                * (s / hh * Math.asin((4 * (q - 1) + hh * hh / q * (q - 2)) / (hh * hh + 4 * (q - 1)))
                        - Math.asin((q - 2) / q) + Math.PI / 2 * (s / hh - 1));
    }

    @Test
    void concentricCylindersOfEqualLengthInnerToOuterOuterToItselfAndToTheEndAnnuli() {
        double r1 = 0.5, r2 = 1, len = 1;
        double f12 = (r2 / r1) * outerToInner(r1, r2, len);
        assertThat(f12).isCloseTo(innerToOuterByIntegration(r1, r2, len), within(1e-10));
        assertThat((r2 / r1) * outerToInner(r1, r2, 10)).isCloseTo(innerToOuterByIntegration(r1, r2, 10), within(1e-10));
        Scene s = Scene.builder().add("inner", Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, r1, len, 8, 1, Facing.OUTWARD))
                .add("outer", Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, r2, len, 8, 1, Facing.INWARD))
                .add("bottom", Shapes.annulus(Vec3.ZERO, Vec3.Z, r1, r2, 1, 8))
                .add("top", reversed(Shapes.annulus(new Vec3(0, 0, len), Vec3.Z, r1, r2, 1, 8))).build();
        ViewFactorResult r = compute(s);
        assertThat(r.surfaceAreas()[1]).isCloseTo(2 * Math.PI * r2 * len, within(1e-12));
        assertThat(r.surfaceFactor(0, 1)).isCloseTo(f12, within(1e-6 * f12));
        assertThat(r.surfaceFactor(1, 0)).isCloseTo(f12 * r1 / r2, within(1e-6 * f12));
        // the inner sees only the outer and the two ends, equally (closure and symmetry; Siegel & Howell 4th ed. §4)
        assertThat(r.surfaceFactor(0, 2)).isCloseTo((1 - f12) / 2, within(1e-6 * (1 - f12) / 2));
        assertThat(r.surfaceFactor(0, 3)).isCloseTo((1 - f12) / 2, within(1e-6 * (1 - f12) / 2));
        // the outer sees itself past the inner cylinder (exact visibility through a round body)
        double f22 = outerToItself(r1, r2, len);
        assertThat(f22).isCloseTo(outerToItselfByIntegration(r1, r2, len), within(1e-10));
        assertThat(outerToItself(r1, r2, 10)).isCloseTo(outerToItselfByIntegration(r1, r2, 10), within(1e-10));
        assertThat(r.surfaceFactor(1, 1)).isCloseTo(f22, within(1e-6 * f22));
        // and each end annulus: F_2e = (1 − F_21 − F_22)/2 (closure and symmetry; Siegel & Howell 4th ed. §4)
        double f2e = (1 - f12 * r1 / r2 - f22) / 2;
        assertThat(r.surfaceFactor(1, 2)).isCloseTo(f2e, within(1e-6 * f2e));
        assertThat(r.surfaceFactor(1, 3)).isCloseTo(f2e, within(1e-6 * f2e));
        assertThat(r.methodCounts().curvedOnPolygons()).isZero();
        assertThat(r.maxRowErrorEstimate()).isLessThan(1e-5);
    }

    /**
     * A cavity 1 µm high and 0.15 m in radius (found by the case fuzz harness: it ran for hours):
     * its wall patches are 2·10⁵ times wider than high, beyond what the contour integral resolves
     * within its budget. The answer must come in seconds, say that the tolerance is not met, and
     * stay sane: rows within their estimated error and within 5 % of 1 (the solver refuses a row
     * more than 5 % above 1; the wall's self term is given up to 0, not left at a runaway value)
     * and base to lid the coaxial-disc closed form (Howell's catalogue C-41, as verified above).
     */
    @Test
    @org.junit.jupiter.api.Timeout(120)
    void aDegenerateCavitySaysItsToleranceIsNotMetInsteadOfRunningForHours() {
        double r = 0.15, h = 1e-6;
        ViewFactorResult res = compute(Scene.of(Enclosures.cylindricalCavity(Vec3.ZERO, Vec3.Z, r, h, 16, 4, 2)));
        assertThat(res.maxRowErrorEstimate()).isGreaterThan(1e-5); // the default facet-row tolerance
        assertThat(res.methodCounts().curvedOnPolygons()).isPositive();
        double[] row = new double[res.facetCount()];
        for (int i = 0; i < res.facetCount(); i++) {
            res.copyFacetRow(i, row);
            double sum = 0;
            for (double v : row) {
                assertThat(v).isFinite().isGreaterThanOrEqualTo(0);
                sum += v;
            }
            assertThat(sum).as("row %d", i).isCloseTo(1, within(Math.min(0.05, res.maxRowErrorEstimate())));
        }
        double fbl = ClosedForms.coaxialDiscs(r, r, h);
        assertThat(res.surfaceFactor(1, 2)).isCloseTo(fbl, within(1e-6 * fbl));
    }
}
