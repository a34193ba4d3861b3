package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.pipeline.CasePipeline;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.PairExchange;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.support.Cases;
import org.exitance.support.RandomEnclosures;
import org.exitance.support.ShippedCases;
import org.exitance.support.SpectralReference;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The pair exchange closes on the solver's own net heats, its Gebhart factors obey reciprocity
 * and summation (checked here by code of the test's own), and two-surface enclosures give the
 * closed forms.
 */
class PairExchangeTest {
    /** Stefan–Boltzmann constant, CODATA 2018 (W m⁻² K⁻⁴). */
    private static final double SIGMA = 5.670374419e-8;

    /**
     * Largest |Σ_j Q_ij − Q_i| over the surfaces, relative to the power the surface exchanges (its
     * incident power A·G plus |Q_i|, both from the solver's result, not from the pair exchange).
     */
    static double worstRowSumError(SolveResult r, PairExchange pe) {
        double worst = 0;
        for (int i = 0; i < r.surfaces().size(); i++) {
            SurfaceResult s = r.surfaces().get(i);
            double sum = 0;
            for (int j = 0; j < pe.nodes().size(); j++) {
                sum += pe.netHeat_W(i, j);
            }
            double scale = Math.abs(s.netHeatW());
            for (double g : s.bandIncidentW()) {
                scale += Math.abs(g);
            }
            worst = Math.max(worst, Math.abs(sum - s.netHeatW()) / Math.max(scale, 1e-300));
        }
        return worst;
    }

    /** Largest |A_i ε_i B_ij − A_j ε_j B_ji| / max of both, over surface pairs and bands. */
    static double worstReciprocityError(PairExchange pe) {
        double worst = 0;
        for (int k = 0; k < pe.bandCount(); k++) {
            for (int i = 0; i < pe.surfaceCount(); i++) {
                for (int j = i + 1; j < pe.surfaceCount(); j++) {
                    double a = pe.emittingArea_m2(k, i) * pe.gebhartFactor(k, i, j);
                    double b = pe.emittingArea_m2(k, j) * pe.gebhartFactor(k, j, i);
                    double big = Math.max(Math.abs(a), Math.abs(b));
                    if (big > 0) {
                        worst = Math.max(worst, Math.abs(a - b) / big);
                    }
                }
            }
        }
        return worst;
    }

    /** Largest |1 − Σ_j B_ij| (j over surfaces and the opening) over surfaces and bands. */
    static double worstSummationError(PairExchange pe) {
        double worst = 0;
        int env = pe.environmentIndex();
        for (int k = 0; k < pe.bandCount(); k++) {
            for (int i = 0; i < pe.surfaceCount(); i++) {
                double s = env >= 0 ? pe.gebhartFactor(k, i, env) : 0.0;
                for (int j = 0; j < pe.surfaceCount(); j++) {
                    s += pe.gebhartFactor(k, i, j);
                }
                worst = Math.max(worst, Math.abs(1 - s));
            }
        }
        return worst;
    }

    private static SolveResult solve(Enclosure e, BandSet bands) {
        return new TemperatureSolver(Cases.of(e, bands)).pairExchange(PairExchangeRule.SURFACES).solve(bands);
    }

    @Test
    void randomEnclosuresCloseTheirRowsAndObeyReciprocityAndSummation() {
        // Reciprocity A_i ε_i B_ij = A_j ε_j B_ji and summation Σ_j B_ij = 1 of Gebhart's absorption
        // factors (Siegel & Howell, Thermal Radiation Heat Transfer, 5th ed., Ch. 6, from memory).
        for (long seed = 1; seed <= 12; seed++) {
            Random rnd = new Random(seed);
            Enclosure e = RandomEnclosures.random(rnd, 3 + rnd.nextInt(6), seed % 2 == 0, 0.4);
            SolveResult r = solve(e, new BandSet(new double[] {2, 5, 9}, "test"));
            PairExchange pe = r.pairExchange().orElseThrow();
            assertThat(pe.bandCount()).isEqualTo(4);
            assertThat(worstRowSumError(r, pe)).as("seed " + seed).isLessThan(1e-9);
            assertThat(worstReciprocityError(pe)).as("seed " + seed).isLessThan(1e-9);
            assertThat(worstSummationError(pe)).as("seed " + seed).isLessThan(1e-9);
            for (int i = 0; i < pe.nodes().size(); i++) {
                for (int j = 0; j < pe.nodes().size(); j++) {
                    assertThat(pe.netHeat_W(i, j)).isEqualTo(-pe.netHeat_W(j, i));
                }
            }
            if (e.environment() != null) {
                int env = pe.environmentIndex();
                assertThat(pe.nodes().get(env)).isEqualTo("environment");
                assertThat(pe.rowSum_W(env)).isCloseTo(r.environment().netHeatW(),
                        within(1e-9 * (Math.abs(r.environment().netHeatW()) + r.energyScaleW() * 1e-3)));
            }
        }
    }

    @Test
    void aPerturbedInputFailsEachCheck() {
        Random rnd = new Random(7);
        Enclosure e = RandomEnclosures.random(rnd, 5, false, 0.3);
        SolveResult r = solve(e, new BandSet(new double[] {3}, "test"));
        PairExchange pe = r.pairExchange().orElseThrow();
        // one surface's reported net heat off by 1e-6 of itself: the row check sees it
        SurfaceResult s = r.surfaces().get(2);
        java.util.List<SurfaceResult> shifted = new java.util.ArrayList<>(r.surfaces());
        shifted.set(2, new SurfaceResult(s.name(), s.areaM2(), s.boundary(), s.temperatureK(), s.temperatureSolved(),
                s.netHeatW() + 1e-6 * (Math.abs(s.netHeatW()) + 1), s.netFluxWPerM2(), s.bandNetHeatW(),
                s.bandEmissivity(), s.convectionW(), s.conductionW(), s.wallW(), s.heatSuppliedW(), s.bandIncidentW(),
                s.bandRadiosityWPerM2()));
        assertThat(worstRowSumError(r.toBuilder().surfaces(shifted).build(), pe)).isGreaterThan(1e-9);
        // one Gebhart factor raised by 1e-6: reciprocity and summation both fail
        PairExchange bent = withGebhart(pe, 0, 1, 3, 1e-6);
        assertThat(worstReciprocityError(bent)).isGreaterThan(1e-9);
        assertThat(worstSummationError(bent)).isGreaterThan(1e-9);
    }

    /** pe with B_ij of band k raised by d. */
    private static PairExchange withGebhart(PairExchange pe, int k, int i, int j, double d) {
        int s = pe.surfaceCount();
        int m = pe.nodes().size();
        double[][] q = new double[pe.bandCount()][m * m];
        double[][] b = new double[pe.bandCount()][s * (s + 1)];
        double[][] e = new double[pe.bandCount()][s];
        double[] c = new double[m * m];
        double[] a = new double[s];
        List<PairExchange.Kind> kinds = new java.util.ArrayList<>();
        for (int x = 0; x < m; x++) {
            kinds.add(pe.kind(x));
        }
        for (int band = 0; band < pe.bandCount(); band++) {
            for (int x = 0; x < s; x++) {
                e[band][x] = pe.emittingArea_m2(band, x);
                a[x] = pe.area_m2(x);
                for (int y = 0; y < s; y++) {
                    b[band][x * (s + 1) + y] = pe.gebhartFactor(band, x, y) + (band == k && x == i && y == j ? d : 0);
                }
            }
        }
        return new PairExchange(pe.nodes(), kinds, q, b, e, c, a);
    }

    @Test
    void gebhartFactorsAgreeWithAnIndependentSolveOfGebhartsEquations() {
        // Opaque enclosure: B_ij = F_ij ε_j + Σ_m F_im ρ_m B_mj, B_i,env = F_i,env + Σ_m F_im ρ_m B_m,env
        // (Gebhart, Int. J. Heat Mass Transfer 3, 1961; Siegel & Howell, 5th ed., Ch. 6, from memory),
        // solved here with Apache Commons Math's LU from the band ε the solver reports.
        for (long seed = 20; seed <= 23; seed++) {
            Random rnd = new Random(seed);
            Enclosure e = RandomEnclosures.random(rnd, 4 + rnd.nextInt(4), seed % 2 == 1, 0.0);
            SolveResult r = solve(e, new BandSet(new double[] {4}, "test"));
            PairExchange pe = r.pairExchange().orElseThrow();
            int n = e.size();
            for (int k = 0; k < 2; k++) {
                RealMatrix lhs = new Array2DRowRealMatrix(n, n);
                RealMatrix rhs = new Array2DRowRealMatrix(n, n + 1);
                for (int i = 0; i < n; i++) {
                    for (int m = 0; m < n; m++) {
                        double rho = 1 - r.surfaces().get(m).bandEmissivity()[k];
                        lhs.setEntry(i, m, (i == m ? 1 : 0) - e.viewFactor(i, m) * rho);
                        rhs.setEntry(i, m, e.viewFactor(i, m) * r.surfaces().get(m).bandEmissivity()[k]);
                    }
                    rhs.setEntry(i, n, e.environmentFactor(i));
                }
                RealMatrix b = new LUDecomposition(lhs).getSolver().solve(rhs);
                for (int i = 0; i < n; i++) {
                    for (int j = 0; j < n; j++) {
                        assertThat(pe.gebhartFactor(k, i, j)).isCloseTo(b.getEntry(i, j), within(1e-12));
                    }
                    if (e.environment() != null) {
                        assertThat(pe.gebhartFactor(k, i, pe.environmentIndex())).isCloseTo(b.getEntry(i, n),
                                within(1e-12));
                    }
                }
            }
        }
    }

    private static EnclosureSurface fixed(String name, double eps, double area, double t) {
        return new EnclosureSurface(name, new Material("m-" + name, new GrayEmissivity(eps), ""), area,
                new BoundaryCondition.FixedTemperature(t), Double.NaN);
    }

    @Test
    void parallelPlatesExchangeTheClosedForm() {
        // Infinite parallel gray plates: q = σ(T1⁴ − T2⁴)/(1/ε1 + 1/ε2 − 1) (Incropera et al.,
        // Fundamentals of Heat and Mass Transfer, 7th ed., Table 13.3, large parallel planes, from
        // memory); Gebhart's factor B_12 = ε2/(1 − ρ1 ρ2) (from B_12 = ε2 + ρ2 ρ1 B_12 with F_12 = 1).
        double e1 = 0.3;
        double e2 = 0.7;
        double t1 = 900;
        double t2 = 400;
        double area = 2.5;
        Enclosure e = new Enclosure(List.of(fixed("hot", e1, area, t1), fixed("cold", e2, area, t2)),
                new double[][] {{0, 1}, {1, 0}}, null);
        PairExchange pe = solve(e, BandSet.gray("t")).pairExchange().orElseThrow();
        double expected = area * SIGMA * (Math.pow(t1, 4) - Math.pow(t2, 4)) / (1 / e1 + 1 / e2 - 1);
        assertThat(pe.netHeat_W(0, 1)).isCloseTo(expected, within(1e-10 * expected));
        assertThat(pe.bandNetHeat_W(0, 1, 0)).isCloseTo(-expected, within(1e-10 * expected));
        assertThat(pe.gebhartFactor(0, 0, 1)).isCloseTo(e2 / (1 - (1 - e1) * (1 - e2)), within(1e-14));
        // the conductance is the secant: G (T1 − T2) = Q
        assertThat(pe.conductance_W_per_K(0, 1) * (t1 - t2)).isCloseTo(expected, within(1e-10 * expected));
        assertThat(pe.nodes()).containsExactly("hot", "cold");
    }

    @Test
    void nonGrayParallelPlatesExchangeTheClosedFormInEachBand() {
        // Per band with step emissivities that change at the band edge, each band is a gray
        // two-plate problem: Q_k = A (E_1k − E_2k)/(1/ε_1k + 1/ε_2k − 1) (Incropera et al., 7th ed.,
        // Table 13.3, applied band by band; Siegel & Howell, 5th ed., band form, from memory), with the
        // band emissive powers from an independent quadrature of Planck's law (support.SpectralReference).
        SpectralEmissivity hot = new TabulatedEmissivity(new double[] {4, Math.nextUp(4.0)}, new double[] {0.9, 0.3});
        SpectralEmissivity cold = new TabulatedEmissivity(new double[] {4, Math.nextUp(4.0)}, new double[] {0.2, 0.8});
        double t1 = 1200;
        double t2 = 450;
        Enclosure e = new Enclosure(List.of(
                new EnclosureSurface("a", new Material("hot", hot, ""), 1.0, new BoundaryCondition.FixedTemperature(t1),
                        Double.NaN),
                new EnclosureSurface("b", new Material("cold", cold, ""), 1.0, new BoundaryCondition.FixedTemperature(t2),
                        Double.NaN)), new double[][] {{0, 1}, {1, 0}}, null);
        PairExchange pe = solve(e, new BandSet(new double[] {4}, "t")).pairExchange().orElseThrow();
        double[][] edges = {{0, 4}, {4, Double.POSITIVE_INFINITY}};
        double[][] eps = {{0.9, 0.2}, {0.3, 0.8}};
        double total = 0;
        for (int k = 0; k < 2; k++) {
            double e1 = SpectralReference.bandPowerWPerM2(edges[k][0], edges[k][1], t1);
            double e2 = SpectralReference.bandPowerWPerM2(edges[k][0], edges[k][1], t2);
            double expected = (e1 - e2) / (1 / eps[k][0] + 1 / eps[k][1] - 1);
            assertThat(pe.bandNetHeat_W(k, 0, 1)).as("band " + k).isCloseTo(expected, within(1e-7 * expected));
            total += expected;
        }
        assertThat(pe.netHeat_W(0, 1)).isCloseTo(total, within(1e-7 * total));
    }

    @Test
    void conductanceTimesTemperatureDifferenceIsThePairsHeat() {
        // For reciprocal exchange areas Q_ij = Σ_k S_ij (E_i − E_j) exactly, so the secant conductance
        // G_ij = Q_ij/(T_i − T_j) (Hottel & Sarofim, Radiative Transfer, 1967, from memory).
        Random rnd = new Random(41);
        Enclosure e = RandomEnclosures.random(rnd, 6, true, 0.3);
        SolveResult r = solve(e, new BandSet(new double[] {3, 7}, "t"));
        PairExchange pe = r.pairExchange().orElseThrow();
        int env = pe.environmentIndex();
        for (int i = 0; i < 6; i++) {
            for (int j = i + 1; j < 6; j++) {
                double dt = r.surfaces().get(i).temperatureK() - r.surfaces().get(j).temperatureK();
                double q = pe.netHeat_W(i, j);
                assertThat(pe.conductance_W_per_K(i, j) * dt).isCloseTo(q, within(1e-9 * (Math.abs(q) + 1e-6)));
                assertThat(pe.conductance_W_per_K(i, j)).isEqualTo(pe.conductance_W_per_K(j, i)).isGreaterThanOrEqualTo(0);
            }
            assertThat(pe.conductance_W_per_K(i, env)).isGreaterThanOrEqualTo(0);
        }
    }

    @Test
    void concentricSpheresExchangeTheClosedForm() {
        // Concentric gray spheres: q = σ A1 (T1⁴ − T2⁴)/(1/ε1 + (1 − ε2)/ε2 (r1/r2)²) (Incropera et al.,
        // 7th ed., Table 13.3, concentric spheres, from memory); F_12 = 1, F_21 = (r1/r2)², F_22 = 1 − F_21.
        double r1 = 0.2;
        double r2 = 0.5;
        double a1 = 4 * Math.PI * r1 * r1;
        double a2 = 4 * Math.PI * r2 * r2;
        double f21 = a1 / a2;
        double e1 = 0.45;
        double e2 = 0.2;
        Enclosure e = new Enclosure(List.of(fixed("inner", e1, a1, 1100), fixed("outer", e2, a2, 500)),
                new double[][] {{0, 1}, {f21, 1 - f21}}, null);
        SolveResult r = solve(e, new BandSet(new double[] {3}, "t"));
        PairExchange pe = r.pairExchange().orElseThrow();
        double expected = SIGMA * a1 * (Math.pow(1100, 4) - Math.pow(500, 4)) / (1 / e1 + (1 - e2) / e2 * (r1 / r2) * (r1 / r2));
        assertThat(pe.netHeat_W(0, 1)).isCloseTo(expected, within(1e-10 * expected));
        assertThat(pe.netHeat_W(1, 0)).isCloseTo(-expected, within(1e-10 * expected));
        // the two bands add to the total, each antisymmetric
        assertThat(pe.bandNetHeat_W(0, 0, 1) + pe.bandNetHeat_W(1, 0, 1)).isCloseTo(expected, within(1e-10 * expected));
    }

    @Test
    void pairHeatsDoNotDependOnSurfaceOrder() {
        Random rnd = new Random(31);
        Enclosure e = RandomEnclosures.random(rnd, 6, true, 0.3);
        int[] order = {3, 0, 5, 1, 4, 2};
        BandSet bands = new BandSet(new double[] {2, 6}, "t");
        PairExchange a = solve(e, bands).pairExchange().orElseThrow();
        PairExchange b = solve(e.permuted(order), bands).pairExchange().orElseThrow();
        for (int i = 0; i < 6; i++) {
            for (int j = 0; j < 7; j++) {
                int bi = b.nodes().indexOf(a.nodes().get(i));
                int bj = b.nodes().indexOf(a.nodes().get(j));
                double v = a.netHeat_W(i, j);
                assertThat(b.netHeat_W(bi, bj)).isCloseTo(v, within(1e-9 * (Math.abs(v) + 1)));
            }
        }
    }

    static Stream<Path> shipped() {
        return ShippedCases.all().stream();
    }

    @TestFactory
    Stream<DynamicTest> everyShippedCaseClosesItsRowsOnItsOwnNetHeats() {
        // With windows, sources, environments, two-sided plates and facets.
        return shipped().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            RadiationCase c = CasePipeline.prepare(f).model();
            for (LoadCaseResult lc : CaseSolver.solveAll(c, null, null, 1e-3, null, PairExchangeRule.FACETS)) {
                SolveResult r = lc.result();
                PairExchange pe = r.pairExchange().orElseThrow();
                assertThat(pe.surfaceCount()).isEqualTo(r.surfaces().size());
                assertThat(worstRowSumError(r, pe)).isLessThan(1e-9);
                for (int s = 0; s < r.sources().size(); s++) {
                    int node = pe.nodes().size() - r.sources().size() + s;
                    double delivered = r.sources().get(s).incidentW();
                    assertThat(pe.rowSum_W(node)).isCloseTo(delivered, within(1e-9 * delivered + 1e-12));
                }
                if (!r.facets().isEmpty()) {
                    PairExchange fe = r.facetPairExchange().orElseThrow();
                    SolveResult byFacet = r.toBuilder().surfaces(r.facets()).build();
                    assertThat(worstRowSumError(byFacet, fe)).isLessThan(1e-9);
                }
            }
        }));
    }
}
