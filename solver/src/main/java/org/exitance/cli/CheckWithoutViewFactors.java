package org.exitance.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import org.exitance.cases.CaseDescription;
import org.exitance.model.EnclosureSurface;
import org.exitance.report.Numbers;
import org.exitance.validation.ExpectedReader;
import org.exitance.validation.ExpectedValues;

/**
 * What {@code exitance check} says of a geometry whose view factors would be held compressed
 * (a large model: their computation takes minutes): everything the reader checked, and that the
 * view factors and the checks that need them (closure, a closed geometry that leaks) were left
 * to {@code check --view-factors} or {@code view-factors}.
 */
final class CheckWithoutViewFactors {
    private CheckWithoutViewFactors() {
    }

    static void print(Path caseFile, CaseDescription d, PrintWriter out) throws org.exitance.cases.CaseException {
        out.println("Valid: " + caseFile + (d.title().isEmpty() ? "" : " — " + d.title()));
        long unknown = d.surfaces().stream().filter(s -> s.boundary().temperatureUnknown()).count();
        int facets = d.geometry().scene().facetCount();
        out.println("  surfaces: " + d.surfaces().size() + " (" + unknown + " with unknown temperature) on "
                + String.format(Locale.ROOT, "%,d", facets) + " facets"
                + (d.geometry().solveOnFacets() ? ", solved facet by facet" : "") + "; materials: "
                + d.materials().size() + (d.environment() == null ? "; closed enclosure"
                : "; environment '" + d.environment().name() + "' at "
                + Numbers.temperature(d.environment().temperatureK()) + " K"));
        out.println("  view factors: not computed by check (held compressed, geometry.options.storage; for "
                + String.format(Locale.ROOT, "%,d", facets) + " facets that takes minutes): `exitance check"
                + " --view-factors` also checks them and the bands, `exitance view-factors` prints them");
        for (EnclosureSurface s : d.surfaces()) {
            out.println("  - " + s.name() + ": " + s.material().name() + ", " + s.boundary().label());
        }
        ExpectedValues expected = ExpectedReader.read(d);
        if (expected != null) {
            out.println("  validation case: " + expected.values().size() + " expected values from "
                    + expected.source());
        }
        for (String w : d.warnings()) {
            out.println("  warning: " + w);
        }
        out.flush();
    }
}
