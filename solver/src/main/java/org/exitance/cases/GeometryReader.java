package org.exitance.cases;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Transform;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.exitance.geometry.viewfactor.Obstruction;
import org.exitance.geometry.viewfactor.Smoothing;
import org.exitance.geometry.viewfactor.ViewFactorOptions;

/**
 * Reads the {@code geometry} object of a case into a scene of named surfaces and the view-factor
 * options (format: docs/case-format.md, "geometry"). Parts that name the same surface are merged
 * into it. Lengths are in metres; directions need not be unit vectors.
 */
final class GeometryReader {
    private GeometryReader() {
    }

    static CaseGeometry read(JsonCursor g, Path caseDir) throws CaseException {
        g.allowOnly("parts", "options");
        Map<String, List<Facet>> bySurface = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        List<JsonCursor> parts = g.field("parts").elementsWithin(Limits.FACETS);
        if (parts.isEmpty()) {
            throw g.field("parts").error("needs at least one part");
        }
        long[] facets = {0};
        for (JsonCursor p : parts) {
            try {
                for (Surface s : part(p, caseDir, notes, facets)) {
                    bySurface.computeIfAbsent(s.name(), k -> new ArrayList<>()).addAll(s.facets());
                }
            } catch (IllegalArgumentException e) { // GeometryException and the checks of Vec3 and Transform
                throw p.error(CaseException.oneLine(e.getMessage()));
            }
        }
        requireWithinBounds(g.field("parts"), bySurface);
        Scene.Builder b = Scene.builder();
        bySurface.forEach(b::add);
        Scene scene;
        try {
            scene = b.build();
        } catch (IllegalArgumentException e) {
            throw g.error(CaseException.oneLine(e.getMessage()));
        }
        ViewFactorOptions options = g.has("options") ? options(g.field("options")) : ViewFactorOptions.defaults();
        boolean onFacets = false;
        if (g.has("options") && g.field("options").has("resolution")) {
            JsonCursor r = g.field("options").field("resolution");
            onFacets = switch (r.text()) {
                case "surfaces" -> false;
                case "facets" -> true;
                default -> throw r.error("must be \"surfaces\" or \"facets\", got \"" + r.text() + "\"");
            };
        }
        CaseGeometry.Storage storage = CaseGeometry.Storage.AUTO;
        if (g.has("options") && g.field("options").has("storage")) {
            JsonCursor r = g.field("options").field("storage");
            storage = switch (r.text()) {
                case "auto" -> CaseGeometry.Storage.AUTO;
                case "dense" -> CaseGeometry.Storage.DENSE;
                case "compressed" -> CaseGeometry.Storage.COMPRESSED;
                default -> throw r.error("must be \"auto\", \"dense\" or \"compressed\", got \"" + r.text() + "\"");
            };
        }
        CaseGeometry cg = new CaseGeometry(scene, options, notes, onFacets, CaseGeometry.DEFAULT_TOLERANCE, storage);
        if (g.has("options") && g.field("options").has("tolerance")) {
            cg = cg.withTolerance(g.field("options").field("tolerance").positiveWithin(Limits.VIEW_FACTOR_TOLERANCE));
        }
        return cg;
    }

    private static final String[] SHAPES = {"rectangle", "polygon", "disc", "annulus", "cylinder", "cone", "sphere",
        "box", "cylindricalCavity", "mesh"};

