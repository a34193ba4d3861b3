package org.exitance.report;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import org.exitance.model.Band;
import org.exitance.result.EnvironmentResult;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;

/** Writes a solve result as readable text tables. Reads the result; computes no physics. */
public final class SolveTableWriter {
    /** Relative energy imbalance above which the writer says the balance does not close. */
    public static final double BALANCE_WARNING = SolveResult.BALANCE_TOLERANCE;
    private static final int MAX_SPLIT_COLUMNS = 8;
    private static final int MAX_SPLIT_ROWS = 24;
    private static final int MAX_LISTED_EDGES = 30;

    private SolveTableWriter() {
    }

    /** Several load cases: each in full, then a side-by-side summary of T and net heat. */
    public static void writeLoadCases(List<LoadCaseResult> results, List<String> warnings, PrintStream out) {
        writeLoadCases(results, warnings, List.of(), out);
    }

    /** As above, with extra lines (e.g. the audit summary) before the warnings and the caution ({@link TableFooter}). */
    public static void writeLoadCases(List<LoadCaseResult> results, List<String> warnings,
                                      List<String> extra, PrintStream out) {
        writeLoadCases(results, warnings, extra, false, out);
    }

    /** As above; {@code conductance}: also list each pair's linearised conductance ({@link PairExchangeWriter}). */
    public static void writeLoadCases(List<LoadCaseResult> results, List<String> warnings,
                                      List<String> extra, boolean conductance, PrintStream out) {
        for (LoadCaseResult r : results) {
            out.println("=".repeat(12) + " Load case: " + r.name()
                    + (r.description().isEmpty() ? "" : " — " + r.description()) + " " + "=".repeat(12));
            body(r.result(), conductance, out);
            out.println();
        }
        List<String> head = new ArrayList<>();
        head.add("Surface");
        for (LoadCaseResult r : results) {
            head.add(r.name() + " T K");
            head.add(r.name() + " Q W");
        }
        boolean[] num = new boolean[head.size()];
        java.util.Arrays.fill(num, true);
        num[0] = false;
        TextTable t = new TextTable(head, num);
        for (int i = 0; i < results.get(0).result().surfaces().size(); i++) {
            List<String> row = new ArrayList<>();
            row.add(results.get(0).result().surfaces().get(i).name());
            for (LoadCaseResult r : results) {
                SurfaceResult s = r.result().surfaces().get(i);
                row.add(Numbers.temperature(s.temperatureK()));
                row.add(Numbers.power(s.heatSuppliedW()));
            }
            t.row(row);
        }
        out.println("Load cases side by side (T: temperature; Q: heat supplied = radiation + convection + conduction):");
        t.render(0).forEach(out::println);
        TableFooter.write(extra, warnings, out);
    }

    public static void write(SolveResult r, List<String> warnings, PrintStream out) {
        write(r, warnings, List.of(), out);
    }

    /** As above, with extra lines (e.g. the audit summary) before the warnings and the caution ({@link TableFooter}). */
    public static void write(SolveResult r, List<String> warnings, List<String> extra, PrintStream out) {
        write(r, warnings, extra, false, out);
    }

    /** As above; {@code conductance}: also list each pair's linearised conductance ({@link PairExchangeWriter}). */
    public static void write(SolveResult r, List<String> warnings, List<String> extra, boolean conductance,
                             PrintStream out) {
        body(r, conductance, out);
        TableFooter.write(extra, warnings, out);
    }

