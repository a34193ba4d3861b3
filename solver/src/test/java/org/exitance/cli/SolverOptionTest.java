package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@code exitance solve --solver}: each method solves the shipped facet case to the same
 * temperatures (the paths differ only in round-off and linear tolerances; common practice), the
 * result names the method, and an unknown name is one line and exit 2.
 */
class SolverOptionTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    private static String demoCase() {
        return RepoCases.root().resolve("cases/demo/heat-treating-chamber-facets.json").toString();
    }

    private static JsonNode solve(String method) throws Exception {
        CliRun run = CliRun.of("solve", "--json", "--no-audit", "--solver", method,
                demoCase());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        return JSON.readTree(run.out());
    }

    @ParameterizedTest
    @ValueSource(strings = {"newton-krylov", "iterative"})
    void everyMethodGivesTheDirectTemperatures(String method) throws Exception {
        JsonNode direct = solve("direct");
        JsonNode other = solve(method);
        assertThat(direct.get("solver").get("strategy").asText()).isEqualTo("direct");
        assertThat(other.get("solver").get("strategy").asText()).isEqualTo(method);
        JsonNode a = direct.get("surfaces");
        JsonNode b = other.get("surfaces");
        assertThat(b.size()).isEqualTo(a.size()).isPositive();
        for (int i = 0; i < a.size(); i++) {
            double t = a.get(i).get("temperature_K").asDouble();
            assertThat(b.get(i).get("temperature_K").asDouble()).isCloseTo(t, within(1e-8 * t));
        }
    }

    @Test
    void anUnknownMethodIsOneLineAndExitTwo() {
        CliRun run = CliRun.of("solve", "--solver", "fastest",
                demoCase());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.errLines()).hasSize(1);
        assertThat(run.err()).contains("--solver").contains("direct, newton-krylov or iterative");
    }
}
