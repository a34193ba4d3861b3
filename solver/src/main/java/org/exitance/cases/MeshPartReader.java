package org.exitance.cases;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.mesh.MeshFormatException;
import org.exitance.geometry.mesh.MeshImport;
import org.exitance.geometry.mesh.MeshOptions;
import org.exitance.geometry.mesh.NormalPolicy;
import org.exitance.geometry.mesh.ObjReader;
import org.exitance.geometry.mesh.StlReader;

/**
 * Reads a {@code mesh} part of a geometry: an STL or OBJ file beside the case, its scale and
 * normal policy, how its groups map to surfaces, and which groups are thin two-sided plates
 * ({@code twoSidedGroups}: such a group's surface NAME becomes NAME.front, radiating toward the
 * group's winding side, and NAME.back, its facets reversed; docs/case-format.md, "geometry").
 */
final class MeshPartReader {
    private MeshPartReader() {
    }

    static List<Surface> read(JsonCursor s, Path caseDir, List<String> notes) throws CaseException {
        s.allowOnly("file", "scale_m", "normals", "surface", "groups", "twoSidedGroups");
        JsonCursor ref = s.field("file");
        Path file = caseDir.resolve(ref.nonEmptyText()).normalize();
        if (!Files.isRegularFile(file)) {
            throw ref.error("mesh file not found: " + file);
        }
        FileLimits.requireReadable(file, ref);
        MeshOptions o = MeshOptions.defaults();
        if (s.has("scale_m")) {
            o = o.withScale(s.field("scale_m").positiveWithin(Limits.MESH_SCALE_M));
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
            if (s.has("twoSidedGroups")) {
                throw s.field("twoSidedGroups").error("goes with \"groups\" (or a mesh whose groups are its surfaces);"
                        + " to make the whole mesh two-sided, put \"twoSided\": true on the part");
            }
            List<Facet> all = new ArrayList<>();
            m.surfaces().forEach(x -> all.addAll(x.facets()));
            return List.of(new Surface(s.field("surface").nonEmptyText(), all));
        }
        List<Surface> out = new ArrayList<>();
        if (s.has("groups")) {
            JsonCursor map = s.field("groups");
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
        } else {
            out.addAll(m.surfaces());
        }
        return s.has("twoSidedGroups") ? twoSided(s.field("twoSidedGroups"), m.surfaces(), out) : out;
    }

    /**
     * Splits the chosen groups into front and back faces.
     *
     * @param groups  the mesh's groups, in file order; not modified
     * @param mapped  the surface each group makes, in the same order; not modified
     * @return the surfaces, a chosen group's as NAME.front then NAME.back
     */
    private static List<Surface> twoSided(JsonCursor list, List<Surface> groups, List<Surface> mapped)
            throws CaseException {
        Map<String, JsonCursor> chosen = new LinkedHashMap<>();
        for (JsonCursor c : list.elementsWithin(Limits.FACETS)) {
            String g = c.nonEmptyText();
            if (groups.stream().noneMatch(x -> x.name().equals(g))) {
                throw c.error("the mesh has no group '" + g + "' (groups: "
                        + String.join(", ", groups.stream().map(Surface::name).toList()) + ")");
            }
            if (chosen.put(g, c) != null) {
                throw c.error("group '" + g + "' is listed twice");
            }
        }
        if (chosen.isEmpty()) {
            throw list.error("must name at least one mesh group");
        }
        Map<String, String> firstGroup = new LinkedHashMap<>(); // surface → the first group that makes it
        List<Surface> out = new ArrayList<>();
        for (int i = 0; i < groups.size(); i++) {
            String group = groups.get(i).name();
            Surface x = mapped.get(i);
            boolean two = chosen.containsKey(group);
            String first = firstGroup.putIfAbsent(x.name(), group);
            if (first != null && chosen.containsKey(first) != two) {
                throw list.error("groups '" + first + "' and '" + group + "' make the same surface '" + x.name()
                        + "'; list both in twoSidedGroups or neither");
            }
            if (two) {
                out.add(new Surface(x.name() + Scene.FRONT_SUFFIX, x.facets()));
                out.add(x.reversed(x.name() + Scene.BACK_SUFFIX));
            } else {
                out.add(x);
            }
        }
        return out;
    }
}
