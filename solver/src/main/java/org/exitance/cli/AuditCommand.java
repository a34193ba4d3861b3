package org.exitance.cli;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.exitance.audit.AuditResult;
import org.exitance.audit.GrayAudit;
import org.exitance.pipeline.PreparedCase;
import org.exitance.model.BandSet;
import org.exitance.model.LoadCase;
import org.exitance.model.RadiationCase;
import org.exitance.report.AuditJsonWriter;
import org.exitance.report.AuditTableWriter;
import org.exitance.report.SolveJsonWriter;
import org.exitance.thermal.CaseSolver;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code exitance audit CASE.json}: where the gray shortcut fails, by how much, and why. */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = {"Compare the band-wise solution with the gray shortcut, surface by surface.",
                "Reports net heat and temperature under each model, the gray error in W, K and %, flags surfaces "
                + "above a threshold and explains each flag by the absorptivity for what the surface receives "
                + "against its emissivity, and the wavelength range that carries the difference."},
        footer = {"", ExitCodes.HELP})
final class AuditCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
    private Path caseFile;

    @Option(names = "--threshold", paramLabel = "PERCENT", defaultValue = "5",
            description = "Flag surfaces whose gray error exceeds this many percent (default ${DEFAULT-VALUE}).")
    private double thresholdPct;

    @Mixin
    private SharedOptions.VfTolerance vfTolerance;

    @Mixin
    private SharedOptions.Json json;

    @Mixin
    private SharedOptions.Output output;

    @Option(names = "--plot", paramLabel = "FILE.png",
            description = "Also draw the models side by side per surface (PNG; one file per load case: NAME-LOADCASE.png).")
    private Path plot;

    @Mixin
    private SharedOptions.Force force;

    @Mixin
    private SharedOptions.Report report;

    @Mixin
    private SharedOptions.BandEdges bandEdges;

    @Mixin
    private SharedOptions.BandTolerance bandTolerance;

    @Option(names = "--load-case", paramLabel = "NAME", description = "Audit only this load case.")
    private String loadCase;

    @Override
    public Integer call() throws Exception {
        if (!(thresholdPct > 0) || !Double.isFinite(thresholdPct)) {
            throw new UserError("--threshold must be a positive number of percent", ExitCodes.BAD_INPUT);
        }
        BandSet override = bandEdges.bands();
        double tolerance = bandTolerance.fraction();
        OutputTarget.check(output.file(), force);
        Path reportFile = report.file(caseFile, "audit");
        OutputTarget.check(reportFile, force);
        PreparedCase c = Runs.load(caseFile, vfTolerance.request());
        RadiationCase base = c.model();
        List<String> names = base.loadCases().stream().map(LoadCase::name).toList();
        if (loadCase != null && !names.contains(loadCase)) {
            throw new UserError(caseFile + ": --load-case: no load case named '" + loadCase + "'", ExitCodes.BAD_INPUT);
        }
        List<AuditResult> audits = Runs.guarded(c, () -> {
            List<AuditResult> out = new ArrayList<>();
            if (base.loadCases().isEmpty()) {
                out.add(GrayAudit.run(base, CaseSolver.solve(base, override, tolerance), thresholdPct, "as given"));
            }
            for (LoadCase lc : base.loadCases()) {
                if (loadCase == null || loadCase.equals(lc.name())) {
                    RadiationCase v = lc.applyTo(base);
                    out.add(GrayAudit.run(v, CaseSolver.solve(v, override, tolerance), thresholdPct, lc.name()));
                }
            }
            return out;
        });
        if (plot != null) {
            if (!plot.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".png")) {
                throw new UserError("--plot: the plot is written as PNG; give a file name ending in .png", ExitCodes.BAD_INPUT);
            }
            for (AuditResult a : audits) {
                Path file = audits.size() == 1 ? plot : plot.resolveSibling(plot.getFileName().toString()
                        .replaceAll("(?i)\\.png$", "") + "-" + a.name().replaceAll("[^A-Za-z0-9_.-]", "_") + ".png");
                OutputTarget.write(file, force, null, ps -> {
                    try {
                        org.exitance.report.AuditPlot.writePng(base.title(), a, ps);
                    } catch (java.io.IOException e) {
                        throw new UserError(file + ": cannot write the plot: " + OutputTarget.problem(e), ExitCodes.BAD_INPUT);
                    }
                });
            }
        }
        if (reportFile != null) {
            Reports.write(reportFile, force, org.exitance.report.html.HtmlReport.audit(Reports.caseOf(caseFile, c),
                    audits));
        }
        PrintStream stdout = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true,
                StandardCharsets.UTF_8);
        if (json.on()) {
            String text = SolveJsonWriter.MAPPER.writeValueAsString(AuditJsonWriter.toJson(caseFile.toString(), audits));
            OutputTarget.write(output.file(), force, stdout, ps -> ps.println(text));
        } else {
            OutputTarget.write(output.file(), force, stdout, ps -> AuditTableWriter.write(base.title(), audits, ps));
        }
        return Runs.exitCode(c, spec.commandLine().getErr());
    }
}
