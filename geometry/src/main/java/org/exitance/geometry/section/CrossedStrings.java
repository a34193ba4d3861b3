package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.List;

/**
 * Exchange per unit length L_e F_e→r (m) between two pieces by Hottel's crossed strings
 * (Hottel &amp; Sarofim, Radiative Transfer, 1967, ch. 2; Siegel &amp; Howell, Thermal
 * Radiation Heat Transfer, 4th ed., §4.4, crossed-string method; Modest, Radiative Heat
 * Transfer, 3rd ed., §4.7).
 *
 * <p>From a point s of the emitter, dF = ½ d(sin φ), so L_e F = ½ ∫ Σ (sin φ_hi − sin φ_lo) ds
 * over the visible intervals ({@link Visibility}). Each interval edge is fixed by a taut string
 * from s: straight to an end point, or tangent to a circle and on around it, or wrapped along a
 * convex emitter (its horizon); its length G obeys dG/ds = −sin φ ({@link Feature}). The emitter
 * is cut wherever the set of strings changes (a shadow edge reaches an end point, an interval
 * opens or closes), and on each stretch the integral is exact: ½ Σ [ΔG_lo − ΔG_hi], the
 * crossed minus the uncrossed strings of that stretch. Without obstacles and with both
 * surfaces in full view this is the textbook ½[(crossed) − (uncrossed)].
 *
 * <p>Cut points: the emitter is cut at every candidate of {@link EventLines} (where a line
 * tangent to two features crosses it: the only places the set of strings can change), and the
 * string sets are compared at 72 further points (64 even ones plus 8 crowding toward the ends)
 * and on both sides of each candidate; each change is bisected to 1e-13 of the emitter's
 * parameter. The even samples are a safety net: a change they and the candidates both miss
 * would leave an error of second order in the sample spacing.
 */
final class CrossedStrings {
    private static final int SAMPLES = 64;
    private static final double[] END_SAMPLES = {1e-12, 1e-9, 1e-6, 1e-3};

    private CrossedStrings() {
    }

    /**
     * @param e emitter
     * @param rcv receiver
     * @param obstacles pieces that may block the view (not e or rcv); not modified
     * @return L_e F_e→rcv (m per m of axial length), ≥ 0 up to rounding
     */
    static double exchange(Piece e, Piece rcv, List<Piece> obstacles) {
        List<Double> us = new ArrayList<>();
        for (double v : END_SAMPLES) {
            us.add(v);
        }
        for (int k = 0; k < SAMPLES; k++) {
            us.add((k + 0.5) / SAMPLES);
        }
        for (int k = END_SAMPLES.length - 1; k >= 0; k--) {
            us.add(1 - END_SAMPLES[k]);
        }
        List<Double> cuts = new ArrayList<>();
        cuts.add(0.0);
        for (double c : EventLines.candidates(e, rcv, obstacles)) {
            cuts.add(c);
            us.add(Math.max(0.5e-12, c - 1e-11));
            us.add(Math.min(1 - 0.5e-12, c + 1e-11));
        }
        java.util.Collections.sort(us);
        Visibility.Signature prev = Visibility.at(e, us.get(0), rcv, obstacles);
        for (int k = 1; k < us.size(); k++) {
            Visibility.Signature next = Visibility.at(e, us.get(k), rcv, obstacles);
            if (!next.sameAs(prev)) {
                refine(e, rcv, obstacles, us.get(k - 1), prev, us.get(k), next, cuts);
            }
            prev = next;
        }
        cuts.add(1.0);
        java.util.Collections.sort(cuts);
        double sum = 0;
        for (int k = 0; k + 1 < cuts.size(); k++) {
            double a = cuts.get(k), b = cuts.get(k + 1);
            if (!(b > a)) {
                continue;
            }
            Visibility.Signature sig = Visibility.at(e, 0.5 * (a + b), rcv, obstacles);
            for (int j = 0; j < sig.lo.size(); j++) {
                sum += sig.lo.get(j).deltaG(e, a, b) - sig.hi.get(j).deltaG(e, a, b);
            }
        }
        return 0.5 * sum;
    }

    /** Adds to cuts (in increasing order) the parameters in (a, b) where the string set changes. Modifies cuts. */
    private static void refine(Piece e, Piece rcv, List<Piece> obstacles, double a, Visibility.Signature sa,
            double b, Visibility.Signature sb, List<Double> cuts) {
        if (b - a < 1e-13) {
            cuts.add(0.5 * (a + b));
            return;
        }
        double m = 0.5 * (a + b);
        Visibility.Signature sm = Visibility.at(e, m, rcv, obstacles);
        if (!sm.sameAs(sa)) {
            refine(e, rcv, obstacles, a, sa, m, sm, cuts);
        }
        if (!sm.sameAs(sb)) {
            refine(e, rcv, obstacles, m, sm, b, sb, cuts);
        }
    }
}
