package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.exitance.cases.RepoCases;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --report DIR} of solve, audit, transient and material: the page's name, the file rules of every
 * output (no overwrite without --force, no directory without --create-dirs), and a page that
 * names nothing to load.
 */
class ReportOptionTest {
    @TempDir
    Path dir;

    private static String plates() {
        return RepoCases.validationCase("gray-parallel-plates.json").toString();
    }

    @Test
    void solveWritesOnePageNamedAfterTheCase() throws Exception {
        CliRun run = CliRun.of("solve", plates(), "--report", dir.toString());
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("Energy balance"); // the tables still go to standard output
        assertThat(dir.resolve("gray-parallel-plates-solve.html")).exists();
        try (var files = Files.list(dir)) {
            assertThat(files.toList()).hasSize(1);
        }
    }

    @Test
    void aReportIsNotOverwrittenWithoutForce() throws Exception {
        Path page = dir.resolve("gray-parallel-plates-solve.html");
        Files.writeString(page, "mine");
        CliRun run = CliRun.of("solve", plates(), "--report", dir.toString());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.out()).as("refused before any work").isEmpty();
        assertThat(run.errLines()).singleElement().asString().contains(page.toString(), "exists", "--force");
        assertThat(Files.readString(page)).isEqualTo("mine");
        CliRun forced = CliRun.of("solve", plates(), "--report", dir.toString(), "--force");
        assertThat(forced.exitCode()).as(forced.toString()).isZero();
        assertThat(Files.readString(page)).startsWith("<!DOCTYPE html>");
    }

    @Test
    void aMissingReportDirectoryIsCreatedOnlyWithCreateDirs() {
        Path missing = dir.resolve("no").resolve("such");
        for (String command : new String[] {"solve", "audit", "material"}) {
            CliRun run = CliRun.of(command, plates(), "--report", missing.toString());
            assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
            assertThat(run.errLines()).as(run.toString()).singleElement().asString()
                    .contains("does not exist", "--create-dirs");
        }
        assertThat(dir.resolve("no")).doesNotExist();
        CliRun run = CliRun.of("audit", plates(), "--report", missing.toString(), "--create-dirs");
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(missing.resolve("gray-parallel-plates-audit.html")).exists();
    }

    /** The furnace demo in time: its page is named after the case, checked before the run, and kept. */
    @Test
    void transientWritesItsPageUnderTheSameFileRules() throws Exception {
        Path c = RepoCases.copyDemo(dir, "furnace-heat-up-lined.json");
        Path out = dir.resolve("out");
        CliRun missing = CliRun.of("transient", c.toString(), "-q", "--report", out.toString());
        assertThat(missing.exitCode()).as(missing.toString()).isEqualTo(2);
        assertThat(missing.out()).as("refused before the run").isEmpty();
        assertThat(missing.errLines()).singleElement().asString().contains("does not exist", "--create-dirs");
        CliRun run = CliRun.of("transient", c.toString(), "-q", "--report", out.toString(), "--create-dirs");
        assertThat(run.exitCode()).as(run.toString()).isZero();
        assertThat(run.out()).contains("Temperatures at the output instants");
        Path page = out.resolve("furnace-heat-up-lined-transient.html");
        assertThat(Files.readString(page)).startsWith("<!DOCTYPE html>").contains("Transient report",
                "has no geometry to draw", "Invented data", "Caution");
        Files.writeString(page, "mine");
        CliRun again = CliRun.of("transient", c.toString(), "-q", "--report", out.toString());
        assertThat(again.exitCode()).as(again.toString()).isEqualTo(2);
        assertThat(again.errLines()).singleElement().asString().contains(page.toString(), "exists", "--force");
        assertThat(Files.readString(page)).isEqualTo("mine");
    }

    @Test
    void aReportDirectoryThatIsAFileIsRefused() throws Exception {
        Path file = Files.writeString(dir.resolve("plain"), "x");
        CliRun run = CliRun.of("material", plates(), "--report", file.toString());
        assertThat(run.exitCode()).as(run.toString()).isEqualTo(2);
        assertThat(run.errLines()).singleElement().asString().contains("not a directory");
    }

    /**
     * The page refers to nothing outside itself: no element with a src or href other than an
     * anchor in the page, no style sheet link, no script source; and it carries the charting
     * library verbatim, as its WebJar ships it (checked against the WebJar on the class path).
     */
    @Test
    void thePageNamesNothingToLoadAndCarriesTheLibraryAsShipped() throws Exception {
        assertThat(CliRun.of("material", RepoCases.root().resolve("cases").resolve("materials").resolve("white-paint.json").toString(), "--report",
                dir.toString()).exitCode()).isZero();
        String page = Files.readString(dir.resolve("white-paint-material.html"));
        // the markup outside the scripts (what the scripts fetch, the browser test watches)
        String html = Pattern.compile("(?s)(<script[^>]*>).*?</script>").matcher(page).replaceAll("$1</script>");
        assertThat(html).contains("<script type=\"application/json\" id=\"report-data\">");
        Matcher m = Pattern.compile("(?i)<[a-z]+[^>]*\\s(src|href)\\s*=\\s*\"([^\"]*)\"").matcher(html);
        while (m.find()) {
            assertThat(m.group(2)).as("a reference in the page").startsWith("#");
        }
        assertThat(html).doesNotContainIgnoringCase("<link").doesNotContainIgnoringCase("@import")
                .doesNotContainIgnoringCase("url(http");
        try (var in = ReportOptionTest.class.getResourceAsStream("/META-INF/resources/webjars/echarts/5.3.1/dist/echarts.min.js")) {
            assertThat(in).as("the ECharts WebJar on the class path").isNotNull();
            assertThat(page).contains(new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8));
        }
    }
}
