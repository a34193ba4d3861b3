package org.exitance.report.html;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.exitance.report.Numbers;
import org.exitance.report.Viridis;
import org.exitance.report.html.Html.Cell;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;

/**
 * The transient report (docs/report.md, "The transient report"): the case summary with the
 * caution; temperature, heater power and net radiative heat against time (line charts, a series
 * per surface, the shown nodes selected); the model at the output instants (the 3-D view of a
 * geometry case, else a table of the surfaces), coloured by temperature on one scale over the
 * whole run, stepped through by a slider; the events, energy account and periods as tables.
 * Reads the run; computes no physics.
 */
final class TransientReport {
    /** Still pictures of a geometry case: at most this many instants, spread over the run. */
    static final int STILLS = 6;

    private TransientReport() {
    }

    static String write(ReportCase c, TransientResult r) {
        Page page = new Page("Transient report", c.title().isEmpty() ? c.file() : c.title(), c.file());
        List<Sample> samples = r.samples();
        double end = samples.get(samples.size() - 1).timeS();
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(HtmlReport.row("Surfaces", r.surfaces().size() + " (" + r.extremes().size()
                + " with an unknown temperature)"));
        rows.add(HtmlReport.row("Bands", r.bands()));
        if (c.scene() != null) {
            rows.add(HtmlReport.row("Geometry", c.scene().surfaceCount() + " surfaces, " + c.scene().facetCount()
                    + " facets"));
        }
        rows.add(HtmlReport.row("Integration", "variable-step BDF2, " + (Double.isNaN(r.toleranceK()) ? "fixed steps"
                : "local error per step at most " + Numbers.small(r.toleranceK()) + " K") + " (docs/transient.md)"));
        rows.add(HtmlReport.row("Run", "0 s to " + fmt("%.6g", end) + " s; " + r.steps().accepted() + " steps accepted, "
                + r.steps().rejected() + " rejected, from " + fmt("%.3g", r.steps().smallestS()) + " s to "
                + fmt("%.3g", r.steps().largestS()) + " s"));
        rows.add(HtmlReport.row("Output instants", samples.size() + ", shown nodes: " + String.join(", ", r.shown())));
        HtmlReport.summary(page, c, rows);

        List<String> names = new ArrayList<>();
        samples.forEach(x -> names.add(instant(x.timeS(), end)));
        int first = samples.size() - 1;
        double[] range = range(r);
        ObjectNode time = page.data.putObject("time");
        time.put("first", first);
        ArrayNode instants = time.putArray("instants");
        names.forEach(instants::add);
        time.putArray("rangeK").add(range[0]).add(range[1]);
        ArrayNode surfaces = time.putArray("surfaces");
        r.surfaces().forEach(surfaces::add);
        ArrayNode t = time.putArray("temperatureK");
        ArrayNode q = time.putArray("netRadiationW");
        ArrayNode p = time.putArray("heaterW");
        for (Sample x : samples) {
            put(t.addArray(), x.temperatureK());
            put(q.addArray(), x.radiationW());
            put(p.addArray(), x.heaterW());
        }

        TransientTables.histories(page, r, end);
        String control = control(names, first);
        if (c.scene() != null) {
            ModelSection.writeRun(page, c.scene(), ModelData.ofRun(c.scene(), r, names, first, stills(samples.size())),
                    control);
        } else {
            nodes(page, r, control, first, range);
        }
        TransientTables.events(page, r);
        TransientTables.energy(page, r);
        return page.render();
    }

    /** An instant's name: its time in s, and in h for a run over two hours. */
    static String instant(double timeS, double endS) {
        return "t = " + fmt("%.6g", timeS) + " s" + (endS > 7200 ? " (" + fmt("%.4g", timeS / 3600) + " h)" : "");
    }

