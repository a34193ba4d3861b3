package org.exitance.cases;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Surface;
import org.exitance.geometry.mesh.MeshFormatException;
import org.exitance.geometry.mesh.MeshImport;
import org.exitance.geometry.mesh.MeshOptions;
import org.exitance.geometry.mesh.NormalPolicy;
import org.exitance.geometry.mesh.ObjReader;
import org.exitance.geometry.mesh.StlReader;

/**
 * Reads a {@code mesh} part of a geometry: an STL or OBJ file beside the case, its scale and
 * normal policy, and how its groups map to surfaces (docs/case-format.md, "geometry").
 */
final class MeshPartReader {
    private MeshPartReader() {
    }

    static List<Surface> read(JsonCursor s, Path caseDir, List<String> notes) throws CaseException {
        s.allowOnly("file", "scale_m", "normals", "surface", "groups");
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
}
