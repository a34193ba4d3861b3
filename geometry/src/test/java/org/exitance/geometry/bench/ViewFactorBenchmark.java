package org.exitance.geometry.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.bvh.TriangleBvh;
import org.exitance.geometry.bvh.WatertightRay;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.viewfactor.ProgressListener;
import org.exitance.geometry.viewfactor.ViewFactorCalculator;
import org.exitance.geometry.viewfactor.ViewFactorOptions;
import org.exitance.geometry.viewfactor.Smoothing;
import org.exitance.geometry.viewfactor.ViewFactorResult;

/**
 * View-factor benchmarks (invented demo geometry). Not a unit test: run by hand, results go to
 * docs/performance.md. Usage:
 *
 * <pre>
 *   mvn -B -q -pl geometry test-compile dependency:build-classpath -Dmdep.outputFile=/tmp/cp.txt
 *   java -Xmx2g -cp geometry/target/classes:geometry/target/test-classes:$(cat /tmp/cp.txt) \
 *        org.exitance.geometry.bench.ViewFactorBenchmark [closed2000|inner10000|scaling|rays] [runs] [threads]
 * </pre>
 */
public final class ViewFactorBenchmark {

    static double TOL = Double.parseDouble(System.getProperty("tol", "1e-7"));

    private ViewFactorBenchmark() {
    }

