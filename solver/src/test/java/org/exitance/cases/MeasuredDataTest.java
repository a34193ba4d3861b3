package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.exitance.model.Material;
import org.exitance.pipeline.CasePipeline;
import org.exitance.result.SolveResult;
import org.exitance.spectral.BandAverages;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Materials given as measured: opaque reflectivity, normal emittance, directional emittance. */
class MeasuredDataTest {
    @TempDir
    Path dir;

    private static ObjectNode json(String text) {
        try {
            return (ObjectNode) RepoCases.JSON.readTree(text);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private SolveResult solve(ObjectNode c, String name) throws Exception {
        return CaseSolver.solve(CasePipeline.prepare(RepoCases.write(dir, name, c)).model(), null);
    }

    private Material material(ObjectNode c, String material) throws Exception {
        return CaseReader.read(RepoCases.write(dir, "m.json", c)).materials().stream()
                .filter(m -> m.name().equals(material)).findFirst().orElseThrow();
    }

    /**
     * An opaque sample's reflectance table gives the same solve as the equivalent emissivity table,
     * ε_λ = 1 − ρ_λ (Kirchhoff, opaque diffuse surface; Siegel &amp; Howell, 5th ed., §3.4).
     */
    @Test
    void aReflectanceTableReproducesTheEquivalentEmissivityTable() throws Exception {
        ObjectNode byEmissivity = RepoCases.load("two-band-parallel-plates.json");
        byEmissivity.remove("expected");
        ObjectNode byReflectance = byEmissivity.deepCopy();
        ((ObjectNode) byEmissivity.get("materials")).set("selective_cold",
                json("{\"spectralEmissivity\": {\"wavelength_um\": [1, 3, 6, 20], \"emissivity\": [0.3, 0.35, 0.8, 0.75]}}"));
        ((ObjectNode) byReflectance.get("materials")).set("selective_cold",
                json("{\"spectralOpaqueReflectivity\": {\"wavelength_um\": [1, 3, 6, 20], \"reflectivity\": [0.7, 0.65, 0.2, 0.25]}}"));
        SolveResult a = solve(byEmissivity, "e.json");
        SolveResult b = solve(byReflectance, "r.json");
        for (int i = 0; i < a.surfaces().size(); i++) {
            assertThat(b.surfaces().get(i).netHeatW()).isCloseTo(a.surfaces().get(i).netHeatW(),
                    within(1e-9 * Math.abs(a.surfaces().get(i).netHeatW())));
        }
    }

    /** ε' = ε_n cos θ tabulated every 10° integrates to about ⅔ ε_n (Siegel &amp; Howell, 5th ed., §3.3). */
    @Test
    void aDirectionalTableIsIntegratedOverTheHemisphere() throws Exception {
        ObjectNode c = RepoCases.plates();
        StringBuilder angles = new StringBuilder();
        StringBuilder values = new StringBuilder();
        for (int d = 0; d <= 90; d += 10) {
            angles.append(d == 0 ? "" : ", ").append(d);
            values.append(d == 0 ? "" : ", ").append(0.6 * Math.cos(Math.toRadians(d)));
        }
        ((ObjectNode) c.get("materials")).set("measured", json("{\"directionalEmissivity\": {\"angle_deg\": [" + angles
                + "], \"emissivity\": [" + values + "]}}"));
        double e = BandAverages.totalEmissivity(material(c, "measured").emissivity(), 300);
        assertThat(e).isCloseTo(0.4, within(2e-3)); // linear interpolation between 10° samples
    }

    /** A normal emittance with the dielectric conversion: the hemispherical value is slightly lower (common practice). */
    @Test
    void aNormalEmittanceIsConvertedByTheStatedModel() throws Exception {
        ObjectNode c = RepoCases.plates();
        ((ObjectNode) c.get("materials")).set("glass", json("{\"normalEmissivity\": 0.92, \"normalToHemispherical\": \"dielectric\"}"));
        ((ObjectNode) c.get("materials")).set("steel", json("{\"normalEmissivity\": 0.1, \"normalToHemispherical\": \"metal\"}"));
        double glass = BandAverages.totalEmissivity(material(c, "glass").emissivity(), 300);
        double steel = BandAverages.totalEmissivity(material(c, "steel").emissivity(), 300);
        assertThat(glass).isBetween(0.84, 0.92);
        assertThat(steel / 0.1).isBetween(1.1, 1.3);
    }

    @Test
    void aNormalEmittanceWithoutItsConversionIsAnInputError() {
        ObjectNode c = RepoCases.plates();
        ((ObjectNode) c.get("materials")).set("glass", json("{\"normalEmissivity\": 0.92}"));
        Path file = RepoCases.write(dir, "no-conversion.json", c);
        String line = BadInput.oneLineError(CliRun.of("solve", file.toString()), 2);
        assertThat(line).contains("$.materials.glass", "normalToHemispherical");
    }

    /** A window's transmissivity from a CSV file solves as the same table given inline. */
    @Test
    void aWindowsTransmissivityFromCsvEqualsTheInlineTable() throws Exception {
        ObjectNode inline = RepoCases.load("window-between-black-plates.json");
        inline.remove("expected");
        ObjectNode fromCsv = inline.deepCopy();
        ((ObjectNode) inline.get("materials").get("quartz_step")).set("spectralTransmissivity",
                json("{\"wavelength_um\": [1, 2, 3, 5], \"transmissivity\": [0.9, 0.85, 0.3, 0.0]}"));
        ((ObjectNode) inline.get("materials").get("quartz_step")).set("spectralEmissivity",
                json("{\"wavelength_um\": [1, 2, 3, 5], \"emissivity\": [0.05, 0.1, 0.6, 0.9]}"));
        RepoCases.writeText(dir, "tau.csv", "# invented test data\nwavelength_um,transmissivity\n1,0.9\n2,0.85\n3,0.3\n5,0.0\n");
        ((ObjectNode) fromCsv.get("materials").get("quartz_step")).set("spectralTransmissivity",
                json("{\"csv\": \"tau.csv\"}"));
        ((ObjectNode) fromCsv.get("materials").get("quartz_step")).set("spectralEmissivity",
                json("{\"wavelength_um\": [1, 2, 3, 5], \"emissivity\": [0.05, 0.1, 0.6, 0.9]}"));
        SolveResult a = solve(inline, "inline.json");
        SolveResult b = solve(fromCsv, "csv.json");
        for (int i = 0; i < a.surfaces().size(); i++) {
            assertThat(b.surfaces().get(i).netHeatW()).isEqualTo(a.surfaces().get(i).netHeatW());
        }
    }
}
