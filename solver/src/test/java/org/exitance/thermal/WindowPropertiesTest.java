package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.ExternalSource;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.support.RandomEnclosures;
import org.exitance.support.SolveCheck;
import org.junit.jupiter.api.Test;

/**
 * Laws that hold with windows: the reported state solves the band equations with the τ terms
 * (checked by {@link SolveCheck} against an independent solve; Modest, Radiative Heat Transfer,
 * 3rd ed., §5.3) and independence of surface order. Each case joins two random reciprocal enclosures by a window: its front face is a surface
 * of the first, its back face a surface of the second, so the faces see different enclosures
 * (either may be open to the environment, and the back face may be lit by a 5772 K source).
 */
class WindowPropertiesTest {
    private static final BandSet BANDS = new BandSet(new double[] {1.5, 3, 6}, "test");

    @Property(tries = 60)
    void aWindowBetweenTwoEnclosuresSolvesItsBandEquations(@ForAll long seed,
                                                           @ForAll @IntRange(min = 1, max = 5) int nA,
                                                           @ForAll @IntRange(min = 1, max = 5) int nB) {
        RadiationCase c = joined(new Random(seed), nA, nB);
        SolveResult res = new TemperatureSolver(c).solve(BANDS);
        assertThat(res.solver().linearSolver()).isEqualTo("direct LU");
        // the τ coupling of the two faces, the transmitted source power and the window's condition
        // on the pair of faces (with convection on the back face), against the independent solve
        SolveCheck.assertSolved(c, res);
    }

