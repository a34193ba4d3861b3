package org.exitance.report;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import org.exitance.model.Band;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.PairExchange;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;

/**
 * CSV files of a solve (RFC 4180: comma-separated, a header line, text quoted where it holds a
 * comma, a quote or a line break; numbers in Java's shortest round-trip form, so reading one back
 * gives the same double). Every file but the view factors starts with a {@code loadCase} column
 * ("as given" for a case without load cases). An unbounded band edge is an empty cell. Columns are
 * listed in docs/command-line.md. Reads results; computes no physics.
 */
public final class CsvExport {
    private CsvExport() {
    }

    /** {@code surfaces.csv}: one row per load case and surface. */
    public static void surfaces(List<LoadCaseResult> results, PrintStream out) {
        line(out, List.of("loadCase", "name", "area_m2", "boundary", "temperature_K", "temperatureSolved", "netHeat_W",
                "netFlux_W_m2", "convection_W", "conduction_W", "heatSupplied_W"));
        for (LoadCaseResult lc : results) {
            for (SurfaceResult s : lc.result().surfaces()) {
                line(out, List.of(lc.name(), s.name(), num(s.areaM2()), s.boundary(), num(s.temperatureK()),
                        String.valueOf(s.temperatureSolved()), num(s.netHeatW()), num(s.netFluxWPerM2()),
                        num(s.convectionW()), num(s.conductionW()), num(s.heatSuppliedW())));
            }
        }
    }

    /** {@code bands.csv}: one row per load case, surface and band: the per-band split. */
    public static void bands(List<LoadCaseResult> results, PrintStream out) {
        line(out, List.of("loadCase", "name", "lower_um", "upper_um", "netHeat_W", "emissivity", "incident_W",
                "radiosity_W_m2"));
        for (LoadCaseResult lc : results) {
            List<Band> bands = lc.result().bands();
            for (SurfaceResult s : lc.result().surfaces()) {
                for (int k = 0; k < bands.size(); k++) {
                    line(out, List.of(lc.name(), s.name(), edge(bands.get(k).lowerUm()), edge(bands.get(k).upperUm()),
                            num(s.bandNetHeatW()[k]), num(s.bandEmissivity()[k]), num(s.bandIncidentW()[k]),
                            num(s.bandRadiosityWPerM2()[k])));
                }
            }
        }
    }

    /**
     * {@code view-factors.csv}: header {@code from,<surfaces…>}, then one row per surface: its name and
     * F[i][j] in surface order, so that the numbers form the N×N block of a case's
     * {@code viewFactors.matrix}.
     *
     * @param f  F[i][j]; not modified
     */
    public static void viewFactors(List<String> names, double[][] f, PrintStream out) {
        List<String> head = new ArrayList<>();
        head.add("from");
        head.addAll(names);
        line(out, head);
        for (int i = 0; i < names.size(); i++) {
            List<String> row = new ArrayList<>();
            row.add(names.get(i));
            for (double v : f[i]) {
                row.add(num(v));
            }
            line(out, row);
        }
    }

    /**
     * {@code pair-exchange.csv}: one row per load case, ordered pair of nodes (from ≠ to) and band,
     * then the same pairs with {@code band} "all" for the totals (edges empty). Gebhart factor and
     * exchange area are filled where "from" is a surface and "to" a surface or the environment, and
     * per band only; the conductance column is present only when asked for.
     */
    public static void pairExchange(List<LoadCaseResult> results, boolean conductance, PrintStream out) {
        List<String> head = new ArrayList<>(List.of("loadCase", "from", "to", "band", "lower_um", "upper_um",
                "netHeat_W", "gebhartFactor", "exchangeArea_m2"));
        if (conductance) {
            head.add("conductance_W_K");
        }
        line(out, head);
        for (LoadCaseResult lc : results) {
            SolveResult r = lc.result();
            PairExchange pe = r.pairExchange().orElse(null);
            if (pe == null) {
                continue;
            }
            int m = pe.nodes().size();
            for (int k = -1; k < pe.bandCount(); k++) {
                for (int i = 0; i < m; i++) {
                    for (int j = 0; j < m; j++) {
                        if (i != j) {
                            line(out, pairRow(lc.name(), pe, r.bands(), k, i, j, conductance));
                        }
                    }
                }
            }
        }
    }

    /** One row; band −1 is the total. */
    private static List<String> pairRow(String loadCase, PairExchange pe, List<Band> bands, int k, int i, int j,
                                        boolean conductance) {
        boolean factors = k >= 0 && i < pe.surfaceCount() && (j < pe.surfaceCount() || j == pe.environmentIndex());
        List<String> row = new ArrayList<>(List.of(loadCase, pe.nodes().get(i), pe.nodes().get(j),
                k < 0 ? "all" : String.valueOf(k + 1), k < 0 ? "" : edge(bands.get(k).lowerUm()),
                k < 0 ? "" : edge(bands.get(k).upperUm()),
                num(k < 0 ? pe.netHeat_W(i, j) : pe.bandNetHeat_W(k, i, j)),
                factors ? num(pe.gebhartFactor(k, i, j)) : "", factors ? num(pe.exchangeArea_m2(k, i, j)) : ""));
        if (conductance) {
            double g = pe.conductance_W_per_K(i, j);
            row.add(k < 0 && Double.isFinite(g) ? num(g) : "");
        }
        return row;
    }

    private static String edge(double um) {
        return Double.isInfinite(um) ? "" : num(um);
    }

    /** Shortest round-trip form of a finite number. */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalStateException("a CSV cell would hold " + v);
        }
        return Double.toString(v);
    }

    static void line(PrintStream out, List<String> cells) {
        StringBuilder b = new StringBuilder();
        for (int c = 0; c < cells.size(); c++) {
            if (c > 0) {
                b.append(',');
            }
            b.append(quote(cells.get(c)));
        }
        out.print(b);
        out.print("\r\n");
    }

    static String quote(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}
