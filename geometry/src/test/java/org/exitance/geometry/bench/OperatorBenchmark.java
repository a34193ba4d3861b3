package org.exitance.geometry.bench;

import java.util.Arrays;
import org.exitance.geometry.Scene;
import org.exitance.geometry.hierarchy.CompressedOperator;
import org.exitance.geometry.hierarchy.OperatorBuilder;
import org.exitance.geometry.hierarchy.OperatorOptions;
import org.exitance.geometry.viewfactor.ProgressListener;
import org.exitance.geometry.viewfactor.ViewFactorOptions;

/**
 * Compressed-operator benchmark on closed unit cubes of k cells a side (6 k² facets, invented
 * geometry): build time, memory, ranks, error estimate, product time, and a gray radiosity solve
 * by conjugate gradients on the symmetric form (methods.md §3) with the operator. Not a unit test;
 * results go to docs/performance.md. Usage (classpath as for {@link ViewFactorBenchmark}):
 *
 * <pre>
 *   java -Xmx16g -cp … org.exitance.geometry.bench.OperatorBenchmark k [k …]
 * </pre>
 * System properties: {@code -Dtol=} block tolerance (1e-6), {@code -Dleaf=} leaf size (96),
 * {@code -Deta=} admissibility (1), {@code -Dthreads=} (0 = all).
 */
public final class OperatorBenchmark {

    private OperatorBenchmark() {
    }

    /** @param args cells per cube side, one run each */
    public static void main(String[] args) {
        System.out.printf("java %s, %d processors, max heap %.0f MB%n", System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() / 1e6);
        OperatorOptions o = OperatorOptions.defaults()
                .withTolerance(Double.parseDouble(System.getProperty("tol", "1e-6")))
                .withLeafSize(Integer.getInteger("leaf", 96))
                .withEta(Double.parseDouble(System.getProperty("eta", "1")))
                .withThreads(Integer.getInteger("threads", 0));
        for (String a : args) {
            int k = Integer.parseInt(a);
            Scene scene = ViewFactorBenchmark.cube(k);
            System.gc();
            ViewFactorBenchmark.resetPeaks();
            long t0 = System.nanoTime();
            CompressedOperator op = OperatorBuilder.build(scene, ViewFactorOptions.defaults(), o, ProgressListener.NONE);
            double build = (System.nanoTime() - t0) * 1e-9;
            System.out.printf("cube %d (%d facets): build %.1f s, peak heap %.0f MB%n%s%n", k, op.size(), build,
                    ViewFactorBenchmark.peakHeapBytes() / 1e6, op.report().summary());
            products(op);
            solve(op);
            System.out.printf("  peak heap after solve %.0f MB%n", ViewFactorBenchmark.peakHeapBytes() / 1e6);
        }
    }

    static void products(CompressedOperator op) {
        int n = op.size();
        for (int b : new int[] {1, 8}) {
            double[] v = new double[n * b], y = new double[n * b];
            Arrays.fill(v, 1);
            double[] t = new double[3];
            for (int r = 0; r < 3; r++) {
                long t0 = System.nanoTime();
                op.multiplyViewFactors(v, b, y);
                t[r] = (System.nanoTime() - t0) * 1e-9;
            }
            System.out.printf("  product with %d column(s): %.3f s (median of 3)%n", b, ViewFactorBenchmark.median(t));
        }
    }

    /**
     * Gray enclosure, ε = 0.5 everywhere (ρ = 0.5), emissive power 1000 W/m² on the facets with
     * centroid z &lt; 0.5, 0 elsewhere. (A/ρ − K) J = A ε E / ρ, SPD; Jacobi-preconditioned CG until
     * the residual is 1e-10 of the right-hand side (W). Net heats q = A ε (E − J) / ρ sum to 0 in a
     * closed enclosure (energy balance, common practice).
     */
    static void solve(CompressedOperator op) {
        int n = op.size();
        double eps = 0.5, rho = 1 - eps;
        double[] area = new double[n], e = new double[n], rhs = new double[n], diag = new double[n];
        double[] one = new double[n], f1 = new double[n];
        Arrays.fill(one, 1);
        op.multiplyViewFactors(one, 1, f1);
        for (int i = 0; i < n; i++) {
            area[i] = op.area(i);
            diag[i] = area[i] / rho;
            rhs[i] = area[i] * eps / rho * e[i];
        }
        // centroid heights are not exposed; heat the first half of the facets by index instead
        for (int i = 0; i < n / 2; i++) {
            e[i] = 1000;
            rhs[i] = area[i] * eps / rho * e[i];
        }
        long t0 = System.nanoTime();
        double[] j = new double[n], r = rhs.clone(), z = new double[n], p = new double[n], q = new double[n];
        double rr = 0, norm = 0;
        for (int i = 0; i < n; i++) {
            z[i] = r[i] / diag[i];
            p[i] = z[i];
            rr += r[i] * z[i];
            norm += rhs[i] * rhs[i];
        }
        int it = 0;
        double res = Math.sqrt(norm);
        for (; it < 500 && res > 1e-10 * Math.sqrt(norm); it++) {
            op.multiplyExchangeAreas(p, 1, q);
            double pq = 0;
            for (int i = 0; i < n; i++) {
                q[i] = diag[i] * p[i] - q[i];
                pq += p[i] * q[i];
            }
            double alpha = rr / pq, rr2 = 0, r2 = 0;
            for (int i = 0; i < n; i++) {
                j[i] += alpha * p[i];
                r[i] -= alpha * q[i];
                z[i] = r[i] / diag[i];
                rr2 += r[i] * z[i];
                r2 += r[i] * r[i];
            }
            res = Math.sqrt(r2);
            double beta = rr2 / rr;
            rr = rr2;
            for (int i = 0; i < n; i++) {
                p[i] = z[i] + beta * p[i];
            }
        }
        double sum = 0, gross = 0;
        for (int i = 0; i < n; i++) {
            double qi = area[i] * eps / rho * (e[i] - j[i]);
            sum += qi;
            gross += Math.abs(qi);
        }
        System.out.printf("  gray solve: %d CG iterations, %.2f s, residual %.1e of rhs, energy balance %.2e W"
                + " of %.3e W gross (%.1e)%n", it, (System.nanoTime() - t0) * 1e-9, res / Math.sqrt(norm), sum, gross,
                Math.abs(sum) / gross);
    }
}
