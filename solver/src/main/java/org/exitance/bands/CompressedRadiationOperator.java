package org.exitance.bands;

import java.util.concurrent.atomic.AtomicLong;
import org.exitance.model.ViewFactorProducts;
import org.exitance.network.RadiationOperator;

/**
 * A compressed view-factor matrix ({@link ViewFactorProducts}) as the operator of the iterative
 * band solves, counting its passes as the dense one does. The diagonal is read once.
 */
final class CompressedRadiationOperator implements RadiationOperator {
    private final ViewFactorProducts f;
    private final AtomicLong rowsMultiplied = new AtomicLong();
    private final double[] diagonal;
    private volatile double[] rowSums;

    /** @param f the operator; shared, not modified */
    CompressedRadiationOperator(ViewFactorProducts f) {
        this.f = f;
        this.diagonal = new double[f.size()];
        for (int i = 0; i < diagonal.length; i++) {
            diagonal[i] = f.diagonal(i);
        }
    }

    @Override
    public int size() {
        return f.size();
    }

    @Override
    public void multiply(double[] v, int cols, double[] w) {
        rowsMultiplied.addAndGet(size());
        f.multiply(v, cols, w);
    }

    @Override
    public void multiplyRows(int[] rows, double[] v, int cols, double[] w) {
        // a selection costs a full product when it is large (the operator's own rule), counted as such
        rowsMultiplied.addAndGet(rows.length > size() / 16 ? size() : rows.length);
        f.multiplyRows(rows, v, cols, w);
    }

    @Override
    public double diagonal(int i) {
        return diagonal[i];
    }

    @Override
    public double[] rowSums() {
        double[] s = rowSums;
        if (s == null) {
            s = f.rowSums();
            rowSums = s;
        }
        return s.clone();
    }

    @Override
    public long memoryBytes() {
        return f.memoryBytes();
    }

    @Override
    public double passes() {
        return size() == 0 ? 0 : (double) rowsMultiplied.get() / size();
    }
}
