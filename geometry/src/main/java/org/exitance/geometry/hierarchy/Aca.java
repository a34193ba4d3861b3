package org.exitance.geometry.hierarchy;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.exitance.geometry.viewfactor.PairSource;

/**
 * Adaptive cross approximation with partial pivoting (Bebendorf, "Approximation of boundary
 * element matrices", Numer. Math. 86 (2000) 565–589; Bebendorf &amp; Rjasanow, "Adaptive low-rank
 * approximation of collocation matrices", Computing 70 (2003) 1–24; cited from memory) of one far
 * block of K, sampling single entries from the exact pair evaluator.
 *
 * <p>Step k takes pivot row i_k, its residual row R = K(i_k, ·) − Σ u_l(i_k) w_l, the column j_k
 * of its largest |R|, w_k = R / R(j_k) and u_k = K(·, j_k) − Σ w_l(j_k) u_l. It stops when
 * ‖u_k‖ ‖w_k‖ ≤ ε ‖S_k‖_F (S_k = Σ u_l w_lᵀ, its norm updated exactly); the next pivot row is
 * the unused row of largest |u_k|. Because that criterion only looks where the pivots have been,
 * it is confirmed on {@value #CHECKS} rows drawn at random (seeded by the block's clusters, so
 * the result does not depend on threads): a row whose residual exceeds ε ‖S_k‖_F / √m becomes
 * the next pivot, and the checks start again. A zero row at rank 0 moves on to the next row; a
 * block of all zeros ends with rank 0 after every row was seen.
 *
 * <p>When the rank would make the factors as large as the block, the block is computed densely
 * instead (the caller does that when this returns false).
 */
final class Aca {

    static final int CHECKS = 2;

    private final PairSource.Pairs pairs;
    private final int[] perm;
    private final MemoryBudget budget;

    Aca(PairSource.Pairs pairs, int[] perm, MemoryBudget budget) {
        this.pairs = pairs;
        this.perm = perm;
        this.budget = budget;
    }

    /**
     * Fills b.u and b.w.
     *
     * @param b a far block; modified
     * @param rowStart first row's position, {@code colStart} first column's
     * @param eps relative Frobenius tolerance of the block
     * @return false if the block is better stored densely (nothing set then)
     */
    boolean approximate(Block b, int rowStart, int colStart, double eps) {
        int m = b.m, n = b.n;
        boolean[] used = new boolean[m];
        int usedCount = 0;
        List<double[]> us = new ArrayList<>(), ws = new ArrayList<>();
        SplittableRandom rnd = new SplittableRandom(0x9E3779B97F4A7C15L * (b.s + 1) + b.t);
        double frob2 = 0;
        int checksPassed = 0, nextRow = 0, scan = 0;
        double[] row = new double[n];
        long taken = 0;
        while (usedCount < m) {
            int i = nextRow;
            used[i] = true;
            usedCount++;
            for (int j = 0; j < n; j++) {
                double r = pairs.exchangeArea(perm[rowStart + i], perm[colStart + j]);
                for (int l = 0; l < us.size(); l++) {
                    r -= us.get(l)[i] * ws.get(l)[j];
                }
                row[j] = r;
            }
            b.evaluations += n;
            int jStar = 0;
            double rowNorm2 = 0;
            for (int j = 0; j < n; j++) {
                rowNorm2 += row[j] * row[j];
                if (Math.abs(row[j]) > Math.abs(row[jStar])) {
                    jStar = j;
                }
            }
            boolean small = us.isEmpty() ? row[jStar] == 0 : rowNorm2 * m <= eps * eps * frob2;
            if (small) {
                if (us.isEmpty()) {
                    // nothing found yet: the next row in order
                    while (scan < m && used[scan]) {
                        scan++;
                    }
                    if (scan >= m) {
                        break;
                    }
                    nextRow = scan;
                    continue;
                }
                if (++checksPassed >= CHECKS) {
                    break;
                }
                nextRow = randomUnused(rnd, used, m);
                if (nextRow < 0) {
                    break;
                }
                continue;
            }
            if ((long) (us.size() + 1) * (m + n) >= (long) m * n) {
                budget.give(taken);
                return false;
            }
            budget.take(8L * (m + n));
            taken += 8L * (m + n);
            double delta = row[jStar];
            double[] w = new double[n];
            for (int j = 0; j < n; j++) {
                w[j] = row[j] / delta;
            }
            double[] u = new double[m];
            for (int p = 0; p < m; p++) {
                double c = pairs.exchangeArea(perm[rowStart + p], perm[colStart + jStar]);
                for (int l = 0; l < us.size(); l++) {
                    c -= ws.get(l)[jStar] * us.get(l)[p];
                }
                u[p] = c;
            }
            b.evaluations += m;
            double uu = dot(u, u), ww = dot(w, w);
            double cross = 0;
            for (int l = 0; l < us.size(); l++) {
                cross += dot(us.get(l), u) * dot(ws.get(l), w);
            }
            frob2 += uu * ww + 2 * cross;
            us.add(u);
            ws.add(w);
            if (uu * ww <= eps * eps * frob2) {
                checksPassed = 0;
                nextRow = randomUnused(rnd, used, m);
            } else {
                checksPassed = 0;
                nextRow = -1;
                double best = -1;
                for (int p = 0; p < m; p++) {
                    if (!used[p] && Math.abs(u[p]) > best) {
                        best = Math.abs(u[p]);
                        nextRow = p;
                    }
                }
            }
            if (nextRow < 0) {
                break;
            }
        }
        b.u = us.toArray(new double[0][]);
        b.w = ws.toArray(new double[0][]);
        return true;
    }

    private static int randomUnused(SplittableRandom rnd, boolean[] used, int m) {
        int start = rnd.nextInt(m);
        for (int k = 0; k < m; k++) {
            int p = (start + k) % m;
            if (!used[p]) {
                return p;
            }
        }
        return -1;
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int k = 0; k < a.length; k++) {
            s += a[k] * b[k];
        }
        return s;
    }
}
