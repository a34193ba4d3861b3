package org.exitance.report.html;

import java.util.List;

/**
 * A small builder of HTML text: escaped text, headings, paragraphs and tables. Every string given
 * as text is escaped here; only {@link #raw} takes markup as it is.
 */
final class Html {
    private final StringBuilder sb = new StringBuilder(1 << 16);

    /** A table cell: its text, and whether it holds a number (right-aligned, with its class). */
    record Cell(String text, String cssClass) {
        static Cell text(String t) {
            return new Cell(t, "");
        }

        static Cell number(String t, String cssClass) {
            return new Cell(t, ("num " + cssClass).trim());
        }
    }

    /** Escapes &amp;, &lt;, &gt; and both quotes, for text and attribute values alike. */
    static String esc(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    Html raw(String markup) {
        sb.append(markup);
        return this;
    }

    Html text(String s) {
        sb.append(esc(s));
        return this;
    }

    /** Opens {@code <section id=ID>} with an h2 heading; close it with {@link #endSection()}. */
    Html section(String id, String heading) {
        sb.append("<section id=\"").append(esc(id)).append("\">\n<h2>").append(esc(heading)).append("</h2>\n");
        return this;
    }

    Html endSection() {
        sb.append("</section>\n");
        return this;
    }

    Html h3(String s) {
        sb.append("<h3>").append(esc(s)).append("</h3>\n");
        return this;
    }

    Html p(String s) {
        sb.append("<p>").append(esc(s)).append("</p>\n");
        return this;
    }

    /** A paragraph with a CSS class. */
    Html p(String cssClass, String s) {
        sb.append("<p class=\"").append(esc(cssClass)).append("\">").append(esc(s)).append("</p>\n");
        return this;
    }

    /** A bulleted list of text items (nothing when empty). */
    Html list(List<String> items) {
        if (!items.isEmpty()) {
            sb.append("<ul>\n");
            items.forEach(i -> sb.append("<li>").append(esc(i)).append("</li>\n"));
            sb.append("</ul>\n");
        }
        return this;
    }

    /**
     * A table.
     *
     * @param attributes extra attributes of the table element, already escaped (e.g. {@code class="x"})
     * @param caption    its caption (text)
     * @param head       column headings (text)
     * @param rows       rows of cells; the first cell of each row is its header cell
     * @param rowKeys    per row, a value for the row's {@code data-key} attribute, or null for none
     */
    Html table(String attributes, String caption, List<String> head, List<List<Cell>> rows, List<String> rowKeys) {
        sb.append("<table ").append(attributes).append(">\n<caption>").append(esc(caption)).append("</caption>\n<thead><tr>");
        head.forEach(h -> sb.append("<th scope=\"col\">").append(esc(h)).append("</th>"));
        sb.append("</tr></thead>\n<tbody>\n");
        for (int r = 0; r < rows.size(); r++) {
            sb.append("<tr");
            if (rowKeys != null && rowKeys.get(r) != null) {
                sb.append(" data-key=\"").append(esc(rowKeys.get(r))).append('"');
            }
            sb.append('>');
            List<Cell> row = rows.get(r);
            for (int c = 0; c < row.size(); c++) {
                String tag = c == 0 ? "th" : "td";
                Cell cell = row.get(c);
                sb.append('<').append(tag).append(c == 0 ? " scope=\"row\"" : "");
                if (!cell.cssClass().isEmpty()) {
                    sb.append(" class=\"").append(esc(cell.cssClass())).append('"');
                }
                sb.append('>').append(esc(cell.text())).append("</").append(tag).append('>');
            }
            sb.append("</tr>\n");
        }
        sb.append("</tbody></table>\n");
        return this;
    }

    @Override
    public String toString() {
        return sb.toString();
    }
}
