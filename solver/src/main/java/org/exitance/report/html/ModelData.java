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
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;

/**
 * The data of the 3-D view, as JSON for the page's script: the scene's facets as triangles
 * (each convex facet split into a fan from its first vertex, coordinates in m), the facet
 * outlines, and per frame (a load case of a solve, an output instant of a transient) each
 * facet's temperature (K) and net flux (W/m²) with each surface's totals. A facet takes its own
 * result where the case was solved on facets ({@code SURFACE#k}), else its surface's. A scene
 * surface without a result of that name (none in a consistent case) has null values and
 * {@code "solved": false}; the page draws it grey and says so when it is picked.
 */
final class ModelData {
    /** One surface's (or facet's) values in a frame: area (m²), temperature (K), net heat (W), net flux (W/m²). */
    private record Values(double areaM2, double temperatureK, double netHeatW, double netFluxWPerM2) {
    }

    private ModelData() {
    }

    /**
     * The view of a solve: one frame per load case, each on its own colour scale.
     *
     * @param scene   the case's geometry (not modified)
     * @param results the solved load cases (or the one solve), in order
     */
    static ObjectNode of(Scene scene, List<LoadCaseResult> results) {
        ObjectNode m = geometry(scene);
        m.put("frameKind", "Load case");
        m.put("commonScale", false);
        ArrayNode frames = m.putArray("frames");
        for (LoadCaseResult lc : results) {
            SolveResult r = lc.result();
            Map<String, Values> byName = new HashMap<>();
            for (List<SurfaceResult> list : List.of(r.surfaces(), r.facets())) {
                list.forEach(s -> byName.put(s.name(), new Values(s.areaM2(), s.temperatureK(), s.netHeatW(),
                        s.netFluxWPerM2())));
            }
            frames.add(frame(scene, lc.name(), !r.facets().isEmpty(), byName));
        }
        return m;
    }

    /**
     * The view of a transient run: one frame per output instant, on one colour scale over the
     * whole run, with the still pictures at some of the instants.
     *
     * @param scene       the case's geometry (not modified)
     * @param names       the frames' names, one per sample
     * @param first       the frame shown first
     * @param stillFrames the frames of the still pictures (not modified)
     */
    static ObjectNode ofRun(Scene scene, TransientResult r, List<String> names, int first, int[] stillFrames) {
        ObjectNode m = geometry(scene);
        m.put("frameKind", "Instant");
        m.put("commonScale", true);
        m.put("firstFrame", first);
        ArrayNode stills = m.putArray("stillFrames");
        for (int f : stillFrames) {
            stills.add(f);
        }
        Map<String, Double> area = new HashMap<>();
        for (Surface s : scene.surfaces()) {
            area.put(s.name(), s.area());
            for (int k = 0; k < s.facets().size(); k++) {
                area.put(s.name() + "#" + (k + 1), s.facets().get(k).area());
            }
        }
        boolean facetResolved = r.surfaces().stream().anyMatch(s -> s.contains("#"));
        ArrayNode frames = m.putArray("frames");
        for (int f = 0; f < r.samples().size(); f++) {
            Sample x = r.samples().get(f);
            Map<String, Values> byName = new HashMap<>();
            for (int i = 0; i < r.surfaces().size(); i++) {
                String name = r.surfaces().get(i);
                if (area.containsKey(name)) {
                    double a = area.get(name);
                    byName.put(name, new Values(a, x.temperatureK()[i], x.radiationW()[i], x.radiationW()[i] / a));
                }
            }
            frames.add(frame(scene, names.get(f), facetResolved, byName));
        }
        return m;
    }

    /** Positions, triangles, outlines and names of the scene. */
    private static ObjectNode geometry(Scene scene) {
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
        return m;
    }

    /** One frame: per scene surface its totals, per facet its own values or its surface's. */
    private static ObjectNode frame(Scene scene, String name, boolean facetResolved, Map<String, Values> byName) {
        ObjectNode c = JsonNodeFactory.instance.objectNode();
        c.put("name", name);
        c.put("facetResolved", facetResolved);
        ArrayNode t = c.putArray("facetTemperatureK");
        ArrayNode q = c.putArray("facetNetFluxWPerM2");
        ArrayNode surfaces = c.putArray("surfaces");
        for (Surface surface : scene.surfaces()) {
            Values s = byName.get(surface.name());
            ObjectNode o = surfaces.addObject();
            o.put("solved", s != null);
            o.put("areaM2", s == null ? surface.area() : s.areaM2());
            if (s != null) {
                o.put("temperatureK", s.temperatureK());
                o.put("netHeatW", s.netHeatW());
                o.put("netFluxWPerM2", s.netFluxWPerM2());
            }
            for (int k = 1; k <= surface.facets().size(); k++) {
                Values own = byName.getOrDefault(surface.name() + "#" + k, s);
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
