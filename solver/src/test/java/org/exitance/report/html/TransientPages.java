package org.exitance.report.html;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.assertj.core.api.SoftAssertions;
import org.assertj.core.data.Offset;
import org.exitance.cli.CliRun;
import org.exitance.report.Viridis;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The transient reports of {@link ReportsInBrowserTest}: the two transient demos (cases without
 * geometry: the table of surfaces stands for the model) and the geometry demo of the spacecraft
 * box given thermal masses and one orbit here (the 3-D view). Checks that the tables equal the
 * JSON of the same run, and that stepping through the instants recolours the model on one scale.
 */
final class TransientPages {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** A checksum of a canvas's pixels (drawn into a 2-D canvas and read back). */
    private static final String PIXEL_SUM = "var c = arguments[0], t = document.createElement('canvas');"
            + "t.width = c.width; t.height = c.height; var g = t.getContext('2d'); g.drawImage(c, 0, 0);"
            + "var d = g.getImageData(0, 0, t.width, t.height).data, s = 0;"
            + "for (var i = 0; i < d.length; i++) { s = (s * 31 + d[i]) % 1000000007; } return s;";
    private static final Pattern RGB = Pattern.compile("rgba?\\((\\d+), (\\d+), (\\d+)");

    private TransientPages() {
    }

    /** Runs the transients (case files already copied into {@code cases}) with --json and --report. */
    static List<ReportsInBrowserTest.Report> write(Path out, Path cases) throws IOException {
        List<ReportsInBrowserTest.Report> reports = new ArrayList<>();
        for (String name : List.of("furnace-heat-up-lined", "spacecraft-box-orbits-transient", "spacecraft-box-geometry-orbits")) {
            Path json = out.resolve(name + "-transient.json");
            CliRun run = CliRun.of("transient", cases.resolve(name + ".json").toString(), "--json", "-q", "-o",
                    json.toString(), "--report", out.toString());
            assertThat(run.exitCode()).as(run.toString()).isZero();
            reports.add(new ReportsInBrowserTest.Report(out.resolve(name + "-transient.html"), JSON.readTree(json.toFile()),
                    name.contains("geometry"), true));
        }
        return reports;
    }

    /** The instants, events, energy and period tables hold the JSON's numbers, to the digits shown. */
    static void checkTables(WebDriver driver, JsonNode json, SoftAssertions soft, String name) {
        JsonNode samples = json.get("samples");
        soft.assertThat(driver.findElements(By.cssSelector("table.instants tbody tr"))).as(name + ": instant rows")
                .hasSize(samples.size());
        for (int k = 0; k < samples.size(); k++) {
            JsonNode x = samples.get(k);
            WebElement row = row(driver, "table.instants", Integer.toString(k));
            close(soft, name + ": time of instant " + k, text(row, "th"), x.get("time_s").asDouble());
            close(soft, name + ": stored at " + k, text(row, "td.stored-mj"), x.get("stored_J").asDouble() / 1e6);
            close(soft, name + ": drift at " + k, text(row, "td.drift-j"), x.get("drift_J").asDouble());
            List<WebElement> temps = row.findElements(By.cssSelector("td.t-k"));
            soft.assertThat(temps).as(name + ": temperatures at " + k).isNotEmpty();
            for (WebElement t : temps) {
                int i = Integer.parseInt(t.getAttribute("class").replaceAll(".*\\bn(\\d+)\\b.*", "$1"));
                close(soft, name + ": T of surface " + i + " at " + k, t.getDomProperty("textContent"),
                        x.get("temperature_K").get(i).asDouble());
            }
        }
        for (JsonNode e : json.get("extremes")) {
            WebElement row = row(driver, "table.extremes", e.get("surface").asText());
            for (String[] c : new String[][] {{"min-k", "min_K"}, {"min-s", "minTime_s"}, {"max-k", "max_K"},
                {"max-s", "maxTime_s"}}) {
                close(soft, name + ": " + e.get("surface").asText() + " " + c[1], text(row, "td." + c[0]),
                        e.get(c[1]).asDouble());
            }
        }
        List<WebElement> targets = driver.findElements(By.cssSelector("table.targets tbody tr"));
        soft.assertThat(targets).as(name + ": target rows").hasSize(json.get("targets").size());
        for (int k = 0; k < Math.min(targets.size(), json.get("targets").size()); k++) {
            JsonNode g = json.get("targets").get(k);
            if (g.get("time_s").isNull()) {
                soft.assertThat(targets.get(k).getDomProperty("textContent")).contains("not within the run");
            } else {
                close(soft, name + ": target time " + k, text(targets.get(k), "td.time-s"), g.get("time_s").asDouble());
            }
        }
        JsonNode e = json.get("energy");
        String[][] energy = {{"storedStart", "storedStart_J"}, {"storedEnd", "storedEnd_J"}, {"supplied", "supplied_J"},
            {"lost", "lost_J"}, {"drift", "drift_J"}};
        for (String[] c : energy) {
            close(soft, name + ": energy " + c[1], text(row(driver, "table.energy", c[0]), "td.j"), e.get(c[1]).asDouble());
        }
        close(soft, name + ": stored change", text(row(driver, "table.energy", "storedChange"), "td.mj"),
                (e.get("storedEnd_J").asDouble() - e.get("storedStart_J").asDouble()) / 1e6);
        close(soft, name + ": relative drift", text(row(driver, "table.energy", "driftRelative"), "td.ratio"),
                e.get("driftRelative").asDouble());
        soft.assertThat(driver.findElements(By.cssSelector("table.periods tbody tr"))).as(name + ": period rows")
                .hasSize(json.get("periods").size());
        for (JsonNode c : json.get("periods")) {
            WebElement row = row(driver, "table.periods", c.get("number").asText());
            close(soft, name + ": period end", text(row, "td.end-s"), c.get("end_s").asDouble());
            close(soft, name + ": period supplied", text(row, "td.supplied-mj"), c.get("supplied_J").asDouble() / 1e6);
            close(soft, name + ": period lost", text(row, "td.lost-mj"), c.get("lost_J").asDouble() / 1e6);
            close(soft, name + ": period stored", text(row, "td.stored-mj"), c.get("storedChange_J").asDouble() / 1e6);
            close(soft, name + ": period change", text(row, "td.change-k"), c.get("maxChange_K").asDouble());
        }
    }

