package org.exitance.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.exitance.pipeline.PreparedCase;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.report.Numbers;
import org.exitance.thermal.CaseSolver;
import org.exitance.validation.ExpectedReader;
import org.exitance.validation.ExpectedValues;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code exitance check CASE.json}: validate without solving. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Validate a case without solving.",
                "Reports what was read, the bands a solve would use and the view-factor closure."},
        footer = {"", ExitCodes.HELP})
final class CheckCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE.json", description = "The case file.")
    private Path caseFile;

    @picocli.CommandLine.Mixin
    private SharedOptions.VfTolerance vfTolerance;

    @picocli.CommandLine.Option(names = "--view-factors", description = "Also compute view factors held compressed"
            + " (a large geometry, geometry.options.storage: minutes), with the checks and bands that need them.")
    private boolean viewFactors;

    @Override
    public Integer call() throws Exception {
        if (!viewFactors) {
            org.exitance.cases.CaseDescription d = org.exitance.cases.CaseReader.read(caseFile);
            if (d.geometry() != null && org.exitance.pipeline.ViewFactorStage.compresses(d.geometry())) {
                CheckWithoutViewFactors.print(caseFile, d, spec.commandLine().getOut());
                return ExitCodes.OK;
            }
        }
        PreparedCase c = Runs.load(caseFile, vfTolerance.request());
        Runs.preflight(c);
        PrintWriter out = spec.commandLine().getOut();
        Enclosure e = c.model().enclosure();
        out.println("Valid: " + caseFile + (c.model().title().isEmpty() ? "" : " — " + c.model().title()));
        long unknown = e.surfaces().stream().filter(s -> s.boundary().temperatureUnknown()).count();
        out.println("  surfaces: " + e.size() + " (" + unknown + " with unknown temperature); materials: "
                + c.model().materials().size() + (e.environment() == null ? "; closed enclosure"
                : "; environment '" + e.environment().name() + "' at "
                + Numbers.temperature(e.environment().temperatureK()) + " K"));
        double worstRow = 0;
        double worstRec = 0;
        for (int i = 0; i < e.size() && e.matrix().isDense(); i++) {
            double sum = 0;
            for (int j = 0; j < e.size(); j++) {
                sum += e.viewFactor(i, j);
                double a = e.surface(i).areaM2() * e.viewFactor(i, j);
                double b = e.surface(j).areaM2() * e.viewFactor(j, i);
                if (Math.max(a, b) > 0) {
                    worstRec = Math.max(worstRec, Math.abs(a - b) / Math.max(a, b));
                }
            }
            worstRow = Math.max(worstRow, e.environment() == null ? Math.abs(1 - sum) : Math.max(0, sum - 1));
        }
        if (e.matrix().isDense()) {
            out.println("  view factors: worst row-sum error " + Numbers.small(worstRow)
                    + ", worst relative reciprocity error " + Numbers.small(worstRec));
        } else {
            out.println("  view factors: " + e.matrix().products().description());
        }
        BandSet given = CaseSolver.givenBands(c.model(), null);
        BandSet bands = given != null ? given : org.exitance.bands.DefaultBandRule.derive(c.model());
        List<Band> list = bands.bands();
        StringBuilder b = new StringBuilder("  bands: " + list.size() + " (" + bands.origin()
                + (given == null && list.size() > 1 ? "; a solve refines them adaptively" : "") + ")");
        for (int k = 1; k < list.size(); k++) {
            b.append(k == 1 ? ", edges µm: " : " ").append(Numbers.wavelength(list.get(k).lowerUm()));
        }
        out.println(b);
        if (c.viewFactors() != null) {
            out.println("  view factors: from geometry, " + c.viewFactors().facetCount() + " facets"
                    + (c.viewFactors().fromCache() ? " (cached)" : String.format(java.util.Locale.ROOT,
                    " (computed in %.2f s%s)", c.viewFactors().seconds(),
                    c.model().facetGroups() == null ? ", now cached" : "; facet factors are not cached")));
        }
        for (EnclosureSurface s : e.surfaces()) {
            out.println("  - " + s.name() + ": " + s.material().name() + ", " + Numbers.area(s.areaM2()) + " m², "
                    + (s.otherFace() == null ? s.boundary().label()
                    : s.boundary() instanceof org.exitance.model.BoundaryCondition.OnOtherFace
                    ? (s.isWindowFace() ? "window" : "two-sided") + " face; its condition is on '" + s.otherFace() + "'"
                    : s.boundary().label() + " (" + (s.isWindowFace() ? "window" : "two-sided") + " face; other face '"
                    + s.otherFace() + "')"));
        }
        printNodesWithTwoFaces(out, e);
        if (c.description().section() != null) {
            var sec = c.description().section();
            out.println("  section: 2-D, " + sec.section().size() + " parts of " + sec.areasM2().size() + " surfaces, "
                    + Numbers.area(sec.section().axialLength_m()) + " m long (crossed strings; heats for the whole length)");
        }
        c.description().covers().forEach((surface, cover) -> out.println("  covered: " + surface + " under "
                + (cover.effective() ? "a pack of effective emittance " + Numbers.ratio(cover.effectiveEmittance())
                : cover.layers() + " layer" + (cover.layers() == 1 ? "" : "s") + " of " + (cover.sharedLayerMaterial()
                ? cover.layerMaterial(1).name() : String.join(", ", cover.layerMaterials().stream().map(m -> m.name()).toList())
                + " (inner to outer)"))
                + ", outer face '" + org.exitance.model.Cover.outerFace(surface) + "' (" + cover.outerMaterial().name()
                + ")"));
        printMaterialFacts(out, c);
        ExpectedValues expected = ExpectedReader.read(c.description());
        if (expected != null) {
            out.println("  validation case: " + expected.values().size() + " expected values from "
                    + expected.source());
        }
        for (String w : c.warnings()) {
            out.println("  warning: " + w);
        }
        out.flush();
        return Runs.exitCode(c, spec.commandLine().getErr());
    }

    /**
     * The materials whose ρ or τ changes with temperature (ρ = 1 − ε − τ, so also an opaque
     * material whose ε does), and the windows checked against a measurement tolerance.
     */
    private static void printMaterialFacts(PrintWriter out, PreparedCase c) {
        List<String> byT = new java.util.ArrayList<>();
        for (org.exitance.model.Material m : c.model().materials()) {
            var d = org.exitance.properties.TemperatureDependence.of(m);
            List<String> which = new java.util.ArrayList<>();
            if (d.transmissivity()) {
                which.add("τ");
            }
            if (d.reflectivity()) {
                which.add(m.semiTransparent() ? "ρ" : "ρ = 1 − ε");
            }
            if (!which.isEmpty()) {
                byT.add(m.name() + " (" + String.join(", ", which) + ")");
            }
        }
        if (!byT.isEmpty()) {
            out.println("  temperature-dependent τ or ρ: " + String.join("; ", byT));
        }
        List<String> tol = new java.util.ArrayList<>();
        c.description().measurementTolerances().forEach((name, t) -> tol.add(name + " "
                + Numbers.ratio(t.value()) + (t.stated() ? " (measurementTolerance)" : " (default)")));
        if (!tol.isEmpty()) {
            out.println("  measured ε, ρ and τ, accepted within |α + ρ + τ − 1| ≤: " + String.join("; ", tol));
        }
    }

    /** One line each for the two-sided plates and the windows: their face pairs, by the face with the condition. */
    private static void printNodesWithTwoFaces(PrintWriter out, Enclosure e) {
        StringBuilder plates = new StringBuilder();
        StringBuilder windows = new StringBuilder();
        for (EnclosureSurface s : e.surfaces()) {
            if (s.otherFace() == null || s.boundary() instanceof org.exitance.model.BoundaryCondition.OnOtherFace) {
                continue;
            }
            StringBuilder b = s.isWindowFace() ? windows : plates;
            b.append(b.length() == 0 ? "" : ", ").append(s.name()).append(" + ").append(s.otherFace());
        }
        if (plates.length() > 0) {
            out.println("  two-sided plates (one node, two faces): " + plates);
        }
        if (windows.length() > 0) {
            out.println("  windows (one node, two faces): " + windows);
        }
    }
}
