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
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

/**
 * A lumped body cooling by radiation only: C dT/dt = −εσA(T⁴ − T_s⁴) (Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., §5.3, radiation-only lumped capacitance, from
 * memory), each closed form checked against an independent Gauss–Legendre quadrature of
 * dt = −C dT / (εσA(T⁴ − T_s⁴)) (Apache Commons Math).
 */
class LumpedCoolingTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    static final double C = 4000;     // J/K: 1 kg of steel-like metal (invented)
    static final double AREA = 0.05;  // m²
    static final double EPS = 0.8;
    static final double T0 = 900;     // K

    static RadiationCase body(double sinkK) {
        return body(sinkK, T0);
    }

    static RadiationCase body(double sinkK, double initialK) {
        EnclosureSurface s = new EnclosureSurface("body", new Material("m", new GrayEmissivity(EPS), ""), AREA,
                new BoundaryCondition.Adiabatic(), initialK);
        return Cases.of(new Enclosure(List.of(s), new double[][] {{0}}, new Environment("sink", sinkK)), null);
    }

    /** Incropera, 6th ed., eq. 5.18 (from memory): the time to cool from ti to t with a sink at ts. */
    static double closedForm(double ts, double ti, double t) {
        return C / (4 * EPS * AREA * SIGMA * ts * ts * ts) * (Math.log(Math.abs((ts + t) / (ts - t)))
                - Math.log(Math.abs((ts + ti) / (ts - ti))) + 2 * (Math.atan(t / ts) - Math.atan(ti / ts)));
    }

    /** The same time by quadrature, independent of the closed form. */
    static double quadrature(double ts, double ti, double t) {
        var gl = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-13);
        return gl.integrate(100_000, x -> C / (EPS * SIGMA * AREA * (Math.pow(x, 4) - Math.pow(ts, 4))), t, ti);
    }

    @Test
    void closedFormsAgreeWithQuadrature() {
        assertThat(closedForm(300, T0, 400)).isCloseTo(quadrature(300, T0, 400), within(1e-7 * quadrature(300, T0, 400)));
        double zeroSink = C / (3 * EPS * SIGMA * AREA) * (1 / Math.pow(400, 3) - 1 / Math.pow(T0, 3));
        assertThat(zeroSink).isCloseTo(quadrature(0, T0, 400), within(1e-7 * zeroSink));
    }

    @Test
    void bodyCoolingToASinkReachesEachTemperatureAtTheClosedFormTime() {
        double ts = 300;
        double[] temps = {800, 600, 450, 400};
        double[] times = new double[temps.length];
        for (int k = 0; k < temps.length; k++) {
            times[k] = closedForm(ts, T0, temps[k]);
        }
        double tol = 0.002;
        TransientResult r = Transients.run(body(ts), Map.of("body", HeatCapacity.ofJPerK(C)), Drivers.none(),
                Transients.adaptive(times[3] * 1.1, tol, T0, times));
        for (int k = 0; k < temps.length; k++) {
            // the tolerance bounds the local error of each step; the global error sums them, damped
            // by the cooling: docs/transient.md states it as at most 50 local tolerances
            assertThat(Transients.at(r, "body", times[k])).as("T at %s s", times[k]).isCloseTo(temps[k], within(50 * tol));
        }
        assertThat(r.steps().accepted()).isLessThan(400);
    }

    @Test
    void bodyCoolingToAZeroKelvinSinkFollowsTheInverseCube() {
        // t = ρcV/(3εσA)(1/T³ − 1/T₀³) (Incropera, 6th ed., eq. 5.18 with T_sur = 0, from memory; quadrature above)
        double[] temps = {700, 500, 350};
        double[] times = new double[temps.length];
        for (int k = 0; k < temps.length; k++) {
            times[k] = C / (3 * EPS * SIGMA * AREA) * (1 / Math.pow(temps[k], 3) - 1 / Math.pow(T0, 3));
        }
        double tol = 0.002;
        TransientResult r = Transients.run(body(0), Map.of("body", HeatCapacity.ofJPerK(C)), Drivers.none(),
                Transients.adaptive(times[2] * 1.05, tol, T0, times));
        for (int k = 0; k < temps.length; k++) {
            assertThat(Transients.at(r, "body", times[k])).isCloseTo(temps[k], within(50 * tol));
        }
    }
}
