package org.exitance.cli;

import java.nio.file.Path;
import org.exitance.cases.CaseException;
import org.exitance.pipeline.CasePipeline;
import org.exitance.pipeline.PreparedCase;
import org.exitance.pipeline.ViewFactorStage;
import org.exitance.model.BandSet;
import org.exitance.model.MemoryBudget;
import org.exitance.network.NetworkConvergenceException;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.thermal.CaseSolver;
import org.exitance.thermal.IllPosedCaseException;
import org.exitance.thermal.SolveCancelledException;
import org.exitance.thermal.SolveFailedException;
import org.exitance.thermal.TemperatureSolver;
import org.exitance.validation.ExpectedReader;

/** Reading and solving with failures turned into one-line user errors naming the file. */
final class Runs {
    private Runs() {
    }

    /** Reads and prepares a case, with the view-factor cache on. */
    static PreparedCase load(Path file) throws CaseException {
        return load(file, ViewFactorStage.Request.DEFAULT);
    }

    /**
     * Reads and prepares a case ({@link CasePipeline}); a validation case's expected values are
     * checked too, so every command rejects a bad {@code expected} block alike.
     */
    static PreparedCase load(Path file, ViewFactorStage.Request request) throws CaseException {
        PreparedCase c = CasePipeline.prepare(file, request);
        ExpectedReader.read(c.description());
        return c;
    }

    /**
     * The exit code of a command that printed its results: 0, or 3 with the shortfall on
     * standard error when the view factors miss the case's view-factor tolerance.
     */
    static int exitCode(PreparedCase c, java.io.PrintWriter err) {
        if (c.shortfall() == null) {
            return ExitCodes.OK;
        }
        err.println("exitance: " + c.file() + ": " + c.shortfall());
        err.flush();
        return ExitCodes.NO_CONVERGENCE;
    }

    /** Checks what can be known without solving: that the problem is posed at all. */
    static void preflight(PreparedCase c) {
        try {
            TemperatureSolver.checkPosed(c.model().enclosure());
        } catch (IllPosedCaseException e) {
            throw new UserError(c.file() + ": " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
    }

    static SolveResult solve(PreparedCase c, BandSet override) {
        return guarded(c, () -> CaseSolver.solve(c.model(), override));
    }

    /** Every load case (or the one named), or the case as given when it has none. */
    static java.util.List<LoadCaseResult> solveAll(PreparedCase c, BandSet override, String only,
                                                   double bandTolerance) {
        return solveAll(c, override, only, bandTolerance, null);
    }

    /** As above, with the linear algebra named by {@code --solver} (null: the default rule). */
    static java.util.List<LoadCaseResult> solveAll(PreparedCase c, BandSet override, String only,
                                                   double bandTolerance, org.exitance.thermal.SolverChoice choice) {
        return solveAll(c, override, only, bandTolerance, choice, org.exitance.thermal.PairExchangeRule.NONE);
    }

    /** As above, with the pair exchange when {@code pairs} asks for it. */
    static java.util.List<LoadCaseResult> solveAll(PreparedCase c, BandSet override, String only,
                                                   double bandTolerance, org.exitance.thermal.SolverChoice choice,
                                                   org.exitance.thermal.PairExchangeRule pairs) {
        java.util.List<String> names = c.model().loadCases().stream().map(org.exitance.model.LoadCase::name).toList();
        if (only != null && !names.contains(only)) {
            throw new UserError(c.file() + ": --load-case: no load case named '" + only + "'"
                    + (names.isEmpty() ? " (the case has none)" : " (the case has: " + String.join(", ", names) + ")"),
                    ExitCodes.BAD_INPUT);
        }
        requireDenseWhereNeeded(c, choice, pairs);
        if (choice == org.exitance.thermal.SolverChoice.ITERATIVE && c.model().enclosure().hasWindows()) {
            throw new UserError(c.file() + ": --solver iterative: the enclosure has windows, whose coupling conjugate"
                    + " gradients cannot solve (use direct or newton-krylov)", ExitCodes.BAD_INPUT);
        }
        return guarded(c, () -> CaseSolver.solveAll(c.model(), override, only, bandTolerance, choice, pairs));
    }

    /**
     * A model whose facet view factors are held compressed has no N×N matrix: only the iterative
     * solver works on it, and the pair exchange (built from dense Gebhart factors) does not exist.
     */
    static void requireDenseWhereNeeded(PreparedCase c, org.exitance.thermal.SolverChoice choice,
                                        org.exitance.thermal.PairExchangeRule pairs) {
        if (c.model().enclosure().matrix().isDense()) {
            return;
        }
        if (choice != null && choice != org.exitance.thermal.SolverChoice.ITERATIVE) {
            throw new UserError(c.file() + ": --solver " + choice.label() + ": the facet view factors are held"
                    + " compressed (geometry.options.storage), which only the iterative solver can use", ExitCodes.BAD_INPUT);
        }
        if (pairs == org.exitance.thermal.PairExchangeRule.SURFACES || pairs == org.exitance.thermal.PairExchangeRule.FACETS) {
            throw new UserError(c.file() + ": --exchange: the pair exchange needs the dense facet view factors, and this"
                    + " model holds them compressed (geometry.options.storage; use --exchange auto or off)",
                    ExitCodes.BAD_INPUT);
        }
    }

    static <T> T guarded(PreparedCase c, java.util.function.Supplier<T> work) {
        try {
            return work.get();
        } catch (IllPosedCaseException e) {
            throw new UserError(c.file() + ": " + e.getMessage(), ExitCodes.BAD_INPUT);
        } catch (SolveFailedException e) {
            throw new UserError(c.file() + ": no convergence: " + e.getMessage() + " (after " + e.iterations()
                    + " Newton iterations, residual " + String.format(java.util.Locale.ROOT, "%.3g", e.residualW())
                    + " W); no result reported", ExitCodes.NO_CONVERGENCE);
        } catch (MemoryBudget.Exceeded e) {
            throw new UserError(c.file() + ": " + e.getMessage(), ExitCodes.BAD_INPUT);
        } catch (NetworkConvergenceException e) {
            throw new UserError(c.file() + ": no convergence in a band's radiosity solve: " + e.getMessage()
                    + "; no result reported", ExitCodes.NO_CONVERGENCE);
        } catch (SolveCancelledException e) {
            throw new UserError(c.file() + ": interrupted (Ctrl-C): the solve stopped; no result written",
                    ExitCodes.INTERRUPTED);
        }
    }
}
