package org.exitance.cases;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.Cover;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;

/**
 * Reads the {@code coveredBy} object of surfaces (docs/case-format.md, "Insulation and shield
 * packs"): {@code {"layers": N, "layerMaterial": "film", "outerMaterial": "outer_film"}}, one
 * material per layer from the surface outward {@code {"layerMaterials": ["moly", "moly", "steel"],
 * "outerMaterial": "steel"}}, or {@code {"effectiveEmittance": 0.02, "outerMaterial": "outer_film"}}.
 */
final class CoverReader {
    private CoverReader() {
    }

    /** The covers by surface name, in case order; empty when no surface has one. */
    static Map<String, Cover> read(JsonCursor arr, List<EnclosureSurface> surfaces, Map<String, Material> materials,
                                   boolean onFacets) throws CaseException {
        Map<String, Cover> out = new LinkedHashMap<>();
        List<JsonCursor> el = arr.elements();
        for (int i = 0; i < el.size(); i++) {
            JsonCursor s = el.get(i);
            if (!s.has("coveredBy")) {
                continue;
            }
            JsonCursor c = s.field("coveredBy").allowOnly("layers", "layerMaterial", "layerMaterials", "outerMaterial",
                    "effectiveEmittance", "layerThermalMass", "description");
            EnclosureSurface surface = surfaces.get(i);
            if (surface.isWindowFace()) {
                throw c.error("a window cannot be covered: its faces pass radiation through");
            }
            if (onFacets) {
                throw c.error("covered surfaces are solved on surfaces: leave the geometry's \"resolution\" at"
                        + " \"surfaces\"");
            }
            Material outer = material(c.field("outerMaterial"), materials);
            String form = c.exactlyOneOf("layers", "layerMaterials", "effectiveEmittance");
            Cover cover;
            if (form.equals("layers")) {
                JsonCursor n = c.field("layers");
                int layers = n.positiveInt();
                if (!Limits.COVER_LAYERS.contains(layers)) {
                    throw n.error("must be " + Limits.COVER_LAYERS.describe() + ", got " + layers);
                }
                cover = new Cover(layers, material(c.field("layerMaterial"), materials), outer);
            } else if (form.equals("layerMaterials")) {
                if (c.has("layerMaterial")) {
                    throw c.field("layerMaterial").error("give one shared material with \"layers\", or one per layer"
                            + " in \"layerMaterials\", not both");
                }
                cover = new Cover(layerList(c.field("layerMaterials"), materials), outer, Double.NaN);
            } else {
                if (c.has("layerMaterial")) {
                    throw c.field("layerMaterial").error("goes with \"layers\"; an effective emittance stands for the"
                            + " whole pack");
                }
                JsonCursor e = c.field("effectiveEmittance");
                double v = e.fraction();
                if (!(v > 0)) {
                    throw e.error("must be above 0, got " + v);
                }
                cover = Cover.effective(v, outer);
            }
            String outerName = Cover.outerFace(surface.name());
            if (surfaces.stream().anyMatch(x -> x.name().startsWith(surface.name() + "."))) {
                throw c.error("the names '" + surface.name() + ".…' are taken by the cover's layers ('" + outerName
                        + "' and the layers between); rename the other surface");
            }
            out.put(surface.name(), cover);
        }
        return out;
    }

    /** One opaque material per layer, from the covered surface outward; 1 to the layer limit of them. */
    private static List<Material> layerList(JsonCursor arr, Map<String, Material> materials) throws CaseException {
        List<JsonCursor> names = arr.elementsWithin(Limits.COVER_LAYERS);
        if (names.isEmpty()) {
            throw arr.error("must list one material per layer, from the covered surface outward; got none");
        }
        List<Material> out = new ArrayList<>(names.size());
        for (JsonCursor n : names) {
            out.add(material(n, materials));
        }
        return out;
    }

    private static Material material(JsonCursor c, Map<String, Material> materials) throws CaseException {
        String name = c.text();
        Material m = materials.get(name);
        if (m == null) {
            throw c.error("unknown material '" + name + "' (declared: " + String.join(", ", materials.keySet()) + ")");
        }
        if (m.semiTransparent()) {
            throw c.error("a layer of a cover is opaque; material '" + name + "' is semi-transparent");
        }
        return m;
    }
}
