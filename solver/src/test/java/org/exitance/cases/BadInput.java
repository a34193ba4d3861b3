package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.exitance.cli.CliRun;

/**
 * The promise for bad input: exit code 2, nothing on standard output, and exactly one line on
 * standard error naming the file, the JSON path and the problem, without a stack trace.
 */
final class BadInput {
    private BadInput() {
    }

    /** Runs {@code exitance check FILE} and {@code exitance solve FILE}; both must keep the promise. */
    static String rejected(Path file, String jsonPath, String... problemWords) {
        return rejectedNaming(file, file, jsonPath, problemWords);
    }

    /** As {@link #rejected}, for a case whose error lies in another file it refers to (a property CSV). */
    static String rejectedNaming(Path caseFile, Path named, String jsonPath, String... problemWords) {
        String line = null;
        for (String command : new String[] {"check", "solve"}) {
            CliRun run = CliRun.of(command, caseFile.toString());
            line = oneLineError(run, 2);
            assertThat(line).as(command).contains(named.toString());
            if (jsonPath != null) {
                assertThat(line).as(command).contains(jsonPath + ":");
            }
            assertThat(line).as(command).contains(problemWords);
        }
        return line;
    }

    /** Asserts the exit code, empty stdout and a single stack-trace-free stderr line; returns that line. */
    static String oneLineError(CliRun run, int exitCode) {
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(exitCode);
        assertThat(run.out()).as(run.toString()).isEmpty();
        assertThat(run.errLines()).as(run.toString()).hasSize(1);
        String line = run.errLines().get(0);
        assertThat(line).as(run.toString())
                .doesNotContain("\tat ", "Exception", "internal error")
                .startsWith("exitance: ");
        return line;
    }
}
