package org.exitance.geometry.viewfactor;

import java.util.BitSet;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.ConjugateGradient;
import org.apache.commons.math3.linear.RealLinearOperator;
import org.apache.commons.math3.linear.RealVector;

/**
 * Least-squares smoothing of approximate direct exchange areas s_ij = A_i F_ij (m²), after
 * Larsen &amp; Howell, "Least-squares smoothing of direct-exchange areas in zonal analysis",
 * J. Heat Transfer 108 (1986) 239–242, with the relative weights proposed by Lawson, "An improved
 * method for smoothing approximate exchange areas", Int. J. Heat Mass Transfer 38 (1995)
 * 3109–3110 (both cited from memory; this is what is implemented):
 *
 * <pre>
 *   minimise   Σ_{i≤j} (s_ij − s̃_ij)² / w_ij ,   w_ij = s̃_ij²
 *   subject to s_ij = s_ji                     (reciprocity)
 *              Σ_j s_ij = A_i  for i ∈ C        (summation)
 * </pre>
 *
 * where s̃_ij = (A_i F_ij + A_j F_ji)/2 is the symmetrised input. Lagrange multipliers give
 * s_ij = s̃_ij + w_ij (λ_i + λ_j) with (D + W_CC) λ = r on C, D_k = Σ_j w_kj, r_k = A_k − Σ_j s̃_kj,
 * solved by conjugate gradients (Apache Commons Math). Since w_ij = s̃_ij², zero entries stay
 * zero and relative changes are balanced. Entries that come out negative are fixed at zero
 * (weight 0) and the system solved again (active set, at most 30 rounds), which keeps every entry
 * non-negative.
 *
 * <p>C is every row with a non-zero weight for {@link Smoothing#CLOSED}. For
 * {@link Smoothing#OPEN} the remainder A_i − Σ_j s_ij goes to the environment (an extra black
 * surface) and is free, so C holds only rows whose remainder would be negative; rows join C until
 * no remainder is negative.
 */
public final class ExchangeAreaSmoother {

    private ExchangeAreaSmoother() {
    }

