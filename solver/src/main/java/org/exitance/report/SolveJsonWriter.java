package org.exitance.report;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.exitance.model.Band;
import org.exitance.result.EnvironmentResult;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.FacePairResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SolverReport;
import org.exitance.result.SurfaceResult;

/**
 * The machine-readable result (documented in docs/command-line.md). Keys carry their units;
 * an unbounded band edge is written as null.
 */
public final class SolveJsonWriter {
    /**
     * The mapper every JSON writer shares. It never writes NaN or Infinity, neither as a token nor
     * as a string: writing a non-finite number fails, naming its JSON path (a bug, reported with
     * exit code 1); a value that does not apply is written as null by the writer itself.
     */
    public static final ObjectMapper MAPPER = new ObjectMapper(JsonFactory.builder()
            .addDecorator((factory, generator) -> new FiniteNumbersOnly(generator)).build())
            .enable(SerializationFeature.INDENT_OUTPUT);

    private SolveJsonWriter() {
    }

    /** A new JSON document carrying the program's name and version, as every machine output starts. */
    public static ObjectNode document() {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("program", "exitance");
        root.put("version", Version.get());
        return root;
    }

    public static ObjectNode toJson(SolveResult r, String caseFile, List<String> warnings) {
        return toJson(r, caseFile, warnings, false);
    }

    /**
     * The result as JSON; its pair exchange, when computed, under {@code pairExchange} (and
     * {@code facetPairExchange}), with the conductances when {@code conductance} is set.
     */
    public static ObjectNode toJson(SolveResult r, String caseFile, List<String> warnings, boolean conductance) {
        ObjectNode root = SolveJsonWriter.document();
        root.put("case", caseFile);
        root.put("title", r.title());
        ArrayNode bands = root.putArray("bands");
        for (Band b : r.bands()) {
            edges(bands.addObject(), b);
        }
        root.put("bandOrigin", r.bandOrigin());
        ArrayNode surfaces = root.putArray("surfaces");
        for (SurfaceResult s : r.surfaces()) {
            ObjectNode o = surfaces.addObject();
            o.put("name", s.name());
            o.put("area_m2", s.areaM2());
            o.put("boundary", s.boundary());
            o.put("temperature_K", s.temperatureK());
            o.put("temperatureSolved", s.temperatureSolved());
            o.put("netHeat_W", s.netHeatW());
            o.put("netFlux_W_m2", s.netFluxWPerM2());
            o.put("convection_W", s.convectionW());
            o.put("conduction_W", s.conductionW());
            o.put("wall_W", s.wallW());
            o.put("heatSupplied_W", s.heatSuppliedW());
            ArrayNode sb = o.putArray("bands");
            for (int k = 0; k < r.bands().size(); k++) {
                ObjectNode bo = sb.addObject();
                edges(bo, r.bands().get(k));
                bo.put("netHeat_W", s.bandNetHeatW()[k]);
                bo.put("emissivity", s.bandEmissivity()[k]);
            }
        }
        writePairs(root, "windows", r.windows());
        writePairs(root, "twoSidedSurfaces", r.twoSided());
        if (!r.facets().isEmpty()) {
            ArrayNode fa = root.putArray("facets");
            for (SurfaceResult f : r.facets()) {
                ObjectNode o = fa.addObject();
                o.put("name", f.name());
                o.put("area_m2", f.areaM2());
                o.put("temperature_K", f.temperatureK());
                o.put("netHeat_W", f.netHeatW());
                o.put("netFlux_W_m2", f.netFluxWPerM2());
            }
        }
        EnvironmentResult env = r.environment();
        if (env != null) {
            ObjectNode o = root.putObject("environment");
            o.put("name", env.name());
            o.put("temperature_K", env.temperatureK());
            o.put("netHeat_W", env.netHeatW());
            ArrayNode eb = o.putArray("bands");
            for (int k = 0; k < r.bands().size(); k++) {
                ObjectNode bo = eb.addObject();
                edges(bo, r.bands().get(k));
                bo.put("netHeat_W", env.bandNetHeatW()[k]);
            }
        } else {
            root.putNull("environment");
        }
        ArrayNode src = root.putArray("sources");
        for (var x : r.sources()) {
            ObjectNode o = src.addObject();
            o.put("name", x.name());
            o.put("spectrum", x.spectrum());
            o.put("incident_W", x.incidentW());
            o.put("absorbedOnArrival_W", x.absorbedW());
        }
        PairExchangeWriter.addTo(root, r, conductance);
        root.put("energyBalance_W", r.energyBalanceW());
        root.put("energyBalanceRelative", r.relativeEnergyBalance());
        root.put("crossingHeat_W", r.crossingHeatW());
        root.put("energyScale_W", r.energyScaleW());
        root.put("energyBalanceCloses", r.energyBalanceCloses());
        SolverReport s = r.solver();
        ObjectNode so = root.putObject("solver");
        so.put("linearSolver", s.linearSolver());
        so.put("iterations", s.newtonIterations());
        so.put("propertyIterations", s.propertyIterations());
        so.put("residual_W", s.residualW());
        so.put("lastTemperatureStep_K", s.lastTemperatureStepK());
        so.put("maxLinearIterations", s.maxLinearIterations());
        so.put("maxLinearRelativeResidual", s.maxLinearResidual());
        if (!s.strategy().isEmpty()) {
            so.put("strategy", s.strategy());
            ArrayNode perBand = so.putArray("bandLinearIterations");
            for (int k : s.bandIterations()) {
                perBand.add(k);
            }
            so.put("krylovProducts", s.krylovProducts());
            so.put("operatorPasses", Math.round(s.operatorPasses() * 100) / 100.0);
            so.put("estimatedMemory_B", s.estimatedBytes());
        }
        ArrayNode w = root.putArray("warnings");
        warnings.forEach(w::add);
        root.put("caution", Caution.SHORT);
        return root;
    }

