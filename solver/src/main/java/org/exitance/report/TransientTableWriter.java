package org.exitance.report;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;

/** The text report of a transient run: temperatures at the output instants, events, energy, steps. */
public final class TransientTableWriter {
    private TransientTableWriter() {
    }

    public static void write(TransientResult r, List<String> warnings, PrintStream out) {
        out.println(r.title().isEmpty() ? "Transient" : r.title());
        out.println("Bands: " + r.bands() + "; " + (Double.isNaN(r.toleranceK()) ? "fixed steps"
                : "local error per step at most " + Numbers.small(r.toleranceK()) + " K") + " (docs/transient.md)");
        out.println();
        List<String> head = new ArrayList<>(List.of("t s", "t h"));
        boolean[] numeric = new boolean[2 + r.shown().size() + 1];
        java.util.Arrays.fill(numeric, true);
        r.shown().forEach(s -> head.add(s + " K"));
        head.add("stored MJ");
        TextTable t = new TextTable(head, numeric);
        for (Sample s : r.samples()) {
            List<String> row = new ArrayList<>(List.of(fmt("%.6g", s.timeS()), fmt("%.4f", s.timeS() / 3600)));
            for (String n : r.shown()) {
                row.add(Numbers.temperature(s.temperatureK()[r.indexOf(n)]));
            }
            row.add(fmt("%.6g", s.storedJ() / 1e6));
            t.row(row);
        }
        out.println("Temperatures at the output instants:");
        t.render(0).forEach(out::println);
        out.println();
        TextTable ex = new TextTable(List.of("Node", "min K", "at s", "max K", "at s"),
                new boolean[] {false, true, true, true, true});
        for (TransientResult.Extremes e : r.extremes()) {
            ex.row(List.of(e.surface(), Numbers.temperature(e.minK()), fmt("%.6g", e.minTimeS()),
                    Numbers.temperature(e.maxK()), fmt("%.6g", e.maxTimeS())));
        }
        out.println("Lowest and highest temperature of each node (at the steps):");
        ex.render(0).forEach(out::println);
        for (TransientResult.TargetTime g : r.targets()) {
            out.println("Target: " + g.surface() + " reaches " + Numbers.temperature(g.targetK()) + " K "
                    + (Double.isNaN(g.timeS()) ? "not within the run" : "at " + fmt("%.6g", g.timeS()) + " s ("
                    + fmt("%.4g", g.timeS() / 3600) + " h)"));
        }
        if (!r.switches().isEmpty()) {
            out.println("Thermostat switches: " + r.switches().size() + " (first at " + fmt("%.6g",
                    r.switches().get(0).timeS()) + " s, last at " + fmt("%.6g",
                    r.switches().get(r.switches().size() - 1).timeS()) + " s)");
        }
        if (!r.cycles().isEmpty()) {
            out.println();
            TextTable cy = new TextTable(List.of("Cycle", "from s", "to s", "supplied MJ", "lost MJ", "stored MJ",
                    "change K"), new boolean[] {true, true, true, true, true, true, true});
            for (TransientResult.Cycle c : r.cycles()) {
                cy.row(List.of(Integer.toString(c.number()), fmt("%.6g", c.startS()), fmt("%.6g", c.endS()),
                        fmt("%.6g", c.suppliedJ() / 1e6), fmt("%.6g", c.lostJ() / 1e6),
                        fmt("%.4g", c.storedChangeJ() / 1e6), fmt("%.3g", c.maxChangeK())));
            }
            out.println("Periods (change: largest temperature difference from one period earlier):");
            cy.render(0).forEach(out::println);
            out.println(r.repeated() ? "The run repeats after " + r.cycles().size() + " periods."
                    : "The run did not repeat within " + r.cycles().size() + " periods.");
        }
        TransientResult.Energy e = r.energy();
        out.println();
        out.println("Energy: supplied " + fmt("%.6g", e.suppliedJ() / 1e6) + " MJ, lost " + fmt("%.6g", e.lostJ() / 1e6)
                + " MJ, stored change " + fmt("%.6g", (e.storedEndJ() - e.storedStartJ()) / 1e6) + " MJ; drift "
                + fmt("%.3g", e.driftJ()) + " J (" + fmt("%.2g", e.driftRelative()) + " of the largest)");
        TransientResult.Steps st = r.steps();
        out.println("Steps: " + st.accepted() + " accepted, " + st.rejected() + " rejected, from " + fmt("%.3g",
                st.smallestS()) + " s to " + fmt("%.3g", st.largestS()) + " s");
        warnings.forEach(w -> out.println("Warning: " + w));
        out.println(Caution.SHORT);
    }

    private static String fmt(String f, double v) {
        return String.format(java.util.Locale.ROOT, f, v);
    }
}