    @Property(tries = 40)
    void windowResultsDoNotDependOnSurfaceOrder(@ForAll long seed, @ForAll @IntRange(min = 1, max = 4) int nA,
                                                @ForAll @IntRange(min = 1, max = 4) int nB) {
        Random r = new Random(seed);
        RadiationCase c = joined(r, nA, nB);
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < c.enclosure().size(); i++) {
            order.add(i);
        }
        Collections.shuffle(order, r);
        RadiationCase p = c.withEnclosure(c.enclosure().permuted(order.stream().mapToInt(Integer::intValue).toArray()));
        SolveResult x = new TemperatureSolver(c).solve(BANDS);
        SolveResult y = new TemperatureSolver(p).solve(BANDS);
        assertThat(deviation(x, y)).isLessThanOrEqualTo(1.0);
    }

    @Test
    void aWindowWhoseTransmissivityIsOffByTenPercentFailsTheSolveCheck() {
        // the solve check can fail on the τ terms: a result checked against the same case with the
        // window's τ table scaled by 0.9
        for (long seed = 1; seed <= 3; seed++) {
            RadiationCase c = joined(new Random(seed), 2, 2);
            SolveResult res = new TemperatureSolver(c).solve(BANDS);
            SolveCheck.assertSolved(c, res);
            assertThatThrownBy(() -> SolveCheck.assertSolved(withTauScaled(c, 0.9), res))
                    .as("seed %d", seed).isInstanceOf(AssertionError.class);
        }
    }

    @Test
    void aPermutedWindowCaseWithItsTransmissivityChangedFailsTheOrderTest() {
        for (long seed = 1; seed <= 3; seed++) {
            RadiationCase c = joined(new Random(seed), 2, 2);
            int n = c.enclosure().size();
            int[] reversed = new int[n];
            for (int i = 0; i < n; i++) {
                reversed[i] = n - 1 - i;
            }
            RadiationCase p = withTauScaled(c, 0.99);
            p = p.withEnclosure(p.enclosure().permuted(reversed));
            SolveResult x = new TemperatureSolver(c).solve(BANDS);
            SolveResult y = new TemperatureSolver(p).solve(BANDS);
            assertThat(deviation(x, y)).as("seed %d", seed).isGreaterThan(100.0);
        }
    }

    /** Largest difference of two solves in units of what the order test allows (at most 1 passes). */
    private static double deviation(SolveResult x, SolveResult y) {
        double worst = 0;
        for (SurfaceResult s : x.surfaces()) {
            SurfaceResult t = y.surface(s.name());
            worst = Math.max(worst, Math.abs(t.temperatureK() - s.temperatureK()) / (1e-9 * s.temperatureK()));
            worst = Math.max(worst, Math.abs(t.netHeatW() - s.netHeatW()) / (1e-9 * x.energyScaleW()));
        }
        return worst;
    }

    /** The case with every window material's τ table scaled by k (ε unchanged). */
    private static RadiationCase withTauScaled(RadiationCase c, double k) {
        List<EnclosureSurface> out = new ArrayList<>();
        for (EnclosureSurface s : c.enclosure().surfaces()) {
            Material m = s.material();
            if (m.transmissivity() instanceof TabulatedEmissivity t) {
                double[] v = t.emissivities();
                for (int i = 0; i < v.length; i++) {
                    v[i] *= k;
                }
                m = new Material(m.name(), m.emissivity(), new TabulatedEmissivity(t.wavelengthsUm(), v), "");
            }
            out.add(new EnclosureSurface(s.name(), m, s.areaM2(), s.boundary(), s.initialTemperatureK(),
                    s.convection(), s.otherFace()));
        }
        return c.withEnclosure(c.enclosure().withSurfaces(out));
    }

    /** Two random enclosures (nA + 1 and nB + 1 surfaces), the last surface of each a window face. */
    private static RadiationCase joined(Random r, int nA, int nB) {
        Enclosure ea = RandomEnclosures.random(r, nA + 1, r.nextBoolean(), 0.5);
        Enclosure eb = RandomEnclosures.random(r, nB + 1, r.nextBoolean(), 0.5);
        // scale the second enclosure so both window faces have the same area (view factors do not change)
        double scale = ea.surface(nA).areaM2() / eb.surface(nB).areaM2();
        int n = nA + nB + 2;
        double[][] f = new double[n][n];
        for (int i = 0; i <= nA; i++) {
            for (int j = 0; j <= nA; j++) {
                f[i][j] = ea.viewFactor(i, j);
            }
        }
        for (int i = 0; i <= nB; i++) {
            for (int j = 0; j <= nB; j++) {
                f[nA + 1 + i][nA + 1 + j] = eb.viewFactor(i, j);
            }
        }
        Material glass = randomWindowMaterial(r);
        double area = ea.surface(nA).areaM2();
        BoundaryCondition windowBc = switch (r.nextInt(4)) {
            case 0 -> new BoundaryCondition.Adiabatic();
            case 1 -> new BoundaryCondition.HeatInput(area * 1000 * r.nextDouble());
            case 2 -> new BoundaryCondition.FixedNetHeat(area * 1000 * r.nextDouble());
            default -> new BoundaryCondition.FixedTemperature(300 + 900 * r.nextDouble());
        };
        Convection conv = r.nextBoolean() ? new Convection(20 * r.nextDouble(), 280 + 40 * r.nextDouble()) : null;
        List<EnclosureSurface> s = new ArrayList<>();
        for (int i = 0; i < nA; i++) {
            EnclosureSurface x = ea.surface(i);
            s.add(new EnclosureSurface("a" + i, x.material(), x.areaM2(), x.boundary(), Double.NaN));
        }
        s.add(new EnclosureSurface("window_front", glass, area, windowBc, Double.NaN, null, "window_back"));
        for (int i = 0; i < nB; i++) {
            EnclosureSurface x = eb.surface(i);
            s.add(new EnclosureSurface("b" + i, x.material(), x.areaM2() * scale, scaled(x.boundary(), scale),
                    Double.NaN));
        }
        s.add(new EnclosureSurface("window_back", glass, area, new BoundaryCondition.OnOtherFace(), Double.NaN, conv,
                "window_front"));
        Environment env = ea.environment() != null ? ea.environment() : eb.environment();
        List<ExternalSource> sources = r.nextBoolean() ? List.of(new ExternalSource("lamp",
                new BlackbodySource(5772), 500 + 1000 * r.nextDouble(), Map.of("window_back", r.nextDouble())))
                : List.of();
        Enclosure e = new Enclosure(s, f, env);
        return new RadiationCase("windows", "", List.of(glass), e, null, SolverSettings.DEFAULT, sources);
    }

    private static BoundaryCondition scaled(BoundaryCondition bc, double scale) {
        return bc instanceof BoundaryCondition.FixedNetHeat h ? new BoundaryCondition.FixedNetHeat(h.netHeatW() * scale)
                : bc;
    }

    /** ε and τ tables on the same nodes with ε + τ ≤ 1. */
    private static Material randomWindowMaterial(Random r) {
        int nodes = 2 + r.nextInt(3);
        double[] w = new double[nodes];
        double[] e = new double[nodes];
        double[] t = new double[nodes];
        double x = 0.5 + r.nextDouble();
        for (int i = 0; i < nodes; i++) {
            w[i] = x;
            e[i] = 0.05 + 0.8 * r.nextDouble();
            t[i] = (1 - e[i]) * 0.95 * r.nextDouble();
            x *= 1.5 + 2 * r.nextDouble();
        }
        return new Material("glass", new TabulatedEmissivity(w, e), new TabulatedEmissivity(w, t), "");
    }
}
