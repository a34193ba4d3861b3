package org.exitance.report.html;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.assertj.core.api.SoftAssertions;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.logging.LogEntries;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.support.ui.WebDriverWait;

/** The checks of {@link ReportsInBrowserTest} that read the page: tables, picking, the network log. */
final class Browser {
    /** Counts the pixels of a canvas (2-D or WebGL) that are neither transparent nor near white. */
    static final String INKED_CANVAS = "var c = arguments[0], t = document.createElement('canvas');"
            + "t.width = c.width; t.height = c.height; var g = t.getContext('2d'); g.drawImage(c, 0, 0);"
            + "var d = g.getImageData(0, 0, t.width, t.height).data, n = 0;"
            + "for (var i = 0; i < d.length; i += 4) { if (d[i + 3] > 0 && (d[i] < 235 || d[i + 1] < 235 || d[i + 2] < 235)) { n++; } }"
            + "return n;";

    /**
     * A pixel of the 3-D view inside a patch of one saturated colour (a facet's face, away from
     * its outline and from the white background): the one nearest the centre of all such pixels.
     */
    static final String FACET_PIXEL = "var c = arguments[0], t = document.createElement('canvas');"
            + "t.width = c.width; t.height = c.height; var g = t.getContext('2d'); g.drawImage(c, 0, 0);"
            + "var w = t.width, h = t.height, d = g.getImageData(0, 0, w, h).data;"
            + "function at(x, y) { var i = 4 * (y * w + x); return [d[i], d[i + 1], d[i + 2]]; }"
            + "function sat(p) { return Math.max(p[0], p[1], p[2]) - Math.min(p[0], p[1], p[2]) > 40; }"
            + "function same(p, q) { return Math.abs(p[0] - q[0]) + Math.abs(p[1] - q[1]) + Math.abs(p[2] - q[2]) < 6; }"
            + "var best = null, bd = 1e18;"
            + "for (var y = 8; y < h - 8; y += 3) { for (var x = 8; x < w - 8; x += 3) {"
            + "  var p = at(x, y); if (!sat(p)) { continue; } var ok = true;"
            + "  for (var dy = -6; dy <= 6 && ok; dy += 3) { for (var dx = -6; dx <= 6 && ok; dx += 3) { ok = same(p, at(x + dx, y + dy)); } }"
            + "  if (!ok) { continue; } var dd = (x - w / 2) * (x - w / 2) + (y - h / 2) * (y - h / 2);"
            + "  if (dd < bd) { bd = dd; best = [x, y]; } } }"
            + "return best;";

    private static final ObjectMapper JSON = new ObjectMapper();

    private Browser() {
    }

    /** The URLs the page asked for (Network.requestWillBeSent in the performance log). */
    static List<String> requestedUrls(LogEntries performance) {
        List<String> urls = new ArrayList<>();
        for (LogEntry e : performance) {
            try {
                JsonNode m = JSON.readTree(e.getMessage()).path("message");
                if (m.path("method").asText().equals("Network.requestWillBeSent")) {
                    urls.add(m.path("params").path("request").path("url").asText());
                }
            } catch (java.io.IOException ex) {
                throw new java.io.UncheckedIOException(ex);
            }
        }
        return urls;
    }

    /** The solve's result JSON of each load case, keyed as the page keys its tables ("" without load cases). */
    static List<String[]> loadCases(JsonNode json) {
        List<String[]> out = new ArrayList<>();
        if (json.has("loadCases")) {
            json.get("loadCases").forEach(lc -> out.add(new String[] {lc.get("name").asText()}));
        } else {
            out.add(new String[] {""});
        }
        return out;
    }

    private static JsonNode result(JsonNode json, String key) {
        if (key.isEmpty()) {
            return json;
        }
        for (JsonNode lc : json.get("loadCases")) {
            if (lc.get("name").asText().equals(key)) {
                return lc.get("result");
            }
        }
        throw new AssertionError("no load case " + key);
    }

