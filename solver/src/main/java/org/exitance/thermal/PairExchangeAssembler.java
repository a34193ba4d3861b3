package org.exitance.thermal;

import java.util.ArrayList;
import java.util.List;
import org.exitance.bands.BandLoop;
import org.exitance.bands.BandProperties;
import org.exitance.bands.ExternalIrradiation;
import org.exitance.model.Band;
import org.exitance.model.MemoryBudget;
import org.exitance.network.AbsorptionFactors;
import org.exitance.result.PairExchange;

/**
 * The pair exchange of a converged solve ({@link PairExchange}), from each band's Gebhart
 * absorption factors B ({@link AbsorptionFactors}: one factorization per band, already made for
 * the solve, and one blocked solve for all N sources).
 *
 * <p>Per band, with E the band emissive powers at the solved temperatures, the power surface j
 * emits that surface i takes is {@code P_j→i = A_j ε_j E_j B_ji}. An external term (the
 * environment, or source s) is absorbed first where it arrives ({@code A_i (H − R)_i}, the
 * network's own split), and what it leaves unabsorbed at j ({@code A_j R_j}) goes on as a source:
 * {@code P_s→i = A_i (H − R)_i + Σ_j A_j R_j B_ji}; it reaches the opening with
 * {@code Σ_j A_j R_j B_j,env}. The net heat of a pair is {@code Q_ij = P_i→j − P_j→i}; a source's
 * column is {@code −P_s→i}. Each surface's row then sums to what the network computes as its net
 * heat, {@code A_i ε_i E_i − (what it takes from every origin)}, because B's rows sum to 1 (the
 * summation rule) for a reciprocal F closed by the environment factor.
 */
final class PairExchangeAssembler {
    private PairExchangeAssembler() {
    }

    /**
     * @param p     the problem (areas, environment factor, sources)
     * @param loop  the band loop at the converged temperatures
     * @param t     the converged temperatures (K); not modified
     */
    static PairExchange of(Problem p, BandLoop loop, double[] t) {
        int n = p.area.length;
        boolean open = p.enc.environment() != null;
        int ns = p.radiative.sources.size();
        int env = open ? n : -1;
        int m = n + (open ? 1 : 0) + ns;
        int nb = loop.bands().size();
        long stored = MemoryBudget.saturatedProduct(2L * Double.BYTES,
                MemoryBudget.saturatedProduct(nb + 1, (long) m * m + (long) n * (n + 2)));
        MemoryBudget.require("the pair exchange of " + n + " surfaces in " + nb + " band" + (nb == 1 ? "" : "s"),
                MemoryBudget.saturatedSum(stored, AbsorptionFactors.peakBytes(n)));
        List<String> names = new ArrayList<>();
        List<PairExchange.Kind> kinds = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            names.add(p.enc.surface(i).name());
            kinds.add(PairExchange.Kind.SURFACE);
        }
        if (open) {
            names.add("environment");
            kinds.add(PairExchange.Kind.ENVIRONMENT);
        }
        for (int s = 0; s < ns; s++) {
            names.add(p.radiative.sources.get(s).name());
            kinds.add(PairExchange.Kind.SOURCE);
        }
        double[][] e = loop.emissivePowers(t);
        double[][] q = new double[nb][m * m];
        double[][] gebhart = new double[nb][];
        double[][] emitting = new double[nb][n];
        double[] cond = new double[m * m];
        for (int k = 0; k < nb; k++) {
            double[] b = AbsorptionFactors.of(loop.network(k), p.envFactor);
            gebhart[k] = b;
            double[] eps = loop.emissivity()[k];
            for (int i = 0; i < n; i++) {
                emitting[k][i] = p.area[i] * eps[i];
            }
            fill(q[k], b, emitting[k], e[k], loop.external(k), p, m, env);
            addConductances(cond, b, emitting[k], e[k], loop.external(k).environmentPower(), loop.bands().get(k), t,
                    p.envT, m, env);
        }
        for (int x = 0; x < m * m; x++) {
            if (kinds.get(x / m) == PairExchange.Kind.SOURCE || kinds.get(x % m) == PairExchange.Kind.SOURCE) {
                cond[x] = Double.NaN;
            }
        }
        return new PairExchange(names, kinds, q, gebhart, emitting, cond, p.area);
    }

    /** One band's m×m net heats (W) into q (modified); the other arrays are not modified. */
    private static void fill(double[] q, double[] b, double[] emitting, double[] e, ExternalIrradiation x, Problem p,
                             int m, int env) {
        int n = emitting.length;
        int w = n + 1;
        for (int i = 0; i < n; i++) {
            double emittedI = emitting[i] * e[i];
            for (int j = i + 1; j < n; j++) {
                double v = emittedI * b[i * w + j] - emitting[j] * e[j] * b[j * w + i];
                q[i * m + j] = v;
                q[j * m + i] = -v;
            }
        }
        int first = env >= 0 ? n + 1 : n;
        for (int term = 0; term < x.termLeaving().length; term++) {
            int node = term == 0 ? env : first + term - 1;
            if (node < 0) {
                continue; // a closed enclosure has no environment term
            }
            double[] leaving = x.termLeaving()[term];
            double[] retained = x.termRetained()[term];
            double toOpening = 0;
            for (int i = 0; i < n; i++) {
                double taken = p.area[i] * retained[i];
                for (int j = 0; j < n; j++) {
                    if (leaving[j] != 0) {
                        taken += p.area[j] * leaving[j] * b[j * w + i];
                    }
                }
                double v = (term == 0 ? emitting[i] * e[i] * b[i * w + n] : 0.0) - taken;
                q[i * m + node] = v;
                q[node * m + i] = -v;
                toOpening += p.area[i] * leaving[i] * b[i * w + n];
            }
            if (term > 0 && env >= 0) {
                q[node * m + env] = toOpening;
                q[env * m + node] = -toOpening;
            }
        }
    }

    /**
     * Adds one band's part of the conductances (W/K) to cond (modified): between surfaces with the
     * mean of both exchange areas, to the environment with the surface's exchange area to the opening.
     */
    private static void addConductances(double[] cond, double[] b, double[] emitting, double[] e, double envE,
                                        Band band, double[] t, double envT, int m, int env) {
        int n = emitting.length;
        int w = n + 1;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                double s = 0.5 * (emitting[i] * b[i * w + j] + emitting[j] * b[j * w + i]);
                double g = s * slope(band, t[i], e[i], t[j], e[j]);
                cond[i * m + j] += g;
                cond[j * m + i] += g;
            }
            if (env >= 0) {
                double g = emitting[i] * b[i * w + n] * slope(band, t[i], e[i], envT, envE);
                cond[i * m + env] += g;
                cond[env * m + i] += g;
            }
        }
    }

    /** (E_a − E_b)/(T_a − T_b), or dE/dT at the mean where the temperatures (nearly) agree (W/(m²·K)). */
    private static double slope(Band band, double ta, double ea, double tb, double eb) {
        double dt = ta - tb;
        if (Math.abs(dt) <= 1e-6 * Math.max(Math.abs(ta), Math.abs(tb))) {
            return BandProperties.emissivePowerDerivative(band, 0.5 * (ta + tb));
        }
        return (ea - eb) / dt;
    }
}
