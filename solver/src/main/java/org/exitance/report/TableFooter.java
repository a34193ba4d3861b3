package org.exitance.report;

import java.io.PrintStream;
import java.util.List;

/**
 * The end every text report shares: extra sections (such as the audit summary of a solve), one
 * {@code Warning:} line per warning of the reader, then a blank line and the {@link Caution}.
 */
public final class TableFooter {
    private TableFooter() {
    }

    /** Only the caution, after a blank line. */
    public static void write(PrintStream out) {
        write(List.of(), List.of(), out);
    }

    /**
     * @param extra    lines printed after a blank line (nothing when empty)
     * @param warnings one line each, prefixed {@code Warning: }
     */
    public static void write(List<String> extra, List<String> warnings, PrintStream out) {
        if (!extra.isEmpty()) {
            out.println();
            extra.forEach(out::println);
        }
        for (String w : warnings) {
            out.println("Warning: " + w);
        }
        out.println();
        out.println(Caution.SHORT);
    }
}
