package org.exitance.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * A named group of facets that radiates as one surface (one row of the surface view-factor
 * matrix). Area in m².
 *
 * @param name non-blank name, unique within a {@link Scene}
 * @param facets at least one facet, in a fixed order
 */
public record Surface(String name, List<Facet> facets) {

    /** @throws GeometryException for a blank name or no facets */
    public Surface {
        if (name == null || name.isBlank()) {
            throw new GeometryException("surface name must not be blank");
        }
        if (facets == null || facets.isEmpty()) {
            throw new GeometryException("surface '" + name + "' has no facets");
        }
        facets = List.copyOf(facets);
    }

    /** @return the total area of the facet polygons (m²), summed in facet order */
    public double area() {
        double a = 0;
        for (Facet f : facets) {
            a += f.area();
        }
        return a;
    }

    /** @return the total exact area (m²; curved facets count their patch), summed in facet order */
    public double exactArea() {
        double a = 0;
        for (Facet f : facets) {
            a += f.exactArea();
        }
        return a;
    }

    /**
     * @param newName name of the result
     * @return the same facets radiating from the other side
     */
    public Surface reversed(String newName) {
        List<Facet> r = new ArrayList<>(facets.size());
        for (Facet f : facets) {
            r.add(f.reversed());
        }
        return new Surface(newName, r);
    }

    /** @return this surface moved by {@code t} */
    public Surface transformed(Transform t) {
        List<Facet> r = new ArrayList<>(facets.size());
        for (Facet f : facets) {
            r.add(f.transformed(t));
        }
        return new Surface(name, r);
    }
}
