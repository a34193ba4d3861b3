package org.exitance.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;
import org.assertj.core.api.SoftAssertions;
import org.exitance.cli.CliRun;
import org.exitance.support.ShippedCases;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.openqa.selenium.logging.LoggingPreferences;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Opens the HTML report of every demo case that solves, an audit report, a material report and
 * the transient reports of {@link TransientPages} in
 * headless Chromium (Debian's chromium and chromedriver, driven by Selenium; one browser session
 * for all) and checks what a reader would: no console errors, no network request, every picture
 * and chart drawn, the 3-D view rendered, the result tables holding the values of the JSON output
 * of the same run, and a click on the model showing the picked surface's values. Keeps a
 * screenshot of each page in target/browser-reports/. Skips only when Chromium is absent and CI is
 * not set.
 */
class ReportsInBrowserTest {
    private static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    private static final Path DRIVER = Path.of("/usr/bin/chromedriver");
    private static final ObjectMapper JSON = new ObjectMapper();

    /**
     * A report to open, and the JSON of the same run (null for the material report).
     *
     * @param timed a transient report
     */
    record Report(Path page, JsonNode json, boolean hasModel, boolean timed) {
        Report(Path page, JsonNode json, boolean hasModel) {
            this(page, json, hasModel, false);
        }
    }

    @Test
    void everyDemoReportRendersOfflineWithTheSolvedValues() throws Exception {
        boolean present = Files.isExecutable(CHROMIUM) && Files.isExecutable(DRIVER);
        if (!present && System.getenv("CI") == null) {
            Assumptions.abort("headless Chromium is not installed (apt-get install chromium chromium-driver);"
                    + " the browser test of the HTML reports is skipped (it runs, and fails without it, when CI is set)");
        }
        assertThat(present).as("CI is set: /usr/bin/chromium and /usr/bin/chromedriver must be installed").isTrue();
        Path out = Path.of("target", "browser-reports").toAbsolutePath();
        List<Report> reports = writeReports(out);
        long start = System.nanoTime();
        ChromeDriver driver = start(out);
        SoftAssertions soft = new SoftAssertions();
        try {
            for (Report r : reports) {
                check(driver, r, soft, out);
            }
        } finally {
            driver.quit();
        }
        System.out.printf("browser checks of %d reports: %.1f s%n", reports.size(), (System.nanoTime() - start) / 1e9);
        soft.assertAll();
    }

    /** Solves every demo case (copied, with its meshes, into target/ so no cache lands in the tree). */
    private static List<Report> writeReports(Path out) throws IOException {
        deleteTree(out);
        Path cases = out.resolve("cases");
        Files.createDirectories(cases);
        Path demo = ShippedCases.root().resolve("cases").resolve("demo");
        copyTree(demo, cases);
        List<Report> reports = new ArrayList<>();
        for (Path original : ShippedCases.demo()) {
            Path c = cases.resolve(original.getFileName());
            String stem = c.getFileName().toString().replace(".json", "");
            Path json = out.resolve(stem + ".json");
            CliRun run = CliRun.of("solve", c.toString(), "--json", "-q", "-o", json.toString(), "--report", out.toString());
            Path page = out.resolve(stem + "-solve.html");
            if (run.exitCode() == 0 || Files.exists(page)) {
                reports.add(new Report(page, JSON.readTree(json.toFile()), JSON.readTree(c.toFile()).has("geometry")));
            } else {
                System.out.println("not solved, no report: " + c.getFileName() + ": " + run.err().strip());
            }
        }
        Path audit = cases.resolve("selective-absorber-audit.json");
        Path auditJson = out.resolve("audit.json");
        assertThat(CliRun.of("audit", audit.toString(), "--json", "-o", auditJson.toString(), "--report",
                out.toString()).exitCode()).isZero();
        reports.add(new Report(out.resolve("selective-absorber-audit-audit.html"), JSON.readTree(auditJson.toFile()), false));
        Path material = ShippedCases.root().resolve("cases").resolve("materials").resolve("white-paint.json");
        assertThat(CliRun.of("material", material.toString(), "--report", out.toString()).exitCode()).isZero();
        reports.add(new Report(out.resolve("white-paint-material.html"), null, false));
        reports.addAll(TransientPages.write(out, cases));
        return reports.stream().map(r -> r.json() != null && r.json().has("samples")
                ? new Report(r.page(), r.json(), r.hasModel(), true) : r).toList();
    }

