package org.exitance.report.html;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import org.exitance.report.Numbers;
import org.exitance.report.html.Html.Cell;
import org.exitance.result.PairExchange;

/**
 * Where the heat goes, from a solve's pair exchange ({@link PairExchange}): the matrix of net heat
 * from each node (row) to each other (column) with its row sums, and a flow diagram (an ECharts
 * Sankey chart) from every node that gives heat, a surface losing heat, an external source or an
 * environment sending heat in, to the nodes that take it.
 */
final class ExchangeSection {
    /** Matrices with more nodes than this are folded into a {@code <details>} element. */
    private static final int FOLD_NODES = 12;

    private ExchangeSection() {
    }

    /**
     * @param chartId the element the flow diagram is drawn into
     * @param key     the load case's name, or "" for a case without load cases
     */
    static void write(Html h, ArrayNode charts, String chartId, String key, PairExchange x,
                      List<org.exitance.model.Band> bands) {
        int n = x.nodes().size();
        List<String> head = new ArrayList<>(List.of("From \\ to, W"));
        head.addAll(x.nodes());
        head.add("Σ row, W");
        List<List<Cell>> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            List<Cell> row = new ArrayList<>(List.of(Cell.text(x.nodes().get(i))));
            for (int j = 0; j < n; j++) {
                row.add(Cell.number(i == j ? "—" : Numbers.power(x.netHeat_W(i, j)), ""));
            }
            row.add(Cell.number(Numbers.power(x.rowSum_W(i)), "row-sum"));
            rows.add(row);
        }
        String caption = "Net heat from row to column, all " + x.bandCount() + " band" + (x.bandCount() == 1 ? "" : "s")
                + (key.isEmpty() ? "" : " — load case " + key);
        if (n > FOLD_NODES) {
            h.raw("<details><summary>The " + n + " × " + n + " matrix of net heat between nodes</summary>\n");
        }
        h.table("class=\"exchange\" data-load-case=\"" + Html.esc(key) + "\"", caption, head, rows, x.nodes());
        if (n > FOLD_NODES) {
            h.raw("</details>\n");
        }
        h.p("note", "Q_ij: the power node i sends out that node j takes, less what j sends out that i takes, after"
                + " every reflection (Gebhart absorption factors, band by band). The matrix is antisymmetric and each"
                + " surface's row sums to its net heat in the results table. A source only gives: its row is what"
                + " each node takes of it.");
        ObjectNode c = charts.addObject();
        c.put("id", chartId);
        c.put("kind", "sankey");
        c.put("title", "Where the heat goes" + (key.isEmpty() ? "" : " — load case " + key)
                + ": from each node that gives heat (left) to those that take it (right), W");
        ArrayNode nodes = c.putArray("nodes");
        ArrayNode links = c.putArray("links");
        java.util.Map<String, Double> left = new java.util.LinkedHashMap<>();
        java.util.Map<String, Double> right = new java.util.LinkedHashMap<>();
        double largest = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                largest = Math.max(largest, Math.abs(x.netHeat_W(i, j)));
            }
        }
        for (int i = 0; i < n; i++) {
            if (!(x.rowSum_W(i) > 0)) {
                continue;
            }
            for (int j = 0; j < n; j++) {
                double q = x.netHeat_W(i, j);
                if (j != i && q > 1e-9 * largest) {
                    String from = x.nodes().get(i) + " (from)";
                    String to = x.nodes().get(j) + " (to)";
                    left.merge(from, q, Double::sum);
                    right.merge(to, q, Double::sum);
                    ObjectNode l = links.addObject();
                    l.put("source", from);
                    l.put("target", to);
                    l.put("value", q);
                }
            }
        }
        for (var side : List.of(left, right)) {
            side.forEach((node, total) -> nodes.addObject().put("name", node).put("value", total));
        }
        h.raw("<div class=\"chart sankey\" id=\"" + chartId + "\" role=\"img\" aria-label=\"Flow diagram of net heat"
                + " between nodes" + Html.esc(key.isEmpty() ? "" : ", load case " + key) + "\"></div>\n");
        h.p("note", "Each band of the diagram is one pair's net heat; a node on the left gives heat (its net heat is"
                + " positive), a node on the right takes it. Widths are to scale; hover for the numbers.");
        if (x.bandCount() > 1) {
            for (int i = 0; i < n; i++) {
                if (x.rowSum_W(i) > 0) {
                    byBand(h, key, x, i, bands);
                }
            }
        }
    }

    /** Band by band, the net heat from node i to every other node (W). */
    private static void byBand(Html h, String key, PairExchange x, int i, List<org.exitance.model.Band> bands) {
        int n = x.nodes().size();
        List<String> head = new ArrayList<>(List.of("Band, µm"));
        for (int j = 0; j < n; j++) {
            if (j != i) {
                head.add("to " + x.nodes().get(j) + ", W");
            }
        }
        List<List<Cell>> rows = new ArrayList<>();
        for (int k = 0; k < x.bandCount(); k++) {
            List<Cell> row = new ArrayList<>(List.of(Cell.text(ResultSections.band(bands.get(k)))));
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    row.add(Cell.number(Numbers.power(x.bandNetHeat_W(k, i, j)), ""));
                }
            }
            rows.add(row);
        }
        List<Cell> total = new ArrayList<>(List.of(Cell.text("all bands")));
        for (int j = 0; j < n; j++) {
            if (j != i) {
                total.add(Cell.number(Numbers.power(x.netHeat_W(i, j)), ""));
            }
        }
        rows.add(total);
        String what = "where the heat of " + x.nodes().get(i) + " goes, band by band";
        h.raw("<details><summary>Table: " + Html.esc(what) + " (" + rows.size() + " rows)</summary>\n");
        h.table("class=\"exchange-bands\"", "Net heat from " + x.nodes().get(i) + " to each node, by band"
                + (key.isEmpty() ? "" : " — load case " + key), head, rows, null);
        h.raw("</details>\n");
    }
}
