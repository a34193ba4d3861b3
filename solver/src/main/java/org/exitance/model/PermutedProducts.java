package org.exitance.model;

/**
 * A compressed view-factor operator with its surfaces renumbered: new index a is old index
 * order[a], so (F' V)_a = (F (P V))_order[a]. The vectors are permuted on the way in and out;
 * the operator itself is shared.
 */
final class PermutedProducts implements ViewFactorProducts {
    private final ViewFactorProducts base;
    private final int[] order;

    /** @param order new index a holds old index order[a]; copied */
    PermutedProducts(ViewFactorProducts base, int[] order) {
        this.base = base;
        this.order = order.clone();
        boolean[] seen = new boolean[order.length];
        for (int a = 0; a < order.length; a++) {
            if (order[a] < 0 || order[a] >= order.length || seen[order[a]]) {
                throw new IllegalArgumentException("not a permutation: " + order[a] + " at " + a);
            }
            seen[order[a]] = true;
        }
    }

    @Override
    public int size() {
        return order.length;
    }

    @Override
    public void multiply(double[] v, int cols, double[] w) {
        double[] old = toOld(v, cols);
        double[] y = new double[old.length];
        base.multiply(old, cols, y);
        for (int a = 0; a < order.length; a++) {
            System.arraycopy(y, order[a] * cols, w, a * cols, cols);
        }
    }

    @Override
    public void multiplyRows(int[] rows, double[] v, int cols, double[] w) {
        int[] oldRows = new int[rows.length];
        for (int r = 0; r < rows.length; r++) {
            oldRows[r] = order[rows[r]];
        }
        base.multiplyRows(oldRows, toOld(v, cols), cols, w);
    }

    /** V in the old numbering (a new array). */
    private double[] toOld(double[] v, int cols) {
        double[] old = new double[order.length * cols];
        for (int a = 0; a < order.length; a++) {
            System.arraycopy(v, a * cols, old, order[a] * cols, cols);
        }
        return old;
    }

    @Override
    public double diagonal(int i) {
        return base.diagonal(order[i]);
    }

    @Override
    public double[] rowSums() {
        double[] s = base.rowSums();
        double[] out = new double[order.length];
        for (int a = 0; a < order.length; a++) {
            out[a] = s[order[a]];
        }
        return out;
    }

    @Override
    public long memoryBytes() {
        return base.memoryBytes() + 8L * order.length;
    }

    @Override
    public double errorEstimate() {
        return base.errorEstimate();
    }

    @Override
    public String description() {
        return base.description();
    }
}
