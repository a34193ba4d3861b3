package org.exitance.result;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * Where the heat goes: the net radiative heat between every pair of nodes of a solve, in total and
 * per band, and the exchange factors that produce it (immutable).
 *
 * <p>Nodes ({@link #nodes()}, {@link #kind(int)}): the surfaces in case order (for a case solved on
 * facets, the facets in {@link SolveResult#facetPairExchange()}); then "environment" when the
 * enclosure is open; then one node per external source, under the source's name. A window or a
 * two-sided plate contributes both faces, each a node of its own.
 *
 * <p>{@code netHeat_W(i, j)} is the net heat from node i to node j: the power node i sends out that
 * node j takes, less the power j sends out that i takes, after every reflection and transmission
 * (W). It is antisymmetric, and each surface's row sums to the surface's net radiative heat
 * ({@link SurfaceResult#netHeatW()}): {@code Σ_j Q_ij = Q_i} with the environment and the sources
 * as columns. A source only gives: its row holds what each surface (and the opening) takes of it,
 * and its row sum is the power it delivers. The environment's row sums to its net heat
 * ({@link EnvironmentResult#netHeatW()}).
 *
 * <p>Exchange factors, per band, with i a surface and j a surface or the environment:
 * {@link #gebhartFactor} B_ij (Gebhart's absorption factor: the fraction of i's emission that j
 * takes; Gebhart 1961; Siegel &amp; Howell, 5th ed., Ch. 6, from memory) and {@link #exchangeArea_m2}
 * A_i ε_i B_ij (m²; Hottel's total exchange area, Hottel &amp; Sarofim, Radiative Transfer, 1967, Ch. 3,
 * from memory), so that between surfaces {@code Q_ij,band = S_ij E_i − S_ji E_j} with E the band
 * emissive powers, and {@code = S_ij (E_i − E_j)} where reciprocity holds.
 *
 * <p>{@link #conductance_W_per_K} is the linearised radiative conductance of a pair at the solved
 * temperatures (W/K): {@code G_ij = Σ_band S̄_ij (E_i − E_j)/(T_i − T_j)} with
 * {@code S̄_ij = (S_ij + S_ji)/2}, so {@code G_ij (T_i − T_j) = Q_ij} (the secant through both
 * temperatures at the solve's band properties; at equal temperatures the tangent
 * {@code Σ S̄ dE/dT}). Between a surface and the environment S is the surface's exchange area to
 * the opening. A source has no temperature, hence no conductance (NaN).
 */
public final class PairExchange {
    /** What a node is. */
    public enum Kind { SURFACE, ENVIRONMENT, SOURCE }

    private final List<String> nodes;
    private final List<Kind> kinds;
    private final int surfaces;
    private final double[][] bandQ;
    private final double[] totalQ;
    private final double[][] gebhart;
    private final double[][] emitting;
    private final double[] conductance;
    private final double[] area;

    /**
     * @param nodes        node names (surfaces, then "environment" if open, then sources)
     * @param kinds        their kinds, same length
     * @param bandNetHeat  per band, the m×m row-major net heats (W), m = nodes; copied, not modified
     * @param gebhart      per band, the s×(s+1) row-major B_ij (s surfaces; the last column the
     *                     environment, 0 when closed); copied, not modified
     * @param emittingArea per band, A_i ε_i of each surface (m²); copied, not modified
     * @param conductance  m×m row-major conductances (W/K), NaN where none applies; copied, not modified
     * @param areaM2       area of each surface (m²); copied, not modified
     */
    public PairExchange(List<String> nodes, List<Kind> kinds, double[][] bandNetHeat, double[][] gebhart,
                        double[][] emittingArea, double[] conductance, double[] areaM2) {
        this.nodes = List.copyOf(nodes);
        this.kinds = List.copyOf(kinds);
        int m = this.nodes.size();
        if (kinds.size() != m || conductance.length != m * m || bandNetHeat.length != gebhart.length
                || bandNetHeat.length != emittingArea.length) {
            throw new IllegalArgumentException("pair exchange: inconsistent sizes");
        }
        this.surfaces = (int) kinds.stream().filter(k -> k == Kind.SURFACE).count();
        this.bandQ = new double[bandNetHeat.length][];
        this.gebhart = new double[gebhart.length][];
        this.emitting = new double[emittingArea.length][];
        this.totalQ = new double[m * m];
        for (int k = 0; k < bandQ.length; k++) {
            if (bandNetHeat[k].length != m * m || gebhart[k].length != surfaces * (surfaces + 1)
                    || emittingArea[k].length != surfaces) {
                throw new IllegalArgumentException("pair exchange: inconsistent sizes in band " + k);
            }
            bandQ[k] = bandNetHeat[k].clone();
            this.gebhart[k] = gebhart[k].clone();
            emitting[k] = emittingArea[k].clone();
            for (int x = 0; x < m * m; x++) {
                totalQ[x] += bandQ[k][x];
            }
        }
        this.conductance = conductance.clone();
        if (areaM2.length != surfaces) {
            throw new IllegalArgumentException("pair exchange: " + areaM2.length + " areas for " + surfaces + " surfaces");
        }
        this.area = areaM2.clone();
    }

    /** Node names: surfaces in case order, then "environment" if open, then the external sources. */
    public List<String> nodes() {
        return nodes;
    }

    /** What node i is. */
    public Kind kind(int i) {
        return kinds.get(i);
    }

    /** The number of surface nodes (they come first). */
    public int surfaceCount() {
        return surfaces;
    }

    /** The environment's node index, or −1 for a closed enclosure. */
    public int environmentIndex() {
        return kinds.indexOf(Kind.ENVIRONMENT);
    }

    public int bandCount() {
        return bandQ.length;
    }

    /** Net heat from node i to node j, all bands (W); antisymmetric. */
    public double netHeat_W(int i, int j) {
        return totalQ[i * nodes.size() + j];
    }

    /** Net heat from node i to node j in one band (W); antisymmetric. */
    public double bandNetHeat_W(int band, int i, int j) {
        return bandQ[band][i * nodes.size() + j];
    }

    /** Σ_j Q_ij (W): a surface's net radiative heat, a source's delivered power, the environment's net heat. */
    public double rowSum_W(int i) {
        double s = 0;
        for (int j = 0; j < nodes.size(); j++) {
            s += netHeat_W(i, j);
        }
        return s;
    }

    /**
     * Gebhart's absorption factor B_ij in one band: the fraction of surface i's emission taken by j.
     *
     * @param i  a surface (index &lt; {@link #surfaceCount()})
     * @param j  a surface, or {@link #environmentIndex()} for what leaves through the opening
     */
    public double gebhartFactor(int band, int i, int j) {
        int col = j < surfaces ? j : checkEnvironment(j);
        return gebhart[band][check(i) * (surfaces + 1) + col];
    }

    /** Hottel's band total exchange area S_ij = A_i ε_i B_ij (m²); indices as {@link #gebhartFactor}. */
    public double exchangeArea_m2(int band, int i, int j) {
        return emitting[band][check(i)] * gebhartFactor(band, i, j);
    }

    /** A_i ε_i of surface i in one band (m²). */
    public double emittingArea_m2(int band, int i) {
        return emitting[band][check(i)];
    }

    /** Area of surface i (m²). */
    public double area_m2(int i) {
        return area[check(i)];
    }

    /** The linearised radiative conductance between nodes i and j (W/K); NaN for a source. */
    public double conductance_W_per_K(int i, int j) {
        return conductance[i * nodes.size() + j];
    }

    /**
     * The nodes j that exchange most with node i, by |Q_ij|, largest first (ties in node order).
     *
     * @param limit at most this many
     */
    public List<Integer> topPartners(int i, int limit) {
        List<Integer> js = new ArrayList<>();
        for (int j = 0; j < nodes.size(); j++) {
            if (j != i && netHeat_W(i, j) != 0) {
                js.add(j);
            }
        }
        js.sort((a, b) -> Double.compare(Math.abs(netHeat_W(i, b)), Math.abs(netHeat_W(i, a))));
        return js.subList(0, Math.min(limit, js.size()));
    }

    private int check(int i) {
        if (i < 0 || i >= surfaces) {
            throw new IndexOutOfBoundsException("node " + i + " is not a surface");
        }
        return i;
    }

    private int checkEnvironment(int j) {
        if (j != environmentIndex() || j < 0) {
            throw new IndexOutOfBoundsException("node " + j + " is neither a surface nor the environment");
        }
        return surfaces;
    }

    /**
     * The same exchange between groups of surfaces (a case solved on facets, reported by surface):
     * net heats and conductances of the members add, exchange areas add (Hottel's zones add), and a
     * group's Gebhart factor is its exchange area over its emitting area (area-weighted where it
     * emits nothing). The environment and the sources stay as they are, after the groups.
     *
     * @param groups  group name → the names of its surface nodes; every surface node in exactly one
     */
    public PairExchange grouped(Map<String, List<String>> groups) {
        int m = nodes.size();
        int g = groups.size();
        int[] to = new int[m];
        Arrays.fill(to, -1);
        List<String> names = new ArrayList<>(groups.keySet());
        List<Kind> kindsOut = new ArrayList<>();
        for (int a = 0; a < g; a++) {
            kindsOut.add(Kind.SURFACE);
            for (String member : groups.get(names.get(a))) {
                to[nodes.indexOf(member)] = a;
            }
        }
        int next = g;
        for (int i = surfaces; i < m; i++) {
            to[i] = next++;
            names.add(nodes.get(i));
            kindsOut.add(kinds.get(i));
        }
        for (int i = 0; i < surfaces; i++) {
            if (to[i] < 0) {
                throw new IllegalArgumentException("surface node " + nodes.get(i) + " is in no group");
            }
        }
        int mo = names.size();
        double[][] q = new double[bandQ.length][mo * mo];
        double[][] b = new double[bandQ.length][g * (g + 1)];
        double[][] e = new double[bandQ.length][g];
        double[] cond = new double[mo * mo];
        double[] groupArea = new double[g];
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < m; j++) {
                if (to[i] != to[j]) {
                    cond[to[i] * mo + to[j]] += conductance_W_per_K(i, j);
                }
            }
        }
        for (int k = 0; k < bandQ.length; k++) {
            double[] s = new double[g * (g + 1)];
            double[] wArea = new double[g * (g + 1)];
            for (int i = 0; i < m; i++) {
                for (int j = 0; j < m; j++) {
                    if (to[i] != to[j]) {
                        q[k][to[i] * mo + to[j]] += bandNetHeat_W(k, i, j);
                    }
                }
            }
            for (int i = 0; i < surfaces; i++) {
                e[k][to[i]] += emitting[k][i];
                if (k == 0) {
                    groupArea[to[i]] += area[i];
                }
                for (int j = 0; j <= surfaces; j++) {
                    int col = j < surfaces ? to[j] : g;
                    double bij = gebhart[k][i * (surfaces + 1) + j];
                    s[to[i] * (g + 1) + col] += emitting[k][i] * bij;
                    wArea[to[i] * (g + 1) + col] += area[i] * bij;
                }
            }
            for (int a = 0; a < g; a++) {
                for (int c = 0; c <= g; c++) {
                    b[k][a * (g + 1) + c] = e[k][a] > 0 ? s[a * (g + 1) + c] / e[k][a] : wArea[a * (g + 1) + c] / groupArea[a];
                }
            }
        }
        for (int x = 0; x < mo * mo; x++) {
            if (kindsOut.get(x / mo) == Kind.SOURCE || kindsOut.get(x % mo) == Kind.SOURCE) {
                cond[x] = Double.NaN;
            }
        }
        return new PairExchange(names, kindsOut, q, b, e, cond, groupArea);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PairExchange p && nodes.equals(p.nodes) && kinds.equals(p.kinds)
                && Arrays.deepEquals(bandQ, p.bandQ) && Arrays.deepEquals(gebhart, p.gebhart)
                && Arrays.deepEquals(emitting, p.emitting) && Arrays.equals(conductance, p.conductance) && Arrays.equals(area, p.area);
    }

    @Override
    public int hashCode() {
        return 31 * nodes.hashCode() + Arrays.deepHashCode(bandQ);
    }

    @Override
    public String toString() {
        return "PairExchange[" + nodes.size() + " nodes, " + bandQ.length + " bands]";
    }
}
