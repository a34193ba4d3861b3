package org.exitance.result;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.exitance.model.Band;

/**
 * The immutable outcome of a band-wise solve; writers read it, none computes physics.
 *
 * <p>Built in one way only: {@link #builder()} with named setters, then {@link Builder#build()}.
 * A derived copy (relabelled bands, facet results aggregated onto surfaces) starts from
 * {@link #toBuilder()}, changes what differs and builds again; the original is left as it is.
 *
 * <p>Parts (accessors of the same name):
 * <ul>
 *   <li>{@code title}: case title</li>
 *   <li>{@code bands}: the bands used</li>
 *   <li>{@code bandOrigin}: how the bands were chosen</li>
 *   <li>{@code surfaces}: one result per surface, in case order</li>
 *   <li>{@code environment}: the environment's result, or null for a closed enclosure</li>
 *   <li>{@code energyBalanceW}: Σ_i Q_i + Q_env + P_ext (P_ext: power arriving from external
 *       sources); zero for an exact, reciprocal network (W)</li>
 *   <li>{@code energyScaleW}: the power that balance is measured against: Σ_i A_i Σ_k J_ik plus
 *       the environment's emission into the enclosure and P_ext (W)</li>
 *   <li>{@code solver}: convergence report</li>
 *   <li>{@code sources}: external sources and what they delivered (empty when there are none)</li>
 *   <li>{@code windows}: one entry per window: its two faces (both also in {@code surfaces}) and
 *       their totals (empty when there are none)</li>
 *   <li>{@code facets}: for a case solved on facets, every facet's own result, which the
 *       surfaces then aggregate; empty otherwise</li>
 *   <li>{@code pairExchange}: the net heat between every pair of surfaces (and with the environment
 *       and the sources), with its exchange factors, when the solve was asked for it
 *       (thermal.PairExchangeRule); by surface</li>
 *   <li>{@code facetPairExchange}: the same facet by facet, for a case solved on facets when asked for</li>
 * </ul>
 * Lists are unmodifiable copies.
 */
public final class SolveResult {
    private final String title;
    private final List<Band> bands;
    private final String bandOrigin;
    private final List<SurfaceResult> surfaces;
    private final EnvironmentResult environment;
    private final double energyBalanceW;
    private final double energyScaleW;
    private final SolverReport solver;
    private final List<SourceResult> sources;
    private final List<FacePairResult> windows;
    private final List<SurfaceResult> facets;
    private final PairExchange pairExchange;
    private final PairExchange facetPairExchange;

    private SolveResult(Builder b) {
        title = require(b.title, "title");
        bands = List.copyOf(require(b.bands, "bands"));
        bandOrigin = require(b.bandOrigin, "bandOrigin");
        surfaces = List.copyOf(require(b.surfaces, "surfaces"));
        environment = b.environment;
        energyBalanceW = require(b.energyBalanceW, "energyBalanceW");
        energyScaleW = require(b.energyScaleW, "energyScaleW");
        solver = require(b.solver, "solver");
        sources = List.copyOf(b.sources);
        windows = List.copyOf(b.windows);
        facets = List.copyOf(b.facets);
        pairExchange = b.pairExchange;
        facetPairExchange = b.facetPairExchange;
    }

    private static <T> T require(T value, String name) {
        if (value == null) {
            throw new IllegalStateException("SolveResult." + name + " was not set");
        }
        return value;
    }

    /** An empty builder; title, bands, bandOrigin, surfaces, both energies and solver must be set. */
    public static Builder builder() {
        return new Builder();
    }

    /** A builder holding every part of this result, for a derived copy. */
    public Builder toBuilder() {
        return new Builder().title(title).bands(bands).bandOrigin(bandOrigin).surfaces(surfaces)
                .environment(environment).energyBalanceW(energyBalanceW).energyScaleW(energyScaleW).solver(solver)
                .sources(sources).facePairs(windows).facets(facets).pairExchange(pairExchange)
                .facetPairExchange(facetPairExchange);
    }

    public String title() {
        return title;
    }

    public List<Band> bands() {
        return bands;
    }

    public String bandOrigin() {
        return bandOrigin;
    }

    public List<SurfaceResult> surfaces() {
        return surfaces;
    }

    public EnvironmentResult environment() {
        return environment;
    }

    public double energyBalanceW() {
        return energyBalanceW;
    }

    public double energyScaleW() {
        return energyScaleW;
    }

    public SolverReport solver() {
        return solver;
    }

    public List<SourceResult> sources() {
        return sources;
    }

    /** Every node with two faces: windows and two-sided opaque plates, in case order. */
    public List<FacePairResult> facePairs() {
        return windows;
    }

    /** The windows among {@link #facePairs()}. */
    public List<FacePairResult> windows() {
        return windows.stream().filter(FacePairResult::window).toList();
    }

    /** The two-sided opaque plates among {@link #facePairs()}. */
    public List<FacePairResult> twoSided() {
        return windows.stream().filter(w -> !w.window()).toList();
    }

    public List<SurfaceResult> facets() {
        return facets;
    }

    /** The pair exchange by surface (nodes in the order of {@link #surfaces()}), when it was computed. */
    public Optional<PairExchange> pairExchange() {
        return Optional.ofNullable(pairExchange);
    }

    /** The pair exchange facet by facet (nodes in the order of {@link #facets()}), when it was computed. */
    public Optional<PairExchange> facetPairExchange() {
        return Optional.ofNullable(facetPairExchange);
    }

