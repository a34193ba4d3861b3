package org.exitance.report.html;

import java.util.List;
import org.exitance.geometry.Scene;
import org.exitance.result.LoadCaseResult;

/**
 * The 3-D view of a geometry case: an interactive three.js view (rotate, zoom, pan, pick a
 * surface) coloured by temperature or net flux with a colour bar, and still pictures from four
 * viewpoints, rendered in the page by the same library when it opens (shown instead of the
 * interactive view when printing). The markup is here; the drawing is the page's script.
 */
final class ModelSection {
    private ModelSection() {
    }

    static void write(Page page, Scene scene, List<LoadCaseResult> results) {
        page.needThree();
        page.data.set("model", ModelData.of(scene, results));
        Html h = page.section("model", "3-D view of the model");
        StringBuilder b = new StringBuilder();
        b.append("<div class=\"controls\">\n<span>Colour by:</span>\n"
                + "<label><input type=\"radio\" name=\"quantity\" value=\"temperature\" checked> temperature (K)</label>\n"
                + "<label><input type=\"radio\" name=\"quantity\" value=\"flux\"> net radiative flux (W/m²)</label>\n");
        if (results.size() > 1) {
            b.append("<label>Load case: <select id=\"loadcase-select\">");
            for (int i = 0; i < results.size(); i++) {
                b.append("<option value=\"").append(i).append("\">").append(Html.esc(results.get(i).name()))
                        .append("</option>");
            }
            b.append("</select></label>\n");
        }
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
                + " enclosure drop away and its inside shows. Colours: viridis, from the lowest value shown (dark"
                + " violet) to the highest (yellow); facet outlines in grey, the picked surface outlined in crimson.");
        h.h3("Still pictures");
        h.p("note", "Rendered by the page when it opens, from four viewpoints (z up), in the quantity chosen above;"
                + " printing shows these instead of the interactive view.");
        h.raw("<div class=\"stills\" id=\"stills\"></div>\n");
        h.endSection();
    }
}
