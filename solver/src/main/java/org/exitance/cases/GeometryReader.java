package org.exitance.cases;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Transform;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.mesh.MeshFormatException;
import org.exitance.geometry.mesh.MeshImport;
import org.exitance.geometry.mesh.MeshOptions;
import org.exitance.geometry.mesh.NormalPolicy;
import org.exitance.geometry.mesh.ObjReader;
import org.exitance.geometry.mesh.StlReader;
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
        List<JsonCursor> parts = g.field("parts").elements();
        if (parts.isEmpty()) {
            throw g.field("parts").error("needs at least one part");
        }
        for (JsonCursor p : parts) {
            try {
                for (Surface s : part(p, caseDir, notes)) {
                    bySurface.computeIfAbsent(s.name(), k -> new ArrayList<>()).addAll(s.facets());
                }
            } catch (GeometryException e) {
                throw p.error(e.getMessage());
            }
        }
        Scene.Builder b = Scene.builder();
        bySurface.forEach(b::add);
        Scene scene;
        try {
            scene = b.build();
        } catch (GeometryException e) {
            throw g.error(e.getMessage());
        }
        ViewFactorOptions options = g.has("options") ? options(g.field("options")) : ViewFactorOptions.defaults();
        boolean facets = false;
        if (g.has("options") && g.field("options").has("resolution")) {
            JsonCursor r = g.field("options").field("resolution");
            facets = switch (r.text()) {
                case "surfaces" -> false;
                case "facets" -> true;
                default -> throw r.error("must be \"surfaces\" or \"facets\", got \"" + r.text() + "\"");
            };
        }
        return new CaseGeometry(scene, options, notes, facets);
    }

    private static final String[] SHAPES = {"rectangle", "polygon", "disc", "annulus", "cylinder", "cone", "sphere",
        "box", "cylindricalCavity", "mesh"};

    private static List<Surface> part(JsonCursor p, Path caseDir, List<String> notes) throws CaseException {
        p.allowOnly("surface", "twoSided", "transform", "rectangle", "polygon", "disc", "annulus", "cylinder", "cone",
                "sphere", "box", "cylindricalCavity", "mesh");
        String kind = p.exactlyOneOf(SHAPES);
        JsonCursor s = p.field(kind);
        List<Surface> out;
        switch (kind) {
            case "box" -> out = box(s);
            case "cylindricalCavity" -> out = cavity(s);
            case "mesh" -> out = mesh(s, caseDir, notes);
            default -> {
                String name = p.field("surface").nonEmptyText();
                out = List.of(new Surface(name, shape(kind, s)));
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
        if (p.has("twoSided") && p.field("twoSided").bool()) {
            List<Surface> both = new ArrayList<>();
            for (Surface x : out) {
                both.add(new Surface(x.name() + Scene.FRONT_SUFFIX, x.facets()));
                both.add(x.reversed(x.name() + Scene.BACK_SUFFIX));
            }
            out = both;
        }
        return out;
    }

    private static List<Facet> shape(String kind, JsonCursor s) throws CaseException {
        switch (kind) {
            case "rectangle": {
                s.allowOnly("origin_m", "edgeU_m", "edgeV_m", "divisions");
                int[] d = divisions(s, 2, new int[] {1, 1});
                return Shapes.parallelogram(vec(s.field("origin_m")), vec(s.field("edgeU_m")), vec(s.field("edgeV_m")),
                        d[0], d[1]);
            }
            case "polygon": {
                s.allowOnly("vertices_m", "divisions");
                List<Vec3> v = new ArrayList<>();
                for (JsonCursor c : s.field("vertices_m").elements()) {
                    v.add(vec(c));
                }
                return Shapes.convexPolygon(v, divisions(s, 1, new int[] {1})[0]);
            }
            case "disc": {
                s.allowOnly("center_m", "normal", "radius_m", "divisions");
                int[] d = divisions(s, 2, new int[] {2, 16});
                return Shapes.disc(vec(s.field("center_m")), vec(s.field("normal")), s.field("radius_m").positive(),
                        d[0], d[1]);
            }
            case "annulus": {
                s.allowOnly("center_m", "normal", "innerRadius_m", "outerRadius_m", "divisions");
                int[] d = divisions(s, 2, new int[] {2, 16});
                return Shapes.annulus(vec(s.field("center_m")), vec(s.field("normal")),
                        s.field("innerRadius_m").nonNegative(), s.field("outerRadius_m").positive(), d[0], d[1]);
            }
            case "cylinder": {
                s.allowOnly("baseCenter_m", "axis", "radius_m", "height_m", "divisions", "facing");
                int[] d = divisions(s, 2, new int[] {16, 4});
                return Shapes.cylinderWall(vec(s.field("baseCenter_m")), vec(s.field("axis")),
                        s.field("radius_m").positive(), s.field("height_m").positive(), d[0], d[1], facing(s));
            }
            case "cone": {
                s.allowOnly("baseCenter_m", "axis", "baseRadius_m", "topRadius_m", "height_m", "divisions", "facing");
                int[] d = divisions(s, 2, new int[] {16, 4});
                return Shapes.coneFrustum(vec(s.field("baseCenter_m")), vec(s.field("axis")),
                        s.field("baseRadius_m").nonNegative(), s.field("topRadius_m").nonNegative(),
                        s.field("height_m").positive(), d[0], d[1], facing(s));
            }
            default: { // sphere
                s.allowOnly("center_m", "radius_m", "divisions", "facing");
                int[] d = divisions(s, 2, new int[] {8, 16});
                return Shapes.sphere(vec(s.field("center_m")), s.field("radius_m").positive(), d[0], d[1], facing(s));
            }
        }
    }

    private static List<Surface> box(JsonCursor s) throws CaseException {
        s.allowOnly("min_m", "max_m", "divisions", "facing", "faces");
        int[] d = divisions(s, 3, new int[] {1, 1, 1});
        List<Surface> faces = Enclosures.box("", vec(s.field("min_m")), vec(s.field("max_m")), d[0], d[1], d[2],
                facing(s));
        return renamed(faces, s.field("faces"), Enclosures.BOX_FACES);
    }

    private static List<Surface> cavity(JsonCursor s) throws CaseException {
        s.allowOnly("baseCenter_m", "axis", "radius_m", "height_m", "divisions", "faces");
        int[] d = divisions(s, 3, new int[] {16, 4, 2});
        List<Surface> parts = Enclosures.cylindricalCavity(vec(s.field("baseCenter_m")), vec(s.field("axis")),
                s.field("radius_m").positive(), s.field("height_m").positive(), d[0], d[1], d[2]);
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

    private static List<Surface> mesh(JsonCursor s, Path caseDir, List<String> notes) throws CaseException {
        s.allowOnly("file", "scale_m", "normals", "surface", "groups");
        JsonCursor ref = s.field("file");
        Path file = caseDir.resolve(ref.nonEmptyText()).normalize();
        if (!Files.isRegularFile(file)) {
            throw ref.error("mesh file not found: " + file);
        }
        MeshOptions o = MeshOptions.defaults();
        if (s.has("scale_m")) {
            o = o.withScale(s.field("scale_m").positive());
        }
        if (s.has("normals")) {
            JsonCursor n = s.field("normals");
            o = o.withNormalPolicy(switch (n.text()) {
                case "strict" -> NormalPolicy.STRICT;
                case "winding" -> NormalPolicy.USE_WINDING;
                case "stored" -> NormalPolicy.USE_STORED_NORMAL;
                default -> throw n.error("must be \"strict\", \"winding\" or \"stored\", got \"" + n.text() + "\"");
            });
        }
        String lower = file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        MeshImport m;
        try {
            if (lower.endsWith(".stl")) {
                m = StlReader.read(file, o);
            } else if (lower.endsWith(".obj")) {
                m = ObjReader.read(file, o);
            } else {
                throw ref.error("mesh files must end in .stl or .obj: " + file.getFileName());
            }
        } catch (MeshFormatException e) {
            throw new CaseException(file, "", (e.location() == null || e.location().isEmpty() ? "" : e.location() + ": ")
                    + e.problem());
        } catch (IOException e) {
            throw ref.error("cannot read mesh: " + CaseException.oneLine(e.getMessage()));
        }
        for (String note : m.notes()) {
            notes.add(file.getFileName() + ": " + note);
        }
        if (s.has("surface")) {
            if (s.has("groups")) {
                throw s.error("give \"surface\" (the whole mesh as one surface) or \"groups\", not both");
            }
            List<Facet> all = new ArrayList<>();
            m.surfaces().forEach(x -> all.addAll(x.facets()));
            return List.of(new Surface(s.field("surface").nonEmptyText(), all));
        }
        if (s.has("groups")) {
            JsonCursor map = s.field("groups");
            List<Surface> out = new ArrayList<>();
            for (Surface x : m.surfaces()) {
                if (!map.has(x.name())) {
                    throw map.error("mesh group '" + x.name() + "' is not mapped to a surface");
                }
                out.add(new Surface(map.field(x.name()).nonEmptyText(), x.facets()));
            }
            for (Map.Entry<String, JsonCursor> e : map.entries()) {
                if (m.surfaces().stream().noneMatch(x -> x.name().equals(e.getKey()))) {
                    throw e.getValue().error("the mesh has no group '" + e.getKey() + "'");
                }
            }
            return out;
        }
        return m.surfaces();
    }

    private static Transform transform(JsonCursor t) throws CaseException {
        t.allowOnly("rotate", "translate_m");
        Transform out = Transform.identity();
        if (t.has("rotate")) {
            JsonCursor r = t.field("rotate").allowOnly("axis", "angle_deg", "pivot_m");
            Vec3 pivot = r.has("pivot_m") ? vec(r.field("pivot_m")) : Vec3.ZERO;
            out = out.then(Transform.rotation(pivot, vec(r.field("axis")), Math.toRadians(r.field("angle_deg").number())));
        }
        if (t.has("translate_m")) {
            out = out.then(Transform.translation(vec(t.field("translate_m"))));
        }
        return out;
    }

    private static ViewFactorOptions options(JsonCursor o) throws CaseException {
        o.allowOnly("threads", "pairTolerance", "obstruction", "closure", "visibilityOrder", "resolution");
        ViewFactorOptions v = ViewFactorOptions.defaults();
        if (o.has("threads")) {
            JsonCursor t = o.field("threads");
            if (!t.node().isIntegralNumber() || t.node().intValue() < 0) {
                throw t.error("expected a whole number ≥ 0 (0: all cores)");
            }
            v = v.withThreads(t.node().intValue());
        }
        if (o.has("pairTolerance")) {
            v = v.withPairTolerance(o.field("pairTolerance").positive());
        }
        if (o.has("visibilityOrder")) {
            v = v.withVisibilityOrder(o.field("visibilityOrder").positiveInt());
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

    private static int[] divisions(JsonCursor s, int count, int[] defaults) throws CaseException {
        if (!s.has("divisions")) {
            return defaults;
        }
        JsonCursor d = s.field("divisions");
        List<JsonCursor> el = d.elements();
        if (el.size() != count) {
            throw d.error("needs " + count + " whole numbers, got " + el.size());
        }
        int[] out = new int[count];
        for (int i = 0; i < count; i++) {
            out[i] = el.get(i).positiveInt();
        }
        return out;
    }

    private static Vec3 vec(JsonCursor c) throws CaseException {
        double[] v = c.numbers();
        if (v.length != 3) {
            throw c.error("expected three numbers [x, y, z], got " + v.length);
        }
        return new Vec3(v[0], v[1], v[2]);
    }
}
