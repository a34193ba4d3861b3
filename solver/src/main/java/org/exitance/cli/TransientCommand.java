package org.exitance.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.exitance.bands.DefaultBandRule;
import org.exitance.cases.CaseDescription;
import org.exitance.model.BandSet;
import org.exitance.pipeline.PreparedCase;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.TemperatureHistoryPlot;
import org.exitance.report.TransientCsvWriter;
import org.exitance.report.TransientJsonWriter;
import org.exitance.report.TransientTableWriter;
import org.exitance.thermal.CaseSolver;
import org.exitance.timeline.TransientCase;
import org.exitance.timeline.TransientFailedException;
import org.exitance.timeline.TransientResult;
import org.exitance.timeline.TransientRun;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code exitance transient CASE.json}: integrates a case with a time block (docs/transient.md). */
@Command(name = "transient", mixinStandardHelpOptions = true,
        description = {"Integrate a case in time from its initial state (the case's \"time\" block).",
                "Implicit variable-step BDF2 on the band-wise model, heat capacities and layered walls; prints the"
                + " temperatures at the output instants, events, periods and the energy account."},
        footer = {"", "Example: exitance transient cases/demo/furnace-heat-up-lined.json --plot heat-up.png --report out", "",
                ExitCodes.HELP})
final class TransientCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file (with a \"time\" block).")
    private Path caseFile;

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

    @Option(names = "--csv", paramLabel = "FILE.csv", description = "Also write the time series as CSV.")
    private Path csv;

    @Option(names = "--plot", paramLabel = "FILE.png", description = "Also draw temperature against time (PNG).")
    private Path plot;

    @Option(names = {"-q", "--quiet"}, description = "No progress and no warnings on standard error.")
    private boolean quiet;

    @Override
    public Integer call() throws Exception {
        BandSet override = bandEdges.bands(gray);
        if (plot != null && !plot.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".png")) {
            throw new UserError(plot + ": the plot file must end in .png", ExitCodes.BAD_INPUT);
        }
        Path reportFile = report.file(caseFile, "transient");
        for (Path p : new Path[] {output.file(), csv, plot, reportFile}) {
            OutputTarget.check(p, force);
        }
        PreparedCase c = Runs.load(caseFile);
        CaseDescription d = c.description();
        if (d.time() == null) {
            throw new UserError(caseFile + ": $: the case has no \"time\" block (docs/transient.md); solve it with"
                    + " exitance solve", ExitCodes.BAD_INPUT);
        }
        TransientCase tc;
        try {
            tc = new TransientCase(c.model(), d.capacities(), d.drivers(), d.time());
        } catch (IllegalArgumentException e) {
            throw new UserError(caseFile + ": $.time: " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
        BandSet given = CaseSolver.givenBands(c.model(), override);
        BandSet bands = given != null ? given : DefaultBandRule.derive(c.model());
        Progress progress = Progress.onStderr(!quiet, spec.commandLine().getErr(), "time");
        TransientResult r;
        try {
            r = Runs.guarded(c, () -> new TransientRun(tc, bands).run(progress::progress));
        } catch (TransientFailedException e) {
            throw new UserError(caseFile + ": no answer of the stated accuracy: " + e.getMessage(),
                    ExitCodes.NO_CONVERGENCE);
        } finally {
            progress.done();
        }
        PrintStream stdout = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true,
                StandardCharsets.UTF_8);
        if (json.on()) {
            String text = SolveJsonWriter.MAPPER.writeValueAsString(
                    TransientJsonWriter.toJson(r, caseFile.toString(), c.warnings()));
            OutputTarget.write(output.file(), force, stdout, ps -> ps.println(text));
        } else {
            OutputTarget.write(output.file(), force, stdout, ps -> TransientTableWriter.write(r, c.warnings(), ps));
        }
        if (csv != null) {
            OutputTarget.write(csv, force, stdout, ps -> TransientCsvWriter.write(r, ps));
        }
        if (plot != null) {
            OutputTarget.write(plot, force, stdout, ps -> {
                try {
                    TemperatureHistoryPlot.writePng(r, ps);
                } catch (IOException e) {
                    throw new UserError(plot + ": cannot write the plot: " + OutputTarget.problem(e), ExitCodes.BAD_INPUT);
                }
            });
        }
        if (reportFile != null) {
            Reports.write(reportFile, force, org.exitance.report.html.HtmlReport.transientRun(Reports.caseOf(caseFile, c),
                    r));
        }
        if (!quiet && json.on()) {
            c.warnings().forEach(w -> spec.commandLine().getErr().println("exitance: warning: " + w));
        }
        if (d.time().periodic() && !r.repeated()) {
            spec.commandLine().getErr().println("exitance: " + caseFile + ": the run did not repeat within "
                    + r.cycles().size() + " periods (tolerance " + d.time().periodToleranceK() + " K; largest change "
                    + (r.cycles().isEmpty() ? "?" : String.format(Locale.ROOT, "%.3g",
                    r.cycles().get(r.cycles().size() - 1).maxChangeK())) + " K)");
            return ExitCodes.NO_CONVERGENCE;
        }
        return Runs.exitCode(c, spec.commandLine().getErr());
    }
}
