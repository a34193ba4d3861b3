package org.exitance.cli;

/** Exit codes of every command (also listed in --help and docs/command-line.md). */
public final class ExitCodes {
    /** Success. */
    public static final int OK = 0;
    /** Unexpected internal error (a bug: please report it with the case). */
    public static final int INTERNAL = 1;
    /** Bad input: unreadable or invalid case, bad option, ill-posed problem. */
    public static final int BAD_INPUT = 2;
    /**
     * A solve did not converge (no result is reported), or the view factors miss the case's
     * view-factor tolerance (the results are printed with that warning).
     */
    public static final int NO_CONVERGENCE = 3;
    /** {@code verify}: at least one validation check failed. */
    public static final int CHECK_FAILED = 4;
    /** Interrupted by Ctrl-C (SIGINT) during a solve: 128 + 2, as shells report it. */
    public static final int INTERRUPTED = 130;

    static final String HELP = "Exit codes: 0 success; 2 bad input (message names file and JSON path);"
            + " 3 no convergence, or view-factor tolerance not met; 4 a validation check failed (verify); 130 interrupted (Ctrl-C); 1 internal error.";

    private ExitCodes() {
    }
}
