package org.exitance.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ForkJoinPool;
import org.exitance.network.DenseTiming;
import org.exitance.thermal.SolverChoice;

/**
 * Benchmark of the temperature solve on closed-box models ({@link BoxModels}, invented data), run
 * by hand as docs/performance.md shows; not a unit test, and its timings live only in that file.
 *
 * <pre>
 *   scaling CHOICE BANDS SIZES [runs] [threads]   time, peak heap and growth exponent of a solve
 *   dense N FILE [threads]                        export one band system (A, b) and time the dense path on it
 * </pre>
 * CHOICE: direct, newton-krylov, iterative or auto (the default rule). The scaling scenario is
 * {@code exitance bench} ({@link BenchRun}) with a thread count and without the warm-up. SIZES: comma-separated
 * facet counts (each rounded to 6c²). A size whose memory estimate exceeds the heap is skipped
 * with the estimate printed.
 */
public final class SolverBenchmark {
    private SolverBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length < 1) {
            System.err.println("usage: scaling CHOICE BANDS SIZES [runs] [threads] | dense N FILE [threads]");
            System.exit(2);
        }
        switch (args[0]) {
            case "scaling" -> scaling(args);
            case "dense" -> dense(args);
            default -> {
                System.err.println("unknown scenario " + args[0]);
                System.exit(2);
            }
        }
    }

    private static void scaling(String[] args) throws Exception {
        SolverChoice choice = args[1].equals("auto") ? null : SolverChoice.of(args[1]);
        int bands = Integer.parseInt(args[2]);
        int[] sizes = Arrays.stream(args[3].split(",")).mapToInt(Integer::parseInt).toArray();
        int runs = args.length > 4 ? Integer.parseInt(args[4]) : 3;
        int threads = args.length > 5 ? Integer.parseInt(args[5]) : Runtime.getRuntime().availableProcessors();
        ForkJoinPool pool = new ForkJoinPool(threads);
        List<BenchRun.Point> points = new ArrayList<>();
        System.out.printf(Locale.ROOT, "%-8s %-6s %-5s %-14s %-9s %-9s %-9s %-7s %-7s %-8s %-8s%n", "facets", "unknown",
                "bands", "solver", "median_s", "min_s", "peak_MB", "est_MB", "newton", "products", "passes");
        long heap = Runtime.getRuntime().maxMemory();
        for (int size : sizes) {
            BenchRun.Point p = pool.submit(() -> BenchRun.run(size, bands, choice, runs, heap)).get();
            points.add(p);
            if (p.skipped()) {
                System.out.printf(Locale.ROOT, "%-8d %-6d %-5d %-14s skipped: estimate %d MB > heap %d MB%n", p.facets(),
                        p.unknown(), bands, p.strategy(), p.estimateBytes() >> 20, heap >> 20);
                continue;
            }
            System.out.printf(Locale.ROOT, "%-8d %-6d %-5d %-14s %-9.3f %-9.3f %-9d %-7d %-7d %-8d %-8.1f  (cpu %.1f s/run;"
                    + " balance %.3g W)%n", p.facets(), p.unknown(), bands, p.strategy(), p.medianSeconds(),
                    p.minSeconds(), p.peakHeapBytes() >> 20, p.estimateBytes() >> 20, p.newtonSteps(), p.products(),
                    p.passes(), p.cpuSeconds(), p.balanceW());
        }
        double e = BenchRun.exponent(points);
        if (!Double.isNaN(e)) {
            System.out.printf(Locale.ROOT, "fitted growth exponent (time ~ N^p, least squares over the sizes above): p = %.2f%n",
                    e);
        }
        pool.shutdown();
    }

    /**
     * Writes one band system of the box, {@code A = I − diag(ρ)F} and b (little-endian doubles: N as
     * a double, then A row-major, then b) and times the tool's dense path on it: the factorization
     * and one solve, three times, in the given number of threads.
     */
    private static void dense(String[] args) throws Exception {
        int size = Integer.parseInt(args[1]);
        Path file = Path.of(args[2]);
        int threads = args.length > 3 ? Integer.parseInt(args[3]) : 1;
        int c = BoxModels.cellsFor(size);
        int n = 6 * c * c;
        double[] area = new double[n];
        double[] f = BoxModels.viewFactors(c, area);
        double[] rho = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            rho[i] = i % 2 == 0 ? 0.7 : 0.15; // invented
            b[i] = (1 - rho[i]) * 5.67e-8 * Math.pow(400 + 800.0 * (i % 97) / 96, 4);
        }
        double[] a = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i * n + j] = (i == j ? 1.0 : 0.0) - rho[i] * f[i * n + j];
            }
        }
        write(file, n, a, b);
        ForkJoinPool pool = new ForkJoinPool(threads);
        double[] times = new double[3];
        double residual = 0;
        for (int r = 0; r < times.length; r++) {
            double[] copy = a.clone();
            long t0 = System.nanoTime();
            residual = pool.submit(() -> DenseTiming.factorAndSolve(copy, n, b, a)).get();
            times[r] = (System.nanoTime() - t0) * 1e-9;
        }
        pool.shutdown();
        double[] sorted = times.clone();
        Arrays.sort(sorted);
        System.out.printf(Locale.ROOT, "java dense N=%d threads=%d median_s=%.4f min_s=%.4f runs=%s residual=%.2e%n", n,
                threads, sorted[1], sorted[0], fmt(times), residual);
    }

    private static void write(Path file, int n, double[] a, double[] b) throws IOException {
        java.nio.ByteBuffer buf = java.nio.ByteBuffer.allocate(8 * (1 + a.length + b.length))
                .order(java.nio.ByteOrder.LITTLE_ENDIAN);
        buf.putDouble(n);
        for (double v : a) {
            buf.putDouble(v);
        }
        for (double v : b) {
            buf.putDouble(v);
        }
        Files.write(file, buf.array());
    }

    private static String fmt(double[] t) {
        StringBuilder sb = new StringBuilder();
        for (double v : t) {
            sb.append(sb.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.3f", v));
        }
        return sb.toString();
    }
}
