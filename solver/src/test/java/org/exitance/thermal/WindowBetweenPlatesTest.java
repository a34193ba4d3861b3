package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.support.Cases;
import org.exitance.support.SolveCheck;
import org.junit.jupiter.api.Test;

/**
 * A window between two black plates: three infinite parallel planes, hot plate | window | cold
 * plate, each pair of neighbours seeing only each other (F = 1). The closed forms below are worked
 * by hand from the network equations of a semi-transparent surface (Siegel &amp; Howell, Thermal
 * Radiation Heat Transfer, 5th ed., partially transparent windows, from memory):
 *
 * <pre>
 *   black plates:  J_1 = E_1,  J_2 = E_2;   G_a = E_1 (front face a sees plate 1), G_b = E_2
 *   window faces:  J_a = ε E_w + ρ E_1 + τ E_2,   J_b = ε E_w + ρ E_2 + τ E_1
 *   window node:   A (q_a + q_b) = A (2 ε E_w − ε (E_1 + E_2))   (since ρ + τ − 1 = −ε)
 *                  adiabatic with convection h on face b: A(2εE_w − ε(E_1 + E_2)) + h A (T_w − T_f) = 0
 *   plates:        Q_1 = A (E_1 − J_a),   Q_2 = A (E_2 − J_b)
 * </pre>
 *
 * In bands each line holds band by band, with E_ik = f_k(T_i) σ T_i⁴ (f_k from blackbody
 * fractions) and the balance summed over bands. The window temperature is found independently
 * with Apache Commons Math's BrentSolver.
 */
class WindowBetweenPlatesTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    private static final double AREA = 2.0;
    private static final double T_HOT = 1400;
    private static final double T_COLD = 450;
    private static final double H = 12;
    private static final double T_FLUID = 300;

    private static SolveResult solve(SpectralEmissivity eps, SpectralEmissivity tau, BandSet bands) {
        Material black = new Material("black", new GrayEmissivity(1.0), "");
        Material glass = new Material("glass", eps, tau, "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", black, AREA, new BoundaryCondition.FixedTemperature(T_HOT), Double.NaN),
                new EnclosureSurface("front", glass, AREA, new BoundaryCondition.Adiabatic(), Double.NaN, null, "back"),
                new EnclosureSurface("back", glass, AREA, new BoundaryCondition.OnOtherFace(), Double.NaN,
                        new Convection(H, T_FLUID), "front"),
                new EnclosureSurface("cold", black, AREA, new BoundaryCondition.FixedTemperature(T_COLD), Double.NaN));
        double[][] f = {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}};
        RadiationCase c = Cases.of(new Enclosure(s, f, null), null);
        SolveResult r = new TemperatureSolver(c).solve(bands);
        SolveCheck.assertSolved(c, r);
        return r;
    }

    @Test
    void grayWindowBetweenBlackPlatesMatchesTheHandFormula() {
        double e = 0.3;
        double t = 0.6;
        double r = 1 - e - t;
        SolveResult res = solve(new GrayEmissivity(e), new GrayEmissivity(t), BandSet.gray("test"));
        double e1 = SIGMA * Math.pow(T_HOT, 4);
        double e2 = SIGMA * Math.pow(T_COLD, 4);
        double tw = new BrentSolver(1e-13, 1e-12).solve(200, x ->
                AREA * (2 * e * SIGMA * Math.pow(x, 4) - e * (e1 + e2)) + H * AREA * (x - T_FLUID), 200, 2000);
        double ew = SIGMA * Math.pow(tw, 4);
        double ja = e * ew + r * e1 + t * e2;
        double jb = e * ew + r * e2 + t * e1;
        assertThat(res.surface("front").temperatureK()).isCloseTo(tw, within(1e-7 * tw));
        assertThat(res.surface("back").temperatureK()).isEqualTo(res.surface("front").temperatureK());
        assertThat(res.surface("hot").netHeatW()).isCloseTo(AREA * (e1 - ja), within(1e-8 * AREA * e1));
        assertThat(res.surface("cold").netHeatW()).isCloseTo(AREA * (e2 - jb), within(1e-8 * AREA * e1));
        // each face's own net heat: q_a = J_a − G_a, q_b = J_b − G_b
        assertThat(res.surface("front").netHeatW()).isCloseTo(AREA * (ja - e1), within(1e-8 * AREA * e1));
        assertThat(res.surface("back").netHeatW()).isCloseTo(AREA * (jb - e2), within(1e-8 * AREA * e1));
        assertThat(res.windows()).singleElement().satisfies(w -> {
            assertThat(w.face()).isEqualTo("front");
            assertThat(w.heatSuppliedW()).isCloseTo(0, within(1e-8 * AREA * e1));
        });
    }

    @Test
    void stepWindowInTwoBandsMatchesTheBandByBandHandFormula() {
        // quartz-like step (invented): τ = 0.9 below 2.5 µm and 0 above; ε = 0.05 below, 0.9 above
        double edge = 2.5;
        double[] eps = {0.05, 0.9};
        double[] tau = {0.9, 0.0};
        SpectralEmissivity epsModel = new TabulatedEmissivity(new double[] {edge, Math.nextUp(edge)}, eps);
        SpectralEmissivity tauModel = new TabulatedEmissivity(new double[] {edge, Math.nextUp(edge)}, tau);
        SolveResult res = solve(epsModel, tauModel, new BandSet(new double[] {edge}, "test"));
        double[] e1 = bandPowers(edge, T_HOT);
        double[] e2 = bandPowers(edge, T_COLD);
        double tw = new BrentSolver(1e-13, 1e-12).solve(200, x -> {
            double[] ew = bandPowers(edge, x);
            double q = 0;
            for (int k = 0; k < 2; k++) {
                q += AREA * (2 * eps[k] * ew[k] - eps[k] * (e1[k] + e2[k]));
            }
            return q + H * AREA * (x - T_FLUID);
        }, 200, 2000);
        double[] ew = bandPowers(edge, tw);
        double qHot = 0;
        double qCold = 0;
        for (int k = 0; k < 2; k++) {
            double rho = 1 - eps[k] - tau[k];
            qHot += AREA * (e1[k] - (eps[k] * ew[k] + rho * e1[k] + tau[k] * e2[k]));
            qCold += AREA * (e2[k] - (eps[k] * ew[k] + rho * e2[k] + tau[k] * e1[k]));
        }
        assertThat(res.surface("back").temperatureK()).isCloseTo(tw, within(1e-7 * tw));
        double scale = AREA * SIGMA * Math.pow(T_HOT, 4);
        assertThat(res.surface("hot").netHeatW()).isCloseTo(qHot, within(1e-8 * scale));
        assertThat(res.surface("cold").netHeatW()).isCloseTo(qCold, within(1e-8 * scale));
    }

    /** Band emissive powers below and above the edge, f(λT) σT⁴ (Planck.fractionBelow). */
    private static double[] bandPowers(double edgeUm, double tK) {
        double below = Planck.fractionBelow(edgeUm * tK);
        double total = SIGMA * Math.pow(tK, 4);
        return new double[] {below * total, (1 - below) * total};
    }
}