    /** Several load cases: {@code loadCases[] {name, description, result}} with one result each. */
    public static ObjectNode loadCasesToJson(List<LoadCaseResult> results, String caseFile,
                                             List<String> warnings) {
        return loadCasesToJson(results, caseFile, warnings, false);
    }

    /** As above, with the pairs' conductances when {@code conductance} is set. */
    public static ObjectNode loadCasesToJson(List<LoadCaseResult> results, String caseFile,
                                             List<String> warnings, boolean conductance) {
        ObjectNode root = SolveJsonWriter.document();
        root.put("case", caseFile);
        ArrayNode arr = root.putArray("loadCases");
        for (LoadCaseResult r : results) {
            ObjectNode o = arr.addObject();
            o.put("name", r.name());
            o.put("description", r.description());
            ObjectNode inner = toJson(r.result(), caseFile, warnings, conductance);
            inner.remove(List.of("program", "version", "case", "caution", "warnings"));
            o.set("result", inner);
        }
        ArrayNode w = root.putArray("warnings");
        warnings.forEach(w::add);
        root.put("caution", Caution.SHORT);
        return root;
    }

    private static void edges(ObjectNode o, Band b) {
        o.put("lower_um", b.lowerUm());
        if (Double.isInfinite(b.upperUm())) {
            o.putNull("upper_um");
        } else {
            o.put("upper_um", b.upperUm());
        }
    }

    /** Nodes with two faces under {@code key}, when there are any. */
    private static void writePairs(ObjectNode root, String key, List<FacePairResult> pairs) {
        if (pairs.isEmpty()) {
            return;
        }
        ArrayNode arr = root.putArray(key);
        for (FacePairResult w : pairs) {
            ObjectNode o = arr.addObject();
            o.put("face", w.face());
            o.put("otherFace", w.otherFace());
            o.put("temperature_K", w.temperatureK());
            o.put("netHeat_W", w.netHeatW());
            o.put("heatSupplied_W", w.heatSuppliedW());
        }
    }
}
