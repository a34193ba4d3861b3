package org.exitance.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.exitance.bench.BenchRun;
import org.exitance.thermal.SolveCancelledException;
import org.exitance.thermal.SolverChoice;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code exitance bench}: times the temperature solve on generated closed boxes (invented data,
 * {@link org.exitance.bench.BoxModels}) from 500 facets up to a chosen size, with 1 and 8 bands
 * and a third of the facets at unknown temperature; prints per size the median time, peak heap,
 * memory estimate, Newton steps and passes over F, and per band count the fitted growth exponent.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = {"Time the temperature solve on generated closed boxes (invented data).",
                "Sizes from 500 facets, doubling, up to --up-to; 1 and 8 bands; a third of the facets at unknown"
                        + " temperature."},
        footer = {"", ExitCodes.HELP})
final class BenchCommand implements Callable<Integer> {
    /** The smallest default size (facets). */
    static final int FIRST = 500;
    /** The size of the untimed warm-up solve (facets). */
    static final int WARM_UP = 216;

    @Spec
    private CommandSpec spec;

    @Option(names = "--up-to", paramLabel = "FACETS", defaultValue = "2000",
            description = "Largest model: sizes 500, 1000, 2000, ... up to this many facets (default ${DEFAULT-VALUE}).")
    private int upTo;

    @Option(names = "--sizes", paramLabel = "LIST", split = ",",
            description = "Exactly these sizes in facets instead (e.g. 500,2000,8000); each is rounded to 6c².")
    private List<Integer> sizes;

    @Option(names = "--bands", paramLabel = "LIST", split = ",", defaultValue = "1,8",
            description = "Band counts to run (default ${DEFAULT-VALUE}).")
    private List<Integer> bands;

    @Option(names = "--runs", paramLabel = "K", defaultValue = "3",
            description = "Runs per size; the median time is reported (default ${DEFAULT-VALUE}).")
    private int runs;

    @Option(names = "--solver", paramLabel = "METHOD",
            description = "direct, newton-krylov or iterative (default: the rule of 'solve').")
    private String solver;

    @Option(names = {"-q", "--quiet"}, description = "No progress on standard error.")
    private boolean quiet;

    @Override
    public Integer call() {
        List<Integer> plan = plan();
        if (bands.stream().anyMatch(b -> b < 1 || b > 64)) {
            throw new UserError("--bands: each band count must be 1 to 64", ExitCodes.BAD_INPUT);
        }
        if (runs < 1 || runs > 101) {
            throw new UserError("--runs: must be 1 to 101", ExitCodes.BAD_INPUT);
        }
        SolverChoice choice;
        try {
            choice = solver == null ? null : SolverChoice.of(solver);
        } catch (IllegalArgumentException e) {
            throw new UserError("--solver: " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
        PrintWriter out = spec.commandLine().getOut();
        long heap = Runtime.getRuntime().maxMemory();
        out.println("Benchmark of the temperature solve on INVENTED models: closed unit-cube boxes with c × c cells a");
        out.println("face and synthetic view factors (reciprocal and closed, not computed from a geometry); every third");
        out.println("facet adiabatic, the others at 400–1200 K; an invented non-gray coating. Heap " + mb(heap)
                + " MB, " + Runtime.getRuntime().availableProcessors() + " processors, " + runs + " run"
                + (runs == 1 ? "" : "s") + " per size.");
        out.println();
        out.printf(Locale.ROOT, "%7s %7s %5s  %-13s %9s %9s %8s %8s %6s %8s %8s %10s%n", "facets", "unknown", "bands",
                "solver", "median_s", "cpu_s", "peak_MB", "est_MB", "newton", "products", "passes", "balance_W");
        try (SolveProgress progress = SolveProgress.onStderr(!quiet, spec.commandLine().getErr())) {
            BenchRun.run(WARM_UP, 2, choice, 2, heap); // compiles the solver's code before anything is timed
            for (int b : bands) {
                List<BenchRun.Point> points = new ArrayList<>();
                for (int size : plan) {
                    BenchRun.Point p = BenchRun.run(size, b, choice, runs, heap);
                    points.add(p);
                    out.println(row(p, heap));
                    out.flush();
                }
                double e = BenchRun.exponent(points);
                out.println(Double.isNaN(e) ? "  " + b + " band" + (b == 1 ? "" : "s")
                        + ": growth exponent needs two measured sizes"
                        : String.format(Locale.ROOT, "  %d band%s: time grows as N^%.2f (least squares over the"
                        + " measured sizes)", b, b == 1 ? "" : "s", e));
            }
        } catch (SolveCancelledException e) {
            throw new UserError("bench: interrupted (Ctrl-C); the sizes above were measured", ExitCodes.INTERRUPTED);
        }
        out.println();
        out.println("peak_MB: the JVM's peak heap during the last run (an upper bound: garbage not yet collected counts);"
                + " est_MB: the estimate made before the solve; passes: products of all N rows of F (any number of"
                + " bands at once); balance_W: the sum of all net heats of the closed box, zero in exact arithmetic.");
        return ExitCodes.OK;
    }

    /** The sizes to run: --sizes, or 500 doubling up to --up-to. */
    private List<Integer> plan() {
        if (sizes != null && spec.commandLine().getParseResult().hasMatchedOption("--up-to")) {
            throw new UserError("--sizes and --up-to: give one of them", ExitCodes.BAD_INPUT);
        }
        List<Integer> plan = new ArrayList<>();
        if (sizes != null) {
            for (int s : sizes) {
                if (s < 6 || s > 1_000_000) {
                    throw new UserError("--sizes: each size must be 6 to 1000000 facets", ExitCodes.BAD_INPUT);
                }
                plan.add(s);
            }
            return plan;
        }
        if (upTo < FIRST || upTo > 1_000_000) {
            throw new UserError("--up-to: must be " + FIRST + " to 1000000 facets", ExitCodes.BAD_INPUT);
        }
        for (long s = FIRST; s <= upTo; s *= 2) {
            plan.add((int) s);
        }
        if (plan.get(plan.size() - 1) < upTo) {
            plan.add(upTo);
        }
        return plan;
    }

    private static String row(BenchRun.Point p, long heap) {
        if (p.skipped()) {
            return String.format(Locale.ROOT, "%7d %7d %5d  %-13s skipped: memory estimate %d MB exceeds the heap %d MB"
                    + " (raise it with EXITANCE_JAVA_OPTS=-Xmx...)", p.facets(), p.unknown(), p.bands(), p.strategy(),
                    mb(p.estimateBytes()), mb(heap));
        }
        return String.format(Locale.ROOT, "%7d %7d %5d  %-13s %9.3f %9.2f %8d %8d %6d %8d %8.1f %10.2e", p.facets(),
                p.unknown(), p.bands(), p.strategy(), p.medianSeconds(), p.cpuSeconds(), mb(p.peakHeapBytes()),
                mb(p.estimateBytes()), p.newtonSteps(), p.products(), p.passes(), p.balanceW());
    }

    private static long mb(long bytes) {
        return bytes >> 20;
    }
}
