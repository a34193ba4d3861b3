package org.exitance.geometry.hierarchy;

/**
 * Settings of the compressed operator. Immutable.
 *
 * @param tolerance relative Frobenius error of each far block (ACA stopping), in (0, 0.1);
 *        default 1e-6
 * @param eta admissibility parameter η: a cluster pair is far when
 *        min(diam) ≤ η · dist (bounding boxes); in (0, 10], default 1
 * @param leafSize most facets in a leaf cluster, in [4, 1024]; default 96
 * @param closed scale to row sums A_i (a closed enclosure); false leaves the rows as computed
 * @param sampledRows most exact rows compared with the operator's for the error estimate (one
 *        per leaf cluster up to this number), in [0, 4096]; default 1,024
 * @param threads worker threads, 0 = all processors; results do not depend on it
 */
public record OperatorOptions(double tolerance, double eta, int leafSize, boolean closed, int sampledRows,
        int threads) {

    /** @throws IllegalArgumentException for out-of-range values */
    public OperatorOptions {
        if (!(tolerance > 0 && tolerance < 0.1)) {
            throw new IllegalArgumentException("tolerance must be in (0, 0.1), got " + tolerance);
        }
        if (!(eta > 0 && eta <= 10)) {
            throw new IllegalArgumentException("eta must be in (0, 10], got " + eta);
        }
        if (leafSize < 4 || leafSize > 1024) {
            throw new IllegalArgumentException("leafSize must be in [4, 1024], got " + leafSize);
        }
        if (sampledRows < 0 || sampledRows > 4096) {
            throw new IllegalArgumentException("sampledRows must be in [0, 4096], got " + sampledRows);
        }
        if (threads < 0) {
            throw new IllegalArgumentException("threads must be >= 0, got " + threads);
        }
    }

    /** @return tolerance 1e-6, η = 1, leaves of 96, closed, up to 1,024 sampled rows, all processors */
    public static OperatorOptions defaults() {
        return new OperatorOptions(1e-6, 1, 96, true, 1024, 0);
    }

    /** @return a copy with another tolerance */
    public OperatorOptions withTolerance(double t) {
        return new OperatorOptions(t, eta, leafSize, closed, sampledRows, threads);
    }

    /** @return a copy with another closure setting */
    public OperatorOptions withClosed(boolean c) {
        return new OperatorOptions(tolerance, eta, leafSize, c, sampledRows, threads);
    }

    /** @return a copy with another leaf size */
    public OperatorOptions withLeafSize(int n) {
        return new OperatorOptions(tolerance, eta, n, closed, sampledRows, threads);
    }

    /** @return a copy with another admissibility parameter */
    public OperatorOptions withEta(double e) {
        return new OperatorOptions(tolerance, e, leafSize, closed, sampledRows, threads);
    }

    /** @return a copy with another thread count */
    public OperatorOptions withThreads(int n) {
        return new OperatorOptions(tolerance, eta, leafSize, closed, sampledRows, n);
    }

    /** @return a copy with another number of sampled rows */
    public OperatorOptions withSampledRows(int n) {
        return new OperatorOptions(tolerance, eta, leafSize, closed, n, threads);
    }
}
