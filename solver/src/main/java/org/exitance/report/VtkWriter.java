package org.exitance.report;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.exitance.model.Band;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;

/**
 * The facets of a geometry case with their results, as a VTK legacy ASCII polydata file (VTK
 * User's Guide, 11th ed., "VTK File Formats", legacy format: DATASET POLYDATA, POINTS, POLYGONS,
 * CELL_DATA; from memory). One polygon per facet, each with its own vertices (lengths in m).
 *
 * <p>Cell data (one value per facet): {@code surface_id}, the 0-based index of the facet's surface
 * in the result's surface order; {@code temperature_K}; {@code netFlux_W_m2}; and per band
 * {@code bandNetFlux_W_m2_<k>} (k from 1, band edges listed in the data set's field data). VTK cell
 * data are numbers, so the surface names travel as a lookup: the data set's field data hold
 * {@code surface_name}, a string array whose entry {@code surface_id} names the facet's surface
 * (characters other than printable ASCII, a space and '%' are written %XX, as VTK's own writer
 * encodes strings), and {@code band_edges_um}, the lower and upper edge of each band (−1 for an
 * unbounded upper edge). For a case solved on facets the values are each facet's own; otherwise a
 * facet carries its surface's. With several load cases, each array name starts with the load case
 * name ({@code <loadCase>_temperature_K}; characters outside [A-Za-z0-9_] become '_').
 * Reads results; computes no physics.
 */
public final class VtkWriter {
    /**
     * The facets to write.
     *
     * @param coordinates per facet, its vertices x0 y0 z0 x1 … (m), in order around the facet; not modified
     * @param surface     per facet, the name of its surface (as in the result's surfaces)
     * @param node        per facet, the name of the node that carries its values: the surface, or
     *                    for a case solved on facets the facet's own name (as in the result's facets)
     */
    public record Facets(List<double[]> coordinates, List<String> surface, List<String> node) {
        public Facets {
            coordinates = List.copyOf(coordinates);
            surface = List.copyOf(surface);
            node = List.copyOf(node);
            if (surface.size() != coordinates.size() || node.size() != coordinates.size()) {
                throw new IllegalArgumentException("VTK facets: inconsistent lengths");
            }
        }
    }

    private VtkWriter() {
    }

    /**
     * @throws IllegalArgumentException when a facet's surface or node has no result
     */
    public static void write(String title, Facets f, List<LoadCaseResult> results, PrintStream out) {
        SolveResult first = results.get(0).result();
        List<String> surfaces = first.surfaces().stream().map(SurfaceResult::name).toList();
        int cells = f.coordinates().size();
        int points = 0;
        int size = 0;
        for (double[] c : f.coordinates()) {
            points += c.length / 3;
            size += 1 + c.length / 3;
        }
        out.print("# vtk DataFile Version 3.0\n");
        String head = ("Exitance " + Version.get() + ": " + title).replaceAll("[\\r\\n]", " ");
        out.print((head.length() > 250 ? head.substring(0, 250) : head) + "\n");
        out.print("ASCII\nDATASET POLYDATA\n");
        List<Band> bands = first.bands();
        out.print("FIELD FieldData 2\n");
        out.print("surface_name 1 " + surfaces.size() + " string\n");
        for (String s : surfaces) {
            out.print(encode(s) + "\n");
        }
        out.print("band_edges_um 2 " + bands.size() + " double\n");
        for (Band b : bands) {
            out.print(num(b.lowerUm()) + " " + (Double.isInfinite(b.upperUm()) ? "-1" : num(b.upperUm())) + "\n");
        }
        out.print("POINTS " + points + " double\n");
        for (double[] c : f.coordinates()) {
            for (int v = 0; v < c.length; v += 3) {
                out.print(num(c[v]) + " " + num(c[v + 1]) + " " + num(c[v + 2]) + "\n");
            }
        }
        out.print("POLYGONS " + cells + " " + size + "\n");
        int next = 0;
        for (double[] c : f.coordinates()) {
            StringBuilder b = new StringBuilder().append(c.length / 3);
            for (int v = 0; v < c.length / 3; v++) {
                b.append(' ').append(next++);
            }
            out.print(b + "\n");
        }
        out.print("CELL_DATA " + cells + "\n");
        out.print("SCALARS surface_id int 1\nLOOKUP_TABLE default\n");
        for (String s : f.surface()) {
            int id = surfaces.indexOf(s);
            if (id < 0) {
                throw new IllegalArgumentException("facet of '" + s + "': no such surface in the result");
            }
            out.print(id + "\n");
        }
        for (LoadCaseResult lc : results) {
            String prefix = results.size() == 1 ? "" : lc.name().replaceAll("[^A-Za-z0-9_]", "_") + "_";
            List<SurfaceResult> values = new ArrayList<>();
            for (String n : f.node()) {
                values.add(find(lc.result(), n));
            }
            scalars(out, prefix + "temperature_K", values.stream().mapToDouble(SurfaceResult::temperatureK).toArray());
            scalars(out, prefix + "netFlux_W_m2", values.stream().mapToDouble(SurfaceResult::netFluxWPerM2).toArray());
            for (int k = 0; k < lc.result().bands().size(); k++) {
                int band = k;
                scalars(out, prefix + "bandNetFlux_W_m2_" + (k + 1),
                        values.stream().mapToDouble(s -> s.bandNetHeatW()[band] / s.areaM2()).toArray());
            }
        }
    }

    private static SurfaceResult find(SolveResult r, String node) {
        for (SurfaceResult s : r.facets()) {
            if (s.name().equals(node)) {
                return s;
            }
        }
        for (SurfaceResult s : r.surfaces()) {
            if (s.name().equals(node)) {
                return s;
            }
        }
        throw new IllegalArgumentException("facet of '" + node + "': no result for it");
    }

    private static void scalars(PrintStream out, String name, double[] v) {
        out.print("SCALARS " + name + " double 1\nLOOKUP_TABLE default\n");
        for (double x : v) {
            out.print(num(x) + "\n");
        }
    }

    /** A finite number as VTK reads it (no NaN: a value that does not apply is never written). */
    private static String num(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalStateException("a VTK value would be " + v);
        }
        return Double.toString(v); // shortest form that reads back as the same double
    }

    /** Printable ASCII other than '%' kept; everything else (spaces, UTF-8 bytes) as %XX. */
    static String encode(String s) {
        StringBuilder b = new StringBuilder();
        for (byte x : s.getBytes(StandardCharsets.UTF_8)) {
            int c = x & 0xff;
            if (c > 0x20 && c < 0x7f && c != '%') {
                b.append((char) c);
            } else {
                b.append('%').append(String.format(Locale.ROOT, "%02X", c));
            }
        }
        return b.toString();
    }
}
