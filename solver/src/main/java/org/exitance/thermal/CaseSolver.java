package org.exitance.thermal;

import java.util.ArrayList;
import java.util.List;
import org.exitance.bands.AdaptiveBands;
import org.exitance.model.LoadCase;
import org.exitance.model.BandSet;
import org.exitance.model.RadiationCase;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;

/** Chooses the bands for a case and solves it: the one entry point the command line uses. */
public final class CaseSolver {
    private CaseSolver() {
    }

    /**
     * The bands given for a solve: the override if given, else the case's; null when neither
     * gives any (then the solve refines adaptively, see {@link AdaptiveBands}).
     *
     * @param override bands from the command line, or null
     */
    public static BandSet givenBands(RadiationCase c, BandSet override) {
        return override != null ? override : c.bands();
    }

    /** The bands a solve uses: the given ones, or the result of adaptive refinement. */
    public static BandSet bandsFor(RadiationCase c, BandSet override) {
        return bandsFor(c, override, AdaptiveBands.DEFAULT_TOLERANCE);
    }

    /** As {@link #bandsFor(RadiationCase, BandSet)} with a refinement tolerance (fraction of max |Q|). */
    public static BandSet bandsFor(RadiationCase c, BandSet override, double tolerance) {
        BandSet given = givenBands(c, override);
        return given != null ? given : AdaptiveBands.refine(c, tolerance, b -> new TemperatureSolver(c).solve(b)).bands();
    }

    /** Solves with the given bands, or with adaptively refined bands when none are given. */
    public static SolveResult solve(RadiationCase c, BandSet override) {
        return solve(c, override, AdaptiveBands.DEFAULT_TOLERANCE);
    }

    /** As {@link #solve(RadiationCase, BandSet)} with a refinement tolerance (fraction of max |Q|). */
    public static SolveResult solve(RadiationCase c, BandSet override, double tolerance) {
        return solve(c, override, tolerance, null);
    }

    /** As {@link #solve(RadiationCase, BandSet, double)} with the given linear algebra (null: the default rule). */
    public static SolveResult solve(RadiationCase c, BandSet override, double tolerance, SolverChoice choice) {
        return solve(c, override, tolerance, choice, PairExchangeRule.NONE);
    }

    /** As {@link #solve(RadiationCase, BandSet, double, SolverChoice)}, with the pair exchange when the rule asks. */
    public static SolveResult solve(RadiationCase c, BandSet override, double tolerance, SolverChoice choice,
                                    PairExchangeRule pairs) {
        BandSet given = givenBands(c, override);
        java.util.function.Function<BandSet, SolveResult> run = b -> new TemperatureSolver(c, choice,
                org.exitance.bands.ExternalAbsorption.SOURCE_SPECTRUM).pairExchange(pairs).solve(b);
        return given != null ? run.apply(given) : AdaptiveBands.refine(c, tolerance, run).result();
    }

    /**
     * Solves every load case of a case (in case order), or the case as given when it has none
     * (then the single result is named "as given").
     *
     * @param only  solve only the load case with this name, or null for all
     * @throws IllegalArgumentException when {@code only} names no load case
     */
    public static List<LoadCaseResult> solveAll(RadiationCase c, BandSet override, String only) {
        return solveAll(c, override, only, AdaptiveBands.DEFAULT_TOLERANCE);
    }

    /** As {@link #solveAll(RadiationCase, BandSet, String)} with a band refinement tolerance. */
    public static List<LoadCaseResult> solveAll(RadiationCase c, BandSet override, String only, double tolerance) {
        return solveAll(c, override, only, tolerance, null);
    }

    /** As {@link #solveAll(RadiationCase, BandSet, String, double)} with the given linear algebra (null: default). */
    public static List<LoadCaseResult> solveAll(RadiationCase c, BandSet override, String only, double tolerance,
                                                SolverChoice choice) {
        return solveAll(c, override, only, tolerance, choice, PairExchangeRule.NONE);
    }

    /** As {@link #solveAll(RadiationCase, BandSet, String, double, SolverChoice)}, with the pair exchange when the rule asks. */
    public static List<LoadCaseResult> solveAll(RadiationCase c, BandSet override, String only, double tolerance,
                                                SolverChoice choice, PairExchangeRule pairs) {
        if (c.loadCases().isEmpty()) {
            if (only != null) {
                throw new IllegalArgumentException("the case has no load cases, so none is named '" + only + "'");
            }
            return List.of(new LoadCaseResult("as given", "", solve(c, override, tolerance, choice, pairs)));
        }
        List<LoadCaseResult> out = new ArrayList<>();
        for (LoadCase lc : c.loadCases()) {
            if (only == null || only.equals(lc.name())) {
                out.add(new LoadCaseResult(lc.name(), lc.description(), solve(lc.applyTo(c), override, tolerance, choice,
                        pairs)));
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("no load case named '" + only + "' (the case has: "
                    + String.join(", ", c.loadCases().stream().map(LoadCase::name).toList()) + ")");
        }
        return out;
    }
}