    private static ChromeDriver start(Path out) throws IOException {
        ChromeOptions o = new ChromeOptions();
        o.setBinary(CHROMIUM.toFile());
        o.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                "--disable-background-networking", "--disable-component-update", "--disable-sync",
                // WebGL without a GPU: the SwiftShader software renderer
                "--use-angle=swiftshader", "--enable-unsafe-swiftshader",
                "--window-size=1300,1000", "--user-data-dir=" + Files.createTempDirectory(out, "profile-"));
        LoggingPreferences logs = new LoggingPreferences();
        logs.enable(LogType.BROWSER, Level.ALL);
        logs.enable(LogType.PERFORMANCE, Level.ALL);
        o.setCapability("goog:loggingPrefs", logs);
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort().build();
        return new ChromeDriver(service, o);
    }

    private static void check(ChromeDriver driver, Report r, SoftAssertions soft, Path out) throws IOException {
        String name = r.page().getFileName().toString();
        String url = r.page().toUri().toString();
        driver.manage().logs().get(LogType.PERFORMANCE); // drop what came before this page
        driver.get(url);
        new WebDriverWait(driver, Duration.ofSeconds(60)).until(d -> "1".equals(d.findElement(By.tagName("body"))
                .getAttribute("data-ready")));
        JavascriptExecutor js = driver;

        // pictures and charts
        List<WebElement> svgs = driver.findElements(By.cssSelector("figure.plot svg"));
        if (!r.timed()) {
            soft.assertThat(svgs).as(name + ": spectral plots").isNotEmpty();
        } else {
            soft.assertThat(driver.findElements(By.cssSelector("div.chart"))).as(name + ": charts against time").hasSizeGreaterThanOrEqualTo(2);
        }
        for (WebElement svg : svgs) {
            soft.assertThat(svg.getSize().getWidth() * svg.getSize().getHeight()).as(name + ": an SVG plot's size").isPositive();
            soft.assertThat(svg.findElements(By.cssSelector("path, text")).size()).as(name + ": an SVG plot's marks")
                    .isGreaterThan(20);
        }
        soft.assertThat(driver.findElement(By.id("script-problem")).getText()).as(name + ": a script problem shown")
                .isEmpty();
        for (WebElement chart : driver.findElements(By.cssSelector("div.chart"))) {
            List<WebElement> canvases = chart.findElements(By.tagName("canvas"));
            soft.assertThat(canvases).as(name + ": chart " + chart.getAttribute("id") + " drawn").isNotEmpty();
            if (!canvases.isEmpty()) {
                Long inked = (Long) js.executeScript(Browser.INKED_CANVAS, canvases.get(0));
                soft.assertThat(inked).as(name + ": chart " + chart.getAttribute("id") + " inked pixels").isGreaterThan(2000L);
            }
        }
        for (WebElement img : driver.findElements(By.tagName("img"))) {
            soft.assertThat((Boolean) js.executeScript("return arguments[0].complete && arguments[0].naturalWidth > 0;", img))
                    .as(name + ": picture " + img.getAttribute("alt")).isTrue();
        }
        if (r.hasModel()) {
            soft.assertThat(driver.findElements(By.cssSelector("#stills img"))).as(name + ": still pictures")
                    .hasSize(r.timed() ? Math.min(6, r.json().get("samples").size()) : 4);
            WebElement canvas = driver.findElement(By.id("view3d"));
            Long inked = (Long) js.executeScript(Browser.INKED_CANVAS, canvas);
            soft.assertThat(inked).as(name + ": 3-D view inked pixels").isGreaterThan(5000L);
            if (r.timed()) {
                TransientPages.checkModel(driver, canvas, r.json(), soft, name);
            } else {
                Browser.checkPicking(driver, canvas, r.json(), soft, name);
            }
            // the view after the pick, as the docs show it
            Files.write(out.resolve(name.replace(".html", "-view.png")),
                    driver.findElement(By.cssSelector("div.viewer")).getScreenshotAs(org.openqa.selenium.OutputType.BYTES));
        }
        if (r.timed()) {
            TransientPages.checkTables(driver, r.json(), soft, name);
            if (!r.hasModel()) {
                TransientPages.checkNodeTable(driver, r.json(), soft, name);
            }
        } else if (r.json() != null) {
            Browser.checkTables(driver, r.json(), soft, name);
        }

        // the browser's own log: no errors; the network: nothing but the page itself
        for (LogEntry e : driver.manage().logs().get(LogType.BROWSER)) {
            soft.assertThat(e.getLevel()).as(name + ": console: " + e.getMessage()).isNotEqualTo(Level.SEVERE);
        }
        List<String> requests = Browser.requestedUrls(driver.manage().logs().get(LogType.PERFORMANCE));
        soft.assertThat(requests).as(name + ": the network log (it holds the page's own request)").contains(url);
        for (String requested : requests) {
            soft.assertThat(requested.equals(url) || requested.startsWith("data:") || requested.startsWith("blob:"))
                    .as(name + ": a request for " + requested).isTrue();
        }
        soft.assertThat((Long) js.executeScript("return performance.getEntriesByType('resource').length;"))
                .as(name + ": resources loaded").isZero();

        Map<String, Object> shot = driver.executeCdpCommand("Page.captureScreenshot",
                Map.of("format", "png", "captureBeyondViewport", true));
        Files.write(out.resolve(name.replace(".html", ".png")), Base64.getDecoder().decode((String) shot.get("data")));
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (var s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else if (!p.getFileName().toString().endsWith(".vfcache")) {
                    Files.copy(p, t);
                }
            }
        }
    }

    private static void deleteTree(Path d) throws IOException {
        if (!Files.exists(d)) {
            return;
        }
        try (var s = Files.walk(d)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
