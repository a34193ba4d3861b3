package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.exitance.model.Material;
import org.exitance.pipeline.CasePipeline;
import org.exitance.result.SolveResult;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Window properties at several temperatures (linear in T between the tables, linear in λ within a
 * table), and measured ε, ρ, τ that do not quite sum to 1. The expected values are interpolated
 * by hand here; the solve is judged against the closed form for a gray window between two black
 * plates (three infinite parallel planes, F = 1 per gap), worked from the radiosity equations of a
 * semi-transparent surface (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed.,
 * partially transparent windows, from memory): J_a = εE_w + ρE_1 + τE_2, so the hot plate's heat is
 * Q_1 = A(E_1 − J_a) = A[ε(E_1 − E_w) + τ(E_1 − E_2)], and an adiabatic window balances
 * 2εE_w = ε(E_1 + E_2) whatever ε and τ are.
 */
class WindowByTemperatureTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018
    @TempDir
    Path dir;

    private Path window(String material) throws Exception {
        String json = """
                {"title": "window at temperature (test)",
                 "materials": {"black": {"emissivity": 1.0}, "glass": %s},
                 "surfaces": [
                   {"name": "hot", "material": "black", "area_m2": 2.0, "temperature_K": 1000},
                   {"name": "front", "material": "glass", "area_m2": 2.0, "adiabatic": true, "otherFace": "back"},
                   {"name": "back", "material": "glass", "area_m2": 2.0, "otherFace": "front"},
                   {"name": "cold", "material": "black", "area_m2": 2.0, "temperature_K": 400}],
                 "viewFactors": {"matrix": [[0, 1, 0, 0], [1, 0, 0, 0], [0, 0, 0, 1], [0, 0, 1, 0]]}}
                """.formatted(material);
        Path f = dir.resolve("window.json");
        Files.writeString(f, json);
        return f;
    }

    private static Material glass(Path f) throws Exception {
        return CaseReader.read(f).materials().stream().filter(m -> m.name().equals("glass")).findFirst().orElseThrow();
    }

    @Test
    void aWindowsEmissivityAndTransmissivityTablesAtTwoTemperaturesAreInterpolatedAtTheWindowTemperature()
            throws Exception {
        Files.writeString(dir.resolve("tau.csv"), """
                # invented test data: a glass that transmits less when hot
                temperature_K,wavelength_um,transmissivity
                300,1,0.6
                1200,1,0.2
                """);
        Path f = window("""
                {"spectralEmissivity": {"byTemperature": [
                    {"temperature_K": 300, "wavelength_um": [1], "emissivity": [0.2]},
                    {"temperature_K": 1200, "wavelength_um": [1], "emissivity": [0.5]}]},
                 "spectralTransmissivity": {"csv": "tau.csv"}}""");
        SolveResult r = CaseSolver.solve(CasePipeline.prepare(f).model(), null);
        double e1 = SIGMA * Math.pow(1000, 4);
        double e2 = SIGMA * Math.pow(400, 4);
        double ew = (e1 + e2) / 2;
        double tw = Math.pow(ew / SIGMA, 0.25);
        double x = (tw - 300) / 900;
        double eps = 0.2 + 0.3 * x;
        double tau = 0.6 - 0.4 * x;
        double q1 = 2.0 * (eps * (e1 - ew) + tau * (e1 - e2));
        assertThat(r.surface("front").temperatureK()).isCloseTo(tw, within(1e-6));
        assertThat(r.surface("hot").netHeatW()).isCloseTo(q1, within(1e-8 * q1));
        // a constant-property window would give another heat: the check can tell
        assertThat(Math.abs(2.0 * (0.2 * (e1 - ew) + 0.6 * (e1 - e2)) - q1)).isGreaterThan(1e-3 * q1);
    }

    @Test
    void aDerivedPropertyIsOneMinusTheOthersAtEveryWavelengthAndTemperature() throws Exception {
        Path f = window("""
                {"spectralTransmissivity": {"byTemperature": [
                    {"temperature_K": 400, "wavelength_um": [1, 3], "transmissivity": [0.8, 0.4]},
                    {"temperature_K": 800, "wavelength_um": [1, 3], "transmissivity": [0.6, 0.2]}]},
                 "spectralReflectivity": {"byTemperature": [
                    {"temperature_K": 500, "wavelength_um": [2], "reflectivity": [0.1]},
                    {"temperature_K": 1000, "wavelength_um": [2], "reflectivity": [0.3]}]}}""");
        Material m = glass(f);
        // at 2 µm, τ is 0.6 at 400 K and 0.4 at 800 K, so 0.5 at 600 K; ρ is 0.1 + 0.2·(100/500) = 0.14; ε = 1 − 0.5 − 0.14
        assertThat(m.transmissivity().at(2, 600)).isCloseTo(0.5, within(1e-12));
        assertThat(m.emissivity().at(2, 600)).isCloseTo(1 - 0.5 - 0.14, within(1e-12));
        // at 1.5 µm and 900 K: τ held at its 800 K table, 0.6 − 0.4·0.25 = 0.5; ρ = 0.1 + 0.2·0.8 = 0.26
        assertThat(m.emissivity().at(1.5, 900)).isCloseTo(1 - 0.5 - 0.26, within(1e-12));
        assertThat(m.emissivity().dependsOnTemperature()).isTrue();
    }

    @Test
    void measuredPropertiesWithinTheToleranceAreScaledToSumToOne() throws Exception {
        Path f = window("{\"emissivity\": 0.3, \"reflectivity\": 0.3, \"transmissivity\": 0.41}");
        Material m = glass(f);
        assertThat(m.emissivity().at(1, 300)).isCloseTo(0.3 / 1.01, within(1e-12));
        assertThat(m.transmissivity().at(1, 300)).isCloseTo(0.41 / 1.01, within(1e-12));
    }

    @Test
    void aSumBeyondTheMeasurementToleranceIsAnErrorInACaseThatNamesTheKey() throws Exception {
        Path f = window("{\"emissivity\": 0.3, \"reflectivity\": 0.3, \"transmissivity\": 0.45}");
        BadInput.rejected(f, "$.materials.glass", "sum to 1.05", "measurement tolerance 0.02", "measurementTolerance");
        Path wider = window("{\"emissivity\": 0.3, \"reflectivity\": 0.3, \"transmissivity\": 0.45,"
                + " \"measurementTolerance\": 0.06}");
        assertThat(glass(wider).emissivity().at(1, 300)).isCloseTo(0.3 / 1.05, within(1e-12));
    }

    @Test
    void theMaterialCommandWarnsAboutASumBeyondTheToleranceAndStillSurveysTheMaterial() throws Exception {
        Path f = dir.resolve("measured.json");
        Files.writeString(f, """
                {"title": "measured window film (invented test data)",
                 "materials": {"film": {"spectralEmissivity": {"wavelength_um": [1, 10], "emissivity": [0.1, 0.8]},
                                        "spectralReflectivity": {"wavelength_um": [1, 10], "reflectivity": [0.1, 0.1]},
                                        "spectralTransmissivity": {"wavelength_um": [1, 10], "transmissivity": [0.85, 0.1]}}}}
                """);
        CliRun run = CliRun.of("material", f.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("film", "Warning: $.materials.film: at 1 µm: ε = 0.1, ρ = 0.1, τ = 0.85 sum to 1.05",
                "measurement tolerance 0.02");
        CliRun json = CliRun.of("material", f.toString(), "--json");
        assertThat(json.exitCode()).isZero();
        assertThat(RepoCases.JSON.readTree(json.out()).get("warnings").get(0).asText()).contains("sum to 1.05");
        // within the tolerance: no warning
        Files.writeString(f, Files.readString(f).replace("0.85", "0.81"));
        assertThat(CliRun.of("material", f.toString()).out()).doesNotContain("Warning");
    }

    @Test
    void aMeasurementToleranceOnAnOpaqueMaterialIsAnError() throws Exception {
        Path f = window("{\"emissivity\": 0.3, \"transmissivity\": 0.4}");
        Files.writeString(f, Files.readString(f).replace("\"black\": {\"emissivity\": 1.0}",
                "\"black\": {\"emissivity\": 1.0, \"measurementTolerance\": 0.05}"));
        BadInput.rejected(f, "$.materials.black.measurementTolerance", "window");
    }
}
