package org.exitance.report.html;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.exitance.model.Band;
import org.exitance.report.Numbers;
import org.exitance.report.SolveTableWriter;
import org.exitance.result.EnvironmentResult;
import org.exitance.result.FacePairResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SourceResult;
import org.exitance.result.SurfaceResult;
import org.exitance.report.html.Html.Cell;

/**
 * The sections of a solve's results: surface tables, energy balance and solver diagnostics, the
 * band set and the per-band heat flows (a table, and a bar chart drawn by ECharts from the data
 * added to {@code charts}). Numbers are formatted as in the text tables ({@link Numbers}).
 */
final class ResultSections {
    private ResultSections() {
    }

    /** A band as "lower–upper" in µm. */
    static String band(Band b) {
        return Numbers.wavelength(b.lowerUm()) + "–" + Numbers.wavelength(b.upperUm());
    }

    /** The results table of one solve, and what goes with it. */
    static void results(Html h, String key, SolveResult r) {
        List<List<Cell>> rows = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        for (SurfaceResult s : r.surfaces()) {
            rows.add(List.of(Cell.text(s.name()), Cell.number(Numbers.area(s.areaM2()), "area"),
                    Cell.text(s.boundary() + (s.temperatureSolved() ? " → T solved" : "")),
                    Cell.number(Numbers.temperature(s.temperatureK()), "t-k"),
                    Cell.number(Numbers.temperature(s.temperatureK() - 273.15), "t-c"),
                    Cell.number(Numbers.power(s.netHeatW()), "q-w"),
                    Cell.number(Numbers.power(s.netFluxWPerM2()), "flux"),
                    Cell.number(Numbers.power(s.heatSuppliedW()), "supplied")));
            keys.add(s.name());
        }
        h.table("class=\"results\" data-load-case=\"" + Html.esc(key) + "\"", "Surfaces" + label(key),
                List.of("Surface", "Area, m²", "Condition", "T, K", "T, °C", "Net heat, W", "Net flux, W/m²",
                        "Heat supplied, W"), rows, keys);
        h.p("note", "Net heat: radiation leaving the surface minus radiation it absorbs; positive when the surface"
                + " loses heat. Heat supplied: radiation + convection + conduction, what must be put in to hold the"
                + " surface in this state.");
        if (r.surfaces().stream().anyMatch(s -> s.convectionW() != 0 || s.conductionW() != 0)) {
            List<List<Cell>> paths = new ArrayList<>();
            for (SurfaceResult s : r.surfaces()) {
                paths.add(List.of(Cell.text(s.name()), Cell.number(Numbers.power(s.netHeatW()), ""),
                        Cell.number(Numbers.power(s.convectionW()), ""), Cell.number(Numbers.power(s.conductionW()), ""),
                        Cell.number(Numbers.power(s.heatSuppliedW()), "")));
            }
            h.table("class=\"paths\"", "Heat leaving each surface by path" + label(key),
                    List.of("Surface", "Radiation, W", "Convection, W", "Conduction, W", "Supplied, W"), paths, null);
        }
        List<String> lines = new ArrayList<>();
        for (FacePairResult w : r.facePairs()) {
            lines.add((w.window() ? "Window " : "Two-sided plate ") + w.face() + " + " + w.otherFace()
                    + ": one temperature " + Numbers.temperature(w.temperatureK()) + " K; net heat of the pair "
                    + Numbers.power(w.netHeatW()) + " W; heat supplied " + Numbers.power(w.heatSuppliedW()) + " W.");
        }
        for (SourceResult s : r.sources()) {
            lines.add("Source " + s.name() + " (" + s.spectrum() + "): " + Numbers.power(s.incidentW()) + " W arrives, "
                    + Numbers.power(s.absorbedW()) + " W is absorbed where it lands, the rest is reflected.");
        }
        EnvironmentResult env = r.environment();
        if (env != null) {
            lines.add("Environment " + env.name() + " at " + Numbers.temperature(env.temperatureK())
                    + " K: net heat into the enclosure " + Numbers.power(env.netHeatW()) + " W.");
        }
        if (!r.facets().isEmpty()) {
            lines.add("Solved on " + r.facets().size() + " facets; a surface's temperature above is the area-weighted"
                    + " mean of its facets' (the 3-D view shows each facet).");
        }
        h.list(lines);
    }

    /** Energy balance and solver diagnostics of one solve, as a two-column table. */
    static void balance(Html h, String key, SolveResult r) {
        double rel = r.relativeEnergyBalance();
        var s = r.solver();
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(row("Σ net heat" + (r.environment() != null ? " (surfaces + environment)" : "")
                + (r.sources().isEmpty() ? "" : " + source power"), Numbers.small(r.energyBalanceW()) + " W"));
        rows.add(row("Heat crossing the enclosure", Numbers.power(r.crossingHeatW()) + " W"));
        rows.add(row("Imbalance, relative", Numbers.small(rel)));
        rows.add(row("Verdict", rel <= SolveTableWriter.BALANCE_WARNING ? "closes (within 1e-6)"
                : r.atRoundingFloor() ? "closes at the rounding floor (within 1e-9 of the power in play)"
                : "does not close: check view-factor closure and reciprocity"));
        rows.add(row("Power in play (Σ A·J over bands, environment, sources)", Numbers.power(r.energyScaleW()) + " W"));
        rows.add(row("Linear solver", s.linearSolver() + (s.strategy().isEmpty() ? "" : " (" + s.strategy() + ")")));
        rows.add(row("Newton iterations", Integer.toString(s.newtonIterations())));
        rows.add(row("Property updates", Integer.toString(s.propertyIterations())));
        rows.add(row("Heat residual", Numbers.small(s.residualW()) + " W"));
        rows.add(row("Largest linear residual", Numbers.small(s.maxLinearResidual())));
        if (s.bandIterations().length > 0) {
            rows.add(row("Most band-solve iterations", Integer.toString(Arrays.stream(s.bandIterations()).max().orElse(0))));
        }
        h.table("class=\"balance\" data-load-case=\"" + Html.esc(key) + "\"", "Energy balance and solver" + label(key),
                List.of("Quantity", "Value"), rows, null);
    }

