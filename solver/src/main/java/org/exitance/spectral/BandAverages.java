package org.exitance.spectral;

import static org.exitance.spectral.BlackbodyIntegrals.FIFTEEN_OVER_PI4;

/**
 * Planck-weighted band averages of a spectral emissivity, and total emissivity/absorptivity.
 *
 * <p>Definitions of total hemispherical emissivity and absorptivity (Siegel &amp; Howell 7th ed.
 * Ch. 3; Modest 3rd ed. Ch. 3; Incropera 6th ed. Secs. 12.4–12.5):
 * <pre>
 *   ε̄_band = ∫_band ε(λ, T_p) E_bλ(λ, T_w) dλ / ∫_band E_bλ(λ, T_w) dλ
 *   ε(T)     = ε̄ over [0, ∞) with T_w = T_p = T
 *   α(T, T_s) = ε̄ over [0, ∞) with T_w = T_s (diffuse surface, blackbody source at T_s)
 * </pre>
 *
 * <p><b>Exact evaluation.</b> Per {@link SpectralEmissivity}'s contract, at fixed T_p the model is
 * piecewise linear in λ between {@code breakpointsUm()} and constant outside. On a sub-interval
 * [p, q] where ε is linear, ε = ε_p (1 − h) + ε_q h with h = (λ − p)/(q − p), so
 * <pre>
 *   ∫_p^q ε E_bλ dλ = ε_p (P − W) + ε_q W,   P = ∫ E_bλ dλ,   W = ∫ h E_bλ dλ = (∫ λE_bλ dλ − p P)/(q − p),
 * </pre>
 * and both ∫E_bλ and ∫λE_bλ have closed series in ζ = C2/(λT) (see {@link BlackbodyIntegrals}).
 * Short sub-intervals (Δζ &lt; 0.5) use a 12-point Gauss–Legendre rule on the same integrands.
 * No adaptive quadrature is involved; the cost is a few series evaluations per table segment
 * inside the band. Measured accuracy against adaptive quadrature: see {@code BandAveragesTest}
 * and docs/theory-spectral.md (better than 1e-12 relative).
 *
 * <p><b>Underflow fallback.</b> The closed series keep their relative accuracy far into the
 * tails, so the Planck-weighted mean is used whenever the band's blackbody integral is a normal
 * double. Only when it underflows (below about 1e-308 of σT_w⁴: nothing a solve can feel) does the
 * method return instead the plain wavelength average (1/(u − l)) ∫_l^u ε(λ, T_p) dλ over the band
 * [l, u]; if the band is unbounded above (u = +∞), it returns the limiting value ε(λ → ∞, T_p),
 * i.e. the held last table value (the limit of that average). This never returns NaN.
 */
public final class BandAverages {

    /** Bands whose blackbody fraction at the weight temperature is below this use the fallback (underflow only). */
    public static final double NEGLIGIBLE_FRACTION = Double.MIN_NORMAL;

    private BandAverages() {
    }

    /**
     * Planck-weighted band mean ∫_band ε(λ, T_p) E_bλ(λ, T_w) dλ / ∫_band E_bλ(λ, T_w) dλ.
     *
     * @param e                     emissivity model
     * @param lowerUm               band lower bound, ≥ 0 µm (may be 0)
     * @param upperUm               band upper bound, &gt; lowerUm (may be +∞)
     * @param weightTemperatureK    T_w of the weighting blackbody, &gt; 0
     * @param propertyTemperatureK  T_p at which ε is evaluated, &gt; 0
     */
    public static double planckMean(SpectralEmissivity e, double lowerUm, double upperUm,
                                    double weightTemperatureK, double propertyTemperatureK) {
        if (e == null) {
            throw new IllegalArgumentException("emissivity model must not be null");
        }
        Planck.requireBand(lowerUm, upperUm);
        Planck.requireTemperature(weightTemperatureK, "weightTemperatureK");
        Planck.requireTemperature(propertyTemperatureK, "propertyTemperatureK");

        double[] nodes = nodesOf(e);
        if (e.isGray() || nodes.length == 0) {
            double rep = upperUm == Double.POSITIVE_INFINITY ? Math.max(lowerUm, 1.0) : upperUm;
            return e.at(rep, propertyTemperatureK);
        }
        final double tw = weightTemperatureK;
        final double tp = propertyTemperatureK;
        final int n = nodes.length;
        double num = 0.0;
        double den = 0.0;

        // Constant piece below the first node.
        if (lowerUm < nodes[0]) {
            double hi = Math.min(upperUm, nodes[0]);
            double p = BlackbodyIntegrals.integral3(Planck.zeta(hi, tw), Planck.zeta(lowerUm, tw));
            num += e.at(nodes[0], tp) * p;
            den += p;
        }
        // Linear segments [nodes[i], nodes[i+1]] intersecting (lower, upper).
        double[] pw = new double[2];
        int i = firstSegment(nodes, lowerUm);
        double vi = i < n ? e.at(nodes[i], tp) : 0.0;
        for (; i + 1 < n && nodes[i] < upperUm; i++) {
            double x0 = nodes[i];
            double x1 = nodes[i + 1];
            double v1 = e.at(x1, tp);
            double p = Math.max(lowerUm, x0);
            double q = Math.min(upperUm, x1);
            if (q > p) {
                double ep = p == x0 ? vi : vi + (p - x0) / (x1 - x0) * (v1 - vi);
                double eq = q == x1 ? v1 : vi + (q - x0) / (x1 - x0) * (v1 - vi);
                if (ep == eq) {
                    double pp = BlackbodyIntegrals.integral3(Planck.zeta(q, tw), Planck.zeta(p, tw));
                    num += ep * pp;
                    den += pp;
                } else {
                    BlackbodyIntegrals.linearSegment(Planck.zeta(q, tw), Planck.zeta(p, tw), p, q, tw, pw);
                    num += ep * (pw[0] - pw[1]) + eq * pw[1];
                    den += pw[0];
                }
            }
            vi = v1;
        }
        // Constant piece above the last node.
        if (upperUm > nodes[n - 1]) {
            double lo = Math.max(lowerUm, nodes[n - 1]);
            double p = BlackbodyIntegrals.integral3(Planck.zeta(upperUm, tw), Planck.zeta(lo, tw));
            num += e.at(nodes[n - 1], tp) * p;
            den += p;
        }

        double fraction = FIFTEEN_OVER_PI4 * den;
        if (!(fraction >= NEGLIGIBLE_FRACTION) || !Double.isFinite(num)) {
            return plainAverage(e, nodes, lowerUm, upperUm, tp);
        }
        return Math.min(1.0, Math.max(0.0, num / den));
    }

