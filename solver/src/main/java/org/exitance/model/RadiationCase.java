package org.exitance.model;

import java.util.List;
import java.util.Objects;

/**
 * Everything a solve needs: the enclosure, the materials it uses, an optional band choice
 * (null: the default rule decides), and solver settings.
 *
 * @param title      short title from the case
 * @param notes      free text from the case (provenance; "invented demo data" for demos)
 * @param materials  all materials declared in the case
 * @param enclosure  surfaces, view factors, environment
 * @param bands      the band set given by the case, or null for the default rule
 * @param settings   solver settings
 * @param sources    radiation arriving from outside the surfaces (sun, planet, lamp)
 * @param loadCases  named variants solved side by side; empty when the case is solved as given
 * @param facetGroups for a case solved on facets, how facets group into the case's surfaces (results
 *                    are reported by surface); null when the enclosure's surfaces are the case's
 */
public record RadiationCase(String title, String notes, List<Material> materials, Enclosure enclosure,
                            BandSet bands, SolverSettings settings, List<ExternalSource> sources,
                            List<LoadCase> loadCases, FacetGroups facetGroups) {

    /** A case solved on its own surfaces. */
    public RadiationCase(String title, String notes, List<Material> materials, Enclosure enclosure, BandSet bands,
                         SolverSettings settings, List<ExternalSource> sources, List<LoadCase> loadCases) {
        this(title, notes, materials, enclosure, bands, settings, sources, loadCases, null);
    }

    /** A case without external sources or load cases. */
    public RadiationCase(String title, String notes, List<Material> materials, Enclosure enclosure, BandSet bands,
                         SolverSettings settings) {
        this(title, notes, materials, enclosure, bands, settings, List.of(), List.of());
    }

    /** A case without load cases. */
    public RadiationCase(String title, String notes, List<Material> materials, Enclosure enclosure, BandSet bands,
                         SolverSettings settings, List<ExternalSource> sources) {
        this(title, notes, materials, enclosure, bands, settings, sources, List.of());
    }

    public RadiationCase {
        title = title == null ? "" : title;
        notes = notes == null ? "" : notes;
        materials = List.copyOf(materials);
        sources = List.copyOf(sources);
        loadCases = List.copyOf(loadCases);
        Objects.requireNonNull(enclosure, "enclosure");
        Objects.requireNonNull(settings, "settings");
    }

    public RadiationCase withBands(BandSet newBands) {
        return new RadiationCase(title, notes, materials, enclosure, newBands, settings, sources, loadCases, facetGroups);
    }

    public RadiationCase withEnclosure(Enclosure newEnclosure) {
        return new RadiationCase(title, notes, materials, newEnclosure, bands, settings, sources, loadCases, facetGroups);
    }
}
