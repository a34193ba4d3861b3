package org.exitance.geometry.mesh;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Vec3;

/**
 * Reads Wavefront OBJ geometry (the "v" and "f" statements of the OBJ format as published by
 * Wavefront Technologies, Appendix B1 of the Advanced Visualizer manual; common practice).
 *
 * <p>{@code g name} and {@code o name} start (or continue) the surface of that name; faces before
 * any of them go to a surface named after the file. Face vertices may be written {@code v},
 * {@code v/vt}, {@code v/vt/vn} or {@code v//vn}; negative indices count back from the last
 * vertex read. Polygons of any size are accepted: planar convex ones become one facet, others are
 * split into triangles (reported). Texture, normal, material, smoothing and line statements are
 * ignored. Coordinates are multiplied by {@link MeshOptions#scale()}; the radiating side follows
 * the winding (counter-clockwise seen from it).
 */
public final class ObjReader {

    private ObjReader() {
    }

    /**
     * @param path the file
     * @param options scale (the normal policy does not apply: OBJ faces have no stored normal
     *        that defines the side)
     * @return surfaces and repairs
     * @throws IOException on a read error, or {@link MeshFormatException} on bad content
     */
    public static MeshImport read(Path path, MeshOptions options) throws IOException {
        String name = path.getFileName().toString();
        String stem = name.replaceFirst("\\.[^.]*$", "");
        List<String> lines = Files.readAllLines(path, StandardCharsets.UTF_8);
        List<Vec3> vertices = new ArrayList<>();
        MeshBuilder mb = new MeshBuilder(name);
        String group = stem;
        for (int ln = 0; ln < lines.size(); ln++) {
            String line = lines.get(ln);
            int hash = line.indexOf('#');
            if (hash >= 0) {
                line = line.substring(0, hash);
            }
            line = line.trim();
            if (line.isEmpty()) {
                continue;
            }
            String where = "line " + (ln + 1);
            String[] tok = line.split("\\s+");
            switch (tok[0]) {
                case "v" -> {
                    if (tok.length < 4) {
                        throw new MeshFormatException(name, where, "expected 'v x y z'");
                    }
                    double k = options.scale();
                    vertices.add(new Vec3(MeshNumbers.parse(tok[1], name, where) * k,
                            MeshNumbers.parse(tok[2], name, where) * k, MeshNumbers.parse(tok[3], name, where) * k));
                }
                case "f" -> {
                    if (tok.length < 4) {
                        throw new MeshFormatException(name, where, "a face needs at least 3 vertices, got "
                                + (tok.length - 1));
                    }
                    List<Vec3> poly = new ArrayList<>(tok.length - 1);
                    for (int k = 1; k < tok.length; k++) {
                        poly.add(vertices.get(index(tok[k], vertices.size(), name, where)));
                    }
                    mb.add(group, poly, where);
                }
                case "g", "o" -> group = tok.length > 1 ? line.substring(tok[0].length()).trim() : stem;
                case "vt", "vn", "vp", "s", "usemtl", "mtllib", "l", "p", "cstype", "deg", "curv", "surf" -> { }
                default -> throw new MeshFormatException(name, where, "unknown statement '" + tok[0] + "'");
            }
        }
        return mb.build("OBJ");
    }

    private static int index(String token, int count, String name, String where) throws MeshFormatException {
        String first = token.split("/", -1)[0];
        int i;
        try {
            i = Integer.parseInt(first);
        } catch (NumberFormatException e) {
            throw new MeshFormatException(name, where, "bad vertex index '" + token + "'");
        }
        int resolved = i > 0 ? i - 1 : count + i;
        if (i == 0 || resolved < 0 || resolved >= count) {
            throw new MeshFormatException(name, where, "vertex index " + i + " out of range (" + count
                    + " vertices read so far)");
        }
        return resolved;
    }
}
