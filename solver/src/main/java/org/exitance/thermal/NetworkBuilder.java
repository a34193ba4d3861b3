package org.exitance.thermal;

import java.util.List;
import org.exitance.bands.BandProperties;
import org.exitance.model.Band;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.network.BandNetwork;
import org.exitance.network.RadiositySolver;
import org.exitance.network.WindowCoupling;
import org.exitance.spectral.BandAverages;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;

/**
 * Builds the band networks of a solve at given temperatures: band-mean ε and τ of every surface,
 * and the irradiation from outside the surfaces (environment, sources) with the part that is
 * reflected or transmitted, absorbed as {@link ExternalAbsorption} says.
 */
final class NetworkBuilder {
    private final RadiationCase radiationCase;
    private final RadiositySolver linear;
    private final ExternalAbsorption absorption;

    NetworkBuilder(RadiationCase radiationCase, RadiositySolver linear, ExternalAbsorption absorption) {
        this.radiationCase = radiationCase;
        this.linear = linear;
        this.absorption = absorption;
    }

    /**
     * One network per band at the current temperatures (K, not modified). External irradiation
     * (the environment, sources) is absorbed with the band absorptivity weighted by the source's
     * own spectrum: a cold sink with its blackbody spectrum, the sun with its own. On a window face
     * the transmissivity is weighted the same way: the reflected part of the external irradiation
     * leaves the face it arrives at, the transmitted part leaves the other face.
     */
    BandNetwork[] networks(Problem p, List<Band> bands, double[][] eps, double[] t) {
        int n = p.enc.size();
        double[][] tau = BandProperties.transmissivities(p.enc.surfaces(), bands, t);
        BandNetwork[] nets = new BandNetwork[bands.size()];
        for (int k = 0; k < nets.length; k++) {
            Band b = bands.get(k);
            double envE = p.envT > 0 ? Planck.bandEmissivePower(b.lowerUm(), b.upperUm(), p.envT) : 0.0;
            double[] h = new double[n];
            double[] leaving = new double[n];
            for (int i = 0; i < n; i++) {
                SpectralEmissivity e = p.enc.surface(i).material().emissivity();
                SpectralEmissivity tr = p.enc.surface(i).material().transmissivity();
                int o = p.other[i];
                double hEnv = p.envFactor[i] * envE;
                if (hEnv > 0) {
                    boolean own = absorption == ExternalAbsorption.OWN_EMISSIVITY;
                    double alpha = own ? eps[k][i] : BandAverages.planckMean(e, b.lowerUm(), b.upperUm(), p.envT, t[i]);
                    double tauExt = tr == null ? 0.0 : own ? tau[k][i]
                            : BandAverages.planckMean(tr, b.lowerUm(), b.upperUm(), p.envT, t[i]);
                    h[i] += hEnv;
                    leaving[i] += Math.max(0.0, 1 - alpha - tauExt) * hEnv;
                    if (o >= 0) {
                        leaving[o] += tauExt * hEnv;
                    }
                }
                for (ExternalSource src : radiationCase.sources()) {
                    double hs = src.irradianceOn(p.enc.surface(i).name())
                            * src.spectrum().bandFraction(b.lowerUm(), b.upperUm());
                    if (hs > 0) {
                        boolean own = absorption == ExternalAbsorption.OWN_EMISSIVITY;
                        double alpha = own ? eps[k][i] : src.spectrum().bandAbsorptivity(e, b.lowerUm(), b.upperUm(), t[i]);
                        double tauExt = tr == null ? 0.0 : own ? tau[k][i]
                                : src.spectrum().bandAbsorptivity(tr, b.lowerUm(), b.upperUm(), t[i]);
                        h[i] += hs;
                        leaving[i] += Math.max(0.0, 1 - alpha - tauExt) * hs;
                        if (o >= 0) {
                            leaving[o] += tauExt * hs;
                        }
                    }
                }
            }
            nets[k] = new BandNetwork(p.f, n, p.area, eps[k], new WindowCoupling(tau[k], p.other), h, leaving, linear);
        }
        return nets;
    }
}
