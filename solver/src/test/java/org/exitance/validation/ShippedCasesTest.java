package org.exitance.validation;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.exitance.pipeline.CasePipeline;
import org.exitance.pipeline.PreparedCase;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.thermal.CaseSolver;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/** Every shipped case (demo and validation) reads, solves, and closes its energy balance. */
class ShippedCasesTest {

    static List<Path> shippedCases() throws IOException {
        Path cases = ValidationCasesTest.repoRoot().resolve("cases");
        try (Stream<Path> s = Files.walk(cases)) {
            return s.filter(p -> p.toString().endsWith(".json"))
                    .filter(p -> !cases.relativize(p).toString().startsWith("materials"))
                    .sorted().toList();
        }
    }

    @TestFactory
    Stream<DynamicTest> everyShippedCaseSolvesAndBalances() throws IOException {
        List<Path> files = shippedCases();
        assertThat(files).anyMatch(p -> p.toString().contains("demo"));
        return files.stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            PreparedCase c = CasePipeline.prepare(f);
            for (LoadCaseResult lc : CaseSolver.solveAll(c.model(), null, null)) {
                SolveResult r = lc.result();
                // first law over the enclosure, its environment and its sources (common practice)
                assertThat(r.relativeEnergyBalance()).as(lc.name()).isLessThan(1e-9);
            }
        }));
    }

    @TestFactory
    Stream<DynamicTest> theAuditRunsOnEveryShippedCase() throws IOException {
        return shippedCases().stream().map(f -> DynamicTest.dynamicTest(f.getFileName().toString(), () -> {
            var model = CasePipeline.prepare(f).model();
            java.util.List<org.exitance.model.RadiationCase> variants = model.loadCases().isEmpty() ? java.util.List.of(model)
                    : model.loadCases().stream().map(lc -> lc.applyTo(model)).toList();
            for (var v : variants) {
                var a = org.exitance.audit.GrayAudit.run(v, CaseSolver.bandsFor(v, null), 5, "t");
                int reported = v.facetGroups() == null ? v.enclosure().size() : v.facetGroups().surfaces().size();
                assertThat(a.rows()).hasSize(reported);
                assertThat(a.gray().relativeEnergyBalance()).isLessThan(1e-9);
            }
        }));
    }
}
