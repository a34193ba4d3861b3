package org.exitance.validation;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.exitance.audit.AuditResult;
import org.exitance.audit.GrayAudit;
import org.exitance.model.RadiationCase;
import org.exitance.pipeline.CasePipeline;
import org.exitance.result.LoadCaseResult;
import org.exitance.support.ShippedCases;
import org.exitance.support.SolveCheck;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every shipped case (demo and validation, the pinned list of {@link ShippedCases}) reads and
 * solves, and each load case's result solves its own band equations ({@link SolveCheck}: the
 * residual of the reported J and G, and an independent LU solve of the textbook system at the
 * reported temperatures).
 */
class ShippedCasesTest {

    static List<Path> shippedCases() {
        return ShippedCases.all();
    }

    @TestFactory
    Stream<DynamicTest> everyShippedCaseSolvesItsBandEquations() {
        return shippedCases().stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            RadiationCase c = CasePipeline.prepare(f).model();
            for (LoadCaseResult lc : CaseSolver.solveAll(c, null, null)) {
                SolveCheck.assertSolved(SolveCheck.caseOf(c, lc), lc.result());
            }
        }));
    }

    @TestFactory
    Stream<DynamicTest> theAuditRunsOnEveryShippedCase() {
        return shippedCases().stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            var model = CasePipeline.prepare(f).model();
            List<RadiationCase> variants = model.loadCases().isEmpty() ? List.of(model)
                    : model.loadCases().stream().map(lc -> lc.applyTo(model)).toList();
            for (var v : variants) {
                AuditResult a = GrayAudit.run(v, CaseSolver.bandsFor(v, null), 5, "t");
                int reported = v.facetGroups() == null ? v.enclosure().size() : v.facetGroups().surfaces().size();
                assertThat(a.rows()).hasSize(reported);
                // the gray shortcut absorbs external irradiation with α = ε; the two-band solve with the spectra
                SolveCheck.assertSolved(v, a.band());
                SolveCheck.assertSolved(v, a.gray(), SolveCheck.TOLERANCE, true);
                if (a.twoBand() != null) {
                    SolveCheck.assertSolved(v, a.twoBand());
                }
            }
        }));
    }

    @Test
    void theShippedCaseFilesAreThePinnedList() {
        assertThat(ShippedCases.demo()).hasSize(ShippedCases.DEMO.size());
        assertThat(ShippedCases.validation()).hasSize(ShippedCases.VALIDATION.size());
    }

    @Test
    void aStrayOrMissingCaseFileFailsThePin(@TempDir Path dir) throws IOException {
        for (String name : ShippedCases.VALIDATION) {
            Files.writeString(dir.resolve(name), "{}");
        }
        assertThat(ShippedCases.pinned(dir, ShippedCases.VALIDATION)).hasSize(ShippedCases.VALIDATION.size());
        Files.createDirectories(dir.resolve("extra"));
        Files.writeString(dir.resolve("extra").resolve("stray.json"), "{}");
        assertThatThrownBy(() -> ShippedCases.pinned(dir, ShippedCases.VALIDATION)).isInstanceOf(AssertionError.class)
                .hasMessageContaining("extra/stray.json");
        Files.delete(dir.resolve("extra").resolve("stray.json"));
        Files.delete(dir.resolve(ShippedCases.VALIDATION.get(0)));
        assertThatThrownBy(() -> ShippedCases.pinned(dir, ShippedCases.VALIDATION)).isInstanceOf(AssertionError.class)
                .hasMessageContaining("missing [" + ShippedCases.VALIDATION.get(0) + "]");
    }
}