    /** @param facets the facet count of the parts so far (modified: this part's facets are added) */
    private static List<Surface> part(JsonCursor p, Path caseDir, List<String> notes, long[] facets)
            throws CaseException {
        p.allowOnly("surface", "twoSided", "transform", "rectangle", "polygon", "disc", "annulus", "cylinder", "cone",
                "sphere", "box", "cylindricalCavity", "mesh");
        String kind = p.exactlyOneOf(SHAPES);
        JsonCursor s = p.field(kind);
        int sides = p.has("twoSided") && p.field("twoSided").bool() ? 2 : 1;
        List<Surface> out;
        switch (kind) {
            case "box" -> out = box(s, facets, sides);
            case "cylindricalCavity" -> out = cavity(s, facets, sides);
            case "mesh" -> {
                if (sides == 2 && s.has("twoSidedGroups")) {
                    throw s.field("twoSidedGroups").error("the whole part is already two-sided (\"twoSided\": true);"
                            + " give one or the other");
                }
                out = MeshPartReader.read(s, caseDir, notes);
                facets[0] = GeometryNumbers.addFacets(s, facets[0],
                        (double) sides * out.stream().mapToInt(x -> x.facets().size()).sum());
            }
            default -> {
                String name = p.field("surface").nonEmptyText();
                out = List.of(new Surface(name, shape(kind, s, facets, sides)));
            }
        }
        boolean namesItsOwnSurfaces = kind.equals("box") || kind.equals("cylindricalCavity") || kind.equals("mesh");
        if (namesItsOwnSurfaces && p.has("surface")) {
            throw p.field("surface").error("a " + kind + " names its surfaces inside the part, not with \"surface\"");
        }
        if (p.has("transform")) {
            Transform t = transform(p.field("transform"));
            List<Surface> moved = new ArrayList<>();
            for (Surface x : out) {
                moved.add(x.transformed(t));
            }
            out = moved;
        }
        if (sides == 2) {
            List<Surface> both = new ArrayList<>();
            for (Surface x : out) {
                both.add(new Surface(x.name() + Scene.FRONT_SUFFIX, x.facets()));
                both.add(x.reversed(x.name() + Scene.BACK_SUFFIX));
            }
            out = both;
        }
        return out;
    }

    /**
     * One shape's facets; the facet count is checked before they are built.
     *
     * @param facets the facet count so far (modified: this shape's facets are added)
     * @param sides  2 for a two-sided part, else 1
     */
    private static List<Facet> shape(String kind, JsonCursor s, long[] facets, int sides) throws CaseException {
        switch (kind) {
            case "rectangle": {
                s.allowOnly("origin_m", "edgeU_m", "edgeV_m", "divisions");
                int[] d = divisions(s, 2, new int[] {1, 1}, facets, sides);
                return Shapes.parallelogram(point(s.field("origin_m")), GeometryNumbers.edge(s.field("edgeU_m")),
                        GeometryNumbers.edge(s.field("edgeV_m")), d[0], d[1]);
            }
            case "polygon": {
                s.allowOnly("vertices_m", "divisions");
                List<Vec3> v = new ArrayList<>();
                for (JsonCursor c : s.field("vertices_m").elementsWithin(Limits.TABLE_POINTS)) {
                    v.add(point(c));
                }
                int d = GeometryNumbers.divisions(s, 1, new int[] {1})[0];
                facets[0] = GeometryNumbers.addFacets(s.has("divisions") ? s.field("divisions") : s, facets[0],
                        (double) sides * v.size() * d * d);
                return Shapes.convexPolygon(v, d);
            }
            case "disc": {
                s.allowOnly("center_m", "normal", "radius_m", "divisions");
                int[] d = divisions(s, 2, new int[] {2, 16}, facets, sides);
                return Shapes.disc(point(s.field("center_m")), direction(s.field("normal")),
                        GeometryNumbers.length(s, "radius_m"), d[0], d[1]);
            }
            case "annulus": {
                s.allowOnly("center_m", "normal", "innerRadius_m", "outerRadius_m", "divisions");
                int[] d = divisions(s, 2, new int[] {2, 16}, facets, sides);
                return Shapes.annulus(point(s.field("center_m")), direction(s.field("normal")),
                        GeometryNumbers.radiusOrZero(s, "innerRadius_m"), GeometryNumbers.length(s, "outerRadius_m"),
                        d[0], d[1]);
            }
            case "cylinder": {
                s.allowOnly("baseCenter_m", "axis", "radius_m", "height_m", "divisions", "facing");
                int[] d = divisions(s, 2, new int[] {16, 4}, facets, sides);
                return Shapes.cylinderWall(point(s.field("baseCenter_m")), direction(s.field("axis")),
                        GeometryNumbers.length(s, "radius_m"), GeometryNumbers.length(s, "height_m"), d[0], d[1],
                        facing(s));
            }
            case "cone": {
                s.allowOnly("baseCenter_m", "axis", "baseRadius_m", "topRadius_m", "height_m", "divisions", "facing");
                int[] d = divisions(s, 2, new int[] {16, 4}, facets, sides);
                return Shapes.coneFrustum(point(s.field("baseCenter_m")), direction(s.field("axis")),
                        GeometryNumbers.radiusOrZero(s, "baseRadius_m"), GeometryNumbers.radiusOrZero(s, "topRadius_m"),
                        GeometryNumbers.length(s, "height_m"), d[0], d[1], facing(s));
            }
            default: { // sphere
                s.allowOnly("center_m", "radius_m", "divisions", "facing");
                int[] d = divisions(s, 2, new int[] {8, 16}, facets, sides);
                return Shapes.sphere(point(s.field("center_m")), GeometryNumbers.length(s, "radius_m"), d[0], d[1],
                        facing(s));
            }
        }
    }

