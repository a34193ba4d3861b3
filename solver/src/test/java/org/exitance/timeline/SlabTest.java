package org.exitance.timeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.Erf;
import org.exitance.conduction.Layer;
import org.exitance.conduction.OuterBoundary;
import org.exitance.conduction.PropertyTable;
import org.exitance.conduction.Wall;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.ViewFactorMatrix;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

/**
 * A wall behind a surface in time, against the conduction solutions of Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., §5.5 (plane wall with convection, the
 * series of eq. 5.39 with eigenvalues from ζ tan ζ = Bi, eq. 5.39c; one-term form eq. 5.40) and
 * §5.7 (semi-infinite solid: eq. 5.57–5.58 for a surface temperature step, eq. 5.59 for a
 * constant surface flux), all from memory; eigenvalues by a root finder (Commons Math Brent),
 * erf from Commons Math. The surface sees only itself (F = 1, a closed enclosure of one
 * surface), so its net radiation is zero and only conduction and convection act.
 */
class SlabTest {
    static final double K = 1.2;       // W/(m·K), a refractory-like solid (invented)
    static final double RHO = 2000;    // kg/m³
    static final double CP = 900;      // J/(kg·K)
    static final double ALPHA = K / (RHO * CP);
    static final double TI = 300;

    static RadiationCase slab(BoundaryCondition bc, Convection conv, double thickness, int cells,
                              OuterBoundary back) {
        EnclosureSurface s = new EnclosureSurface("face", new Material("m", new GrayEmissivity(0.7), ""), 1.0, bc,
                Double.NaN, conv, null);
        Wall w = new Wall(List.of(new Layer(thickness, PropertyTable.constant(K), RHO, CP, cells)), back);
        Enclosure e = new Enclosure(List.of(s), ViewFactorMatrix.copyOf(new double[][] {{1}}), null, List.of(),
                Map.of("face", w));
        return Cases.of(e, null);
    }

    @Test
    void thickSlabAfterASurfaceTemperatureStepTakesTheSemiInfiniteFluxAndProfile() {
        double ts = 400;
        double[] times = {1800, 3600};
        RadiationCase m = slab(new BoundaryCondition.FixedTemperature(ts), null, 0.5, 250, new OuterBoundary.Insulated());
        TransientResult r = Transients.run(m, Map.of(), Drivers.none(), Transients.adaptive(3600, 1e-3, TI, times));
        for (double t : times) {
            Sample s = sampleAt(r, t);
            // q_s = k (T_s − T_i) / √(π α t) (Incropera, 6th ed., eq. 5.58)
            double q = K * (ts - TI) / Math.sqrt(Math.PI * ALPHA * t);
            assertThat(s.wallInW()[0]).as("flux at %s s", t).isCloseTo(q, within(0.005 * q));
            // T(x, t) = T_s + (T_i − T_s) erf(x / 2√(αt)) (eq. 5.57), at the centre of cell 4 (x = 9 mm)
            double x = 4.5 * 0.5 / 250;
            double tx = ts + (TI - ts) * Erf.erf(x / (2 * Math.sqrt(ALPHA * t)));
            assertThat(s.wallCellsK()[0][4]).isCloseTo(tx, within(0.05));
        }
    }

    @Test
    void thickSlabUnderAConstantFluxWarmsAsTheSquareRootOfTime() {
        double q = 2000; // W/m²
        double[] times = {900, 3600};
        RadiationCase m = slab(new BoundaryCondition.HeatInput(q), null, 0.5, 250, new OuterBoundary.Insulated());
        TransientResult r = Transients.run(m, Map.of(), Drivers.none(), Transients.adaptive(3600, 1e-3, TI, times));
        for (double t : times) {
            // T_s = T_i + (2 q / k) √(α t / π) (Incropera, 6th ed., eq. 5.59 at x = 0)
            double expected = TI + 2 * q / K * Math.sqrt(ALPHA * t / Math.PI);
            assertThat(Transients.at(r, "face", t)).as("T_s at %s s", t).isCloseTo(expected, within(0.003 * (expected - TI)));
        }
    }

    /** θ*(x* = 1, Fo) of the plane wall with convection, eq. 5.39, from nTerms eigenvalues. */
    static double series(double bi, double fo, int nTerms) {
        BrentSolver brent = new BrentSolver(1e-15);
        double sum = 0;
        for (int k = 0; k < nTerms; k++) {
            double lo = k * Math.PI + 1e-12;
            double hi = k * Math.PI + Math.PI / 2 - 1e-12;
            double z = brent.solve(200, x -> x * Math.tan(x) - bi, lo, hi);
            double c = 4 * Math.sin(z) / (2 * z + Math.sin(2 * z));
            sum += c * Math.exp(-z * z * fo) * Math.cos(z);
        }
        return sum;
    }

    static double finiteSlabSurface(int cells, double fo) {
        return finiteSlabSurface(cells, fo, Double.NaN);
    }

    /** The surface temperature at Fo (K), with error control (step NaN) or a fixed step (s). */
    static double finiteSlabSurface(int cells, double fo, double step) {
        double h = 60;       // W/(m²·K)
        double l = 0.05;     // m, half thickness (the back is the plane of symmetry)
        double tf = 1000;
        double t = fo * l * l / ALPHA;
        RadiationCase m = slab(new BoundaryCondition.Adiabatic(), new Convection(h, tf), l, cells,
                new OuterBoundary.Insulated());
        TimeSettings ts = Double.isNaN(step) ? Transients.adaptive(t, 1e-4, TI, t)
                : Transients.fixedStep(t, t / Math.round(t / step), TI, t);
        TransientResult r = Transients.run(m, Map.of(), Drivers.none(), ts);
        return Transients.at(r, "face", t);
    }

    @Test
    void finiteSlabSurfaceFollowsThePlaneWallSeries() {
        double bi = 60 * 0.05 / K;
        double oneTerm = series(bi, 0.5, 1);
        double many = series(bi, 0.5, 40);
        // the one-term form holds for Fo > 0.2 (Incropera, §5.5.2): here within 0.5 % of θ
        assertThat(oneTerm).isCloseTo(many, within(0.005 * many));
        double expected = 1000 + (TI - 1000) * many;
        double got = finiteSlabSurface(0, 0.5);
        assertThat(got).isCloseTo(expected, within(0.002 * (1000 - TI)));
    }

    @Test
    void finiteSlabErrorFallsAsTheSquareOfTheCellWidth() {
        double bi = 60 * 0.05 / K;
        double expected = 1000 + (TI - 1000) * series(bi, 0.5, 40);
        // fixed steps of 1 s (about 1900 steps) leave a time error far below the spatial one
        double e8 = Math.abs(finiteSlabSurface(8, 0.5, 1.0) - expected);
        double e16 = Math.abs(finiteSlabSurface(16, 0.5, 1.0) - expected);
        double e32 = Math.abs(finiteSlabSurface(32, 0.5, 1.0) - expected);
        // second order in Δx (Patankar 1980, §4.3: central differences): ratio near 4 each halving
        assertThat(e8 / e16).isBetween(3.0, 5.0);
        assertThat(e16 / e32).isBetween(3.0, 5.0);
    }

    private static Sample sampleAt(TransientResult r, double t) {
        return r.samples().stream().filter(s -> Math.abs(s.timeS() - t) < 1e-6 * t).findFirst().orElseThrow();
    }
}
