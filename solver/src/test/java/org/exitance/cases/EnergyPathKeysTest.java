package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reading dissipation, convection and conductive links, and rejecting bad ones with a path. */
class EnergyPathKeysTest {
    private static final String CASE = """
            {"materials": {"m": {"emissivity": 0.5}},
             "surfaces": [
               {"name": "a", "material": "m", "area_m2": 1, "dissipation_W": 10,
                "convection": {"coefficient_W_m2K": 4, "fluidTemperature_C": 20}},
               {"name": "b", "material": "m", "area_m2": 1, "temperature_K": 300}],
             "conductiveLinks": [{"between": ["a", "%s"], "conductance_W_K": %s}],
             "viewFactors": {"matrix": [[0, 1], [1, 0]]}}
            """;

    private static Path write(Path dir, String other, String g) throws Exception {
        Path f = dir.resolve("c.json");
        Files.writeString(f, String.format(CASE, other, g));
        return f;
    }

    @Test
    void dissipationConvectionAndLinksAreRead(@TempDir Path dir) throws Exception {
        CaseDescription c = CaseReader.read(write(dir, "b", "0.3"));
        EnclosureSurface a = c.surfaces().get(0);
        assertThat(a.boundary()).isEqualTo(new BoundaryCondition.HeatInput(10));
        assertThat(a.convection().coefficientWPerM2K()).isEqualTo(4);
        assertThat(a.convection().fluidTemperatureK()).isEqualTo(293.15);
        assertThat(c.links()).hasSize(1);
    }

    @Test
    void aLinkToAnUnknownSurfaceNamesItsPath(@TempDir Path dir) throws Exception {
        Path f = write(dir, "nowhere", "0.3");
        assertThatThrownBy(() -> CaseReader.read(f)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.conductiveLinks[0].between[1]").hasMessageContaining("nowhere");
    }

    @Test
    void aNonPositiveConductanceIsRejected(@TempDir Path dir) throws Exception {
        Path f = write(dir, "b", "-1");
        assertThatThrownBy(() -> CaseReader.read(f)).isInstanceOf(CaseException.class)
                .hasMessageContaining("$.conductiveLinks[0].conductance_W_K");
    }
}
