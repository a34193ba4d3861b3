package org.exitance.geometry.hierarchy;

import java.util.Arrays;
import org.exitance.geometry.viewfactor.PairSource;

/**
 * Binary cluster tree over the facets: each node is a contiguous range of positions in a
 * permutation of the facets, with the bounding box of its facets' vertices (m). A node with more than {@code leafSize} facets is bisected across the longest axis of
 * its centroids' bounding box at that box's midpoint (geometric bisection); when every centroid
 * lies on one side, it is halved in the order below instead. A node whose facets lie in 2 to
 * {@value #MAX_PLANES} distinct planes (an edge or a corner of a box, a few flat walls) is first
 * split by plane instead: the facets in the plane of its first facet against the rest. Cross
 * approximation of a block whose cluster spans a crease has to find every plane's part of the
 * kernel with its pivots and was measured to miss some (a 10,086-facet cube: row errors 6e-3 at a
 * block tolerance of 1e-6); with planar clusters each far block is one smooth kernel.
 *
 * <p>Order independence: the facets are first sorted by their order-independent key
 * ({@link PairSource#key}, index on ties) and every split keeps that order on each side, so the
 * tree and the positions do not depend on the order of surfaces or facets in the scene.
 *
 * <p>A node also records whether all its facets lie in one plane (normal and offset within 1e-9
 * of the scene size): two such clusters in the same plane, or a cluster wholly behind a planar
 * cluster's plane, exchange nothing, and their block is known to be zero without sampling.
 */
final class ClusterTree {

    static final int MAX_PLANES = 8;

    /** Facet index at each position (position = index in tree order). */
    final int[] perm;
    final int[] start, end, child1, child2;
    /** Bounding boxes: lo and hi, 3 per node (m). */
    final double[] lo, hi;
    /** Per node: unit normal and offset (4 values) of the plane of all its facets, or NaN when not planar. */
    final double[] plane;
    /** Per node: first leaf number and one past the last (leaves are numbered in tree order). */
    final int[] leafLo, leafHi;
    /** Node of each leaf number. */
    final int[] leaves;
    final int nodes;