    /**
     * A case without geometry: the table of surfaces shows the last instant first; the First button
     * and the slider show others; every swatch has the viridis colour of its temperature on the
     * run's scale (lowest to highest temperature of the JSON's samples), so colours change.
     */
    static void checkNodeTable(WebDriver driver, JsonNode json, SoftAssertions soft, String name) {
        JsonNode samples = json.get("samples");
        int last = samples.size() - 1;
        List<String> before = nodeTableAt(driver, json, last, soft, name);
        driver.findElement(By.id("instant-first")).click();
        List<String> first = nodeTableAt(driver, json, 0, soft, name);
        soft.assertThat(first).as(name + ": the colours change with the instant").isNotEqualTo(before);
        slide(driver, last / 2);
        nodeTableAt(driver, json, last / 2, soft, name);
    }

    private static List<String> nodeTableAt(WebDriver driver, JsonNode json, int k, SoftAssertions soft, String name) {
        WebElement table = driver.findElement(By.id("instant-nodes"));
        new WebDriverWait(driver, Duration.ofSeconds(10)).until(d -> table.getAttribute("data-instant").equals("" + k));
        double[] range = range(json);
        JsonNode t = json.get("samples").get(k).get("temperature_K");
        List<String> colours = new ArrayList<>();
        for (WebElement row : table.findElements(By.cssSelector("tbody tr"))) {
            int i = Integer.parseInt(row.getAttribute("data-index"));
            close(soft, name + ": table T of " + i + " at " + k, text(row, "td.t-k"), t.get(i).asDouble());
            String css = row.findElement(By.cssSelector("span.swatch")).getCssValue("background-color");
            colours.add(css);
            Matcher m = RGB.matcher(css);
            soft.assertThat(m.find()).as(name + ": swatch colour " + css).isTrue();
            Color expected = Viridis.at((t.get(i).asDouble() - range[0]) / (range[1] - range[0]));
            int[] got = {Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)), Integer.parseInt(m.group(3))};
            int[] want = {expected.getRed(), expected.getGreen(), expected.getBlue()};
            for (int c = 0; c < 3; c++) {
                soft.assertThat(got[c]).as(name + ": swatch of " + i + " at " + k + ", channel " + c)
                        .isCloseTo(want[c], Offset.offset(2));
            }
        }
        return colours;
    }

    /**
     * A geometry case: the colour bar spans the run's lowest to highest temperature and keeps it
     * when the instant changes, the view's pixels change, and the picked surface's temperature
     * follows the instant (the JSON's sample).
     */
    static void checkModel(WebDriver driver, WebElement canvas, JsonNode json, SoftAssertions soft, String name) {
        JavascriptExecutor js = (JavascriptExecutor) driver;
        JsonNode samples = json.get("samples");
        int last = samples.size() - 1;
        double[] range = range(json);
        String bar = driver.findElement(By.id("colorbar")).getAttribute("data-range");
        soft.assertThat(bar).as(name + ": colour bar range").isNotNull();
        if (bar != null) {
            String[] lohi = bar.split(" ");
            soft.assertThat(Double.parseDouble(lohi[0])).as(name + ": scale low").isCloseTo(range[0], Offset.offset(1e-9));
            soft.assertThat(Double.parseDouble(lohi[1])).as(name + ": scale high").isCloseTo(range[1], Offset.offset(1e-9));
        }
        String surface = Browser.clickFacet(driver, canvas, soft, name);
        int i = surface == null ? -1 : indexOf(json, surface);
        soft.assertThat(i).as(name + ": the picked surface " + surface + " is a surface of the run").isNotNegative();
        if (i >= 0) {
            pickedAt(driver, samples, last, i, soft, name);
        }
        Object pixels = js.executeScript(PIXEL_SUM, canvas); // after the pick, whose outline stays
        driver.findElement(By.id("instant-first")).click();
        new WebDriverWait(driver, Duration.ofSeconds(10)).until(d -> Long.valueOf(0).equals(
                js.executeScript("return window.exitanceReport.instant;")));
        soft.assertThat(js.executeScript(PIXEL_SUM, canvas)).as(name + ": the view changes with the instant")
                .isNotEqualTo(pixels);
        soft.assertThat(driver.findElement(By.id("colorbar")).getAttribute("data-range"))
                .as(name + ": one scale over the run").isEqualTo(bar);
        if (i >= 0) {
            pickedAt(driver, samples, 0, i, soft, name);
            slide(driver, 2);
            pickedAt(driver, samples, 2, i, soft, name);
        }
    }

    private static void pickedAt(WebDriver driver, JsonNode samples, int k, int i, SoftAssertions soft, String name) {
        WebElement pick = driver.findElement(By.id("pick"));
        String t = samples.get(k).get("time_s").asText();
        soft.assertThat(pick.findElement(By.cssSelector("dd[data-row='1']")).getText()).as(name + ": the instant picked")
                .startsWith("t = " + String.format(java.util.Locale.ROOT, "%.6g", samples.get(k).get("time_s").asDouble()));
        close(soft, name + ": picked temperature at " + t + " s", pick.findElement(By.cssSelector("dd[data-row='2']"))
                .getText(), samples.get(k).get("temperature_K").get(i).asDouble());
    }

    /** Moves the slider as a user would (value and an input event). */
    private static void slide(WebDriver driver, int k) {
        ((JavascriptExecutor) driver).executeScript("var s = document.getElementById('instant'); s.value = arguments[0];"
                + "s.dispatchEvent(new Event('input'));", String.valueOf(k));
    }

    /** The run's lowest and highest temperature of any surface at any instant (K), from the JSON. */
    private static double[] range(JsonNode json) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (JsonNode x : json.get("samples")) {
            for (JsonNode t : x.get("temperature_K")) {
                lo = Math.min(lo, t.asDouble());
                hi = Math.max(hi, t.asDouble());
            }
        }
        return new double[] {lo, hi};
    }

    private static int indexOf(JsonNode json, String surface) {
        ArrayNode names = (ArrayNode) json.get("surfaces");
        for (int i = 0; i < names.size(); i++) {
            if (names.get(i).asText().equals(surface)) {
                return i;
            }
        }
        return -1;
    }

    private static WebElement row(WebDriver driver, String table, String key) {
        return driver.findElement(By.cssSelector(table + " tr[data-key='" + key + "']"));
    }

    private static String text(WebElement row, String cell) {
        // textContent, not the rendered text: a table folded into <details> is not rendered
        return row.findElement(By.cssSelector(cell)).getDomProperty("textContent");
    }

    /** The shown number equals the expected one to within half a unit of its last shown digit. */
    static void close(SoftAssertions soft, String what, String shown, double expected) {
        String s = shown.trim();
        int e = s.toLowerCase(java.util.Locale.ROOT).indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        int exponent = e < 0 ? 0 : Integer.parseInt(s.substring(e + 1).replace("+", ""));
        int dot = mantissa.indexOf('.');
        int decimals = dot < 0 ? 0 : mantissa.length() - dot - 1;
        double tolerance = 0.5001 * Math.pow(10, exponent - decimals) + 1e-12 * Math.abs(expected);
        soft.assertThat(Double.parseDouble(s)).as(what + " (shown " + s + ")").isCloseTo(expected, Offset.offset(tolerance));
    }
}
