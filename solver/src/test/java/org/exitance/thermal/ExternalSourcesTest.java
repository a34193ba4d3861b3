package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.ExternalSource;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.result.SolveResult;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.support.RandomEnclosures;
import org.exitance.support.SolveCheck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Bodies in sunlight radiating to a 0 K sink. Radiative equilibrium of an isolated body:
 * α_s S A_projected = ε(T) σ T⁴ A (standard closed form; e.g. Incropera et al., 6th ed.,
 * §12.8 on solar irradiation and the α_s/ε ratio). Sun: a 5772 K blackbody of 1361 W/m²
 * (common practice).
 */
class ExternalSourcesTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    private static final double SUN_K = 5772;
    private static final double SOLAR_W_M2 = 1361;
    /** A selective coating: ε_λ = 0.9 below 2 µm, 0.1 above. */
    private static final SpectralEmissivity SELECTIVE =
            new TabulatedEmissivity(new double[] {2, Math.nextUp(2.0)}, new double[] {0.9, 0.1});

    private static double stepTotal(double tempK) {
        return 0.1 + 0.8 * Planck.fractionBelow(2 * tempK);
    }

    /**
     * @param shape       "plate" (insulated back, face-on), "sphere", "cube" (one face toward the sun)
     * @param incidence   projected area over total area: 1, 1/4, 1/6
     */
    @ParameterizedTest
    @CsvSource({"plate, 1.0", "sphere, 0.25", "cube, 0.16666666666666666"})
    void isolatedBodyInSunlightReachesRadiativeEquilibrium(String shape, double incidence) {
        EnclosureSurface body = new EnclosureSurface(shape, new Material("sel", SELECTIVE, ""), 2.0,
                new BoundaryCondition.Adiabatic(), Double.NaN);
        Enclosure e = new Enclosure(List.of(body), new double[][] {{0}}, new Environment("space", 0.0));
        ExternalSource sun = new ExternalSource("sun", new BlackbodySource(SUN_K), SOLAR_W_M2, Map.of(shape, incidence));
        double alphaS = 0.1 + 0.8 * Planck.fractionBelow(2 * SUN_K);
        double expected = new BrentSolver(1e-12).solve(200,
                t -> alphaS * SOLAR_W_M2 * incidence - stepTotal(t) * SIGMA * Math.pow(t, 4), 10, 3000);
        for (BandSet bands : List.of(BandSet.gray("t"), new BandSet(new double[] {0.5, 2, 8}, "t"))) {
            RadiationCase c = new RadiationCase("t", "", List.of(body.material()), e, null, SolverSettings.DEFAULT,
                    List.of(sun));
            SolveResult r = new TemperatureSolver(c).solve(bands);
            assertThat(r.surface(shape).temperatureK()).as("%s with %d bands", shape, bands.size())
                    .isCloseTo(expected, within(1e-6));
            SolveCheck.assertSolved(c, r);
        }
    }

    @Property(tries = 40)
    void aLitEnclosureSolvesItsBandEquations(@ForAll long seed, @ForAll @IntRange(min = 2, max = 6) int n,
                                             @ForAll boolean open) {
        RadiationCase c = litCase(new Random(seed), n, open, 0);
        SolveResult res = new TemperatureSolver(c).solve(new BandSet(new double[] {1, 2.5, 6}, "t"));
        // the source's band shares and absorptivities, the reflected part and every unknown's
        // condition, against the independent solve of the textbook system
        SolveCheck.assertSolved(c, res);
    }

    @Test
    void aResultCheckedAgainstTheCaseWithTheLampAHundredKelvinCoolerFails() {
        // the check above can fail on the source terms: the same lamp power in another spectrum
        // changes every band's share and absorptivity
        for (long seed = 1; seed <= 3; seed++) {
            RadiationCase c = litCase(new Random(seed), 4, true, 0);
            SolveResult res = new TemperatureSolver(c).solve(new BandSet(new double[] {1, 2.5, 6}, "t"));
            SolveCheck.assertSolved(c, res);
            RadiationCase cooler = litCase(new Random(seed), 4, true, -100);
            assertThatThrownBy(() -> SolveCheck.assertSolved(cooler, res)).as("seed %d", seed)
                    .isInstanceOf(AssertionError.class);
        }
    }

    /** A random enclosure lit by a lamp of 2000–6000 K (plus {@code shiftK}) on a random half of its surfaces. */
    private static RadiationCase litCase(Random r, int n, boolean open, double shiftK) {
        Enclosure e = RandomEnclosures.random(r, n, open, 0.5);
        java.util.Map<String, Double> inc = new java.util.HashMap<>();
        for (EnclosureSurface s : e.surfaces()) {
            if (r.nextBoolean()) {
                inc.put(s.name(), r.nextDouble());
            }
        }
        inc.put(e.surface(0).name(), 0.5 + 0.5 * r.nextDouble());
        ExternalSource lamp = new ExternalSource("lamp", new BlackbodySource(2000 + 4000 * r.nextDouble() + shiftK),
                500 + 4500 * r.nextDouble(), inc);
        return new RadiationCase("t", "", List.of(), e, null, SolverSettings.DEFAULT, List.of(lamp));
    }
}