    /**
     * Smooths a facet (or surface) matrix in place; also used for a view-factor matrix a case gives.
     *
     * @param f row-major n × n view factors; modified (replaced by the smoothed factors)
     * @param n number of facets
     * @param area facet areas (m²); not modified
     * @param mode CLOSED or OPEN
     * @return what changed
     */
    public static SmoothingReport smooth(double[] f, int n, double[] area, Smoothing mode) {
        if (mode == Smoothing.NONE) {
            return SmoothingReport.none();
        }
        BitSet zero = new BitSet();
        boolean[] inC = new boolean[n];
        double[] lambda = new double[n];
        int iterations = 0;
        for (int round = 0; round < 30; round++) {
            double[] d = new double[n];
            double[] rowSum = new double[n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double s = target(f, n, area, zero, i, j);
                    rowSum[i] += s;
                    d[i] += s * s;
                }
            }
            if (mode == Smoothing.CLOSED) {
                for (int i = 0; i < n; i++) {
                    inC[i] = d[i] > 0;
                }
            } else {
                // rows whose remainder after the current correction is negative join C
                for (int i = 0; i < n; i++) {
                    if (!inC[i] && d[i] > 0 && area[i] - corrected(f, n, area, zero, lambda, i) < 0) {
                        inC[i] = true;
                    }
                }
            }
            int[] idx = indexOf(inC);
            double[] r = new double[idx.length];
            for (int k = 0; k < idx.length; k++) {
                r[k] = area[idx[k]] - rowSum[idx[k]];
            }
            java.util.Arrays.fill(lambda, 0);
            if (idx.length > 0) {
                Operator op = new Operator(f, n, area, zero, idx, d);
                ConjugateGradient cg = new ConjugateGradient(10 * idx.length + 100, 1e-14, false);
                RealVector x = cg.solve(op, new ArrayRealVector(r, false));
                iterations += cg.getIterationManager().getIterations();
                for (int k = 0; k < idx.length; k++) {
                    lambda[idx[k]] = x.getEntry(k);
                }
            }
            boolean changed = false;
            for (int i = 0; i < n; i++) {
                for (int j = i; j < n; j++) {
                    double s = target(f, n, area, zero, i, j);
                    if (s != 0 && s + s * s * (lambda[i] + lambda[j]) < 0) {
                        zero.set(i * n + j);
                        changed = true;
                    }
                }
            }
            boolean openGrew = false;
            if (mode == Smoothing.OPEN) {
                for (int i = 0; i < n; i++) {
                    if (!inC[i] && area[i] - corrected(f, n, area, zero, lambda, i) < -1e-15 * area[i]) {
                        openGrew = true;
                    }
                }
            }
            if (!changed && !openGrew) {
                break;
            }
        }
        // write back
        double maxChange = 0, sumSq = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double s = target(f, n, area, zero, i, j);
                double v = Math.max(0, s + s * s * (lambda[i] + lambda[j]));
                double fij = v / area[i], fji = v / area[j];
                double c1 = fij - f[i * n + j], c2 = fji - f[j * n + i];
                maxChange = Math.max(maxChange, Math.max(Math.abs(c1), Math.abs(c2)));
                sumSq += c1 * c1 + (i == j ? 0 : c2 * c2);
                f[i * n + j] = fij;
                f[j * n + i] = fji;
            }
        }
        return new SmoothingReport(mode, maxChange, Math.sqrt(sumSq / ((double) n * n)), zero.cardinality(), iterations);
    }

    /** Symmetrised input s̃_ij (m²), or 0 when held at zero. f is not modified. */
    private static double target(double[] f, int n, double[] area, BitSet zero, int i, int j) {
        int a = Math.min(i, j), b = Math.max(i, j);
        if (zero.get(a * n + b)) {
            return 0;
        }
        return 0.5 * (area[i] * f[i * n + j] + area[j] * f[j * n + i]);
    }

    private static double corrected(double[] f, int n, double[] area, BitSet zero, double[] lambda, int i) {
        double s = 0;
        for (int j = 0; j < n; j++) {
            double t = target(f, n, area, zero, i, j);
            s += Math.max(0, t + t * t * (lambda[i] + lambda[j]));
        }
        return s;
    }

    private static int[] indexOf(boolean[] flags) {
        int c = 0;
        for (boolean b : flags) {
            c += b ? 1 : 0;
        }
        int[] idx = new int[c];
        c = 0;
        for (int i = 0; i < flags.length; i++) {
            if (flags[i]) {
                idx[c++] = i;
            }
        }
        return idx;
    }

    /** (D + W_CC) restricted to C, applied without storing W. */
    private static final class Operator extends RealLinearOperator {
        private final double[] f;
        private final int n;
        private final double[] area;
        private final BitSet zero;
        private final int[] idx;
        private final double[] d;

        Operator(double[] f, int n, double[] area, BitSet zero, int[] idx, double[] d) {
            this.f = f;
            this.n = n;
            this.area = area;
            this.zero = zero;
            this.idx = idx;
            this.d = d;
        }

        @Override
        public int getRowDimension() {
            return idx.length;
        }

        @Override
        public int getColumnDimension() {
            return idx.length;
        }

        @Override
        public RealVector operate(RealVector x) {
            double[] y = new double[idx.length];
            for (int k = 0; k < idx.length; k++) {
                int i = idx[k];
                double v = d[i] * x.getEntry(k);
                for (int l = 0; l < idx.length; l++) {
                    double s = target(f, n, area, zero, i, idx[l]);
                    v += s * s * x.getEntry(l);
                }
                y[k] = v;
            }
            return new ArrayRealVector(y, false);
        }
    }
}
