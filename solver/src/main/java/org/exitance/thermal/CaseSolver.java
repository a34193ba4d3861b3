package org.exitance.thermal;

import org.exitance.bands.DefaultBandRule;
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
}
