package org.exitance.report.html;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleBiFunction;
import org.exitance.report.Numbers;
import org.exitance.report.html.Html.Cell;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;

/**
 * The sections of the transient report that hold its numbers: the histories (line charts and
 * the table of the output instants), the events and the energy account with the periods. Every
 * number is the one the JSON output holds, rounded as the text table rounds it.
 */
final class TransientTables {
    private TransientTables() {
    }

    /** Temperature, heater power and net radiative heat against time, and the table of the instants. */
    static void histories(Page page, TransientResult r, double endS) {
        Html h = page.section("histories", "Temperatures and heats against time");
        h.p("note", "One line per surface; the legend turns lines on and off (the shown nodes of the case are on)."
                + " Each output instant carries a mark; the dashed crimson line is the instant the model below shows,"
                + " and a click on a mark shows that instant there.");
        boolean hours = endS > 7200;
        List<Sample> samples = r.samples();
        chart(page, h, "chart-temperature", "Temperature against time", "Temperature, K", "temperature", r, hours,
                (x, i) -> x.temperatureK()[i], false);
        boolean heaters = false;
        for (Sample x : samples) {
            for (double w : x.heaterW()) {
                heaters |= w != 0;
            }
        }
        if (heaters) {
            ObjectNode c = chart(page, h, "chart-heater", "Heater power against time", "Heater power, W", "power", r,
                    hours, (x, i) -> x.heaterW()[i], true);
            ArrayNode bands = c.putArray("bands");
            for (double[] on : onIntervals(r, endS)) {
                bands.addObject().put("from", hours ? on[0] / 3600 : on[0]).put("to", hours ? on[1] / 3600 : on[1]);
            }
            if (!r.switches().isEmpty()) {
                h.p("note", "Shaded: a thermostat's heater is on (from its switch times, listed under Events). The lines"
                        + " join the output instants, so a switch between two instants shows only in the shading.");
            }
        } else {
            h.p("note", "No surface is heated (no dissipation at any output instant): no heater chart.");
        }
        chart(page, h, "chart-radiation", "Net radiative heat against time (positive: the surface loses heat)",
                "Net radiative heat, W", "power", r, hours, (x, i) -> x.radiationW()[i], false);

        List<String> head = new ArrayList<>(List.of("Time, s", "Time, h"));
        r.shown().forEach(s -> head.add(s + ", K"));
        head.add("Stored, MJ");
        head.add("Drift, J");
        List<List<Cell>> rows = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        for (int k = 0; k < samples.size(); k++) {
            Sample x = samples.get(k);
            List<Cell> row = new ArrayList<>(List.of(Cell.text(fmt("%.6g", x.timeS())),
                    Cell.number(fmt("%.4f", x.timeS() / 3600), "time-h")));
            for (String s : r.shown()) {
                int i = r.indexOf(s);
                row.add(Cell.number(Numbers.temperature(x.temperatureK()[i]), "t-k n" + i));
            }
            row.add(Cell.number(fmt("%.6g", x.storedJ() / 1e6), "stored-mj"));
            row.add(Cell.number(fmt("%.3g", driftJ(r, x)), "drift-j"));
            rows.add(row);
            keys.add(Integer.toString(k));
        }
        ResultSections.fold(h, rows.size(), "the " + rows.size() + " output instants", () -> h.table(
                "class=\"instants\"", "At the output instants (drift: stored change − (supplied − lost) since the start)",
                head, rows, keys));
        h.endSection();
    }

    /** The drift of the energy account at an instant (J), as the JSON output gives it. */
    static double driftJ(TransientResult r, Sample x) {
        return x.storedJ() - r.energy().storedStartJ() - (x.suppliedJ() - x.lostJ());
    }

    /**
     * The intervals (s) in which a thermostat's heater is on, from the switches: before a heater's
     * first switch its state is the opposite of that switch. A heater that never switched is not
     * in the list (its state is not recorded).
     */
    static List<double[]> onIntervals(TransientResult r, double endS) {
        List<double[]> out = new ArrayList<>();
        java.util.Map<String, Double> onSince = new java.util.LinkedHashMap<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (TransientResult.Switch s : r.switches()) {
            if (seen.add(s.heater()) && !s.on()) {
                onSince.put(s.heater(), 0.0);
            }
            Double since = onSince.remove(s.heater());
            if (s.on()) {
                onSince.put(s.heater(), s.timeS());
            } else if (since != null) {
                out.add(new double[] {since, s.timeS()});
            }
        }
        onSince.values().forEach(since -> out.add(new double[] {since, endS}));
        return out;
    }

    private static ObjectNode chart(Page page, Html h, String id, String title, String yName, String format,
                              TransientResult r, boolean hours, ToDoubleBiFunction<Sample, Integer> value,
                              boolean heatedOnly) {
        ObjectNode c = page.charts.addObject();
        c.put("kind", "lines");
        c.put("id", id);
        c.put("title", title);
        c.put("xName", hours ? "Time, h" : "Time, s");
        c.put("yName", yName);
        c.put("format", format);
        ArrayNode x = c.putArray("x");
        r.samples().forEach(s -> x.add(hours ? s.timeS() / 3600 : s.timeS()));
        ArrayNode series = c.putArray("series");
        for (int i = 0; i < r.surfaces().size(); i++) {
            int surface = i;
            if (heatedOnly && r.samples().stream().allMatch(s -> value.applyAsDouble(s, surface) == 0)) {
                continue;
            }
            ObjectNode o = series.addObject();
            o.put("name", r.surfaces().get(i));
            o.put("shown", heatedOnly || r.shown().contains(r.surfaces().get(i)));
            ArrayNode v = o.putArray("values");
            r.samples().forEach(s -> v.add(value.applyAsDouble(s, surface)));
        }
        h.raw("<div class=\"chart\" id=\"" + Html.esc(id) + "\" role=\"img\" aria-label=\"" + Html.esc(title)
                + "\"></div>\n");
        return c;
    }

