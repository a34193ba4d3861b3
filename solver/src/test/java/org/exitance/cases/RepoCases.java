package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The shipped cases, found from the module directory (Maven runs tests in solver/), and a way to
 * write edited copies of them for tests.
 */
public final class RepoCases {
    public static final ObjectMapper JSON = new ObjectMapper();

    private RepoCases() {
    }

    /** The repository root: the parent of the module directory; it holds cases/. */
    public static Path root() {
        Path root = Path.of("").toAbsolutePath().getParent();
        assertThat(root.resolve("cases")).as("cases/ beside the module directory").isDirectory();
        return root;
    }

    public static Path validation() {
        return root().resolve("cases").resolve("validation");
    }

    /** A shipped validation case by file name. */
    public static Path validationCase(String fileName) {
        Path p = validation().resolve(fileName);
        assertThat(p).isRegularFile();
        return p;
    }

    /** A fresh, editable copy of a shipped validation case. */
    public static ObjectNode load(String fileName) {
        try {
            return (ObjectNode) JSON.readTree(validationCase(fileName).toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The two gray parallel plates ('hot' at 1000 K, 'cold' at 500 K), the base of most bad cases. */
    public static ObjectNode plates() {
        return load("gray-parallel-plates.json");
    }

    /** Writes a case as JSON into dir and returns its path. */
    public static Path write(Path dir, String fileName, ObjectNode node) {
        try {
            Path p = dir.resolve(fileName);
            JSON.writerWithDefaultPrettyPrinter().writeValue(p.toFile(), node);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Writes text into dir and returns its path. */
    public static Path writeText(Path dir, String fileName, String text) {
        try {
            return Files.writeString(dir.resolve(fileName), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Copies a file of cases/demo into dir (so that a cache written beside it stays out of the tree). */
    public static Path copyDemo(Path dir, String fileName) {
        try {
            Path to = dir.resolve(fileName);
            Files.copy(root().resolve("cases").resolve("demo").resolve(fileName), to);
            return to;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
