package org.exitance.timeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.exitance.conduction.HeatCapacity;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.ExternalSource;
import org.exitance.model.LoadCase;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

/** Schedules, thermostats and periodic runs. */
class SchedulesTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;

    @Test
    void scheduleRampsHoldsJumpsAndRepeats() {
        // piecewise-linear interpolation (common practice)
        Schedule s = new Schedule(new double[] {0, 100, 200, 200, 300}, new double[] {0, 50, 50, 10, 10}, Double.NaN);
        assertThat(s.at(-5)).isEqualTo(0);
        assertThat(s.at(40)).isCloseTo(20, within(1e-12));
        assertThat(s.at(150)).isEqualTo(50);
        assertThat(s.at(199.999)).isEqualTo(50);
        assertThat(s.at(200)).isEqualTo(10);
        assertThat(s.at(1e6)).isEqualTo(10);
        Schedule orbit = new Schedule(new double[] {0, 60, 60, 90}, new double[] {1, 1, 0, 0}, 90);
        assertThat(orbit.at(30 + 90 * 7)).isEqualTo(1);
        assertThat(orbit.at(75 + 90 * 7)).isEqualTo(0);
        assertThat(orbit.knotsIn(80, 200)).containsExactly(90.0, 150.0, 180.0);
    }

    private static RadiationCase box(double sinkK, List<ExternalSource> sources) {
        EnclosureSurface s = new EnclosureSurface("box", new Material("m", new GrayEmissivity(0.8), ""), 0.5,
                new BoundaryCondition.HeatInput(0), Double.NaN);
        Enclosure e = new Enclosure(List.of(s), new double[][] {{0}}, new Environment("space", sinkK));
        return new RadiationCase("test", "", List.of(s.material()), e, null, SolverSettings.DEFAULT, sources,
                List.<LoadCase>of());
    }

    @Test
    void thermostatHoldsTheSensorBetweenItsThresholdsWithTheQuadraturePeriod() {
        double c = 5000;
        double p = 200;
        double ts = 250;
        double on = 280;
        double off = 290;
        Drivers d = new Drivers(Map.of(), Map.of(), Map.of(), null,
                List.of(new Drivers.Thermostat("box", "box", on, off, p)));
        double tol = 1e-3;
        TimeSettings time = new TimeSettings(20_000, tol, 0.01, 200, 1e-9, Double.NaN, Double.NaN, new double[0], 285,
                Double.NaN, Double.NaN, List.of(), List.of());
        TransientResult r = Transients.run(box(ts, List.of()), Map.of("box", HeatCapacity.ofJPerK(c)), d, time);
        assertThat(r.switches().size()).isGreaterThan(8);
        // a switch happens within the tolerance of its threshold: the extremes stay inside the band
        assertThat(r.extremes().get(0).minK()).isGreaterThan(on - 10 * tol);
        assertThat(r.extremes().get(0).maxK()).isLessThan(off + 10 * tol);
        // heating from on to off takes ∫ C dT / (P − εσA(T⁴ − T_s⁴)), cooling back ∫ C dT / (εσA(T⁴ − T_s⁴))
        // (the lumped energy balance, Incropera, 6th ed., eq. 5.15, from memory), by Gauss–Legendre quadrature
        var gl = new IterativeLegendreGaussIntegrator(8, 1e-12, 1e-12);
        double tOn = gl.integrate(100_000, x -> c / (p - 0.8 * SIGMA * 0.5 * (Math.pow(x, 4) - Math.pow(ts, 4))), on, off);
        double tOff = gl.integrate(100_000, x -> c / (0.8 * SIGMA * 0.5 * (Math.pow(x, 4) - Math.pow(ts, 4))), on, off);
        List<TransientResult.Switch> sw = r.switches();
        int last = sw.size() - 1;
        int k = sw.get(last).on() ? last - 2 : last - 1; // the last complete on phase starts at k
        assertThat(sw.get(k).on()).isTrue();
        assertThat(sw.get(k + 1).timeS() - sw.get(k).timeS()).isCloseTo(tOn, within(0.005 * tOn));
        assertThat(sw.get(k).timeS() - sw.get(k - 1).timeS()).isCloseTo(tOff, within(0.005 * tOff));
    }

    @Test
    void orbitRepeatsAndItsEmissionBalancesTheSunAbsorbedPerOrbit() {
        double period = 5400;
        double sunlit = 3600;
        ExternalSource sun = new ExternalSource("sun", new BlackbodySource(5772), 1361, Map.of("box", 1.0));
        Schedule eclipse = new Schedule(new double[] {0, sunlit, sunlit, period}, new double[] {1, 1, 0, 0}, period);
        Drivers d = new Drivers(Map.of(), Map.of(), Map.of("sun", eclipse), null, List.of());
        double tolK = 0.01;
        TimeSettings time = new TimeSettings(60 * period, 1e-3, 0.01, 300, 1e-9, Double.NaN, 10, new double[0], 250,
                period, tolK, List.of(), List.of());
        TransientResult r = Transients.run(box(3, List.of(sun)), Map.of("box", HeatCapacity.ofJPerK(40_000)), d, time);
        assertThat(r.repeated()).isTrue();
        TransientResult.Cycle lastCycle = r.cycles().get(r.cycles().size() - 1);
        assertThat(r.cycles().size()).isGreaterThan(1).isLessThan(60);
        assertThat(lastCycle.maxChangeK()).isLessThanOrEqualTo(tolK);
        // over one period of a periodic orbit the stored heat returns, so the emission εσA∫(T⁴ − T_sink⁴)dt
        // equals the sun absorbed, α G A t_sun with α = ε for a gray surface (Kirchhoff; common practice);
        // the emission is integrated here by the trapezoid over the outputs 10 s apart
        double emitted = 0;
        List<Sample> ss = r.samples();
        for (int k = 1; k < ss.size(); k++) {
            double a = ss.get(k - 1).timeS();
            double b = ss.get(k).timeS();
            if (a >= lastCycle.startS() - 1e-6 && b <= lastCycle.endS() + 1e-6) {
                double ea = 0.8 * SIGMA * 0.5 * (Math.pow(ss.get(k - 1).temperatureK()[0], 4) - Math.pow(3, 4));
                double eb = 0.8 * SIGMA * 0.5 * (Math.pow(ss.get(k).temperatureK()[0], 4) - Math.pow(3, 4));
                emitted += 0.5 * (b - a) * (ea + eb);
            }
        }
        double absorbed = 0.8 * 1361 * 0.5 * sunlit;
        // what a period leaves unbalanced is at most C·(the repeat tolerance) = 400 J of 2e6 J
        assertThat(emitted).isCloseTo(absorbed, within(5e-4 * absorbed));
    }

    @Test
    void aRampedThenHeldDissipationIntegratesExactly() {
        // a node that sees only itself (F = 1: no net radiation) under P(t) = 0.1 W/s · t up to 1000 s, then
        // 100 W: C dT/dt = P, so T = T0 + ∫P dt / C, a quadratic then a line (calculus); BDF2 reproduces
        // polynomials of degree 2 exactly, so only rounding and Newton's tolerance remain
        double c = 2000;
        EnclosureSurface s = new EnclosureSurface("node", new Material("m", new GrayEmissivity(0.5), ""), 1.0,
                new BoundaryCondition.HeatInput(0), Double.NaN);
        RadiationCase m = Cases.of(new Enclosure(List.of(s), new double[][] {{1}}, null), null);
        Schedule ramp = new Schedule(new double[] {0, 1000}, new double[] {0, 100}, Double.NaN);
        Drivers d = new Drivers(Map.of("node", ramp), Map.of(), Map.of(), null, List.of());
        TransientResult r = Transients.run(m, Map.of("node", HeatCapacity.ofJPerK(c)), d,
                Transients.adaptive(2000, 1e-3, 300, 500, 1000, 2000));
        assertThat(Transients.at(r, "node", 500)).isCloseTo(300 + 0.5 * 0.1 * 500 * 500 / c, within(1e-6));
        assertThat(Transients.at(r, "node", 1000)).isCloseTo(300 + 0.5 * 0.1 * 1000 * 1000 / c, within(1e-6));
        assertThat(Transients.at(r, "node", 2000)).isCloseTo(300 + (50_000 + 100_000) / c, within(1e-6));
    }

    @Test
    void anEnvironmentStepHeatsTheBodyAsTheLumpedClosedFormSays() {
        // the environment jumps from 300 K to 400 K at 1000 s; the body, at 300 K, then warms by
        // radiation alone (Incropera, 6th ed., eq. 5.18 with T_sur = 400 K, from memory; its quadrature
        // check is in LumpedCoolingTest): nothing moves before the step
        Schedule env = new Schedule(new double[] {0, 1000, 1000}, new double[] {300, 300, 400}, Double.NaN);
        Drivers d = new Drivers(Map.of(), Map.of(), Map.of(), env, List.of());
        double t350 = 1000 + LumpedCoolingTest.closedForm(400, 300, 350);
        double t390 = 1000 + LumpedCoolingTest.closedForm(400, 300, 390);
        RadiationCase body = LumpedCoolingTest.body(300, 300);
        TransientResult r = Transients.run(body, Map.of("body", HeatCapacity.ofJPerK(LumpedCoolingTest.C)), d,
                Transients.adaptive(t390 + 10, 1e-3, 300, 999, t350, t390));
        assertThat(Transients.at(r, "body", 999)).isCloseTo(300, within(1e-9));
        assertThat(Transients.at(r, "body", t350)).isCloseTo(350, within(0.05));
        assertThat(Transients.at(r, "body", t390)).isCloseTo(390, within(0.05));
    }
}
