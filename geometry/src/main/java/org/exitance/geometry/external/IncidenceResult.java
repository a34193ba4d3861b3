package org.exitance.geometry.external;

import java.util.Arrays;
import java.util.List;

/**
 * Incidence factors (dimensionless, in [0, 1]) of a scene for one external source: the
 * irradiance arriving on a facet or surface per unit source irradiance.
 *
 * <p>Surface factors are area-weighted facet factors, Σ_f A_f φ_f / A_S, summed in facet order.
 * Arrays are copied on construction and on access (the record is immutable).
 *
 * @param surfaceNames surface names in scene order
 * @param facetFactors one factor per facet, in the scene's global facet order
 * @param surfaceFactors one factor per surface, in scene order
 * @param raysCast number of shadow rays cast to obtain the result (0 when none were needed)
 */
public record IncidenceResult(List<String> surfaceNames, double[] facetFactors, double[] surfaceFactors,
        long raysCast) {

    /** @throws IllegalArgumentException if the surface arrays do not match the names */
    public IncidenceResult {
        surfaceNames = List.copyOf(surfaceNames);
        facetFactors = facetFactors.clone();
        surfaceFactors = surfaceFactors.clone();
        if (surfaceFactors.length != surfaceNames.size()) {
            throw new IllegalArgumentException(surfaceFactors.length + " surface factors for "
                    + surfaceNames.size() + " surfaces");
        }
    }

    /** @return a copy of the facet factors (global facet order) */
    @Override
    public double[] facetFactors() {
        return facetFactors.clone();
    }

    /** @return a copy of the surface factors (scene order) */
    @Override
    public double[] surfaceFactors() {
        return surfaceFactors.clone();
    }

    /**
     * @param surfaceName a surface name of the scene
     * @return its area-weighted factor
     * @throws IllegalArgumentException if absent
     */
    public double surfaceFactor(String surfaceName) {
        int k = surfaceNames.indexOf(surfaceName);
        if (k < 0) {
            throw new IllegalArgumentException("no surface named '" + surfaceName + "'");
        }
        return surfaceFactors[k];
    }

    /** @return factor of facet {@code index} (global order) */
    public double facetFactor(int index) {
        return facetFactors[index];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof IncidenceResult r && surfaceNames.equals(r.surfaceNames)
                && Arrays.equals(facetFactors, r.facetFactors) && Arrays.equals(surfaceFactors, r.surfaceFactors)
                && raysCast == r.raysCast;
    }

    @Override
    public int hashCode() {
        return 31 * (31 * surfaceNames.hashCode() + Arrays.hashCode(facetFactors)) + Arrays.hashCode(surfaceFactors);
    }

    @Override
    public String toString() {
        return "IncidenceResult" + surfaceNames + Arrays.toString(surfaceFactors) + " rays=" + raysCast;
    }
}
