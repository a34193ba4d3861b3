package org.exitance.properties;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.Material;
import org.exitance.spectral.BandAverages;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.source.IrradiationSource;

/**
 * Total properties of one material over a range of surface temperatures: ε(T) and, for each
 * source, α(T) and α/ε. Total emissivity: {@link BandAverages#totalEmissivity} (exact for the
 * piecewise-linear models; Siegel &amp; Howell 7th ed. Ch. 3; Incropera 6th ed. Sec. 12.4).
 * Absorptivity: {@link IrradiationSource#absorptivity}. The surface temperature enters α only
 * through a temperature-dependent ε(λ, T).
 *
 * @param material the material
 * @param sources  the sources, in the order of {@link SurveyRow#absorptivity(int)}
 * @param rows     one row per surface temperature, increasing
 */
public record MaterialSurvey(Material material, List<IrradiationSource> sources, List<SurveyRow> rows) {
    public MaterialSurvey {
        sources = List.copyOf(sources);
        rows = List.copyOf(rows);
    }

    /** Computes the survey at the given surface temperatures (K, each &gt; 0). */
    public static MaterialSurvey of(Material material, double[] temperaturesK, List<IrradiationSource> sources) {
        SpectralEmissivity e = material.emissivity();
        List<SurveyRow> rows = new ArrayList<>(temperaturesK.length);
        for (double t : temperaturesK) {
            double[] alpha = new double[sources.size()];
            for (int k = 0; k < alpha.length; k++) {
                alpha[k] = sources.get(k).absorptivity(e, t);
            }
            SpectralEmissivity tau = material.transmissivity();
            if (tau == null) {
                rows.add(new SurveyRow(t, BandAverages.totalEmissivity(e, t), alpha));
                continue;
            }
            double[] tr = new double[sources.size()];
            for (int k = 0; k < tr.length; k++) {
                tr[k] = sources.get(k).absorptivity(tau, t); // the source-weighted mean of τ_λ, as for α_λ
            }
            rows.add(new SurveyRow(t, BandAverages.totalEmissivity(e, t), alpha, BandAverages.totalEmissivity(tau, t),
                    tr));
        }
        return new MaterialSurvey(material, sources, rows);
    }

    /** True when ε does not depend on wavelength: then α = ε for every source. */
    public boolean gray() {
        return material.emissivity().isGray();
    }

    /** True when ε (or a window's τ) depends on temperature. */
    public boolean temperatureDependent() {
        return material.emissivity().dependsOnTemperature()
                || material.transmissivity() != null && material.transmissivity().dependsOnTemperature();
    }
}
