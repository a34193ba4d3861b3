package org.exitance.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.exitance.pipeline.ComputedViewFactors;
import org.exitance.pipeline.PreparedCase;
import org.exitance.pipeline.ViewFactorStage;
import org.exitance.report.Numbers;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.TextTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code exitance view-factors CASE.json}: the surface view-factor matrix of a geometry case. */
@Command(name = "view-factors", mixinStandardHelpOptions = true,
        description = {"Compute (or load from the cache) the view factors of a case's geometry.",
                "Prints the surface matrix with closure and reciprocity diagnostics and the methods used; --json or "
                + "--csv FILE for machine use."},
        footer = {"", ExitCodes.HELP})
final class ViewFactorsCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "A case with a \"geometry\" object.")
    private Path caseFile;

    @Mixin
    private SharedOptions.VfTolerance vfTolerance;

    @Mixin
    private SharedOptions.Json json;

    @Option(names = "--csv", paramLabel = "FILE", description = "Also write the surface matrix as CSV to FILE.")
    private Path csv;

    @Mixin
    private SharedOptions.Force force;

    @Option(names = "--no-cache", description = "Compute afresh; neither read nor write the cache beside the case.")
    private boolean noCache;

    @Option(names = {"-q", "--quiet"}, description = "No progress on standard error.")
    private boolean quiet;

    @Override
    public Integer call() throws Exception {
        OutputTarget.check(csv, force);
        Progress progress = Progress.onStderr(!quiet, spec.commandLine().getErr());
        PreparedCase c;
        try {
            c = Runs.load(caseFile, new ViewFactorStage.Request(!noCache, progress, progress::cancelled, vfTolerance.value()));
        } finally {
            progress.done();
        }
        ComputedViewFactors v = c.viewFactors();
        if (v == null) {
            throw new UserError(caseFile + ": $: the case gives its view factors as a matrix; view-factors needs a"
                    + " \"geometry\"", ExitCodes.BAD_INPUT);
        }
        PrintStream stdout = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true,
                StandardCharsets.UTF_8);
        if (csv != null) {
            OutputTarget.write(csv, force, stdout, ps -> writeCsv(v, ps));
        }
        if (json.on()) {
            stdout.println(SolveJsonWriter.MAPPER.writeValueAsString(toJson(v, caseFile, c)));
        } else {
            writeTable(v, c, spec.commandLine().getOut());
        }
        stdout.flush();
        return Runs.exitCode(c, spec.commandLine().getErr());
    }

    private static void writeTable(ComputedViewFactors v, PreparedCase c, PrintWriter out) {
        out.println("View factors F[row → column] of " + v.surfaceNames().size() + " surfaces from " + v.facetCount()
                + " facets" + (v.fromCache() ? " (from the cache)" : String.format(Locale.ROOT, " (%.2f s)", v.seconds())));
        List<String> head = new ArrayList<>();
        head.add("From \\ to");
        head.add("Area m²");
        head.addAll(v.surfaceNames());
        head.add("Leaving");
        head.add("Row sum");
        boolean[] num = new boolean[head.size()];
        java.util.Arrays.fill(num, true);
        num[0] = false;
        TextTable t = new TextTable(head, num);
        for (int i = 0; i < v.surfaceNames().size(); i++) {
            List<String> row = new ArrayList<>();
            row.add(v.surfaceNames().get(i));
            row.add(Numbers.area(v.areasM2()[i]));
            double sum = 0;
            for (double f : v.matrix()[i]) {
                row.add(String.format(Locale.ROOT, "%.6f", f));
                sum += f;
            }
            row.add(String.format(Locale.ROOT, "%.6f", v.environmentFactors()[i]));
            row.add(String.format(Locale.ROOT, "%.8f", sum));
            t.row(row);
        }
        t.render(0).forEach(out::println);
        out.println("  (Leaving: the share that leaves the geometry, to the environment in a solve)");
        out.println();
        out.println("Closure (facet rows" + (v.compressed() ? ", before the scaling" : "") + "): largest |1 − Σ F| "
                + Numbers.small(v.maxRowSumDeviation()) + " (row " + v.worstRow() + "); largest excess above 1 "
                + Numbers.small(v.maxRowSumExcess()) + "; largest reciprocity error "
                + (v.compressed() ? "none (one stored triangle)" : Numbers.small(v.maxReciprocityError())));
        out.println("Error estimate: largest facet row " + Numbers.small(v.maxRowErrorEstimate())
                + (v.compressed() ? " (compression and closure, from exact rows sampled, plus the pairs' own estimates)"
                : " (sum of its pairs' estimates)"));
        out.println("Tolerance " + Numbers.small(c.viewFactorTolerance()) + " on facet rows: "
                + (c.shortfall() == null ? "met" : "NOT met (" + c.shortfall() + ")"));
        out.println("Methods: " + v.methodSummary());
        out.println("Closure enforcement: " + v.smoothing());
        out.println("Geometry hash: " + v.geometryHash().replace("-compressed", " (compressed operator)"));
    }

    private static void writeCsv(ComputedViewFactors v, PrintStream ps) {
        StringBuilder h = new StringBuilder("from");
        v.surfaceNames().forEach(n -> h.append(',').append(n));
        h.append(",leaving");
        ps.println(h);
        for (int i = 0; i < v.surfaceNames().size(); i++) {
            StringBuilder r = new StringBuilder(v.surfaceNames().get(i));
            for (double f : v.matrix()[i]) {
                r.append(',').append(f);
            }
            r.append(',').append(v.environmentFactors()[i]);
            ps.println(r);
        }
    }

    private static ObjectNode toJson(ComputedViewFactors v, Path caseFile, PreparedCase c) {
        ObjectNode root = SolveJsonWriter.MAPPER.createObjectNode();
        root.put("case", caseFile.toString());
        ArrayNode names = root.putArray("surfaces");
        for (int i = 0; i < v.surfaceNames().size(); i++) {
            ObjectNode o = names.addObject();
            o.put("name", v.surfaceNames().get(i));
            o.put("area_m2", v.areasM2()[i]);
            o.put("leaving", v.environmentFactors()[i]);
        }
        ArrayNode m = root.putArray("matrix");
        for (double[] row : v.matrix()) {
            ArrayNode r = m.addArray();
            for (double x : row) {
                r.add(x);
            }
        }
        ObjectNode d = root.putObject("diagnostics");
        d.put("facetCount", v.facetCount());
        d.put("maxRowSumDeviation", v.maxRowSumDeviation());
        d.put("maxRowSumExcess", v.maxRowSumExcess());
        d.put("worstRow", v.worstRow());
        d.put("maxReciprocityError", v.maxReciprocityError());
        d.put("maxRowErrorEstimate", v.maxRowErrorEstimate());
        d.put("tolerance", c.viewFactorTolerance());
        d.put("toleranceMet", c.shortfall() == null);
        d.put("methods", v.methodSummary());
        d.put("closureEnforcement", v.smoothing());
        d.put("geometryHash", v.geometryHash());
        d.put("fromCache", v.fromCache());
        d.put("seconds", v.seconds());
        return root;
    }
}
