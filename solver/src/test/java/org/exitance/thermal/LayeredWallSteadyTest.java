package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
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
import org.exitance.model.ViewFactorMatrix;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

/**
 * Steady conduction through a layered wall behind a surface: the series resistances
 * Σ L/k + 1/h of the layers and the outer film (Incropera et al., Fundamentals of Heat and Mass
 * Transfer, 6th ed., §3.1.3, eq. 3.19), and with radiation from the outer face the balance of
 * the same series with εσ(T_o⁴ − T_a⁴) (eq. 1.7), solved for T_o by a root finder (Commons Math).
 */
class LayeredWallSteadyTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    private static final double AREA = 2.0;

    private static Wall lining(OuterBoundary out) {
        return new Wall(List.of(
                new Layer(0.10, PropertyTable.constant(0.3), 300, 1000, 0),    // fibre (invented)
                new Layer(0.115, PropertyTable.constant(1.1), 2000, 900, 0),   // brick (invented)
                new Layer(0.005, PropertyTable.constant(45), 7800, 470, 0)),   // steel shell (invented)
                out);
    }

    private static SolveResult solve(BoundaryCondition bc, Wall w, double envK) {
        EnclosureSurface s = new EnclosureSurface("lining", new Material("m", new GrayEmissivity(0.8), ""), AREA, bc,
                Double.NaN);
        Enclosure e = new Enclosure(List.of(s), ViewFactorMatrix.copyOf(new double[][] {{0}}),
                new Environment("chamber gas", envK), List.of(), Map.of("lining", w));
        return new TemperatureSolver(Cases.of(e, null)).solve(BandSet.gray("test"));
    }

    @Test
    void heldSurfaceLosesTheSeriesResistanceFlux() {
        double ts = 1300;
        double ta = 300;
        double h = 10;
        SolveResult r = solve(new BoundaryCondition.FixedTemperature(ts), lining(new OuterBoundary.Exposed(h, 0, ta)), 300);
        double resistance = 0.10 / 0.3 + 0.115 / 1.1 + 0.005 / 45 + 1 / h; // m²K/W, eq. 3.19
        double q = (ts - ta) / resistance;
        assertThat(r.surface("lining").wallW()).isCloseTo(AREA * q, within(1e-9 * AREA * q));
        assertThat(r.surface("lining").heatSuppliedW()).isCloseTo(r.surface("lining").netHeatW() + AREA * q,
                within(1e-9 * AREA * q));
    }

    @Test
    void liningOnAnAdiabaticSurfaceBalancesTheRadiationItReceives() {
        // the surface receives εσ(T_g⁴ − T_s⁴) from black surroundings at T_g and passes it through the
        // wall, whose outer face convects and radiates to the shop at T_a
        double tg = 1400;
        double ta = 300;
        double h = 8;
        double epsOut = 0.6;
        SolveResult r = solve(new BoundaryCondition.Adiabatic(), lining(new OuterBoundary.Exposed(h, epsOut, ta)), tg);
        double rWall = 0.10 / 0.3 + 0.115 / 1.1 + 0.005 / 45;
        BrentSolver brent = new BrentSolver(1e-12);
        // T_s from the radiation in; T_o from the wall and the outer film
        double toRef = brent.solve(200, to -> {
            double q = h * (to - ta) + epsOut * SIGMA * (Math.pow(to, 4) - Math.pow(ta, 4));
            double tsx = to + q * rWall;
            return 0.8 * SIGMA * (Math.pow(tg, 4) - Math.pow(tsx, 4)) - q;
        }, ta, tg);
        double tsRef = toRef + rWall * (h * (toRef - ta) + epsOut * SIGMA * (Math.pow(toRef, 4) - Math.pow(ta, 4)));
        assertThat(r.surface("lining").temperatureK()).isCloseTo(tsRef, within(1e-6 * tsRef));
        double qRef = 0.8 * SIGMA * (Math.pow(tg, 4) - Math.pow(tsRef, 4)) * AREA;
        assertThat(r.surface("lining").wallW()).isCloseTo(qRef, within(1e-6 * qRef));
    }

    @Test
    void conductivityLinearInTemperatureGivesTheKirchhoffTransformFlux() {
        // k = k0 (1 + β T): q = (k0 / L)[(T_s − T_o) + β/2 (T_s² − T_o²)] (Incropera, 6th ed., §3.2, the
        // variable-conductivity plane wall, from memory: ∫ k dT over the wall divided by L)
        double k0 = 0.2;
        double beta = 1e-3;
        double l = 0.2;
        double ts = 1200;
        double to = 350;
        double exact = k0 / l * ((ts - to) + beta / 2 * (ts * ts - to * to));
        for (int cells : new int[] {1, 4, 16}) {
            PropertyTable k = new PropertyTable(new double[] {0, 2000}, new double[] {k0, k0 * (1 + beta * 2000)});
            Wall w = new Wall(List.of(new Layer(l, k, 200, 1000, cells)), new OuterBoundary.Held(to));
            SolveResult r = solve(new BoundaryCondition.FixedTemperature(ts), w, 300);
            // for k linear in T the interface conductance from the cell-centre values (series of the two half
            // cells) is exact: the discrete flux equals the transform's at any cell count
            assertThat(r.surface("lining").wallW() / AREA).isCloseTo(exact, within(1e-9 * exact));
        }
    }

    @Test
    void conductivityCurvedInTemperatureConvergesAtSecondOrderInTheCellWidth() {
        // k = a + b T² (invented insulating brick), tabulated every 5 K: the exact flux is
        // (1/L)∫ k dT = (1/L)[a (T_s − T_o) + b/3 (T_s³ − T_o³)] (Incropera, 6th ed., §3.2; the
        // table's own error, about (5 K)² k''/12, is below 1e-6 of it)
        double a = 0.1;
        double b = 2e-7;
        double[] tk = new double[401];
        double[] kv = new double[401];
        for (int j = 0; j < tk.length; j++) {
            tk[j] = 5.0 * j;
            kv[j] = a + b * tk[j] * tk[j];
        }
        double l = 0.2;
        double ts = 1250;
        double to = 320;
        double exact = (a * (ts - to) + b / 3 * (ts * ts * ts - to * to * to)) / l;
        double[] err = new double[3];
        int[] cells = {8, 16, 32};
        for (int c = 0; c < 3; c++) {
            Wall w = new Wall(List.of(new Layer(l, new PropertyTable(tk, kv), 200, 1000, cells[c])),
                    new OuterBoundary.Held(to));
            SolveResult r = solve(new BoundaryCondition.FixedTemperature(ts), w, 300);
            err[c] = Math.abs(r.surface("lining").wallW() / AREA - exact);
        }
        assertThat(err[2]).isLessThan(2e-3 * exact);
        assertThat(err[0] / err[1]).isBetween(3.0, 5.0);
        assertThat(err[1] / err[2]).isBetween(3.0, 5.0);
    }
}
