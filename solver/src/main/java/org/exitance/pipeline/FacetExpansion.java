package org.exitance.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.FacetGroups;
import org.exitance.model.ViewFactorMatrix;

/**
 * Turns a geometry case solved on facets into an enclosure of facets: each facet of surface S
 * becomes an enclosure surface {@code S#k} with S's material, convection and boundary condition
 * as a facet carries it ({@link FacetGroups#forFacet}), and the facet view-factor matrix. Results
 * are reported back by surface.
 */
final class FacetExpansion {
    /**
     * @param surfaces    the facet surfaces, case-surface order then scene order within a surface
     * @param matrix      facet view factors in that order
     * @param groups      the grouping back to the case's surfaces
     * @param sceneOrder  facet names in scene order (as the geometry numbers facets)
     */
    record Result(List<EnclosureSurface> surfaces, ViewFactorMatrix matrix, FacetGroups groups, List<String> sceneOrder) {
    }

    private FacetExpansion() {
    }

    /**
     * @param caseSurfaces the case's surfaces (none a window face: the reader has checked)
     * @param open         whether an environment receives what the facet rows leave
     * @param warnings     receives a line when the facet matrix is made consistent (modified)
     */
    static Result expand(ComputedViewFactors v, List<EnclosureSurface> caseSurfaces, boolean open,
                         java.nio.file.Path file, List<String> warnings) throws org.exitance.cases.CaseException {
        ComputedViewFactors.FacetFactors ff = v.facets();
        int n = ff.count();
        String[] sceneNames = new String[n];
        int[] counter = new int[v.surfaceNames().size()];
        for (int f = 0; f < n; f++) {
            int s = ff.surfaceIndex()[f];
            sceneNames[f] = FacetGroups.facetName(v.surfaceNames().get(s), ++counter[s]);
        }
        List<EnclosureSurface> out = new ArrayList<>();
        List<Integer> order = new ArrayList<>();
        Map<String, List<String>> groups = new LinkedHashMap<>();
        for (EnclosureSurface s : caseSurfaces) {
            int si = v.surfaceNames().indexOf(s.name());
            List<String> names = new ArrayList<>();
            for (int f = 0; f < n; f++) {
                if (ff.surfaceIndex()[f] == si) {
                    double a = ff.areasM2()[f];
                    out.add(new EnclosureSurface(sceneNames[f], s.material(), a,
                            FacetGroups.forFacet(s.boundary(), a, s.areaM2()), s.initialTemperatureK(), s.convection()));
                    order.add(f);
                    names.add(sceneNames[f]);
                }
            }
            groups.put(s.name(), names);
        }
        double[] area = new double[n];
        for (int a = 0; a < n; a++) {
            area[a] = out.get(a).areaM2();
        }
        ViewFactorMatrix m = ff.compressed() != null ? compressedMatrix(ff, order, n)
                : facetMatrix(ff.matrix(), order, n, area, open, file, warnings);
        return new Result(out, m, new FacetGroups(groups), List.of(sceneNames));
    }

    /**
     * The facet matrix in expansion order, negative entries (round-off of hidden pairs) and −0 held at +0.
     * Held once: when the order is the scene's own and no entry is negative, the matrix shares the
     * computed array (read only from then on); otherwise it is one reordered copy.
     *
     * @param scene  facet view factors in scene order, row-major; not modified
     */
    private static ViewFactorMatrix facetMatrix(double[] scene, List<Integer> order, int n, double[] area,
                                                boolean open, java.nio.file.Path file, List<String> warnings)
            throws org.exitance.cases.CaseException {
        boolean identity = true;
        for (int a = 0; a < n && identity; a++) {
            identity = order.get(a) == a;
        }
        boolean nonNegative = true;
        for (int i = 0; i < scene.length && nonNegative; i++) {
            nonNegative = Double.doubleToRawLongBits(scene[i]) >= 0; // sign bit clear: +0 and positive, not −0
        }
        if (identity && nonNegative
                && ConsistentViewFactors.worstError(scene, n, area, open) <= ConsistentViewFactors.CONSISTENT) {
            return ViewFactorMatrix.adopt(scene, n);
        }
        double[] m = new double[scene.length];
        for (int a = 0; a < n; a++) {
            int fa = order.get(a);
            for (int b = 0; b < n; b++) {
                m[a * n + b] = Math.max(0.0, scene[fa * n + order.get(b)]);
            }
        }
        try {
            String changed = ConsistentViewFactors.repair(m, n, area, open);
            if (changed != null) {
                warnings.add(changed.replace("view factors:", "facet view factors:"));
            }
        } catch (ConsistentViewFactors.Unrepairable e) {
            throw new org.exitance.cases.CaseException(file, "$.geometry", e.getMessage());
        }
        return ViewFactorMatrix.adopt(m, n);
    }

    /**
     * The compressed facet operator in expansion order (renumbered, not copied). Its rows are
     * reciprocal by construction and, closed, scaled to 1; rows above 1 by more than
     * {@link GeometryViewFactors#OVERLAP} were refused before this, smaller excesses are in the
     * accuracy check (an open row's remainder is then held at 0 for the environment).
     */
    private static ViewFactorMatrix compressedMatrix(ComputedViewFactors.FacetFactors ff, List<Integer> order, int n) {
        ViewFactorMatrix m = ViewFactorMatrix.compressed(ff.compressed());
        int[] o = order.stream().mapToInt(Integer::intValue).toArray();
        boolean identity = true;
        for (int a = 0; a < n && identity; a++) {
            identity = o[a] == a;
        }
        return identity ? m : m.permuted(o);
    }

    /** Spreads incidence factors given per case surface onto that surface's facets. */
    static List<ExternalSource> spreadOverFacets(List<ExternalSource> sources, FacetGroups groups) {
        List<ExternalSource> out = new ArrayList<>();
        for (ExternalSource src : sources) {
            Map<String, Double> inc = new LinkedHashMap<>();
            for (Map.Entry<String, Double> e : src.incidence().entrySet()) {
                List<String> facets = groups.facetsBySurface().get(e.getKey());
                if (facets == null) {
                    inc.put(e.getKey(), e.getValue()); // already per facet
                } else {
                    facets.forEach(f -> inc.put(f, e.getValue()));
                }
            }
            out.add(new ExternalSource(src.name(), src.spectrum(), src.irradianceWPerM2(), inc));
        }
        return out;
    }
}
