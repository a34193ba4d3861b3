package org.exitance.audit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.BandAverages;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.thermal.TemperatureSolver;

/**
 * Where the gray shortcut fails, by how much, and why. The case is solved three ways:
 * <ol>
 *   <li>band-wise with the given (converged) bands: the reference;</li>
 *   <li>gray: one band, each surface's total hemispherical emissivity at its own temperature used
 *       for emission and for absorbing everything, including the environment and sources;</li>
 *   <li>where an external source is present, the common two-band practice: a solar band below
 *       {@value #TWO_BAND_SPLIT_UM} µm absorbed with the source-weighted absorptance, an infrared
 *       band above it.</li>
 * </ol>
 * The cause of a difference is read from the band solution: the gray model emits exactly what the
 * band model emits (ε(T)σT⁴ = Σ_k ε_k E_k), so the difference comes from absorption, and
 * {@code Σ_k (ε_k − ε(T)) G_k} names the bands where the absorbed radiation differs
 * (Siegel &amp; Howell, on the non-gray band-energy method; Modest, Radiative Heat Transfer, 3rd ed.,
 * on the semigray approximation).
 */
public final class GrayAudit {
    /** Edge between the solar and the infrared band of the two-band practice (µm; common practice). */
    public static final double TWO_BAND_SPLIT_UM = 4.0;
    /** Default flagging threshold (%). */
    public static final double DEFAULT_THRESHOLD_PCT = 5.0;

    private GrayAudit() {
    }

    /**
     * @param c            the case (a load case already applied)
     * @param bands        the converged band set of the reference solution
     * @param thresholdPct flagging threshold (%)
     * @param name         label of this audit (load case)
     */
    public static AuditResult run(RadiationCase c, BandSet bands, double thresholdPct, String name) {
        return run(c, new TemperatureSolver(c).solve(bands), thresholdPct, name);
    }

    /**
     * As {@link #run(RadiationCase, BandSet, double, String)} with the reference band-wise solution
     * already at hand (it is not solved again).
     */
    public static AuditResult run(RadiationCase c, SolveResult band, double thresholdPct, String name) {
        SolveResult gray = new TemperatureSolver(c, ExternalAbsorption.OWN_EMISSIVITY)
                .solve(BandSet.gray("gray shortcut"));
        SolveResult two = c.sources().isEmpty() ? null
                : new TemperatureSolver(c).solve(new BandSet(new double[] {TWO_BAND_SPLIT_UM}, "solar + infrared"));
        double maxQ = band.surfaces().stream().mapToDouble(s -> Math.abs(s.netHeatW())).max().orElse(0);
        List<AuditRow> rows = new ArrayList<>();
        for (int i = 0; i < band.surfaces().size(); i++) {
            SurfaceResult b = band.surfaces().get(i);
            SurfaceResult g = gray.surfaces().get(i);
            SurfaceResult t = two == null ? null : two.surfaces().get(i);
            double errW = g.netHeatW() - b.netHeatW();
            double errK = g.temperatureK() - b.temperatureK();
            double pct = b.temperatureSolved() ? 100 * (Math.pow(g.temperatureK() / b.temperatureK(), 4) - 1)
                    : 100 * errW / Math.max(Math.max(Math.abs(b.netHeatW()), 0.01 * maxQ), 1e-9 * band.energyScaleW());
            if (!Double.isFinite(pct)) {
                pct = 0;
            }
            rows.add(new AuditRow(b.name(), b.temperatureSolved(), b.netHeatW(), g.netHeatW(),
                    t == null ? Double.NaN : t.netHeatW(), b.temperatureK(), g.temperatureK(),
                    t == null ? Double.NaN : t.temperatureK(), errW, errK, pct, Math.abs(pct) > thresholdPct,
                    cause(surfaceNamed(c, b.name()), b, band.bands(), nonGray(c))));
        }
        return new AuditResult(name, thresholdPct, rows, band, gray, two);
    }

    /** The enclosure surface of a result row: itself, or for a case solved on facets its first facet. */
    private static EnclosureSurface surfaceNamed(RadiationCase c, String name) {
        int i = c.enclosure().indexOf(name);
        if (i < 0 && c.facetGroups() != null) {
            i = c.enclosure().indexOf(c.facetGroups().facetsBySurface().get(name).get(0));
        }
        return c.enclosure().surface(i);
    }

    /** The case's surfaces (facets reported by their surface) whose emissivity or transmissivity is not gray. */
    private static List<String> nonGray(RadiationCase c) {
        java.util.LinkedHashSet<String> out = new java.util.LinkedHashSet<>();
        for (EnclosureSurface s : c.enclosure().surfaces()) {
            if (!s.material().isGray()) {
                out.add(c.facetGroups() == null ? s.name() : c.facetGroups().surfaceOf(s.name()));
            }
        }
        return List.copyOf(out);
    }

    /**
     * The cause in numbers, from the band solution of one surface.
     *
     * @param nonGray  the case's non-gray surfaces, named when this one is gray
     */
    static GrayCause cause(EnclosureSurface s, SurfaceResult b, List<Band> bands, List<String> nonGray) {
        double eps = BandAverages.totalEmissivity(s.material().emissivity(), b.temperatureK());
        int nb = bands.size();
        double absorbed = 0;
        double incident = 0;
        double[] diff = new double[nb];
        double total = 0;
        for (int k = 0; k < nb; k++) {
            double g = b.bandIncidentW()[k];
            absorbed += b.bandEmissivity()[k] * g;
            incident += g;
            diff[k] = Math.abs((b.bandEmissivity()[k] - eps) * g);
            total += diff[k];
        }
        double alpha = incident > 0 ? absorbed / incident : eps;
        if (s.material().isGray()) {
            List<String> others = nonGray.stream().filter(x -> !x.equals(s.name())).toList();
            return new GrayCause(alpha, eps, 0, Double.POSITIVE_INFINITY, 0, GrayCause.Kind.OTHER_SURFACES, others);
        }
        if (!(total > 0)) {
            return new GrayCause(alpha, eps, 0, Double.POSITIVE_INFINITY, 0, GrayCause.Kind.OWN_SPECTRUM, List.of());
        }
        Integer[] order = new Integer[nb];
        for (int k = 0; k < nb; k++) {
            order[k] = k;
        }
        Arrays.sort(order, Comparator.comparingDouble((Integer k) -> -diff[k]).thenComparingInt(k -> k));
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        double carried = 0;
        for (int k : order) {
            lo = Math.min(lo, bands.get(k).lowerUm());
            hi = Math.max(hi, bands.get(k).upperUm());
            carried += diff[k];
            if (carried >= 0.5 * total) {
                break;
            }
        }
        return new GrayCause(alpha, eps, lo, hi, carried / total, GrayCause.Kind.OWN_SPECTRUM, List.of());
    }
}
