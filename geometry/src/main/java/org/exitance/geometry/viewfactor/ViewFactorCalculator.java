package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import org.exitance.geometry.Scene;

/**
 * Entry point: facet-to-facet and surface-to-surface view factors of a {@link Scene}.
 *
 * <p>Each unordered pair i &lt; j is evaluated once by {@link PairEvaluator} (method chosen per
 * pair, see there and docs/view-factors.md); reciprocity gives the other entry,
 * F_ij = s_ij / A_i and F_ji = s_ij / A_j.
 *
 * <p>Parallelism and determinism: rows are split into {@value #CHUNKS} fixed chunks (row i in
 * chunk i mod {@value #CHUNKS}); worker threads take whole chunks. Every matrix entry is written
 * once by a computation that depends only on its pair; per-row error sums are accumulated per
 * chunk and reduced in chunk order. The result is therefore identical bit for bit for any thread
 * count. Cancellation is checked before each row; progress is reported after each row.
 */
public final class ViewFactorCalculator {

    /** Fixed number of work chunks (independent of the thread count). */
    static final int CHUNKS = 64;

    private ViewFactorCalculator() {
    }

    /**
     * @param scene geometry
     * @param options settings
     * @param progress progress listener (may be {@link ProgressListener#NONE})
     * @return the result
     */
    public static ViewFactorResult compute(Scene scene, ViewFactorOptions options, ProgressListener progress) {
        return compute(scene, options, progress, () -> false);
    }

