package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.exitance.geometry.GeometryException;
import org.exitance.geometry.section.SectionElement.Arc;
import org.exitance.geometry.section.SectionElement.Circle;
import org.exitance.geometry.section.SectionElement.Segment;
import org.exitance.geometry.viewfactor.ClosureDiagnostics;

/**
 * View factors of a 2-D section (infinitely long geometry) by Hottel's crossed strings, with
 * strings pulled tight around convex obstacles and around convex surfaces themselves (Hottel
 * &amp; Sarofim, Radiative Transfer, 1967; Siegel &amp; Howell, Thermal Radiation Heat
 * Transfer, 4th ed., §4.4; Modest, Radiative Heat Transfer, 3rd ed., §4.7). See
 * {@link CrossedStrings} for the pair calculation and docs/view-factors.md for what is
 * supported.
 *
 * <ul>
 * <li>Every pair of pieces is computed once, emitter = the first in a canonical order of the
 * surfaces by their geometry; reciprocity fills the other entry (L_i F_ij = L_j F_ji). Every
 * other surface is a possible obstacle. Results do not depend on the order of the surfaces.</li>
 * <li>Flat surfaces and tubes have F_ii = 0; a convex arc longer than π is split in two pieces
 * that cannot see each other. A concave arc exchanges through its chord:
 * L_arc F_arc,j = L_chord F_chord,j, and F_arc,arc = 1 − L_chord / L_arc (closure of the
 * hollow).</li>
 * <li>A strip lying exactly on the chord of a concave arc and radiating into its hollow is a lid:
 * the two see each other through the whole chord (F_lid,arc = 1) and nothing else.</li>
 * <li>A shell (inward-radiating circle) around everything gets what the other rows leave:
 * F_i,shell = 1 − Σ_{j ≠ shell} F_ij, its row by reciprocity and its self factor by closure.</li>
 * </ul>
 */
public final class SectionViewFactors {

    private SectionViewFactors() {
    }

    /**
     * @param section the section
     * @return view factors, perimeters and diagnostics, in the section's surface order
     * @throws GeometryException if the section lies outside what the method supports (crossing
     *         surfaces, a surface in the hollow of a concave arc, a second shell, a surface outside
     *         the shell), with the surfaces named
     */
    public static SectionResult compute(Section section) {
        int n = section.size();
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        double[][] keys = new double[n][];
        for (int i = 0; i < n; i++) {
            keys[i] = key(section.surfaces().get(i).element());
        }
        Arrays.sort(order, Comparator.comparing((Integer i) -> keys[i], Arrays::compare));
        List<SectionElement> elements = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int c = 0; c < n; c++) {
            if (c > 0 && Arrays.equals(keys[order[c]], keys[order[c - 1]])) {
                throw new GeometryException("section surfaces '" + section.surfaces().get(order[c - 1]).name()
                        + "' and '" + section.surfaces().get(order[c]).name() + "' are the same curve");
            }
            elements.add(section.surfaces().get(order[c]).element());
            names.add(section.surfaces().get(order[c]).name());
        }
        SectionPieces sp = new SectionPieces(elements, names);
        double[] x = exchange(sp, n);
        double[] len = new double[n];
        for (int c = 0; c < n; c++) {
            len[c] = elements.get(c).length();
        }
        if (sp.shell >= 0) {
            close(x, len, n, sp.shell);
        }
        // back to the section's order
        double[] f = new double[n * n], perimeters = new double[n];
        for (int a = 0; a < n; a++) {
            perimeters[order[a]] = len[a];
            for (int b = 0; b < n; b++) {
                f[order[a] * n + order[b]] = x[a * n + b] / len[a];
            }
        }
        List<String> userNames = section.surfaces().stream().map(Section.NamedElement::name).toList();
        return new SectionResult(userNames, perimeters, f, section.axialLength_m(),
                ClosureDiagnostics.of(f, n, perimeters, userNames::get));
    }

    /** Exchange lengths X_ij = L_i F_ij (m), row-major, canonical order. */
    private static double[] exchange(SectionPieces sp, int n) {
        double[] x = new double[n * n];
        for (int i = 0; i < n; i++) {
            x[i * n + i] = sp.selfExchange[i];
        }
        List<Piece> pieces = sp.pieces;
        for (int p = 0; p < pieces.size(); p++) {
            for (int q = p + 1; q < pieces.size(); q++) {
                Piece e = pieces.get(p), r = pieces.get(q);
                if (sp.lidOf[p] >= 0 || sp.lidOf[q] >= 0) {
                    // a lidded hollow sees only its lid, through the whole chord
                    if (sp.lidOf[p] == q || sp.lidOf[q] == p) {
                        Piece chord = sp.lidOf[p] == q ? e : r;
                        x[e.owner * n + r.owner] += chord.length;
                        x[r.owner * n + e.owner] += chord.length;
                    }
                    continue;
                }
                double[] box = union(e.box(), r.box());
                PairHull hull = new PairHull(e, r);
                List<Piece> obstacles = new ArrayList<>();
                for (Piece o : pieces) {
                    if (o != e && o != r && overlaps(o.box(), box) && !hull.excludes(o)) {
                        obstacles.add(o);
                    }
                }
                double v = CrossedStrings.exchange(e, r, obstacles);
                x[e.owner * n + r.owner] += v;
                x[r.owner * n + e.owner] += v;
            }
        }
        return x;
    }

    /** Gives the shell k the remainder of every row, then its own row by reciprocity and closure. Modifies x. */
    private static void close(double[] x, double[] len, int n, int k) {
        double rowOfShell = 0;
        for (int i = 0; i < n; i++) {
            if (i == k) {
                continue;
            }
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += j == k ? 0 : x[i * n + j];
            }
            x[i * n + k] = len[i] - s;
            x[k * n + i] = len[i] - s;
            rowOfShell += len[i] - s;
        }
        x[k * n + k] = len[k] - rowOfShell;
    }

    /** Canonical key of an element: kind, then its coordinates and side. */
    private static double[] key(SectionElement el) {
        if (el instanceof Segment s) {
            return new double[] {0, s.x0(), s.y0(), s.x1(), s.y1()};
        }
        if (el instanceof Arc a) {
            double start = a.startAngle() - 2 * Math.PI * Math.floor(a.startAngle() / (2 * Math.PI));
            return new double[] {1, a.cx(), a.cy(), a.radius(), start, a.sweep(), a.side().ordinal()};
        }
        Circle c = (Circle) el;
        return new double[] {2, c.cx(), c.cy(), c.radius(), c.side().ordinal()};
    }

    private static double[] union(double[] a, double[] b) {
        return new double[] {Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.max(a[2], b[2]), Math.max(a[3], b[3])};
    }

    private static boolean overlaps(double[] a, double[] b) {
        return a[0] <= b[2] && b[0] <= a[2] && a[1] <= b[3] && b[1] <= a[3];
    }
}
