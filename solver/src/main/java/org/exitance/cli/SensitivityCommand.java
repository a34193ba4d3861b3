package org.exitance.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.exitance.pipeline.PreparedCase;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.LoadCase;
import org.exitance.model.RadiationCase;
import org.exitance.report.Caution;
import org.exitance.report.Numbers;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.TableFooter;
import org.exitance.report.TextTable;
import org.exitance.thermal.CaseSolver;
import org.exitance.thermal.EmissivitySensitivities;
import org.exitance.thermal.TemperatureSolver;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code exitance sensitivity CASE.json --of SURFACE}: which emissivities matter most. */
@Command(name = "sensitivity", mixinStandardHelpOptions = true,
        description = {"Rank the band emissivities by how much they move one result.",
                "Derivatives of a surface's net heat or temperature with respect to every surface's band-mean "
                + "emissivity (tangent-linear, exact for properties constant inside each band), ranked by effect; "
                + "with ± bounds on materials (\"emissivityUncertainty\"), the propagated uncertainty."},
        footer = {"", ExitCodes.HELP})
final class SensitivityCommand implements Callable<Integer> {
    /** Reference change of ε used to rank when a material states no uncertainty. */
    static final double REFERENCE_CHANGE = 0.01;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
    private Path caseFile;

    @Option(names = "--of", required = true, paramLabel = "SURFACE", description = "The surface whose result is studied.")
    private String surface;

    @Option(names = "--quantity", paramLabel = "net-heat|temperature", defaultValue = "net-heat",
            description = "net-heat (W, default) or temperature (K; for a surface whose temperature is solved).")
    private String quantity;

    @Option(names = "--top", paramLabel = "N", defaultValue = "15", description = "Rows in the ranking (default ${DEFAULT-VALUE}).")
    private int top;

    @Option(names = "--load-case", paramLabel = "NAME", description = "The load case (required when the case has several).")
    private String loadCase;

    @Mixin
    private SharedOptions.BandEdges bandEdges;

    @Mixin
    private SharedOptions.Json json;

