package org.exitance.report.html;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import org.exitance.report.Caution;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.Version;

/**
 * One report page being assembled: its sections (each listed in the table of contents), the
 * data its script reads, and which libraries it needs. {@link #render()} fills the page template
 * (resource page.html) with them, the style sheet, the inlined libraries and the glue script.
 */
final class Page {
    private static final String RESOURCES = "/org/exitance/report/html/";
    /** The page's script, in this order, run as one function (report.js holds run()). */
    private static final String[] SCRIPTS = {"report.js", "report-charts.js", "report-model.js", "report-time.js"};

    final Html body = new Html();
    final ObjectNode data = JsonNodeFactory.instance.objectNode();
    final ArrayNode charts = data.putArray("charts");
    private final List<String[]> toc = new ArrayList<>();
    private final String kind;
    private final String heading;
    private final String meta;
    private boolean three;
    private String label = "";

    /**
     * @param kind    what the report is, e.g. "Solve report"
     * @param heading the page heading (the case title or file)
     * @param meta    a line under it (the file)
     */
    Page(String kind, String heading, String meta) {
        this.kind = kind;
        this.heading = heading;
        this.meta = meta;
        body.raw("<p id=\"script-problem\" class=\"warning\" hidden></p>\n"
                + "<noscript><p class=\"warning\">Scripts are off: the tables and plots below are complete; the"
                + " charts and the 3-D view need scripts.</p></noscript>\n");
    }

    /** Opens a section and lists it in the table of contents. */
    Html section(String id, String title) {
        toc.add(new String[] {id, title});
        return body.section(id, title);
    }

    /**
     * Marks the page as built on invented data when the case's title or notes say so (the demo
     * cases do): a label under the heading.
     */
    void inventedLabel(String title, String notes) {
        if ((title + " " + notes).toLowerCase(java.util.Locale.ROOT).contains("invented")) {
            label = "<p class=\"invented\">Invented data: the case says its data are invented, for illustration;"
                    + " they are not measurements.</p>";
        }
    }

    /** The page also needs three.js (a 3-D view). */
    void needThree() {
        three = true;
    }

    /** The caution box, with the project's caution and the limits of the model. */
    void caution() {
        body.raw("<div class=\"caution\" role=\"note\"><strong>Caution</strong>" + Html.esc(Caution.SHORT)
                + "<br>The results are as good as the inputs: spectral property data, temperatures and the view factors"
                + " of the model. Furnaces, hot surfaces and flight hardware: follow the local codes, standards and"
                + " licensed practice that apply; this report does not replace them.</div>\n");
    }

    /** The libraries section: which libraries the page carries, and their licences. */
    private void libraries() {
        section("libraries", "Libraries and licences");
        body.p("The charts are drawn by Apache ECharts " + Libraries.ECHARTS_VERSION
                + (three ? " and the 3-D view by three.js " + Libraries.THREE_VERSION : "")
                + ", both carried inside this page. The spectral and audit plots were drawn when the report was written,"
                + " with JFreeChart and JFreeSVG, as inline SVG. Colour scale: viridis (perceptually uniform, readable in"
                + " grey and by colour-blind readers); bar series also carry patterns.");
        body.raw(Libraries.licencesHtml(three));
        body.endSection();
    }

    /** The whole page as HTML text. */
    String render() {
        libraries();
        StringBuilder tocHtml = new StringBuilder();
        for (String[] t : toc) {
            tocHtml.append("<li><a href=\"#").append(Html.esc(t[0])).append("\">").append(Html.esc(t[1]))
                    .append("</a></li>\n");
        }
        String json;
        try {
            json = SolveJsonWriter.MAPPER.writeValueAsString(data);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("report data: " + e.getOriginalMessage(), e);
        }
        // inside a script element: no "</" or "<!--" may appear in the text
        json = json.replace("</", "<\\/").replace("<!--", "<\\u0021--");
        String libs = Libraries.echarts() + (three ? "\n</script>\n<script>\n" + Libraries.threeScripts() : "");
        String page = Libraries.resource(RESOURCES + "page.html");
        return fill(page, new String[][] {
            {"@VERSION@", Html.esc(Version.get())},
            {"@TITLE@", Html.esc(kind + " — " + heading)},
            {"@KIND@", Html.esc(kind)},
            {"@HEADING@", Html.esc(heading)},
            {"@META@", Html.esc(meta)},
            {"@LABEL@", label},
            {"@STYLE@", Libraries.resource(RESOURCES + "report.css")},
            {"@TOC@", tocHtml.toString()},
            {"@BODY@", body.toString()},
            {"@DATA@", json},
            {"@LIBRARIES@", libs},
            {"@GLUE@", glue()},
        });
    }

    /** The page's script files joined into one function scope, ending with the call of run(). */
    private static String glue() {
        StringBuilder b = new StringBuilder("(function () {\n'use strict';\n");
        for (String s : SCRIPTS) {
            b.append(Libraries.resource(RESOURCES + s)).append('\n');
        }
        return b.append("run();\n})();").toString();
    }

    /** Replaces each marker once, in one pass, so that no inserted text is searched again. */
    private static String fill(String template, String[][] pairs) {
        StringBuilder out = new StringBuilder(template.length() + (4 << 20));
        int at = 0;
        while (true) {
            int next = -1;
            String[] which = null;
            for (String[] p : pairs) {
                int i = template.indexOf(p[0], at);
                if (i >= 0 && (next < 0 || i < next)) {
                    next = i;
                    which = p;
                }
            }
            if (which == null) {
                out.append(template, at, template.length());
                return out.toString();
            }
            out.append(template, at, next).append(which[1]);
            at = next + which[0].length();
        }
    }
}
