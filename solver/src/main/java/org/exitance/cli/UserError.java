package org.exitance.cli;

/** A problem with what the user asked for, reported on one line with an exit code. */
final class UserError extends RuntimeException {
    private final int exitCode;

    UserError(String message, int exitCode) {
        super(message);
        this.exitCode = exitCode;
    }

    int exitCode() {
        return exitCode;
    }
}
