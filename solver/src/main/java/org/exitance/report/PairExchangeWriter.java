package org.exitance.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import org.exitance.model.Band;
import org.exitance.result.PairExchange;
import org.exitance.result.SolveResult;

/**
 * Writes the pair exchange of a solve ({@link PairExchange}): the top partners of each surface in
 * the text table, the full matrices in JSON, and (with {@code conductance}) the linearised radiative
 * conductance of each pair. Reads the result; computes no physics.
 */
public final class PairExchangeWriter {
    /** Partners listed per surface in the text table. */
    public static final int TOP = 3;
    /** Pairs listed in the text conductance table; the rest are in JSON and CSV. */
    private static final int MAX_CONDUCTANCE_ROWS = 40;

    private PairExchangeWriter() {
    }

    /** The text section: where each surface's net heat goes, then the conductances when asked for. */
    public static void writeTable(SolveResult r, boolean conductance, PrintStream out) {
        PairExchange pe = r.pairExchange().orElse(null);
        if (pe == null) {
            return;
        }
        out.println();
        out.println("Where the heat goes: net heat from each surface to its largest partners, W (a row adds up to"
                + " the surface's net heat; every pair in --json and --csv):");
        List<String> head = new ArrayList<>(List.of("Surface", "Net heat W"));
        for (int c = 1; c <= TOP; c++) {
            head.add("Partner " + c);
        }
        boolean[] num = new boolean[head.size()];
        num[1] = true;
        TextTable t = new TextTable(head, num);
        for (int i = 0; i < pe.surfaceCount(); i++) {
            List<String> row = new ArrayList<>(List.of(pe.nodes().get(i), Numbers.power(r.surfaces().get(i).netHeatW())));
            List<Integer> top = pe.topPartners(i, TOP);
            for (int c = 0; c < TOP; c++) {
                row.add(c < top.size() ? pe.nodes().get(top.get(c)) + " " + signed(pe.netHeat_W(i, top.get(c))) : "");
            }
            t.row(row);
        }
        t.render(0).forEach(out::println);
        if (conductance) {
            writeConductances(pe, out);
        }
    }

    private static void writeConductances(PairExchange pe, PrintStream out) {
        List<int[]> pairs = new ArrayList<>();
        int m = pe.nodes().size();
        for (int i = 0; i < m; i++) {
            for (int j = i + 1; j < m; j++) {
                double g = pe.conductance_W_per_K(i, j);
                if (Double.isFinite(g) && g != 0) {
                    pairs.add(new int[] {i, j});
                }
            }
        }
        pairs.sort((a, b) -> Double.compare(pe.conductance_W_per_K(b[0], b[1]), pe.conductance_W_per_K(a[0], a[1])));
        out.println();
        out.println("Linearised radiative conductance of each pair at the solved temperatures, G = Q/(T_i − T_j), W/K"
                + (pairs.size() > MAX_CONDUCTANCE_ROWS ? " (largest " + MAX_CONDUCTANCE_ROWS + " of " + pairs.size()
                + "; all in --json and --csv)" : "") + ":");
        TextTable t = new TextTable(List.of("From", "To", "G W/K", "Q W"), new boolean[] {false, false, true, true});
        for (int[] p : pairs.subList(0, Math.min(MAX_CONDUCTANCE_ROWS, pairs.size()))) {
            t.row(List.of(pe.nodes().get(p[0]), pe.nodes().get(p[1]), conductance(pe.conductance_W_per_K(p[0], p[1])),
                    Numbers.power(pe.netHeat_W(p[0], p[1]))));
        }
        t.render(0).forEach(out::println);
    }

    private static String signed(double w) {
        String s = Numbers.power(w);
        return s.startsWith("-") ? s : "+" + s;
    }

    private static String conductance(double g) {
        return String.format(java.util.Locale.ROOT, "%.4e", g);
    }

    /**
     * The JSON section {@code pairExchange} (or {@code facetPairExchange}): nodes with their kind,
     * the total net heat matrix, and per band its net heats, Gebhart factors and exchange areas
     * (rows: surfaces; columns: surfaces, then the environment when open); the conductances (null
     * where none applies) when asked for.
     */
    public static ObjectNode toJson(PairExchange pe, List<Band> bands, boolean conductance) {
        ObjectNode o = SolveJsonWriter.MAPPER.createObjectNode();
        ArrayNode nodes = o.putArray("nodes");
        int m = pe.nodes().size();
        for (int i = 0; i < m; i++) {
            ObjectNode n = nodes.addObject();
            n.put("name", pe.nodes().get(i));
            n.put("kind", pe.kind(i).name().toLowerCase(java.util.Locale.ROOT));
        }
        matrix(o.putArray("netHeat_W"), m, m, (i, j) -> pe.netHeat_W(i, j));
        int s = pe.surfaceCount();
        int env = pe.environmentIndex();
        int cols = s + (env >= 0 ? 1 : 0);
        ArrayNode bandArr = o.putArray("bands");
        for (int k = 0; k < pe.bandCount(); k++) {
            int band = k;
            ObjectNode b = bandArr.addObject();
            b.put("lower_um", bands.get(k).lowerUm());
            if (Double.isInfinite(bands.get(k).upperUm())) {
                b.putNull("upper_um");
            } else {
                b.put("upper_um", bands.get(k).upperUm());
            }
            matrix(b.putArray("netHeat_W"), m, m, (i, j) -> pe.bandNetHeat_W(band, i, j));
            matrix(b.putArray("gebhartFactor"), s, cols, (i, j) -> pe.gebhartFactor(band, i, j < s ? j : env));
            matrix(b.putArray("exchangeArea_m2"), s, cols, (i, j) -> pe.exchangeArea_m2(band, i, j < s ? j : env));
        }
        if (conductance) {
            ArrayNode g = o.putArray("conductance_W_K");
            for (int i = 0; i < m; i++) {
                ArrayNode row = g.addArray();
                for (int j = 0; j < m; j++) {
                    double v = pe.conductance_W_per_K(i, j);
                    if (i == j || !Double.isFinite(v)) {
                        row.addNull();
                    } else {
                        row.add(v);
                    }
                }
            }
        }
        return o;
    }

    private interface Cell {
        double at(int i, int j);
    }

    private static void matrix(ArrayNode arr, int rows, int cols, Cell c) {
        for (int i = 0; i < rows; i++) {
            ArrayNode row = arr.addArray();
            for (int j = 0; j < cols; j++) {
                row.add(c.at(i, j));
            }
        }
    }

    /** Adds the sections of r's pair exchange (if any) to a solve's JSON document (modified). */
    public static void addTo(ObjectNode root, SolveResult r, boolean conductance) {
        r.pairExchange().ifPresent(pe -> root.set("pairExchange", toJson(pe, r.bands(), conductance)));
        r.facetPairExchange().ifPresent(pe -> root.set("facetPairExchange", toJson(pe, r.bands(), conductance)));
    }
}
