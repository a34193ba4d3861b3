package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.Material;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.TemperatureTabulatedEmissivity;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

class TemperatureSolverTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;

    private static SolveResult plateToSurroundings(SpectralEmissivity m, BoundaryCondition bc, double envK, BandSet bands) {
        EnclosureSurface plate = new EnclosureSurface("plate", new Material("m", m, ""), 1.5, bc, Double.NaN);
        Enclosure e = new Enclosure(List.of(plate), new double[][] {{0}}, new Environment("sky", envK));
        return new TemperatureSolver(Cases.of(e, null)).solve(bands);
    }

    @Test
    void plateWithAGivenFluxToSurroundingsReachesTheClosedFormTemperature() {
        // Small gray body in large surroundings: q = ε σ (T⁴ − Tsur⁴)
        // (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 13.27), solved for T.
        double eps = 0.35;
        double q = 2500;
        double tSur = 290;
        SolveResult r = plateToSurroundings(new GrayEmissivity(eps), new BoundaryCondition.FixedNetFlux(q), tSur,
                BandSet.gray("test"));
        double expected = Math.pow(Math.pow(tSur, 4) + q / (eps * SIGMA), 0.25);
        assertThat(r.surface("plate").temperatureK()).isCloseTo(expected, within(1e-9 * expected));
        assertThat(r.environment().netHeatW()).isCloseTo(-q * 1.5, within(1e-9 * q));
    }

    @Test
    void surroundingsAreAbsorbedWithTheirOwnSpectrumNotTheSurfaces() {
        // Small convex body in large surroundings, non-gray: it emits ε(T) σT⁴ and absorbs
        // α(T_sur) σT_sur⁴, where α is the total absorptivity for blackbody irradiation at T_sur
        // (Incropera et al., 6th ed., §12.7 and Eq. 13.27; Kirchhoff for a diffuse surface).
        // For a step surface (0.9 below 3 µm, 0.2 above) both follow from the blackbody fraction.
        SpectralEmissivity step = new TabulatedEmissivity(new double[] {3, Math.nextUp(3.0)}, new double[] {0.9, 0.2});
        double t = 1200;
        double tSur = 300;
        SolveResult r = plateToSurroundings(step, new BoundaryCondition.FixedTemperature(t), tSur, BandSet.gray("t"));
        double epsT = 0.2 + 0.7 * org.exitance.spectral.Planck.fractionBelow(3 * t);
        double alphaSur = 0.2 + 0.7 * org.exitance.spectral.Planck.fractionBelow(3 * tSur);
        double expected = 1.5 * SIGMA * (epsT * Math.pow(t, 4) - alphaSur * Math.pow(tSur, 4));
        assertThat(r.surface("plate").netHeatW()).isCloseTo(expected, within(1e-9 * expected));
    }

    @Test
    void temperatureDependentEmissivityIsUpdatedToConvergence() {
        // ε(T) = 0.3 at 300 K rising linearly to 0.6 at 900 K, gray at each temperature; the plate
        // dissipates q = 20 kW/m² to a 0 K sink: q = ε(T) σ T⁴, solved independently with Apache
        // Commons Math's Brent solver.
        SpectralEmissivity m = new TemperatureTabulatedEmissivity(new double[] {300, 900}, new TabulatedEmissivity[] {
            new TabulatedEmissivity(new double[] {1}, new double[] {0.3}),
            new TabulatedEmissivity(new double[] {1}, new double[] {0.6})});
        double q = 20_000;
        SolveResult r = plateToSurroundings(m, new BoundaryCondition.FixedNetFlux(q), 0.0,
                new BandSet(new double[] {2, 5}, "test"));
        double expected = new BrentSolver(1e-12).solve(200,
                t -> (0.3 + 0.3 * (t - 300) / 600) * SIGMA * Math.pow(t, 4) - q, 300, 900);
        assertThat(r.surface("plate").temperatureK()).isCloseTo(expected, within(1e-6));
        assertThat(r.solver().propertyIterations()).isGreaterThan(1);
    }

    @Test
    void allSurfacesWithUnknownTemperatureAndNoEnvironmentIsIllPosed() {
        Material m = new Material("m", new GrayEmissivity(0.5), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("a", m, 1, new BoundaryCondition.Adiabatic(), Double.NaN),
                new EnclosureSurface("b", m, 1, new BoundaryCondition.FixedNetHeat(0), Double.NaN));
        Enclosure e = new Enclosure(s, new double[][] {{0, 1}, {1, 0}}, null);
        assertThatThrownBy(() -> new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("t")))
                .isInstanceOf(IllPosedCaseException.class).hasMessageContaining("fix at least one");
    }

    @Test
    void aDemandThatNeedsATemperatureBelowAbsoluteZeroIsReportedNotSolved() {
        // The plate faces a 1000 K wall; it cannot absorb more than ε σ (1000⁴) A, yet it is asked to.
        Material m = new Material("m", new GrayEmissivity(0.5), "");
        double maxAbsorbed = 0.5 * SIGMA * Math.pow(1000, 4);
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("wall", m, 1, new BoundaryCondition.FixedTemperature(1000), Double.NaN),
                new EnclosureSurface("plate", m, 1, new BoundaryCondition.FixedNetFlux(-3 * maxAbsorbed), Double.NaN));
        Enclosure e = new Enclosure(s, new double[][] {{0, 1}, {1, 0}}, null);
        assertThatThrownBy(() -> new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("t")))
                .isInstanceOf(SolveFailedException.class).hasMessageContaining("plate");
    }

    @Test
    void aSurfaceThatCannotEmitHasNoDefinedTemperature() {
        Material black = new Material("black", new GrayEmissivity(1), "");
        Material mirror = new Material("mirror", new GrayEmissivity(0), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", black, 1, new BoundaryCondition.FixedTemperature(800), Double.NaN),
                new EnclosureSurface("shield", mirror, 1, new BoundaryCondition.Adiabatic(), Double.NaN));
        Enclosure e = new Enclosure(s, new double[][] {{0, 1}, {1, 0}}, null);
        assertThatThrownBy(() -> new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("t")))
                .isInstanceOf(IllPosedCaseException.class).hasMessageContaining("shield");
    }
}
