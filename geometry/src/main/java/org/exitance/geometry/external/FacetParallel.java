package org.exitance.geometry.external;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;

/**
 * Runs a per-facet computation on fixed chunks of contiguous facets. Each facet's result is
 * written once by a computation that depends only on that facet, so results are identical bit for
 * bit for any thread count; per-chunk counters are reduced in chunk order.
 */
final class FacetParallel {

    /** Fixed number of chunks (independent of the thread count). */
    static final int CHUNKS = 64;

    /** Work on one facet by one worker (a worker is used by one thread only). */
    interface Worker {
        /**
         * @param facet global facet index
         * @return number of rays cast for it
         */
        long run(int facet);
    }

    private FacetParallel() {
    }

    /**
     * @param count number of facets
     * @param threads worker threads (0 = all processors)
     * @param workers makes one worker per thread
     * @return total rays reported by the workers
     */
    static long forEach(int count, int threads, Supplier<Worker> workers) {
        if (threads < 0) {
            throw new IllegalArgumentException("threads must be ≥ 0, got " + threads);
        }
        int chunks = Math.max(1, Math.min(CHUNKS, count));
        int nt = threads == 0 ? Runtime.getRuntime().availableProcessors() : threads;
        nt = Math.max(1, Math.min(nt, chunks));
        long[] rays = new long[chunks];
        AtomicInteger next = new AtomicInteger();
        Runnable body = () -> {
            Worker w = workers.get();
            for (int c = next.getAndIncrement(); c < chunks; c = next.getAndIncrement()) {
                long r = 0;
                for (int f = (int) ((long) c * count / chunks), end = (int) ((long) (c + 1) * count / chunks); f < end; f++) {
                    r += w.run(f);
                }
                rays[c] = r;
            }
        };
        if (nt == 1) {
            body.run();
        } else {
            ExecutorService pool = Executors.newFixedThreadPool(nt, r -> {
                Thread th = new Thread(r, "external-incidence");
                th.setDaemon(true);
                return th;
            });
            List<Future<?>> futures = new ArrayList<>();
            for (int k = 0; k < nt; k++) {
                futures.add(pool.submit(body));
            }
            org.exitance.geometry.Workers.awaitAll(pool, futures);
        }
        long total = 0;
        for (long r : rays) {
            total += r;
        }
        return total;
    }
}
