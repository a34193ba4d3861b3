package org.exitance.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.exitance.audit.AuditResult;
import org.exitance.audit.AuditRow;
import org.exitance.audit.GrayAudit;
import org.exitance.model.Material;
import org.exitance.properties.MaterialSurvey;
import org.exitance.properties.SpectralCurves;
import org.exitance.properties.SurveyRow;
import org.exitance.report.AuditTableWriter;
import org.exitance.report.MaterialTableWriter;
import org.exitance.report.Numbers;
import org.exitance.report.html.Html.Cell;
import org.exitance.spectral.source.IrradiationSource;

/**
 * The property sections: each material's ε(λ), ρ(λ) and τ(λ) against normalised Planck curves
 * (the project's JFreeChart plot, as inline SVG), the material survey tables, and the gray-body
 * audit (table, causes and bar charts).
 */
final class PropertySections {
    /** Most temperatures whose Planck curves one plot shows (as {@code exitance material}). */
    static final int PLOT_TEMPERATURES = 5;

    private PropertySections() {
    }

    /**
     * One plot per material.
     *
     * @param temperaturesK the temperatures whose Planck curves are drawn, ascending (thinned to
     *                      {@value #PLOT_TEMPERATURES}); not modified
     * @param materialOf    surface name → material name, to say which surfaces use each (empty: not said)
     */
    static void spectra(Html h, List<Material> materials, double[] temperaturesK, List<IrradiationSource> sources,
                        java.util.Map<String, String> materialOf) {
        double[] shown = SpectralCurves.pickForPlot(temperaturesK, PLOT_TEMPERATURES);
        h.p("Each plot: the material's spectral emissivity ε(λ) (solid), reflectivity ρ(λ) (dots) and, for a window,"
                + " transmissivity τ(λ) (long dashes), with the Planck curves E_bλ/E_bλ,max of "
                + (shown.length < temperaturesK.length ? shown.length + " of the " + temperaturesK.length + " " : "the ")
                + "temperatures " + join(shown) + " K" + (sources.isEmpty() ? "" : " and the case's sources")
                + ", each scaled to its own peak. Where a Planck curve sits on a stretch of high ε, the surface emits"
                + " and absorbs there.");
        for (Material m : materials) {
            String title = "Material " + m.name() + ": ε(λ), ρ(λ)" + (m.semiTransparent() ? ", τ(λ)" : "")
                    + " and Planck curves";
            List<String> users = materialOf.entrySet().stream().filter(e -> e.getValue().equals(m.name()))
                    .map(java.util.Map.Entry::getKey).sorted().toList();
            String caption = title + (materialOf.isEmpty() ? "" : users.isEmpty() ? "; no surface of the case uses it"
                    : "; used by " + String.join(", ", users));
            h.raw("<figure class=\"plot\" data-material=\"" + Html.esc(m.name()) + "\">"
                    + Svg.spectrum(title, m.description(), SpectralCurves.of(m, shown, sources))
                    + "<figcaption>" + Html.esc(caption) + "</figcaption></figure>\n");
        }
    }

    private static String join(double[] t) {
        List<String> s = new ArrayList<>();
        for (double x : t) {
            s.add(String.format(Locale.ROOT, "%.0f", x));
        }
        return String.join(", ", s);
    }

    /** The survey table of one material: ε, ρ, a window's τ, and α and α/ε per source, by temperature. */
    static void survey(Html h, MaterialSurvey m) {
        boolean window = !m.rows().isEmpty() && m.rows().get(0).window();
        List<String> head = new ArrayList<>(List.of("T, K", "ε"));
        if (window) {
            head.add("τ");
        }
        head.add("ρ");
        for (IrradiationSource s : m.sources()) {
            head.add("α, " + s.label());
            head.add("α/ε, " + s.label());
            if (window) {
                head.add("τ, " + s.label());
            }
        }
        List<List<Cell>> rows = new ArrayList<>();
        for (SurveyRow r : m.rows()) {
            List<Cell> row = new ArrayList<>(List.of(Cell.text(Numbers.temperature(r.temperatureK())),
                    Cell.number(Numbers.ratio(r.totalEmissivity()), "eps")));
            if (window) {
                row.add(Cell.number(Numbers.ratio(r.totalTransmissivity()), ""));
            }
            row.add(Cell.number(Numbers.ratio(r.totalReflectivity()), ""));
            for (int k = 0; k < m.sources().size(); k++) {
                row.add(Cell.number(Numbers.ratio(r.absorptivity(k)), "alpha"));
                row.add(Cell.number(MaterialTableWriter.quotient(r.alphaOverEpsilon(k)), ""));
                if (window) {
                    row.add(Cell.number(Numbers.ratio(r.transmissivity()[k]), ""));
                }
            }
            rows.add(row);
        }
        String kind = m.gray() ? "gray: α = ε for every source"
                : m.temperatureDependent() ? "spectral, depends on temperature" : "spectral, independent of temperature";
        h.table("class=\"survey\" data-material=\"" + Html.esc(m.material().name()) + "\"",
                "Material " + m.material().name() + " — " + kind, head, rows, null);
    }

