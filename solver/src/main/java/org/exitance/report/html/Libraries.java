package org.exitance.report.html;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The JavaScript libraries the report inlines, read from their WebJars on the class path when a
 * report is written (Apache ECharts for charts, three.js for the 3-D view), with their licence
 * texts. Nothing is fetched: the page carries the libraries' own files, unchanged except for the
 * two module lines of three.js's orbit control (its ES-module import and export become a plain
 * script's, see {@link #threeScripts()}).
 */
final class Libraries {
    /** Versions, filled in from the build (exitance-version.properties). */
    static final String ECHARTS_VERSION;
    static final String THREE_VERSION;

    static {
        Properties p = new Properties();
        try (InputStream in = Libraries.class.getResourceAsStream("/exitance-version.properties")) {
            p.load(in);
        } catch (IOException | NullPointerException e) {
            throw new IllegalStateException("exitance-version.properties is missing from the build", e);
        }
        ECHARTS_VERSION = p.getProperty("echarts.version");
        THREE_VERSION = p.getProperty("three.version");
    }

    private static final Pattern IMPORT = Pattern.compile("import\\s*\\{([^}]*)\\}\\s*from\\s*'three';");
    private static final Pattern EXPORT = Pattern.compile("export\\s*\\{\\s*OrbitControls\\s*\\};");

    private Libraries() {
    }

    private static String echartsPath(String file) {
        return "/META-INF/resources/webjars/echarts/" + ECHARTS_VERSION + "/" + file;
    }

    private static String threePath(String file) {
        return "/META-INF/resources/webjars/three/" + THREE_VERSION + "/" + file;
    }

    /** A text resource of the class path (UTF-8). */
    static String resource(String path) {
        try (InputStream in = Libraries.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("the build lacks " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** ECharts' minified bundle, a UMD script that defines the global {@code echarts}. */
    static String echarts() {
        return resource(echartsPath("dist/echarts.min.js"));
    }

    /**
     * three.js's CommonJS build, run inside a function that gives it an {@code exports} object and
     * returns it as the global {@code THREE}; then the orbit control, its {@code import {…} from
     * 'three'} line turned into {@code const {…} = THREE;} and its export into a global
     * {@code OrbitControls}.
     */
    static String threeScripts() {
        String core = "var THREE = (function () {\nvar exports = {};\nvar module = {exports: exports};\n"
                + resource(threePath("build/three.cjs")) + "\nreturn exports;\n})();\n";
        String orbit = resource(threePath("examples/jsm/controls/OrbitControls.js"));
        Matcher im = IMPORT.matcher(orbit);
        if (!im.find()) {
            throw new IllegalStateException("OrbitControls.js of three.js " + THREE_VERSION + " has no import line");
        }
        orbit = orbit.substring(0, im.start()) + "const {" + im.group(1) + "} = THREE;" + orbit.substring(im.end());
        Matcher ex = EXPORT.matcher(orbit);
        if (!ex.find()) {
            throw new IllegalStateException("OrbitControls.js of three.js " + THREE_VERSION + " has no export line");
        }
        orbit = orbit.substring(0, ex.start()) + "window.OrbitControls = OrbitControls;" + orbit.substring(ex.end());
        return core + "</script>\n<script>\n(function () {\n" + orbit + "\n})();\n";
    }

    /** The licence texts, as one HTML fragment of collapsible blocks. */
    static String licencesHtml(boolean withThree) {
        StringBuilder b = new StringBuilder();
        b.append(block("Apache ECharts " + ECHARTS_VERSION + " (Apache License 2.0)",
                resource(echartsPath("LICENSE")) + "\n\n" + resource(echartsPath("NOTICE")) + "\n\n"
                + resource(echartsPath("licenses/LICENSE-d3"))));
        if (withThree) {
            b.append(block("three.js " + THREE_VERSION + " (MIT License)", resource(threePath("LICENSE"))));
        }
        return b.toString();
    }

    private static String block(String title, String text) {
        return "<details class=\"licence\"><summary>" + Html.esc(title) + "</summary><pre>" + Html.esc(text)
                + "</pre></details>\n";
    }
}
