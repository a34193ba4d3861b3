package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Converged means converged: stiff conductive links, nearly non-emitting surfaces and exact
 * starting guesses, each against a reference computed here independently of the solver.
 *
 * <p>Geometry of the link cases: two pairs of infinite parallel plates, hot–front and back–cold
 * (F = 1 within a pair), the two middle plates joined by a conductive link G. Per pair the
 * two-surface gray exchange is {@code q = σ(T₁⁴ − T₂⁴) / (1/ε₁ + 1/ε₂ − 1)} (Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.3, infinite parallel planes); the
 * link carries {@code G (T_f − T_b)}. The reference solves the two balances with Brent's method
 * (Commons Math).
 */
class ConvergenceTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018

    /**
     * Heat through the chain (W, per unit area) from the closed forms: for a trial heat q the
     * middle temperatures follow from each pair, T_f⁴ = T_h⁴ − q R₁/σ and T_b⁴ = T_c⁴ + q R₂/σ
     * (R = 1/ε₁ + 1/ε₂ − 1), and Brent finds the q that the link carries, q = G (T_f − T_b).
     */
    private static double chainHeat(double th, double tc, double eOuter, double eMiddle, double g) {
        double r = 1 / eOuter + 1 / eMiddle - 1;
        double qMax = SIGMA * (Math.pow(th, 4) - Math.pow(tc, 4)) / (2 * r);
        return new BrentSolver(1e-300, Math.ulp(qMax)).solve(500, q -> {
            double tf = Math.pow(Math.pow(th, 4) - q * r / SIGMA, 0.25);
            double tb = Math.pow(Math.pow(tc, 4) + q * r / SIGMA, 0.25);
            return g * (tf - tb) - q;
        }, 0, qMax);
    }

    private static RadiationCase chain(double th, double tc, double eOuter, double eMiddle, double g) {
        Material outer = new Material("outer", new GrayEmissivity(eOuter), "");
        Material middle = new Material("middle", new GrayEmissivity(eMiddle), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", outer, 1, new BoundaryCondition.FixedTemperature(th), Double.NaN),
                new EnclosureSurface("front", middle, 1, new BoundaryCondition.Adiabatic(), Double.NaN),
                new EnclosureSurface("back", middle, 1, new BoundaryCondition.Adiabatic(), Double.NaN),
                new EnclosureSurface("cold", outer, 1, new BoundaryCondition.FixedTemperature(tc), Double.NaN));
        double[][] f = {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}};
        Enclosure e = new Enclosure(s, f, null, List.of(new ConductiveLink("front", "back", g)));
        return new RadiationCase("chain", "", List.of(), e, null, SolverSettings.DEFAULT, List.of());
    }

    /** A 1000 K furnace wall, a shield stand-in of two faces joined by G, a 300 K wall. */
    @ParameterizedTest(name = "G = {0} W/K")
    @ValueSource(doubles = {1e-6, 1e-3, 1, 1e3, 1e5, 1e8})
    void furnaceShieldWithAnyLinkConductanceConverges(double g) {
        SolveResult r = new TemperatureSolver(chain(1000, 300, 0.8, 0.1, g)).solve(BandSet.gray("gray"));
        double q = chainHeat(1000, 300, 0.8, 0.1, g);
        assertThat(r.surface("hot").netHeatW()).isCloseTo(q, org.assertj.core.data.Offset.offset(1e-9 * Math.abs(q) + 1e-12));
        assertThat(r.solver().newtonIterations()).isPositive();
        assertThat(r.solver().lastTemperatureStepK()).isLessThanOrEqualTo(1e-6);
    }

    /** A cryogenic line: radiation carries under a watt, the link 10⁴ W/K. */
    @ParameterizedTest(name = "G = {0} W/K")
    @ValueSource(doubles = {1e-6, 1e2, 1e4, 1e8})
    void cryogenicLineWithStiffLinkConverges(double g) {
        SolveResult r = new TemperatureSolver(chain(80, 20, 0.05, 0.05, g)).solve(BandSet.gray("gray"));
        double q = chainHeat(80, 20, 0.05, 0.05, g);
        assertThat(Math.abs(q)).isLessThan(1.0);
        assertThat(r.surface("hot").netHeatW()).isCloseTo(q, org.assertj.core.data.Offset.offset(1e-9 * Math.abs(q)));
    }

    /**
     * A wall between black surfaces at 1000 K and 300 K (each seen with F = 1/2) whose emissivity
     * is c·g(λ), with g two steps inside the two bands. As c → 0 the wall's temperature tends to
     * the T* at which it would emit, band by band weighted by g, what it absorbs; it then reflects
     * everything else, and being planar (F_ww = 0) it sees none of its own reflection, so its
     * irradiation is exactly ½E_b(1000 K) + ½E_b(300 K) per band. Independent reference: the band
     * balance Σ_k g_k [f_k(T*)T*⁴ − ½f_k(1000)1000⁴ − ½f_k(300)300⁴] = 0 solved by Brent with band
     * fractions from the series written in the test (Reference#fractionBelow; Siegel &amp; Howell).
     */
    @ParameterizedTest(name = "c = {0}")
    @CsvSource({"1e-300", "1e-100", "1e-12", "1e-9", "1e-6"})
    void nearlyNonEmittingWallReachesItsLimitTemperature(double c) {
        double edge = 4.0;
        double g1 = 1.0;
        double g2 = 0.25;
        double[] nodes = {edge, Math.nextUp(edge)};
        Material wall = new Material("wall", new TabulatedEmissivity(nodes, new double[] {c * g1, c * g2}), "");
        Material black = new Material("black", new GrayEmissivity(1.0), "");
        List<EnclosureSurface> s = new ArrayList<>(List.of(
                new EnclosureSurface("hot", black, 1, new BoundaryCondition.FixedTemperature(1000), Double.NaN),
                new EnclosureSurface("wall", wall, 1, new BoundaryCondition.Adiabatic(), Double.NaN),
                new EnclosureSurface("cold", black, 1, new BoundaryCondition.FixedTemperature(300), Double.NaN)));
        double[][] f = {{0, 0.5, 0.5}, {0.5, 0, 0.5}, {0.5, 0.5, 0}};
        RadiationCase rc = new RadiationCase("limit", "", List.of(), new Enclosure(s, f, null), null,
                SolverSettings.DEFAULT, List.of());
        SolveResult r = new TemperatureSolver(rc).solve(new BandSet(new double[] {edge}, "two bands"));
        java.util.function.DoubleUnaryOperator below = t -> org.exitance.spectral.ReferenceAccess.fractionBelow(edge * t);
        double target = 0.5 * (g1 * below.applyAsDouble(1000) + g2 * (1 - below.applyAsDouble(1000))) * 1e12
                + 0.5 * (g1 * below.applyAsDouble(300) + g2 * (1 - below.applyAsDouble(300))) * Math.pow(300, 4);
        double tStar = new BrentSolver(1e-14, 1e-12).solve(500, t ->
                (g1 * below.applyAsDouble(t) + g2 * (1 - below.applyAsDouble(t))) * Math.pow(t, 4) - target, 300, 1000);
        // the wall's own emission perturbs the limit by O(c): below 1e-5 K for c ≤ 1e-6
        assertThat(r.surface("wall").temperatureK()).isCloseTo(tStar, org.assertj.core.data.Offset.offset(1e-5));
        assertThat(r.solver().newtonIterations()).isPositive();
    }

    /**
     * An exact starting guess is still checked by a Newton step, never reported after zero
     * iterations. A two-sided gray plate (one node) between a 1000 K and a 300 K plate, all with
     * the same ε, balances at T⁴ = (T_h⁴ + T_c⁴)/2 (one radiation shield of equal emissivity;
     * Incropera 6th ed., shield series form, from memory); the solve starts there.
     */
    @org.junit.jupiter.api.Test
    void anExactStartIsCheckedByAtLeastOneStep() {
        double tMid = Math.pow((Math.pow(1000, 4) + Math.pow(300, 4)) / 2, 0.25);
        Material m = new Material("m", new GrayEmissivity(0.5), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", m, 1, new BoundaryCondition.FixedTemperature(1000), Double.NaN),
                new EnclosureSurface("front", m, 1, new BoundaryCondition.Adiabatic(), tMid, null, "back"),
                new EnclosureSurface("back", m, 1, new BoundaryCondition.OnOtherFace(), Double.NaN, null, "front"),
                new EnclosureSurface("cold", m, 1, new BoundaryCondition.FixedTemperature(300), Double.NaN));
        double[][] f = {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}};
        RadiationCase exact = new RadiationCase("exact start", "", List.of(), new Enclosure(s, f, null), null,
                SolverSettings.DEFAULT, List.of());
        SolveResult r = new TemperatureSolver(exact).solve(BandSet.gray("gray"));
        assertThat(r.solver().newtonIterations()).isGreaterThanOrEqualTo(1);
        assertThat(r.solver().lastTemperatureStepK()).isLessThanOrEqualTo(1e-6);
        assertThat(r.surface("front").temperatureK()).isCloseTo(tMid, org.assertj.core.data.Offset.offset(1e-9));
    }
}