    /** Each surface's temperature and net heat in the page's tables equal the JSON's, to the digits shown. */
    static void checkTables(WebDriver driver, JsonNode json, SoftAssertions soft, String name) {
        if (json.has("audits")) {
            for (JsonNode a : json.get("audits")) {
                String key = a.get("name").asText().equals("as given") ? "" : a.get("name").asText();
                for (JsonNode s : a.get("surfaces")) {
                    WebElement row = row(driver, "table.audit", key, s.get("name").asText());
                    close(soft, name, row, "td.q-w", s.get("netHeat_W").get("band").asDouble());
                    close(soft, name, row, "td.t-k", s.get("temperature_K").get("band").asDouble());
                }
            }
            return;
        }
        for (String[] lc : loadCases(json)) {
            JsonNode r = result(json, lc[0]);
            for (JsonNode s : r.get("surfaces")) {
                WebElement row = row(driver, "table.results", lc[0], s.get("name").asText());
                close(soft, name, row, "td.t-k", s.get("temperature_K").asDouble());
                close(soft, name, row, "td.q-w", s.get("netHeat_W").asDouble());
                // the pair exchange: each surface's row of the matrix sums to its net heat
                List<WebElement> exchange = driver.findElements(By.cssSelector("table.exchange[data-load-case='"
                        + lc[0] + "'] tr[data-key='" + s.get("name").asText() + "']"));
                if (!exchange.isEmpty()) {
                    close(soft, name, exchange.get(0), "td.row-sum", s.get("netHeat_W").asDouble());
                }
            }
            soft.assertThat(driver.findElements(By.cssSelector("table.exchange[data-load-case='" + lc[0] + "']")))
                    .as(name + ": a pair-exchange matrix exactly when the JSON has one").hasSize(r.has("pairExchange") ? 1 : 0);
        }
    }

    private static WebElement row(WebDriver driver, String table, String key, String surface) {
        return driver.findElement(By.cssSelector(table + "[data-load-case='" + key + "'] tr[data-key='" + surface + "']"));
    }

    /** The shown number equals the JSON's to its shown precision: 0.01, or 5 significant digits in exponent form. */
    private static void close(SoftAssertions soft, String name, WebElement row, String cell, double expected) {
        // textContent, not the rendered text: a table folded into <details> is not rendered
        String shown = row.findElement(By.cssSelector(cell)).getDomProperty("textContent");
        double tolerance = Math.max(0.0051, 1e-4 * Math.abs(expected));
        soft.assertThat(Double.parseDouble(shown)).as(name + ": " + row.getAttribute("data-key") + " " + cell)
                .isCloseTo(expected, org.assertj.core.data.Offset.offset(tolerance));
    }

    /**
     * Clicks a facet of the 3-D view (inside a patch of one colour) and returns the surface the
     * pick panel then names, or null (a soft failure) when no facet was found.
     */
    static String clickFacet(WebDriver driver, WebElement canvas, SoftAssertions soft, String name) {
        @SuppressWarnings("unchecked")
        List<Long> xy = (List<Long>) ((JavascriptExecutor) driver).executeScript(FACET_PIXEL, canvas);
        soft.assertThat(xy).as(name + ": a facet to click in the 3-D view").isNotNull();
        if (xy == null) {
            return null;
        }
        int w = canvas.getSize().getWidth();
        int h = canvas.getSize().getHeight();
        new Actions(driver).moveToElement(canvas, (int) (xy.get(0) - w / 2), (int) (xy.get(1) - h / 2)).click().perform();
        WebElement pick = driver.findElement(By.id("pick"));
        new WebDriverWait(driver, Duration.ofSeconds(10)).until(d -> pick.getAttribute("data-surface") != null);
        return pick.getAttribute("data-surface");
    }

    /** A click on a facet of the 3-D view shows that surface's name and temperature, as in the JSON. */
    static void checkPicking(WebDriver driver, WebElement canvas, JsonNode json, SoftAssertions soft, String name) {
        String surface = clickFacet(driver, canvas, soft, name);
        if (surface == null) {
            return;
        }
        WebElement pick = driver.findElement(By.id("pick"));
        JsonNode r = result(json, loadCases(json).get(0)[0]);
        JsonNode expected = null;
        for (JsonNode s : r.get("surfaces")) {
            if (s.get("name").asText().equals(surface)) {
                expected = s;
            }
        }
        soft.assertThat(expected).as(name + ": the picked surface " + surface + " is a surface of the result").isNotNull();
        if (expected != null) {
            String t = pick.findElement(By.cssSelector("dd[data-row='2']")).getText();
            soft.assertThat(Double.parseDouble(t)).as(name + ": picked " + surface + " temperature")
                    .isCloseTo(expected.get("temperature_K").asDouble(), org.assertj.core.data.Offset.offset(0.0051));
            String q = pick.findElement(By.cssSelector("dd[data-row='3']")).getText();
            double eq = expected.get("netHeat_W").asDouble();
            soft.assertThat(Double.parseDouble(q)).as(name + ": picked " + surface + " net heat")
                    .isCloseTo(eq, org.assertj.core.data.Offset.offset(Math.max(0.0051, 1e-4 * Math.abs(eq))));
        }
    }
}
