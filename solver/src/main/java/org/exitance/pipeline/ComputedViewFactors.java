package org.exitance.pipeline;

import java.util.List;

/**
 * Surface view factors computed from a case's geometry (or loaded from its cache), with what a
 * reader of the numbers needs to judge them.
 *
 * @param surfaceNames        surface names in scene order
 * @param areasM2             surface areas (m²)
 * @param matrix              F[i][j] between surfaces
 * @param environmentFactors  per surface, 1 − Σ_j F_ij: the share that leaves the geometry
 * @param facetCount          facets in the scene
 * @param maxRowSumDeviation  largest |1 − Σ_j F_ij| over facet rows: the closure error of a closed
 *                            geometry; for an open one, the largest share leaving it
 * @param maxRowSumExcess     largest Σ_j F_ij − 1 over facet rows (an error in any geometry)
 * @param maxReciprocityError largest relative reciprocity error over facet pairs
 * @param worstRow            the facet row with the largest |1 − Σ_j F_ij|
 * @param maxRowErrorEstimate largest estimated error of a facet row from sampled (partly hidden) pairs
 * @param methodSummary       how many facet pairs each method handled, as text
 * @param smoothing           what closure enforcement did, as text ("none" when not requested)
 * @param geometryHash        SHA-256 of the geometry and options
 * @param seconds             compute time (s); 0 when loaded from the cache
 * @param fromCache           whether the numbers came from the cache
 * @param facets              facet-level view factors when the case is solved on facets, else null
 *                            (their {@code compressed} operator when the geometry is held compressed)
 */
public record ComputedViewFactors(List<String> surfaceNames, double[] areasM2, double[][] matrix,
                                  double[] environmentFactors, int facetCount, double maxRowSumDeviation,
                                  double maxRowSumExcess,
                                  double maxReciprocityError, String worstRow, double maxRowErrorEstimate,
                                  String methodSummary, String smoothing, String geometryHash, double seconds,
                                  boolean fromCache, FacetFactors facets) {

    /**
     * Facet-level view factors: the dense matrix, or the compressed operator.
     *
     * @param areasM2      facet areas (m²), scene order
     * @param surfaceIndex index into surfaceNames of each facet's surface
     * @param matrix       F between facets, row-major n × n; null when held compressed
     * @param compressed   F between facets as a compressed operator (scene order); null when dense
     */
    public record FacetFactors(double[] areasM2, int[] surfaceIndex, double[] matrix,
                               org.exitance.model.ViewFactorProducts compressed) {
        /** Dense facet factors. */
        public FacetFactors(double[] areasM2, int[] surfaceIndex, double[] matrix) {
            this(areasM2, surfaceIndex, matrix, null);
        }

        /** Facet factors held as a compressed operator. */
        static FacetFactors ofOperator(double[] areasM2, int[] surfaceIndex,
                                       org.exitance.model.ViewFactorProducts operator) {
            return new FacetFactors(areasM2, surfaceIndex, null, operator);
        }

        public int count() {
            return areasM2.length;
        }
    }
    public ComputedViewFactors {
        surfaceNames = List.copyOf(surfaceNames);
    }

    /** Whether the view factors came from a compressed operator (no dense facet matrix exists). */
    public boolean compressed() {
        return geometryHash.endsWith("-compressed");
    }
}
