package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.result.SolveResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.ReferenceAccess;
import org.exitance.spectral.TabulatedEmissivity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Two-sided opaque plates (one node, two faces, each with its own coating) and radiation shields
 * made of them, against the closed forms for infinite parallel plates (Incropera et al.,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.3 (infinite parallel planes) and its radiation-shield series form, from memory;
 * Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §6.3, radiation shields).
 */
class TwoSidedPlateTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018

    private static EnclosureSurface fixed(String name, Material m, double t) {
        return new EnclosureSurface(name, m, 1, new BoundaryCondition.FixedTemperature(t), Double.NaN);
    }

    private static EnclosureSurface face(String name, Material m, String other, boolean carries) {
        return new EnclosureSurface(name, m, 1, carries ? new BoundaryCondition.Adiabatic()
                : new BoundaryCondition.OnOtherFace(), Double.NaN, null, other);
    }

    /**
     * A chain: plate 1 | shield 1 front, back | … | plate 2, each gap an infinite parallel pair (F = 1).
     *
     * @param shields  shield face materials, front and back per shield
     */
    private static RadiationCase chain(Material outer, double t1, double t2, Material[][] shields) {
        List<EnclosureSurface> s = new ArrayList<>();
        s.add(fixed("plate1", outer, t1));
        for (int k = 0; k < shields.length; k++) {
            s.add(face("s" + k + "f", shields[k][0], "s" + k + "b", true));
            s.add(face("s" + k + "b", shields[k][1], "s" + k + "f", false));
        }
        s.add(fixed("plate2", outer, t2));
        int n = s.size();
        double[][] f = new double[n][n];
        for (int i = 0; i + 1 < n; i += 2) {
            f[i][i + 1] = 1; // plate1 ↔ s0f, s0b ↔ s1f, …, last back ↔ plate2
            f[i + 1][i] = 1;
        }
        return new RadiationCase("chain", "", List.of(), new Enclosure(s, f, null), null, SolverSettings.DEFAULT, List.of());
    }

    /**
     * A two-sided plate between a hot and a cold black wall: each face is a two-surface exchange with a
     * black partner, q_front = ε_f σ(T_h⁴ − T_p⁴), q_back = ε_b σ(T_p⁴ − T_c⁴), and the plate balances
     * them: T_p⁴ = (ε_f T_h⁴ + ε_b T_c⁴)/(ε_f + ε_b).
     */
    @Test
    void aTwoSidedPlateBetweenBlackWallsHasTheTwoSurfaceHeatOnEachFace() {
        Material black = new Material("black", new GrayEmissivity(1), "");
        Material front = new Material("oxidised", new GrayEmissivity(0.7), "");
        Material back = new Material("polished", new GrayEmissivity(0.1), "");
        SolveResult r = new TemperatureSolver(chain(black, 1200, 400, new Material[][] {{front, back}}))
                .solve(BandSet.gray("gray"));
        double tp4 = (0.7 * Math.pow(1200, 4) + 0.1 * Math.pow(400, 4)) / 0.8;
        double qFront = 0.7 * SIGMA * (Math.pow(1200, 4) - tp4);
        assertThat(r.surface("s0f").temperatureK()).isCloseTo(Math.pow(tp4, 0.25), within(1e-9));
        assertThat(r.surface("s0b").temperatureK()).isEqualTo(r.surface("s0f").temperatureK());
        assertThat(r.surface("s0f").netHeatW()).isCloseTo(-qFront, within(1e-9 * qFront));
        assertThat(r.surface("s0b").netHeatW()).isCloseTo(qFront, within(1e-9 * qFront));
        assertThat(r.twoSided()).singleElement().satisfies(p -> {
            assertThat(p.face()).isEqualTo("s0f");
            assertThat(p.netHeatW()).isCloseTo(0, within(1e-9 * qFront));
        });
        assertThat(r.windows()).isEmpty();
    }

    /** N identical gray shields: q = σ(T₁⁴ − T₂⁴)/[1/ε₁ + 1/ε₂ − 1 + N(2/ε_s − 1)] (Incropera 6th ed., radiation-shield series form, from memory). */
    @ParameterizedTest(name = "N = {0}")
    @ValueSource(ints = {1, 2, 5})
    void identicalGrayShieldsCutTheHeatAsTheClosedFormSays(int n) {
        Material outer = new Material("outer", new GrayEmissivity(0.8), "");
        Material shield = new Material("shield", new GrayEmissivity(0.05), "");
        Material[][] s = new Material[n][];
        for (int k = 0; k < n; k++) {
            s[k] = new Material[] {shield, shield};
        }
        SolveResult r = new TemperatureSolver(chain(outer, 1000, 300, s)).solve(BandSet.gray("gray"));
        double q = SIGMA * (Math.pow(1000, 4) - Math.pow(300, 4)) / (1 / 0.8 + 1 / 0.8 - 1 + n * (2 / 0.05 - 1));
        assertThat(r.surface("plate1").netHeatW()).isCloseTo(q, within(1e-9 * q));
        // first shield: T⁴ = T₁⁴ − q (1/ε₁ + 1/ε_s − 1)/σ (the series resistances up to it)
        double t4 = Math.pow(1000, 4) - q * (1 / 0.8 + 1 / 0.05 - 1) / SIGMA;
        assertThat(r.surface("s0f").temperatureK()).isCloseTo(Math.pow(t4, 0.25), within(1e-8));
    }

    /**
     * One shield, non-gray in two bands split at 3 µm, between gray plates. Per band k the gap
     * exchange is (E_k(T₁) − E_k(T_s))/R_k and (E_k(T_s) − E_k(T₂))/R'_k with the band's series
     * resistances; the shield temperature balances the band sums. Independent reference: Brent on
     * T_s with band fractions from the quadrature of Planck's law in the test support
     * (ReferenceAccess#fractionBelow).
     */
    @Test
    void aTwoBandShieldMatchesThePerBandClosedForms() {
        double edge = 3;
        Material outer = new Material("outer", new GrayEmissivity(0.9), "");
        Material selective = new Material("selective",
                new TabulatedEmissivity(new double[] {edge, Math.nextUp(edge)}, new double[] {0.6, 0.1}), "");
        SolveResult r = new TemperatureSolver(chain(outer, 1200, 350, new Material[][] {{selective, selective}}))
                .solve(new BandSet(new double[] {edge}, "two bands"));
        double[] eS = {0.6, 0.1};
        java.util.function.BiFunction<Integer, Double, Double> eb = (k, t) -> {
            double f = ReferenceAccess.fractionBelow(edge * t);
            return SIGMA * Math.pow(t, 4) * (k == 0 ? f : 1 - f);
        };
        java.util.function.DoubleUnaryOperator net = ts -> {
            double s = 0;
            for (int k = 0; k < 2; k++) {
                double rk = 1 / 0.9 + 1 / eS[k] - 1;
                s += (eb.apply(k, 1200.0) - eb.apply(k, ts)) / rk - (eb.apply(k, ts) - eb.apply(k, 350.0)) / rk;
            }
            return s;
        };
        double ts = new BrentSolver(1e-13, 1e-11).solve(500, net::applyAsDouble, 350, 1200);
        double q = 0;
        for (int k = 0; k < 2; k++) {
            q += (eb.apply(k, 1200.0) - eb.apply(k, ts)) / (1 / 0.9 + 1 / eS[k] - 1);
        }
        assertThat(r.surface("s0f").temperatureK()).isCloseTo(ts, within(1e-6));
        assertThat(r.surface("plate1").netHeatW()).isCloseTo(q, within(1e-7 * q));
    }

    /**
     * A cryogenic line: long concentric tubes (inner r₁ at 77 K, jacket r₃ at 300 K) with a thin
     * shield tube r₂ between them, per metre. Each gap is the long-concentric-cylinder exchange,
     * q' = 2πr_i σ(T_i⁴ − T_j⁴)/(1/ε_i + (1 − ε_j)/ε_j · r_i/r_j) (Incropera et al., 6th ed.,
     * Table 13.3, long concentric cylinders, and its shield examples; from memory), and the shield balances the two gaps:
     * T_s⁴ = (r₁T₁⁴/D₁ + r₂T₃⁴/D₂)/(r₁/D₁ + r₂/D₂), with D₁, D₂ the two denominators.
     */
    @Test
    void aShieldTubeInACryogenicLineCarriesTheConcentricClosedFormHeat() {
        double r1 = 0.025;
        double r2 = 0.035;
        double r3 = 0.05;
        double e1 = 0.05;
        double es = 0.03;
        double e3 = 0.1;
        Material inner = new Material("inner", new GrayEmissivity(e1), "");
        Material shield = new Material("shield", new GrayEmissivity(es), "");
        Material jacket = new Material("jacket", new GrayEmissivity(e3), "");
        double a1 = 2 * Math.PI * r1;
        double a2 = 2 * Math.PI * r2;
        double a3 = 2 * Math.PI * r3;
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("line", inner, a1, new BoundaryCondition.FixedTemperature(77), Double.NaN),
                face("shield_in", shield, "shield_out", true),
                face("shield_out", shield, "shield_in", false),
                new EnclosureSurface("jacket", jacket, a3, new BoundaryCondition.FixedTemperature(300), Double.NaN));
        List<EnclosureSurface> sized = new ArrayList<>();
        for (EnclosureSurface x : s) {
            sized.add(x.name().startsWith("shield") ? new EnclosureSurface(x.name(), x.material(), a2, x.boundary(),
                    Double.NaN, null, x.otherFace()) : x);
        }
        // long concentric tubes (Incropera 6th ed., Table 13.1): inner sees outer, outer sees inner r_i/r_j and itself
        double[][] f = {{0, 1, 0, 0}, {r1 / r2, 1 - r1 / r2, 0, 0}, {0, 0, 0, 1}, {0, 0, r2 / r3, 1 - r2 / r3}};
        RadiationCase c = new RadiationCase("cryogenic line", "", List.of(), new Enclosure(sized, f, null), null,
                SolverSettings.DEFAULT, List.of());
        SolveResult r = new TemperatureSolver(c).solve(BandSet.gray("gray"));
        double d1 = 1 / e1 + (1 - es) / es * r1 / r2;
        double d2 = 1 / es + (1 - e3) / e3 * r2 / r3;
        double ts4 = (r1 * Math.pow(77, 4) / d1 + r2 * Math.pow(300, 4) / d2) / (r1 / d1 + r2 / d2);
        double q = 2 * Math.PI * r1 * SIGMA * (Math.pow(77, 4) - ts4) / d1; // W per metre, negative: the line gains
        assertThat(r.surface("shield_in").temperatureK()).isCloseTo(Math.pow(ts4, 0.25), within(1e-8));
        assertThat(r.surface("line").netHeatW()).isCloseTo(q, within(1e-9 * Math.abs(q)));
        assertThat(q).isNegative();
    }
}
