package org.exitance.geometry.bvh;

/**
 * Builds the arrays of a {@link TriangleBvh}: top-down object-median split along the longest
 * axis of the centroid bounds, leaves of at most {@value #LEAF_SIZE} triangles, boxes padded by
 * 1e-9 of the scene size (see {@link TriangleBvh} for the literature). Used once per hierarchy.
 */
final class BvhBuilder {
    static final int LEAF_SIZE = 4;

    final double[] tri;   // 9 per triangle, reordered
    final int[] owner;    // per triangle, reordered
    final double[] box;   // 6 per node: min xyz, max xyz
    final int[] first;    // leaf: first triangle; inner: index of the right child
    final int[] count;    // leaf: number of triangles (> 0); inner: 0
    private int nodes;

    /**
     * @param triangles packed vertices, 9 doubles per triangle (m); not modified (copied)
     * @param owners owner id per triangle; not modified (copied)
     */
    BvhBuilder(double[] triangles, int[] owners) {
        int n = owners.length;
        if (triangles.length != 9 * n) {
            throw new IllegalArgumentException("need 9 coordinates per triangle");
        }
        int[] order = new int[n];
        double[] cen = new double[3 * n];
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (int t = 0; t < n; t++) {
            order[t] = t;
            for (int k = 0; k < 3; k++) {
                cen[3 * t + k] = (triangles[9 * t + k] + triangles[9 * t + 3 + k] + triangles[9 * t + 6 + k]) / 3;
                for (int v = 0; v < 3; v++) {
                    lo[k] = Math.min(lo[k], triangles[9 * t + 3 * v + k]);
                    hi[k] = Math.max(hi[k], triangles[9 * t + 3 * v + k]);
                }
            }
        }
        double size = n == 0 ? 0 : Math.sqrt(sq(hi[0] - lo[0]) + sq(hi[1] - lo[1]) + sq(hi[2] - lo[2]));
        int maxNodes = Math.max(1, 2 * n);
        box = new double[6 * maxNodes];
        first = new int[maxNodes];
        count = new int[maxNodes];
        nodes = 0;
        if (n > 0) {
            build(order, cen, triangles, 0, n, 1e-9 * size + Double.MIN_NORMAL);
        }
        tri = new double[9 * n];
        owner = new int[n];
        for (int t = 0; t < n; t++) {
            System.arraycopy(triangles, 9 * order[t], tri, 9 * t, 9);
            owner[t] = owners[order[t]];
        }
    }

    private static double sq(double v) {
        return v * v;
    }

    private int build(int[] order, double[] cen, double[] triangles, int from, int to, double pad) {
        int node = nodes++;
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        double[] clo = lo.clone(), chi = hi.clone();
        for (int i = from; i < to; i++) {
            int t = order[i];
            for (int k = 0; k < 3; k++) {
                for (int v = 0; v < 3; v++) {
                    lo[k] = Math.min(lo[k], triangles[9 * t + 3 * v + k]);
                    hi[k] = Math.max(hi[k], triangles[9 * t + 3 * v + k]);
                }
                clo[k] = Math.min(clo[k], cen[3 * t + k]);
                chi[k] = Math.max(chi[k], cen[3 * t + k]);
            }
        }
        for (int k = 0; k < 3; k++) {
            box[6 * node + k] = lo[k] - pad;
            box[6 * node + 3 + k] = hi[k] + pad;
        }
        if (to - from <= LEAF_SIZE) {
            first[node] = from;
            count[node] = to - from;
            return node;
        }
        int axis = 0;
        for (int k = 1; k < 3; k++) {
            if (chi[k] - clo[k] > chi[axis] - clo[axis]) {
                axis = k;
            }
        }
        int mid = (from + to) >>> 1;
        select(order, cen, axis, from, to - 1, mid);
        count[node] = 0;
        build(order, cen, triangles, from, mid, pad);
        first[node] = build(order, cen, triangles, mid, to, pad);
        return node;
    }

    /** Quickselect: partially orders order[lo..hi] so that position k holds the k-th key (ties by index). */
    private static void select(int[] order, double[] cen, int axis, int lo, int hi, int k) {
        while (lo < hi) {
            int pivotIndex = order[(lo + hi) >>> 1];
            double pk = cen[3 * pivotIndex + axis];
            int i = lo, j = hi;
            while (i <= j) {
                while (less(order[i], pivotIndex, pk, cen, axis)) {
                    i++;
                }
                while (less(pivotIndex, order[j], cen[3 * order[j] + axis], cen, axis)) {
                    j--;
                }
                if (i <= j) {
                    int t = order[i];
                    order[i] = order[j];
                    order[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return;
            }
        }
    }

    private static boolean less(int a, int b, double keyB, double[] cen, int axis) {
        double ka = cen[3 * a + axis];
        return ka < keyB || (ka == keyB && a < b);
    }

}
