package org.exitance.report;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.exitance.properties.MaterialSurvey;
import org.exitance.properties.SurveyRow;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * Writes material property surveys as readable text: per material a table of surface
 * temperature, total emissivity, total reflectivity (and a window's transmissivity), and α and α/ε for every source. Reads the surveys; computes
 * no physics.
 */
public final class MaterialTableWriter {

    private MaterialTableWriter() {
    }

    /**
     * @param fileLabel where the materials came from, e.g. "cases/materials/white-paint.json (material file)"
     * @param title     the file's title, may be empty
     * @param surveys   one per material, all with the same sources
     */
    public static void write(String fileLabel, String title, List<MaterialSurvey> surveys, PrintStream out) {
        out.println("Exitance " + Version.get() + " — material properties");
        out.println("File: " + fileLabel + (title.isEmpty() ? "" : " — " + title));
        if (!surveys.isEmpty()) {
            List<IrradiationSource> sources = surveys.get(0).sources();
            for (IrradiationSource s : sources) {
                out.println("Source: " + describe(s));
            }
        }
        for (MaterialSurvey m : surveys) {
            out.println();
            writeOne(m, out);
        }
        out.println();
        out.println("ε: total hemispherical emissivity at the surface temperature T. α: total absorptivity of the"
                + " diffuse surface at T for the source (Kirchhoff: α_λ = ε_λ).");
        TableFooter.write(out);
    }

    /** One line describing a source. */
    public static String describe(IrradiationSource s) {
        if (s instanceof SourceSpectrum g) {
            return "spectrum " + g.label() + ": " + Numbers.wavelength(g.firstUm()) + "–" + Numbers.wavelength(g.lastUm())
                    + " µm, " + g.wavelengthUm().length + " samples, total " + Numbers.power(g.totalIrradianceWM2())
                    + " W/m² (zero outside the sampled range)";
        }
        BlackbodySource b = (BlackbodySource) s;
        return "blackbody at " + Numbers.temperature(b.temperatureK()) + " K";
    }

    /** Short column name of a source: "5772 K" for a blackbody, "spectrum" for the (only) tabulated one. */
    private static String column(IrradiationSource s) {
        return s instanceof SourceSpectrum ? "spectrum" : s.label().replace(" blackbody", "");
    }

    private static void writeOne(MaterialSurvey m, PrintStream out) {
        String kind = m.gray() ? "gray: α = ε for every source"
                : m.temperatureDependent() ? "spectral, depends on temperature" : "spectral, independent of temperature";
        out.println("Material " + m.material().name() + " — " + kind);
        if (!m.material().description().isEmpty()) {
            out.println("  " + m.material().description());
        }
        boolean window = !m.rows().isEmpty() && m.rows().get(0).window();
        List<String> headers = new ArrayList<>(List.of("T K", "ε"));
        if (window) {
            headers.add("τ");
        }
        headers.add("ρ");
        for (IrradiationSource s : m.sources()) {
            headers.add("α " + column(s));
            headers.add("α/ε " + column(s));
            if (window) {
                headers.add("τ " + column(s));
            }
        }
        boolean[] numeric = new boolean[headers.size()];
        Arrays.fill(numeric, true);
        TextTable t = new TextTable(headers, numeric);
        for (SurveyRow r : m.rows()) {
            List<String> cells = new ArrayList<>(List.of(Numbers.temperature(r.temperatureK()),
                    Numbers.ratio(r.totalEmissivity())));
            if (window) {
                cells.add(Numbers.ratio(r.totalTransmissivity()));
            }
            cells.add(Numbers.ratio(r.totalReflectivity()));
            for (int k = 0; k < m.sources().size(); k++) {
                cells.add(Numbers.ratio(r.absorptivity(k)));
                cells.add(quotient(r.alphaOverEpsilon(k)));
                if (window) {
                    cells.add(Numbers.ratio(r.transmissivity()[k]));
                }
            }
            t.row(cells);
        }
        t.render(2).forEach(out::println);
        if (!window) {
            out.println("  (ρ: total reflectivity for a blackbody at T, ρ = 1 − ε for an opaque material)");
        } else {
            out.println("  (τ, ρ: total transmissivity and reflectivity for a blackbody at T, ρ = 1 − ε − τ; τ for a"
                    + " source: the share of its radiation that passes)");
        }
    }

    /** α/ε to three decimals; "∞" for ε = 0 with α &gt; 0, "—" for 0/0. */
    public static String quotient(double q) {
        if (Double.isNaN(q)) {
            return "—";
        }
        if (Double.isInfinite(q)) {
            return "∞";
        }
        return String.format(Locale.ROOT, "%.3f", q);
    }
}
