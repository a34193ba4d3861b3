package org.exitance.geometry;

import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;

/** Waiting for a pool's tasks, shared by the parallel computations of this module. */
public final class Workers {
    private Workers() {
    }

    /**
     * Waits for every task, rethrows a task's unchecked exception or error as it was thrown,
     * turns an interruption into a {@link CancellationException}, and always shuts the pool down.
     */
    public static void awaitAll(ExecutorService pool, List<? extends Future<?>> futures) {
        try {
            for (Future<?> fu : futures) {
                fu.get();
            }
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException re) {
                throw re;
            }
            if (cause instanceof Error er) {
                throw er;
            }
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        } finally {
            pool.shutdownNow();
        }
    }
}