    private static void body(SolveResult r, boolean conductance, PrintStream out) {
        out.println("Exitance " + Version.get() + (r.title().isEmpty() ? "" : " — " + r.title()));
        out.println();
        writeBands(r, out);
        out.println();
        TextTable t = new TextTable(List.of("Surface", "Area m²", "Condition", "T K", "T °C", "Net heat W",
                "Net flux W/m²"), new boolean[] {false, true, false, true, true, true, true});
        for (SurfaceResult s : r.surfaces()) {
            t.row(List.of(s.name(), Numbers.area(s.areaM2()), s.boundary() + (s.temperatureSolved() ? " → T solved" : ""),
                    Numbers.temperature(s.temperatureK()), Numbers.temperature(s.temperatureK() - 273.15),
                    Numbers.power(s.netHeatW()), Numbers.power(s.netFluxWPerM2())));
        }
        t.render(0).forEach(out::println);
        out.println("  (net heat: radiation leaving the surface minus radiation it absorbs; positive = loses heat)");
        for (var w : r.facePairs()) {
            out.println("  " + (w.window() ? "window " : "two-sided ") + w.face() + " + " + w.otherFace()
                    + " (two faces, one temperature "
                    + Numbers.temperature(w.temperatureK()) + " K): net heat of the pair " + Numbers.power(w.netHeatW())
                    + " W = emitted − absorbed; heat supplied " + Numbers.power(w.heatSuppliedW()) + " W");
        }
        writeOtherPaths(r, out);
        writeFacetSpread(r, out);
        for (var src : r.sources()) {
            out.println("Source '" + src.name() + "' (" + src.spectrum() + "): " + Numbers.power(src.incidentW())
                    + " W arrives, " + Numbers.power(src.absorbedW()) + " W absorbed where it lands, the rest reflected");
        }
        EnvironmentResult env = r.environment();
        if (env != null) {
            out.println();
            out.println("Environment '" + env.name() + "' at " + Numbers.temperature(env.temperatureK())
                    + " K: net heat into the enclosure " + Numbers.power(env.netHeatW()) + " W");
        }
        PairExchangeWriter.writeTable(r, conductance, out);
        out.println();
        writeBandSplit(r, out);
        out.println();
        writeBalance(r, out);
    }

    /** For a solve on facets: how many facets, and each surface's facet temperature range. */
    private static void writeFacetSpread(SolveResult r, PrintStream out) {
        if (r.facets().isEmpty()) {
            return;
        }
        out.println();
        out.println("Solved on " + r.facets().size() + " facets (T above: area-weighted mean); facet temperatures:");
        for (SurfaceResult s : r.surfaces()) {
            double min = Double.POSITIVE_INFINITY;
            double max = 0;
            int count = 0;
            for (SurfaceResult f : r.facets()) {
                if (f.name().startsWith(s.name() + "#")) {
                    min = Math.min(min, f.temperatureK());
                    max = Math.max(max, f.temperatureK());
                    count++;
                }
            }
            out.println("  " + s.name() + ": " + count + " facets, " + Numbers.temperature(min) + "–"
                    + Numbers.temperature(max) + " K");
        }
    }

    /** Convection, conduction and heat supplied, when any surface has them. */
    private static void writeOtherPaths(SolveResult r, PrintStream out) {
        boolean any = r.surfaces().stream().anyMatch(s -> s.convectionW() != 0 || s.conductionW() != 0
                || s.wallW() != 0);
        if (!any) {
            return;
        }
        out.println();
        TextTable t = new TextTable(List.of("Surface", "Radiation W", "Convection W", "Conduction W", "Wall W",
                "Supplied W"), new boolean[] {false, true, true, true, true, true});
        for (SurfaceResult s : r.surfaces()) {
            t.row(List.of(s.name(), Numbers.power(s.netHeatW()), Numbers.power(s.convectionW()),
                    Numbers.power(s.conductionW()), Numbers.power(s.wallW()), Numbers.power(s.heatSuppliedW())));
        }
        out.println("Heat leaving each surface by path (supplied = what must be put in to hold it there):");
        t.render(0).forEach(out::println);
    }

    private static void writeBands(SolveResult r, PrintStream out) {
        List<Band> bands = r.bands();
        StringBuilder b = new StringBuilder("Bands: " + bands.size() + " (" + r.bandOrigin() + ")");
        if (bands.size() > 1 && bands.size() <= MAX_LISTED_EDGES) {
            b.append(", edges µm:");
            for (int k = 1; k < bands.size(); k++) {
                b.append(' ').append(Numbers.wavelength(bands.get(k).lowerUm()));
            }
        } else if (bands.size() > 1) {
            b.append(", edges from ").append(Numbers.wavelength(bands.get(1).lowerUm())).append(" to ")
                    .append(Numbers.wavelength(bands.get(bands.size() - 1).lowerUm())).append(" µm (all in --json)");
        }
        out.println(b);
    }

