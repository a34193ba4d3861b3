package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cases.RepoCases;
import org.exitance.support.ShippedCases;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code exitance verify}: the shipped validation cases pass; a wrong reference fails with exit 4. */
class VerifyCommandTest {
    @TempDir
    Path dir;

    /** The number of expected values listed in the "expected" blocks of the pinned validation cases. */
    private static int expectedValueCount() throws IOException {
        ObjectMapper json = new ObjectMapper();
        int n = 0;
        for (Path f : ShippedCases.validation()) {
            JsonNode expected = json.readTree(f.toFile()).get("expected");
            for (JsonNode target : expected.path("surfaces")) {
                n += target.size();
            }
            n += expected.path("environment").size();
        }
        return n;
    }

    @Test
    void shippedValidationCasesAllPass() throws IOException {
        Path validation = RepoCases.validation();
        int checks = expectedValueCount();
        assertThat(checks).isPositive();
        CliRun run = CliRun.of("verify", validation.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("verify: " + checks + " passed, 0 failed").doesNotContain("FAIL");
    }

    @Test
    void wrongExpectedValueFailsWithExitFour() throws IOException {
        ObjectNode c = RepoCases.plates();
        ObjectNode hot = (ObjectNode) c.get("expected").get("surfaces").get("hot");
        hot.put("netHeat_W", hot.get("netHeat_W").asDouble() * 1.01);
        RepoCases.write(dir, "gray-parallel-plates-wrong.json", c);
        CliRun run = CliRun.of("verify", dir.toString());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(4);
        assertThat(run.out()).contains("FAIL", "verify: 1 passed, 1 failed");
    }

    @Test
    void verifyJsonReportsTheFailure() throws IOException {
        ObjectNode c = RepoCases.plates();
        ObjectNode cold = (ObjectNode) c.get("expected").get("surfaces").get("cold");
        cold.put("netHeat_W", -cold.get("netHeat_W").asDouble());
        Path file = RepoCases.write(dir, "sign-flipped.json", c);
        CliRun run = CliRun.of("verify", "--json", file.toString());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(4);
        JsonNode verdicts = new ObjectMapper().readTree(run.out());
        assertThat(verdicts.get("passed").asBoolean()).isFalse();
    }

    @Test
    void verifyOnAMissingDirectoryIsBadInput() {
        CliRun run = CliRun.of("verify", dir.resolve("nowhere").toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains("nowhere");
    }
}
