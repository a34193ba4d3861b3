package org.exitance.pipeline;

import java.util.Locale;
import org.exitance.geometry.hierarchy.CompressedOperator;
import org.exitance.geometry.hierarchy.OperatorReport;
import org.exitance.model.ViewFactorProducts;

/**
 * The geometry's compressed operator ({@link CompressedOperator}: F' = diag(1/A) D K̃ D, facets
 * in scene order) as the model's {@link ViewFactorProducts}. Thread-count independence and
 * reciprocity come from the operator (fixed product order, one stored triangle).
 */
final class OperatorProducts implements ViewFactorProducts {
    private final CompressedOperator op;

    /** @param op the operator; shared, immutable */
    OperatorProducts(CompressedOperator op) {
        this.op = op;
    }

    @Override
    public int size() {
        return op.size();
    }

    @Override
    public void multiply(double[] v, int cols, double[] w) {
        op.multiplyViewFactors(v, cols, w);
    }

    @Override
    public void multiplyRows(int[] rows, double[] v, int cols, double[] w) {
        op.multiplyViewFactorRows(rows, v, cols, w);
    }

    @Override
    public double diagonal(int i) {
        return op.diagonal(i);
    }

    @Override
    public double[] rowSums() {
        return op.rowSums();
    }

    @Override
    public long memoryBytes() {
        return op.bytes();
    }

    @Override
    public double errorEstimate() {
        return op.report().totalErrorEstimate();
    }

    @Override
    public String description() {
        OperatorReport r = op.report();
        return String.format(Locale.ROOT, "compressed operator of %d facets: %.1f MB (dense: %.1f MB), block tolerance"
                + " %.1e, estimated row error %.2e", r.facets(), r.bytes() / 1e6, r.denseBytes() / 1e6, r.tolerance(),
                r.totalErrorEstimate());
    }
}
