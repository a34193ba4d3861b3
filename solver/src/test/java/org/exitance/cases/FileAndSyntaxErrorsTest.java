package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Files that are missing or are not JSON (a well-formed file with a repeated key is not JSON either). */
class FileAndSyntaxErrorsTest {
    @TempDir
    Path dir;

    @Test
    void missingFileIsNamedAndExitsTwo() {
        Path missing = dir.resolve("no-such-case.json");
        BadInput.rejected(missing, null, "file not found");
    }

    @Test
    void malformedJsonReportsLineAndColumn() {
        // line 3 lacks the comma after the title; the parser trips at the start of line 4
        Path file = RepoCases.writeText(dir, "broken.json", String.join("\n",
                "{",
                "  \"title\": \"broken\",",
                "  \"notes\": \"no comma follows\"",
                "  \"materials\": {}",
                "}"));
        String line = BadInput.rejected(file, null, "malformed JSON", "line 4, column 3");
        assertThat(line).doesNotContain("\n");
    }

    @Test
    void truncatedJsonIsMalformed() {
        Path file = RepoCases.writeText(dir, "truncated.json", "{\n  \"title\": \"cut off\",\n  \"surfaces\": [\n");
        String line = BadInput.rejected(file, null, "malformed JSON at line 4", "line 3, column 15");
        assertThat(line).doesNotContain("Source", "REDACTED");
    }

    @Test
    void duplicateJsonKeyNamesTheKeyAndItsPath() {
        String text = RepoCases.plates().toPrettyString()
                .replaceFirst("\"area_m2\" : 1\\.0", "\"area_m2\" : 1.0, \"area_m2\" : 2.0");
        assertThat(text).contains("\"area_m2\" : 2.0");
        Path file = RepoCases.writeText(dir, "duplicate-key.json", text);
        BadInput.rejected(file, "$.surfaces[0].area_m2", "duplicate", "area_m2");
    }

    @Test
    void duplicateKeyIsFoundByTheReaderItself() {
        String text = RepoCases.plates().toPrettyString().replaceFirst("\"title\"", "\"notes\" : \"x\", \"title\"");
        Path file = RepoCases.writeText(dir, "duplicate-top-level.json", text);
        CaseException e = org.assertj.core.api.Assertions.catchThrowableOfType(CaseException.class,
                () -> CaseReader.read(file));
        assertThat(e).isNotNull();
        assertThat(e.file()).isEqualTo(file);
        assertThat(e.jsonPath()).isEqualTo("$.notes");
    }
}
