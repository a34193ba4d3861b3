package org.exitance.thermal;

/**
 * When a solve computes its pair exchange ({@link org.exitance.result.PairExchange}).
 * <ul>
 *   <li>{@code NONE}: never;</li>
 *   <li>{@code AUTO}: when the enclosure solved has at most {@link #AUTO_LIMIT} surfaces (or facets,
 *       for a case solved on facets): then its cost, about 5N³ flops and a few N² arrays per band,
 *       is small beside the solve's;</li>
 *   <li>{@code SURFACES}: always, reported by surface;</li>
 *   <li>{@code FACETS}: always, and for a case solved on facets also facet by facet
 *       ({@link org.exitance.result.SolveResult#facetPairExchange()}).</li>
 * </ul>
 * A library caller's default ({@link TemperatureSolver}) is NONE; the command line's is AUTO.
 */
public enum PairExchangeRule {
    NONE, AUTO, SURFACES, FACETS;

    /** Largest enclosure (surfaces or facets) for which AUTO computes the pair exchange. */
    public static final int AUTO_LIMIT = 200;

    /** Whether an enclosure of n surfaces (or facets) gets its pair exchange computed. */
    public boolean applies(int n) {
        return this == SURFACES || this == FACETS || this == AUTO && n <= AUTO_LIMIT;
    }
}