    /**
     * The heat that crosses the enclosure (W): half of Σ_i |Q_i| + |Q_env| + P_ext, i.e. what the
     * sources of heat deliver and the sinks take. The energy balance is measured against it: 323 W
     * of imbalance in a furnace through which 6.4 kW passes is 5 %, however much is emitted and
     * reflected inside. With no net heat anywhere (an isothermal enclosure) it is 0.
     */
    public double crossingHeatW() {
        double s = 0;
        for (SurfaceResult x : surfaces) {
            s += Math.abs(x.netHeatW());
        }
        if (environment != null) {
            s += Math.abs(environment.netHeatW());
        }
        for (SourceResult x : sources) {
            s += x.incidentW();
        }
        return 0.5 * s;
    }

    /**
     * |energy balance| relative to {@link #crossingHeatW()}; where nothing crosses the enclosure
     * (less than 1e-12 of the power in play), relative to the power in play instead.
     */
    public double relativeEnergyBalance() {
        double crossing = crossingHeatW();
        double scale = crossing > 1e-12 * energyScaleW ? crossing : energyScaleW;
        return scale > 0 ? Math.abs(energyBalanceW) / scale : Math.abs(energyBalanceW);
    }

    /** Largest imbalance, relative to the heat crossing the enclosure, that counts as closed. */
    public static final double BALANCE_TOLERANCE = 1e-6;
    /**
     * An imbalance below this fraction of the power in play is the rounding of the band sums (the
     * net heats are differences of emitted and absorbed powers that large); it closes whatever the
     * heat crossing the enclosure, and the net heats are uncertain by about that much.
     */
    public static final double ROUNDING_FLOOR = 1e-9;

    /** @return true if the energy balance closes: within {@link #BALANCE_TOLERANCE} of the crossing heat, or at the rounding floor */
    public boolean energyBalanceCloses() {
        return relativeEnergyBalance() <= BALANCE_TOLERANCE || atRoundingFloor();
    }

    /** @return true if the imbalance is within {@link #ROUNDING_FLOOR} of the power in play */
    public boolean atRoundingFloor() {
        return Math.abs(energyBalanceW) <= ROUNDING_FLOOR * energyScaleW;
    }

    /** The surface result with this name. */
    public SurfaceResult surface(String name) {
        return surfaces.stream().filter(s -> s.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no surface named " + name));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SolveResult r && title.equals(r.title) && bands.equals(r.bands)
                && bandOrigin.equals(r.bandOrigin) && surfaces.equals(r.surfaces)
                && Objects.equals(environment, r.environment)
                && Double.compare(energyBalanceW, r.energyBalanceW) == 0
                && Double.compare(energyScaleW, r.energyScaleW) == 0 && solver.equals(r.solver)
                && sources.equals(r.sources) && windows.equals(r.windows) && facets.equals(r.facets)
                && Objects.equals(pairExchange, r.pairExchange) && Objects.equals(facetPairExchange, r.facetPairExchange);
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, bands, bandOrigin, surfaces, environment, energyBalanceW, energyScaleW, solver,
                sources, windows, facets, pairExchange, facetPairExchange);
    }

    @Override
    public String toString() {
        return "SolveResult[" + title + ", " + bands.size() + " bands, " + surfaces.size() + " surfaces, "
                + facets.size() + " facets, balance " + energyBalanceW + " W of " + energyScaleW + " W]";
    }

    /**
     * Named setters for a {@link SolveResult}. Lists given are copied at {@link #build()} (not
     * modified); sources, windows and facets default to empty, the environment to none (null).
     */
    public static final class Builder {
        private String title;
        private List<Band> bands;
        private String bandOrigin;
        private List<SurfaceResult> surfaces;
        private EnvironmentResult environment;
        private Double energyBalanceW;
        private Double energyScaleW;
        private SolverReport solver;
        private List<SourceResult> sources = List.of();
        private List<FacePairResult> windows = List.of();
        private List<SurfaceResult> facets = List.of();
        private PairExchange pairExchange;
        private PairExchange facetPairExchange;

        private Builder() {
        }

        /** @param v the pair exchange by surface, or null when not computed */
        public Builder pairExchange(PairExchange v) {
            pairExchange = v;
            return this;
        }

        /** @param v the pair exchange by facet, or null when not computed */
        public Builder facetPairExchange(PairExchange v) {
            facetPairExchange = v;
            return this;
        }

        public Builder title(String v) {
            title = v;
            return this;
        }

        public Builder bands(List<Band> v) {
            bands = v;
            return this;
        }

        public Builder bandOrigin(String v) {
            bandOrigin = v;
            return this;
        }

        public Builder surfaces(List<SurfaceResult> v) {
            surfaces = v;
            return this;
        }

        /** @param v the environment's result, or null for a closed enclosure */
        public Builder environment(EnvironmentResult v) {
            environment = v;
            return this;
        }

        public Builder energyBalanceW(double v) {
            energyBalanceW = v;
            return this;
        }

        public Builder energyScaleW(double v) {
            energyScaleW = v;
            return this;
        }

        public Builder solver(SolverReport v) {
            solver = v;
            return this;
        }

        public Builder sources(List<SourceResult> v) {
            sources = Objects.requireNonNull(v, "sources");
            return this;
        }

        public Builder facePairs(List<FacePairResult> v) {
            windows = Objects.requireNonNull(v, "facePairs");
            return this;
        }

        public Builder facets(List<SurfaceResult> v) {
            facets = Objects.requireNonNull(v, "facets");
            return this;
        }

        /** @throws IllegalStateException naming the first required part that was not set */
        public SolveResult build() {
            return new SolveResult(this);
        }
    }
}