    @Override
    public Integer call() throws Exception {
        if (!quantity.equals("net-heat") && !quantity.equals("temperature")) {
            throw new UserError("--quantity must be net-heat or temperature, got '" + quantity + "'", ExitCodes.BAD_INPUT);
        }
        if (top < 1) {
            throw new UserError("--top must be at least 1", ExitCodes.BAD_INPUT);
        }
        PreparedCase c = Runs.load(caseFile);
        RadiationCase model = pick(c);
        int i = model.enclosure().indexOf(surface);
        if (i < 0) {
            throw new UserError(caseFile + ": --of: no surface named '" + surface + "'", ExitCodes.BAD_INPUT);
        }
        boolean temperature = quantity.equals("temperature");
        if (temperature && !model.enclosure().surface(i).boundary().temperatureUnknown()) {
            throw new UserError(caseFile + ": --quantity temperature: the temperature of '" + surface
                    + "' is fixed; study its net-heat", ExitCodes.BAD_INPUT);
        }
        BandSet override = bandEdges.bands();
        EmissivitySensitivities s = Runs.guarded(c, () -> new TemperatureSolver(model)
                .sensitivities(CaseSolver.bandsFor(model, override)));
        List<Band> bands = s.solved().bands();
        double[][] d = temperature ? s.temperature()[i] : s.netHeat()[i];
        double value = temperature ? s.solved().surfaces().get(i).temperatureK() : s.solved().surfaces().get(i).netHeatW();
        String unit = temperature ? "K" : "W";
        List<Row> rows = new ArrayList<>();
        Map<String, Double> byMaterial = new LinkedHashMap<>();
        double rss = 0;
        boolean anyBound = false;
        for (int j = 0; j < d.length; j++) {
            double u = model.enclosure().surface(j).material().emissivityUncertainty();
            for (int k = 0; k < bands.size(); k++) {
                double eps = s.solved().surfaces().get(j).bandEmissivity()[k];
                double change = Double.isNaN(u) ? REFERENCE_CHANGE : u;
                rows.add(new Row(model.enclosure().surface(j).name(), bands.get(k), eps, d[j][k], Math.abs(d[j][k]) * change,
                        !Double.isNaN(u)));
                if (!Double.isNaN(u)) {
                    anyBound = true;
                    rss += Math.pow(d[j][k] * u, 2);
                    byMaterial.merge(model.enclosure().surface(j).material().name(), d[j][k] * u, Double::sum);
                }
            }
        }
        double correlated = Math.sqrt(byMaterial.values().stream().mapToDouble(x -> x * x).sum());
        rows.sort(Comparator.comparingDouble((Row r) -> -r.effect).thenComparing(r -> r.surface));
        List<Row> shown = rows.subList(0, Math.min(top, rows.size()));
        PrintStream out = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true, StandardCharsets.UTF_8);
        if (json.on()) {
            ObjectNode root = SolveJsonWriter.MAPPER.createObjectNode();
            root.put("case", caseFile.toString());
            root.put("surface", surface);
            root.put("quantity", temperature ? "temperature_K" : "netHeat_W");
            root.put("value", value);
            ArrayNode arr = root.putArray("sensitivities");
            for (Row r : rows) {
                ObjectNode o = arr.addObject();
                o.put("surface", r.surface);
                o.put("lower_um", r.band.lowerUm());
                if (Double.isInfinite(r.band.upperUm())) {
                    o.putNull("upper_um");
                } else {
                    o.put("upper_um", r.band.upperUm());
                }
                o.put("emissivity", r.eps);
                o.put("derivative", r.derivative);
                o.put("effect", r.effect);
                o.put("effectFromStatedBound", r.bounded);
            }
            if (anyBound) {
                ObjectNode p = root.putObject("propagatedUncertainty");
                p.put("independentBands", Math.sqrt(rss));
                p.put("correlatedWithinMaterial", correlated);
            }
            root.put("caution", Caution.SHORT);
            out.println(SolveJsonWriter.MAPPER.writeValueAsString(root));
        } else {
            out.println("Sensitivity of the " + (temperature ? "temperature" : "net heat") + " of '" + surface + "' = "
                    + (temperature ? Numbers.temperature(value) : Numbers.power(value)) + " " + unit + " to band-mean"
                    + " emissivities (" + bands.size() + " bands" + (model.loadCases().isEmpty() && loadCase == null ? ""
                    : ", load case " + loadCase) + ")");
            TextTable t = new TextTable(List.of("Rank", "Surface", "Band µm", "ε", "∂/∂ε " + unit, "Effect " + unit, ""),
                    new boolean[] {true, false, false, true, true, true, false});
            int rank = 1;
            for (Row r : shown) {
                t.row(List.of(Integer.toString(rank++), r.surface, Numbers.wavelength(r.band.lowerUm()) + "–"
                        + Numbers.wavelength(r.band.upperUm()), Numbers.ratio(r.eps),
                        String.format(Locale.ROOT, "%.4g", r.derivative), String.format(Locale.ROOT, "%.4g", r.effect),
                        r.bounded ? "± stated" : "± 0.01"));
            }
            t.render(0).forEach(out::println);
            out.println("  (effect: |∂/∂ε| times the material's stated ± bound on ε, or times 0.01 where none is stated)");
            if (anyBound) {
                out.println(String.format(Locale.ROOT, "Propagated uncertainty from stated bounds: ±%.4g %s with independent"
                        + " bands (root-sum-square), ±%.4g %s with each material's error the same in every band",
                        Math.sqrt(rss), unit, correlated, unit));
            }
            TableFooter.write(out);
        }
        return ExitCodes.OK;
    }

    private RadiationCase pick(PreparedCase c) {
        RadiationCase base = c.model();
        if (base.loadCases().isEmpty()) {
            if (loadCase != null) {
                throw new UserError(caseFile + ": --load-case: the case has no load cases", ExitCodes.BAD_INPUT);
            }
            return base;
        }
        List<String> names = base.loadCases().stream().map(LoadCase::name).toList();
        if (loadCase == null || !names.contains(loadCase)) {
            throw new UserError(caseFile + ": --load-case: name one of " + String.join(", ", names), ExitCodes.BAD_INPUT);
        }
        return base.loadCases().get(names.indexOf(loadCase)).applyTo(base);
    }

    private record Row(String surface, Band band, double eps, double derivative, double effect, boolean bounded) {
    }
}
