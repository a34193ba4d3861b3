package org.exitance.validation;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.exitance.support.ShippedCases;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Runs every shipped validation case (cases/validation/*.json), exactly as
 * {@code exitance verify} does. Each case names its published source and carries its reference
 * values and tolerance.
 */
class ValidationCasesTest {

    static Path repoRoot() {
        Path here = Path.of("").toAbsolutePath();
        for (Path p = here; p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("cases").resolve("validation"))) {
                return p;
            }
        }
        throw new IllegalStateException("cases/validation not found above " + here);
    }

    @TestFactory
    Stream<DynamicTest> everyValidationCasePasses() throws IOException {
        List<Path> files = ShippedCases.validation();
        assertThat(ValidationRunner.casesIn(repoRoot().resolve("cases").resolve("validation"))).containsExactlyElementsOf(files);
        return files.stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            CaseVerdict v = ValidationRunner.run(f);
            assertThat(v.error()).as("error").isNull();
            assertThat(v.source()).isNotBlank();
            for (CheckOutcome c : v.checks()) {
                assertThat(c.passed()).as("%s %s: expected %s, computed %s, allowed %s", c.target(), c.quantity(),
                        c.expected(), c.computed(), c.allowed()).isTrue();
            }
        }));
    }
}
