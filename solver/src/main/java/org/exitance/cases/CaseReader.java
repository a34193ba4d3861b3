package org.exitance.cases;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Convection;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.ExternalSource;
import org.exitance.model.LoadCase;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;

/**
 * Reads and validates a case file (the format is documented field by field in
 * docs/case-format.md). Everything is checked before a model object is built: unknown keys,
 * missing fields, wrong types, out-of-range values, view-factor closure and reciprocity.
 * Every problem is a {@link CaseException} naming the file and JSON path.
 */
public final class CaseReader {
    /** Default |1 − Σ_j F_ij| allowed in a closed enclosure, and Σ_j F_ij − 1 allowed in any. */
    public static final double DEFAULT_ROW_SUM_TOLERANCE = 1e-6;
    /** Default relative reciprocity error |A_i F_ij − A_j F_ji| / max(...) beyond which a case is rejected. */
    public static final double DEFAULT_RECIPROCITY_TOLERANCE = 1e-2;
    /** Share of a surface's radiation that may escape a geometry declared closed (no environment). */
    public static final double OPEN_GEOMETRY = 1e-3;
    /** Relative reciprocity error above which a warning is printed. */
    public static final double RECIPROCITY_WARNING = 1e-6;

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    private CaseReader() {
    }

    /** Reads, validates and builds a case; a geometry case gets its view factors from the cache or computes them. */
    public static LoadedCase read(Path file) throws CaseException {
        return read(file, ViewFactorStage.Request.DEFAULT);
    }

    /** As {@link #read(Path)}, with control over the cache, progress and cancellation of view factors. */
    public static LoadedCase read(Path file, ViewFactorStage.Request request) throws CaseException {
        JsonNode root = parse(file);
        return new Builder(file, JsonCursor.root(root, file), request).build();
    }

    static JsonNode parse(Path file) throws CaseException {
        if (!Files.exists(file)) {
            throw new CaseException(file, "", "file not found");
        }
        if (!Files.isRegularFile(file)) {
            throw new CaseException(file, "", "not a regular file");
        }
        try {
            JsonNode n = JSON.readTree(file.toFile());
            if (n == null || n.isMissingNode()) {
                throw new CaseException(file, "", "empty file");
            }
            return n;
        } catch (JsonParseException e) {
            String original = PropertyCsvReader.oneLine(e.getOriginalMessage());
            if (original.startsWith("Duplicate field") && e.getProcessor() != null) {
                throw new CaseException(file, jsonPath(e.getProcessor().getParsingContext()), "duplicate key (line "
                        + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr() + "): " + original);
            }
            // the parser names positions as "[Source: ...; line: 3, column: 15]"; keep only the position
            throw new CaseException(file, "", "malformed JSON at line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr() + ": "
                    + original.replaceAll("\\[Source: [^\\]]*?line: (\\d+), column: (\\d+)\\]", "line $1, column $2"));
        } catch (JsonProcessingException e) {
            throw new CaseException(file, "", "malformed JSON: " + PropertyCsvReader.oneLine(e.getOriginalMessage()));
        } catch (IOException e) {
            throw new CaseException(file, "", "cannot read: " + PropertyCsvReader.oneLine(e.getMessage()));
        }
    }

