package org.exitance.bands;

import java.util.List;
import org.exitance.model.Band;
import org.exitance.model.EnclosureSurface;
import org.exitance.spectral.BandAverages;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;

/**
 * Band-mean emissivities and band emissive powers of the surfaces of an enclosure.
 *
 * <p>The band mean of ε is Planck-weighted at the surface's own temperature, so that the band's
 * emission {@code ε_k f_k σT⁴} is exact; the same mean serves for absorption (α_λ = ε_λ for a
 * diffuse surface, Kirchhoff). The error of that shared mean shrinks as bands narrow
 * (Modest, Radiative Heat Transfer, 3rd ed., §5.7; Siegel &amp; Howell, 5th ed., §6.4). A window's
 * band transmissivity is weighted the same way.
 */
public final class BandProperties {
    private BandProperties() {
    }

    /**
     * Band-mean emissivities, [band][surface].
     *
     * @param surfaces      the surfaces
     * @param bands         the bands
     * @param temperatureK  current temperature of each surface (K), not modified
     */
    public static double[][] emissivities(List<EnclosureSurface> surfaces, List<Band> bands, double[] temperatureK) {
        double[][] out = new double[bands.size()][surfaces.size()];
        for (int i = 0; i < surfaces.size(); i++) {
            SpectralEmissivity e = surfaces.get(i).material().emissivity();
            for (int k = 0; k < bands.size(); k++) {
                Band b = bands.get(k);
                out[k][i] = BandAverages.planckMean(e, b.lowerUm(), b.upperUm(), temperatureK[i]);
            }
        }
        return out;
    }

    /**
     * Band-mean transmissivities, [band][surface]: 0 for opaque surfaces; for a window face the
     * mean of τ_λ Planck-weighted at its own temperature, like ε (the band reflectivity is then
     * 1 − ε_k − τ_k, exactly, since the mean is linear in the property).
     *
     * @param temperatureK  current temperature of each surface (K), not modified
     */
    public static double[][] transmissivities(List<EnclosureSurface> surfaces, List<Band> bands,
                                              double[] temperatureK) {
        double[][] out = new double[bands.size()][surfaces.size()];
        for (int i = 0; i < surfaces.size(); i++) {
            SpectralEmissivity tau = surfaces.get(i).material().transmissivity();
            if (tau == null) {
                continue;
            }
            for (int k = 0; k < bands.size(); k++) {
                Band b = bands.get(k);
                out[k][i] = BandAverages.planckMean(tau, b.lowerUm(), b.upperUm(), temperatureK[i]);
            }
        }
        return out;
    }

    /** d/dT of the band emissive power (W/(m²·K)) at a temperature (K). */
    public static double emissivePowerDerivative(Band b, double temperatureK) {
        return Planck.bandEmissivePowerDerivative(b.lowerUm(), b.upperUm(), temperatureK);
    }
}