    /** Divisions of a shape that makes d[0]·d[1] facets, added to the count before it is built. */
    private static int[] divisions(JsonCursor s, int count, int[] defaults, long[] facets, int sides)
            throws CaseException {
        int[] d = GeometryNumbers.divisions(s, count, defaults);
        facets[0] = GeometryNumbers.addFacets(s.has("divisions") ? s.field("divisions") : s, facets[0],
                (double) sides * d[0] * d[1]);
        return d;
    }

    private static List<Surface> box(JsonCursor s, long[] facets, int sides) throws CaseException {
        s.allowOnly("min_m", "max_m", "divisions", "facing", "faces");
        int[] d = GeometryNumbers.divisions(s, 3, new int[] {1, 1, 1});
        facets[0] = GeometryNumbers.addFacets(s.has("divisions") ? s.field("divisions") : s, facets[0],
                2.0 * sides * ((double) d[0] * d[1] + (double) d[1] * d[2] + (double) d[0] * d[2]));
        Vec3 min = point(s.field("min_m"));
        Vec3 max = point(s.field("max_m"));
        for (int k = 0; k < 3; k++) {
            if (!(max.get(k) - min.get(k) >= Limits.LENGTH_M.min())) {
                throw s.field("max_m").error("must exceed min_m on every axis (by at least "
                        + Limits.number(Limits.LENGTH_M.min()) + " m): " + "xyz".charAt(k) + " from "
                        + Limits.number(min.get(k)) + " m to " + Limits.number(max.get(k)) + " m");
            }
        }
        List<Surface> faces = Enclosures.box("", min, max, d[0], d[1], d[2], facing(s));
        return renamed(faces, s.field("faces"), Enclosures.BOX_FACES);
    }

    private static List<Surface> cavity(JsonCursor s, long[] facets, int sides) throws CaseException {
        s.allowOnly("baseCenter_m", "axis", "radius_m", "height_m", "divisions", "faces");
        int[] d = GeometryNumbers.divisions(s, 3, new int[] {16, 4, 2});
        facets[0] = GeometryNumbers.addFacets(s.has("divisions") ? s.field("divisions") : s, facets[0],
                (double) sides * d[0] * ((double) d[1] + 2.0 * d[2]));
        List<Surface> parts = Enclosures.cylindricalCavity(point(s.field("baseCenter_m")), direction(s.field("axis")),
                GeometryNumbers.length(s, "radius_m"), GeometryNumbers.length(s, "height_m"), d[0], d[1], d[2]);
        return renamed(parts, s.field("faces"), List.of("wall", "base", "lid"));
    }

    /** Maps builder face names to case surface names; every face must be named. */
    private static List<Surface> renamed(List<Surface> faces, JsonCursor map, List<String> faceNames)
            throws CaseException {
        map.allowOnly(faceNames.toArray(new String[0]));
        List<Surface> out = new ArrayList<>();
        for (Surface f : faces) {
            if (!map.has(f.name())) {
                throw map.error("missing face '" + f.name() + "' (name a surface for each of "
                        + String.join(", ", faceNames) + ")");
            }
            out.add(new Surface(map.field(f.name()).nonEmptyText(), f.facets()));
        }
        return out;
    }

