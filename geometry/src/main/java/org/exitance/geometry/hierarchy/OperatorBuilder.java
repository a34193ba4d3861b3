package org.exitance.geometry.hierarchy;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Workers;
import org.exitance.geometry.viewfactor.PairSource;
import org.exitance.geometry.viewfactor.ProgressListener;
import org.exitance.geometry.viewfactor.ViewFactorOptions;

/**
 * Builds the compressed exchange-area operator of a scene without forming the dense matrix:
 * cluster tree ({@link ClusterTree}), block partition ({@link BlockPartition}), near blocks
 * exact from the pair evaluator, far blocks by {@link Aca} from the same evaluator (so they
 * carry the same per-pair accuracy; a cluster pair with an occluder between them is refined to
 * exact blocks instead, see {@link BlockPartition}), then the closure scaling
 * ({@link Closure}) and the sampled-row error estimate ({@link RowSampler}).
 *
 * <p>Memory: the near blocks' bytes are known from the partition and reserved before any entry is
 * computed; every low-rank term is reserved before it is allocated ({@link MemoryBudget}). A
 * model too large for the heap ends with a {@link org.exitance.geometry.GeometryException}
 * naming the need, never with an OutOfMemoryError from the operator's own arrays.
 *
 * <p>Determinism: each block depends only on its clusters and the evaluator; blocks are handed
 * to threads in a fixed order, and nothing is summed across threads.
 */
public final class OperatorBuilder {

    /** Rank below which factors are expected to pay (measured: 11..39 at 1e-6, mean 19). */
    static final int TYPICAL_RANK = 20;

    private OperatorBuilder() {
    }

    /**
     * @param scene geometry
     * @param vf per-pair settings (the same as the dense path's)
     * @param o operator settings
     * @param progress fraction of the block work done
     * @return the operator, its {@link CompressedOperator#report()} filled
     * @throws org.exitance.geometry.GeometryException when it would not fit in the heap
     */
    public static CompressedOperator build(Scene scene, ViewFactorOptions vf, OperatorOptions o,
            ProgressListener progress) {
        return build(scene, vf, o, progress, MemoryBudget.ofHeap());
    }

    static CompressedOperator build(Scene scene, ViewFactorOptions vf, OperatorOptions o, ProgressListener progress,
            MemoryBudget budget) {
        long t0 = System.nanoTime();
        PairSource src = new PairSource(scene, vf);
        int n = src.count();
        int threads = o.threads() == 0 ? Runtime.getRuntime().availableProcessors() : o.threads();
        budget.take(8L * 40 * n); // tree, permutation, vectors of the product and the closure
        ClusterTree tree = new ClusterTree(src, o.leafSize());
        List<Block> blocks = BlockPartition.of(tree, src, o.eta());
        long nearBytes = 0;
        for (Block b : blocks) {
            nearBytes += b.far ? 0 : 8L * b.m * b.n;
        }
        budget.take(nearBytes + 64L * blocks.size());
        compute(src, tree, blocks, o, threads, budget, progress);
        double[] area = new double[n];
        for (int p = 0; p < n; p++) {
            area[p] = src.area(tree.perm[p]);
        }
        CompressedOperator op = new CompressedOperator(tree, blocks, contributions(tree, blocks), area, threads);
        Closure closure = new Closure();
        if (o.closed()) {
            closure.apply(op);
        } else {
            closure.refused = "not applied (open enclosure)";
        }
        if (closure.refused != null) {
            closure.rowError = rowSumError(op);
            closure.rawRowError = closure.rowError;
        }
        RowSampler sample = new RowSampler(src, op, o.sampledRows(), threads);
        op.report = report(op, blocks, o, closure, sample, (System.nanoTime() - t0) * 1e-9, threads);
        return op;
    }

