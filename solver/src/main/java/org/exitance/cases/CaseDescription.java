package org.exitance.cases;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.exitance.model.Cover;
import org.exitance.model.BandSet;
import org.exitance.model.ConductiveLink;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.LoadCase;
import org.exitance.model.Material;
import org.exitance.model.SolverSettings;

/**
 * A case as read and validated by {@link CaseReader}: everything the file says, with nothing
 * computed. A case that gives its view factors as a matrix carries the matrix; a geometry case
 * carries the parsed scene, and {@code org.exitance.pipeline.CasePipeline} computes (or loads)
 * its view factors and builds the solver's model from it.
 *
 * @param file        where it came from
 * @param title       its title ("" if none)
 * @param notes       its notes ("" if none)
 * @param materials   the declared materials, in file order
 * @param surfaces    the case's surfaces, in file order
 * @param environment the environment, or null for a closed enclosure
 * @param links       conductive links between surfaces (empty when none)
 * @param viewFactors the given F[i][j] in surface order, or null for a geometry case; shared, not
 *                    copied: callers must not modify it
 * @param geometry    the parsed geometry, or null when the case gives a matrix
 * @param bands       the bands the case gives, or null for the default rule
 * @param settings    solver settings
 * @param sources     external sources and how each lands
 * @param loadCases   load cases (empty when the case is solved as given)
 * @param expected    the {@code expected} block of a validation case, unread (the validation package
 *                    reads it), or null
 * @param warnings    non-fatal findings of reading (mesh repairs, small matrix errors), one line each
 * @param covers      insulation blankets and shield packs by covered surface name (empty for none)
 * @param section     the 2-D cross-section of an infinitely long case, or null
 * @param walls       layered walls behind surfaces, by surface name (empty for none)
 * @param capacities  heat capacities by the surface that carries a node's condition (empty for none)
 * @param time        the {@code time} block's settings, or null without one
 * @param drivers     the {@code time} block's schedules and thermostats, or null without one
 * @param measurementTolerances  for each window whose ε, ρ and τ are all given, by material name:
 *                    the stated or default measurement tolerance (empty for none)
 */
public record CaseDescription(Path file, String title, String notes, List<Material> materials,
                              List<EnclosureSurface> surfaces, Environment environment, List<ConductiveLink> links,
                              double[][] viewFactors, CaseGeometry geometry, BandSet bands, SolverSettings settings,
                              List<CaseSource> sources, List<LoadCase> loadCases, JsonCursor expected,
                              List<String> warnings, Map<String, Cover> covers, CaseSection section,
                              Map<String, MeasurementTolerance> measurementTolerances,
                              Map<String, org.exitance.conduction.Wall> walls,
                              Map<String, org.exitance.conduction.HeatCapacity> capacities,
                              org.exitance.timeline.TimeSettings time, org.exitance.timeline.Drivers drivers) {
    public CaseDescription {
        walls = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(walls));
        capacities = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(capacities));
        measurementTolerances = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(measurementTolerances));
        covers = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(covers));
        materials = List.copyOf(materials);
        surfaces = List.copyOf(surfaces);
        links = List.copyOf(links);
        sources = List.copyOf(sources);
        loadCases = List.copyOf(loadCases);
        warnings = List.copyOf(warnings);
    }
}
