package org.exitance.cases;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.exitance.model.Material;

/**
 * Reads the materials of a file for the property tool: either a whole case (recognized by its
 * {@code surfaces} key, read and validated by {@link CaseReader}) or a standalone material file
 * <pre>
 *   {"title": "...", "notes": "...", "materials": {"name": { ... exactly as in a case ... }}}
 * </pre>
 * where {@code title} and {@code notes} are optional and every other key is an error. Materials
 * are parsed by the same code as a case's, so the forms and rules are those of
 * docs/case-format.md; a CSV property file is found relative to the material file.
 */
public final class MaterialFileReader {

    private MaterialFileReader() {
    }

    /**
     * What a file holds.
     *
     * @param file      where it came from
     * @param isCase    true for a case file, false for a standalone material file
     * @param title     its title ("" if none)
     * @param notes     its notes ("" if none)
     * @param materials its materials, in file order
     * @param warnings  findings that do not stop the survey, one line each: a window whose measured
     *                  α + ρ + τ misses 1 by more than its measurement tolerance (an error in a case)
     */
    public record MaterialFile(Path file, boolean isCase, String title, String notes, List<Material> materials,
                               List<String> warnings) {
        public MaterialFile {
            materials = List.copyOf(materials);
            warnings = List.copyOf(warnings);
        }

        /**
         * All materials (name == null) or the one so named.
         *
         * @throws CaseException at {@code $.materials} when no material has that name
         */
        public List<Material> select(String name) throws CaseException {
            if (name == null) {
                return materials;
            }
            List<String> names = new ArrayList<>();
            for (Material m : materials) {
                if (m.name().equals(name)) {
                    return List.of(m);
                }
                names.add(m.name());
            }
            throw new CaseException(file, "$.materials", "no material named '" + name + "' (materials here: "
                    + String.join(", ", names) + ")");
        }
    }

    /** Reads and validates a case file or a standalone material file. */
    public static MaterialFile read(Path file) throws CaseException {
        JsonNode root = CaseJson.parse(file);
        if (root.isObject() && root.has("surfaces")) {
            CaseDescription c = CaseReader.read(file);
            return new MaterialFile(file, true, c.title(), c.notes(), c.materials(), List.of());
        }
        JsonCursor cursor = JsonCursor.root(root, file).allowOnly("title", "notes", "materials");
        String title = cursor.has("title") ? cursor.field("title").text() : "";
        String notes = cursor.has("notes") ? cursor.field("notes").text() : "";
        List<String> warnings = new ArrayList<>();
        Map<String, Material> materials = MaterialReader.readAll(cursor.field("materials"),
                file.toAbsolutePath().getParent(), warnings);
        return new MaterialFile(file, false, title, notes, new ArrayList<>(materials.values()), warnings);
    }
}