    private static void compute(PairSource src, ClusterTree tree, List<Block> blocks, OperatorOptions o, int threads,
            MemoryBudget budget, ProgressListener progress) {
        List<Block> order = new ArrayList<>(blocks);
        order.removeIf(b -> b.zero);
        // costly blocks first (near ones cost m n evaluations; far ones about r (m + n))
        order.sort(Comparator.comparingLong((Block b) -> b.far ? 24L * (b.m + b.n) : (long) b.m * b.n).reversed()
                .thenComparingInt(b -> b.s).thenComparingInt(b -> b.t));
        double total = 0;
        for (Block b : order) {
            total += b.far ? 24.0 * (b.m + b.n) : (double) b.m * b.n;
        }
        double all = Math.max(1, total);
        AtomicInteger next = new AtomicInteger();
        AtomicLong done = new AtomicLong();
        Object lock = new Object();
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, threads), r -> {
            Thread th = new Thread(r, "compressed-operator");
            th.setDaemon(true);
            return th;
        });
        List<Future<?>> futures = new ArrayList<>();
        for (int w = 0; w < Math.max(1, threads); w++) {
            futures.add(pool.submit(() -> {
                PairSource.Pairs pairs = src.newPairs();
                Aca aca = new Aca(pairs, tree.perm, budget);
                for (int k = next.getAndIncrement(); k < order.size(); k = next.getAndIncrement()) {
                    Block b = order.get(k);
                    int rs = tree.start[b.s], cs = tree.start[b.t];
                    // a far block too small to gain from factors of a typical rank is computed densely
                    boolean small = (long) TYPICAL_RANK * (b.m + b.n) >= (long) b.m * b.n;
                    if (!b.far || small || !aca.approximate(b, rs, cs, o.tolerance())) {
                        if (b.far) {
                            budget.take(8L * b.m * b.n);
                        }
                        dense(pairs, tree.perm, b, rs, cs);
                    }
                    long cost = b.far ? 24L * (b.m + b.n) : (long) b.m * b.n;
                    double frac = done.addAndGet(cost) / all;
                    synchronized (lock) {
                        progress.progress(Math.min(1, frac));
                    }
                }
                return null;
            }));
        }
        Workers.awaitAll(pool, futures);
    }

    /** Fills b.dense with exact entries (each pair of a diagonal block once, mirrored). */
    private static void dense(PairSource.Pairs pairs, int[] perm, Block b, int rs, int cs) {
        double[] d = new double[b.m * b.n];
        for (int i = 0; i < b.m; i++) {
            for (int j = b.diagonal() ? i : 0; j < b.n; j++) {
                double s = pairs.exchangeArea(perm[rs + i], perm[cs + j]);
                d[i * b.n + j] = s;
                if (b.diagonal()) {
                    d[j * b.n + i] = s;
                }
            }
        }
        b.evaluations += b.diagonal() ? (long) b.m * (b.m + 1) / 2 : (long) b.m * b.n;
        b.dense = d;
    }

    /** Per leaf, the blocks it takes rows from, in block order (2k, or 2k + 1 when transposed). */
    private static int[][] contributions(ClusterTree tree, List<Block> blocks) {
        int leaves = tree.leaves.length;
        int[] count = new int[leaves];
        for (int pass = 0; pass < 2; pass++) {
            int[][] out = pass == 1 ? new int[leaves][] : null;
            if (out != null) {
                for (int l = 0; l < leaves; l++) {
                    out[l] = new int[count[l]];
                    count[l] = 0;
                }
            }
            for (int k = 0; k < blocks.size(); k++) {
                Block b = blocks.get(k);
                if (b.zero || (b.dense == null && b.rank() == 0)) {
                    continue;
                }
                for (int l = tree.leafLo[b.s]; l < tree.leafHi[b.s]; l++) {
                    if (out != null) {
                        out[l][count[l]] = 2 * k;
                    }
                    count[l]++;
                }
                for (int l = tree.leafLo[b.t]; l < tree.leafHi[b.t] && !b.diagonal(); l++) {
                    if (out != null) {
                        out[l][count[l]] = 2 * k + 1;
                    }
                    count[l]++;
                }
            }
            if (out != null) {
                return out;
            }
        }
        throw new AssertionError();
    }

    private static double rowSumError(CompressedOperator op) {
        int n = op.size();
        double[] one = new double[n], y = new double[n];
        java.util.Arrays.fill(one, 1);
        op.multiplyViewFactors(one, 1, y);
        double e = 0;
        for (double v : y) {
            e = Math.max(e, Math.abs(v - 1));
        }
        return e;
    }

    private static OperatorReport report(CompressedOperator op, List<Block> blocks, OperatorOptions o, Closure c,
            RowSampler sample, double seconds, int threads) {
        int near = 0, far = 0, zero = 0, denseFar = 0, minRank = Integer.MAX_VALUE, maxRank = 0;
        long rankSum = 0, evaluations = 0;
        for (Block b : blocks) {
            evaluations += b.evaluations;
            if (b.zero) {
                zero++;
            } else if (!b.far) {
                near++;
            } else if (b.dense != null) {
                denseFar++;
            } else {
                far++;
                minRank = Math.min(minRank, b.rank());
                maxRank = Math.max(maxRank, b.rank());
                rankSum += b.rank();
            }
        }
        return new OperatorReport(op.size(), near, far, zero, denseFar, far == 0 ? 0 : minRank,
                far == 0 ? 0 : (double) rankSum / far, maxRank, op.bytes(), evaluations + sample.evaluations,
                o.tolerance(), o.eta(), c.refused, c.iterations, c.maxDeviation, c.rowError, c.rawRowError, c.rawWorst, sample.rows,
                sample.maxError, sample.rmsError, sample.estimate(c.maxDeviation), 2 * sample.maxPairError, seconds,
                threads);
    }
}