    private static Transform transform(JsonCursor t) throws CaseException {
        t.allowOnly("rotate", "translate_m");
        Transform out = Transform.identity();
        if (t.has("rotate")) {
            JsonCursor r = t.field("rotate").allowOnly("axis", "angle_deg", "pivot_m");
            Vec3 pivot = r.has("pivot_m") ? point(r.field("pivot_m")) : Vec3.ZERO;
            out = out.then(Transform.rotation(pivot, direction(r.field("axis")),
                    Math.toRadians(r.field("angle_deg").within(Limits.ANGLE_DEG))));
        }
        if (t.has("translate_m")) {
            out = out.then(Transform.translation(GeometryNumbers.translation(t.field("translate_m"))));
        }
        return out;
    }

    private static ViewFactorOptions options(JsonCursor o) throws CaseException {
        o.allowOnly("threads", "tolerance", "pairTolerance", "obstruction", "closure", "visibilityOrder", "resolution",
                "storage");
        ViewFactorOptions v = ViewFactorOptions.defaults();
        if (o.has("threads")) {
            v = v.withThreads(o.field("threads").wholeWithin(Limits.THREADS));
        }
        if (o.has("pairTolerance")) {
            v = v.withPairTolerance(o.field("pairTolerance").positiveWithin(Limits.PAIR_TOLERANCE));
        }
        if (o.has("visibilityOrder")) {
            v = v.withVisibilityOrder(o.field("visibilityOrder").wholeWithin(Limits.VISIBILITY_ORDER));
        }
        if (o.has("obstruction")) {
            JsonCursor c = o.field("obstruction");
            v = v.withObstruction(switch (c.text()) {
                case "auto" -> Obstruction.AUTO;
                case "none" -> Obstruction.NONE;
                default -> throw c.error("must be \"auto\" or \"none\", got \"" + c.text() + "\"");
            });
        }
        if (o.has("closure")) {
            JsonCursor c = o.field("closure");
            v = v.withSmoothing(switch (c.text()) {
                case "as-computed" -> Smoothing.NONE;
                case "smooth-closed" -> Smoothing.CLOSED;
                case "smooth-open" -> Smoothing.OPEN;
                default -> throw c.error("must be \"as-computed\", \"smooth-closed\" or \"smooth-open\", got \""
                        + c.text() + "\"");
            });
        }
        return v;
    }

    private static Facing facing(JsonCursor s) throws CaseException {
        if (!s.has("facing")) {
            return Facing.INWARD;
        }
        JsonCursor f = s.field("facing");
        return switch (f.text()) {
            case "inward" -> Facing.INWARD;
            case "outward" -> Facing.OUTWARD;
            default -> throw f.error("must be \"inward\" or \"outward\", got \"" + f.text() + "\"");
        };
    }

    private static Vec3 point(JsonCursor c) throws CaseException {
        return GeometryNumbers.point(c);
    }

    private static Vec3 direction(JsonCursor c) throws CaseException {
        return GeometryNumbers.direction(c);
    }

    /**
     * Every vertex of the geometry lies within {@link Limits#COORDINATE_M} (a mesh's scale
     * and a part's transform can move it there).
     *
     * @param bySurface the facets by surface; not modified
     */
    private static void requireWithinBounds(JsonCursor parts, Map<String, List<Facet>> bySurface)
            throws CaseException {
        for (List<Facet> list : bySurface.values()) {
            for (Facet f : list) {
                for (int k = 0; k < f.vertexCount(); k++) {
                    Vec3 v = f.vertex(k);
                    double far = Math.max(Math.abs(v.x()), Math.max(Math.abs(v.y()), Math.abs(v.z())));
                    if (far > Limits.COORDINATE_M.max()) {
                        throw parts.error("a vertex lies " + Limits.number(far) + " m from the origin along an axis;"
                                + " coordinates must lie " + Limits.COORDINATE_M.describe()
                                + " (see Limits in docs/case-format.md)");
                    }
                }
            }
        }
    }
}
