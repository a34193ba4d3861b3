package org.exitance.cases;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.exitance.model.BandSet;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Cover;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.LoadCase;
import org.exitance.model.Material;
import org.exitance.model.SolverSettings;

/**
 * Reads and validates a case file (the format is documented field by field in
 * docs/case-format.md) into a {@link CaseDescription}, computing nothing: view factors of a
 * geometry, and the model a solve takes, come from {@code org.exitance.pipeline.CasePipeline}.
 * Each part has its reader; this class runs them in a fixed order, which decides the error a case
 * with several problems reports. Every problem is a {@link CaseException} naming the file and
 * JSON path.
 */
public final class CaseReader {
    private CaseReader() {
    }

    /** Reads and validates a case; computes no view factors and writes no file. */
    public static CaseDescription read(Path file) throws CaseException {
        JsonCursor root = JsonCursor.root(CaseJson.parse(file), file);
        Path dir = file.toAbsolutePath().getParent();
        List<String> warnings = new ArrayList<>();
        root.allowOnly("$schema", "title", "notes", "materials", "surfaces", "environment", "viewFactors", "geometry",
                "section", "bands", "conductiveLinks", "sources", "loadCases", "solver", "expected", "time");
        if (root.has("$schema")) {
            root.field("$schema").text(); // where an editor finds the case schema (docs/case.schema.json); not used
        }
        root.exactlyOneOf("viewFactors", "geometry", "section");
        CaseGeometry geometry = root.has("geometry") ? GeometryReader.read(root.field("geometry"), dir) : null;
        Map<String, Double> geometryAreas = null;
        if (geometry != null) {
            geometryAreas = new LinkedHashMap<>();
            for (var s : geometry.scene().surfaces()) {
                geometryAreas.put(s.name(), s.exactArea());
            }
            geometry.notes().forEach(n -> warnings.add("geometry: " + n));
        }
        CaseSection section = root.has("section") ? CaseSection.read(root.field("section")) : null;
        if (section != null) {
            geometryAreas = new LinkedHashMap<>(section.areasM2());
        }
        String title = root.optional("title").isPresent() ? root.field("title").text() : "";
        String notes = root.optional("notes").isPresent() ? root.field("notes").text() : "";
        Map<String, Material> materials = MaterialReader.readAll(root.field("materials"), dir);
        List<EnclosureSurface> surfaces = SurfaceReader.read(root.field("surfaces"), materials, geometryAreas);
        Environment env = LinkAndEnvironmentReader.environment(root);
        List<ConductiveLink> links = LinkAndEnvironmentReader.links(root, surfaces);
        double[][] matrix = null;
        if (section != null) {
            SurfaceReader.requireListed(geometryAreas, surfaces, root.field("surfaces"));
        } else if (geometry != null) {
            SurfaceReader.requireListed(geometryAreas, surfaces, root.field("surfaces"));
            if (geometry.solveOnFacets()) {
                requireSolvableOnFacets(root.field("geometry").field("options").field("resolution"), surfaces, links);
            }
        } else {
            matrix = ViewFactorMatrixReader.read(root.field("viewFactors"), surfaces, env != null, warnings);
        }
        BandSet bands = BandAndSolverReader.bands(root);
        SolverSettings settings = BandAndSolverReader.settings(root);
        Set<String> surfaceNames = new HashSet<>();
        surfaces.forEach(x -> surfaceNames.add(x.name()));
        List<CaseSource> sources = root.has("sources")
                ? SourceReader.read(root.field("sources"), surfaceNames, dir, geometry != null) : List.of();
        Set<String> sourceNames = new HashSet<>();
        sources.forEach(x -> sourceNames.add(x.name()));
        List<LoadCase> loadCases = root.has("loadCases")
                ? LoadCaseReader.read(root.field("loadCases"), surfaceNames, sourceNames) : List.of();
        JsonCursor expected = root.has("expected") ? root.field("expected") : null;
        Map<String, Cover> covers = CoverReader.read(root.field("surfaces"), surfaces, materials,
                geometry != null && geometry.solveOnFacets());
        Map<String, org.exitance.conduction.Wall> walls = StorageReader.walls(root.field("surfaces"), surfaces);
        Map<String, org.exitance.conduction.HeatCapacity> caps = StorageReader.capacities(root.field("surfaces"),
                surfaces, covers);
        requireStorable(root.field("surfaces"), surfaces, walls, caps, covers,
                geometry != null && geometry.solveOnFacets());
        TimeReader.Block time = root.has("time")
                ? TimeReader.read(root.field("time"), surfaces, sourceNames, env != null) : null;
        if (time != null && geometry != null && geometry.solveOnFacets()) {
            throw root.field("time").error("a case in time is solved on its surfaces: leave the geometry's"
                    + " \"resolution\" at \"surfaces\"");
        }
        if (time != null && !loadCases.isEmpty()) {
            throw root.field("loadCases").error("a case with a time block runs as given: its schedules take the place"
                    + " of load cases (leave one of them out)");
        }
        return new CaseDescription(file, title, notes, new ArrayList<>(materials.values()), surfaces, env, links,
                matrix, geometry, bands, settings, sources, loadCases, expected, warnings, covers, section,
                MaterialReader.measurementTolerances(root.field("materials")), walls, caps,
                time == null ? null : time.settings(), time == null ? null : time.drivers());
    }

    /** Walls and thermal masses sit on surfaces solved as themselves: not on facets, not under a cover. */
    private static void requireStorable(JsonCursor arr, List<EnclosureSurface> surfaces,
                                        Map<String, org.exitance.conduction.Wall> walls,
                                        Map<String, org.exitance.conduction.HeatCapacity> caps, Map<String, Cover> covers,
                                        boolean onFacets) throws CaseException {
        List<JsonCursor> el = arr.elements();
        for (int i = 0; i < el.size(); i++) {
            String name = surfaces.get(i).name();
            boolean stores = walls.containsKey(name) || el.get(i).has("thermalMass");
            if (stores && onFacets) {
                throw el.get(i).error("walls and thermal masses belong to whole surfaces: leave the geometry's"
                        + " \"resolution\" at \"surfaces\"");
            }
            if (walls.containsKey(name) && covers.containsKey(name)) {
                throw el.get(i).field("wall").error("a covered surface's outer face is the cover's: give the wall or the"
                        + " cover, not both");
            }
        }
    }

    /** A case solved facet by facet: no conductive links and no windows (both join whole surfaces). */
    private static void requireSolvableOnFacets(JsonCursor resolution, List<EnclosureSurface> surfaces,
                                                List<ConductiveLink> links) throws CaseException {
        if (!links.isEmpty()) {
            throw resolution.error("conductive links join surfaces: leave \"resolution\" at \"surfaces\"");
        }
        for (EnclosureSurface s : surfaces) {
            if (s.hasOtherFace()) {
                throw resolution.error("nodes with two faces are solved on surfaces: leave \"resolution\" at"
                        + " \"surfaces\" (surface '" + s.name() + "' is a " + (s.isWindowFace() ? "window" : "two-sided")
                        + " face)");
            }
        }
    }

    /** A number in an error or warning message: nine significant digits. */
    public static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.9g", v);
    }
}
