package org.exitance.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.exitance.audit.AuditResult;
import org.exitance.model.Material;
import org.exitance.properties.MaterialSurvey;
import org.exitance.report.MaterialTableWriter;
import org.exitance.report.html.Html.Cell;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SolveResult;
import org.exitance.result.SurfaceResult;
import org.exitance.spectral.source.IrradiationSource;

/**
 * The offline HTML reports of {@code solve}, {@code audit} and {@code material}: one
 * self-contained page each, which loads nothing (libraries, pictures and data are inside it).
 * Reads results; computes no physics. The sections are described in docs/report.md.
 */
public final class HtmlReport {
    private HtmlReport() {
    }

    /**
     * The solve report.
     *
     * @param results the solved load cases (one, named as the solve names it, for a case without load cases)
     * @param audits  the gray-body audit of each, or empty when it was not asked for
     */
    public static String solve(ReportCase c, List<LoadCaseResult> results, List<AuditResult> audits) {
        Page page = new Page("Solve report", heading(c), c.file());
        summary(page, c, results.get(0).result(), results);
        boolean several = results.size() > 1;
        Html h = page.section("results", "Results");
        for (LoadCaseResult r : results) {
            if (several) {
                h.h3("Load case " + r.name() + (r.description().isEmpty() ? "" : " — " + r.description()));
            }
            ResultSections.results(h, several ? r.name() : "", r.result());
        }
        h.endSection();
        h = page.section("balance", "Energy balance and solver");
        for (LoadCaseResult r : results) {
            ResultSections.balance(h, several ? r.name() : "", r.result());
        }
        h.endSection();
        h = page.section("bands", "Band set");
        ResultSections.bands(h, results.get(0).result());
        h.endSection();
        h = page.section("band-flows", "Heat flows per band");
        for (int i = 0; i < results.size(); i++) {
            LoadCaseResult r = results.get(i);
            ResultSections.bandFlows(h, page.charts, "chart-bands-" + i, several ? r.name() : "", r.result());
        }
        h.endSection();
        if (results.stream().anyMatch(r -> r.result().pairExchange().isPresent())) {
            Html x = page.section("exchange", "Where the heat goes: pair exchange");
            for (int i = 0; i < results.size(); i++) {
                LoadCaseResult r = results.get(i);
                int chart = i;
                r.result().pairExchange().ifPresent(p -> ExchangeSection.write(x, page.charts, "chart-exchange-" + chart,
                        several ? r.name() : "", p, r.result().bands()));
            }
            x.endSection();
        }
        spectra(page, c, results);
        if (!audits.isEmpty()) {
            Html a = page.section("audit", "Gray-body audit");
            audits.forEach(x -> PropertySections.audit(a, c.title(), x));
            a.endSection();
        }
        if (c.scene() != null) {
            ModelSection.write(page, c.scene(), results);
        }
        return page.render();
    }

    /** The transient report: the run's charts, the model at its output instants, events and energy. */
    public static String transientRun(ReportCase c, org.exitance.timeline.TransientResult r) {
        return TransientReport.write(c, r);
    }

    /** The audit report: summary, band set, the audit of every (load) case, and the spectra. */
    public static String audit(ReportCase c, List<AuditResult> audits) {
        Page page = new Page("Gray-body audit report", heading(c), c.file());
        List<LoadCaseResult> bandResults = audits.stream()
                .map(a -> new LoadCaseResult(a.name(), "", a.band())).toList();
        summary(page, c, audits.get(0).band(), bandResults);
        Html h = page.section("audit", "Gray-body audit");
        audits.forEach(a -> PropertySections.audit(h, c.title(), a));
        h.endSection();
        Html b = page.section("bands", "Band set (the band-wise reference)");
        ResultSections.bands(b, audits.get(0).band());
        b.endSection();
        spectra(page, c, bandResults);
        return page.render();
    }

