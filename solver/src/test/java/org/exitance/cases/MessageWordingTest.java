package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Messages speak of the user's input in its own keys and units: no option or class names of the
 * JSON library, no record dumps such as {@code Vec3[x=…]}.
 */
class MessageWordingTest {
    private static final String[] INTERNALS = {"JsonReadFeature", "DeserializationFeature", "Feature", "`",
        "com.fasterxml", "JsonNode", "StreamReadConstraints", "Vec3[", "x=", "Exception"};

    @TempDir
    Path dir;

    private String rejectedText(String name, String text, String... words) {
        Path file = RepoCases.writeText(dir, name, text);
        String line = BadInput.rejected(file, null, words);
        assertThat(line).doesNotContain(INTERNALS);
        return line;
    }

    @Test
    void notANumberTokenIsNamedWithoutTheParsersOptionName() {
        String text = RepoCases.plates().toPrettyString().replaceFirst("\"temperature_K\" : 1000", "\"temperature_K\" : NaN");
        rejectedText("nan.json", text, "malformed JSON", "'NaN' is not a JSON number");
    }

    @Test
    void trailingContentIsNamedWithoutTheLibrarysClassNames() {
        rejectedText("trailing.json", RepoCases.plates().toPrettyString() + "\n{}", "malformed JSON",
                "more content after the end");
    }

    @Test
    void commentsLeadingPlusAndLeadingZeroesAreExplainedInJsonTerms() {
        String base = RepoCases.plates().toPrettyString();
        rejectedText("comment.json", base.replaceFirst("\\{", "{ /* note */"), "JSON has no comments");
        rejectedText("plus.json", base.replaceFirst("\"temperature_K\" : 1000", "\"temperature_K\" : +1000"),
                "no leading plus sign");
        rejectedText("zeroes.json", base.replaceFirst("\"temperature_K\" : 1000", "\"temperature_K\" : 01000"),
                "no leading zeroes");
    }

    @Test
    void deepNestingIsRefusedInPlainWords() {
        rejectedText("deep.json", "{\"title\": " + "[".repeat(5000) + "]".repeat(5000) + "}", "nested too deeply");
    }

    @Test
    void aDegenerateRectangleShowsItsCornerAsTheCaseWritesPoints() {
        ObjectNode c = RepoCases.plates();
        c.remove("viewFactors");
        c.remove("expected");
        for (var s : c.get("surfaces")) {
            ((ObjectNode) s).remove("area_m2");
        }
        var parts = c.putObject("geometry").putArray("parts");
        for (String name : new String[] {"hot", "cold"}) {
            ObjectNode r = parts.addObject().put("surface", name).putObject("rectangle");
            r.putArray("origin_m").add(0).add(0).add(name.equals("hot") ? 0 : 1);
            r.putArray("edgeU_m").add(1).add(0).add(0);
            r.putArray("edgeV_m").add(2).add(0).add(0); // parallel to edgeU_m: no area
        }
        Path file = RepoCases.write(dir, "skewed.json", c);
        String line = BadInput.rejected(file, "$.geometry.parts[0]", "zero area", "[0, 0, 0]");
        assertThat(line).doesNotContain(INTERNALS);
    }
}
