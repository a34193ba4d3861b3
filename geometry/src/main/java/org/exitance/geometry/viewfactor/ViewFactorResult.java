package org.exitance.geometry.viewfactor;

import java.nio.DoubleBuffer;
import java.util.List;

/**
 * The outcome of {@link ViewFactorCalculator#compute}. Immutable: arrays are copied on access,
 * the facet matrix is exposed read-only.
 *
 * <p>Facet matrix: dense, row-major, {@code double}, F[i·n + j] = F_ij (fraction of the energy
 * leaving facet i that arrives at facet j), facets numbered in scene order. 8 n² bytes (800 MB for
 * 10,000 facets). Surface matrix: F_IJ = Σ_{i∈I} Σ_{j∈J} A_i F_ij / A_I.
 */
public final class ViewFactorResult {

    private final List<String> surfaceNames;
    private final double[] surfaceAreas;
    private final double[][] surfaceMatrix;
    private final double[] environment;
    private final int facetCount;
    private final double[] facetAreas;
    private final int[] facetSurface;
    private final double[] facetMatrix;
    private final ClosureDiagnostics surfaceClosure;
    private final ClosureDiagnostics facetClosure;
    private final MethodCounts methodCounts;
    private final double maxRowErrorEstimate;
    private final SmoothingReport smoothing;
    private final String geometryHash;
    private final ViewFactorOptions options;
    private final int threadsUsed;
    private final double seconds;
    private final ClosureDiagnostics rawFacetClosure;
    private final ClosureDiagnostics rawSurfaceClosure;

    ViewFactorResult(List<String> surfaceNames, double[] surfaceAreas, double[][] surfaceMatrix, double[] environment,
            int facetCount, double[] facetAreas, int[] facetSurface, double[] facetMatrix,
            ClosureDiagnostics surfaceClosure, ClosureDiagnostics facetClosure, MethodCounts methodCounts,
            double maxRowErrorEstimate, SmoothingReport smoothing, String geometryHash, ViewFactorOptions options,
            int threadsUsed, double seconds, ClosureDiagnostics rawFacetClosure, ClosureDiagnostics rawSurfaceClosure) {
        this.surfaceNames = List.copyOf(surfaceNames);
        this.surfaceAreas = surfaceAreas;
        this.surfaceMatrix = surfaceMatrix;
        this.environment = environment;
        this.facetCount = facetCount;
        this.facetAreas = facetAreas;
        this.facetSurface = facetSurface;
        this.facetMatrix = facetMatrix;
        this.surfaceClosure = surfaceClosure;
        this.facetClosure = facetClosure;
        this.methodCounts = methodCounts;
        this.maxRowErrorEstimate = maxRowErrorEstimate;
        this.smoothing = smoothing;
        this.geometryHash = geometryHash;
        this.options = options;
        this.threadsUsed = threadsUsed;
        this.seconds = seconds;
        this.rawFacetClosure = rawFacetClosure;
        this.rawSurfaceClosure = rawSurfaceClosure;
    }

    /** @return surface names in scene order */
    public List<String> surfaceNames() {
        return surfaceNames;
    }

    /** @return surface areas (m²), a copy */
    public double[] surfaceAreas() {
        return surfaceAreas.clone();
    }

    /** @return the surface view-factor matrix F_IJ, a copy */
    public double[][] surfaceMatrix() {
        double[][] c = new double[surfaceMatrix.length][];
        for (int k = 0; k < c.length; k++) {
            c[k] = surfaceMatrix[k].clone();
        }
        return c;
    }

    /** @return F_IJ */
    public double surfaceFactor(int from, int to) {
        return surfaceMatrix[from][to];
    }

    /**
     * @return per surface, the view factor to the environment 1 − Σ_J F_IJ (a copy); ≈ 0 for a
     *         closed enclosure, where its size measures the summation error
     */
    public double[] environmentFactors() {
        return environment.clone();
    }

    /** @return number of facets */
    public int facetCount() {
        return facetCount;
    }

    /** @return facet areas (m²), a copy */
    public double[] facetAreas() {
        return facetAreas.clone();
    }

    /** @return index of the surface each facet belongs to, a copy */
    public int[] facetSurfaces() {
        return facetSurface.clone();
    }

    /** @return F_ij between facets i and j */
    public double facetFactor(int i, int j) {
        return facetMatrix[i * facetCount + j];
    }

    /** @return the facet matrix, row-major, read-only view (no copy) */
    public DoubleBuffer facetMatrix() {
        return DoubleBuffer.wrap(facetMatrix).asReadOnlyBuffer();
    }

    /**
     * Copies one facet row.
     *
     * @param i facet index
     * @param dest destination of length ≥ facetCount; modified
     */
    public void copyFacetRow(int i, double[] dest) {
        System.arraycopy(facetMatrix, i * facetCount, dest, 0, facetCount);
    }

    /** @return closure diagnostics of the surface matrix */
    public ClosureDiagnostics surfaceClosure() {
        return surfaceClosure;
    }

    /** @return closure diagnostics of the facet matrix */
    public ClosureDiagnostics facetClosure() {
        return facetClosure;
    }

    /** @return pairs per method */
    public MethodCounts methodCounts() {
        return methodCounts;
    }

    /**
     * @return the estimated largest error of a facet row sum: max_i Σ_j e_ij / A_i with e_ij the
     *         per-pair estimate (proximity-rule bound, contour 1e-10 relative, standard error of
     *         partly hidden pairs)
     */
    public double maxRowErrorEstimate() {
        return maxRowErrorEstimate;
    }

    /** @return closure diagnostics of the facet matrix as computed, before any smoothing */
    public ClosureDiagnostics rawFacetClosure() {
        return rawFacetClosure;
    }

    /** @return closure diagnostics of the surface matrix as computed, before any smoothing */
    public ClosureDiagnostics rawSurfaceClosure() {
        return rawSurfaceClosure;
    }

    /** @return the requested row-sum tolerance ({@link ViewFactorOptions#tolerance()}) */
    public double tolerance() {
        return options.tolerance();
    }

    /**
     * @return true if the raw matrix is a closed enclosure within the tolerance: every facet row
     *         sum within {@link #tolerance()} of 1 and every surface row sum within a tenth of it
     */
    public boolean closedWithinTolerance() {
        return rawFacetClosure.maxRowSumError() <= options.tolerance()
                && rawSurfaceClosure.maxRowSumError() <= 0.1 * options.tolerance();
    }

    /**
     * Whether the stated accuracy holds: for a closed enclosure, {@link #closedWithinTolerance()};
     * otherwise (open geometry, or rows off by more than the tolerance) the estimated largest row
     * error {@link #maxRowErrorEstimate()} must be within the tolerance. False means the matrix
     * is outside its stated accuracy and must not be used as if it were right.
     *
     * @return true if the tolerance was met
     */
    public boolean toleranceMet() {
        return closedWithinTolerance() || maxRowErrorEstimate <= options.tolerance();
    }

    /** @return what closure enforcement did (mode NONE if nothing was changed) */
    public SmoothingReport smoothing() {
        return smoothing;
    }

    /** @return SHA-256 (hex) of the geometry and the result-affecting options: a cache key */
    public String geometryHash() {
        return geometryHash;
    }

    /** @return the options used */
    public ViewFactorOptions options() {
        return options;
    }

    /** @return worker threads used (does not affect the values) */
    public int threadsUsed() {
        return threadsUsed;
    }

    /** @return wall-clock time of the computation (s) */
    public double seconds() {
        return seconds;
    }
}
