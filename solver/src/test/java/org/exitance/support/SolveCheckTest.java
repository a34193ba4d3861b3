package org.exitance.support;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.thermal.TemperatureSolver;
import org.junit.jupiter.api.Test;

/**
 * The solve check itself: it reproduces a closed form, and it rejects what the energy balance
 * cannot see (a wrong radiosity vector, a wrong temperature, a solve of another matrix).
 */
class SolveCheckTest {
    private static final BandSet FOUR_BANDS = new BandSet(new double[] {1.5, 3, 6}, "test");

    @Test
    void theReferenceSolveGivesTheClosedFormForGrayParallelPlates() {
        // q = σ(T1⁴ − T2⁴)/(1/ε1 + 1/ε2 − 1) (Incropera et al., 6th ed., Table 13.3, large parallel planes)
        double e1 = 0.3;
        double e2 = 0.7;
        double t1 = 900;
        double t2 = 400;
        RadiationCase c = Cases.of(new Enclosure(List.of(
                new EnclosureSurface("one", new Material("a", new GrayEmissivity(e1), ""), 2.0,
                        new BoundaryCondition.FixedTemperature(t1), Double.NaN),
                new EnclosureSurface("two", new Material("b", new GrayEmissivity(e2), ""), 2.0,
                        new BoundaryCondition.FixedTemperature(t2), Double.NaN)),
                new double[][] {{0, 1}, {1, 0}}, null), null);
        SolveResult r = new TemperatureSolver(c).solve(FOUR_BANDS);
        SolveCheck.Reference ref = SolveCheck.reference(c, r, false);
        double q = 0;
        for (double[] band : ref.netHeatW()) {
            q += band[0];
        }
        double sigma = 5.670374419e-8; // CODATA 2018
        double expected = 2.0 * sigma * (Math.pow(t1, 4) - Math.pow(t2, 4)) / (1 / e1 + 1 / e2 - 1);
        assertThat(q).isCloseTo(expected, within(1e-9 * expected));
        SolveCheck.assertSolved(c, r);
    }

    @Property(tries = 20)
    void aWrongRadiosityFailsTheResidualThoughItsEnergyBalanceCloses(@ForAll long seed,
                                                                    @ForAll @IntRange(min = 2, max = 6) int n) {
        Random rnd = new Random(seed);
        RadiationCase c = Cases.of(RandomEnclosures.random(rnd, n, false, 0.0), null);
        SolveResult right = new TemperatureSolver(c).solve(FOUR_BANDS);
        assertThat(SolveCheck.residualW(c, right)).isLessThan(1e-9 * SolveCheck.scaleW(c, right));
        // J scaled by random factors in [0.5, 1.5], G = FJ recomputed from it: a closed F still
        // balances Σ A(J − G) = Σ_i Σ_j (A_i δ_ij − A_i F_ij) J_j = 0 to rounding (common practice)
        Enclosure e = c.enclosure();
        List<SurfaceResult> wrong = new ArrayList<>();
        double[][] j = new double[FOUR_BANDS.size()][n];
        for (int k = 0; k < j.length; k++) {
            for (int i = 0; i < n; i++) {
                j[k][i] = right.surfaces().get(i).bandRadiosityWPerM2()[k] * (0.5 + rnd.nextDouble());
            }
        }
        double balance = 0;
        for (int i = 0; i < n; i++) {
            SurfaceResult s = right.surfaces().get(i);
            double[] bj = new double[j.length];
            double[] bg = new double[j.length];
            for (int k = 0; k < j.length; k++) {
                bj[k] = j[k][i];
                for (int m = 0; m < n; m++) {
                    bg[k] += s.areaM2() * e.viewFactor(i, m) * j[k][m];
                }
                balance += s.areaM2() * bj[k] - bg[k];
            }
            wrong.add(new SurfaceResult(s.name(), s.areaM2(), s.boundary(), s.temperatureK(), s.temperatureSolved(),
                    s.netHeatW(), s.netFluxWPerM2(), s.bandNetHeatW(), s.bandEmissivity(), s.convectionW(),
                    s.conductionW(), s.wallW(), s.heatSuppliedW(), bg, bj));
        }
        SolveResult bad = right.toBuilder().surfaces(wrong).build();
        double scale = SolveCheck.scaleW(c, right);
        assertThat(Math.abs(balance)).isLessThan(1e-9 * scale);
        assertThat(SolveCheck.residualW(c, bad)).isGreaterThan(1e-4 * scale);
        assertThatThrownBy(() -> SolveCheck.assertSolved(c, bad)).isInstanceOf(AssertionError.class);
    }

    @Test
    void aWrongTemperatureFailsEvenWithItsOwnConsistentRadiosity() {
        Random rnd = new Random(7);
        Enclosure e = RandomEnclosures.random(rnd, 4, true, 1.0);
        RadiationCase c = Cases.of(e, null);
        SolveResult right = new TemperatureSolver(c).solve(FOUR_BANDS);
        SolveCheck.assertSolved(c, right);
        // the same enclosure with surface 1's solved temperature held 0.1 K higher: a consistent
        // band solve at those temperatures, which misses surface 1's condition
        List<EnclosureSurface> held = new ArrayList<>(e.surfaces());
        double t1 = right.surfaces().get(1).temperatureK() + 0.1;
        held.set(1, held.get(1).withBoundary(new BoundaryCondition.FixedTemperature(t1), Double.NaN));
        RadiationCase moved = Cases.of(e.withSurfaces(held), null);
        SolveResult other = new TemperatureSolver(moved).solve(FOUR_BANDS);
        SolveCheck.assertSolved(moved, other);
        assertThat(SolveCheck.residualW(c, other)).isLessThan(1e-9 * SolveCheck.scaleW(c, other));
        assertThatThrownBy(() -> SolveCheck.assertSolved(c, other)).isInstanceOf(AssertionError.class)
                .hasMessageContaining("condition");
    }
}