    /** The JSON path of a parser position, in the form the cursor uses ({@code $.surfaces[0].area_m2}). */
    private static String jsonPath(JsonStreamContext ctx) {
        StringBuilder b = new StringBuilder();
        for (JsonStreamContext c = ctx; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray()) {
                b.insert(0, "[" + Math.max(c.getCurrentIndex(), 0) + "]");
            } else if (c.getCurrentName() != null) {
                String k = c.getCurrentName();
                b.insert(0, k.matches("[A-Za-z_][A-Za-z0-9_]*") ? "." + k : "['" + k + "']");
            }
        }
        return "$" + b;
    }

    /** Reads a temperature given as {@code <prefix>_K} or {@code <prefix>_C}; returns K. */
    static Optional<Double> temperature(JsonCursor obj, String prefix, boolean allowZero) throws CaseException {
        boolean k = obj.has(prefix + "_K");
        boolean c = obj.has(prefix + "_C");
        if (k && c) {
            throw obj.error("give " + prefix + "_K or " + prefix + "_C, not both");
        }
        if (!k && !c) {
            return Optional.empty();
        }
        JsonCursor v = obj.field(prefix + (k ? "_K" : "_C"));
        double value = v.number();
        double kelvin = k ? value : value + 273.15;
        if (kelvin < 0) {
            throw v.error("temperature below absolute zero (" + value + (k ? " K" : " °C") + ")");
        }
        if (kelvin == 0 && !allowZero) {
            throw v.error("a surface temperature must be above 0 K");
        }
        return Optional.of(kelvin);
    }

    private static final class Builder {
        private final Path file;
        private final JsonCursor root;
        private final List<String> warnings = new ArrayList<>();
        private final ViewFactorStage.Request request;
        /** Surface areas from the geometry (m²), or null when the case gives areas and a matrix. */
        private Map<String, Double> geometryAreas;

        Builder(Path file, JsonCursor root, ViewFactorStage.Request request) {
            this.file = file;
            this.root = root;
            this.request = request;
        }

        LoadedCase build() throws CaseException {
            root.allowOnly("title", "notes", "materials", "surfaces", "environment", "viewFactors", "geometry",
                    "bands", "conductiveLinks", "sources", "loadCases", "solver", "expected");
            root.exactlyOneOf("viewFactors", "geometry");
            GeometryReader.Geometry geometry = root.has("geometry")
                    ? GeometryReader.read(root.field("geometry"), file.toAbsolutePath().getParent()) : null;
            if (geometry != null) {
                geometryAreas = new LinkedHashMap<>();
                geometry.scene().surfaces().forEach(x -> geometryAreas.put(x.name(), x.area()));
                geometry.notes().forEach(n -> warnings.add("geometry: " + n));
            }
            String title = root.optional("title").isPresent() ? root.field("title").text() : "";
            String notes = root.optional("notes").isPresent() ? root.field("notes").text() : "";
            Map<String, Material> materials = MaterialReader.readAll(root.field("materials"),
                    file.toAbsolutePath().getParent());
            List<EnclosureSurface> surfaces = surfaces(root.field("surfaces"), materials);
            Environment env = environment();
            List<ConductiveLink> links = links(surfaces);
            ComputedViewFactors computed = null;
            double[][] f;
            List<EnclosureSurface> solvedOn = surfaces;
            FacetExpansion.Result facets = null;
            if (geometry != null) {
                requireSameSurfaces(geometry, surfaces);
                computed = ViewFactorStage.obtain(file, geometry, request, geometry.solveOnFacets());
                f = fromGeometry(computed, surfaces, env != null);
                if (geometry.solveOnFacets()) {
                    JsonCursor where = root.field("geometry").field("options").field("resolution");
                    if (!links.isEmpty()) {
                        throw where.error("conductive links join surfaces: leave \"resolution\" at \"surfaces\"");
                    }
                    facets = FacetExpansion.expand(computed, surfaces, where);
                    solvedOn = facets.surfaces();
                    f = facets.matrix();
                }
            } else {
                f = viewFactors(root.field("viewFactors"), surfaces, env != null);
            }
            BandSet bands = bands();
            SolverSettings settings = settings();
            Enclosure enclosure;
            try {
                enclosure = new Enclosure(solvedOn, f, env, links);
            } catch (IllegalArgumentException e) {
                throw root.error(e.getMessage());
            }
            List<ExternalSource> sources = root.has("sources")
                    ? SourceReader.read(root.field("sources"), surfaceNames(surfaces), file.toAbsolutePath().getParent(),
                            geometry == null ? null : geometry.scene(), facets == null ? null : facets.sceneOrder())
                    : List.of();
            if (facets != null) {
                sources = FacetExpansion.spreadOverFacets(sources, facets.groups());
            }
            List<LoadCase> loadCases = root.has("loadCases")
                    ? loadCases(root.field("loadCases"), surfaces, sources) : List.of();
            RadiationCase model = new RadiationCase(title, notes, new ArrayList<>(materials.values()), enclosure,
                    bands, settings, sources, loadCases, facets == null ? null : facets.groups());
            ExpectedValues expected = root.has("expected")
                    ? expected(root.field("expected"), surfaces, env) : null;
            return new LoadedCase(file, model, warnings, expected, computed);
        }

        /** Area of a surface: given in the case, or (for a geometry case) from its facets. */
        private double area(JsonCursor s, String name) throws CaseException {
            if (geometryAreas == null) {
                return s.field("area_m2").positive();
            }
            if (s.has("area_m2")) {
                throw s.field("area_m2").error("the area of a surface comes from the geometry; leave area_m2 out");
            }
            Double a = geometryAreas.get(name);
            if (a == null) {
                throw s.field("name").error("no geometry part makes a surface named '" + name + "' (the geometry has: "
                        + String.join(", ", geometryAreas.keySet()) + ")");
            }
            return a;
        }

        private void requireSameSurfaces(GeometryReader.Geometry g, List<EnclosureSurface> surfaces)
                throws CaseException {
            for (String name : geometryAreas.keySet()) {
                if (surfaces.stream().noneMatch(x -> x.name().equals(name))) {
                    throw root.field("surfaces").error("the geometry makes a surface '" + name
                            + "' that $.surfaces does not list (give it a material and a boundary condition)");
                }
            }
        }

        /** The computed surface matrix in case order; checks that an open geometry has an environment. */
        private double[][] fromGeometry(ComputedViewFactors v, List<EnclosureSurface> surfaces, boolean open)
                throws CaseException {
            int n = surfaces.size();
            int[] at = new int[n];
            for (int i = 0; i < n; i++) {
                at[i] = v.surfaceNames().indexOf(surfaces.get(i).name());
            }
            double[][] f = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    f[i][j] = v.matrix()[at[i]][at[j]];
                }
                double leaving = v.environmentFactors()[at[i]];
                if (!open && leaving > OPEN_GEOMETRY) {
                    throw root.field("geometry").error("the geometry is open: " + fmt(leaving) + " of the radiation"
                            + " leaving '" + surfaces.get(i).name() + "' escapes; add an \"environment\" to receive it,"
                            + " or close the geometry");
                }
            }
            if (!open && v.maxRowSumDeviation() > 1e-9) {
                warnings.add("view factors: closed geometry, largest facet row-sum error " + fmt(v.maxRowSumDeviation())
                        + " (row " + v.worstRow() + "); the energy balance shows its effect");
            }
            if (v.maxRowSumExcess() > 1e-6) {
                warnings.add("view factors: a facet row sums to " + fmt(1 + v.maxRowSumExcess()) + ", above 1");
            }
            return f;
        }

        private static java.util.Set<String> surfaceNames(List<EnclosureSurface> surfaces) {
            java.util.Set<String> names = new java.util.HashSet<>();
            surfaces.forEach(x -> names.add(x.name()));
            return names;
        }

        private List<EnclosureSurface> surfaces(JsonCursor arr, Map<String, Material> materials) throws CaseException {
            List<JsonCursor> el = arr.elements();
            if (el.isEmpty()) {
                throw arr.error("needs at least one surface");
            }
            List<EnclosureSurface> out = new ArrayList<>();
            Map<String, String> seen = new LinkedHashMap<>();
            for (JsonCursor s : el) {
                s.allowOnly("name", "material", "area_m2", "temperature_K", "temperature_C", "netHeat_W",
                        "netFlux_W_m2", "dissipation_W", "adiabatic", "convection", "initialTemperature_K",
                        "initialTemperature_C", "description", "otherFace");
                JsonCursor nameCursor = s.field("name");
                String name = nameCursor.nonEmptyText();
                if (seen.containsKey(name)) {
                    throw nameCursor.error("duplicate surface name '" + name + "' (first at " + seen.get(name) + ")");
                }
                seen.put(name, s.path());
                JsonCursor matCursor = s.field("material");
                String matName = matCursor.text();
                Material m = materials.get(matName);
                if (m == null) {
                    throw matCursor.error("unknown material '" + matName + "' (declared: "
                            + String.join(", ", materials.keySet()) + ")");
                }
                double area = area(s, name);
                String otherFace = s.has("otherFace") ? s.field("otherFace").nonEmptyText() : null;
                BoundaryCondition bc = otherFace != null && WindowFaces.conditionLeftOut(s)
                        ? new BoundaryCondition.OnOtherFace() : boundary(s);
                double initial = temperature(s, "initialTemperature", false).orElse(Double.NaN);
                if (!Double.isNaN(initial) && !bc.temperatureUnknown()) {
                    throw s.error("initialTemperature is only for surfaces whose temperature is unknown"
                            + (otherFace != null ? " (on a window, give it on the face with the condition)" : ""));
                }
                Convection convection = s.has("convection") ? convection(s.field("convection")) : null;
                out.add(new EnclosureSurface(name, m, area, bc, initial, convection, otherFace));
            }
            WindowFaces.check(el, out);
            return out;
        }

        private BoundaryCondition boundary(JsonCursor s) throws CaseException {
            if (s.has("temperature_K") && s.has("temperature_C")) {
                throw s.error("give temperature_K or temperature_C, not both");
            }
            String which = s.exactlyOneOf("temperature_K", "temperature_C", "netHeat_W", "netFlux_W_m2",
                    "dissipation_W", "adiabatic");
            switch (which) {
                case "temperature_K":
                case "temperature_C":
                    return new BoundaryCondition.FixedTemperature(temperature(s, "temperature", false).orElseThrow());
                case "netHeat_W":
                    return new BoundaryCondition.FixedNetHeat(s.field("netHeat_W").number());
                case "netFlux_W_m2":
                    return new BoundaryCondition.FixedNetFlux(s.field("netFlux_W_m2").number());
                case "dissipation_W":
                    return new BoundaryCondition.HeatInput(s.field("dissipation_W").number());
                default:
                    JsonCursor a = s.field("adiabatic");
                    if (!a.bool()) {
                        throw a.error("write \"adiabatic\": true, or give a temperature, netHeat_W or netFlux_W_m2");
                    }
                    return new BoundaryCondition.Adiabatic();
            }
        }

        private List<LoadCase> loadCases(JsonCursor arr, List<EnclosureSurface> surfaces, List<ExternalSource> sources)
                throws CaseException {
            List<LoadCase> out = new ArrayList<>();
            java.util.Set<String> names = new java.util.HashSet<>();
            java.util.Set<String> known = surfaceNames(surfaces);
            List<JsonCursor> el = arr.elements();
            if (el.isEmpty()) {
                throw arr.error("needs at least one load case (or leave the key out)");
            }
            for (JsonCursor lc : el) {
                lc.allowOnly("name", "description", "surfaces", "sources");
                JsonCursor nameCursor = lc.field("name");
                String name = nameCursor.nonEmptyText();
                if (!names.add(name)) {
                    throw nameCursor.error("duplicate load case name '" + name + "'");
                }
                String description = lc.has("description") ? lc.field("description").text() : "";
                Map<String, BoundaryCondition> boundaries = new LinkedHashMap<>();
                if (lc.has("surfaces")) {
                    for (Map.Entry<String, JsonCursor> e : lc.field("surfaces").entries()) {
                        if (!known.contains(e.getKey())) {
                            throw e.getValue().error("no surface named '" + e.getKey() + "'");
                        }
                        JsonCursor b = e.getValue().allowOnly("temperature_K", "temperature_C", "netHeat_W",
                                "netFlux_W_m2", "dissipation_W", "adiabatic");
                        boundaries.put(e.getKey(), boundary(b));
                    }
                }
                List<String> active = null;
                if (lc.has("sources")) {
                    active = new ArrayList<>();
                    for (JsonCursor x : lc.field("sources").elements()) {
                        String sn = x.text();
                        if (sources.stream().noneMatch(s -> s.name().equals(sn))) {
                            throw x.error("no source named '" + sn + "'");
                        }
                        active.add(sn);
                    }
                }
                out.add(new LoadCase(name, description, boundaries, active));
            }
            return out;
        }

        private static Convection convection(JsonCursor c) throws CaseException {
            c.allowOnly("coefficient_W_m2K", "fluidTemperature_K", "fluidTemperature_C");
            double h = c.field("coefficient_W_m2K").nonNegative();
            double tf = temperature(c, "fluidTemperature", false)
                    .orElseThrow(() -> c.error("missing required key 'fluidTemperature_K' (or 'fluidTemperature_C')"));
            return new Convection(h, tf);
        }

        private List<ConductiveLink> links(List<EnclosureSurface> surfaces) throws CaseException {
            Optional<JsonCursor> o = root.optional("conductiveLinks");
            if (o.isEmpty()) {
                return List.of();
            }
            List<ConductiveLink> out = new ArrayList<>();
            for (JsonCursor l : o.get().elements()) {
                l.allowOnly("between", "conductance_W_K", "description");
                JsonCursor between = l.field("between");
                List<JsonCursor> ends = between.elements();
                if (ends.size() != 2) {
                    throw between.error("needs exactly two surface names, got " + ends.size());
                }
                String a = ends.get(0).text();
                String b = ends.get(1).text();
                for (int k = 0; k < 2; k++) {
                    String name = k == 0 ? a : b;
                    if (surfaces.stream().noneMatch(x -> x.name().equals(name))) {
                        throw ends.get(k).error("no surface named '" + name + "'");
                    }
                }
                if (a.equals(b)) {
                    throw between.error("a conductive link needs two different surfaces");
                }
                out.add(new ConductiveLink(a, b, l.field("conductance_W_K").positive()));
            }
            return out;
        }

        private Environment environment() throws CaseException {
            Optional<JsonCursor> o = root.optional("environment");
            if (o.isEmpty()) {
                return null;
            }
            JsonCursor e = o.get().allowOnly("name", "temperature_K", "temperature_C", "description");
            String name = e.field("name").nonEmptyText();
            double t = temperature(e, "temperature", true)
                    .orElseThrow(() -> e.error("missing required key 'temperature_K' (or 'temperature_C')"));
            return new Environment(name, t);
        }

        private double[][] viewFactors(JsonCursor vf, List<EnclosureSurface> surfaces, boolean open)
                throws CaseException {
            vf.allowOnly("matrix", "rowSumTolerance", "reciprocityTolerance");
            double rowTol = vf.has("rowSumTolerance") ? vf.field("rowSumTolerance").positive() : DEFAULT_ROW_SUM_TOLERANCE;
            double recTol = vf.has("reciprocityTolerance")
                    ? vf.field("reciprocityTolerance").positive() : DEFAULT_RECIPROCITY_TOLERANCE;
            JsonCursor m = vf.field("matrix");
            List<JsonCursor> rows = m.elements();
            int n = surfaces.size();
            if (rows.size() != n) {
                throw m.error("has " + rows.size() + " rows for " + n + " surfaces (rows follow the order of $.surfaces)");
            }
            double[][] f = new double[n][];
            for (int i = 0; i < n; i++) {
                JsonCursor row = rows.get(i);
                List<JsonCursor> cells = row.elements();
                if (cells.size() != n) {
                    throw row.error("has " + cells.size() + " entries for " + n + " surfaces");
                }
                f[i] = new double[n];
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    f[i][j] = cells.get(j).fraction();
                    sum += f[i][j];
                }
                String who = "row of '" + surfaces.get(i).name() + "'";
                if (sum > 1 + rowTol) {
                    throw row.error(who + " sums to " + fmt(sum) + ", above 1 (tolerance " + rowTol + ")");
                }
                if (!open && sum < 1 - rowTol) {
                    throw row.error(who + " sums to " + fmt(sum) + ", below 1: the enclosure is open;"
                            + " add an \"environment\" to receive the remainder, or complete the row");
                }
                if (!open && Math.abs(1 - sum) > 1e-12) {
                    warnings.add("view factors: " + who + " sums to " + fmt(sum) + " (|1 − Σ| = "
                            + fmt(Math.abs(1 - sum)) + ")");
                }
            }
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    double aij = surfaces.get(i).areaM2() * f[i][j];
                    double aji = surfaces.get(j).areaM2() * f[j][i];
                    double big = Math.max(aij, aji);
                    if (big == 0) {
                        continue;
                    }
                    double rel = Math.abs(aij - aji) / big;
                    if (rel > recTol) {
                        throw rows.get(i).elements().get(j).error("reciprocity broken between '" + surfaces.get(i).name()
                                + "' and '" + surfaces.get(j).name() + "': A_i F_ij = " + fmt(aij) + " m² but A_j F_ji = "
                                + fmt(aji) + " m² (relative error " + fmt(rel) + " > " + recTol + ")");
                    }
                    if (rel > RECIPROCITY_WARNING) {
                        warnings.add("view factors: reciprocity error " + fmt(rel) + " between '"
                                + surfaces.get(i).name() + "' and '" + surfaces.get(j).name()
                                + "'; the energy balance will show it");
                    }
                }
            }
            return f;
        }

        private BandSet bands() throws CaseException {
            Optional<JsonCursor> o = root.optional("bands");
            if (o.isEmpty()) {
                return null;
            }
            JsonCursor b = o.get().allowOnly("edges_um");
            JsonCursor edges = b.field("edges_um");
            List<JsonCursor> el = edges.elements();
            double[] e = new double[el.size()];
            for (int i = 0; i < e.length; i++) {
                e[i] = el.get(i).positive();
                if (i > 0 && !(e[i] > e[i - 1])) {
                    throw el.get(i).error("band edges must increase: " + e[i] + " after " + e[i - 1]);
                }
            }
            return new BandSet(e, e.length == 0 ? "case (one band: gray)" : "case");
        }

        private SolverSettings settings() throws CaseException {
            Optional<JsonCursor> o = root.optional("solver");
            if (o.isEmpty()) {
                return SolverSettings.DEFAULT;
            }
            JsonCursor s = o.get().allowOnly("temperatureTolerance_K", "relativeHeatTolerance", "maxNewtonIterations",
                    "maxPropertyIterations");
            SolverSettings d = SolverSettings.DEFAULT;
            return new SolverSettings(
                    s.has("temperatureTolerance_K") ? s.field("temperatureTolerance_K").positive() : d.temperatureToleranceK(),
                    s.has("relativeHeatTolerance") ? s.field("relativeHeatTolerance").positive() : d.relativeHeatTolerance(),
                    s.has("maxNewtonIterations") ? s.field("maxNewtonIterations").positiveInt() : d.maxNewtonIterations(),
                    s.has("maxPropertyIterations") ? s.field("maxPropertyIterations").positiveInt() : d.maxPropertyIterations());
        }

        private ExpectedValues expected(JsonCursor e, List<EnclosureSurface> surfaces, Environment env)
                throws CaseException {
            e.allowOnly("source", "derivation", "relativeTolerance", "absoluteTolerance", "surfaces", "environment");
            String source = e.field("source").nonEmptyText();
            String derivation = e.has("derivation") ? e.field("derivation").text() : "";
            double rel = e.has("relativeTolerance") ? e.field("relativeTolerance").nonNegative() : 0;
            double abs = e.has("absoluteTolerance") ? e.field("absoluteTolerance").nonNegative() : 0;
            if (rel == 0 && abs == 0) {
                throw e.error("needs relativeTolerance or absoluteTolerance");
            }
            List<Expectation> values = new ArrayList<>();
            if (e.has("surfaces")) {
                for (Map.Entry<String, JsonCursor> s : e.field("surfaces").entries()) {
                    if (surfaces.stream().noneMatch(x -> x.name().equals(s.getKey()))) {
                        throw s.getValue().error("no surface named '" + s.getKey() + "'");
                    }
                    quantities(s.getKey(), s.getValue(), values, true);
                }
            }
            if (e.has("environment")) {
                if (env == null) {
                    throw e.field("environment").error("the case has no environment");
                }
                quantities(env.name(), e.field("environment"), values, false);
            }
            if (values.isEmpty()) {
                throw e.error("lists no expected values");
            }
            return new ExpectedValues(source, derivation, rel, abs, values);
        }

        private static void quantities(String target, JsonCursor q, List<Expectation> out, boolean surface)
                throws CaseException {
            if (surface) {
                q.allowOnly("netHeat_W", "netFlux_W_m2", "temperature_K");
            } else {
                q.allowOnly("netHeat_W");
            }
            for (Map.Entry<String, JsonCursor> v : q.entries()) {
                out.add(new Expectation(target, v.getKey(), v.getValue().number()));
            }
        }
    }

    static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.9g", v);
    }
}
