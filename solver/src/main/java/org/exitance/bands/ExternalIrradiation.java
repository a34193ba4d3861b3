package org.exitance.bands;

import org.exitance.model.Band;
import org.exitance.model.ExternalSource;
import org.exitance.spectral.BandAverages;
import org.exitance.spectral.Planck;
import org.exitance.spectral.SpectralEmissivity;

/**
 * Irradiation of one band from outside the surfaces, per surface (W/m²): the environment and
 * every external source, each absorbed as {@link ExternalAbsorption} says, the rest reflected or,
 * on a window face, transmitted to the other face.
 *
 * <p>The environment is one more blackbody term: a black surface at its temperature irradiates
 * surface i with {@code F_i,env f_k(T_env) σT_env⁴}, and is absorbed with the band absorptivity
 * Planck-weighted at T_env (Kirchhoff, α_λ = ε_λ; Siegel &amp; Howell, 5th ed., §6.4). A source
 * delivers {@code S_i f_k,source} with its own band absorptivity. Every term then goes through the
 * same absorb, reflect and transmit step.
 *
 * <p>Arrays are owned by the record and must not be modified.
 *
 * @param irradiance            H_i, all external irradiation arriving at surface i in the band
 * @param leaving               R_i, the part of it that leaves face i unabsorbed: reflected from H_i
 *                              and, for a window face, transmitted from the other face's H
 * @param retained              H_i − R_i, summed from its parts without cancellation: what face i keeps
 *                              (absorbs, or passes to its other face) less what its other face passes to it
 * @param retainedMagnitude     the sum of the magnitudes of those parts (W/m²)
 * @param environmentPower      f_k(T_env) σT_env⁴, the environment's band emissive power (0 without one)
 * @param sourceFraction        per source, the share of its power in the band
 * @param sourceAbsorptivity    [source][surface], each surface's band absorptivity for the source's
 *                              own spectrum where the source delivers power in the band (else 0),
 *                              whatever {@link ExternalAbsorption} the network uses
 * @param termLeaving           R_i split by origin, [term][surface]: term 0 the environment, term
 *                              1 + s external source s; the terms add up to {@code leaving}
 * @param termRetained          H_i − R_i split the same way, [term][surface]
 */
public record ExternalIrradiation(double[] irradiance, double[] leaving, double[] retained,
                                  double[] retainedMagnitude, double environmentPower,
                                  double[] sourceFraction, double[][] sourceAbsorptivity,
                                  double[][] termLeaving, double[][] termRetained) {

    /**
     * The external irradiation of band {@code b} at surface temperatures {@code t}.
     *
     * @param r           the enclosure's arrays
     * @param b           the band
     * @param absorption  how external irradiation is absorbed
     * @param eps         band-mean ε per surface (used with {@link ExternalAbsorption#OWN_EMISSIVITY}); not modified
     * @param tau         band-mean τ per surface; not modified
     * @param t           surface temperatures (K); not modified
     */
    public static ExternalIrradiation of(RadiativeArrays r, Band b, ExternalAbsorption absorption, double[] eps,
                                         double[] tau, double[] t) {
        int n = r.n;
        boolean own = absorption == ExternalAbsorption.OWN_EMISSIVITY;
        double envE = r.environmentK > 0 ? Planck.bandEmissivePower(b.lowerUm(), b.upperUm(), r.environmentK) : 0.0;
        int ns = r.sources.size();
        double[] fraction = new double[ns];
        for (int s = 0; s < ns; s++) {
            fraction[s] = r.sources.get(s).spectrum().bandFraction(b.lowerUm(), b.upperUm());
        }
        double[] h = new double[n];
        double[] leaving = new double[n];
        double[] retained = new double[n];
        double[] magnitude = new double[n];
        double[][] sourceAlpha = new double[ns][n];
        double[][] termLeaving = new double[ns + 1][n];
        double[][] termRetained = new double[ns + 1][n];
        double[] unused = new double[n]; // the split needs no H or magnitude of its own
        for (int i = 0; i < n; i++) {
            SpectralEmissivity e = r.surface(i).material().emissivity();
            SpectralEmissivity tr = r.surface(i).material().transmissivity();
            double hEnv = r.environmentFactor[i] * envE;
            if (hEnv > 0) {
                double alpha = own ? eps[i] : BandAverages.planckMean(e, b.lowerUm(), b.upperUm(), r.environmentK, t[i]);
                double tauExt = tr == null ? 0.0 : own ? tau[i]
                        : BandAverages.planckMean(tr, b.lowerUm(), b.upperUm(), r.environmentK, t[i]);
                absorb(r, i, hEnv, alpha, tauExt, h, leaving, retained, magnitude);
                absorb(r, i, hEnv, alpha, tauExt, unused, termLeaving[0], termRetained[0], unused);
            }
            for (int s = 0; s < ns; s++) {
                ExternalSource src = r.sources.get(s);
                double hs = src.irradianceOn(r.surface(i).name()) * fraction[s];
                if (hs > 0) {
                    sourceAlpha[s][i] = src.spectrum().bandAbsorptivity(e, b.lowerUm(), b.upperUm(), t[i]);
                    double alpha = own ? eps[i] : sourceAlpha[s][i];
                    double tauExt = tr == null ? 0.0 : own ? tau[i]
                            : src.spectrum().bandAbsorptivity(tr, b.lowerUm(), b.upperUm(), t[i]);
                    absorb(r, i, hs, alpha, tauExt, h, leaving, retained, magnitude);
                    absorb(r, i, hs, alpha, tauExt, unused, termLeaving[s + 1], termRetained[s + 1], unused);
                }
            }
        }
        return new ExternalIrradiation(h, leaving, retained, magnitude, envE, fraction, sourceAlpha, termLeaving,
                termRetained);
    }

    /** One term H arriving at face i: α H is absorbed, τ H leaves the other face, the rest is reflected. */
    private static void absorb(RadiativeArrays r, int i, double arriving, double alpha, double tauExt, double[] h,
                               double[] leaving, double[] retained, double[] magnitude) {
        h[i] += arriving;
        leaving[i] += Math.max(0.0, 1 - alpha - tauExt) * arriving;
        double kept = Math.min(1.0, alpha + tauExt) * arriving;
        retained[i] += kept;
        magnitude[i] += kept;
        int o = r.otherFace[i];
        if (o >= 0) {
            leaving[o] += tauExt * arriving;
            retained[o] -= tauExt * arriving;
            magnitude[o] += tauExt * arriving;
        }
    }
}
