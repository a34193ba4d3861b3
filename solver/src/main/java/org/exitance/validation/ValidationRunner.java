package org.exitance.validation;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.exitance.cases.CaseException;
import org.exitance.pipeline.CasePipeline;
import org.exitance.pipeline.PreparedCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.thermal.CaseSolver;
import org.exitance.thermal.IllPosedCaseException;
import org.exitance.thermal.SolveFailedException;

/**
 * Runs validation cases: each carries reference values from a named published source and a
 * tolerance; the runner solves the case and compares. The command {@code exitance verify} and
 * the test suite both use it, so what engineers see is what the build checks. A case goes through
 * the same pipeline as on the command line ({@link CasePipeline}); its expected values are read
 * after it, so a case with several problems reports the same one here as there.
 */
public final class ValidationRunner {
    private ValidationRunner() {
    }

    /** The validation case files of a directory, sorted by name. */
    public static List<Path> casesIn(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().toList();
        }
    }

    /** Reads, solves and checks one case; never throws for a problem with the case itself. */
    public static CaseVerdict run(Path file) {
        PreparedCase c;
        ExpectedValues ev;
        try {
            c = CasePipeline.prepare(file);
            ev = ExpectedReader.read(c.description());
        } catch (CaseException e) {
            return new CaseVerdict(file, "", "", List.of(), e.getMessage(), Double.NaN);
        }
        if (ev == null) {
            return new CaseVerdict(file, c.model().title(), "", List.of(),
                    "not a validation case: it has no \"expected\" block", Double.NaN);
        }
        SolveResult r;
        try {
            r = CaseSolver.solve(c.model(), null);
        } catch (SolveFailedException e) {
            return new CaseVerdict(file, c.model().title(), ev.source(), List.of(),
                    "no convergence: " + e.getMessage(), Double.NaN);
        } catch (IllPosedCaseException e) {
            return new CaseVerdict(file, c.model().title(), ev.source(), List.of(), e.getMessage(), Double.NaN);
        } catch (RuntimeException e) {
            return new CaseVerdict(file, c.model().title(), ev.source(), List.of(),
                    "the solve failed: " + (e.getMessage() == null ? "an unexpected " + e.getClass().getSimpleName()
                            : e.getMessage()), Double.NaN);
        }
        List<CheckOutcome> out = new ArrayList<>();
        for (Expectation x : ev.values()) {
            double computed = value(r, x);
            double allowed = ev.relativeTolerance() * Math.abs(x.value()) + ev.absoluteTolerance();
            out.add(new CheckOutcome(x.target(), x.quantity(), x.value(), computed, allowed,
                    ev.passes(computed, x.value())));
        }
        return new CaseVerdict(file, c.model().title(), ev.source(), out, null, r.relativeEnergyBalance());
    }

    private static double value(SolveResult r, Expectation x) {
        if (r.environment() != null && r.environment().name().equals(x.target())
                && r.surfaces().stream().noneMatch(s -> s.name().equals(x.target()))) {
            return r.environment().netHeatW();
        }
        SurfaceResult s = r.surface(x.target());
        switch (x.quantity()) {
            case "netHeat_W":
                return s.netHeatW();
            case "netFlux_W_m2":
                return s.netFluxWPerM2();
            case "temperature_K":
                return s.temperatureK();
            default:
                throw new IllegalArgumentException("unknown quantity " + x.quantity());
        }
    }
}
