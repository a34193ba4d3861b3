package org.exitance.cases;

import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Parses a case (or material) file into a JSON tree, strictly: duplicate keys and trailing
 * tokens are errors. Every problem is a {@link CaseException} naming the file and, for a
 * duplicate key, its JSON path; syntax errors name the line and column.
 */
final class CaseJson {
    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    private CaseJson() {
    }

    static JsonNode parse(Path file) throws CaseException {
        if (!Files.exists(file)) {
            throw new CaseException(file, "", "file not found");
        }
        if (!Files.isRegularFile(file)) {
            throw new CaseException(file, "", "not a regular file");
        }
        FileLimits.requireReadable(file, null);
        try {
            JsonNode n = JSON.readTree(file.toFile());
            if (n == null || n.isMissingNode()) {
                throw new CaseException(file, "", "empty file");
            }
            return n;
        } catch (JsonParseException e) {
            String original = CaseException.oneLine(e.getOriginalMessage());
            if (original.startsWith("Duplicate field") && e.getProcessor() != null) {
                throw new CaseException(file, jsonPath(e.getProcessor().getParsingContext()), "duplicate key (line "
                        + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr() + "): " + original);
            }
            // the parser names positions as "[Source: ...; line: 3, column: 15]"; keep only the position
            throw new CaseException(file, "", "malformed JSON at line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr() + ": " + JsonSyntax.plain(original));
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? "" : " at line " + e.getLocation().getLineNr() + ", column "
                    + e.getLocation().getColumnNr();
            throw new CaseException(file, "", "malformed JSON" + where + ": "
                    + JsonSyntax.plain(CaseException.oneLine(e.getOriginalMessage())));
        } catch (IOException e) {
            throw new CaseException(file, "", "cannot read: " + CaseException.oneLine(e.getMessage()));
        }
    }

    /** The JSON path of a parser position, in the form the cursor uses ({@code $.surfaces[0].area_m2}). */
    private static String jsonPath(JsonStreamContext ctx) {
        StringBuilder b = new StringBuilder();
        for (JsonStreamContext c = ctx; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray()) {
                b.insert(0, "[" + Math.max(c.getCurrentIndex(), 0) + "]");
            } else if (c.getCurrentName() != null) {
                String k = c.getCurrentName();
                b.insert(0, k.matches("[A-Za-z_][A-Za-z0-9_]*") ? "." + k : "['" + k + "']");
            }
        }
        return "$" + b;
    }
}
