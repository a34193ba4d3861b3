package org.exitance.thermal;

/** A temperature solve stopped because the user asked it to ({@link SolveMonitor#cancelled}); no result. */
public final class SolveCancelledException extends RuntimeException {
    public SolveCancelledException() {
        super("the solve was interrupted; no result");
    }
}
