package org.exitance.thermal;

import java.util.List;
import org.exitance.bands.BandLoop;
import org.exitance.bands.BandProperties;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.model.Band;
import org.exitance.model.SolverSettings;
import org.exitance.network.RadiositySolver;

/**
 * The outer loop of a temperature solve: band-mean properties depend on temperature (Planck
 * weighting, ε(λ, T) tables), so they are updated at the temperatures of the last Newton solve
 * until the temperatures stop moving by more than the tolerance.
 */
final class PropertyLoop {
    private final Problem p;
    private final SolverSettings settings;
    private final RadiositySolver linear;
    private final ExternalAbsorption absorption;
    private final SolverChoice choice;

    /**
     * @param linear  the band-solve strategy
     * @param choice  how the Newton step is found (its band-solve strategy is {@code linear})
     */
    PropertyLoop(Problem p, SolverSettings settings, RadiositySolver linear, ExternalAbsorption absorption,
                 SolverChoice choice) {
        this.p = p;
        this.settings = settings;
        this.linear = linear;
        this.absorption = absorption;
        this.choice = choice;
    }

    /** The last band loop of {@link #converge}, whose radiosities warm-start the next loop's solves. */
    private BandLoop last;

    /** The band loop (properties and networks) at temperatures t (K, not modified). */
    BandLoop at(List<Band> bands, double[] t) {
        return BandLoop.prepare(p.radiative, bands, BandProperties.emissivities(p.enc.surfaces(), bands, t), t,
                absorption, linear).warmStartFrom(last);
    }

    /**
     * Converged temperatures with these bands.
     *
     * @param start  starting temperatures (K), not modified
     * @return a new array
     * @throws SolveFailedException when the properties do not settle or Newton fails
     */
    double[] converge(List<Band> bands, double[] start, Counters counters) {
        double[] t = start.clone();
        if (p.unknown.length == 0) {
            counters.propertyIterations = Math.max(counters.propertyIterations, 1);
            return t;
        }
        NewtonIteration newton = new NewtonIteration(p, settings, counters, choice);
        for (int outer = 1; outer <= settings.maxPropertyIterations(); outer++) {
            counters.propertyIterations++;
            double[][] eps = BandProperties.emissivities(p.enc.surfaces(), bands, t);
            Posedness.requireEmission(p, eps);
            BandLoop loop = BandLoop.prepare(p.radiative, bands, eps, t, absorption, linear).warmStartFrom(last);
            last = loop;
            double[] before = t.clone();
            t = newton.solve(loop, t);
            counters.addLinear(loop);
            double move = 0;
            for (int u : p.unknown) {
                move = Math.max(move, Math.abs(t[u] - before[u]));
            }
            if (move == 0 || outer > 1 && move <= settings.temperatureToleranceK()) {
                return t;
            }
            counters.lastOuterMove = move;
        }
        throw new SolveFailedException("band properties did not settle in " + settings.maxPropertyIterations()
                + " updates (last temperature change " + NewtonIteration.fmt(counters.lastOuterMove) + " K)",
                counters.newtonIterations, counters.residualW);
    }
}
