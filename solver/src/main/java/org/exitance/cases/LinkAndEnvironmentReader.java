package org.exitance.cases;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.exitance.model.ConductiveLink;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;

/**
 * Reads the {@code environment} of a case (the blackbody surroundings that receive what leaves
 * an open enclosure) and its {@code conductiveLinks} between surfaces (docs/case-format.md).
 */
final class LinkAndEnvironmentReader {
    private LinkAndEnvironmentReader() {
    }

    /** The environment, or null for a closed enclosure. */
    static Environment environment(JsonCursor root) throws CaseException {
        Optional<JsonCursor> o = root.optional("environment");
        if (o.isEmpty()) {
            return null;
        }
        JsonCursor e = o.get().allowOnly("name", "temperature_K", "temperature_C", "description");
        String name = e.field("name").nonEmptyText();
        double t = TemperatureField.read(e, "temperature", Limits.ENVIRONMENT_TEMPERATURE_K)
                .orElseThrow(() -> e.error("missing required key 'temperature_K' (or 'temperature_C')"));
        return new Environment(name, t);
    }

    /** The conductive links (W/K) between the case's surfaces; empty when there are none. */
    static List<ConductiveLink> links(JsonCursor root, List<EnclosureSurface> surfaces) throws CaseException {
        Optional<JsonCursor> o = root.optional("conductiveLinks");
        if (o.isEmpty()) {
            return List.of();
        }
        List<ConductiveLink> out = new ArrayList<>();
        for (JsonCursor l : o.get().elements()) {
            l.allowOnly("between", "conductance_W_K", "description");
            JsonCursor between = l.field("between");
            List<JsonCursor> ends = between.elements();
            if (ends.size() != 2) {
                throw between.error("needs exactly two surface names, got " + ends.size());
            }
            String a = ends.get(0).text();
            String b = ends.get(1).text();
            for (int k = 0; k < 2; k++) {
                String name = k == 0 ? a : b;
                if (surfaces.stream().noneMatch(x -> x.name().equals(name))) {
                    throw ends.get(k).error("no surface named '" + name + "'");
                }
            }
            if (a.equals(b)) {
                throw between.error("a conductive link needs two different surfaces");
            }
            out.add(new ConductiveLink(a, b, l.field("conductance_W_K").positiveWithin(Limits.CONDUCTANCE_W_K)));
        }
        return out;
    }
}
