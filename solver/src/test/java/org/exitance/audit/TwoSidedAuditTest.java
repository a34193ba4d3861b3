package org.exitance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.ReferenceAccess;
import org.exitance.spectral.TabulatedEmissivity;
import org.junit.jupiter.api.Test;

/**
 * The gray-body audit of an adiabatic two-sided plate whose front is selective (ε = 0.6 below 3 µm,
 * 0.1 above) and whose back is gray (0.3), between a hot black wall (1400 K) seen by the front and
 * a cold black wall (300 K) seen by the back, each gap a pair of infinite parallel planes. With
 * black partners each face's band exchange is ε_k (E_k(T_p) − E_k(T_wall)) (Incropera et al., 6th
 * ed., Table 13.3 with ε₂ = 1, per band: Siegel &amp; Howell, 5th ed., band-energy method). The
 * band-wise plate temperature balances the band sums; the gray shortcut uses the front's total
 * emissivity at the plate's own temperature, ε(T) = 0.6 F(3 µm·T) + 0.1 (1 − F(3 µm·T)). Both are
 * found here by Brent's method, with blackbody fractions F from a quadrature of Planck's law in the
 * test support.
 */
class TwoSidedAuditTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    private static final double EDGE = 3;

    private static double eb(int band, double t) {
        double f = ReferenceAccess.fractionBelow(EDGE * t);
        return SIGMA * Math.pow(t, 4) * (band == 0 ? f : 1 - f);
    }

    @Test
    void theAuditComparesTheBandWiseAndGrayPlateTemperaturesOfATwoSidedPlate() {
        Material black = new Material("black", new GrayEmissivity(1), "");
        Material selective = new Material("selective",
                new TabulatedEmissivity(new double[] {EDGE, Math.nextUp(EDGE)}, new double[] {0.6, 0.1}), "");
        Material gray = new Material("gray", new GrayEmissivity(0.3), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", black, 1, new BoundaryCondition.FixedTemperature(1400), Double.NaN),
                new EnclosureSurface("front", selective, 1, new BoundaryCondition.Adiabatic(), Double.NaN, null, "back"),
                new EnclosureSurface("back", gray, 1, new BoundaryCondition.OnOtherFace(), Double.NaN, null, "front"),
                new EnclosureSurface("cold", black, 1, new BoundaryCondition.FixedTemperature(300), Double.NaN));
        double[][] f = {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}};
        RadiationCase c = new RadiationCase("audit", "", List.of(black, selective, gray), new Enclosure(s, f, null),
                null, SolverSettings.DEFAULT);
        AuditResult a = GrayAudit.run(c, new BandSet(new double[] {EDGE}, "two bands"), 5, "as given");

        double[] eFront = {0.6, 0.1};
        DoubleUnaryOperator bandBalance = t -> eFront[0] * (eb(0, t) - eb(0, 1400)) + eFront[1] * (eb(1, t) - eb(1, 1400))
                + 0.3 * SIGMA * (Math.pow(t, 4) - Math.pow(300, 4));
        DoubleUnaryOperator total = t -> 0.6 * ReferenceAccess.fractionBelow(EDGE * t)
                + 0.1 * (1 - ReferenceAccess.fractionBelow(EDGE * t));
        DoubleUnaryOperator grayBalance = t -> total.applyAsDouble(t) * SIGMA * (Math.pow(t, 4) - Math.pow(1400, 4))
                + 0.3 * SIGMA * (Math.pow(t, 4) - Math.pow(300, 4));
        BrentSolver brent = new BrentSolver(1e-13, 1e-11);
        double tb = brent.solve(200, bandBalance::applyAsDouble, 300, 1400);
        double tg = brent.solve(200, grayBalance::applyAsDouble, 300, 1400);

        AuditRow front = a.rows().stream().filter(r -> r.surface().equals("front")).findFirst().orElseThrow();
        AuditRow back = a.rows().stream().filter(r -> r.surface().equals("back")).findFirst().orElseThrow();
        assertThat(front.bandTemperatureK()).isCloseTo(tb, within(1e-6));
        assertThat(front.grayTemperatureK()).isCloseTo(tg, within(1e-6));
        assertThat(back.grayTemperatureK()).isEqualTo(front.grayTemperatureK());
        assertThat(front.grayErrorPct()).isCloseTo(100 * (Math.pow(tg / tb, 4) - 1), within(1e-6));
        // the gray back face exchanges ε_b σ(T⁴ − T_c⁴) in both solutions, at their own plate temperatures
        double qBack = 0.3 * SIGMA * (Math.pow(tg, 4) - Math.pow(300, 4));
        assertThat(back.grayNetHeatW()).isCloseTo(qBack, within(1e-8 * qBack));
        assertThat(front.flagged()).isEqualTo(Math.abs(100 * (Math.pow(tg / tb, 4) - 1)) > 5);
        assertThat(a.gray().twoSided()).singleElement().satisfies(p ->
                assertThat(p.netHeatW()).isCloseTo(0, within(1e-9 * qBack)));
    }
}
