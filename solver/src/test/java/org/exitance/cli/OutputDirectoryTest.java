package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file is written only into a directory that exists, unless --create-dirs asks for it. */
class OutputDirectoryTest {
    @TempDir
    Path dir;

    private static String plates() {
        return RepoCases.validationCase("gray-parallel-plates.json").toString();
    }

    @Test
    void outputIntoAMissingDirectoryIsExitTwoAndCreatesNothing() {
        Path out = dir.resolve("no").resolve("such").resolve("result.json");
        CliRun run = CliRun.of("solve", "--json", "-o", out.toString(), plates());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString()
                .contains(out.toString(), "directory", "does not exist", "--create-dirs");
        assertThat(dir.resolve("no")).doesNotExist();
    }

    @Test
    void createDirsCreatesTheMissingDirectories() throws Exception {
        Path out = dir.resolve("new").resolve("deeper").resolve("result.txt");
        CliRun run = CliRun.of("solve", "--create-dirs", "-o", out.toString(), plates());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(Files.readString(out)).contains("Energy balance");
    }

    @Test
    void everyCommandThatWritesFilesRefusesAMissingDirectory() {
        Path missing = dir.resolve("missing");
        String geometry = RepoCases.copyDemo(dir, "heat-treating-chamber-geometry.json").toString();
        String[][] commands = {
            {"audit", "-o", missing.resolve("a.txt").toString(), plates()},
            {"material", "-o", missing.resolve("m.txt").toString(), plates()},
            {"material", "--plot", missing.resolve("m.png").toString(), plates()},
            {"view-factors", "--csv", missing.resolve("f.csv").toString(), geometry},
        };
        for (String[] c : commands) {
            CliRun run = CliRun.of(c);
            assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
            assertThat(run.errLines()).as(run.toString()).singleElement().asString().contains("does not exist");
        }
        assertThat(missing).doesNotExist();
    }
}
