package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;

/** Help, version and unknown options. */
class GlobalOptionsTest {

    @Test
    void helpExitsZeroAndListsTheSubcommandsAndExitCodes() {
        CliRun run = CliRun.of("--help");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("solve", "check", "verify", "Exit codes");
        assertThat(run.err()).isEmpty();
    }

    @Test
    void subcommandHelpExitsZero() {
        CliRun run = CliRun.of("solve", "--help");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).contains("--band-edges", "--force");
    }

    @Test
    void versionExitsZeroAndNamesTheProgram() {
        CliRun run = CliRun.of("--version");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out().trim()).startsWith("exitance ").hasLineCount(1);
    }

    @Test
    void unknownOptionExitsTwoWithOneLine() {
        CliRun run = CliRun.of("solve", "--colour",
                RepoCases.validationCase("gray-parallel-plates.json").toString());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains("--colour");
    }

    @Test
    void unknownSubcommandExitsTwoWithOneLine() {
        CliRun run = CliRun.of("sovle");
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains("sovle");
    }
}
