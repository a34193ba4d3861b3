package org.exitance.thermal;

import java.util.ArrayList;
import java.util.List;
import org.exitance.bands.DefaultBandRule;
import org.exitance.model.LoadCase;
import org.exitance.model.BandSet;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;

/** Chooses the bands for a case and solves it: the one entry point the command line uses. */
public final class CaseSolver {
    private CaseSolver() {
    }

    /**
     * The band set a solve will use: the override if given, else the case's, else the default rule.
     *
     * @param override bands from the command line, or null
     */
    public static BandSet bandsFor(RadiationCase c, BandSet override) {
        if (override != null) {
            return override;
        }
        return c.bands() != null ? c.bands() : DefaultBandRule.derive(c);
    }

    /** Solves with {@link #bandsFor}. */
    public static SolveResult solve(RadiationCase c, BandSet override) {
        return new TemperatureSolver(c).solve(bandsFor(c, override));
    }

    /** One solved load case. */
    public record LoadCaseResult(String name, String description, SolveResult result) {
    }

    /**
     * Solves every load case of a case (in case order), or the case as given when it has none
     * (then the single result is named "as given").
     *
     * @param only  solve only the load case with this name, or null for all
     * @throws IllegalArgumentException when {@code only} names no load case
     */
    public static List<LoadCaseResult> solveAll(RadiationCase c, BandSet override, String only) {
        if (c.loadCases().isEmpty()) {
            if (only != null) {
                throw new IllegalArgumentException("the case has no load cases, so none is named '" + only + "'");
            }
            return List.of(new LoadCaseResult("as given", "", solve(c, override)));
        }
        List<LoadCaseResult> out = new ArrayList<>();
        for (LoadCase lc : c.loadCases()) {
            if (only == null || only.equals(lc.name())) {
                out.add(new LoadCaseResult(lc.name(), lc.description(), solve(lc.applyTo(c), override)));
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("no load case named '" + only + "' (the case has: "
                    + String.join(", ", c.loadCases().stream().map(LoadCase::name).toList()) + ")");
        }
        return out;
    }
}
