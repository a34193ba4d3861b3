package org.exitance.bands;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import java.util.function.Function;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.source.BlackbodySource;

/**
 * Adaptive band refinement. Starts from the default rule's edges and splits, at their geometric
 * middle, the bands where (a) some surface's property varies inside the band (by more than
 * {@value #PROPERTY_STEP}) and (b) the band carries more than {@value #ENERGY_SHARE} of the
 * emission of one of the case's temperatures (surfaces, environment, blackbody sources). After each
 * round it solves again and stops when no surface changes by more than the tolerance: net heat for
 * surfaces at fixed temperature, and σ|ΔT⁴|·A for surfaces whose temperature is solved, against
 * {@code tolerance × max |net heat|}. The change of the last round is reported as the estimated band
 * error (a conservative estimate when refinement converges linearly or faster).
 */
public final class AdaptiveBands {
    /** Default tolerance: 0.1 % of the largest |net heat|. */
    public static final double DEFAULT_TOLERANCE = 1e-3;
    static final double PROPERTY_STEP = 1e-3;
    static final double ENERGY_SHARE = 1e-4;
    static final int MAX_ROUNDS = 8;
    static final int MAX_BANDS = 400;

    /**
     * The outcome of a refinement.
     *
     * @param bands            the final band set
     * @param result           the solve with those bands
     * @param rounds           refinement rounds done
     * @param estimatedErrorW  the largest change of the last round (W)
     * @param converged        whether the tolerance was met (false: stopped at the band or round limit)
     */
    public record Outcome(BandSet bands, SolveResult result, int rounds, double estimatedErrorW, boolean converged) {
    }

    private AdaptiveBands() {
    }

    /**
     * Refines the bands of a case.
     *
     * @param c          the case
     * @param tolerance  stop when no surface changes by more than this fraction of max |net heat|
     * @param solver     solves the case with a band set (the temperature solve; any exception it
     *                   throws passes through)
     */
    public static Outcome refine(RadiationCase c, double tolerance, Function<BandSet, SolveResult> solver) {
        BandSet current = DefaultBandRule.derive(c);
        SolveResult prev = solver.apply(current);
        if (current.size() == 1) {
            return new Outcome(current, prev, 0, 0, true); // every surface gray: one band is exact
        }
        double change = Double.POSITIVE_INFINITY;
        int round = 0;
        boolean converged = false;
        while (round < MAX_ROUNDS) {
            BandSet next = split(c, current, prev);
            if (next.size() == current.size() || next.size() > MAX_BANDS) {
                converged = next.size() == current.size();
                break;
            }
            round++;
            SolveResult res = solver.apply(next);
            change = difference(prev, res);
            current = next;
            prev = res;
            double scale = prev.surfaces().stream().mapToDouble(s -> Math.abs(s.netHeatW())).max().orElse(0);
            if (change <= tolerance * scale) {
                converged = true;
                break;
            }
        }
        double err = Double.isFinite(change) ? change : 0;
        String origin = String.format(java.util.Locale.ROOT, "adaptive: %d refinement rounds, estimated band error %.3g W%s",
                round, err, converged ? "" : " (stopped at the band limit before meeting the tolerance)");
        return new Outcome(new BandSet(current.interiorEdgesUm(), origin), relabel(prev, origin), round, err, converged);
    }

    private static SolveResult relabel(SolveResult r, String origin) {
        return r.toBuilder().bandOrigin(origin).build();
    }

    /** Largest change between two solves, in W (see class doc). */
    static double difference(SolveResult a, SolveResult b) {
        double sigma = org.exitance.spectral.PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
        double d = 0;
        for (int i = 0; i < a.surfaces().size(); i++) {
            SurfaceResult x = a.surfaces().get(i);
            SurfaceResult y = b.surfaces().get(i);
            d = Math.max(d, Math.abs(x.netHeatW() - y.netHeatW()));
            if (x.temperatureSolved()) {
                d = Math.max(d, sigma * x.areaM2() * Math.abs(Math.pow(x.temperatureK(), 4) - Math.pow(y.temperatureK(), 4)));
            }
        }
        return d;
    }

    /** Splits the bands that need it (see class doc); returns the same set when none does. */
    static BandSet split(RadiationCase c, BandSet set, SolveResult solved) {
        List<Double> temps = new ArrayList<>();
        for (SurfaceResult s : solved.surfaces()) {
            temps.add(s.temperatureK());
        }
        if (c.enclosure().environment() != null && c.enclosure().environment().temperatureK() > 0) {
            temps.add(c.enclosure().environment().temperatureK());
        }
        for (ExternalSource src : c.sources()) {
            if (src.spectrum() instanceof BlackbodySource bb) {
                temps.add(bb.temperatureK());
            }
        }
        TreeSet<Double> edges = new TreeSet<>();
        for (double e : set.interiorEdgesUm()) {
            edges.add(e);
        }
        for (Band b : set.bands()) {
            if (carriesEnergy(b, temps, c) && propertyVaries(b, c, temps)) {
                double mid = b.lowerUm() == 0 ? b.upperUm() / 2
                        : Double.isInfinite(b.upperUm()) ? 2 * b.lowerUm() : Math.sqrt(b.lowerUm() * b.upperUm());
                edges.add(mid);
            }
        }
        return new BandSet(edges.stream().mapToDouble(Double::doubleValue).toArray(), set.origin());
    }

    private static boolean carriesEnergy(Band b, List<Double> temps, RadiationCase c) {
        for (double t : temps) {
            if (Planck.bandFraction(b.lowerUm(), b.upperUm(), t) > ENERGY_SHARE) {
                return true;
            }
        }
        for (ExternalSource src : c.sources()) {
            if (src.spectrum().bandFraction(b.lowerUm(), b.upperUm()) > ENERGY_SHARE) {
                return true;
            }
        }
        return false;
    }

    /** Whether some surface's ε or τ changes by more than PROPERTY_STEP across the band. */
    private static boolean propertyVaries(Band b, RadiationCase c, List<Double> temps) {
        double lo = b.lowerUm() == 0 ? Math.min(1e-3, b.upperUm() / 2) : b.lowerUm();
        double hi = Double.isInfinite(b.upperUm()) ? Math.max(1e4, 2 * b.lowerUm()) : b.upperUm();
        for (EnclosureSurface s : c.enclosure().surfaces()) {
            for (SpectralEmissivity e : new SpectralEmissivity[] {s.material().emissivity(), s.material().transmissivity()}) {
                if (e == null || e.isGray()) {
                    continue;
                }
                double t = temps.isEmpty() ? 300 : temps.get(0);
                double min = Math.min(e.at(lo, t), e.at(hi, t));
                double max = Math.max(e.at(lo, t), e.at(hi, t));
                for (double node : e.breakpointsUm()) {
                    if (node > lo && node < hi) {
                        min = Math.min(min, e.at(node, t));
                        max = Math.max(max, e.at(node, t));
                    }
                }
                if (max - min > PROPERTY_STEP) {
                    return true;
                }
            }
        }
        return false;
    }
}
