package org.exitance.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.exitance.cases.CaseException;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.support.SolveCheck;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A shield pack whose layers each have their own material ({@code coveredBy.layerMaterials}),
 * between two large parallel plates (F = 1 across every gap, gray). The closed form of N shields
 * in series: q = σ(T₁⁴ − T₂⁴) / [1/ε₁ + 1/ε₂ − 1 + Σ_k (1/ε_k,in + 1/ε_k,out − 1)], and shield k's
 * temperature from the resistance between plate 1 and it (Incropera, DeWitt, Bergman &amp; Lavine,
 * 6th ed., §13.3, Eq. 13.24 and the shield form; Siegel &amp; Howell, 5th ed., §6.3, series
 * resistances; from memory). Checked also against a radiosity balance of the stack written and
 * solved in the test (Commons Math LU), which does not use the series form.
 */
class CoverLayerMaterialsTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    private static final double T_HOT = 1400;
    private static final double T_COLD = 350;
    private static final double E_HOT = 0.7;
    private static final double E_COLD = 0.5;
    /** Layer emissivities from the hot plate outward; the last layer's outer face has E_OUTER. */
    private static final double[] LAYERS = {0.3, 0.12, 0.06, 0.2};
    private static final double E_OUTER = 0.45;
    @TempDir
    Path dir;

    private Path write(String cover) throws Exception {
        String json = """
                {"title": "shield pack with a material per layer (test)",
                 "materials": {"hot_face": {"emissivity": %s}, "cold_face": {"emissivity": %s},
                               "s1": {"emissivity": %s}, "s2": {"emissivity": %s}, "s3": {"emissivity": %s},
                               "s4": {"emissivity": %s}, "outer": {"emissivity": %s}},
                 "surfaces": [{"name": "hot", "material": "hot_face", "area_m2": 1.5, "temperature_K": %s,
                               "coveredBy": %s},
                              {"name": "cold", "material": "cold_face", "area_m2": 1.5, "temperature_K": %s}],
                 "viewFactors": {"matrix": [[0, 1], [1, 0]]}}
                """.formatted(E_HOT, E_COLD, LAYERS[0], LAYERS[1], LAYERS[2], LAYERS[3], E_OUTER, T_HOT, cover, T_COLD);
        Path f = dir.resolve("pack.json");
        Files.writeString(f, json);
        return f;
    }

    /** ε of the faces in order: hot plate, (in, out) of each shield, cold plate. */
    private static double[] faces() {
        int n = LAYERS.length;
        double[] e = new double[2 * n + 2];
        e[0] = E_HOT;
        for (int k = 0; k < n; k++) {
            e[1 + 2 * k] = LAYERS[k];
            e[2 + 2 * k] = k == n - 1 ? E_OUTER : LAYERS[k];
        }
        e[2 * n + 1] = E_COLD;
        return e;
    }

    @Test
    void shieldsOfDifferentEmissivitiesCarryTheSeriesClosedFormHeatAndTemperatures() throws Exception {
        RadiationCase c = CasePipeline.prepare(write(
                "{\"layerMaterials\": [\"s1\", \"s2\", \"s3\", \"s4\"], \"outerMaterial\": \"outer\"}")).model();
        SolveResult r = CaseSolver.solve(c, null);
        SolveCheck.assertSolved(c, r);
        double[] e = faces();
        int n = LAYERS.length;
        // series closed form: one gap resistance 1/ε_a + 1/ε_b − 1 per gap (n + 1 gaps)
        double[] gap = new double[n + 1];
        double total = 0;
        for (int g = 0; g <= n; g++) {
            gap[g] = 1 / e[2 * g] + 1 / e[2 * g + 1] - 1;
            total += gap[g];
        }
        double q = SIGMA * (Math.pow(T_HOT, 4) - Math.pow(T_COLD, 4)) / total; // W/m²
        assertThat(r.surface("hot").netHeatW()).isCloseTo(1.5 * q, within(1e-9 * 1.5 * q));
        assertThat(r.surface("cold").netHeatW()).isCloseTo(-1.5 * q, within(1e-9 * 1.5 * q));
        double before = 0;
        double[] independent = independentShieldTemperatures();
        for (int k = 1; k <= n; k++) {
            before += gap[k - 1];
            double tk = Math.pow(Math.pow(T_HOT, 4) - q * before / SIGMA, 0.25);
            String in = "hot.layer" + k + ".in";
            assertThat(r.surface(in).temperatureK()).as("shield %d, series form", k).isCloseTo(tk, within(1e-7));
            assertThat(r.surface(in).temperatureK()).as("shield %d, stack balance", k)
                    .isCloseTo(independent[k - 1], within(1e-7));
            assertThat(material(c, in)).isEqualTo("s" + k);
        }
        assertThat(material(c, "hot.layer3.out")).isEqualTo("s3");
        assertThat(material(c, "hot.outer")).isEqualTo("outer");
        // the shields are hotter nearer the hot plate, and differ: a wrong material on one layer would move them
        assertThat(independent[0]).isGreaterThan(independent[1]);
    }

    private static String material(RadiationCase c, String surface) {
        return c.enclosure().surfaces().stream().filter(s -> s.name().equals(surface)).findFirst().orElseThrow()
                .material().name();
    }

    /**
     * The stack as a radiosity network written from first principles: J_i = ε_i E_i + (1 − ε_i) J_partner
     * for every face (F = 1 to its gap partner), E of the plates fixed, and for each shield (faces in,
     * out) a zero net heat (J_in − J_prev) + (J_out − J_next) = 0 with E_in = E_out. Unknowns: every J
     * and each shield's E = σT⁴; one linear system, solved by LU.
     */
    private static double[] independentShieldTemperatures() {
        double[] e = faces();
        int n = LAYERS.length;
        int faces = 2 * n + 2;
        int unknowns = faces + n;
        double[][] a = new double[unknowns][unknowns];
        double[] b = new double[unknowns];
        for (int i = 0; i < faces; i++) {
            int partner = i % 2 == 0 ? i + 1 : i - 1; // hot(0)↔in1(1), out1(2)↔in2(3), …, outN(2n)↔cold(2n+1)
            a[i][i] = 1;
            a[i][partner] = -(1 - e[i]);
            if (i == 0) {
                b[i] = e[i] * SIGMA * Math.pow(T_HOT, 4);
            } else if (i == faces - 1) {
                b[i] = e[i] * SIGMA * Math.pow(T_COLD, 4);
            } else {
                a[i][faces + (i - 1) / 2] = -e[i];
            }
        }
        for (int k = 0; k < n; k++) {
            int in = 1 + 2 * k;
            int out = 2 + 2 * k;
            int row = faces + k;
            a[row][in] += 1;
            a[row][in - 1] -= 1;
            a[row][out] += 1;
            a[row][out + 1] -= 1;
        }
        RealVector x = new LUDecomposition(new Array2DRowRealMatrix(a)).getSolver().solve(new ArrayRealVector(b));
        double[] t = new double[n];
        for (int k = 0; k < n; k++) {
            t[k] = Math.pow(x.getEntry(faces + k) / SIGMA, 0.25);
        }
        return t;
    }

    @Test
    void sharedAndPerLayerFormsAgreeWhenTheLayersAreAlike() throws Exception {
        SolveResult shared = CaseSolver.solve(CasePipeline.prepare(write(
                "{\"layers\": 3, \"layerMaterial\": \"s2\", \"outerMaterial\": \"outer\"}")).model(), null);
        SolveResult list = CaseSolver.solve(CasePipeline.prepare(write(
                "{\"layerMaterials\": [\"s2\", \"s2\", \"s2\"], \"outerMaterial\": \"outer\"}")).model(), null);
        assertThat(list.surface("hot").netHeatW()).isEqualTo(shared.surface("hot").netHeatW());
        // the series form with three alike shields: gaps hot–s2, s2–s2 twice, outer–cold
        double eps = LAYERS[1];
        double total = (1 / E_HOT + 1 / eps - 1) + 2 * (2 / eps - 1) + (1 / E_OUTER + 1 / E_COLD - 1);
        double q = SIGMA * (Math.pow(T_HOT, 4) - Math.pow(T_COLD, 4)) / total;
        assertThat(list.surface("hot").netHeatW()).isCloseTo(1.5 * q, within(1e-9 * 1.5 * q));
    }

    @Test
    void aBadLayerListIsAnInputErrorNamingItsPath() throws Exception {
        CaseException unknown = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"layerMaterials\": [\"s1\", \"nothing\"], \"outerMaterial\": \"outer\"}")));
        assertThat(unknown.getMessage()).contains("$.surfaces[0].coveredBy.layerMaterials[1]", "unknown material 'nothing'");
        CaseException empty = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"layerMaterials\": [], \"outerMaterial\": \"outer\"}")));
        assertThat(empty.getMessage()).contains("$.surfaces[0].coveredBy.layerMaterials", "one material per layer");
        CaseException both = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"layers\": 2, \"layerMaterials\": [\"s1\", \"s2\"], \"outerMaterial\": \"outer\"}")));
        assertThat(both.getMessage()).contains("$.surfaces[0].coveredBy", "more than one of");
        CaseException mixed = assertThrows(CaseException.class, () -> CasePipeline.prepare(write(
                "{\"layerMaterial\": \"s1\", \"layerMaterials\": [\"s1\", \"s2\"], \"outerMaterial\": \"outer\"}")));
        assertThat(mixed.getMessage()).contains("$.surfaces[0].coveredBy.layerMaterial", "not both");
    }
}
