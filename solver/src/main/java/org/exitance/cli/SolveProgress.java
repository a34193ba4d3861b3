package org.exitance.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.exitance.thermal.SolveMonitor;

/**
 * Progress of temperature solves on standard error, and Ctrl-C for them. The line (bands, Newton
 * step, largest heat residual in watts) is shown only when standard error is a terminal, the user
 * did not ask for quiet, and the solve has run for {@link #QUIET_SECONDS}: a small case prints
 * nothing. Ctrl-C asks the solve to stop ({@link SolveMonitor#cancelled}); the command then reports
 * one line and exits with {@link ExitCodes#INTERRUPTED}. Should the solve not reach a point where
 * it stops within {@link #GRACE_MS} ms, the line is printed by the interrupt itself.
 */
final class SolveProgress implements SolveMonitor, AutoCloseable {
    static final double QUIET_SECONDS = 0.5;
    static final long GRACE_MS = 5000;
    /** The latest monitor made, whose interrupt waits for the command's last line. */
    private static volatile SolveProgress latest;

    /** Counted down once the command has printed its last line (ExitanceCommand.run). */
    private final CountDownLatch reported = new CountDownLatch(1);
    private final long graceMs;

    private final boolean show;
    private final PrintWriter err;
    private final long start = System.nanoTime();
    private final Thread hook;
    private volatile boolean cancelled;
    private boolean printed;
    private int width;

    /**
     * @param show     whether to print progress lines
     * @param hook     whether Ctrl-C (JVM shutdown) cancels the solve
     * @param graceMs  how long an interrupt waits for the command's own line
     */
    SolveProgress(boolean show, PrintWriter err, boolean hook, long graceMs) {
        this.show = show;
        this.graceMs = graceMs;
        this.err = err;
        this.hook = hook ? new Thread(this::interrupted, "exitance-solve-cancel") : null;
        if (this.hook != null) {
            Runtime.getRuntime().addShutdownHook(this.hook);
        }
        SolveMonitor.install(this);
        latest = this;
    }

    /** @param wanted  false with --quiet */
    static SolveProgress onStderr(boolean wanted, PrintWriter err) {
        return new SolveProgress(wanted && System.console() != null, err, true, GRACE_MS);
    }

    /** The command has printed what it had to say: an interrupt need not print for it. */
    static void reported() {
        SolveProgress p = latest;
        if (p != null) {
            p.reported.countDown();
        }
    }

    @Override
    public synchronized void newtonStep(int bands, int step, double largestResidualW) {
        if (!show || (System.nanoTime() - start) * 1e-9 < QUIET_SECONDS) {
            return;
        }
        String line = line(bands, step, largestResidualW);
        err.print("\r" + line + " ".repeat(Math.max(0, width - line.length())));
        err.flush();
        width = line.length();
        printed = true;
    }

    /** The progress line, e.g. "solve: 8 bands, Newton step 5, largest heat residual 3.2e-04 W". */
    static String line(int bands, int step, double largestResidualW) {
        return String.format(Locale.ROOT, "solve: %d band%s, Newton step %d, largest heat residual %.2e W", bands,
                bands == 1 ? "" : "s", step, largestResidualW);
    }

    @Override
    public boolean cancelled() {
        return cancelled;
    }

    /** Ctrl-C: ask the solve to stop, and give the command time to say so in one line. */
    void interrupted() {
        cancelled = true;
        boolean said;
        try {
            said = reported.await(graceMs, TimeUnit.MILLISECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            said = false;
        }
        if (!said) {
            synchronized (this) {
                err.println((printed ? "\n" : "") + "exitance: interrupted (Ctrl-C); no result written");
                err.flush();
            }
        }
    }

    /** Ends the progress line, uninstalls this monitor and removes the Ctrl-C hook. */
    @Override
    public synchronized void close() {
        if (printed) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
        }
        SolveMonitor.remove(this);
        if (hook != null) {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException e) {
                // the JVM is already shutting down (Ctrl-C): the hook runs
            }
        }
    }
}
