package org.exitance.cases;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.conduction.HeatCapacity;
import org.exitance.conduction.Layer;
import org.exitance.conduction.OuterBoundary;
import org.exitance.conduction.PropertyTable;
import org.exitance.conduction.Wall;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;

/**
 * Reads what stores and conducts heat behind the surfaces (docs/case-format.md, "thermalMass"
 * and "wall"): a surface's {@code thermalMass} (a heat capacity, or a mass with a constant or
 * tabulated specific heat) and its layered {@code wall} with the outer boundary.
 */
final class StorageReader {
    private StorageReader() {
    }

    /** Heat capacities by the surface that carries the node's condition (a face's other face for a two-sided node). */
    static Map<String, HeatCapacity> capacities(JsonCursor arr, List<EnclosureSurface> surfaces,
                                                Map<String, org.exitance.model.Cover> covers) throws CaseException {
        Map<String, HeatCapacity> out = new LinkedHashMap<>();
        List<JsonCursor> el = arr.elements();
        for (int i = 0; i < el.size(); i++) {
            String name = surfaces.get(i).name();
            if (el.get(i).has("coveredBy") && el.get(i).field("coveredBy").has("layerThermalMass")) {
                // each sheet of the pack is a two-sided node carried by its inner face (pipeline/CoverExpansion)
                JsonCursor lm = el.get(i).field("coveredBy").field("layerThermalMass").allowOnly("heatCapacity_J_K",
                        "mass_kg", "specificHeat_J_kgK", "specificHeatTable");
                HeatCapacity each = capacity(lm);
                org.exitance.model.Cover c = covers.get(name);
                int sheets = c.effective() ? 1 : c.layers();
                for (int k = 1; k <= sheets; k++) {
                    out.put(c.effective() ? name + ".cover.in" : name + ".layer" + k + ".in", each);
                }
            }
            if (!el.get(i).has("thermalMass")) {
                continue;
            }
            JsonCursor m = el.get(i).field("thermalMass").allowOnly("heatCapacity_J_K", "mass_kg", "specificHeat_J_kgK",
                    "specificHeatTable");
            EnclosureSurface s = surfaces.get(i);
            String carrier = s.boundary() instanceof BoundaryCondition.OnOtherFace ? s.otherFace() : s.name();
            BoundaryCondition bc = surfaces.stream().filter(x -> x.name().equals(carrier)).findFirst().orElseThrow()
                    .boundary();
            if (!bc.balancesAllPaths()) {
                throw m.error("a node with a thermal mass needs a dissipation_W or adiabatic condition (its heat"
                        + " balance counts every path), not " + bc.label());
            }
            if (out.containsKey(carrier)) {
                throw m.error("the node of '" + carrier + "' already has a thermal mass (give it on one face)");
            }
            out.put(carrier, capacity(m));
        }
        return out;
    }

    private static HeatCapacity capacity(JsonCursor m) throws CaseException {
        if (m.has("heatCapacity_J_K")) {
            if (m.has("mass_kg") || m.has("specificHeat_J_kgK") || m.has("specificHeatTable")) {
                throw m.error("give heatCapacity_J_K, or mass_kg with a specific heat, not both");
            }
            return HeatCapacity.ofJPerK(m.field("heatCapacity_J_K").positiveWithin(Limits.HEAT_CAPACITY_J_K));
        }
        double mass = m.field("mass_kg").positiveWithin(Limits.MASS_KG);
        String which = m.exactlyOneOf("specificHeat_J_kgK", "specificHeatTable");
        PropertyTable c = which.equals("specificHeat_J_kgK")
                ? PropertyTable.constant(m.field("specificHeat_J_kgK").positiveWithin(Limits.SPECIFIC_HEAT_J_KGK))
                : table(m.field("specificHeatTable"), "specificHeat_J_kgK", Limits.SPECIFIC_HEAT_J_KGK);
        return new HeatCapacity(mass, c);
    }

    /** Walls by surface name. */
    static Map<String, Wall> walls(JsonCursor arr, List<EnclosureSurface> surfaces) throws CaseException {
        Map<String, Wall> out = new LinkedHashMap<>();
        List<JsonCursor> el = arr.elements();
        for (int i = 0; i < el.size(); i++) {
            if (el.get(i).has("wall")) {
                out.put(surfaces.get(i).name(), wall(el.get(i).field("wall")));
            }
        }
        return out;
    }

