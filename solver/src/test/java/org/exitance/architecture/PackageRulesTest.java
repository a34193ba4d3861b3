package org.exitance.architecture;

import static com.tngtech.archunit.base.DescribedPredicate.not;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAnyPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.assertj.core.api.Assertions.assertThat;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The import rules of DEVELOPERS.md ("Architecture"), enforced on the compiled main classes
 * with ArchUnit: each package of org.exitance may depend only on the packages listed for it
 * below, data flowing one way from the case file to the writers. The physics (spectral, model,
 * network, bands, thermal, sensitivity, result) touches no files, JSON or command line.
 * A new package must be added here, and to the table in DEVELOPERS.md, before it can exist.
 */
class PackageRulesTest {
    private static final String ROOT = "org.exitance.";

    /** Package (relative to org.exitance) → the org.exitance packages it may use besides itself. */
    static final Map<String, List<String>> ALLOWED = new LinkedHashMap<>();

    static {
        ALLOWED.put("spectral", List.of());
        ALLOWED.put("spectral.source", List.of("spectral"));
        ALLOWED.put("conduction", List.of("spectral"));
        ALLOWED.put("model", List.of("spectral", "spectral.source", "conduction"));
        ALLOWED.put("network", List.of());
        ALLOWED.put("result", List.of("model"));
        ALLOWED.put("bands", List.of("spectral", "spectral.source", "model", "network", "result"));
        ALLOWED.put("thermal", List.of("spectral", "spectral.source", "model", "network", "bands", "result",
                "conduction"));
        ALLOWED.put("timeline", List.of("spectral", "spectral.source", "model", "bands", "result", "thermal",
                "conduction"));
        ALLOWED.put("sensitivity", List.of("spectral", "model", "network", "bands", "result", "thermal"));
        ALLOWED.put("audit", List.of("spectral", "spectral.source", "model", "bands", "result", "thermal"));
        ALLOWED.put("properties", List.of("spectral", "spectral.source", "model"));
        ALLOWED.put("bench", List.of("spectral", "model", "bands", "result", "thermal"));
        ALLOWED.put("cases", List.of("spectral", "spectral.source", "model", "conduction", "timeline", "geometry.."));
        ALLOWED.put("pipeline", List.of("spectral", "spectral.source", "model", "bands", "thermal", "result", "cases",
                "geometry.."));
        ALLOWED.put("validation", List.of("model", "bands", "thermal", "result", "cases", "pipeline"));
        ALLOWED.put("report", List.of("spectral", "spectral.source", "model", "result", "audit", "properties",
                "sensitivity", "timeline", "conduction"));
        ALLOWED.put("report.html", List.of("spectral", "spectral.source", "model", "result", "audit", "properties",
                "report", "timeline", "geometry.."));
        ALLOWED.put("cli", List.of("..")); // the command line may use everything
    }

    /** Libraries that mean files, JSON, plots or the command line: none of them in the physics. */
    private static final String[] EDGE_LIBRARIES = {"com.fasterxml..", "picocli..", "org.jfree..", "java.nio.file.."};
    private static final String[] PHYSICS = {"spectral", "spectral.source", "model", "network", "result", "bands",
        "thermal", "sensitivity", "conduction", "timeline"};

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.exitance");

    @TestFactory
    List<DynamicTest> eachPackageImportsOnlyWhatItsRuleAllows() {
        return ALLOWED.entrySet().stream().filter(e -> !e.getValue().equals(List.of("..")))
                .map(e -> DynamicTest.dynamicTest(e.getKey(), () -> packageRule(e.getKey(), e.getValue()).check(MAIN)))
                .toList();
    }

    @Test
    void thePhysicsTouchesNoFilesJsonPlotsOrCommandLine() {
        String[] physics = java.util.Arrays.stream(PHYSICS).map(p -> ROOT + p).toArray(String[]::new);
        noClasses().that().resideInAnyPackage(physics)
                .should().dependOnClassesThat().resideInAnyPackage(EDGE_LIBRARIES)
                .because("the physics takes model objects and returns results, usable as a library")
                .check(MAIN);
    }

    /**
     * The same table applied to the import lines of the sources, so that an unused import
     * (which leaves no trace in the class files) cannot point the wrong way either.
     */
    @Test
    void importLinesFollowTheSameRules() throws java.io.IOException {
        java.nio.file.Path src = java.nio.file.Path.of("src/main/java/org/exitance");
        List<String> wrong = new java.util.ArrayList<>();
        try (var files = java.nio.file.Files.walk(src)) {
            for (java.nio.file.Path f : files.filter(x -> x.toString().endsWith(".java")).toList()) {
                String pkg = src.relativize(f.getParent()).toString().replace(java.io.File.separatorChar, '.');
                List<String> allowed = ALLOWED.getOrDefault(pkg, List.of());
                if (allowed.equals(List.of(".."))) {
                    continue;
                }
                for (String line : java.nio.file.Files.readAllLines(f)) {
                    java.util.regex.Matcher m = java.util.regex.Pattern
                            .compile("^import (?:static )?org\\.exitance\\.([a-z.]+)\\.[A-Z].*").matcher(line);
                    if (m.matches() && !m.group(1).equals(pkg) && !permits(allowed, m.group(1))) {
                        wrong.add(f + ": " + line);
                    }
                }
            }
        }
        assertThat(wrong).as("imports against DEVELOPERS.md, Architecture").isEmpty();
    }

    private static boolean permits(List<String> allowed, String used) {
        for (String a : allowed) {
            if (a.endsWith("..") ? used.equals(a.substring(0, a.length() - 2)) || used.startsWith(a.substring(0,
                    a.length() - 1)) : used.equals(a)) {
                return true;
            }
        }
        return false;
    }

    @Test
    void everyPackageHasARule() {
        Set<String> packages = MAIN.stream().map(JavaClass::getPackageName)
                .filter(p -> p.startsWith(ROOT) && !p.startsWith(ROOT + "geometry"))
                .map(p -> p.substring(ROOT.length()))
                .collect(Collectors.toCollection(TreeSet::new));
        assertThat(ALLOWED.keySet()).containsAll(packages);
    }

    /** No class of {@code pkg} depends on an org.exitance class outside {@code pkg} and its allowed packages. */
    static com.tngtech.archunit.lang.ArchRule packageRule(String pkg, List<String> allowed) {
        String[] ok = new String[allowed.size() + 1];
        ok[0] = ROOT + pkg;
        for (int i = 0; i < allowed.size(); i++) {
            ok[i + 1] = ROOT + allowed.get(i);
        }
        return noClasses().that().resideInAPackage(ROOT + pkg)
                .should().dependOnClassesThat(resideInAPackage("org.exitance..").and(not(resideInAnyPackage(ok))))
                .because("DEVELOPERS.md, Architecture: " + pkg + " may use " + (allowed.isEmpty() ? "no other package"
                        : String.join(", ", allowed)))
                .allowEmptyShould(true);
    }
}
