package org.exitance.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * How a case solved on facets reports by surface: each named surface of the case and the
 * enclosure surfaces (facets, named {@code SURFACE#k}) it was split into, in order.
 *
 * @param facetsBySurface surface name → its facets' names
 */
public record FacetGroups(Map<String, List<String>> facetsBySurface) {
    public FacetGroups {
        Map<String, List<String>> copy = new LinkedHashMap<>();
        facetsBySurface.forEach((k, v) -> copy.put(k, List.copyOf(v)));
        facetsBySurface = java.util.Collections.unmodifiableMap(copy);
    }

    /** The name of facet k (1-based) of a surface. */
    public static String facetName(String surface, int k) {
        return surface + "#" + k;
    }

    /** Surfaces in order. */
    public List<String> surfaces() {
        return new ArrayList<>(facetsBySurface.keySet());
    }

    /** The surface a facet belongs to, or null when the name is not one of this grouping's facets. */
    public String surfaceOf(String facet) {
        for (Map.Entry<String, List<String>> e : facetsBySurface.entrySet()) {
            if (e.getValue().contains(facet)) {
                return e.getKey();
            }
        }
        return null;
    }

    /**
     * A surface's boundary condition as each of its facets carries it: temperatures, fluxes and
     * adiabatic walls hold facet by facet (an adiabatic facet balances locally); a net heat becomes
     * the same net flux on every facet; a dissipation is shared in proportion to area.
     *
     * @param facetAreaM2    the facet's area (m²)
     * @param surfaceAreaM2  the whole surface's area (m²)
     */
    public static BoundaryCondition forFacet(BoundaryCondition bc, double facetAreaM2, double surfaceAreaM2) {
        if (bc instanceof BoundaryCondition.FixedNetHeat h) {
            return new BoundaryCondition.FixedNetFlux(h.netHeatW() / surfaceAreaM2);
        }
        if (bc instanceof BoundaryCondition.HeatInput p) {
            return new BoundaryCondition.HeatInput(p.powerW() * facetAreaM2 / surfaceAreaM2);
        }
        if (bc instanceof BoundaryCondition.OnOtherFace) {
            throw new IllegalArgumentException("windows are solved on surfaces, not facets");
        }
        return bc;
    }
}
