package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.Material;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

/**
 * Radiation, convection and conduction in one surface energy balance, against scalar balances
 * solved independently with Apache Commons Math's Brent solver. Newton's law of cooling and
 * the gray small-body exchange q = εσ(T⁴ − Tsur⁴) (Incropera et al., Fundamentals of Heat and
 * Mass Transfer, 6th ed., Eqs. 1.3a and 13.27).
 */
class SurfaceEnergyBalanceTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    private static final BrentSolver BRENT = new BrentSolver(1e-12);

    @Test
    void dissipatingPlateWithConvectionMatchesTheScalarBalance() {
        double eps = 0.8;
        double area = 0.5;
        double power = 400;
        double h = 6;
        double tFluid = 295;
        double tSky = 250;
        EnclosureSurface plate = new EnclosureSurface("plate", new Material("m", new GrayEmissivity(eps), ""), area,
                new BoundaryCondition.HeatInput(power), Double.NaN, new Convection(h, tFluid));
        Enclosure e = new Enclosure(List.of(plate), new double[][] {{0}}, new Environment("sky", tSky));
        SolveResult r = new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("t"));
        double expected = BRENT.solve(200, t -> eps * SIGMA * area * (Math.pow(t, 4) - Math.pow(tSky, 4))
                + h * area * (t - tFluid) - power, 200, 2000);
        SurfaceResult s = r.surface("plate");
        assertThat(s.temperatureK()).isCloseTo(expected, within(1e-7));
        assertThat(s.netHeatW() + s.convectionW()).isCloseTo(power, within(1e-8 * power));
        assertThat(s.heatSuppliedW()).isCloseTo(power, within(1e-8 * power));
    }

    @Test
    void twoPlatesJoinedByAConductiveLinkMatchTheCoupledScalarBalances() {
        // Two plates that see only the surroundings (0 K sink); plate a dissipates P, plate b
        // none; a link of conductance G joins them. Balances (common practice, first law):
        //   P = ε σ A Ta⁴ + G (Ta − Tb),    0 = ε σ A Tb⁴ + G (Tb − Ta).
        double eps = 0.6;
        double area = 0.2;
        double power = 50;
        double g = 0.4;
        Material m = new Material("m", new GrayEmissivity(eps), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("a", m, area, new BoundaryCondition.HeatInput(power), Double.NaN),
                new EnclosureSurface("b", m, area, new BoundaryCondition.Adiabatic(), Double.NaN));
        Enclosure e = new Enclosure(s, new double[][] {{0, 0}, {0, 0}}, new Environment("space", 0.0),
                List.of(new ConductiveLink("a", "b", g)));
        SolveResult r = new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("t"));
        // independent solution: for each Ta, Tb from its own balance; then Ta from a's balance
        // (a solver instance keeps state, so the nested solve needs its own)
        java.util.function.DoubleUnaryOperator tbOf = ta -> new BrentSolver(1e-12).solve(200,
                tb -> eps * SIGMA * area * Math.pow(tb, 4) + g * (tb - ta), 0, ta);
        double ta = BRENT.solve(200, t -> eps * SIGMA * area * Math.pow(t, 4) + g * (t - tbOf.applyAsDouble(t))
                - power, 1, 3000);
        double tb = tbOf.applyAsDouble(ta);
        assertThat(r.surface("a").temperatureK()).isCloseTo(ta, within(1e-6));
        assertThat(r.surface("b").temperatureK()).isCloseTo(tb, within(1e-6));
        assertThat(r.surface("a").conductionW()).isCloseTo(-r.surface("b").conductionW(), within(1e-9));
        // first law: everything dissipated leaves to space
        assertThat(-r.environment().netHeatW()).isCloseTo(power, within(1e-8 * power));
    }

    @Test
    void convectionAloneFixesTheTemperatureLevel() {
        // No fixed temperature and no environment, but the wall convects to air at 300 K: with
        // no dissipation, the closed enclosure settles at the air temperature (common practice).
        Material m = new Material("m", new GrayEmissivity(0.5), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("a", m, 1, new BoundaryCondition.Adiabatic(), Double.NaN,
                        new Convection(10, 300)),
                new EnclosureSurface("b", m, 1, new BoundaryCondition.Adiabatic(), Double.NaN));
        Enclosure e = new Enclosure(s, new double[][] {{0, 1}, {1, 0}}, null);
        SolveResult r = new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("t"));
        assertThat(r.surface("a").temperatureK()).isCloseTo(300, within(1e-6));
        assertThat(r.surface("b").temperatureK()).isCloseTo(300, within(1e-6));
    }
}
