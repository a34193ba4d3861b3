package org.exitance.sensitivity;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.Band;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.RadiationCase;

/**
 * Ranks the band emissivities by their effect on one result and propagates the materials'
 * stated ± bounds on ε to it, to first order (GUM, JCGM 100:2008, §5.1, law of propagation of
 * uncertainty): root-sum-square over independent bands, and, as the other extreme, with each
 * material's error the same in every band (its band derivatives add before squaring).
 */
public final class UncertaintyPropagation {
    /** Reference change of ε used to rank where a material states no uncertainty. */
    public static final double REFERENCE_CHANGE = 0.01;

    /**
     * One band emissivity's effect.
     *
     * @param surface     the surface whose ε it is
     * @param band        the band
     * @param emissivity  its band-mean ε at the solved state
     * @param derivative  ∂(result)/∂ε (W or K per unit ε)
     * @param effect      |derivative| × the stated bound (or × {@link #REFERENCE_CHANGE})
     * @param bounded     whether the material states a bound
     */
    public record Effect(String surface, Band band, double emissivity, double derivative, double effect,
                         boolean bounded) {
    }

    /**
     * @param effects                   every band emissivity, largest effect first (ties by surface name)
     * @param anyStatedBound            whether some material states a bound
     * @param independentBands          propagated uncertainty, bands independent (W or K)
     * @param correlatedWithinMaterial  propagated uncertainty, each material's error the same in every band
     */
    public record Ranking(List<Effect> effects, boolean anyStatedBound, double independentBands,
                          double correlatedWithinMaterial) {
        public Ranking {
            effects = List.copyOf(effects);
        }
    }

    private UncertaintyPropagation() {
    }

    /**
     * The ranking for surface {@code i}'s net heat or temperature.
     *
     * @param model        the solved case (for materials and their bounds)
     * @param s            its sensitivities
     * @param i            the surface studied
     * @param temperature  true for ∂T_i, false for ∂Q_i
     */
    public static Ranking of(RadiationCase model, EmissivitySensitivities s, int i, boolean temperature) {
        List<Band> bands = s.solved().bands();
        double[][] d = temperature ? s.temperature()[i] : s.netHeat()[i];
        List<Effect> rows = new ArrayList<>();
        Map<String, Double> byMaterial = new LinkedHashMap<>();
        double rss = 0;
        boolean anyBound = false;
        for (int j = 0; j < d.length; j++) {
            EnclosureSurface sj = model.enclosure().surface(j);
            double u = sj.material().emissivityUncertainty();
            for (int k = 0; k < bands.size(); k++) {
                double eps = s.solved().surfaces().get(j).bandEmissivity()[k];
                double change = Double.isNaN(u) ? REFERENCE_CHANGE : u;
                rows.add(new Effect(sj.name(), bands.get(k), eps, d[j][k], Math.abs(d[j][k]) * change, !Double.isNaN(u)));
                if (!Double.isNaN(u)) {
                    anyBound = true;
                    rss += Math.pow(d[j][k] * u, 2);
                    byMaterial.merge(sj.material().name(), d[j][k] * u, Double::sum);
                }
            }
        }
        double correlated = Math.sqrt(byMaterial.values().stream().mapToDouble(x -> x * x).sum());
        rows.sort(Comparator.comparingDouble((Effect r) -> -r.effect()).thenComparing(Effect::surface));
        return new Ranking(rows, anyBound, Math.sqrt(rss), correlated);
    }
}