    /**
     * The colour scale of the run (K): the lowest and highest temperature of any surface at any
     * output instant, widened by 0.5 % (at least 0.5 K) each way when they are equal.
     */
    static double[] range(TransientResult r) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Sample x : r.samples()) {
            for (double v : x.temperatureK()) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        if (!(hi > lo)) {
            double pad = Math.max(Math.abs(lo) * 0.005, 0.5);
            return new double[] {lo - pad, hi + pad};
        }
        return new double[] {lo, hi};
    }

    /** The instants of the still pictures: at most {@link #STILLS}, evenly spread from the first to the last. */
    static int[] stills(int instants) {
        int n = Math.min(STILLS, instants);
        int[] out = new int[n];
        for (int k = 0; k < n; k++) {
            out[k] = n == 1 ? 0 : (int) Math.round(k * (instants - 1) / (double) (n - 1));
        }
        return out;
    }

    /** The slider and buttons that step through the instants. */
    private static String control(List<String> names, int first) {
        return "<div class=\"controls instants\">\n<span>Instant:</span>\n"
                + "<button type=\"button\" id=\"instant-first\">First</button>\n"
                + "<button type=\"button\" id=\"instant-prev\">Previous</button>\n"
                + "<input type=\"range\" id=\"instant\" min=\"0\" max=\"" + (names.size() - 1) + "\" step=\"1\" value=\""
                + first + "\" aria-label=\"Output instant\">\n"
                + "<button type=\"button\" id=\"instant-next\">Next</button>\n"
                + "<button type=\"button\" id=\"instant-last\">Last</button>\n"
                + "<output id=\"instant-label\">" + Html.esc(names.get(first)) + "</output>\n</div>\n";
    }

    /**
     * A case without geometry: each surface at the chosen instant, with a swatch of its
     * temperature's colour; written at the first instant shown, so that it reads without scripts.
     */
    private static void nodes(Page page, TransientResult r, String control, int first, double[] range) {
        Html h = page.section("model", "Surfaces at the output instants");
        h.p("This case gives its view factors as a matrix, so it has no geometry to draw: the table shows each"
                + " surface at the instant chosen, its colour on one viridis scale over the whole run (dark violet the"
                + " lowest temperature, yellow the highest), so that colours compare across instants.");
        h.raw(control);
        h.raw("<div class=\"viewer\">\n");
        Sample x = r.samples().get(first);
        StringBuilder b = new StringBuilder("<table id=\"instant-nodes\" class=\"instant-nodes\" data-instant=\""
                + first + "\">\n<caption>Surfaces at the instant chosen</caption>\n<thead><tr><th scope=\"col\">Surface"
                + "</th><th scope=\"col\">Colour</th><th scope=\"col\">Temperature, K</th><th scope=\"col\">Net"
                + " radiative heat, W</th><th scope=\"col\">Heater, W</th></tr></thead>\n<tbody>\n");
        for (int i = 0; i < r.surfaces().size(); i++) {
            java.awt.Color col = Viridis.at((x.temperatureK()[i] - range[0]) / (range[1] - range[0]));
            b.append("<tr data-key=\"").append(Html.esc(r.surfaces().get(i))).append("\" data-index=\"").append(i)
                    .append("\"><th scope=\"row\">").append(Html.esc(r.surfaces().get(i)))
                    .append("</th><td><span class=\"swatch\" style=\"background-color: ")
                    .append(String.format(Locale.ROOT, "#%06x", col.getRGB() & 0xffffff)).append("\"></span></td>")
                    .append("<td class=\"num t-k\">").append(Numbers.temperature(x.temperatureK()[i]))
                    .append("</td><td class=\"num q-w\">").append(Numbers.power(x.radiationW()[i]))
                    .append("</td><td class=\"num h-w\">").append(Numbers.power(x.heaterW()[i])).append("</td></tr>\n");
        }
        h.raw(b.append("</tbody></table>\n").toString());
        h.raw("<div class=\"legend\"><canvas id=\"node-colorbar\" width=\"130\" height=\"320\""
                + " aria-label=\"Colour bar\"></canvas></div>\n</div>\n");
        h.p("note", "Scale: " + Numbers.temperature(range[0]) + " K to " + Numbers.temperature(range[1]) + " K."
                + " Net radiative heat is positive where the surface loses heat.");
        h.endSection();
    }

    private static void put(ArrayNode a, double[] v) {
        for (double x : v) {
            a.add(x);
        }
    }

    static String fmt(String f, double v) {
        return String.format(Locale.ROOT, f, v);
    }
}
