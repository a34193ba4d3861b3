package org.exitance.report.html;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;

/**
 * The data of the 3-D view, as JSON for the page's script: the scene's facets as triangles
 * (each convex facet split into a fan from its first vertex, coordinates in m), the facet
 * outlines, and per load case each facet's temperature (K) and net flux (W/m²) with each
 * surface's totals. A facet takes its own result where the case was solved on facets
 * ({@code SURFACE#k}), else its surface's. A scene surface without a result of that name (none
 * in a consistent case) has null values and {@code "solved": false}; the page draws it grey and
 * says so when it is picked.
 */
final class ModelData {
    private ModelData() {
    }

    /**
     * @param scene   the case's geometry (not modified)
     * @param results the solved load cases (or the one solve), in order
     */
    static ObjectNode of(Scene scene, List<LoadCaseResult> results) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        ObjectNode m = f.objectNode();
        ArrayNode positions = m.putArray("positions");
        ArrayNode triangleFacet = m.putArray("triangleFacet");
        ArrayNode facetSurface = m.putArray("facetSurface");
        ArrayNode facetLabel = m.putArray("facetLabel");
        ArrayNode edges = m.putArray("edges");
        ArrayNode edgeFacet = m.putArray("edgeFacet");
        ArrayNode surfaces = m.putArray("surfaces");
        int facet = 0;
        for (int s = 0; s < scene.surfaces().size(); s++) {
            Surface surface = scene.surfaces().get(s);
            surfaces.add(surface.name());
            int k = 0;
            for (Facet x : surface.facets()) {
                facetSurface.add(s);
                facetLabel.add(surface.name() + "#" + ++k);
                List<Vec3> v = x.vertices();
                for (int i = 1; i + 1 < v.size(); i++) {
                    add(positions, v.get(0));
                    add(positions, v.get(i));
                    add(positions, v.get(i + 1));
                    triangleFacet.add(facet);
                }
                for (int i = 0; i < v.size(); i++) {
                    add(edges, v.get(i));
                    add(edges, v.get((i + 1) % v.size()));
                    edgeFacet.add(facet);
                }
                facet++;
            }
        }
        ArrayNode cases = m.putArray("loadCases");
        for (LoadCaseResult lc : results) {
            cases.add(loadCase(scene, lc.name(), lc.result()));
        }
        return m;
    }

    private static ObjectNode loadCase(Scene scene, String name, SolveResult r) {
        Map<String, SurfaceResult> byName = new HashMap<>();
        r.surfaces().forEach(s -> byName.put(s.name(), s));
        Map<String, SurfaceResult> facets = new HashMap<>();
        r.facets().forEach(s -> facets.put(s.name(), s));
        ObjectNode c = JsonNodeFactory.instance.objectNode();
        c.put("name", name);
        c.put("facetResolved", !r.facets().isEmpty());
        ArrayNode t = c.putArray("facetTemperatureK");
        ArrayNode q = c.putArray("facetNetFluxWPerM2");
        ArrayNode surfaces = c.putArray("surfaces");
        for (Surface surface : scene.surfaces()) {
            SurfaceResult s = byName.get(surface.name());
            ObjectNode o = surfaces.addObject();
            o.put("solved", s != null);
            o.put("areaM2", s == null ? surface.area() : s.areaM2());
            if (s != null) {
                o.put("temperatureK", s.temperatureK());
                o.put("netHeatW", s.netHeatW());
                o.put("netFluxWPerM2", s.netFluxWPerM2());
            }
            for (int k = 1; k <= surface.facets().size(); k++) {
                SurfaceResult own = facets.getOrDefault(surface.name() + "#" + k, s);
                if (own == null) {
                    t.addNull();
                    q.addNull();
                } else {
                    t.add(own.temperatureK());
                    q.add(own.netFluxWPerM2());
                }
            }
        }
        return c;
    }

    private static void add(ArrayNode a, Vec3 v) {
        a.add((float) v.x());
        a.add((float) v.y());
        a.add((float) v.z());
    }
}