    /** Targets, extremes and thermostat switches. */
    static void events(Page page, TransientResult r) {
        Html h = page.section("events", "Events");
        if (!r.targets().isEmpty()) {
            List<List<Cell>> rows = new ArrayList<>();
            for (TransientResult.TargetTime g : r.targets()) {
                boolean reached = !Double.isNaN(g.timeS());
                rows.add(List.of(Cell.text(g.surface()), Cell.number(Numbers.temperature(g.targetK()), "target-k"),
                        reached ? Cell.number(fmt("%.6g", g.timeS()), "time-s") : Cell.text("not within the run"),
                        reached ? Cell.number(fmt("%.4g", g.timeS() / 3600), "time-h") : Cell.text("")));
            }
            h.table("class=\"targets\"", "Time to reach a target (first crossing, linear within the step)",
                    List.of("Node", "Target, K", "Reached at, s", "Reached at, h"), rows, null);
        }
        List<List<Cell>> rows = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        for (TransientResult.Extremes e : r.extremes()) {
            rows.add(List.of(Cell.text(e.surface()), Cell.number(Numbers.temperature(e.minK()), "min-k"),
                    Cell.number(fmt("%.6g", e.minTimeS()), "min-s"), Cell.number(Numbers.temperature(e.maxK()), "max-k"),
                    Cell.number(fmt("%.6g", e.maxTimeS()), "max-s")));
            keys.add(e.surface());
        }
        h.table("class=\"extremes\"", "Lowest and highest temperature of each node (at the steps)",
                List.of("Node", "Lowest, K", "at, s", "Highest, K", "at, s"), rows, keys);
        if (r.switches().isEmpty()) {
            h.p("No thermostat switched.");
        } else {
            List<List<Cell>> sw = new ArrayList<>();
            for (TransientResult.Switch s : r.switches()) {
                sw.add(List.of(Cell.text(s.heater()), Cell.number(fmt("%.6g", s.timeS()), "time-s"),
                        Cell.text(s.on() ? "on" : "off")));
            }
            ResultSections.fold(h, sw.size(), "the " + sw.size() + " thermostat switches", () -> h.table(
                    "class=\"switches\"", "Thermostat switches", List.of("Heater", "At, s", "Switched"), sw, null));
        }
        h.endSection();
    }

    /** The energy account with its drift, and the periods of a periodic run. */
    static void energy(Page page, TransientResult r) {
        Html h = page.section("energy", "Energy account");
        TransientResult.Energy e = r.energy();
        List<List<Cell>> rows = List.of(
                energyRow("Stored at the start", e.storedStartJ()),
                energyRow("Stored at the end", e.storedEndJ()),
                energyRow("Stored change", e.storedEndJ() - e.storedStartJ()),
                energyRow("Supplied", e.suppliedJ()),
                energyRow("Lost", e.lostJ()),
                List.of(Cell.text("Drift: stored change − (supplied − lost)"), Cell.number(fmt("%.3g", e.driftJ() / 1e6),
                        "mj"), Cell.number(fmt("%.3g", e.driftJ()), "j")),
                List.of(Cell.text("Drift relative to the largest of them"), Cell.text(""),
                        Cell.number(fmt("%.2g", e.driftRelative()), "ratio")));
        h.table("class=\"energy\"", "The run's energy account (stored heat counted from 0 K)",
                List.of("Item", "MJ", "J"), rows, List.of("storedStart", "storedEnd", "storedChange", "supplied", "lost",
                        "drift", "driftRelative"));
        h.p("note", "Supplied and lost are the integrator's trapezoidal sums over the steps; the drift is what they leave"
                + " unexplained (docs/transient.md, \"Events and output\").");
        if (!r.cycles().isEmpty()) {
            h.h3("Periods");
            List<List<Cell>> cy = new ArrayList<>();
            List<String> keys = new ArrayList<>();
            for (TransientResult.Cycle c : r.cycles()) {
                cy.add(List.of(Cell.text(Integer.toString(c.number())), Cell.number(fmt("%.6g", c.startS()), "start-s"),
                        Cell.number(fmt("%.6g", c.endS()), "end-s"), Cell.number(fmt("%.6g", c.suppliedJ() / 1e6), "supplied-mj"),
                        Cell.number(fmt("%.6g", c.lostJ() / 1e6), "lost-mj"),
                        Cell.number(fmt("%.4g", c.storedChangeJ() / 1e6), "stored-mj"),
                        Cell.number(fmt("%.3g", c.maxChangeK()), "change-k")));
                keys.add(Integer.toString(c.number()));
            }
            h.table("class=\"periods\"", "Periods (change: largest temperature difference from one period earlier)",
                    List.of("Period", "From, s", "To, s", "Supplied, MJ", "Lost, MJ", "Stored change, MJ", "Change, K"),
                    cy, keys);
            h.p(r.repeated() ? "The run repeats after " + r.cycles().size() + " periods."
                    : "The run did not repeat within " + r.cycles().size() + " periods.");
        }
        h.endSection();
    }

    private static List<Cell> energyRow(String item, double joules) {
        return List.of(Cell.text(item), Cell.number(fmt("%.6g", joules / 1e6), "mj"), Cell.number(Numbers.power(joules), "j"));
    }

    private static String fmt(String f, double v) {
        return TransientReport.fmt(f, v);
    }
}
