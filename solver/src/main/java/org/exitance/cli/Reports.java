package org.exitance.cli;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.cases.CaseDescription;
import org.exitance.cases.CaseSource;
import org.exitance.model.EnclosureSurface;
import org.exitance.pipeline.PreparedCase;
import org.exitance.report.html.ReportCase;

/** Gathers what an HTML report says about the case, and writes a report page (see {@link OutputTarget}). */
final class Reports {
    private Reports() {
    }

    /** The case as the report presents it. */
    static ReportCase caseOf(Path caseFile, PreparedCase c) {
        CaseDescription d = c.description();
        Map<String, String> materialOf = new LinkedHashMap<>();
        for (EnclosureSurface s : d.surfaces()) {
            materialOf.put(s.name(), s.material().name());
        }
        List<org.exitance.spectral.source.IrradiationSource> sources = d.sources().stream()
                .map(CaseSource::source).map(org.exitance.model.ExternalSource::spectrum).distinct().toList();
        List<String> facts = new java.util.ArrayList<>();
        if (c.viewFactors() != null) {
            facts.add("View factors: " + (c.shortfall() == null ? "within" : "NOT within") + " the tolerance "
                    + org.exitance.report.Numbers.small(c.viewFactorTolerance()) + " on facet rows (estimated error "
                    + org.exitance.report.Numbers.small(c.viewFactors().maxRowErrorEstimate()) + ", "
                    + (d.environment() == null
                            ? "largest |1 − Σ F| of a facet row "
                                    + org.exitance.report.Numbers.small(c.viewFactors().maxRowSumDeviation())
                            // open: the rows leave their remainder to the environment, so only an excess is an error
                            : "largest excess of a facet row above 1 "
                                    + org.exitance.report.Numbers.small(c.viewFactors().maxRowSumExcess()))
                    + ")");
        }
        return new ReportCase(caseFile.toString(), d.title(), d.notes(), d.materials(), materialOf, sources,
                d.environment() == null ? Double.NaN : d.environment().temperatureK(),
                d.geometry() == null ? null : d.geometry().scene(), facts, c.warnings());
    }

    /** Writes the page to {@code file} (checked with {@link OutputTarget#check} before the work began). */
    static void write(Path file, SharedOptions.Force force, String html) {
        OutputTarget.write(file, force, null, ps -> {
            ps.print(html);
            if (ps.checkError()) {
                throw new UserError(file + ": cannot write the report", ExitCodes.BAD_INPUT);
            }
        });
    }
}
