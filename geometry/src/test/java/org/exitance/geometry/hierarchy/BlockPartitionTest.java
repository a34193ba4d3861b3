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