    private static List<Cell> row(String what, String value) {
        return List.of(Cell.text(what), Cell.number(value, ""));
    }

    /** Tables longer than this are folded into a {@code <details>} element. */
    private static final int FOLD_ROWS = 16;
    /** Above this many surfaces the per-band table has a row per surface instead of a row per band. */
    private static final int SURFACE_COLUMNS = 10;

    /** The band set: one row per band with its edges. */
    static void bands(Html h, SolveResult r) {
        List<List<Cell>> rows = new ArrayList<>();
        for (int k = 0; k < r.bands().size(); k++) {
            Band b = r.bands().get(k);
            rows.add(List.of(Cell.text(Integer.toString(k + 1)), Cell.number(Numbers.wavelength(b.lowerUm()), ""),
                    Cell.number(Numbers.wavelength(b.upperUm()), "")));
        }
        h.p(r.bands().size() + " band" + (r.bands().size() == 1 ? " (the gray solution)" : "s")
                + "; chosen by: " + r.bandOrigin() + ".");
        fold(h, rows.size(), "the " + rows.size() + " bands", () -> h.table("class=\"bands\"", "Bands",
                List.of("Band", "From, µm", "To, µm"), rows, null));
    }

    /** Writes a table, folded into a {@code <details>} element when it has more than {@link #FOLD_ROWS} rows. */
    static void fold(Html h, int rows, String what, Runnable table) {
        if (rows > FOLD_ROWS) {
            h.raw("<details><summary>Table of " + Html.esc(what) + " (" + rows + " rows)</summary>\n");
            table.run();
            h.raw("</details>\n");
        } else {
            table.run();
        }
    }

    /**
     * Net heat per band and surface: a table, and a bar chart (bands along the axis, a series per
     * surface) registered in {@code charts} and drawn into the element {@code chartId}.
     */
    static void bandFlows(Html h, ArrayNode charts, String chartId, String key, SolveResult r) {
        List<Band> bands = r.bands();
        List<String> names = new ArrayList<>();
        List<double[]> split = new ArrayList<>();
        List<Double> totals = new ArrayList<>();
        for (SurfaceResult s : r.surfaces()) {
            names.add(s.name());
            split.add(s.bandNetHeatW());
            totals.add(s.netHeatW());
        }
        if (r.environment() != null) {
            names.add("environment " + r.environment().name() + " (into the enclosure)");
            split.add(r.environment().bandNetHeatW());
            totals.add(r.environment().netHeatW());
        }
        List<List<Cell>> rows = new ArrayList<>();
        List<String> head = new ArrayList<>();
        if (names.size() <= SURFACE_COLUMNS) {
            head.add("Band, µm");
            names.forEach(n -> head.add(n + ", W"));
            for (int k = 0; k < bands.size(); k++) {
                List<Cell> row = new ArrayList<>(List.of(Cell.text(band(bands.get(k)))));
                for (double[] q : split) {
                    row.add(Cell.number(Numbers.power(q[k]), ""));
                }
                rows.add(row);
            }
            List<Cell> total = new ArrayList<>(List.of(Cell.text("all bands")));
            totals.forEach(q -> total.add(Cell.number(Numbers.power(q), "q-w")));
            rows.add(total);
        } else {
            head.add("Surface");
            bands.forEach(b -> head.add(band(b) + " µm, W"));
            head.add("All bands, W");
            for (int i = 0; i < names.size(); i++) {
                List<Cell> row = new ArrayList<>(List.of(Cell.text(names.get(i))));
                for (double q : split.get(i)) {
                    row.add(Cell.number(Numbers.power(q), ""));
                }
                row.add(Cell.number(Numbers.power(totals.get(i)), "q-w"));
                rows.add(row);
            }
        }
        fold(h, rows.size(), "net heat per band", () -> h.table("class=\"band-split\" data-load-case=\""
                + Html.esc(key) + "\"", "Net heat per band, W" + label(key), head, rows, null));
        h.raw("<div class=\"chart\" id=\"" + chartId + "\" role=\"img\" aria-label=\"Bar chart of net heat per band"
                + Html.esc(label(key)) + "\"></div>\n");
        ObjectNode c = charts.addObject();
        c.put("id", chartId);
        c.put("kind", "bands");
        c.put("title", "Net heat per band" + label(key) + " (positive: the surface loses heat)");
        ArrayNode series = c.putArray("series");
        ArrayNode values = c.putArray("values");
        for (int i = 0; i < names.size(); i++) {
            series.add(names.get(i));
            ArrayNode v = values.addArray();
            Arrays.stream(split.get(i)).forEach(v::add);
        }
        ArrayNode bandNames = c.putArray("bands");
        bands.forEach(b -> bandNames.add(band(b)));
    }

    private static String label(String key) {
        return key.isEmpty() ? "" : " — load case " + key;
    }
}