    /** {@link #planckMean(SpectralEmissivity, double, double, double, double)} with T_w = T_p = T. */
    public static double planckMean(SpectralEmissivity e, double lowerUm, double upperUm, double temperatureK) {
        return planckMean(e, lowerUm, upperUm, temperatureK, temperatureK);
    }

    /**
     * Planck means for consecutive bands [edges[k], edges[k+1]] (edges strictly increasing, first ≥ 0,
     * last may be +∞). Convenience for band-wise solvers.
     */
    public static double[] planckMeans(SpectralEmissivity e, double[] bandEdgesUm,
                                       double weightTemperatureK, double propertyTemperatureK) {
        if (bandEdgesUm == null || bandEdgesUm.length < 2) {
            throw new IllegalArgumentException("need at least two band edges");
        }
        double[] out = new double[bandEdgesUm.length - 1];
        for (int k = 0; k < out.length; k++) {
            out[k] = planckMean(e, bandEdgesUm[k], bandEdgesUm[k + 1], weightTemperatureK, propertyTemperatureK);
        }
        return out;
    }

    /** Total hemispherical emissivity at T: ∫_0^∞ ε(λ,T) E_bλ(λ,T) dλ / σT⁴. */
    public static double totalEmissivity(SpectralEmissivity e, double temperatureK) {
        return planckMean(e, 0.0, Double.POSITIVE_INFINITY, temperatureK, temperatureK);
    }

    /**
     * Total hemispherical absorptivity of a diffuse surface at {@code surfaceTemperatureK} for
     * irradiation from a blackbody at {@code sourceTemperatureK}:
     * ∫_0^∞ ε(λ, T_surface) E_bλ(λ, T_source) dλ / σT_source⁴.
     */
    public static double totalAbsorptivity(SpectralEmissivity e, double surfaceTemperatureK, double sourceTemperatureK) {
        return planckMean(e, 0.0, Double.POSITIVE_INFINITY, sourceTemperatureK, surfaceTemperatureK);
    }

    // ---------------------------------------------------------------------------------------

    private static double[] nodesOf(SpectralEmissivity e) {
        if (e instanceof TabulatedEmissivity t) {
            return t.nodesNoCopy();
        }
        if (e instanceof TemperatureTabulatedEmissivity t) {
            return t.nodesNoCopy();
        }
        double[] nodes = e.breakpointsUm();
        return nodes == null ? new double[0] : nodes;
    }

    /** Index of the segment [nodes[i], nodes[i+1]] containing lowerUm (0 if below the table). */
    private static int firstSegment(double[] nodes, double lowerUm) {
        int lo = 0;
        int hi = nodes.length - 1;
        if (lowerUm <= nodes[0]) {
            return 0;
        }
        // largest i with nodes[i] <= lowerUm
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (nodes[mid] <= lowerUm) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /** Fallback: plain λ-average over [l, u], or the held last value when u = +∞. */
    static double plainAverage(SpectralEmissivity e, double[] nodes, double lowerUm, double upperUm, double tp) {
        int n = nodes.length;
        if (upperUm == Double.POSITIVE_INFINITY) {
            return e.at(Math.max(lowerUm, nodes[n - 1]), tp);
        }
        // Exact trapezoid over the pieces of the piecewise-linear ε inside [l, u].
        double sum = 0.0;
        double x = lowerUm;
        double vx = e.at(x, tp);
        for (int i = 0; i < n; i++) {
            double node = nodes[i];
            if (node <= x) {
                continue;
            }
            if (node >= upperUm) {
                break;
            }
            double vn = e.at(node, tp);
            sum += 0.5 * (vx + vn) * (node - x);
            x = node;
            vx = vn;
        }
        double vu = e.at(upperUm, tp);
        sum += 0.5 * (vx + vu) * (upperUm - x);
        return Math.min(1.0, Math.max(0.0, sum / (upperUm - lowerUm)));
    }
}
