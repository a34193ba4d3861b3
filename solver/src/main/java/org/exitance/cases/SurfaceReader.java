package org.exitance.cases;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Convection;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;

/**
 * Reads the {@code surfaces} array of a case: name, material, area (given, or from the geometry),
 * boundary condition, convection, starting temperature and the other face of a window
 * (docs/case-format.md, "surfaces"). Boundary conditions are read here for load cases too.
 */
final class SurfaceReader {
    private SurfaceReader() {
    }

    /**
     * @param materials     the case's materials by name
     * @param geometryAreas surface areas from the geometry (m²) by name, or null when the case gives areas
     */
    static List<EnclosureSurface> read(JsonCursor arr, Map<String, Material> materials,
                                       Map<String, Double> geometryAreas) throws CaseException {
        List<JsonCursor> el = arr.elementsWithin(Limits.FACETS);
        if (el.isEmpty()) {
            throw arr.error("needs at least one surface");
        }
        List<EnclosureSurface> out = new ArrayList<>();
        Map<String, String> seen = new LinkedHashMap<>();
        for (JsonCursor s : el) {
            s.allowOnly("name", "material", "area_m2", "temperature_K", "temperature_C", "netHeat_W",
                    "netFlux_W_m2", "dissipation_W", "adiabatic", "convection", "initialTemperature_K",
                    "initialTemperature_C", "description", "otherFace", "coveredBy", "thermalMass", "wall");
            JsonCursor nameCursor = s.field("name");
            String name = nameCursor.nonEmptyText();
            if (seen.containsKey(name)) {
                throw nameCursor.error("duplicate surface name '" + name + "' (first at " + seen.get(name) + ")");
            }
            seen.put(name, s.path());
            JsonCursor matCursor = s.field("material");
            String matName = matCursor.text();
            Material m = materials.get(matName);
            if (m == null) {
                throw matCursor.error("unknown material '" + matName + "' (declared: "
                        + String.join(", ", materials.keySet()) + ")");
            }
            double area = area(s, name, geometryAreas);
            String otherFace = s.has("otherFace") ? s.field("otherFace").nonEmptyText() : null;
            if (name.equals(otherFace)) {
                throw s.field("otherFace").error("a window face cannot be its own other face");
            }
            BoundaryCondition bc = otherFace != null && WindowFaces.conditionLeftOut(s)
                    ? new BoundaryCondition.OnOtherFace() : boundary(s);
            double initial = TemperatureField.read(s, "initialTemperature").orElse(Double.NaN);
            if (!Double.isNaN(initial) && !bc.temperatureUnknown()) {
                throw s.error("initialTemperature is only for surfaces whose temperature is unknown"
                        + (otherFace != null ? " (on a node with two faces, give it on the face with the condition)" : ""));
            }
            Convection convection = s.has("convection") ? convection(s.field("convection")) : null;
            out.add(new EnclosureSurface(name, m, area, bc, initial, convection, otherFace));
        }
        WindowFaces.check(el, out);
        return out;
    }

    /** Every surface the geometry makes must be listed in {@code $.surfaces}. */
    static void requireListed(Map<String, Double> geometryAreas, List<EnclosureSurface> surfaces, JsonCursor arr)
            throws CaseException {
        for (String name : geometryAreas.keySet()) {
            if (surfaces.stream().noneMatch(x -> x.name().equals(name))) {
                throw arr.error("the geometry makes a surface '" + name
                        + "' that $.surfaces does not list (give it a material and a boundary condition)");
            }
        }
    }

    /** Area of a surface: given in the case, or (for a geometry case) from its facets. */
    private static double area(JsonCursor s, String name, Map<String, Double> geometryAreas) throws CaseException {
        if (geometryAreas == null) {
            return s.field("area_m2").positiveWithin(Limits.AREA_M2);
        }
        if (s.has("area_m2")) {
            throw s.field("area_m2").error("the area of a surface comes from the geometry; leave area_m2 out");
        }
        Double a = geometryAreas.get(name);
        if (a == null) {
            throw s.field("name").error("no geometry part makes a surface named '" + name + "' (the geometry has: "
                    + String.join(", ", geometryAreas.keySet()) + ")");
        }
        return a;
    }

    /** The one boundary condition an object gives (a surface, or a surface's entry in a load case). */
    static BoundaryCondition boundary(JsonCursor s) throws CaseException {
        if (s.has("temperature_K") && s.has("temperature_C")) {
            throw s.error("give temperature_K or temperature_C, not both");
        }
        String which = s.exactlyOneOf("temperature_K", "temperature_C", "netHeat_W", "netFlux_W_m2",
                "dissipation_W", "adiabatic");
        switch (which) {
            case "temperature_K":
            case "temperature_C":
                return new BoundaryCondition.FixedTemperature(TemperatureField.read(s, "temperature").orElseThrow());
            case "netHeat_W":
                return new BoundaryCondition.FixedNetHeat(s.field("netHeat_W").within(Limits.HEAT_W));
            case "netFlux_W_m2":
                return new BoundaryCondition.FixedNetFlux(s.field("netFlux_W_m2").within(Limits.FLUX_W_M2));
            case "dissipation_W":
                return new BoundaryCondition.HeatInput(s.field("dissipation_W").within(Limits.HEAT_W));
            default:
                JsonCursor a = s.field("adiabatic");
                if (!a.bool()) {
                    throw a.error("write \"adiabatic\": true, or give a temperature, netHeat_W or netFlux_W_m2");
                }
                return new BoundaryCondition.Adiabatic();
        }
    }

    private static Convection convection(JsonCursor c) throws CaseException {
        c.allowOnly("coefficient_W_m2K", "fluidTemperature_K", "fluidTemperature_C");
        double h = c.field("coefficient_W_m2K").nonNegativeWithin(Limits.CONVECTION_W_M2K);
        double tf = TemperatureField.read(c, "fluidTemperature")
                .orElseThrow(() -> c.error("missing required key 'fluidTemperature_K' (or 'fluidTemperature_C')"));
        return new Convection(h, tf);
    }
}