    /** Closed box 1 × 1 × 0.75 m, 20 × 20 × 15 cells: 2,000 square facets of 0.05 m. */
    static Scene closed2000() {
        return Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 0.75), 20, 20, 15));
    }

    /** Unit box, 40 cells a side (9,600 facets) with a 0.4 × 0.4 × 0.2 m block inside (400 facets). */
    static Scene inner10000() {
        List<Surface> s = new ArrayList<>(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), 40, 40, 40));
        s.addAll(Enclosures.box("block.", new Vec3(0.3, 0.3, 0.4), new Vec3(0.7, 0.7, 0.6), 10, 10, 5, Facing.OUTWARD));
        return Scene.of(s);
    }

    /** Smaller variant of {@link #inner10000} for studies: outer n cells a side, block 0.4 × 0.4 × 0.2 m. */
    static Scene innerSmall(int n, int b) {
        List<Surface> s = new ArrayList<>(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), n, n, n));
        s.addAll(Enclosures.box("block.", new Vec3(0.3, 0.3, 0.4), new Vec3(0.7, 0.7, 0.6), b, b, Math.max(1, b / 2),
                Facing.OUTWARD));
        return Scene.of(s);
    }

    static Scene cube(int n) {
        return Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), n, n, n));
    }

    static long peakHeapBytes() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum;
    }

    static void resetPeaks() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            p.resetPeakUsage();
        }
    }

    static double maxRowSumError(ViewFactorResult r) {
        return r.rawFacetClosure().maxRowSumError(); // as computed, before any smoothing
    }

    static double median(double[] v) {
        double[] c = v.clone();
        Arrays.sort(c);
        return c.length % 2 == 1 ? c[c.length / 2] : 0.5 * (c[c.length / 2 - 1] + c[c.length / 2]);
    }

    static void run(String name, Scene scene, int runs, int threads) {
        double[] times = new double[runs];
        ViewFactorResult r = null;
        for (int k = 0; k < runs; k++) {
            r = null;
            System.gc();
            resetPeaks();
            long t0 = System.nanoTime();
            r = ViewFactorCalculator.compute(scene, ViewFactorOptions.defaults().withThreads(threads).withPairTolerance(TOL)
                    .withVisibilityOrder(Integer.getInteger("vis", 3))
                    .withSmoothing(Smoothing.valueOf(System.getProperty("smooth", "AUTO"))), ProgressListener.NONE);
            times[k] = (System.nanoTime() - t0) * 1e-9;
            System.out.printf("%s run %d: %.2f s, peak heap %.0f MB%n", name, k + 1, times[k], peakHeapBytes() / 1e6);
        }
        long n = r.facetCount();
        double pairs = n * (n - 1) / 2.0;
        double med = median(times);
        System.out.printf("%s: facets %d, threads %d, median %.2f s (min %.2f, max %.2f), %.3g pairs/s/core, "
                + "raw max |1-rowsum| %.2e (%s), rms %.2e, surface %.2e, est %.2e, tolerance met %b, smoothing %s "
                + "(max change %.2e)%n  %s%n", name, n, r.threadsUsed(), med,
                Arrays.stream(times).min().getAsDouble(), Arrays.stream(times).max().getAsDouble(),
                pairs / med / r.threadsUsed(), maxRowSumError(r), r.rawFacetClosure().worstRow(),
                r.rawFacetClosure().rmsRowSumError(), r.rawSurfaceClosure().maxRowSumError(), r.maxRowErrorEstimate(),
                r.toleranceMet(), r.smoothing().mode(), r.smoothing().maxChange(), r.methodCounts());
    }

    static void rays(int runs) {
        Scene s = inner10000();
        List<Facet> facets = s.facets();
        int tris = 0;
        for (Facet f : facets) {
            tris += f.vertexCount() - 2;
        }
        double[] tri = new double[9 * tris];
        int[] owner = new int[tris];
        int k = 0;
        for (int fi = 0; fi < facets.size(); fi++) {
            Facet f = facets.get(fi);
            for (int a = 1; a + 1 < f.vertexCount(); a++) {
                Vec3[] v = {f.vertex(0), f.vertex(a), f.vertex(a + 1)};
                for (int c = 0; c < 3; c++) {
                    tri[9 * k + 3 * c] = v[c].x();
                    tri[9 * k + 3 * c + 1] = v[c].y();
                    tri[9 * k + 3 * c + 2] = v[c].z();
                }
                owner[k++] = fi;
            }
        }
        TriangleBvh bvh = new TriangleBvh(tri, owner);
        Random rnd = new Random(1);
        int m = 2_000_000;
        double[] o = new double[3 * m], d = new double[3 * m];
        for (int i = 0; i < 3 * m; i++) {
            o[i] = 0.05 + 0.9 * rnd.nextDouble();
            d[i] = rnd.nextGaussian();
        }
        WatertightRay ray = new WatertightRay();
        double[] hit = new double[3];
        double[] times = new double[runs];
        for (int r = 0; r < runs; r++) {
            long t0 = System.nanoTime();
            int hits = 0;
            for (int i = 0; i < m; i++) {
                ray.set(o[3 * i], o[3 * i + 1], o[3 * i + 2], d[3 * i], d[3 * i + 1], d[3 * i + 2]);
                if (bvh.closest(ray, 0, Double.MAX_VALUE, hit)) {
                    hits++;
                }
            }
            times[r] = (System.nanoTime() - t0) * 1e-9;
            System.out.printf("rays run %d: %.2f s, %d hits%n", r + 1, times[r], hits);
        }
        System.out.printf("rays: %d triangles, closest-hit %.3g rays/s on one core (median of %d)%n", tris,
                m / median(times), runs);
    }

    /** @param args scenario, runs, threads */
    public static void main(String[] args) {
        String what = args.length > 0 ? args[0] : "closed2000";
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
        int threads = args.length > 2 ? Integer.parseInt(args[2]) : 0;
        System.out.printf("java %s, %d processors, max heap %.0f MB%n", System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() / 1e6);
        switch (what) {
            case "closed2000" -> run("closed2000", closed2000(), runs, threads);
            case "inner10000" -> run("inner10000", inner10000(), runs, threads);
            case "scaling" -> {
                for (int n : new int[] {9, 13, 18, 26}) {
                    run("cube" + 6 * n * n, cube(n), runs, threads);
                }
            }
            case "rays" -> rays(runs);
            case "innerSmall" -> run("innerSmall", innerSmall(Integer.getInteger("n", 12), Integer.getInteger("b", 4)),
                    runs, threads);
            default -> throw new IllegalArgumentException("unknown scenario " + what);
        }
    }
}
