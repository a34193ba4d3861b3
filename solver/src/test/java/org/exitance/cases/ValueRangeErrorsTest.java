package org.exitance.cases;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Values of the right type that are physically impossible, and conflicting boundary conditions. */
class ValueRangeErrorsTest {
    @TempDir
    Path dir;

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    private static ObjectNode spectralPlate1(ObjectNode c, double[] wavelengths, double[] emissivities) {
        ObjectNode table = ((ObjectNode) c.get("materials")).putObject("plate1").putObject("spectralEmissivity");
        var w = table.putArray("wavelength_um");
        for (double x : wavelengths) {
            w.add(x);
        }
        var e = table.putArray("emissivity");
        for (double x : emissivities) {
            e.add(x);
        }
        return c;
    }

    @Test
    void grayEmissivityAboveOneIsOutOfRange() {
        ObjectNode c = RepoCases.plates();
        ((ObjectNode) c.get("materials").get("plate2")).put("emissivity", 1.2);
        Path file = RepoCases.write(dir, "emissivity-above-one.json", c);
        BadInput.rejected(file, "$.materials.plate2.emissivity", "[0, 1]", "1.2");
    }

    @Test
    void negativeGrayEmissivityIsOutOfRange() {
        ObjectNode c = RepoCases.plates();
        ((ObjectNode) c.get("materials").get("plate2")).put("emissivity", -0.1);
        Path file = RepoCases.write(dir, "emissivity-negative.json", c);
        BadInput.rejected(file, "$.materials.plate2.emissivity", "[0, 1]", "-0.1");
    }

    @Test
    void emissivityOutOfRangeInsideATableNamesTheEntry() {
        ObjectNode c = spectralPlate1(RepoCases.plates(), new double[] {1, 2, 3}, new double[] {0.5, 1.05, 0.5});
        Path file = RepoCases.write(dir, "table-emissivity.json", c);
        BadInput.rejected(file, "$.materials.plate1.spectralEmissivity.emissivity[1]", "[0, 1]", "1.05");
    }

    @Test
    void nonIncreasingWavelengthsInATableAreRejected() {
        ObjectNode c = spectralPlate1(RepoCases.plates(), new double[] {1, 3, 3}, new double[] {0.5, 0.6, 0.7});
        Path file = RepoCases.write(dir, "table-wavelengths.json", c);
        BadInput.rejected(file, "$.materials.plate1.spectralEmissivity.wavelength_um[2]", "must increase");
    }

    @Test
    void negativeAreaNamesThePathAndExitsTwo() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("area_m2", -1.0);
        Path file = RepoCases.write(dir, "negative-area.json", c);
        BadInput.rejected(file, "$.surfaces[1].area_m2", "must be positive", "-1.0");
    }

    @Test
    void kelvinTemperatureBelowZeroIsRejected() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("temperature_K", -5);
        Path file = RepoCases.write(dir, "negative-kelvin.json", c);
        BadInput.rejected(file, "$.surfaces[1].temperature_K", "below absolute zero");
    }

    @Test
    void celsiusTemperatureBelowAbsoluteZeroIsRejected() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).remove("temperature_K");
        surface(c, 1).put("temperature_C", -300);
        Path file = RepoCases.write(dir, "cold-celsius.json", c);
        BadInput.rejected(file, "$.surfaces[1].temperature_C", "below absolute zero", "-300");
    }

    @Test
    void environmentBelowAbsoluteZeroIsRejected() {
        ObjectNode c = RepoCases.load("gray-plate-to-environment.json");
        ((ObjectNode) c.get("environment")).put("temperature_K", -1);
        Path file = RepoCases.write(dir, "cold-environment.json", c);
        BadInput.rejected(file, "$.environment.temperature_K", "below absolute zero");
    }

    @Test
    void kelvinAndCelsiusTogetherAreRejected() {
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("temperature_C", 226.85);
        Path file = RepoCases.write(dir, "kelvin-and-celsius.json", c);
        BadInput.rejected(file, "$.surfaces[1]", "temperature_K", "temperature_C");
    }

    @Test
    void environmentWithKelvinAndCelsiusSaysNotBoth() {
        ObjectNode c = RepoCases.load("gray-plate-to-environment.json");
        ((ObjectNode) c.get("environment")).put("temperature_C", 26.85);
        Path file = RepoCases.write(dir, "environment-kelvin-and-celsius.json", c);
        BadInput.rejected(file, "$.environment", "not both");
    }

    @Test
    void twoBoundaryConditionsOnOneSurfaceAreRejected() {
        ObjectNode c = RepoCases.plates();
        surface(c, 0).put("netHeat_W", 1000.0);
        Path file = RepoCases.write(dir, "two-conditions.json", c);
        BadInput.rejected(file, "$.surfaces[0]", "more than one of", "temperature_K, netHeat_W");
    }

    @Test
    void surfaceWithoutBoundaryConditionIsRejected() {
        ObjectNode c = RepoCases.plates();
        surface(c, 0).remove("temperature_K");
        Path file = RepoCases.write(dir, "no-condition.json", c);
        BadInput.rejected(file, "$.surfaces[0]", "needs one of");
    }
}