    /**
     * @param scene geometry
     * @param options settings
     * @param progress progress listener
     * @param cancelRequested polled before each row; when it returns true the computation stops
     * @return the result
     * @throws CancellationException if cancelled
     */
    public static ViewFactorResult compute(Scene scene, ViewFactorOptions options, ProgressListener progress,
            BooleanSupplier cancelRequested) {
        long start = System.nanoTime();
        PairSource source = new PairSource(scene, options);
        FacetTable t = source.table;
        int n = t.count;
        double[] f = new double[Math.multiplyExact(n, n)];
        int chunks = Math.min(CHUNKS, n);
        double[][] chunkError = new double[chunks][n];
        long[][] chunkCounts = new long[chunks][PairEvaluator.COUNTERS];
        int threads = options.threads() == 0 ? Runtime.getRuntime().availableProcessors() : options.threads();
        threads = Math.max(1, Math.min(threads, chunks));
        AtomicInteger nextChunk = new AtomicInteger();
        AtomicLong pairsDone = new AtomicLong();
        double totalPairs = Math.max(1, (double) n * (n - 1) / 2);
        Object lock = new Object();
        double[] reported = {0};
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread th = new Thread(r, "view-factors");
            th.setDaemon(true);
            return th;
        });
        List<Future<?>> futures = new ArrayList<>();
        for (int w = 0; w < threads; w++) {
            futures.add(pool.submit(() -> {
                PairEvaluator ev = source.newPairs().ev;
                for (int c = nextChunk.getAndIncrement(); c < chunks; c = nextChunk.getAndIncrement()) {
                    java.util.Arrays.fill(ev.counters, 0);
                    double[] err = chunkError[c];
                    for (int i = c; i < n; i += chunks) {
                        if (cancelRequested.getAsBoolean()) {
                            throw new CancellationException("view-factor computation cancelled");
                        }
                        if (t.patch[i] != null && t.patch[i].concave()) {
                            // a concave patch sees itself
                            f[i * n + i] = ev.selfExchangeArea(i) / t.exactArea[i];
                            err[i] += ev.lastError;
                        }
                        for (int j = i + 1; j < n; j++) {
                            double s = ev.exchangeArea(i, j);
                            if (!Double.isFinite(s) || !Double.isFinite(ev.lastError)) {
                                // never let NaN or infinity out: an internal error, not a result
                                throw new ArithmeticException("non-finite exchange area between facets " + i
                                        + " and " + j + " (internal error)");
                            }
                            f[i * n + j] = s / t.exactArea[i];
                            f[j * n + i] = s / t.exactArea[j];
                            err[i] += ev.lastError;
                            err[j] += ev.lastError;
                        }
                        long done = pairsDone.addAndGet(n - 1 - i);
                        synchronized (lock) {
                            double frac = done / totalPairs;
                            if (frac > reported[0]) {
                                reported[0] = frac;
                                progress.progress(Math.min(1, frac));
                            }
                        }
                    }
                    System.arraycopy(ev.counters, 0, chunkCounts[c], 0, PairEvaluator.COUNTERS);
                }
                return null;
            }));
        }
        org.exitance.geometry.Workers.awaitAll(pool, futures);
        long[] counts = new long[PairEvaluator.COUNTERS];
        double[] rowError = new double[n];
        for (int c = 0; c < chunks; c++) {
            for (int k = 0; k < counts.length; k++) {
                counts[k] += chunkCounts[c][k];
            }
            for (int i = 0; i < n; i++) {
                rowError[i] += chunkError[c][i];
            }
        }
        double maxRowError = 0;
        for (int i = 0; i < n; i++) {
            maxRowError = Math.max(maxRowError, rowError[i] / t.exactArea[i]);
        }
        SmoothingReport smoothing = ExchangeAreaSmoother.smooth(f, n, t.exactArea, options.smoothing());
        return assemble(scene, options, t, f, counts, maxRowError, smoothing, threads, start);
    }

    private static ViewFactorResult assemble(Scene scene, ViewFactorOptions options, FacetTable t, double[] f,
            long[] counts, double maxRowError, SmoothingReport smoothing, int threads, long start) {
        int n = t.count, m = scene.surfaceCount();
        double[] sArea = new double[m];
        for (int i = 0; i < n; i++) {
            sArea[t.surfaceOf[i]] += t.exactArea[i];
        }
        double[][] sf = new double[m][m];
        for (int i = 0; i < n; i++) {
            double[] row = sf[t.surfaceOf[i]];
            for (int j = 0; j < n; j++) {
                row[t.surfaceOf[j]] += t.exactArea[i] * f[i * n + j];
            }
        }
        double[] env = new double[m];
        double[] flat = new double[m * m];
        for (int a = 0; a < m; a++) {
            double sum = 0;
            for (int b = 0; b < m; b++) {
                sf[a][b] /= sArea[a];
                sum += sf[a][b];
                flat[a * m + b] = sf[a][b];
            }
            env[a] = 1 - sum;
        }
        List<String> names = new ArrayList<>();
        scene.surfaces().forEach(s -> names.add(s.name()));
        int[] firstOfSurface = new int[m];
        for (int i = n - 1; i >= 0; i--) {
            firstOfSurface[t.surfaceOf[i]] = i;
        }
        ClosureDiagnostics surfaceClosure = ClosureDiagnostics.of(flat, m, sArea, names::get);
        ClosureDiagnostics facetClosure = ClosureDiagnostics.of(f, n, t.exactArea,
                i -> names.get(t.surfaceOf[i]) + "#" + (i - firstOfSurface[t.surfaceOf[i]]));
        MethodCounts mc = new MethodCounts(counts[PairEvaluator.ZERO], counts[PairEvaluator.CLIPPED],
                counts[PairEvaluator.CONTOUR], counts[PairEvaluator.QUADRATURE], counts[PairEvaluator.PARTIAL],
                counts[PairEvaluator.HIDDEN], counts[PairEvaluator.RAYS], counts[PairEvaluator.CURVED_ON_POLYGONS],
                counts[PairEvaluator.CURVED_EXACT]);
        return new ViewFactorResult(names, sArea, sf, env, n, t.exactArea.clone(), t.surfaceOf.clone(), f, surfaceClosure,
                facetClosure, mc, maxRowError, smoothing, GeometryHash.of(scene, options), options, threads,
                (System.nanoTime() - start) * 1e-9);
    }
}
