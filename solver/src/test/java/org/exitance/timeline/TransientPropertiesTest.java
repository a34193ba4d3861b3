package org.exitance.timeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.conduction.HeatCapacity;
import org.exitance.conduction.Layer;
import org.exitance.conduction.OuterBoundary;
import org.exitance.conduction.PropertyTable;
import org.exitance.conduction.Wall;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.ViewFactorMatrix;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.support.Cases;
import org.exitance.thermal.TemperatureSolver;
import org.junit.jupiter.api.Test;

/**
 * Laws of the integrator: its order, its long-time limit, and energy conservation checked by a
 * computation of its own.
 */
class TransientPropertiesTest {
    private static final double TS = 300;

    /** The lumped body's exact temperature at t (K), by a root finder on the closed-form time. */
    private static double exactCooling(double t) {
        return new BrentSolver(1e-12).solve(200, x -> LumpedCoolingTest.closedForm(TS, LumpedCoolingTest.T0, x) - t,
                TS + 1e-6, LumpedCoolingTest.T0);
    }

    private static double coolingError(TimeSettings ts, double t) {
        TransientResult r = Transients.run(LumpedCoolingTest.body(TS),
                Map.of("body", HeatCapacity.ofJPerK(LumpedCoolingTest.C)), Drivers.none(), ts);
        return Transients.at(r, "body", t) - exactCooling(t);
    }

    @Test
    void fixedStepErrorFallsAsTheSquareOfTheStep() {
        // BDF2 is of order 2 (Hairer and Wanner, Solving ODEs II, §V.1): halving h quarters the error
        double t = 3000;
        double e1 = coolingError(Transients.fixedStep(t, 60, LumpedCoolingTest.T0, t), t);
        double e2 = coolingError(Transients.fixedStep(t, 30, LumpedCoolingTest.T0, t), t);
        double e3 = coolingError(Transients.fixedStep(t, 15, LumpedCoolingTest.T0, t), t);
        assertThat(e1 / e2).isBetween(3.4, 4.6);
        assertThat(e2 / e3).isBetween(3.6, 4.4);
    }

    @Test
    void errorFallsWithTheToleranceAsTheOrderSays() {
        // error per step ∝ h³ ≤ tol, steps ∝ 1/h, so the global error ∝ h² ∝ tol^(2/3) (Hairer, Nørsett and
        // Wanner, Solving ODEs I, §II.4): a tolerance 8 times smaller gives an error about 4 times smaller
        double t = 3000;
        double e1 = Math.abs(coolingError(Transients.adaptive(t, 8e-3, LumpedCoolingTest.T0, t), t));
        double e2 = Math.abs(coolingError(Transients.adaptive(t, 1e-3, LumpedCoolingTest.T0, t), t));
        double e3 = Math.abs(coolingError(Transients.adaptive(t, 1.25e-4, LumpedCoolingTest.T0, t), t));
        assertThat(e1 / e2).isBetween(2.5, 6.5);
        assertThat(e2 / e3).isBetween(2.5, 6.5);
    }

    /** A heater and a lined wall, open to surroundings at 300 K through a part of their view. */
    static RadiationCase heaterAndLining() {
        Material m = new Material("m", new GrayEmissivity(0.8), "");
        EnclosureSurface heater = new EnclosureSurface("heater", m, 0.5, new BoundaryCondition.HeatInput(800), 300);
        EnclosureSurface lining = new EnclosureSurface("lining", m, 2.0, new BoundaryCondition.Adiabatic(), 300);
        double[][] f = {{0, 0.9}, {0.225, 0.6}};
        Wall w = new Wall(List.of(new Layer(0.04, PropertyTable.constant(0.4), 800, 1000, 10),
                new Layer(0.002, PropertyTable.constant(40), 7800, 470, 2)), new OuterBoundary.Exposed(8, 0.5, 300));
        Enclosure e = new Enclosure(List.of(heater, lining), ViewFactorMatrix.copyOf(f), new Environment("room", 300),
                List.of(), Map.of("lining", w));
        return Cases.of(e, null);
    }

    static final Map<String, HeatCapacity> CAPS = Map.of("heater", HeatCapacity.ofJPerK(3000));

    @Test
    void longRunEndsAtTheSteadySolution() {
        SolveResult steady = new TemperatureSolver(heaterAndLining()).solve(BandSet.gray("test"));
        double end = 400_000;
        TransientResult r = Transients.run(heaterAndLining(), CAPS, Drivers.none(),
                Transients.adaptive(end, 1e-3, 300, end));
        for (String s : List.of("heater", "lining")) {
            assertThat(Transients.at(r, s, end)).as(s).isCloseTo(steady.surface(s).temperatureK(), within(1e-3));
        }
    }

    /** (stored change) − (supplied − lost) over a run, from the samples alone (J). */
    static double independentImbalance(RadiationCase m, TransientResult r, double heaterCapacity) {
        double[] widths = new double[12];
        double[] rhoC = new double[12];
        for (int j = 0; j < 12; j++) {
            widths[j] = j < 10 ? 0.004 : 0.001;
            rhoC[j] = j < 10 ? 800 * 1000 : 7800 * 470;
        }
        int h = r.indexOf("heater");
        int l = r.indexOf("lining");
        double[] stored = new double[r.samples().size()];
        double[] net = new double[stored.length];
        for (int k = 0; k < stored.length; k++) {
            Sample s = r.samples().get(k);
            double wall = 0;
            for (int j = 0; j < 12; j++) {
                wall += rhoC[j] * widths[j] * s.wallCellsK()[l][j];
            }
            stored[k] = heaterCapacity * s.temperatureK()[h] + 2.0 * wall;
            double lost = 0;
            for (int i : new int[] {h, l}) {
                lost += s.radiationW()[i] + s.convectionW()[i] + s.linksW()[i];
            }
            net[k] = 800 - lost - s.wallOutW()[l];
        }
        double integral = 0;
        for (int k = 1; k < stored.length; k++) {
            double dt = r.samples().get(k).timeS() - r.samples().get(k - 1).timeS();
            integral += 0.5 * dt * (net[k] + net[k - 1]);
        }
        return stored[stored.length - 1] - stored[0] - integral;
    }

    @Test
    void storedHeatChangesByWhatIsSuppliedLessWhatIsLost() {
        double end = 20_000;
        TimeSettings ts = new TimeSettings(end, 1e-3, 1e-3, 500, 1e-9, Double.NaN, 5, new double[0], 300,
                Double.NaN, Double.NaN, List.of(), List.of());
        RadiationCase m = heaterAndLining();
        TransientResult r = Transients.run(m, CAPS, Drivers.none(), ts);
        double supplied = 800 * end;
        double imbalance = independentImbalance(m, r, 3000);
        // stored energy from temperatures × capacities (widths of the stated subdivision, 10 and 2 cells),
        // the boundary heats integrated by the trapezoid over outputs 5 s apart
        double bound = 1e-6 * supplied;
        assertThat(Math.abs(imbalance)).isLessThan(bound);
        // the check can fail: a heater capacity 1 % off (3030 J/K) leaves a gap far beyond the bound
        double wrong = independentImbalance(m, r, 3030);
        assertThat(Math.abs(wrong)).isGreaterThan(100 * bound);
        // the integrator's own account closes too
        assertThat(r.energy().driftRelative()).isLessThan(1e-6);
    }
}
