package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;

class AuditCommandTest {

    @Test
    void theDemoBuiltToFoolTheGrayShortcutIsFlaggedWithItsCause() throws Exception {
        String c = RepoCases.root().resolve("cases/demo/selective-absorber-audit.json").toString();
        CliRun r = CliRun.of("audit", c);
        assertThat(r.exitCode()).isEqualTo(0);
        assertThat(r.out()).contains("selective_plate", "FLAGGED", "Verdict", "Caution");
        CliRun j = CliRun.of("audit", "--json", c);
        JsonNode surfaces = new ObjectMapper().readTree(j.out()).get("audits").get(0).get("surfaces");
        JsonNode plate = surfaces.get(1);
        assertThat(plate.get("name").asText()).isEqualTo("selective_plate");
        assertThat(plate.get("flagged").asBoolean()).isTrue();
        assertThat(plate.get("netHeat_W").has("band")).isTrue();
        assertThat(plate.get("temperature_K").get("gray").asDouble())
                .isLessThan(plate.get("temperature_K").get("band").asDouble());
        assertThat(plate.get("cause").get("effectiveAbsorptivity").asDouble())
                .isGreaterThan(plate.get("cause").get("emissivityAtOwnTemperature").asDouble());
        assertThat(plate.has("grayError_W") && plate.has("grayError_pct")).isTrue();
    }

    @Test
    void aHigherThresholdClearsTheFlagAndANonsenseThresholdIsRejected() {
        String c = RepoCases.root().resolve("cases/demo/selective-absorber-audit.json").toString();
        assertThat(CliRun.of("audit", "--threshold", "50", c).out()).doesNotContain("FLAGGED");
        CliRun bad = CliRun.of("audit", "--threshold", "-1", c);
        assertThat(bad.exitCode()).isEqualTo(2);
        assertThat(bad.err().lines().count()).isEqualTo(1);
    }

    @Test
    void solveCarriesTheAuditUnlessAskedNotTo() throws Exception {
        String c = RepoCases.root().resolve("cases/demo/selective-absorber-audit.json").toString();
        JsonNode with = new ObjectMapper().readTree(CliRun.of("solve", "--json", c).out());
        assertThat(with.get("audit").get("flagged").asInt()).isEqualTo(1);
        JsonNode without = new ObjectMapper().readTree(CliRun.of("solve", "--json", "--no-audit", c).out());
        assertThat(without.has("audit")).isFalse();
        assertThat(CliRun.of("solve", c).out()).contains("Gray-body audit");
    }

    @Test
    void thePlotIsAPngFileAndIsNotOverwrittenWithoutForce(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        String c = RepoCases.root().resolve("cases/demo/selective-absorber-audit.json").toString();
        java.nio.file.Path png = dir.resolve("audit.png");
        assertThat(CliRun.of("audit", "--plot", png.toString(), c).exitCode()).isEqualTo(0);
        byte[] head = java.util.Arrays.copyOf(java.nio.file.Files.readAllBytes(png), 8);
        // PNG signature (ISO/IEC 15948)
        assertThat(head).isEqualTo(new byte[] {(byte) 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A});
        CliRun again = CliRun.of("audit", "--plot", png.toString(), c);
        assertThat(again.exitCode()).isEqualTo(2);
        assertThat(again.err()).contains("exists");
    }
}
