package org.exitance.cli;

import java.nio.file.Path;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseReader;
import org.exitance.cases.LoadedCase;
import org.exitance.model.BandSet;
import org.exitance.network.NetworkConvergenceException;
import org.exitance.result.SolveResult;
import org.exitance.thermal.CaseSolver;
import org.exitance.thermal.IllPosedCaseException;
import org.exitance.thermal.SolveFailedException;
import org.exitance.thermal.TemperatureSolver;

/** Reading and solving with failures turned into one-line user errors naming the file. */
final class Runs {
    private Runs() {
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
        try {
            return CaseSolver.solve(c.model(), override);
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
