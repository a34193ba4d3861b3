package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code solve --output FILE}: writes the file, never overwrites without --force. */
class OutputFileTest {
    @TempDir
    Path dir;

    private static String plates() {
        return RepoCases.validationCase("gray-parallel-plates.json").toString();
    }

    @Test
    void outputWritesTheFileAndNothingToStdout() throws Exception {
        Path out = dir.resolve("result.txt");
        CliRun run = CliRun.of("solve", "--output", out.toString(), plates());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).isEmpty();
        assertThat(Files.readString(out)).contains("hot", "cold", "Energy balance");
    }

    @Test
    void jsonOutputFileParses() throws Exception {
        Path out = dir.resolve("result.json");
        CliRun run = CliRun.of("solve", "--json", "-o", out.toString(), plates());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(new ObjectMapper().readTree(out.toFile()).get("surfaces")).hasSize(2);
    }

    @Test
    void existingFileIsNotOverwrittenWithoutForce() throws Exception {
        Path out = Files.writeString(dir.resolve("result.txt"), "keep me\n");
        CliRun run = CliRun.of("solve", "--output", out.toString(), plates());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains(out.toString(), "--force");
        assertThat(Files.readString(out)).isEqualTo("keep me\n");
        try (var files = Files.list(dir)) {
            assertThat(files).as("no temporary file left behind").containsExactly(out);
        }
    }

    @Test
    void forceReplacesAnExistingFile() throws Exception {
        Path out = Files.writeString(dir.resolve("result.txt"), "keep me\n");
        CliRun run = CliRun.of("solve", "--output", out.toString(), "--force", plates());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(Files.readString(out)).doesNotContain("keep me").contains("Energy balance");
    }
}
