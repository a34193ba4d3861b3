package org.exitance.report.html;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.exitance.geometry.Scene;
import org.exitance.result.LoadCaseResult;

/**
 * The 3-D view of a geometry case: an interactive three.js view (rotate, zoom, pan, pick a
 * surface) coloured by temperature or net flux with a colour bar, and still pictures rendered in
 * the page by the same library when it opens (shown instead of the interactive view when
 * printing). A solve shows its load cases (a list chooses one; each on its own scale) and four
 * viewpoints; a transient run its output instants (a slider steps through them, on one scale over
 * the run) and the oblique view at some instants. The markup is here; the drawing is the page's
 * script.
 */
final class ModelSection {
    private ModelSection() {
    }

    /** The view of a solve's load cases. */
    static void write(Page page, Scene scene, List<LoadCaseResult> results) {
        StringBuilder b = new StringBuilder();
        if (results.size() > 1) {
            b.append("<label>Load case: <select id=\"loadcase-select\">");
            for (int i = 0; i < results.size(); i++) {
                b.append("<option value=\"").append(i).append("\">").append(Html.esc(results.get(i).name()))
                        .append("</option>");
            }
            b.append("</select></label>\n");
        }
        write(page, scene, ModelData.of(scene, results), "", b.toString(),
                "Rendered by the page when it opens, from four viewpoints (z up), in the quantity chosen above;"
                        + " printing shows these instead of the interactive view.");
    }

    /**
     * The view of a transient's instants.
     *
     * @param data      the view's data ({@link ModelData#ofRun})
     * @param instants  the markup of the instant control, above the view
     */
    static void writeRun(Page page, Scene scene, ObjectNode data, String instants) {
        write(page, scene, data, instants, "",
                "The oblique view at some of the instants (z up), in the quantity chosen above and on the scale of the"
                        + " whole run, rendered by the page when it opens; printing shows these instead of the"
                        + " interactive view.");
    }

    private static void write(Page page, Scene scene, ObjectNode data, String above, String choices, String stills) {
        page.needThree();
        page.data.set("model", data);
        Html h = page.section("model", "3-D view of the model");
        StringBuilder b = new StringBuilder(above);
        b.append("<div class=\"controls\">\n<span>Colour by:</span>\n"
                + "<label><input type=\"radio\" name=\"quantity\" value=\"temperature\" checked> temperature (K)</label>\n"
                + "<label><input type=\"radio\" name=\"quantity\" value=\"flux\"> net radiative flux (W/m²)</label>\n");
        b.append(choices);
        b.append("<label>Surface: <select id=\"pick-select\"><option value=\"-1\">(click the model, or choose)</option>");
        for (int s = 0; s < scene.surfaceCount(); s++) {
            b.append("<option value=\"").append(s).append("\">").append(Html.esc(scene.surfaces().get(s).name()))
                    .append("</option>");
        }
        b.append("</select></label>\n<button type=\"button\" id=\"view-reset\">Reset view</button>\n</div>\n");
        b.append("<div class=\"viewer\">\n<canvas class=\"view3d\" id=\"view3d\" width=\"760\" height=\"520\""
                + " aria-label=\"Interactive 3-D view of the model\"></canvas>\n"
                + "<div class=\"legend\"><canvas id=\"colorbar\" width=\"130\" height=\"520\""
                + " aria-label=\"Colour bar\"></canvas></div>\n"
                + "<div class=\"pick\" id=\"pick\" aria-live=\"polite\"><p><strong>Picked surface</strong></p>"
                + "<dl id=\"pick-values\"><dt>none yet</dt><dd>click a surface</dd></dl></div>\n</div>\n"
                + "<p class=\"note\" id=\"colorbar-label\"></p>\n");
        h.raw(b.toString());
        h.p("note", "Drag to rotate, scroll to zoom, right-drag to pan; click a facet to read its surface's values."
                + " Each facet is seen from the side it radiates into, so the walls nearest the viewer of a closed"
                + " enclosure drop away and its inside shows. Colours: viridis, from the lowest value of the scale (dark"
                + " violet) to the highest (yellow); facet outlines in grey, the picked surface outlined in crimson.");
        h.h3("Still pictures");
        h.p("note", stills);
        h.raw("<div class=\"stills\" id=\"stills\"></div>\n");
        h.endSection();
    }
}
