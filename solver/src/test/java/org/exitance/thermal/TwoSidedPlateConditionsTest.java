package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.LoadCase;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.result.FacePairResult;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.support.SolveCheck;
import org.junit.jupiter.api.Test;

/**
 * A two-sided opaque plate (front ε_f = 0.8, back ε_b = 0.3, each face of area A) between a hot
 * black wall (T_h) that only its front sees and a cold black wall (T_c) that only its back sees,
 * every gap a pair of infinite parallel planes (F = 1), under every boundary condition and with
 * convection, a conductive link and load cases. With a black partner each face's net heat is the
 * two-surface closed form ε A σ(T_p⁴ − T_wall⁴) (Incropera et al., Fundamentals of Heat and Mass
 * Transfer, 6th ed., Table 13.3, infinite parallel planes with ε₂ = 1). Where the balance mixes
 * radiation, convection h A (T − T_fluid) and conduction G (T − T_c), the plate temperature is
 * found by Brent's method (Apache Commons Math) on that balance, written here.
 */
class TwoSidedPlateConditionsTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    private static final double AREA = 2.0;
    private static final double TH = 1000;
    private static final double TC = 300;
    private static final double EF = 0.8;
    private static final double EB = 0.3;
    private static final Material BLACK = new Material("black", new GrayEmissivity(1), "");
    private static final Material OXIDISED = new Material("oxidised", new GrayEmissivity(EF), "");
    private static final Material POLISHED = new Material("polished", new GrayEmissivity(EB), "");

    /**
     * hot | front, back | cold.
     *
     * @param onBack  true to carry the condition on the back face (the second of the pair)
     */
    private static RadiationCase plate(BoundaryCondition bc, boolean onBack, Convection front, Convection back,
                                       List<ConductiveLink> links, List<LoadCase> loadCases) {
        BoundaryCondition other = new BoundaryCondition.OnOtherFace();
        List<EnclosureSurface> s = new ArrayList<>();
        s.add(new EnclosureSurface("hot", BLACK, AREA, new BoundaryCondition.FixedTemperature(TH), Double.NaN));
        s.add(new EnclosureSurface("front", OXIDISED, AREA, onBack ? other : bc, Double.NaN, front, "back"));
        s.add(new EnclosureSurface("back", POLISHED, AREA, onBack ? bc : other, Double.NaN, back, "front"));
        s.add(new EnclosureSurface("cold", BLACK, AREA, new BoundaryCondition.FixedTemperature(TC), Double.NaN));
        double[][] f = {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}};
        return new RadiationCase("two-sided plate", "", List.of(BLACK, OXIDISED, POLISHED),
                new Enclosure(s, f, null, links), BandSet.gray("gray"), SolverSettings.DEFAULT, List.of(), loadCases);
    }

    private static double qFront(double tp) {
        return EF * AREA * SIGMA * (Math.pow(tp, 4) - Math.pow(TH, 4));
    }

    private static double qBack(double tp) {
        return EB * AREA * SIGMA * (Math.pow(tp, 4) - Math.pow(TC, 4));
    }

    private static double brent(DoubleUnaryOperator balance) {
        return new BrentSolver(1e-12, 1e-10).solve(200, balance::applyAsDouble, 1, 3000);
    }

    private static void assertFaces(SolveResult r, double tp, double heatSupplied) {
        double scale = Math.abs(qFront(tp)) + Math.abs(qBack(tp));
        assertThat(r.surface("front").temperatureK()).isCloseTo(tp, within(1e-8 * tp));
        assertThat(r.surface("back").temperatureK()).isEqualTo(r.surface("front").temperatureK());
        assertThat(r.surface("front").netHeatW()).isCloseTo(qFront(tp), within(1e-9 * scale));
        assertThat(r.surface("back").netHeatW()).isCloseTo(qBack(tp), within(1e-9 * scale));
        FacePairResult pair = r.twoSided().get(0);
        assertThat(r.twoSided()).hasSize(1);
        assertThat(pair.netHeatW()).isCloseTo(qFront(tp) + qBack(tp), within(1e-9 * scale));
        assertThat(pair.heatSuppliedW()).isCloseTo(heatSupplied, within(1e-8 * scale));
        assertThat(pair.temperatureK()).isCloseTo(tp, within(1e-8 * tp));
    }

    @Test
    void aFixedTemperatureOnTheBackFaceHoldsTheNodeAndSuppliesBothFacesLinksAndConvection() {
        Convection conv = new Convection(12, 320);
        List<ConductiveLink> link = List.of(new ConductiveLink("front", "cold", 3.5));
        RadiationCase c = plate(new BoundaryCondition.FixedTemperature(700), true, null, conv, link, List.of());
        SolveResult r = new TemperatureSolver(c).solve(BandSet.gray("gray"));
        double supplied = qFront(700) + qBack(700) + 12 * AREA * (700 - 320) + 3.5 * (700 - TC);
        assertFaces(r, 700, supplied);
        assertThat(r.surface("back").convectionW()).isCloseTo(12 * AREA * 380, within(1e-9));
        assertThat(r.surface("front").conductionW()).isCloseTo(3.5 * 400, within(1e-9));
        SolveCheck.assertSolved(c, r);
    }

    @Test
    void aNetHeatCountsBothFacesTogether() {
        double q = -6000; // W, the node absorbs 6 kW by radiation (it is cooled from inside)
        SolveResult r = new TemperatureSolver(plate(new BoundaryCondition.FixedNetHeat(q), false, null, null,
                List.of(), List.of())).solve(BandSet.gray("gray"));
        // q = ε_f A σ(T⁴ − T_h⁴) + ε_b A σ(T⁴ − T_c⁴)
        double tp4 = (q / (AREA * SIGMA) + EF * Math.pow(TH, 4) + EB * Math.pow(TC, 4)) / (EF + EB);
        assertFaces(r, Math.pow(tp4, 0.25), q);
    }

    @Test
    void aNetFluxIsPerFaceArea() {
        double flux = -2500; // W/m² of one face: the node's net heat is flux × A (not × 2A)
        SolveResult r = new TemperatureSolver(plate(new BoundaryCondition.FixedNetFlux(flux), true, null, null,
                List.of(), List.of())).solve(BandSet.gray("gray"));
        double tp4 = (flux / SIGMA + EF * Math.pow(TH, 4) + EB * Math.pow(TC, 4)) / (EF + EB);
        assertFaces(r, Math.pow(tp4, 0.25), flux * AREA);
    }

    @Test
    void aDissipationLeavesByBothFacesConvectionOnEachFaceAndALink() {
        double p = 9000;
        Convection cf = new Convection(8, 400);
        Convection cb = new Convection(25, 290);
        List<ConductiveLink> link = List.of(new ConductiveLink("cold", "back", 6));
        RadiationCase c = plate(new BoundaryCondition.HeatInput(p), false, cf, cb, link, List.of());
        SolveResult r = new TemperatureSolver(c).solve(BandSet.gray("gray"));
        double tp = brent(t -> qFront(t) + qBack(t) + 8 * AREA * (t - 400) + 25 * AREA * (t - 290) + 6 * (t - TC) - p);
        assertFaces(r, tp, p);
        SolveCheck.assertSolved(c, r);
    }

    @Test
    void anAdiabaticPlateWithConvectionBalancesRadiationAgainstTheFluid() {
        Convection cb = new Convection(15, 350);
        RadiationCase c = plate(new BoundaryCondition.Adiabatic(), false, null, cb, List.of(), List.of());
        SolveResult r = new TemperatureSolver(c).solve(BandSet.gray("gray"));
        double tp = brent(t -> qFront(t) + qBack(t) + 15 * AREA * (t - 350));
        assertFaces(r, tp, 0);
        // radiation alone does not balance: the fluid takes the rest
        assertThat(r.twoSided().get(0).netHeatW()).isCloseTo(-15 * AREA * (tp - 350), within(1e-6));
    }

    @Test
    void loadCasesNamingEitherFaceReplaceTheNodesCondition() {
        List<LoadCase> lcs = List.of(
                new LoadCase("powered", "", Map.of("back", new BoundaryCondition.HeatInput(4000)), null),
                new LoadCase("held", "", Map.of("front", new BoundaryCondition.FixedTemperature(650)), null));
        RadiationCase c = plate(new BoundaryCondition.Adiabatic(), false, null, null, List.of(), lcs);
        List<LoadCaseResult> all = CaseSolver.solveAll(c, BandSet.gray("gray"), null);
        assertThat(all).hasSize(2);
        double powered = brent(t -> qFront(t) + qBack(t) - 4000);
        assertFaces(all.get(0).result(), powered, 4000);
        assertFaces(all.get(1).result(), 650, qFront(650) + qBack(650));
        // and the base case, adiabatic: T⁴ = (ε_f T_h⁴ + ε_b T_c⁴)/(ε_f + ε_b)
        SolveResult base = new TemperatureSolver(c).solve(BandSet.gray("gray"));
        assertFaces(base, Math.pow((EF * Math.pow(TH, 4) + EB * Math.pow(TC, 4)) / (EF + EB), 0.25), 0);
    }
}
