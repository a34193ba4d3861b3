package org.exitance.cli;

import java.nio.file.Path;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseReader;
import org.exitance.cases.LoadedCase;
import org.exitance.model.BandSet;
import org.exitance.network.NetworkConvergenceException;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.thermal.CaseSolver;
import org.exitance.thermal.IllPosedCaseException;
import org.exitance.thermal.SolveFailedException;
import org.exitance.thermal.TemperatureSolver;

/** Reading and solving with failures turned into one-line user errors naming the file. */
final class Runs {
    private Runs() {
    }

    /** A band tolerance given in percent on the command line, as a fraction. */
    static double bandTolerance(double percent) {
        if (!(percent > 0) || !Double.isFinite(percent)) {
            throw new UserError("--band-tolerance must be a positive number of percent", ExitCodes.BAD_INPUT);
        }
        return percent / 100;
    }

    static LoadedCase load(Path file) throws CaseException {
        return CaseReader.read(file);
    }

    /** Checks what can be known without solving: that the problem is posed at all. */
    static void preflight(LoadedCase c) {
        try {
            TemperatureSolver.checkPosed(c.model().enclosure());
        } catch (IllPosedCaseException e) {
            throw new UserError(c.file() + ": " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
    }

    static SolveResult solve(LoadedCase c, BandSet override) {
        return guarded(c, () -> CaseSolver.solve(c.model(), override));
    }

    /** Every load case (or the one named), or the case as given when it has none. */
    static java.util.List<LoadCaseResult> solveAll(LoadedCase c, BandSet override, String only,
                                                   double bandTolerance) {
        java.util.List<String> names = c.model().loadCases().stream().map(org.exitance.model.LoadCase::name).toList();
        if (only != null && !names.contains(only)) {
            throw new UserError(c.file() + ": --load-case: no load case named '" + only + "'"
                    + (names.isEmpty() ? " (the case has none)" : " (the case has: " + String.join(", ", names) + ")"),
                    ExitCodes.BAD_INPUT);
        }
        return guarded(c, () -> CaseSolver.solveAll(c.model(), override, only, bandTolerance));
    }

    static <T> T guarded(LoadedCase c, java.util.function.Supplier<T> work) {
        try {
            return work.get();
        } catch (IllPosedCaseException e) {
            throw new UserError(c.file() + ": " + e.getMessage(), ExitCodes.BAD_INPUT);
        } catch (SolveFailedException e) {
            throw new UserError(c.file() + ": no convergence: " + e.getMessage() + " (after " + e.iterations()
                    + " Newton iterations, residual " + String.format(java.util.Locale.ROOT, "%.3g", e.residualW())
                    + " W); no result reported", ExitCodes.NO_CONVERGENCE);
        } catch (NetworkConvergenceException e) {
            throw new UserError(c.file() + ": no convergence in a band's radiosity solve: " + e.getMessage()
                    + "; no result reported", ExitCodes.NO_CONVERGENCE);
        }
    }
}
