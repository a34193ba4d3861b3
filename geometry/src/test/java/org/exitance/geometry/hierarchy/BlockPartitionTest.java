package org.exitance.geometry.hierarchy;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.viewfactor.PairSource;
import org.exitance.geometry.viewfactor.ViewFactorOptions;
import org.junit.jupiter.api.Test;

/**
 * Structure of the cluster tree and the block partition (common practice for H-matrices: the
 * blocks tile the matrix, the admissible ones satisfy the admissibility condition). Invented
 * geometry: a closed unit cube, 12 cells a side (864 facets).
 */
class BlockPartitionTest {

    static final PairSource SRC = new PairSource(Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), 12, 12, 12)),
            ViewFactorOptions.defaults());

    @Test
    void blocksTileTheUpperTriangleExactlyOnce() {
        ClusterTree tree = new ClusterTree(SRC, 16);
        List<Block> blocks = BlockPartition.of(tree, SRC, 1);
        int n = SRC.count();
        int[] cover = new int[n * n];
        for (Block b : blocks) {
            for (int i = 0; i < b.m; i++) {
                for (int j = b.diagonal() ? i : 0; j < b.n; j++) {
                    cover[(tree.start[b.s] + i) * n + tree.start[b.t] + j]++;
                }
            }
            if (b.far && !b.zero) {
                assertThat(Math.min(tree.diameter(b.s), tree.diameter(b.t))).isLessThanOrEqualTo(tree.distance(b.s, b.t));
            }
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                assertThat(cover[i * n + j]).as("(%d, %d)", i, j).isEqualTo(j >= i ? 1 : 0);
            }
        }
        boolean[] seen = new boolean[n];
        for (int f : tree.perm) {
            assertThat(seen[f]).isFalse();
            seen[f] = true;
        }
    }

    @Test
    void aSixFacetCubeIsOneExactBlockWithTheClosedFormFactors() {
        // smallest case: one leaf, no far block. Unit cube faces: opposite 0.19982 (Howell C-11),
        // adjacent 0.20004 (C-14), via ClosedForms; rows sum to 1 (summation rule)
        Scene cube = Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), 1, 1, 1));
        CompressedOperator op = OperatorBuilder.build(cube, ViewFactorOptions.defaults(), OperatorOptions.defaults(),
                org.exitance.geometry.viewfactor.ProgressListener.NONE);
        assertThat(op.report().farBlocks() + op.report().zeroBlocks()).isZero();
        double[] e = new double[36], y = new double[36];
        for (int c = 0; c < 6; c++) {
            e[c * 6 + c] = 1;
        }
        op.multiplyViewFactors(e, 6, y);
        double opposite = org.exitance.geometry.viewfactor.ClosedForms.parallelRectangles(1, 1, 1);
        double adjacent = org.exitance.geometry.viewfactor.ClosedForms.perpendicularRectangles(1, 1, 1);
        for (int i = 0; i < 6; i++) {
            double sum = 0;
            for (int j = 0; j < 6; j++) {
                double fij = y[i * 6 + j];
                sum += fij;
                boolean facing = cube.facets().get(i).normal().dot(cube.facets().get(j).normal()) < -0.5;
                assertThat(fij).isCloseTo(i == j ? 0 : facing ? opposite : adjacent,
                        org.assertj.core.api.Assertions.within(1e-9));
            }
            assertThat(sum).isCloseTo(1, org.assertj.core.api.Assertions.within(1e-12));
        }
    }

    @Test
    void leavesOfABoxLieInOnePlaneAndZeroBlocksExchangeNothing() {
        ClusterTree tree = new ClusterTree(SRC, 16);
        for (int v : tree.leaves) {
            assertThat(tree.plane[4 * v]).as("leaf %d planar", v).isNotNaN();
        }
        PairSource.Pairs pairs = SRC.newPairs();
        for (Block b : BlockPartition.of(tree, SRC, 1)) {
            if (b.zero) {
                // coplanar facets or facets behind each other's plane: F = 0 (common practice)
                int i = tree.perm[tree.start[b.s]], j = tree.perm[tree.end[b.t] - 1];
                assertThat(pairs.exchangeArea(i, j)).isZero();
            }
        }
    }
}
