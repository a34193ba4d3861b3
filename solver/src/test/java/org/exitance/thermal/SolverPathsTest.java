package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ForkJoinPool;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.support.Cases;
import org.exitance.support.RandomEnclosures;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The three linear-algebra paths of a temperature solve (direct: LU and blocked Jacobian;
 * newton-krylov: LU and GMRES; iterative: conjugate gradients and GMRES) solve the same equations,
 * so their converged temperatures and heats agree to 1e-8 relative (common practice: the paths
 * differ only in round-off and in the linear tolerances, 1e-13 per surface for CG); and no result
 * changes with the number of threads (the work is split so that every number is computed by the
 * same operations in the same order).
 */
class SolverPathsTest {

    private static SolveResult solve(RadiationCase c, SolverChoice choice) {
        return new TemperatureSolver(c, choice, ExternalAbsorption.SOURCE_SPECTRUM).solve(c.bands());
    }

    private static void assertAgree(SolveResult a, SolveResult b) {
        double heatScale = 0;
        for (SurfaceResult s : a.surfaces()) {
            heatScale = Math.max(heatScale, Math.abs(s.netHeatW()));
        }
        for (int i = 0; i < a.surfaces().size(); i++) {
            SurfaceResult x = a.surfaces().get(i);
            SurfaceResult y = b.surfaces().get(i);
            assertThat(y.temperatureK()).as(x.name()).isCloseTo(x.temperatureK(), within(1e-8 * x.temperatureK()));
            assertThat(y.netHeatW()).as(x.name()).isCloseTo(x.netHeatW(), within(1e-8 * heatScale));
        }
    }

    /** A random enclosure (closed or open), or the same with every surface nearly perfectly reflecting. */
    private static RadiationCase randomCase(long seed, int n, boolean open, double reflecting) {
        Random r = new Random(seed);
        Enclosure e = RandomEnclosures.random(r, n, open, 0.4);
        if (reflecting > 0) {
            Material mirror = new Material("mirror", new GrayEmissivity(1 - reflecting), "invented");
            List<EnclosureSurface> s = new ArrayList<>();
            for (EnclosureSurface x : e.surfaces()) {
                s.add(new EnclosureSurface(x.name(), mirror, x.areaM2(), x.boundary(), Double.NaN));
            }
            e = e.withSurfaces(s);
        }
        return Cases.of(e, new BandSet(new double[] {2.0, 5.0, 12.0}, "test"));
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4})
    void threePathsAgreeOnRandomEnclosures(long seed) {
        RadiationCase c = randomCase(seed, 40 + (int) seed * 7, seed % 2 == 0, 0);
        SolveResult direct = solve(c, SolverChoice.DIRECT);
        assertAgree(direct, solve(c, SolverChoice.NEWTON_KRYLOV));
        assertAgree(direct, solve(c, SolverChoice.ITERATIVE));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.99, 0.999})
    void threePathsAgreeWhenNearlyEverythingIsReflected(double rho) {
        RadiationCase c = randomCase(11, 60, false, rho);
        SolveResult direct = solve(c, SolverChoice.DIRECT);
        SolveResult cg = solve(c, SolverChoice.ITERATIVE);
        assertAgree(direct, solve(c, SolverChoice.NEWTON_KRYLOV));
        assertAgree(direct, cg);
        // and the report says how slowly the band solves converged
        assertThat(cg.solver().bandIterations()).hasSize(4);
        for (int k : cg.solver().bandIterations()) {
            assertThat(k).isBetween(1, 400);
        }
        assertThat(cg.solver().strategy()).isEqualTo("iterative");
    }

    /** Big enough (N > the LU panel of 64) that every parallel split of the work is exercised. */
    @Test
    void resultsDoNotChangeWithTheThreadCount() throws Exception {
        RadiationCase c = withLinksAndConvection(randomCase(21, 150, true, 0));
        for (SolverChoice choice : SolverChoice.values()) {
            double[] reference = null;
            for (int threads : new int[] {1, 2, 3}) {
                ForkJoinPool pool = new ForkJoinPool(threads);
                SolveResult r = pool.submit(() -> solve(c, choice)).get();
                pool.shutdown();
                double[] values = new double[2 * r.surfaces().size()];
                for (int i = 0; i < r.surfaces().size(); i++) {
                    values[2 * i] = r.surfaces().get(i).temperatureK();
                    values[2 * i + 1] = r.surfaces().get(i).netHeatW();
                }
                if (reference == null) {
                    reference = values;
                } else {
                    assertThat(values).as(choice + " with " + threads + " threads").containsExactly(reference);
                }
            }
        }
    }

    @Test
    void pathsAgreeWithLinksAndConvection() {
        RadiationCase c = withLinksAndConvection(randomCase(31, 50, false, 0));
        SolveResult direct = solve(c, SolverChoice.DIRECT);
        assertAgree(direct, solve(c, SolverChoice.NEWTON_KRYLOV));
        assertAgree(direct, solve(c, SolverChoice.ITERATIVE));
    }

    /** Surfaces 1–4 become heat inputs with convection; links join 1–2, 2–3 and 3 to a fixed surface 0. */
    static RadiationCase withLinksAndConvection(RadiationCase c) {
        Enclosure e = c.enclosure();
        List<EnclosureSurface> s = new ArrayList<>(e.surfaces());
        for (int i = 1; i <= 4; i++) {
            EnclosureSurface x = s.get(i);
            s.set(i, new EnclosureSurface(x.name(), x.material(), x.areaM2(), new BoundaryCondition.HeatInput(50.0 * i),
                    Double.NaN, new Convection(5 + i, 320)));
        }
        List<ConductiveLink> links = List.of(new ConductiveLink(s.get(1).name(), s.get(2).name(), 0.8),
                new ConductiveLink(s.get(2).name(), s.get(3).name(), 2.5),
                new ConductiveLink(s.get(3).name(), s.get(0).name(), 0.3));
        Enclosure withLinks = new Enclosure(s, e.matrix(), e.environment(), links);
        return c.withEnclosure(withLinks);
    }
}
