package org.exitance.geometry.mesh;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.exitance.geometry.Vec3;

/**
 * Reads STL (stereolithography) files, ASCII or binary, detected from the content: a file whose
 * length is 84 + 50·n with n the 32-bit count at byte 80 is binary (binary files may also start
 * with "solid"); otherwise a file starting with "solid" is ASCII. Format as commonly documented
 * (3D Systems' StereoLithography Interface Specification, 1989; common practice).
 *
 * <p>Each ASCII {@code solid} becomes a surface named after it (or after the file, numbered, when
 * unnamed); a binary file is one surface named after the file. Coordinates are multiplied by
 * {@link MeshOptions#scale()}. Zero-area triangles are dropped and reported; stored normals
 * opposing the winding are handled by {@link NormalPolicy}.
 */
public final class StlReader {

    private StlReader() {
    }

    /**
     * @param path the file
     * @param options scale and normal policy
     * @return surfaces and repairs
     * @throws IOException on a read error, or {@link MeshFormatException} on bad content
     */
    public static MeshImport read(Path path, MeshOptions options) throws IOException {
        byte[] data = Files.readAllBytes(path);
        String name = path.getFileName().toString();
        String stem = name.replaceFirst("\\.[^.]*$", "");
        if (data.length >= 84) {
            long n = ByteBuffer.wrap(data, 80, 4).order(ByteOrder.LITTLE_ENDIAN).getInt() & 0xffffffffL;
            if (data.length == 84 + 50 * n) {
                return binary(data, (int) n, name, stem, options);
            }
        }
        String head = new String(data, 0, Math.min(data.length, 256), StandardCharsets.US_ASCII).stripLeading();
        if (head.startsWith("solid")) {
            return ascii(new String(data, StandardCharsets.US_ASCII), name, stem, options);
        }
        throw new MeshFormatException(name, "byte 0", data.length < 84 ? "too short for binary STL and not ASCII STL"
                : "neither ASCII STL (no 'solid') nor binary STL (length " + data.length
                        + " does not match the triangle count in the header)");
    }

    private static MeshImport binary(byte[] data, int n, String name, String stem, MeshOptions o)
            throws MeshFormatException {
        ByteBuffer b = ByteBuffer.wrap(data).order(ByteOrder.LITTLE_ENDIAN);
        MeshBuilder mb = new MeshBuilder(name);
        for (int t = 0; t < n; t++) {
            int off = 84 + 50 * t;
            float[] v = new float[12];
            for (int k = 0; k < 12; k++) {
                v[k] = b.getFloat(off + 4 * k);
                if (!Float.isFinite(v[k])) {
                    throw new MeshFormatException(name, "facet " + (t + 1), "non-finite number");
                }
            }
            Vec3 normal = new Vec3(v[0], v[1], v[2]);
            Vec3[] p = new Vec3[3];
            for (int k = 0; k < 3; k++) {
                p[k] = new Vec3(v[3 + 3 * k] * o.scale(), v[4 + 3 * k] * o.scale(), v[5 + 3 * k] * o.scale());
            }
            addTriangle(mb, stem, normal, p, "facet " + (t + 1), o, name);
        }
        return mb.build("STL");
    }

    private static void addTriangle(MeshBuilder mb, String group, Vec3 stored, Vec3[] p, String where, MeshOptions o,
            String name) throws MeshFormatException {
        Vec3 winding = p[1].minus(p[0]).cross(p[2].minus(p[0]));
        if (stored.length() > 0 && winding.length() > 0 && stored.dot(winding) < 0) {
            mb.normalConflicts++;
            switch (o.normalPolicy()) {
                case STRICT -> throw new MeshFormatException(name, where,
                        "stored normal " + stored + " points against the vertex winding (inverted facet); "
                                + "choose a normal policy to repair");
                case USE_STORED_NORMAL -> p = new Vec3[] {p[0], p[2], p[1]};
                case USE_WINDING -> { }
                default -> throw new IllegalStateException();
            }
        }
        mb.add(group, List.of(p), where);
    }

