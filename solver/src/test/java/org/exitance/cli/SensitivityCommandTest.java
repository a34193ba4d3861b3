package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;

class SensitivityCommandTest {
    private static final String CASE = RepoCases.root().resolve("cases/demo/selective-absorber-audit.json").toString();

    @Test
    void rankingCarriesEveryBandAndThePropagatedUncertainty() throws Exception {
        CliRun r = CliRun.of("sensitivity", CASE, "--of", "selective_plate", "--quantity", "temperature", "--json");
        assertThat(r.exitCode()).isEqualTo(0);
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.get("quantity").asText()).isEqualTo("temperature_K");
        JsonNode s = j.get("sensitivities");
        assertThat(s.size()).isGreaterThan(3);
        double rss = 0;
        for (JsonNode x : s) {
            if (x.get("effectFromStatedBound").asBoolean()) {
                rss += x.get("effect").asDouble() * x.get("effect").asDouble();
            }
        }
        // root-sum-square of independent contributions (common practice in uncertainty propagation)
        assertThat(j.get("propagatedUncertainty").get("independentBands").asDouble()).isCloseTo(Math.sqrt(rss),
                within(1e-9 * Math.sqrt(rss)));
    }

    @Test
    void aFixedTemperatureHasNoTemperatureSensitivityAndAnUnknownSurfaceIsNamed() {
        CliRun fixed = CliRun.of("sensitivity", CASE, "--of", "emitter", "--quantity", "temperature");
        assertThat(fixed.exitCode()).isEqualTo(2);
        assertThat(fixed.err()).contains("fixed");
        CliRun unknown = CliRun.of("sensitivity", CASE, "--of", "nowhere");
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.err().lines().count()).isEqualTo(1);
    }
}