    private static Wall wall(JsonCursor w) throws CaseException {
        w.allowOnly("layers", "outside", "description");
        List<Layer> layers = new ArrayList<>();
        for (JsonCursor l : w.field("layers").elementsWithin(Limits.WALL_LAYERS)) {
            l.allowOnly("thickness_m", "conductivity_W_mK", "conductivityTable", "density_kg_m3", "specificHeat_J_kgK",
                    "cells", "description");
            double t = l.field("thickness_m").positiveWithin(Limits.THICKNESS_M);
            String which = l.exactlyOneOf("conductivity_W_mK", "conductivityTable");
            PropertyTable k = which.equals("conductivity_W_mK")
                    ? PropertyTable.constant(l.field("conductivity_W_mK").positiveWithin(Limits.CONDUCTIVITY_W_MK))
                    : table(l.field("conductivityTable"), "conductivity_W_mK", Limits.CONDUCTIVITY_W_MK);
            double rho = l.field("density_kg_m3").positiveWithin(Limits.DENSITY_KG_M3);
            double c = l.field("specificHeat_J_kgK").positiveWithin(Limits.SPECIFIC_HEAT_J_KGK);
            int cells = l.has("cells") ? l.field("cells").wholeWithin(Limits.WALL_CELLS) : 0;
            layers.add(new Layer(t, k, rho, c, cells));
        }
        if (layers.isEmpty()) {
            throw w.field("layers").error("a wall needs at least one layer");
        }
        JsonCursor o = w.field("outside");
        o.allowOnly("convection_W_m2K", "emissivity", "ambient_K", "ambient_C", "temperature_K", "temperature_C",
                "insulated");
        OuterBoundary ob;
        if (o.has("insulated")) {
            if (!o.field("insulated").bool()) {
                throw o.field("insulated").error("write \"insulated\": true, or give an ambient or a temperature");
            }
            if (o.has("ambient_K") || o.has("ambient_C") || o.has("temperature_K") || o.has("temperature_C")) {
                throw o.error("an insulated outer face takes no temperature");
            }
            ob = new OuterBoundary.Insulated();
        } else if (o.has("temperature_K") || o.has("temperature_C")) {
            if (o.has("ambient_K") || o.has("ambient_C") || o.has("convection_W_m2K") || o.has("emissivity")) {
                throw o.error("give a held temperature, or an ambient with convection and emissivity, not both");
            }
            ob = new OuterBoundary.Held(TemperatureField.read(o, "temperature").orElseThrow());
        } else {
            double ta = TemperatureField.read(o, "ambient", Limits.ENVIRONMENT_TEMPERATURE_K)
                    .orElseThrow(() -> o.error("give \"insulated\": true, a temperature_K, or an ambient_K with"
                            + " convection_W_m2K and emissivity"));
            double h = o.has("convection_W_m2K") ? o.field("convection_W_m2K").nonNegativeWithin(Limits.CONVECTION_W_M2K)
                    : 0;
            double e = o.has("emissivity") ? o.field("emissivity").within(Limits.FRACTION) : 0;
            if (h == 0 && e == 0) {
                throw o.error("an outer face open to an ambient needs convection_W_m2K or emissivity above 0");
            }
            ob = new OuterBoundary.Exposed(h, e, ta);
        }
        return new Wall(layers, ob);
    }

    /** A property table {"temperature_K": [...], key: [...]} in increasing temperature. */
    static PropertyTable table(JsonCursor t, String key, Limits.Range range) throws CaseException {
        t.allowOnly("temperature_K", key);
        List<JsonCursor> tk = t.field("temperature_K").elementsWithin(Limits.TABLE_POINTS);
        List<JsonCursor> v = t.field(key).elementsWithin(Limits.TABLE_POINTS);
        if (tk.size() != v.size() || tk.isEmpty()) {
            throw t.error("needs as many values in " + key + " as temperatures, at least one");
        }
        double[] x = new double[tk.size()];
        double[] y = new double[tk.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = tk.get(i).positiveWithin(Limits.TEMPERATURE_K);
            y[i] = v.get(i).positiveWithin(range);
            if (i > 0 && !(x[i] > x[i - 1])) {
                throw tk.get(i).error("table temperatures must increase");
            }
        }
        return new PropertyTable(x, y);
    }
}
