package org.exitance.cases;

import java.util.List;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;

/**
 * Checks the windows of a case's {@code surfaces}: a window is two surfaces, its faces, that name
 * each other with {@code otherFace}, use the same semi-transparent material and the same area; one
 * face carries the boundary condition and the other gives none. Opaque surfaces have no
 * {@code otherFace}. Errors name the file and the JSON path of the offending surface.
 */
final class WindowFaces {
    /** The keys of a boundary condition (as in {@code CaseReader}). */
    private static final String[] CONDITION_KEYS = {"temperature_K", "temperature_C", "netHeat_W", "netFlux_W_m2",
        "dissipation_W", "adiabatic"};

    private WindowFaces() {
    }

    /** True when the surface object gives no boundary-condition key. */
    static boolean conditionLeftOut(JsonCursor s) {
        for (String k : CONDITION_KEYS) {
            if (s.has(k)) {
                return false;
            }
        }
        return true;
    }

    /**
     * @param cursors  the surface objects, in order
     * @param surfaces the surfaces read from them, same order
     */
    static void check(List<JsonCursor> cursors, List<EnclosureSurface> surfaces) throws CaseException {
        for (int i = 0; i < surfaces.size(); i++) {
            EnclosureSurface s = surfaces.get(i);
            JsonCursor c = cursors.get(i);
            if (s.otherFace() == null) {
                if (s.material().semiTransparent()) {
                    throw c.field("material").error("material '" + s.material().name() + "' is semi-transparent, so"
                            + " surface '" + s.name() + "' is a window face: name its other face with \"otherFace\"");
                }
                continue;
            }
            JsonCursor oc = c.field("otherFace");
            if (!s.material().semiTransparent()) {
                throw oc.error("surface '" + s.name() + "' has an opaque material ('" + s.material().name()
                        + "'); only a window (a material with transmissivity) has an other face");
            }
            if (s.otherFace().equals(s.name())) {
                throw oc.error("a window face cannot be its own other face");
            }
            int j = indexOf(surfaces, s.otherFace());
            if (j < 0) {
                throw oc.error("no surface named '" + s.otherFace() + "'");
            }
            EnclosureSurface o = surfaces.get(j);
            if (!s.name().equals(o.otherFace())) {
                throw oc.error("surface '" + o.name() + "' does not name '" + s.name() + "' as its otherFace"
                        + " (the two faces of a window name each other)");
            }
            if (!o.material().equals(s.material())) {
                throw c.field("material").error("window faces '" + s.name() + "' and '" + o.name()
                        + "' must use the same material, got '" + s.material().name() + "' and '"
                        + o.material().name() + "'");
            }
            if (o.areaM2() != s.areaM2()) {
                throw c.error("window faces '" + s.name() + "' and '" + o.name() + "' must have the same area, got "
                        + CaseReader.fmt(s.areaM2()) + " m² and " + CaseReader.fmt(o.areaM2()) + " m²");
            }
            boolean here = !(s.boundary() instanceof BoundaryCondition.OnOtherFace);
            boolean there = !(o.boundary() instanceof BoundaryCondition.OnOtherFace);
            if (here && there && i < j) {
                throw c.error("window faces '" + s.name() + "' and '" + o.name() + "' both give a boundary condition;"
                        + " give it on one face only (both faces share one temperature)");
            }
            if (!here && !there) {
                throw c.error("window faces '" + s.name() + "' and '" + o.name() + "' give no boundary condition;"
                        + " give one on one of the faces");
            }
        }
    }

    private static int indexOf(List<EnclosureSurface> surfaces, String name) {
        for (int i = 0; i < surfaces.size(); i++) {
            if (surfaces.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }
}
