package org.exitance.bench;

import java.util.Arrays;
import java.util.List;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SolverReport;
import org.exitance.thermal.MemoryEstimate;
import org.exitance.thermal.SolverChoice;
import org.exitance.thermal.TemperatureSolver;

/**
 * Times the temperature solve of the closed-box models ({@link BoxModels}, invented data) at one
 * size and band count: the median wall time of several runs, the process CPU time per run, the
 * JVM's peak heap against the memory estimate, Newton steps, Jacobian–vector products and passes
 * over F; and the growth exponent fitted over several sizes.
 */
public final class BenchRun {
    private BenchRun() {
    }

    /**
     * One measured (or skipped) size.
     *
     * @param facets          N = 6c²
     * @param unknown         unknown-temperature facets (every third)
     * @param bands           bands
     * @param strategy        the linear algebra used ("direct", "newton-krylov", "iterative")
     * @param medianSeconds   median wall time of the runs (s); NaN when skipped
     * @param minSeconds      shortest run (s); NaN when skipped
     * @param cpuSeconds      process CPU time per run (s): the work, also on a shared machine
     * @param peakHeapBytes   the JVM's peak heap during the last run (bytes)
     * @param estimateBytes   {@link MemoryEstimate} of the solve (bytes)
     * @param newtonSteps     Newton steps of the last run, every band set counted
     * @param products        Jacobian–vector products of the last run
     * @param passes          passes over F of the last run (RadiationOperator#passes)
     * @param balanceW        energy balance of the last run (W)
     * @param skipped         whether the size was skipped because its estimate exceeds the heap
     */
    public record Point(int facets, int unknown, int bands, String strategy, double medianSeconds, double minSeconds,
                        double cpuSeconds, long peakHeapBytes, long estimateBytes, int newtonSteps, int products,
                        double passes, double balanceW, boolean skipped) {
    }

    /** The facets of the box nearest to {@code size} (6c²). */
    public static int facets(int size) {
        int c = BoxModels.cellsFor(size);
        return 6 * c * c;
    }

    /**
     * Runs one size.
     *
     * @param size       about this many facets
     * @param bands      bands (1: gray)
     * @param choice     the linear algebra, or null for the default rule
     * @param runs       runs, at least 1 (the median is reported)
     * @param heapBytes  the heap the solve may use: a size whose estimate exceeds it is skipped
     *                   without building its model
     */
    public static Point run(int size, int bands, SolverChoice choice, int runs, long heapBytes) {
        int n = facets(size);
        int m = (n + 2) / 3;
        SolverChoice how = choice != null ? choice : SolverChoice.forCase(n, m, bands, false, heapBytes);
        long estimate = MemoryEstimate.bytes(n, m, bands, how);
        if (estimate > heapBytes) {
            return new Point(n, m, bands, how.label(), Double.NaN, Double.NaN, Double.NaN, 0, estimate, 0, 0, 0, 0,
                    true);
        }
        RadiationCase rc = BoxModels.box(size, bands);
        double[] times = new double[runs];
        SolveResult last = null;
        long cpu0 = cpuNanos();
        for (int r = 0; r < runs; r++) {
            System.gc();
            long t0 = System.nanoTime();
            last = new TemperatureSolver(rc, how, ExternalAbsorption.SOURCE_SPECTRUM).solve(rc.bands());
            times[r] = (System.nanoTime() - t0) * 1e-9;
        }
        double cpu = (cpuNanos() - cpu0) * 1e-9 / runs;
        double[] sorted = times.clone();
        Arrays.sort(sorted);
        SolverReport s = last.solver();
        return new Point(n, m, bands, s.strategy(), sorted[runs / 2], sorted[0], cpu, s.peakHeapBytes(),
                s.estimatedBytes(), s.newtonIterations(), s.krylovProducts(), s.operatorPasses(),
                last.energyBalanceW(), false);
    }

    /**
     * The least-squares slope p of log(median time) against log N over the measured points
     * (time ~ N^p), or NaN with fewer than two measured sizes.
     *
     * @param points  not modified; skipped points are left out
     */
    public static double exponent(List<Point> points) {
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        int k = 0;
        for (Point p : points) {
            if (p.skipped() || !(p.medianSeconds() > 0)) {
                continue;
            }
            double x = Math.log(p.facets());
            double y = Math.log(p.medianSeconds());
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
            k++;
        }
        double den = k * sxx - sx * sx;
        return k >= 2 && den > 0 ? (k * sxy - sx * sy) / den : Double.NaN;
    }

    /** CPU time of the whole process so far (ns). */
    static long cpuNanos() {
        java.lang.management.OperatingSystemMXBean os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        return os instanceof com.sun.management.OperatingSystemMXBean sun ? sun.getProcessCpuTime() : 0L;
    }
}
