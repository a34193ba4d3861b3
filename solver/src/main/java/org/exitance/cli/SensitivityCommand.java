package org.exitance.cli;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.exitance.pipeline.PreparedCase;
import org.exitance.model.BandSet;
import org.exitance.model.LoadCase;
import org.exitance.model.RadiationCase;
import org.exitance.thermal.CaseSolver;
import org.exitance.sensitivity.EmissivitySensitivities;
import org.exitance.sensitivity.TangentLinear;
import org.exitance.sensitivity.UncertaintyPropagation;
import org.exitance.report.SensitivityWriter;
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
    private SharedOptions.VfTolerance vfTolerance;

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
        PreparedCase c = Runs.load(caseFile, vfTolerance.request());
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
        EmissivitySensitivities s = Runs.guarded(c, () -> TangentLinear.compute(model,
                CaseSolver.bandsFor(model, override)));
        UncertaintyPropagation.Ranking ranking = UncertaintyPropagation.of(model, s, i, temperature);
        PrintStream out = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true, StandardCharsets.UTF_8);
        SensitivityWriter.Study study = new SensitivityWriter.Study(caseFile.toString(), surface, temperature,
                model.loadCases().isEmpty() && loadCase == null ? null : loadCase);
        if (json.on()) {
            SensitivityWriter.json(study, s, ranking, out);
        } else {
            SensitivityWriter.table(study, s, ranking, top, out);
        }
        return Runs.exitCode(c, spec.commandLine().getErr());
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
}
