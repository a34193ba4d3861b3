package org.exitance.report;

import java.io.PrintStream;
import java.util.Locale;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;

/**
 * The time series of a transient run as CSV (RFC 4180; one row per output instant): time, stored
 * heat, then per surface its temperature, heater power and net radiative heat.
 */
public final class TransientCsvWriter {
    private TransientCsvWriter() {
    }

    public static void write(TransientResult r, PrintStream out) {
        StringBuilder head = new StringBuilder("time_s,stored_J");
        for (String s : r.surfaces()) {
            head.append(',').append(quoted(s + " temperature_K")).append(',').append(quoted(s + " heater_W"))
                    .append(',').append(quoted(s + " netRadiation_W"));
        }
        out.print(head + "\r\n");
        for (Sample x : r.samples()) {
            StringBuilder row = new StringBuilder(num(x.timeS())).append(',').append(num(x.storedJ()));
            for (int i = 0; i < r.surfaces().size(); i++) {
                row.append(',').append(num(x.temperatureK()[i])).append(',').append(num(x.heaterW()[i])).append(',')
                        .append(num(x.radiationW()[i]));
            }
            out.print(row + "\r\n");
        }
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.10g", v);
    }

    private static String quoted(String s) {
        return s.contains(",") || s.contains("\"") || s.contains(" ") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }
}
