package org.exitance.thermal;

import java.util.List;
import java.util.Objects;
import org.exitance.bands.BandLoop;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.Enclosure;
import org.exitance.model.RadiationCase;
import org.exitance.network.BandState;
import org.exitance.network.RadiositySolver;
import org.exitance.result.SolveResult;

/**
 * Band-wise radiosity solve with unknown temperatures: the facade over the steps of a solve.
 *
 * <ol>
 *   <li>{@link Posedness}: something fixes the temperature level;</li>
 *   <li>{@link StartingGuess}: given, initial or estimated temperatures;</li>
 *   <li>with several bands and unknown temperatures, a one-band gray solve first (each
 *       surface's total hemispherical emissivity at its temperature) as the starting point;</li>
 *   <li>{@link PropertyLoop}: band properties updated around {@link NewtonIteration} until the
 *       temperatures settle; the linear algebra (band solves and Newton step) is a
 *       {@link SolverChoice}, by default chosen by {@link SolverChoice#forCase} from the size, the
 *       bands and the memory estimate ({@link MemoryEstimate});</li>
 *   <li>the band loop at the converged state ({@link BandLoop}) and {@link ResultAssembler}; a
 *       case solved on facets is reported by surface ({@link FacetAggregation}).</li>
 * </ol>
 *
 * <p>A window is one thermal node with two faces: both carry the node's temperature, its
 * residual adds both faces' net heat (and the convection and links of either face), and its
 * Jacobian column adds both faces' sensitivities.
 */
public final class TemperatureSolver {
    private final RadiationCase radiationCase;
    private final RadiositySolver linear;
    private final SolverChoice choice;
    private final ExternalAbsorption absorption;
    private PairExchangeRule pairs = PairExchangeRule.NONE;

    /** A solver that picks its linear algebra by {@link SolverChoice#forCase} and absorbs by source spectrum. */
    public TemperatureSolver(RadiationCase c) {
        this(c, ExternalAbsorption.SOURCE_SPECTRUM);
    }

    /** A solver with the default linear algebra and the given absorption of external irradiation. */
    public TemperatureSolver(RadiationCase c, ExternalAbsorption absorption) {
        this(c, (SolverChoice) null, absorption);
    }

    /**
     * A solver with the given linear algebra (null: the default rule, {@link SolverChoice#forCase},
     * applied when the bands are known).
     *
     * @throws IllegalArgumentException when the case has windows and the choice is "iterative"
     */
    public TemperatureSolver(RadiationCase c, SolverChoice choice, ExternalAbsorption absorption) {
        if (choice == SolverChoice.ITERATIVE && c.enclosure().hasWindows()) {
            throw new IllegalArgumentException("an enclosure with windows needs a direct radiosity solver"
                    + " (--solver direct or newton-krylov)");
        }
        this.radiationCase = c;
        this.linear = null;
        this.choice = choice;
        this.absorption = Objects.requireNonNull(absorption);
    }

    /** A solver with the given linear strategy, absorbing external irradiation by source spectrum. */
    public TemperatureSolver(RadiationCase c, RadiositySolver linear) {
        this(c, linear, ExternalAbsorption.SOURCE_SPECTRUM);
    }

    /**
     * @param c           the case
     * @param linear      the radiosity strategy
     * @param absorption  how external irradiation (environment, sources) is absorbed
     * @throws IllegalArgumentException when the case has windows and the strategy does not support them
     */
    public TemperatureSolver(RadiationCase c, RadiositySolver linear, ExternalAbsorption absorption) {
        if (c.enclosure().hasWindows() && !linear.supportsWindows()) {
            throw new IllegalArgumentException("an enclosure with windows needs the direct radiosity solver");
        }
        this.radiationCase = c;
        this.linear = linear;
        this.choice = SolverChoice.DIRECT;
        this.absorption = Objects.requireNonNull(absorption);
    }

    /**
     * When this solver computes the pair exchange (default {@link PairExchangeRule#NONE}).
     *
     * @return this solver
     */
    public TemperatureSolver pairExchange(PairExchangeRule rule) {
        this.pairs = Objects.requireNonNull(rule);
        return this;
    }

    /**
     * Solves the case with the given bands.
     *
     * @throws IllPosedCaseException when the case has no solution as posed
     * @throws SolveFailedException  when Newton or the property loop does not converge
     */
    public SolveResult solve(BandSet bandSet) {
        SolveResult r = converge(bandSet).result();
        if (radiationCase.facetGroups() == null) {
            return r;
        }
        return FacetAggregation.bySurface(r, radiationCase.facetGroups(), pairs == PairExchangeRule.FACETS);
    }

