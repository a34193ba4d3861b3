package org.exitance.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Cover;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;

/**
 * Expands covered surfaces into their packs (model/Cover). A surface S keeps its name, material
 * and condition, and now faces only the first layer. Layer k is a two-sided opaque node with faces
 * {@code S.layer<k>.in} and {@code S.layer<k>.out}, both of layer k's material (S may be one face of a two-sided plate: the
 * hot-zone wall of a vacuum furnace, covered on its outer face); the last layer's outer face is
 * {@code S.outer}, which takes S's place in the enclosure (its row and column of F) and the
 * external irradiation aimed at S. Every gap between consecutive sheets is a pair of infinite
 * parallel sheets, F = 1 both ways (Siegel &amp; Howell, 5th ed., §6.3, radiation shields).
 *
 * <p>A pack given by its effective emittance ε* has one outer sheet ({@code S.cover.in},
 * {@code S.outer}): S's face under the pack is black and the sheet's inner face gray with ε*,
 * so that the gap carries exactly ε* σ(T_S⁴ − T_sheet⁴) per m² (1/(1/1 + 1/ε* − 1) = ε*); the
 * wall's own coating is part of what ε* states.
 */
final class CoverExpansion {

    /**
     * The expanded enclosure.
     *
     * @param surfaces  covered surfaces followed by their layers, in case order
     * @param matrix    view factors in that order (a new array)
     * @param outer     covered surface name → its outer face's name
     */
    record Result(List<EnclosureSurface> surfaces, double[][] matrix, Map<String, String> outer) {
    }

    private CoverExpansion() {
    }

    /**
     * @param surfaces  the case's surfaces
     * @param f         view factors in case order; not modified
     * @param covers    covers by surface name
     */
    static Result expand(List<EnclosureSurface> surfaces, double[][] f, Map<String, Cover> covers) {
        List<EnclosureSurface> out = new ArrayList<>();
        List<Integer> origin = new ArrayList<>(); // index into the case's surfaces of the row each new row copies, or -1
        List<int[]> gaps = new ArrayList<>();
        Map<String, String> outerNames = new LinkedHashMap<>();
        for (int i = 0; i < surfaces.size(); i++) {
            EnclosureSurface s = surfaces.get(i);
            Cover c = covers.get(s.name());
            if (c == null) {
                out.add(s);
                origin.add(i);
                continue;
            }
            double a = s.areaM2();
            int wall = out.size();
            Material under = c.effective() ? new Material(s.material().name() + " (under an effective emittance: black)",
                    new GrayEmissivity(1), "") : s.material();
            // a two-sided plate may be covered on one face: that face keeps its partner
            out.add(new EnclosureSurface(s.name(), under, a, s.boundary(), s.initialTemperatureK(), s.convection(),
                    s.otherFace()));
            origin.add(-1);
            int previous = wall;
            int sheets = c.effective() ? 1 : c.layers();
            for (int k = 1; k <= sheets; k++) {
                String in = c.effective() ? s.name() + ".cover.in" : s.name() + ".layer" + k + ".in";
                String o = k == sheets ? Cover.outerFace(s.name()) : s.name() + ".layer" + k + ".out";
                Material inner = c.effective() ? new Material(s.name() + " effective emittance",
                        new GrayEmissivity(c.effectiveEmittance()), "") : c.layerMaterial(k);
                Material outerMaterial = k == sheets ? c.outerMaterial() : c.layerMaterial(k);
                out.add(new EnclosureSurface(in, inner, a, new BoundaryCondition.Adiabatic(), Double.NaN, null, o));
                origin.add(-1);
                gaps.add(new int[] {previous, out.size() - 1});
                out.add(new EnclosureSurface(o, outerMaterial, a, new BoundaryCondition.OnOtherFace(), Double.NaN, null,
                        in));
                origin.add(k == sheets ? i : -1);
                previous = out.size() - 1;
            }
            outerNames.put(s.name(), Cover.outerFace(s.name()));
        }
        int n = out.size();
        double[][] m = new double[n][n];
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                if (origin.get(a) >= 0 && origin.get(b) >= 0) {
                    m[a][b] = f[origin.get(a)][origin.get(b)];
                }
            }
        }
        for (int[] g : gaps) {
            m[g[0]][g[1]] = 1;
            m[g[1]][g[0]] = 1;
        }
        return new Result(out, m, outerNames);
    }

    /** Moves the external irradiation aimed at a covered surface onto its outer face. */
    static List<ExternalSource> aimAtOuterFaces(List<ExternalSource> sources, Map<String, String> outer) {
        if (outer.isEmpty()) {
            return sources;
        }
        List<ExternalSource> moved = new ArrayList<>();
        for (ExternalSource src : sources) {
            Map<String, Double> inc = new LinkedHashMap<>();
            src.incidence().forEach((name, v) -> inc.put(outer.getOrDefault(name, name), v));
            moved.add(new ExternalSource(src.name(), src.spectrum(), src.irradianceWPerM2(), inc));
        }
        return moved;
    }
}