    private static MeshImport ascii(String text, String name, String stem, MeshOptions o) throws MeshFormatException {
        MeshBuilder mb = new MeshBuilder(name);
        String[] lines = text.split("\r?\n|\r", -1);
        String solid = null;
        Set<String> used = new HashSet<>();
        int solids = 0, facet = 0;
        Vec3 normal = null;
        Vec3[] loop = new Vec3[3];
        int nv = -1;
        int facetLine = 0;
        for (int ln = 0; ln < lines.length; ln++) {
            String line = lines[ln].trim();
            if (line.isEmpty()) {
                continue;
            }
            String where = "line " + (ln + 1);
            String[] tok = line.split("\\s+");
            switch (tok[0]) {
                case "solid" -> {
                    if (solid != null) {
                        throw new MeshFormatException(name, where, "'solid' inside solid '" + solid + "'");
                    }
                    solids++;
                    String label = line.length() > 5 ? line.substring(5).trim() : "";
                    solid = label.isEmpty() ? stem + (solids > 1 ? "." + solids : "") : label;
                    String unique = solid;
                    for (int k = 2; !used.add(unique); k++) {
                        unique = solid + "." + k;
                    }
                    solid = unique;
                }
                case "facet" -> {
                    requireSolid(solid, name, where);
                    if (tok.length != 5 || !tok[1].equals("normal")) {
                        throw new MeshFormatException(name, where, "expected 'facet normal nx ny nz'");
                    }
                    normal = new Vec3(MeshNumbers.parse(tok[2], name, where), MeshNumbers.parse(tok[3], name, where),
                            MeshNumbers.parse(tok[4], name, where));
                    facet++;
                    facetLine = ln + 1;
                }
                case "outer" -> {
                    if (normal == null) {
                        throw new MeshFormatException(name, where, "'outer loop' outside a facet");
                    }
                    nv = 0;
                }
                case "vertex" -> {
                    if (nv < 0) {
                        throw new MeshFormatException(name, where, "'vertex' outside 'outer loop'");
                    }
                    if (nv == 3) {
                        throw new MeshFormatException(name, where, "more than 3 vertices in a facet");
                    }
                    if (tok.length != 4) {
                        throw new MeshFormatException(name, where, "expected 'vertex x y z'");
                    }
                    double k = o.scale();
                    loop[nv++] = new Vec3(MeshNumbers.parse(tok[1], name, where) * k,
                            MeshNumbers.parse(tok[2], name, where) * k, MeshNumbers.parse(tok[3], name, where) * k);
                }
                case "endloop" -> {
                    if (nv != 3) {
                        throw new MeshFormatException(name, where, "facet has " + Math.max(nv, 0) + " vertices, need 3");
                    }
                }
                case "endfacet" -> {
                    if (nv != 3 || normal == null) {
                        throw new MeshFormatException(name, where, "incomplete facet");
                    }
                    addTriangle(mb, solid, normal, loop.clone(), "facet " + facet + " (line " + facetLine + ")", o, name);
                    normal = null;
                    nv = -1;
                }
                case "endsolid" -> {
                    requireSolid(solid, name, where);
                    if (normal != null) {
                        throw new MeshFormatException(name, where, "'endsolid' inside a facet");
                    }
                    solid = null;
                }
                default -> throw new MeshFormatException(name, where, "unexpected keyword '" + tok[0] + "'");
            }
        }
        if (solid != null) {
            throw new MeshFormatException(name, "end of file", "missing 'endsolid' for solid '" + solid + "'");
        }
        return mb.build("STL");
    }

    private static void requireSolid(String solid, String name, String where) throws MeshFormatException {
        if (solid == null) {
            throw new MeshFormatException(name, where, "outside 'solid ... endsolid'");
        }
    }

}
