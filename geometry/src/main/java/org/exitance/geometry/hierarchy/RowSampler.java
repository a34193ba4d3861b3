package org.exitance.geometry.hierarchy;

import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.exitance.geometry.viewfactor.PairSource;

/**
 * A-posteriori error estimate: whole rows of the finished operator F' (closure included)
 * compared with exact rows from the pair evaluator, O(N) time and memory per row. One row is
 * taken from each leaf cluster (all rows of a leaf share the same blocks), or from leaves spread
 * evenly over the tree when there are more leaves than rows wanted; within a leaf the row is
 * fixed by the leaf's number. The choice depends only on the geometry. Error of row i: Σ_j |F'_ij − F_ij|, which
 * bounds |(F' v)_i − (F v)_i| for every vector with |v_j| ≤ 1.
 *
 * <p>The stated estimate ({@link #estimate}) is 2 × the largest sampled row error (a safety
 * factor for the rows not sampled: on the test boxes the worst row of all was 1.6–4.6 × the
 * worst sampled one before the closure term) plus 2δ + δ², δ = max |d_i − 1| of the closure
 * scaling, which bounds that scaling's own change of a row (its entries sum to about 1).
 */
final class RowSampler {

    final int rows;
    double maxError, rmsError;
    /** Largest sampled Σ_j of the pair evaluator's own error estimates of a row (dimensionless). */
    double maxPairError;
    long evaluations;

    RowSampler(PairSource src, CompressedOperator op, int wanted, int threads) {
        int n = op.size();
        int leaves = op.tree.leaves.length;
        rows = Math.min(wanted, leaves);
        double[] err = new double[rows];
        double[] pairErr = new double[rows];
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, threads));
        try {
            pool.submit(() -> IntStream.range(0, rows).parallel().forEach(k -> {
                int leaf = (int) ((long) k * leaves / rows);
                int node = op.tree.leaves[leaf];
                int p = op.tree.start[node] + (int) ((leaf * 7919L + op.tree.size(node) / 2) % op.tree.size(node));
                double[] e = rowError(src.newPairs(), op, p);
                err[k] = e[0];
                pairErr[k] = e[1];
            })).join();
        } finally {
            pool.shutdown();
        }
        double s = 0;
        for (int k = 0; k < rows; k++) {
            maxError = Math.max(maxError, err[k]);
            maxPairError = Math.max(maxPairError, pairErr[k]);
            s += err[k] * err[k];
        }
        rmsError = rows == 0 ? 0 : Math.sqrt(s / rows);
        evaluations = (long) rows * n;
    }

    /** @return the stated estimate of max_i Σ_j |F'_ij − F_ij| (see the class doc) */
    double estimate(double maxScaleDeviation) {
        return 2 * maxError + 2 * maxScaleDeviation + maxScaleDeviation * maxScaleDeviation;
    }

    /**
     * @return {Σ_j |F'_pj − F_pj|, Σ_j of the evaluator's error estimates of F_pj} for the row at
     *         tree position p (a new array)
     */
    static double[] rowError(PairSource.Pairs pairs, CompressedOperator op, int p) {
        int n = op.size();
        double[] row = new double[n];
        op.addRow(p, row);
        int[] perm = op.tree.perm;
        double e = 0, pe = 0;
        for (int q = 0; q < n; q++) {
            double exact = pairs.exchangeArea(perm[p], perm[q]);
            e += Math.abs(op.scale[p] * row[q] * op.scale[q] - exact);
            pe += pairs.lastError();
        }
        return new double[] {e / op.area[p], pe / op.area[p]};
    }
}