    /**
     * Solves the case and keeps the converged state (band networks, temperatures) for the
     * linearisations built on it (sensitivities). The result is per surface of the enclosure
     * (per facet for a case solved on facets, before aggregation), with its pair exchange when the
     * rule ({@link #pairExchange(PairExchangeRule)}) asks for it.
     *
     * @throws IllPosedCaseException when the case has no solution as posed
     * @throws SolveFailedException  when Newton or the property loop does not converge
     */
    public ConvergedState converge(BandSet bandSet) {
        Enclosure enc = radiationCase.enclosure();
        Problem p = new Problem(enc, radiationCase.sources());
        Posedness.requireAnchor(enc);
        return converge(p, bandSet, StartingGuess.temperatures(p, radiationCase.sources()), true);
    }

    /**
     * One solve with extra heat paths of the caller (a time step: each node's storage and its
     * walls' implicit conduction, {@link SurfacePaths}) from the caller's temperatures, without the
     * gray start and without the anchor check (the storage terms fix the level). The result is per
     * surface of the enclosure; {@link SurfaceResult#wallW()} holds the extra paths' heat.
     *
     * @param start  temperatures per surface (K); fixed ones are taken from their conditions; not modified
     * @throws IllPosedCaseException when a node's temperature is undetermined
     * @throws SolveFailedException  when Newton or the property loop does not converge
     */
    public SolveResult solveWith(BandSet bandSet, SurfacePaths paths, double[] start) {
        Problem p = new Problem(radiationCase.enclosure(), radiationCase.sources(), paths);
        double[] t = start.clone();
        for (int i = 0; i < t.length; i++) {
            var bc = radiationCase.enclosure().surface(p.primary[i]).boundary();
            if (bc instanceof org.exitance.model.BoundaryCondition.FixedTemperature f) {
                t[i] = f.temperatureK();
            }
        }
        return converge(p, bandSet, t, false).result();
    }

    private ConvergedState converge(Problem p, BandSet bandSet, double[] start, boolean grayStart) {
        Enclosure enc = radiationCase.enclosure();
        List<Band> bands = bandSet.bands();
        double[] t = start;
        Counters counters = new Counters();
        boolean compressed = !enc.matrix().isDense();
        SolverChoice how = choice != null ? choice : compressed ? SolverChoice.ITERATIVE
                : SolverChoice.forCase(enc.size(), p.unknown.length, bands.size(), enc.hasWindows(),
                        Runtime.getRuntime().maxMemory());
        if (compressed && (how != SolverChoice.ITERATIVE || linear != null)) {
            throw new IllegalArgumentException("the view factors are held compressed: only the iterative solver"
                    + " (conjugate gradients on the operator) can solve this model, not " + how.label());
        }
        RadiositySolver band = linear != null ? linear : how.radiositySolver(enc.size());
        long estimate = compressed
                ? MemoryEstimate.bytes(enc.size(), p.unknown.length, bands.size(), how, enc.matrix().products().memoryBytes())
                : MemoryEstimate.bytes(enc.size(), p.unknown.length, bands.size(), how);
        PeakHeap.reset();
        PropertyLoop properties = new PropertyLoop(p, radiationCase.settings(), band, absorption, how);
        if (grayStart && p.unknown.length > 0 && bands.size() > 1) {
            t = properties.converge(BandSet.gray("gray start").bands(), t, counters);
        }
        t = properties.converge(bands, t, counters);
        BandLoop loop = properties.at(bands, t);
        BandState[] states = loop.solve(t);
        counters.addLinear(loop);
        SolveResult assembled = new ResultAssembler(radiationCase, band.name())
                .assemble(p, bandSet, loop, states, t, counters);
        SolveResult.Builder rb = assembled.toBuilder().solver(assembled.solver().withRun(how.label(),
                counters.bandIterations, counters.krylovProducts, p.radiative.operator.passes(), estimate,
                PeakHeap.bytes()));
        if (pairs.applies(enc.size()) && !compressed) { // the command line refuses an explicit request first
            rb.pairExchange(PairExchangeAssembler.of(p, loop, t));
        }
        SolveResult r = rb.build();
        return new ConvergedState(p, loop, states, t, r);
    }

    /**
     * Rejects an enclosure whose temperature level nothing fixes: every temperature unknown, no
     * environment, and no surface that convects (on an energy-balance condition) to a fluid.
     *
     * @throws IllPosedCaseException when that is so
     */
    public static void checkPosed(Enclosure enc) {
        Posedness.requireAnchor(enc);
    }
}