    private static void writeBandSplit(SolveResult r, PrintStream out) {
        List<Band> bands = r.bands();
        if (bands.size() == 1) {
            out.println("Net heat per band: one band (gray solution); see the table above.");
            return;
        }
        List<SurfaceResult> s = r.surfaces();
        if (bands.size() > MAX_SPLIT_ROWS) {
            out.println("Net heat per band: " + s.size() + " surfaces × " + bands.size()
                    + " bands; use --json for the full split.");
        } else if (s.size() <= MAX_SPLIT_COLUMNS) {
            List<String> head = new ArrayList<>();
            head.add("Band µm");
            boolean[] num = new boolean[s.size() + 1];
            for (int i = 0; i < s.size(); i++) {
                head.add(s.get(i).name() + " W");
                num[i + 1] = true;
            }
            TextTable t = new TextTable(head, num);
            for (int k = 0; k < bands.size(); k++) {
                List<String> row = new ArrayList<>();
                row.add(Numbers.wavelength(bands.get(k).lowerUm()) + "–" + Numbers.wavelength(bands.get(k).upperUm()));
                for (SurfaceResult x : s) {
                    row.add(Numbers.power(x.bandNetHeatW()[k]));
                }
                t.row(row);
            }
            out.println("Net heat per band, W:");
            t.render(0).forEach(out::println);
        } else if (bands.size() <= MAX_SPLIT_COLUMNS) {
            List<String> head = new ArrayList<>();
            head.add("Surface");
            boolean[] num = new boolean[bands.size() + 1];
            for (int k = 0; k < bands.size(); k++) {
                head.add(Numbers.wavelength(bands.get(k).lowerUm()) + "–" + Numbers.wavelength(bands.get(k).upperUm()) + " µm");
                num[k + 1] = true;
            }
            TextTable t = new TextTable(head, num);
            for (SurfaceResult x : s) {
                List<String> row = new ArrayList<>();
                row.add(x.name());
                for (double q : x.bandNetHeatW()) {
                    row.add(Numbers.power(q));
                }
                t.row(row);
            }
            out.println("Net heat per band, W:");
            t.render(0).forEach(out::println);
        } else {
            out.println("Net heat per band: " + s.size() + " surfaces × " + bands.size()
                    + " bands; use --json for the full split.");
        }
    }

    private static void writeBalance(SolveResult r, PrintStream out) {
        double rel = r.relativeEnergyBalance();
        out.println("Energy balance: Σ net heat" + (r.environment() != null ? " (surfaces + environment)" : "")
                + (r.sources().isEmpty() ? "" : " + source power")
                + " = " + Numbers.small(r.energyBalanceW()) + " W, " + Numbers.small(rel) + " of the "
                + Numbers.power(r.crossingHeatW()) + " W crossing the enclosure — "
                + (rel <= BALANCE_WARNING ? "closes"
                        : r.atRoundingFloor() ? "closes at the rounding floor (within " + Numbers.small(SolveResult.ROUNDING_FLOOR)
                                + " of the " + Numbers.power(r.energyScaleW()) + " W in play): the net heats are uncertain by about "
                                + Numbers.small(Math.abs(r.energyBalanceW())) + " W"
                        : "DOES NOT CLOSE (check view-factor closure and reciprocity)"));
        var s = r.solver();
        out.println("Solver: " + s.linearSolver() + "; Newton iterations " + s.newtonIterations()
                + ", property updates " + s.propertyIterations() + ", heat residual " + Numbers.small(s.residualW())
                + " W; linear residual " + Numbers.small(s.maxLinearResidual())
                + (s.strategy().isEmpty() ? "" : " (" + s.strategy() + ", most band-solve iterations "
                + java.util.Arrays.stream(s.bandIterations()).max().orElse(0) + ")"));
        if (s.estimatedBytes() >= LARGE_BYTES) {
            out.println(String.format(java.util.Locale.ROOT, "Memory: %.0f MB estimated before the solve, peak heap %.0f MB"
                    + " (view factors included; the peak counts garbage not yet collected)", s.estimatedBytes() / 1e6,
                    s.peakHeapBytes() / 1e6));
        }
    }

    /** From this estimated solve memory on, the text states the estimate and the measured peak. */
    static final long LARGE_BYTES = 256L << 20;
}
