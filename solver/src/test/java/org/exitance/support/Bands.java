package org.exitance.support;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.Band;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * The coefficients of the band radiosity equations of a case at the reported temperatures, from
 * {@link SpectralReference} and the case's inputs only (see {@link SolveCheck} for the equations).
 * All arrays are [band][surface] in case order, owned here, not to be modified.
 */
final class Bands {
    final int n;
    final int nb;
    final List<String> names = new ArrayList<>();
    final double[][] f;
    final double[] area;
    final int[] other;
    final double[][] eps;
    final double[][] tau;
    final double[][] e;
    final double[][] h;
    final double[][] leaving;
    private final Map<List<Object>, Double> means = new HashMap<>();

    Bands(RadiationCase c, SolveResult r, boolean ownEmissivity) {
        Enclosure enc = c.enclosure();
        List<SurfaceResult> rep = SolveCheck.reported(c, r);
        List<Band> bands = r.bands();
        n = enc.size();
        nb = bands.size();
        f = new double[n][n];
        area = new double[n];
        other = new int[n];
        double[] t = new double[n];
        double[] envF = new double[n];
        for (int i = 0; i < n; i++) {
            EnclosureSurface s = enc.surface(i);
            names.add(s.name());
            area[i] = s.areaM2();
            other[i] = s.otherFace() == null ? -1 : enc.indexOf(s.otherFace());
            t[i] = rep.get(i).temperatureK();
            double sum = 0;
            for (int j = 0; j < n; j++) {
                f[i][j] = enc.viewFactor(i, j);
                sum += f[i][j];
            }
            envF[i] = enc.environment() == null ? 0.0 : Math.max(0.0, 1.0 - sum);
        }
        eps = new double[nb][n];
        tau = new double[nb][n];
        e = new double[nb][n];
        h = new double[nb][n];
        leaving = new double[nb][n];
        double tEnv = enc.environment() == null ? 0.0 : enc.environment().temperatureK();
        for (int k = 0; k < nb; k++) {
            double lo = bands.get(k).lowerUm();
            double hi = bands.get(k).upperUm();
            double envE = tEnv > 0 ? SpectralReference.bandPowerWPerM2(lo, hi, tEnv) : 0.0;
            for (int i = 0; i < n; i++) {
                SpectralEmissivity em = enc.surface(i).material().emissivity();
                SpectralEmissivity tr = enc.surface(i).material().transmissivity();
                eps[k][i] = mean(em, lo, hi, t[i], t[i]);
                tau[k][i] = tr == null ? 0.0 : mean(tr, lo, hi, t[i], t[i]);
                e[k][i] = SpectralReference.bandPowerWPerM2(lo, hi, t[i]);
            }
            for (int i = 0; i < n; i++) {
                SpectralEmissivity em = enc.surface(i).material().emissivity();
                SpectralEmissivity tr = enc.surface(i).material().transmissivity();
                double hEnv = envF[i] * envE;
                if (hEnv > 0) {
                    double a = ownEmissivity ? eps[k][i] : mean(em, lo, hi, tEnv, t[i]);
                    double tx = tr == null ? 0.0 : ownEmissivity ? tau[k][i] : mean(tr, lo, hi, tEnv, t[i]);
                    arrive(k, i, hEnv, a, tx);
                }
                for (ExternalSource src : c.sources()) {
                    double hs = src.irradianceOn(enc.surface(i).name()) * fraction(src, lo, hi);
                    if (hs > 0) {
                        double a = ownEmissivity ? eps[k][i] : sourceMean(src, em, lo, hi, t[i]);
                        double tx = tr == null ? 0.0 : ownEmissivity ? tau[k][i] : sourceMean(src, tr, lo, hi, t[i]);
                        arrive(k, i, hs, a, tx);
                    }
                }
            }
        }
    }

    /** ρ_ik = 1 − ε − τ, never below 0. */
    double rho(int k, int i) {
        return Math.max(0.0, 1.0 - eps[k][i] - tau[k][i]);
    }

    /** F x (x not modified, result new). */
    double[] times(double[] x) {
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += f[i][j] * x[j];
            }
            y[i] = s;
        }
        return y;
    }

    /** Irradiation H arriving at face i: α H absorbed, τ H leaves the other face, the rest is reflected. */
    private void arrive(int k, int i, double hIn, double alpha, double tauExt) {
        h[k][i] += hIn;
        leaving[k][i] += Math.max(0.0, 1.0 - alpha - tauExt) * hIn;
        if (other[i] >= 0) {
            leaving[k][other[i]] += tauExt * hIn;
        }
    }

    private double mean(SpectralEmissivity p, double lo, double hi, double weightK, double propertyK) {
        List<Object> key = List.of(p, lo, hi, weightK, propertyK);
        return means.computeIfAbsent(key, x -> SpectralReference.planckMean(p, lo, hi, weightK, propertyK));
    }

    private static double fraction(ExternalSource src, double lo, double hi) {
        if (src.spectrum() instanceof BlackbodySource b) {
            return SpectralReference.blackbodyFraction(lo, hi, b.temperatureK());
        }
        return SpectralReference.spectrumFraction((SourceSpectrum) src.spectrum(), lo, hi);
    }

    private double sourceMean(ExternalSource src, SpectralEmissivity p, double lo, double hi, double propertyK) {
        if (src.spectrum() instanceof BlackbodySource b) {
            return mean(p, lo, hi, b.temperatureK(), propertyK);
        }
        return SpectralReference.spectrumMean(p, (SourceSpectrum) src.spectrum(), lo, hi, propertyK);
    }
}
