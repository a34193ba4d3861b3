package org.exitance.cli;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.exitance.pipeline.PreparedCase;
import org.exitance.model.BandSet;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.SolveTableWriter;
import org.exitance.audit.AuditResult;
import org.exitance.audit.GrayAudit;
import org.exitance.model.RadiationCase;
import org.exitance.report.AuditJsonWriter;
import org.exitance.report.AuditTableWriter;
import org.exitance.result.LoadCaseResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code exitance solve CASE.json}: band-wise solve, table or JSON. */
@Command(name = "solve", mixinStandardHelpOptions = true,
        description = {"Solve a case band by band.",
                "Prints net heat and flux of every surface, solved temperatures, the per-band split and the "
                + "energy balance; --json for the machine-readable result."},
        footer = {"", ExitCodes.HELP})
final class SolveCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
    private Path caseFile;

    @Mixin
    private SharedOptions.VfTolerance vfTolerance;

    @Mixin
    private SharedOptions.Json json;

    @Mixin
    private SharedOptions.Output output;

    @Mixin
    private SharedOptions.Force force;

    @Mixin
    private SharedOptions.Report report;

    @Mixin
    private SharedOptions.BandEdges bandEdges;

    @Mixin
    private SharedOptions.Gray gray;

    @Mixin
    private SharedOptions.BandTolerance bandTolerance;

    @Option(names = "--load-case", paramLabel = "NAME",
            description = "Solve only this load case (default: every load case of the case, side by side).")
    private String loadCase;

    @Option(names = "--no-audit", description = "Leave out the gray-body audit section.")
    private boolean noAudit;

    @Option(names = "--threshold", paramLabel = "PERCENT", defaultValue = "5",
            description = "Audit: flag surfaces whose gray error exceeds this many percent (default ${DEFAULT-VALUE}).")
    private double thresholdPct;

    @Option(names = "--solver", paramLabel = "METHOD",
            description = "Linear algebra: direct (LU per band, blocked Jacobian), newton-krylov (LU per band,"
                    + " GMRES Newton steps) or iterative (conjugate gradients per band, GMRES Newton steps)."
                    + " Default: chosen by size and bands (docs/theory.md).")
    private String solver;

    @Option(names = {"-q", "--quiet"}, description = "Do not print warnings or progress on standard error.")
    private boolean quiet;

    @Mixin
    private ExportOptions exports;

    @Override
    public Integer call() throws Exception {
        BandSet override = bandEdges.bands(gray);
        OutputTarget.check(output.file(), force);
        Path reportFile = report.file(caseFile, "solve");
        OutputTarget.check(reportFile, force);
        exports.checkFiles(force);
        PreparedCase c = Runs.load(caseFile, vfTolerance.request());
        exports.check(c, force);
        org.exitance.thermal.SolverChoice choice;
        try {
            choice = solver == null ? null : org.exitance.thermal.SolverChoice.of(solver);
        } catch (IllegalArgumentException e) {
            throw new UserError("--solver: " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
        List<LoadCaseResult> results;
        List<AuditResult> audits;
        try (SolveProgress progress = SolveProgress.onStderr(!quiet, spec.commandLine().getErr())) {
            results = Runs.solveAll(c, override, loadCase, bandTolerance.fraction(), choice, exports.rule());
            audits = noAudit || gray.on() ? List.of() : audit(c, results);
        }
        boolean variants = !c.model().loadCases().isEmpty();
        if (reportFile != null) {
            Reports.write(reportFile, force, org.exitance.report.html.HtmlReport.solve(Reports.caseOf(caseFile, c),
                    results, audits));
        }
        PrintStream stdout = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true,
                StandardCharsets.UTF_8);
        if (json.on()) {
            com.fasterxml.jackson.databind.node.ObjectNode node = variants
                    ? SolveJsonWriter.loadCasesToJson(results, caseFile.toString(), c.warnings(), exports.conductance())
                    : SolveJsonWriter.toJson(results.get(0).result(), caseFile.toString(), c.warnings(),
                    exports.conductance());
            if (!audits.isEmpty()) {
                var arr = AuditJsonWriter.toJson(caseFile.toString(), audits).get("audits");
                if (variants) {
                    for (int i = 0; i < arr.size(); i++) {
                        ((com.fasterxml.jackson.databind.node.ObjectNode) node.get("loadCases").get(i)).set("audit", arr.get(i));
                    }
                } else {
                    node.set("audit", arr.get(0));
                }
            }
            if (c.viewFactors() != null) {
                com.fasterxml.jackson.databind.node.ObjectNode vf = node.putObject("viewFactorAccuracy");
                vf.put("tolerance", c.viewFactorTolerance());
                vf.put("toleranceMet", c.shortfall() == null);
                vf.put("maxRowErrorEstimate", c.viewFactors().maxRowErrorEstimate());
                vf.put("maxRowSumDeviation", c.viewFactors().maxRowSumDeviation());
            }
            String text = SolveJsonWriter.MAPPER.writeValueAsString(node);
            OutputTarget.write(output.file(), force, stdout, ps -> ps.println(text));
            if (!quiet) {
                // the view-factor shortfall, if any, is the one line of exit code 3 (Runs.exitCode)
                c.warnings().stream().filter(w -> !w.equals(c.shortfall()))
                        .forEach(w -> spec.commandLine().getErr().println("exitance: warning: " + w));
            }
        } else {
            List<String> extra = new java.util.ArrayList<>();
            if (c.viewFactors() != null && c.shortfall() == null) {
                extra.add("View factors: within the tolerance " + org.exitance.report.Numbers.small(c.viewFactorTolerance())
                        + " on facet rows (estimated error " + org.exitance.report.Numbers.small(
                        c.viewFactors().maxRowErrorEstimate()) + ")");
            }
            extra.addAll(AuditTableWriter.summaryLines(audits));
            if (variants) {
                OutputTarget.write(output.file(), force, stdout, ps -> SolveTableWriter.writeLoadCases(results, c.warnings(),
                        extra, exports.conductance(), ps));
            } else {
                OutputTarget.write(output.file(), force, stdout, ps -> SolveTableWriter.write(results.get(0).result(),
                        c.warnings(), extra, exports.conductance(), ps));
            }
        }
        exports.write(c, results, force);
        return Runs.exitCode(c, spec.commandLine().getErr());
    }

    /** The gray-body audit of every solved (load) case, with the bands the solve used. */
    private List<AuditResult> audit(PreparedCase c, List<LoadCaseResult> results) {
        if (!(thresholdPct > 0) || !Double.isFinite(thresholdPct)) {
            throw new UserError("--threshold must be a positive number of percent", ExitCodes.BAD_INPUT);
        }
        return Runs.guarded(c, () -> {
            List<AuditResult> out = new java.util.ArrayList<>();
            for (LoadCaseResult r : results) {
                RadiationCase v = c.model().loadCases().stream().filter(lc -> lc.name().equals(r.name())).findFirst()
                        .map(lc -> lc.applyTo(c.model())).orElse(c.model());
                out.add(GrayAudit.run(v, r.result(), thresholdPct, r.name()));
            }
            return out;
        });
    }
}