    ClusterTree(PairSource src, int leafSize) {
        int n = src.count();
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> src.key(a) != src.key(b) ? Long.compare(src.key(a), src.key(b))
                : Integer.compare(a, b));
        perm = new int[n];
        for (int i = 0; i < n; i++) {
            perm[i] = order[i];
        }
        int max = Math.max(1, 2 * n);
        start = new int[max];
        end = new int[max];
        child1 = new int[max];
        child2 = new int[max];
        lo = new double[3 * max];
        hi = new double[3 * max];
        plane = new double[4 * max];
        leafLo = new int[max];
        leafHi = new int[max];
        int[] count = {0};
        int[] scratch = new int[n];
        split(src, 0, n, Math.max(1, leafSize), count, scratch);
        nodes = count[0];
        int nLeaves = 0;
        for (int v = 0; v < nodes; v++) {
            if (child1[v] < 0) {
                nLeaves++;
            }
        }
        leaves = new int[nLeaves];
        number(0, new int[] {0});
    }

    boolean leaf(int v) {
        return child1[v] < 0;
    }

    int size(int v) {
        return end[v] - start[v];
    }

    /** @return diagonal of node v's box (m) */
    double diameter(int v) {
        double s = 0;
        for (int k = 0; k < 3; k++) {
            double d = hi[3 * v + k] - lo[3 * v + k];
            s += d * d;
        }
        return Math.sqrt(s);
    }

    /** @return distance between the boxes of nodes a and b (m; 0 if they overlap) */
    double distance(int a, int b) {
        double s = 0;
        for (int k = 0; k < 3; k++) {
            double gap = Math.max(lo[3 * a + k] - hi[3 * b + k], lo[3 * b + k] - hi[3 * a + k]);
            if (gap > 0) {
                s += gap * gap;
            }
        }
        return Math.sqrt(s);
    }

    private int split(PairSource src, int from, int to, int leafSize, int[] count, int[] scratch) {
        int v = count[0]++;
        start[v] = from;
        end[v] = to;
        child1[v] = -1;
        child2[v] = -1;
        double[] clo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] chi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        Arrays.fill(lo, 3 * v, 3 * v + 3, Double.MAX_VALUE);
        Arrays.fill(hi, 3 * v, 3 * v + 3, -Double.MAX_VALUE);
        double[] box = new double[6];
        for (int p = from; p < to; p++) {
            int f = perm[p];
            src.bounds(f, box);
            for (int k = 0; k < 3; k++) {
                double c = src.centroid(f, k);
                clo[k] = Math.min(clo[k], c);
                chi[k] = Math.max(chi[k], c);
                lo[3 * v + k] = Math.min(lo[3 * v + k], box[k]);
                hi[3 * v + k] = Math.max(hi[3 * v + k], box[k + 3]);
            }
        }
        planeOf(src, v, from, to);
        if (to - from <= leafSize) {
            return v;
        }
        int cut = planeCut(src, from, to, scratch);
        if (cut > from) {
            child1[v] = split(src, from, cut, leafSize, count, scratch);
            child2[v] = split(src, cut, to, leafSize, count, scratch);
            return v;
        }
        int axis = 0;
        for (int k = 1; k < 3; k++) {
            if (chi[k] - clo[k] > chi[axis] - clo[axis]) {
                axis = k;
            }
        }
        double mid = 0.5 * (clo[axis] + chi[axis]);
        int left = 0, right = 0;
        for (int p = from; p < to; p++) {
            if (src.centroid(perm[p], axis) <= mid) {
                perm[from + left++] = perm[p];
            } else {
                scratch[right++] = perm[p];
            }
        }
        System.arraycopy(scratch, 0, perm, from + left, right);
        cut = from + left;
        if (left == 0 || right == 0) {
            // all centroids on one side (identical coordinate): halve in key order
            cut = from + (to - from) / 2;
        }
        child1[v] = split(src, from, cut, leafSize, count, scratch);
        child2[v] = split(src, cut, to, leafSize, count, scratch);
        return v;
    }

    /**
     * Puts the facets in the plane of the node's first facet before the others (order kept on
     * each side) when the node spans 2..{@value #MAX_PLANES} planes.
     *
     * @return the first position after that plane's facets, or {@code from} for no plane split
     */
    private int planeCut(PairSource src, int from, int to, int[] scratch) {
        double[] planes = new double[4 * (MAX_PLANES + 1)];
        int count = 0;
        for (int p = from; p < to; p++) {
            int f = perm[p];
            if (src.curved(f)) {
                return from;
            }
            if (planeIndex(src, f, planes, count) < 0) {
                if (count == MAX_PLANES) {
                    return from;
                }
                double[] pl = planeOfFacet(src, f);
                System.arraycopy(pl, 0, planes, 4 * count, 4);
                count++;
            }
        }
        if (count < 2) {
            return from;
        }
        int in = 0, out = 0;
        for (int p = from; p < to; p++) {
            int f = perm[p];
            if (planeIndex(src, f, planes, 1) == 0) {
                perm[from + in++] = f;
            } else {
                scratch[out++] = f;
            }
        }
        System.arraycopy(scratch, 0, perm, from + in, out);
        return from + in;
    }

    private double planeTolerance = -1;

    private static double[] planeOfFacet(PairSource src, int f) {
        double nx = src.normal(f, 0), ny = src.normal(f, 1), nz = src.normal(f, 2);
        return new double[] {nx, ny, nz, nx * src.centroid(f, 0) + ny * src.centroid(f, 1) + nz * src.centroid(f, 2)};
    }

    /** @return index among the first {@code count} planes of the one facet f lies in, or −1 */
    private int planeIndex(PairSource src, int f, double[] planes, int count) {
        if (planeTolerance < 0) {
            planeTolerance = 1e-9 * Math.max(diameter(0), 1e-300);
        }
        double[] pl = planeOfFacet(src, f);
        for (int k = 0; k < count; k++) {
            if (Math.abs(pl[0] - planes[4 * k]) <= 1e-12 && Math.abs(pl[1] - planes[4 * k + 1]) <= 1e-12
                    && Math.abs(pl[2] - planes[4 * k + 2]) <= 1e-12
                    && Math.abs(pl[3] - planes[4 * k + 3]) <= planeTolerance) {
                return k;
            }
        }
        return -1;
    }

    /** Records the common plane of the node's facets, or NaN. */
    private void planeOf(PairSource src, int v, int from, int to) {
        int f0 = perm[from];
        double nx = src.normal(f0, 0), ny = src.normal(f0, 1), nz = src.normal(f0, 2);
        double d = nx * src.centroid(f0, 0) + ny * src.centroid(f0, 1) + nz * src.centroid(f0, 2);
        double tol = 1e-9 * diameter(v);
        boolean flat = !src.curved(f0);
        for (int p = from + 1; p < to && flat; p++) {
            int f = perm[p];
            double off = nx * src.centroid(f, 0) + ny * src.centroid(f, 1) + nz * src.centroid(f, 2) - d;
            flat = !src.curved(f) && Math.abs(off) <= tol && Math.abs(src.normal(f, 0) - nx) <= 1e-12
                    && Math.abs(src.normal(f, 1) - ny) <= 1e-12 && Math.abs(src.normal(f, 2) - nz) <= 1e-12;
        }
        double[] value = flat ? new double[] {nx, ny, nz, d} : new double[] {Double.NaN, 0, 0, 0};
        System.arraycopy(value, 0, plane, 4 * v, 4);
    }

    private void number(int v, int[] next) {
        leafLo[v] = next[0];
        if (leaf(v)) {
            leaves[next[0]++] = v;
        } else {
            number(child1[v], next);
            number(child2[v], next);
        }
        leafHi[v] = next[0];
    }

    /**
     * @return true when nothing leaves a facet of a toward a facet of b: both planar in one plane,
     *         or one planar with the other's whole box on or behind its plane
     */
    boolean noExchange(int a, int b) {
        return behind(a, b) || behind(b, a);
    }

    /** Whether node b's box lies on or behind the plane of planar node a (tolerance 1e-9 of the boxes). */
    private boolean behind(int a, int b) {
        if (Double.isNaN(plane[4 * a])) {
            return false;
        }
        double tol = 1e-9 * (diameter(a) + diameter(b));
        double nx = plane[4 * a], ny = plane[4 * a + 1], nz = plane[4 * a + 2], d = plane[4 * a + 3];
        double most = -Double.MAX_VALUE;
        for (int c = 0; c < 8; c++) {
            double x = (c & 1) == 0 ? lo[3 * b] : hi[3 * b];
            double y = (c & 2) == 0 ? lo[3 * b + 1] : hi[3 * b + 1];
            double z = (c & 4) == 0 ? lo[3 * b + 2] : hi[3 * b + 2];
            most = Math.max(most, nx * x + ny * y + nz * z - d);
        }
        return most <= tol;
    }
}