    /**
     * The material report: per material its survey table and its spectral plot.
     *
     * @param plotTemperaturesK the temperatures of the Planck curves, ascending; not modified
     */
    public static String material(String file, String title, List<MaterialSurvey> surveys,
                                  double[] plotTemperaturesK, List<String> warnings) {
        Page page = new Page("Material report", title.isEmpty() ? file : title, file);
        Html h = page.section("summary", "Summary");
        List<String> lines = new ArrayList<>();
        lines.add("File: " + file + (title.isEmpty() ? "" : " — " + title));
        if (!surveys.isEmpty()) {
            surveys.get(0).sources().forEach(s -> lines.add("Source: " + MaterialTableWriter.describe(s)));
        }
        h.list(lines);
        page.caution();
        warnings(h, warnings);
        h.endSection();
        Html t = page.section("tables", "Total properties");
        t.p("ε: total hemispherical emissivity at the surface temperature T. α: total absorptivity of the diffuse"
                + " surface at T for the source (Kirchhoff: α_λ = ε_λ). ρ: total reflectivity for a blackbody at T.");
        surveys.forEach(x -> PropertySections.survey(t, x));
        t.endSection();
        Html s = page.section("spectra", "Spectral properties and Planck curves");
        PropertySections.spectra(s, surveys.stream().map(MaterialSurvey::material).toList(), plotTemperaturesK,
                surveys.isEmpty() ? List.of() : surveys.get(0).sources(), java.util.Map.of());
        s.endSection();
        return page.render();
    }

    private static String heading(ReportCase c) {
        return c.title().isEmpty() ? c.file() : c.title();
    }

    private static void summary(Page page, ReportCase c, SolveResult first, List<LoadCaseResult> results) {
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(row("Surfaces", Integer.toString(first.surfaces().size())));
        rows.add(row("Bands", first.bands().size() + " (" + first.bandOrigin() + ")"));
        if (c.scene() != null) {
            rows.add(row("Geometry", c.scene().surfaceCount() + " surfaces, " + c.scene().facetCount() + " facets"
                    + (first.facets().isEmpty() ? "" : "; solved facet by facet")));
        }
        if (results.size() > 1 || !results.get(0).name().equals("as given")) {
            rows.add(row("Load cases", String.join(", ", results.stream().map(LoadCaseResult::name).toList())));
        }
        summary(page, c, rows);
    }

    /**
     * The case summary section: the case's file, title, notes, materials and enclosure, then the
     * given rows and the case's facts; the caution; the warnings. Marks the page as invented data
     * where the case says so.
     *
     * @param more rows particular to the report (item, value); not modified
     */
    static void summary(Page page, ReportCase c, List<List<Cell>> more) {
        page.inventedLabel(c.title(), c.notes());
        Html h = page.section("summary", "Case summary");
        List<List<Cell>> rows = new ArrayList<>();
        rows.add(row("Case file", c.file()));
        rows.add(row("Title", c.title()));
        if (!c.notes().isEmpty()) {
            rows.add(row("Notes", c.notes()));
        }
        rows.add(row("Materials", String.join(", ", c.materials().stream().map(Material::name).toList())));
        rows.add(row("Enclosure", Double.isNaN(c.environmentK()) ? "closed"
                : "open to an environment at " + org.exitance.report.Numbers.temperature(c.environmentK()) + " K"));
        rows.addAll(more);
        c.facts().forEach(f -> rows.add(row("Note", f)));
        h.table("class=\"summary\"", "The case", List.of("Item", "Value"), rows, null);
        page.caution();
        warnings(h, c.warnings());
        h.endSection();
    }

    /** A row of two text cells. */
    static List<Cell> row(String item, String value) {
        return List.of(Cell.text(item), Cell.text(value));
    }

    private static void warnings(Html h, List<String> warnings) {
        if (!warnings.isEmpty()) {
            h.raw("<div class=\"warning\"><p><strong>Warnings</strong></p>");
            h.list(warnings);
            h.raw("</div>\n");
        }
    }

    /** The spectra of the case's materials against the Planck curves of its temperatures. */
    private static void spectra(Page page, ReportCase c, List<LoadCaseResult> results) {
        TreeSet<Double> temps = new TreeSet<>();
        for (LoadCaseResult r : results) {
            for (SurfaceResult s : r.result().surfaces()) {
                temps.add(Math.rint(s.temperatureK() * 100) / 100);
            }
        }
        if (!Double.isNaN(c.environmentK())) {
            temps.add(c.environmentK());
        }
        double[] t = temps.stream().mapToDouble(Double::doubleValue).toArray();
        List<IrradiationSource> sources = c.sources();
        Html h = page.section("spectra", "Spectral properties against the case's temperatures");
        PropertySections.spectra(h, c.materials(), t, sources, c.materialOf());
        h.endSection();
    }
}
