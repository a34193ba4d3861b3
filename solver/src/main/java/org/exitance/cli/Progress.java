package org.exitance.cli;

import java.io.PrintWriter;
import org.exitance.geometry.viewfactor.ProgressListener;

/**
 * Progress of a long computation on standard error: only when standard error is a terminal and
 * the user did not ask for quiet. Ctrl-C during the computation requests cancellation.
 */
final class Progress implements ProgressListener {
    private final boolean show;
    private final PrintWriter err;
    private volatile boolean cancelled;
    private int lastPercent = -1;
    private boolean printed;
    private final Thread hook;
    private final String label;

    private Progress(boolean show, PrintWriter err, String label) {
        this.label = label;
        this.show = show;
        this.err = err;
        this.hook = new Thread(() -> cancelled = true, "exitance-cancel");
        Runtime.getRuntime().addShutdownHook(hook);
    }

    /** @param wanted false with --quiet */
    static Progress onStderr(boolean wanted, PrintWriter err) {
        return onStderr(wanted, err, "view factors");
    }

    /** @param label  what is running ("time") */
    static Progress onStderr(boolean wanted, PrintWriter err, String label) {
        return new Progress(wanted && System.console() != null, err, label);
    }

    @Override
    public synchronized void progress(double fractionDone) {
        int p = (int) Math.floor(100 * fractionDone);
        if (show && p != lastPercent) {
            lastPercent = p;
            printed = true;
            err.print("\r" + label + ": " + p + " %");
            err.flush();
        }
    }

    boolean cancelled() {
        return cancelled;
    }

    /** Ends the progress line and removes the cancellation hook. */
    synchronized void done() {
        if (printed) {
            err.print("\r" + " ".repeat(24) + "\r");
            err.flush();
        }
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException e) {
            // the JVM is already shutting down (Ctrl-C): nothing to remove
        }
    }
}
