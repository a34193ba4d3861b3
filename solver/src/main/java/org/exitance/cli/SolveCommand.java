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
import org.exitance.thermal.CaseSolver;
import picocli.CommandLine.Command;
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

    @Option(names = "--json", description = "Write the machine-readable result (JSON) instead of tables.")
    private boolean json;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write to FILE instead of standard output (never overwrites without --force).")
    private Path output;

    @Option(names = "--force", description = "Allow --output to replace an existing file.")
    private boolean force;

    @Option(names = "--band-edges", paramLabel = "µm,µm,...",
            description = "Interior band edges in µm, overriding the case and the default rule (e.g. 1.5,3,6).")
    private String bandEdges;

    @Option(names = "--gray", description = "Solve with one band (the gray solution).")
    private boolean gray;

    @Option(names = "--band-tolerance", paramLabel = "PERCENT", defaultValue = "0.1",
            description = "Adaptive bands (used when neither the case nor --band-edges gives bands) stop when no surface "
                    + "changes by more than this percent of the largest |net heat| (default ${DEFAULT-VALUE}).")
    private double bandTolerancePct;

    @Option(names = "--load-case", paramLabel = "NAME",
            description = "Solve only this load case (default: every load case of the case, side by side).")
    private String loadCase;

    @Option(names = "--no-audit", description = "Leave out the gray-body audit section.")
    private boolean noAudit;

    @Option(names = "--threshold", paramLabel = "PERCENT", defaultValue = "5",
            description = "Audit: flag surfaces whose gray error exceeds this many percent (default ${DEFAULT-VALUE}).")
    private double thresholdPct;

    @Option(names = {"-q", "--quiet"}, description = "Do not print warnings on standard error.")
    private boolean quiet;

    @Override
    public Integer call() throws Exception {
        BandSet override = BandOption.parse(bandEdges, gray);
        PreparedCase c = Runs.load(caseFile);
        List<CaseSolver.LoadCaseResult> results = Runs.solveAll(c, override, loadCase,
                Runs.bandTolerance(bandTolerancePct));
        boolean variants = !c.model().loadCases().isEmpty();
        List<AuditResult> audits = noAudit || gray ? List.of() : audit(c, results);
        PrintStream stdout = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true,
                StandardCharsets.UTF_8);
        if (json) {
            com.fasterxml.jackson.databind.node.ObjectNode node = variants
                    ? SolveJsonWriter.loadCasesToJson(results, caseFile.toString(), c.warnings())
                    : SolveJsonWriter.toJson(results.get(0).result(), caseFile.toString(), c.warnings());
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
            String text = SolveJsonWriter.MAPPER.writeValueAsString(node);
            OutputTarget.write(output, force, stdout, ps -> ps.println(text));
            if (!quiet) {
                c.warnings().forEach(w -> spec.commandLine().getErr().println("exitance: warning: " + w));
            }
        } else if (variants) {
            OutputTarget.write(output, force, stdout, ps -> SolveTableWriter.writeLoadCases(results, c.warnings(),
                    AuditTableWriter.summaryLines(audits), ps));
        } else {
            OutputTarget.write(output, force, stdout, ps -> SolveTableWriter.write(results.get(0).result(),
                    c.warnings(), AuditTableWriter.summaryLines(audits), ps));
        }
        return ExitCodes.OK;
    }

    /** The gray-body audit of every solved (load) case, with the bands the solve used. */
    private List<AuditResult> audit(PreparedCase c, List<CaseSolver.LoadCaseResult> results) {
        if (!(thresholdPct > 0) || !Double.isFinite(thresholdPct)) {
            throw new UserError("--threshold must be a positive number of percent", ExitCodes.BAD_INPUT);
        }
        return Runs.guarded(c, () -> {
            List<AuditResult> out = new java.util.ArrayList<>();
            for (CaseSolver.LoadCaseResult r : results) {
                RadiationCase v = c.model().loadCases().stream().filter(lc -> lc.name().equals(r.name())).findFirst()
                        .map(lc -> lc.applyTo(c.model())).orElse(c.model());
                out.add(GrayAudit.run(v, r.result(), thresholdPct, r.name()));
            }
            return out;
        });
    }
}
