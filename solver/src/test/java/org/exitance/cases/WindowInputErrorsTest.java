package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bad windows and bad semi-transparent materials: exit 2 with one line naming the file, the JSON
 * path and the problem (the promise kept by {@link BadInput}). The base case is the shipped
 * validation case with a window between two black plates. α + ρ + τ = 1 for a diffuse surface
 * with α = ε is common practice (Kirchhoff's law and energy conservation).
 */
class WindowInputErrorsTest {
    private static final String BASE = "window-between-black-plates.json";

    @TempDir
    Path dir;

    private static ObjectNode quartz(ObjectNode c) {
        return (ObjectNode) c.get("materials").get("quartz_step");
    }

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    private static ArrayNode values(ObjectNode table, String key, double... v) {
        ArrayNode a = table.putArray(key);
        for (double x : v) {
            a.add(x);
        }
        return a;
    }

    @Test
    void theBaseCaseIsValid() {
        Path file = RepoCases.write(dir, "ok.json", RepoCases.load(BASE));
        assertThat(org.exitance.cli.CliRun.of("check", file.toString()).exitCode()).isZero();
    }

    @Test
    void propertiesThatDoNotSumToOneAreRejectedNamingMaterialAndWavelength() {
        ObjectNode c = RepoCases.load(BASE);
        ObjectNode r = quartz(c).putObject("spectralReflectivity");
        values(r, "bandEdges_um", 2.5);
        values(r, "reflectivity", 0.05, 0.3); // above 2.5 µm ε + τ = 0.9, so ρ must be 0.1; 0.3 is off
        Path file = RepoCases.write(dir, "sum-off.json", c);
        String line = BadInput.rejected(file, "$.materials.quartz_step", "at 2.5 µm", "ε = 0.9", "ρ = 0.3",
                "τ = 0 sum to 1.2", "must be 1");
    }

    @Test
    void aTransmissivityAboveOneIsOutOfRange() {
        ObjectNode c = RepoCases.load(BASE);
        values((ObjectNode) quartz(c).get("spectralTransmissivity"), "transmissivity", 1.2, 0.0);
        Path file = RepoCases.write(dir, "tau-above-one.json", c);
        BadInput.rejected(file, "$.materials.quartz_step.spectralTransmissivity.transmissivity[0]", "[0, 1]", "1.2");
    }

    @Test
    void emissivityAndTransmissivityAboveOneTogetherLeaveNoRoomForReflection() {
        ObjectNode c = RepoCases.load(BASE);
        quartz(c).remove("spectralEmissivity");
        quartz(c).put("emissivity", 0.5); // with τ = 0.9 below 2.5 µm, ρ = −0.4
        Path file = RepoCases.write(dir, "rho-negative.json", c);
        BadInput.rejected(file, "$.materials.quartz_step", "ρ = -0.4", "outside [0, 1]");
    }

    @Test
    void aSemiTransparentSurfaceWithoutAnOtherFaceIsRejected() {
        ObjectNode c = RepoCases.load(BASE);
        surface(c, 1).remove("otherFace");
        Path file = RepoCases.write(dir, "no-other-face.json", c);
        BadInput.rejected(file, "$.surfaces[1].material", "semi-transparent", "otherFace");
    }

    @Test
    void anOtherFaceThatDoesNotNameItBackIsRejected() {
        ObjectNode c = RepoCases.load(BASE);
        ObjectNode third = surface(c, 3);
        third.put("material", "quartz_step");
        third.put("otherFace", "window_inner");
        third.remove("temperature_K");
        surface(c, 2).put("otherFace", "cold");
        Path file = RepoCases.write(dir, "unpaired.json", c);
        BadInput.rejected(file, "$.surfaces[1].otherFace", "does not name 'window_inner'");
    }

    @Test
    void anOtherFaceNamingNoSurfaceIsRejected() {
        ObjectNode c = RepoCases.load(BASE);
        surface(c, 1).put("otherFace", "window_outside");
        Path file = RepoCases.write(dir, "unknown-face.json", c);
        BadInput.rejected(file, "$.surfaces[1].otherFace", "no surface named 'window_outside'");
    }

    @Test
    void windowFacesOfDifferentAreaAreRejected() {
        ObjectNode c = RepoCases.load(BASE);
        surface(c, 2).put("area_m2", 3.0);
        Path file = RepoCases.write(dir, "area.json", c);
        BadInput.rejected(file, "$.surfaces[1]", "same area", "2.00000000 m² and 3.00000000 m²");
    }

    @Test
    void windowFacesOfDifferentMaterialsAreRejected() {
        ObjectNode c = RepoCases.load(BASE);
        ((ObjectNode) c.get("materials")).set("quartz_copy", quartz(c).deepCopy());
        surface(c, 2).put("material", "quartz_copy");
        Path file = RepoCases.write(dir, "material.json", c);
        BadInput.rejected(file, "$.surfaces[1].material", "same material", "'quartz_step' and 'quartz_copy'");
    }

    /** An opaque surface may have an other face (a two-sided plate), but the two must name each other. */
    @Test
    void anOpaqueFaceWhosePartnerDoesNotNameItBackIsRejected() {
        ObjectNode c = RepoCases.load(BASE);
        surface(c, 3).put("otherFace", "hot");
        Path file = RepoCases.write(dir, "opaque.json", c);
        BadInput.rejected(file, "$.surfaces[3].otherFace", "does not name");
    }

    @Test
    void aConditionOnBothFacesIsRejected() {
        ObjectNode c = RepoCases.load(BASE);
        surface(c, 2).put("temperature_K", 900);
        Path file = RepoCases.write(dir, "both.json", c);
        BadInput.rejected(file, "$.surfaces[1]", "both give a boundary condition");
    }

    @Test
    void aWindowMaterialNeedsTwoProperties() {
        ObjectNode c = RepoCases.load(BASE);
        quartz(c).remove("spectralEmissivity");
        Path file = RepoCases.write(dir, "one-property.json", c);
        BadInput.rejected(file, "$.materials.quartz_step", "needs two of emissivity, reflectivity and transmissivity");
    }
}
