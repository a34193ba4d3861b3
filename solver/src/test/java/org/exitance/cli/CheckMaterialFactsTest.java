package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code exitance check} lists the materials whose τ or ρ depends on temperature and the windows
 * held to a measurement tolerance. ρ = 1 − ε − τ (α = ε, Kirchhoff; α + ρ + τ = 1, Incropera et
 * al., 6th ed., Sec. 12.7, from memory): a window given a constant ρ and τ(T) has a constant ρ
 * even though ε changes; an opaque material with ε(T) has ρ(T).
 */
class CheckMaterialFactsTest {
    @TempDir
    Path dir;

    private static String window(String name, String material) {
        return """
                {"name": "%1$s_in", "material": "%2$s", "area_m2": 0.1, "adiabatic": true, "otherFace": "%1$s_out"},
                {"name": "%1$s_out", "material": "%2$s", "area_m2": 0.1, "otherFace": "%1$s_in"},
                """.formatted(name, material);
    }

    @Test
    void checkListsTemperatureDependentTauOrRhoAndMeasurementTolerances() throws Exception {
        String byT = """
                {"byTemperature": [{"temperature_K": 300, "wavelength_um": [0.5, 4], "transmissivity": [0.9, 0]},
                                   {"temperature_K": 900, "wavelength_um": [0.5, 4], "transmissivity": [0.7, 0]}]}""";
        String json = """
                {"title": "material facts (test)",
                 "materials": {
                   "hot_glass": {"emissivity": 0.05, "spectralTransmissivity": %1$s},
                   "coated_glass": {"reflectivity": 0.08, "spectralTransmissivity": %1$s},
                   "oxide": {"spectralEmissivity": {"byTemperature": [
                      {"temperature_K": 300, "wavelength_um": [1, 5], "emissivity": [0.3, 0.6]},
                      {"temperature_K": 1200, "wavelength_um": [1, 5], "emissivity": [0.5, 0.7]}]}},
                   "measured": {"emissivity": 0.1, "reflectivity": 0.1, "transmissivity": 0.79, "measurementTolerance": 0.05},
                   "measured_default": {"emissivity": 0.1, "reflectivity": 0.1, "transmissivity": 0.8},
                   "black": {"emissivity": 1}},
                 "surfaces": [
                   %2$s%3$s%4$s%5$s
                   {"name": "wall", "material": "oxide", "area_m2": 2.0, "temperature_K": 800},
                   {"name": "floor", "material": "black", "area_m2": 1.0, "temperature_K": 300}],
                 "environment": {"name": "room", "temperature_K": 300},
                 "viewFactors": {"matrix": [
                   [0,0,0,0,0,0,0,0, 0.5, 0], [0,0,0,0,0,0,0,0, 0, 0],
                   [0,0,0,0,0,0,0,0, 0.5, 0], [0,0,0,0,0,0,0,0, 0, 0],
                   [0,0,0,0,0,0,0,0, 0.5, 0], [0,0,0,0,0,0,0,0, 0, 0],
                   [0,0,0,0,0,0,0,0, 0.5, 0], [0,0,0,0,0,0,0,0, 0, 0],
                   [0.025,0,0.025,0,0.025,0,0.025,0, 0, 0.5], [0,0,0,0,0,0,0,0, 1, 0]]}}
                """.formatted(byT, window("a", "hot_glass"), window("b", "coated_glass"), window("c", "measured"),
                window("d", "measured_default"));
        Path f = dir.resolve("facts.json");
        Files.writeString(f, json);
        CliRun run = CliRun.of("check", f.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        String line = run.out().lines().filter(l -> l.contains("temperature-dependent τ or ρ")).findFirst().orElseThrow();
        // hot_glass: τ(T) with a constant ε, so ρ = 1 − ε − τ changes; coated_glass: ρ given constant
        assertThat(line).contains("hot_glass (τ, ρ)", "coated_glass (τ)", "oxide (ρ = 1 − ε)")
                .doesNotContain("coated_glass (τ, ρ)", "measured", "black");
        String tol = run.out().lines().filter(l -> l.contains("measured ε, ρ and τ")).findFirst().orElseThrow();
        assertThat(tol).contains("measured 0.0500 (measurementTolerance)", "measured_default 0.0200 (default)")
                .doesNotContain("hot_glass", "coated_glass");
    }

    @Test
    void aCaseWithoutSuchMaterialsPrintsNeitherLine() {
        CliRun run = CliRun.of("check", org.exitance.cases.RepoCases.validationCase("gray-three-surface-reradiating.json")
                .toString());
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).doesNotContain("temperature-dependent τ or ρ", "measured ε, ρ and τ");
    }
}
