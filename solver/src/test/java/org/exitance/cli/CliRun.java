package org.exitance.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

/**
 * Runs the command line in-process and keeps what it wrote. Test support for the command-line
 * and bad-input tests.
 *
 * @param exitCode the exit code
 * @param out      everything written to standard output
 * @param err      everything written to standard error
 */
public record CliRun(int exitCode, String out, String err) {

    /** Runs {@code exitance ARGS...}. */
    public static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ExitanceCommand.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new CliRun(code, out.toString(), err.toString());
    }

    /** Non-empty lines written to standard error. */
    public List<String> errLines() {
        return err.lines().filter(l -> !l.isBlank()).toList();
    }

    @Override
    public String toString() {
        return "exit " + exitCode + "\n--- stdout ---\n" + out + "--- stderr ---\n" + err;
    }
}
