package org.exitance.thermal;

/**
 * What a running temperature solve reports and asks: its progress after every Newton step, and
 * whether the user has asked it to stop (polled between Newton steps and Jacobian–vector
 * products). One monitor serves the process ({@link #install}); the default does nothing and
 * never cancels. Implementations must be thread-safe.
 */
public interface SolveMonitor {

    /** The monitor that reports nothing and never cancels. */
    SolveMonitor NONE = new SolveMonitor() {
        @Override
        public void newtonStep(int bands, int step, double largestResidualW) {
        }

        @Override
        public boolean cancelled() {
            return false;
        }
    };

    /**
     * After a Newton step.
     *
     * @param bands             bands of the band set being solved (1 for the gray start)
     * @param step              Newton steps of the solve so far, every band set counted
     * @param largestResidualW  the largest heat residual of an unknown-temperature node (W)
     */
    void newtonStep(int bands, int step, double largestResidualW);

    /** Whether the solve should stop ({@link SolveCancelledException}). */
    boolean cancelled();

    /**
     * Makes {@code m} the process's monitor (null: {@link #NONE}).
     *
     * @return the monitor it replaces
     */
    static SolveMonitor install(SolveMonitor m) {
        synchronized (Holder.class) {
            SolveMonitor old = Holder.current;
            Holder.current = m == null ? NONE : m;
            return old;
        }
    }

    /** Puts back {@link #NONE} if {@code m} is still the process's monitor (else leaves the other one). */
    static void remove(SolveMonitor m) {
        synchronized (Holder.class) {
            if (Holder.current == m) {
                Holder.current = NONE;
            }
        }
    }

    /** The process's monitor. */
    static SolveMonitor current() {
        return Holder.current;
    }

    /** Throws {@link SolveCancelledException} when the process's monitor says so. */
    static void checkCancelled() {
        if (Holder.current.cancelled()) {
            throw new SolveCancelledException();
        }
    }

    /** The installed monitor. */
    final class Holder {
        private static volatile SolveMonitor current = NONE;

        private Holder() {
        }
    }
}
