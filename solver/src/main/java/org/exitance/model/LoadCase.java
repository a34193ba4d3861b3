package org.exitance.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A named variant of a case that shares its geometry and materials: some surfaces get other
 * boundary conditions, and only some external sources shine (e.g. "sunlit" and "eclipse",
 * "cold start" and "holding").
 *
 * @param name           name used in reports
 * @param description    free text, may be empty
 * @param boundaries     replacement boundary conditions by surface name
 * @param activeSources  names of the sources that shine in this load case, or null for all
 */
public record LoadCase(String name, String description, Map<String, BoundaryCondition> boundaries,
                       List<String> activeSources) {
    public LoadCase {
        Objects.requireNonNull(name, "name");
        description = description == null ? "" : description;
        boundaries = Map.copyOf(boundaries);
        activeSources = activeSources == null ? null : List.copyOf(activeSources);
    }

    /**
     * The case as this load case sees it: boundaries replaced, inactive sources removed. A
     * replacement named on either face of a window goes to the face that carries the window's
     * condition.
     */
    public RadiationCase applyTo(RadiationCase base) {
        Enclosure e = base.enclosure();
        List<EnclosureSurface> surfaces = new ArrayList<>();
        FacetGroups groups = base.facetGroups();
        for (EnclosureSurface s : e.surfaces()) {
            BoundaryCondition bc = s.boundary();
            String owner = groups == null ? null : groups.surfaceOf(s.name());
            if (owner != null) {
                if (boundaries.containsKey(owner)) {
                    double area = 0;
                    for (String f : groups.facetsBySurface().get(owner)) {
                        area += e.surface(e.indexOf(f)).areaM2();
                    }
                    bc = FacetGroups.forFacet(boundaries.get(owner), s.areaM2(), area);
                }
            } else if (!(bc instanceof BoundaryCondition.OnOtherFace)) {
                // a window's condition belongs to the pair: a replacement named on either face applies
                bc = boundaries.getOrDefault(s.name(), s.otherFace() == null ? bc
                        : boundaries.getOrDefault(s.otherFace(), bc));
            }
            double initial = bc.temperatureUnknown() ? s.initialTemperatureK() : Double.NaN;
            surfaces.add(s.withBoundary(bc, initial));
        }
        List<ExternalSource> sources = base.sources().stream()
                .filter(x -> activeSources == null || activeSources.contains(x.name())).toList();
        return new RadiationCase(base.title() + " — " + name, base.notes(), base.materials(),
                e.withSurfaces(surfaces), base.bands(), base.settings(),
                sources, List.of(), groups);
    }
}
