package org.exitance.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table with aligned columns: text left-aligned, numbers right-aligned.
 * Used by every human-readable writer.
 */
public final class TextTable {
    private final List<String> headers;
    private final boolean[] numeric;
    private final List<List<String>> rows = new ArrayList<>();

    /**
     * @param headers column titles; a title ending in a unit (e.g. "Net heat W") is fine
     * @param numeric which columns right-align
     */
    public TextTable(List<String> headers, boolean[] numeric) {
        this.headers = List.copyOf(headers);
        this.numeric = numeric.clone();
    }

    public TextTable row(List<String> cells) {
        if (cells.size() != headers.size()) {
            throw new IllegalArgumentException("row has " + cells.size() + " cells for " + headers.size() + " columns");
        }
        rows.add(List.copyOf(cells));
        return this;
    }

    /** The table as lines, each indented by {@code indent} spaces; a rule under the header. */
    public List<String> render(int indent) {
        int[] w = new int[headers.size()];
        for (int c = 0; c < w.length; c++) {
            w[c] = headers.get(c).length();
            for (List<String> r : rows) {
                w[c] = Math.max(w[c], r.get(c).length());
            }
        }
        List<String> out = new ArrayList<>();
        String pad = " ".repeat(indent);
        out.add(pad + line(headers, w));
        StringBuilder rule = new StringBuilder(pad);
        for (int c = 0; c < w.length; c++) {
            rule.append(c == 0 ? "" : "  ").append("-".repeat(w[c]));
        }
        out.add(rule.toString());
        for (List<String> r : rows) {
            out.add(pad + line(r, w));
        }
        return out;
    }

    private String line(List<String> cells, int[] w) {
        StringBuilder b = new StringBuilder();
        for (int c = 0; c < w.length; c++) {
            if (c > 0) {
                b.append("  ");
            }
            String s = cells.get(c);
            String fill = " ".repeat(w[c] - s.length());
            b.append(numeric[c] ? fill + s : s + fill);
        }
        return b.toString().stripTrailing();
    }
}
