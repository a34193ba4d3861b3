package org.exitance.geometry.hierarchy;

/**
 * What a compressed operator is made of and how accurate it is.
 *
 * @param facets N
 * @param nearBlocks leaf pairs computed exactly; {@code farBlocks} compressed by ACA;
 *        {@code zeroBlocks} known to exchange nothing (coplanar or behind); {@code denseFarBlocks}
 *        far blocks whose rank made dense storage smaller
 * @param minRank smallest, {@code meanRank} mean and {@code maxRank} largest rank of the compressed blocks
 * @param bytes memory held by the operator (entries and index arrays)
 * @param evaluations exact pair evaluations made for the build (the dense path makes N(N−1)/2)
 * @param tolerance relative Frobenius error of each far block (ACA stopping)
 * @param eta admissibility parameter
 * @param closureNote null when the closure scaling was applied, else why not (or that it was not asked for)
 * @param closureIterations products spent on the scaling
 * @param maxScaleDeviation max |d_i − 1| of the scaling: every entry changed by at most
 *        2 max|d − 1| + max|d − 1|² relative
 * @param rowSumError max_i |Σ_j F'_ij − 1| after the scaling (before it when not applied)
 * @param rawRowSumError max_i |Σ_j F̃_ij − 1| of the compressed entries before any scaling: the
 *        closure error the scaling removed (equal to {@code rowSumError} when it was not applied)
 * @param worstRawRow the facet (scene order) of {@code rawRowSumError} (0 when it was not measured)
 * @param sampledRows exact rows compared
 * @param maxRowError max over the sampled rows of Σ_j |F'_ij − F_ij| (the row's ℓ1 error, which
 *        bounds the error of (F' v)_i for any |v| ≤ 1)
 * @param rmsRowError root mean square of the same
 * @param errorEstimate the stated estimate of max_i Σ_j |F'_ij − F_ij| over all rows: 2 × maxRowError
 *        + 2 maxScaleDeviation + maxScaleDeviation² (statistical: a sample of rows, not a bound)
 * @param pairErrorEstimate 2 × the largest sampled row sum of the pair evaluator's own error
 *        estimates (dimensionless): the accuracy of the exact entries the blocks approximate, as
 *        the dense path states it per row; the whole stated error of a row is
 *        {@code errorEstimate + pairErrorEstimate} ({@link #totalErrorEstimate})
 * @param buildSeconds wall time of the build, estimate included
 * @param threads worker threads used
 */
public record OperatorReport(int facets, int nearBlocks, int farBlocks, int zeroBlocks, int denseFarBlocks,
        int minRank, double meanRank, int maxRank, long bytes, long evaluations, double tolerance, double eta,
        String closureNote, int closureIterations, double maxScaleDeviation, double rowSumError, double rawRowSumError,
        int worstRawRow, int sampledRows, double maxRowError, double rmsRowError, double errorEstimate,
        double pairErrorEstimate, double buildSeconds, int threads) {

    /** @return the stated error of a facet row: compression and closure plus the exact entries' own */
    public double totalErrorEstimate() {
        return errorEstimate + pairErrorEstimate;
    }

    /** @return bytes of the dense N × N matrix of doubles this replaces */
    public double denseBytes() {
        return 8.0 * facets * facets;
    }

    /** @return a few lines for a log or a report */
    public String summary() {
        return String.format("compressed operator: %d facets, %.1f MB (dense: %.1f MB), blocks near %d, far %d"
                + " (ranks %d..%d, mean %.1f), zero %d, far kept dense %d; %d pair evaluations (%.2f%% of dense)%n"
                + "  block tolerance %.1e (eta %.2f); closure %s; max |row sum - 1| %.1e%n"
                + "  row error (l1) of %d exact rows sampled: max %.2e, rms %.2e; estimated for all rows %.2e"
                + " (with the pairs' own %.2e); built in %.2f s on %d threads",
                facets, bytes / 1e6, denseBytes() / 1e6, nearBlocks, farBlocks, minRank, maxRank, meanRank, zeroBlocks,
                denseFarBlocks, evaluations, 100.0 * evaluations / Math.max(1, 0.5 * facets * (facets - 1.0)),
                tolerance, eta, closureNote == null ? String.format("by scaling, max |d-1| %.2e in %d products",
                        maxScaleDeviation, closureIterations) : closureNote, rowSumError, sampledRows, maxRowError,
                rmsRowError, errorEstimate, totalErrorEstimate(), buildSeconds, threads);
    }
}
