package org.exitance.pipeline;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.cases.CaseSource;
import org.exitance.cases.SourcePlacement;
import org.exitance.geometry.Scene;
import org.exitance.geometry.external.CollimatedIncidence;
import org.exitance.geometry.external.IncidenceResult;
import org.exitance.geometry.external.PlanetViewFactor;
import org.exitance.geometry.external.ShadowedPlanetView;
import org.exitance.model.ExternalSource;

/**
 * Incidence factors of the sources a geometry places: a collimated source's cos θ times lit
 * fraction (ray casting), a planet's view factor to a sphere; given factors pass unchanged.
 * Every factor is clamped to [0, 1].
 */
final class SourceIncidence {
    private SourceIncidence() {
    }

    /**
     * @param scene      the case's geometry, or null for a matrix case (every placement is then given)
     * @param facetNames for a case solved on facets, the facets' names in scene order: a source placed
     *                   by the geometry then gets a factor per facet; null to get one per surface
     */
    static List<ExternalSource> place(List<CaseSource> sources, Scene scene, List<String> facetNames) {
        List<ExternalSource> out = new ArrayList<>();
        for (CaseSource c : sources) {
            ExternalSource s = c.source();
            IncidenceResult r;
            if (c.placement() instanceof SourcePlacement.Collimated d) {
                r = new CollimatedIncidence(scene).compute(d.direction());
            } else if (c.placement() instanceof SourcePlacement.Planet p) {
                r = p.shadowing() ? new ShadowedPlanetView(scene).compute(p.toward(), p.altitudeM(), p.radiusM())
                        : PlanetViewFactor.compute(scene, p.toward(), p.altitudeM(), p.radiusM());
            } else {
                out.add(s);
                continue;
            }
            out.add(new ExternalSource(s.name(), s.spectrum(), s.irradianceWPerM2(), factors(r, facetNames)));
        }
        return out;
    }

    /** Per-surface (or, with facet names, per-facet) factors of a geometry computation. */
    private static Map<String, Double> factors(IncidenceResult r, List<String> facetNames) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (facetNames != null) {
            for (int f = 0; f < facetNames.size(); f++) {
                out.put(facetNames.get(f), Math.min(1.0, Math.max(0.0, r.facetFactors()[f])));
            }
            return out;
        }
        for (int i = 0; i < r.surfaceNames().size(); i++) {
            out.put(r.surfaceNames().get(i), Math.min(1.0, Math.max(0.0, r.surfaceFactors()[i])));
        }
        return out;
    }
}
