package org.exitance.result;

import java.util.List;
import org.exitance.model.Band;

/**
 * The immutable outcome of a band-wise solve; writers read it, none computes physics.
 *
 * @param title              case title
 * @param bands              the bands used
 * @param bandOrigin         how the bands were chosen
 * @param surfaces           one result per surface, in case order
 * @param environment        the environment's result, or null for a closed enclosure
 * @param energyBalanceW     Σ_i Q_i + Q_env + P_ext (P_ext: power arriving from external sources):
 *                           zero for an exact, reciprocal network (W)
 * @param energyScaleW       the power that balance is measured against: Σ_i A_i Σ_k J_ik plus the
 *                           environment's emission into the enclosure and P_ext (W)
 * @param solver             convergence report
 * (windows: window pairs; facets: for a case solved on facets, every facet's own result; the
 * surfaces then aggregate them)
 * @param sources            external sources and what they delivered
 * @param windows            one entry per window: its two faces (both also in {@code surfaces}) and their totals
 */
public record SolveResult(String title, List<Band> bands, String bandOrigin, List<SurfaceResult> surfaces,
                          EnvironmentResult environment, double energyBalanceW, double energyScaleW,
                          SolverReport solver, List<SourceResult> sources, List<WindowResult> windows,
                          List<SurfaceResult> facets) {

    /** A result solved on the case's own surfaces (no facet detail). */
    public SolveResult(String title, List<Band> bands, String bandOrigin, List<SurfaceResult> surfaces,
                       EnvironmentResult environment, double energyBalanceW, double energyScaleW,
                       SolverReport solver, List<SourceResult> sources, List<WindowResult> windows) {
        this(title, bands, bandOrigin, surfaces, environment, energyBalanceW, energyScaleW, solver, sources, windows,
                List.of());
    }

    /** A result without windows. */
    public SolveResult(String title, List<Band> bands, String bandOrigin, List<SurfaceResult> surfaces,
                       EnvironmentResult environment, double energyBalanceW, double energyScaleW,
                       SolverReport solver, List<SourceResult> sources) {
        this(title, bands, bandOrigin, surfaces, environment, energyBalanceW, energyScaleW, solver, sources, List.of());
    }

    public SolveResult {
        facets = List.copyOf(facets);
        bands = List.copyOf(bands);
        surfaces = List.copyOf(surfaces);
        sources = List.copyOf(sources);
        windows = List.copyOf(windows);
    }

    /** |energy balance| relative to the scale. */
    public double relativeEnergyBalance() {
        return energyScaleW > 0 ? Math.abs(energyBalanceW) / energyScaleW : Math.abs(energyBalanceW);
    }

    /** The surface result with this name. */
    public SurfaceResult surface(String name) {
        return surfaces.stream().filter(s -> s.name().equals(name)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no surface named " + name));
    }
}