    /** The gray-body audit of one (load) case: table, causes of the flags, verdict and bar charts. */
    static void audit(Html h, String title, AuditResult a) {
        boolean two = a.twoBand() != null;
        String key = a.name().equals("as given") ? "" : a.name();
        if (!key.isEmpty()) {
            h.h3("Load case " + key);
        }
        h.p("Reference: " + a.band().bands().size() + " bands (" + a.band().bandOrigin() + "). Gray: one band, each"
                + " surface's total ε at its own temperature for emission and absorption." + (two ? " Two-band: solar"
                + " below " + Numbers.wavelength(GrayAudit.TWO_BAND_SPLIT_UM) + " µm with source-weighted absorptance,"
                + " infrared above." : ""));
        List<String> head = new ArrayList<>(List.of("Surface", "Band Q, W", "Gray Q, W"));
        if (two) {
            head.add("Two-band Q, W");
        }
        head.addAll(List.of("Band T, K", "Gray T, K"));
        if (two) {
            head.add("Two-band T, K");
        }
        head.addAll(List.of("Gray error, W", "Gray error, K", "Error, %", "Flag"));
        List<List<Cell>> rows = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        for (AuditRow r : a.rows()) {
            List<Cell> row = new ArrayList<>(List.of(Cell.text(r.surface()), Cell.number(Numbers.power(r.bandNetHeatW()),
                    "q-w"), Cell.number(Numbers.power(r.grayNetHeatW()), "")));
            if (two) {
                row.add(Cell.number(Numbers.power(r.twoBandNetHeatW()), ""));
            }
            row.add(Cell.number(Numbers.temperature(r.bandTemperatureK()), "t-k"));
            row.add(Cell.number(Numbers.temperature(r.grayTemperatureK()), ""));
            if (two) {
                row.add(Cell.number(Numbers.temperature(r.twoBandTemperatureK()), ""));
            }
            row.add(Cell.number(Numbers.power(r.grayErrorW()), ""));
            row.add(Cell.number(String.format(Locale.ROOT, "%.2f", r.grayErrorK()), ""));
            row.add(Cell.number(String.format(Locale.ROOT, "%+.1f", r.grayErrorPct()), "pct"));
            row.add(Cell.text(r.flagged() ? "FLAGGED" : ""));
            rows.add(row);
            keys.add(r.surface());
        }
        h.table("class=\"audit\" data-load-case=\"" + Html.esc(key) + "\"", "Gray-body audit"
                + (key.isEmpty() ? "" : " — load case " + key), head, rows, keys);
        String pct = Numbers.ratio(a.thresholdPct()).replaceAll("0+$", "").replaceAll("\\.$", "");
        h.p("note", "Error %: of |band Q| for a fixed-temperature surface; where the temperature is solved, of its"
                + " emissive power σT⁴. Flagged above " + pct + " %.");
        List<String> causes = new ArrayList<>();
        for (AuditRow r : a.rows()) {
            if (r.flagged()) {
                causes.add(AuditTableWriter.causeLine(r));
            }
        }
        h.list(causes);
        h.p("verdict", "Verdict: " + (a.flaggedCount() == 0 ? "the gray shortcut is within " + pct + " % on every surface."
                : a.flaggedCount() + " of " + a.rows().size() + " surfaces are off by more than the threshold under the"
                + " gray shortcut."));
        h.raw("<figure class=\"plot\">" + Svg.audit(title, a) + "<figcaption>The models side by side per surface"
                + (key.isEmpty() ? "" : ", load case " + Html.esc(key)) + "</figcaption></figure>\n");
    }
}
