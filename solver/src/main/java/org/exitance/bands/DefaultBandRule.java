package org.exitance.bands;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * The band edges Exitance uses when a case names none. The rule, stated once (also in
 * docs/case-format.md):
 *
 * <ol>
 *   <li>If every surface material is gray, one band (the gray solution is then exact).</li>
 *   <li>Planck edges: for the lowest and the highest temperature in the case (fixed surface
 *       temperatures, initial guesses, the environment if above 0 K, blackbody sources, and for a
 *       tabulated source the temperature whose Wien peak matches the spectrum's peak), the
 *       wavelengths where
 *       λT = 1,500, 2,500, 4,000, 7,000 and 15,000 µm·K (blackbody fractions about 1.4 %, 16 %,
 *       48 %, 81 % and 97 %).</li>
 *   <li>Property edges: every node of every non-gray property table (emissivity, and a window's
 *       transmissivity and reflectivity) that lies where the case's
 *       Planck curves carry energy, λ in [500 µm·K / T_max, 50,000 µm·K / T_min].</li>
 *   <li>Planck edges are rounded to 4 significant digits; property edges are kept exactly, so a
 *       step in a table coincides with a band edge.</li>
 *   <li>Edges closer than 8 % to the previous kept edge (ratio below 1.08) are dropped,
 *       scanning from short to long wavelength; at most {@value #MAX_EDGES} edges remain
 *       (every other edge is dropped until they fit).</li>
 * </ol>
 */
public final class DefaultBandRule {
    /** Most interior edges the rule produces. */
    public static final int MAX_EDGES = 48;
    private static final double[] PLANCK_LAMBDA_T_UM_K = {1500, 2500, 4000, 7000, 15000};
    private static final double MIN_RATIO = 1.08;

    private DefaultBandRule() {
    }

    /** Derives the default band set for a case. */
    public static BandSet derive(RadiationCase c) {
        List<EnclosureSurface> surfaces = c.enclosure().surfaces();
        boolean allGray = surfaces.stream().allMatch(s -> s.material().isGray());
        if (allGray) {
            return BandSet.gray("default rule: every surface is gray");
        }
        double tMin = Double.POSITIVE_INFINITY;
        double tMax = 0;
        for (EnclosureSurface s : surfaces) {
            if (s.boundary() instanceof BoundaryCondition.FixedTemperature ft) {
                tMin = Math.min(tMin, ft.temperatureK());
                tMax = Math.max(tMax, ft.temperatureK());
            }
            if (Double.isFinite(s.initialTemperatureK())) {
                tMin = Math.min(tMin, s.initialTemperatureK());
                tMax = Math.max(tMax, s.initialTemperatureK());
            }
        }
        for (ExternalSource src : c.sources()) {
            double ts = src.spectrum() instanceof BlackbodySource bb ? bb.temperatureK()
                    : PhysicalConstants.WIEN_UM_K / peakWavelengthUm((SourceSpectrum) src.spectrum());
            tMin = Math.min(tMin, ts);
            tMax = Math.max(tMax, ts);
        }
        if (c.enclosure().environment() != null && c.enclosure().environment().temperatureK() > 0) {
            tMin = Math.min(tMin, c.enclosure().environment().temperatureK());
            tMax = Math.max(tMax, c.enclosure().environment().temperatureK());
        }
        if (!(tMax > 0)) {
            tMin = tMax = 300; // no temperature known yet: room temperature sets the scale
        }
        TreeSet<Double> edges = new TreeSet<>();
        for (double x : PLANCK_LAMBDA_T_UM_K) {
            edges.add(round4(x / tMax));
            edges.add(round4(x / tMin));
        }
        double lo = 500 / tMax;
        double hi = 50000 / tMin;
        for (EnclosureSurface s : surfaces) {
            for (SpectralEmissivity e : new SpectralEmissivity[] {s.material().emissivity(),
                    s.material().transmissivity()}) {
                if (e != null && !e.isGray()) {
                    for (double w : e.breakpointsUm()) {
                        if (w >= lo && w <= hi) {
                            edges.add(w);
                        }
                    }
                }
            }
        }
        List<Double> kept = new ArrayList<>();
        for (double e : edges) {
            if (kept.isEmpty() || e / kept.get(kept.size() - 1) >= MIN_RATIO) {
                kept.add(e);
            }
        }
        while (kept.size() > MAX_EDGES) {
            List<Double> thinner = new ArrayList<>();
            for (int i = 0; i < kept.size(); i += 2) {
                thinner.add(kept.get(i));
            }
            kept = thinner;
        }
        double[] out = kept.stream().mapToDouble(Double::doubleValue).toArray();
        return new BandSet(out, "default rule (Planck and property edges)");
    }

    /** Wavelength of the largest sample of a tabulated spectrum (µm). */
    private static double peakWavelengthUm(SourceSpectrum s) {
        double[] w = s.wavelengthUm();
        double[] g = s.irradianceWM2PerUm();
        int best = 0;
        for (int i = 1; i < g.length; i++) {
            if (g[i] > g[best]) {
                best = i;
            }
        }
        return w[best];
    }

    /** Rounds Planck edges to 4 significant digits so printed edges are the edges used. */
    private static double round4(double v) {
        return Double.parseDouble(String.format(java.util.Locale.ROOT, "%.4g", v));
    }
}
