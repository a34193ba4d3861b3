package org.exitance.cases;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.LoadCase;

/**
 * Reads the {@code loadCases} array: named variants of the case that replace some surfaces'
 * boundary conditions and choose which sources shine (docs/case-format.md, "loadCases").
 */
final class LoadCaseReader {
    private LoadCaseReader() {
    }

    /**
     * @param surfaceNames the case's surface names
     * @param sourceNames  the case's source names
     */
    static List<LoadCase> read(JsonCursor arr, Set<String> surfaceNames, Set<String> sourceNames)
            throws CaseException {
        List<LoadCase> out = new ArrayList<>();
        Set<String> names = new HashSet<>();
        List<JsonCursor> el = arr.elements();
        if (el.isEmpty()) {
            throw arr.error("needs at least one load case (or leave the key out)");
        }
        for (JsonCursor lc : el) {
            lc.allowOnly("name", "description", "surfaces", "sources");
            JsonCursor nameCursor = lc.field("name");
            String name = nameCursor.nonEmptyText();
            if (!names.add(name)) {
                throw nameCursor.error("duplicate load case name '" + name + "'");
            }
            String description = lc.has("description") ? lc.field("description").text() : "";
            Map<String, BoundaryCondition> boundaries = new LinkedHashMap<>();
            if (lc.has("surfaces")) {
                for (Map.Entry<String, JsonCursor> e : lc.field("surfaces").entries()) {
                    if (!surfaceNames.contains(e.getKey())) {
                        throw e.getValue().error("no surface named '" + e.getKey() + "'");
                    }
                    JsonCursor b = e.getValue().allowOnly("temperature_K", "temperature_C", "netHeat_W",
                            "netFlux_W_m2", "dissipation_W", "adiabatic");
                    boundaries.put(e.getKey(), SurfaceReader.boundary(b));
                }
            }
            List<String> active = null;
            if (lc.has("sources")) {
                active = new ArrayList<>();
                for (JsonCursor x : lc.field("sources").elements()) {
                    String sn = x.text();
                    if (!sourceNames.contains(sn)) {
                        throw x.error("no source named '" + sn + "'");
                    }
                    active.add(sn);
                }
            }
            out.add(new LoadCase(name, description, boundaries, active));
        }
        return out;
    }
}
