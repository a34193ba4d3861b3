package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.support.ShippedCases;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * docs/case.schema.json (JSON Schema draft 2020-12), checked with a general-purpose validator
 * (networknt json-schema-validator): it accepts every shipped case, rejects what the reader rejects
 * for a structural reason, and names every key the reader knows.
 */
class CaseSchemaTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path SCHEMA = ShippedCases.root().resolve("docs").resolve("case.schema.json");
    private static final Schema VALIDATOR = load();

    @TempDir
    Path dir;

    private static Schema load() {
        try {
            return SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12)
                    .getSchema(Files.readString(SCHEMA), InputFormat.JSON);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static List<Error> errors(String json) {
        return VALIDATOR.validate(json, InputFormat.JSON);
    }

    @Test
    void theSchemaDeclaresDraft2020_12() throws Exception {
        assertThat(JSON.readTree(SCHEMA.toFile()).get("$schema").asText())
                .isEqualTo("https://json-schema.org/draft/2020-12/schema");
    }

    @TestFactory
    Stream<DynamicTest> everyShippedCaseIsValid() {
        return Stream.concat(ShippedCases.all().stream(), ShippedCases.large().stream()).map(f -> DynamicTest.dynamicTest(f.getFileName().toString(),
                () -> assertThat(errors(Files.readString(f))).as(f.toString()).isEmpty()));
    }

    /** A structural mistake made to a valid case: the reader refuses it, and so does the schema. */
    private void bothReject(String caseName, String what, Consumer<ObjectNode> mistake) throws Exception {
        ObjectNode c = (ObjectNode) JSON.readTree(RepoCases.validationCase(caseName).toFile());
        assertThat(errors(c.toString())).as("unchanged " + caseName).isEmpty();
        mistake.accept(c);
        Path file = dir.resolve(what.replaceAll("[^a-z]", "-") + ".json");
        JSON.writeValue(file.toFile(), c);
        assertThatThrownBy(() -> CaseReader.read(file)).as("reader, " + what).isInstanceOf(CaseException.class);
        assertThat(errors(c.toString())).as("schema, " + what).isNotEmpty();
    }

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    @Test
    void structuralMistakesTheReaderRefusesTheSchemaRefusesToo() throws Exception {
        String plates = "gray-parallel-plates.json";
        bothReject(plates, "unknown top-level key", c -> c.put("viewfactors", 1));
        bothReject(plates, "unknown surface key", c -> surface(c, 0).put("emmisivity", 0.5));
        bothReject(plates, "area as text", c -> surface(c, 0).put("area_m2", "large"));
        bothReject(plates, "missing material", c -> surface(c, 0).remove("material"));
        bothReject(plates, "missing surfaces", c -> c.remove("surfaces"));
        bothReject(plates, "no view factors", c -> c.remove("viewFactors"));
        bothReject(plates, "two boundary conditions", c -> surface(c, 1).put("netHeat_W", 10));
        bothReject(plates, "matrix as text", c -> ((ObjectNode) c.get("viewFactors")).put("matrix", "identity"));
        bothReject(plates, "band edges as object", c -> c.putObject("bands").putObject("edges_um"));
        bothReject(plates, "solver iterations as text", c -> c.putObject("solver").put("maxNewtonIterations", "many"));
        bothReject(plates, "environment without temperature", c -> c.putObject("environment").put("name", "room"));
        bothReject(plates, "unknown material key", c -> {
            ObjectNode m = (ObjectNode) c.get("materials").elements().next();
            m.put("color", "grey");
        });
        bothReject(plates, "emissivity table without values", c -> {
            ObjectNode m = (ObjectNode) c.get("materials").elements().next();
            m.removeAll();
            m.putObject("spectralEmissivity").putArray("wavelength_um").add(1).add(2);
        });
        bothReject(plates, "source without spectrum", c -> c.putArray("sources").addObject().put("name", "sun")
                .put("irradiance_W_m2", 1361).putObject("incidence").put("hot", 1.0));
        bothReject(plates, "unknown load-case key", c -> c.putArray("loadCases").addObject().put("name", "a")
                .put("when", "night"));
    }

    @Test
    void aGeometryPartWithAnUnknownShapeOrKeyIsRefusedByBoth() throws Exception {
        ObjectNode c = (ObjectNode) JSON.readTree(ShippedCases.root().resolve("cases/demo/heat-treating-chamber-geometry.json")
                .toFile());
        assertThat(errors(c.toString())).isEmpty();
        ObjectNode part = (ObjectNode) c.get("geometry").get("parts").get(0);
        ObjectNode rect = (ObjectNode) part.remove("rectangle");
        part.set("square", rect);
        Path file = dir.resolve("square.json");
        JSON.writeValue(file.toFile(), c);
        assertThatThrownBy(() -> CaseReader.read(file)).isInstanceOf(CaseException.class);
        assertThat(errors(c.toString())).isNotEmpty();
        part.remove("square");
        rect.put("origin", "here");
        part.set("rectangle", rect);
        JSON.writeValue(file.toFile(), c);
        assertThatThrownBy(() -> CaseReader.read(file)).isInstanceOf(CaseException.class);
        assertThat(errors(c.toString())).isNotEmpty();
    }

    @Test
    void theReaderAndTheSchemaAcceptASchemaKey() throws Exception {
        ObjectNode c = (ObjectNode) JSON.readTree(RepoCases.validationCase("gray-parallel-plates.json").toFile());
        ObjectNode withKey = JSON.createObjectNode().put("$schema", "../../docs/case.schema.json");
        withKey.setAll(c);
        Path file = dir.resolve("with-schema.json");
        JSON.writeValue(file.toFile(), withKey);
        assertThat(CaseReader.read(file).surfaces()).hasSize(2);
        assertThat(errors(withKey.toString())).isEmpty();
        withKey.put("$schema", 3);
        JSON.writeValue(file.toFile(), withKey);
        assertThatThrownBy(() -> CaseReader.read(file)).isInstanceOf(CaseException.class);
        assertThat(errors(withKey.toString())).isNotEmpty();
    }

    /**
     * Every key the readers allow (the string literals of their {@code allowOnly} calls and of
     * MaterialReader.allowedKeys(), the measured-emissivity keys and the box and cavity face names) is a property of the schema, and
     * every property of the schema is such a key (or "$schema").
     */
    @Test
    void theSchemaNamesExactlyTheKeysTheReadersAllow() throws Exception {
        Set<String> reader = new TreeSet<>();
        Path sources = ShippedCases.root().resolve("solver/src/main/java/org/exitance");
        Pattern call = Pattern.compile("allowOnly\\(([^)]*)\\)");
        Pattern literal = Pattern.compile("\"([^\"]+)\"");
        try (Stream<Path> files = Stream.concat(Files.list(sources.resolve("cases")),
                Stream.of(sources.resolve("validation/ExpectedReader.java")))) {
            for (Path f : (Iterable<Path>) files::iterator) {
                Matcher m = call.matcher(Files.readString(f));
                while (m.find()) {
                    Matcher l = literal.matcher(m.group(1));
                    while (l.find()) {
                        reader.add(l.group(1));
                    }
                }
            }
        }
        // a material's keys are listed in MaterialReader.allowedKeys()
        String material = Files.readString(sources.resolve("cases/MaterialReader.java"));
        int at = material.indexOf("String[] allowedKeys()");
        Matcher keys = literal.matcher(material.substring(at, material.indexOf("}", at)));
        while (keys.find()) {
            reader.add(keys.group(1));
        }
        reader.addAll(MeasuredEmissivityReader.KEYS);
        reader.addAll(Enclosures.BOX_FACES);
        reader.addAll(List.of("wall", "base", "lid")); // the cylindrical cavity's faces (GeometryReader)
        Set<String> schema = new TreeSet<>();
        collect(JSON.readTree(SCHEMA.toFile()), schema);
        assertThat(reader).as("allowed by the reader, missing from the schema").isSubsetOf(schema);
        schema.remove("$schema");
        assertThat(schema).as("in the schema, unknown to the reader").isSubsetOf(reader);
        assertThat(reader).hasSizeGreaterThan(100);
    }

    private static void collect(JsonNode n, Set<String> out) {
        if (n.isObject()) {
            JsonNode props = n.get("properties");
            if (props != null && props.isObject()) {
                props.fieldNames().forEachRemaining(out::add);
            }
            for (Iterator<JsonNode> it = n.elements(); it.hasNext(); ) {
                collect(it.next(), out);
            }
        } else if (n.isArray()) {
            for (JsonNode x : (ArrayNode) n) {
                collect(x, out);
            }
        }
    }
}
