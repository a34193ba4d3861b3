package org.exitance.cases;

import java.util.List;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;

/**
 * Checks the nodes with two faces of a case's {@code surfaces}: two surfaces that name each other
 * with {@code otherFace}, have the same area, and of which one carries the boundary condition and
 * the other gives none. A window (a semi-transparent material) must have two faces, both with its
 * material; a two-sided opaque plate (a shield, a fin) may give each face its own coating.
 * Errors name the file and the JSON path of the offending surface.
 */
final class WindowFaces {
    /**
     * Largest relative difference of the two faces' areas that counts as equal: the areas of a
     * two-sided geometry part's faces ({@code NAME.front}, {@code NAME.back}) are sums over the same
     * facets in opposite vertex order and may differ in the last digits.
     */
    static final double AREA_ROUNDING = 1e-9;

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
     * @param surfaces the surfaces read from them, same order (modified: the second face of a node
     *                 whose areas agree to {@link #AREA_ROUNDING} takes the first face's area exactly)
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
            if (s.otherFace().equals(s.name())) {
                throw oc.error("a face cannot be its own other face");
            }
            int j = indexOf(surfaces, s.otherFace());
            if (j < 0) {
                throw oc.error("no surface named '" + s.otherFace() + "'");
            }
            EnclosureSurface o = surfaces.get(j);
            if (!s.name().equals(o.otherFace())) {
                throw oc.error("surface '" + o.name() + "' does not name '" + s.name() + "' as its otherFace"
                        + " (the two faces of a node name each other)");
            }
            if (s.material().semiTransparent() != o.material().semiTransparent()) {
                throw c.field("material").error("faces '" + s.name() + "' and '" + o.name() + "': one is a window"
                        + " face (semi-transparent '" + (s.material().semiTransparent() ? s : o).material().name()
                        + "') and the other opaque; a window's faces share its material");
            }
            if (s.material().semiTransparent() && !o.material().equals(s.material())) {
                throw c.field("material").error("window faces '" + s.name() + "' and '" + o.name()
                        + "' must use the same material, got '" + s.material().name() + "' and '"
                        + o.material().name() + "'");
            }
            if (Math.abs(o.areaM2() - s.areaM2()) > AREA_ROUNDING * Math.max(o.areaM2(), s.areaM2())) {
                throw c.error("faces '" + s.name() + "' and '" + o.name() + "' of one node must have the same area, got "
                        + CaseReader.fmt(s.areaM2()) + " m² and " + CaseReader.fmt(o.areaM2()) + " m²");
            }
            if (i < j && o.areaM2() != s.areaM2()) {
                o = new EnclosureSurface(o.name(), o.material(), s.areaM2(), o.boundary(), o.initialTemperatureK(),
                        o.convection(), o.otherFace());
                surfaces.set(j, o);
            }
            boolean here = !(s.boundary() instanceof BoundaryCondition.OnOtherFace);
            boolean there = !(o.boundary() instanceof BoundaryCondition.OnOtherFace);
            if (here && there && i < j) {
                throw c.error("faces '" + s.name() + "' and '" + o.name() + "' both give a boundary condition;"
                        + " give it on one face only (both faces share one temperature)");
            }
            if (!here && !there) {
                throw c.error("faces '" + s.name() + "' and '" + o.name() + "' give no boundary condition;"
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
