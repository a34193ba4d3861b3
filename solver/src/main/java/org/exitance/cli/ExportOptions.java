package org.exitance.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Surface;
import org.exitance.model.FacetGroups;
import org.exitance.pipeline.PreparedCase;
import org.exitance.report.CsvExport;
import org.exitance.report.VtkWriter;
import org.exitance.result.LoadCaseResult;
import org.exitance.result.SurfaceResult;
import org.exitance.thermal.PairExchangeRule;
import picocli.CommandLine.Option;

/**
 * The pair-exchange and export options of {@code solve}: {@code --exchange WHEN},
 * {@code --conductance}, {@code --csv DIR} and {@code --vtk FILE} (help texts in {@link OptionHelp}). Every file is checked
 * ({@link OutputTarget#check}) before the solve and written through {@link OutputTarget#write}.
 */
final class ExportOptions {
    /** The files {@code --csv DIR} writes. */
    static final String SURFACES = "surfaces.csv";
    static final String BANDS = "bands.csv";
    static final String VIEW_FACTORS = "view-factors.csv";
    static final String PAIRS = "pair-exchange.csv";

    @Option(names = "--exchange", paramLabel = "WHEN", defaultValue = "auto", descriptionKey = "exchange",
            description = "Pair exchange (net heat between every pair of surfaces, Gebhart factors): auto (when the"
                    + " solved enclosure has at most " + PairExchangeRule.AUTO_LIMIT + " surfaces or facets), on,"
                    + " facets (also facet by facet, for a case solved on facets) or off (default ${DEFAULT-VALUE}).")
    private String exchange;

    @Option(names = "--conductance", descriptionKey = "conductance", description = "Also give the linearised radiative conductance of each pair at"
            + " the solved temperatures (W/K) in the table, JSON and CSV.")
    private boolean conductance;

    @Option(names = "--csv", paramLabel = "DIR", descriptionKey = "csv", description = "Also write " + SURFACES + ", " + BANDS + ", "
            + VIEW_FACTORS + " and (with the pair exchange) " + PAIRS + " into DIR (never overwrites without --force;"
            + " a missing DIR needs --create-dirs).")
    private Path csvDir;

    @Option(names = "--vtk", paramLabel = "FILE", descriptionKey = "vtk", description = "Also write the facets of a geometry case with their"
            + " results as VTK legacy polydata (.vtk) to FILE.")
    private Path vtk;

    /** When the solve computes the pair exchange. */
    PairExchangeRule rule() {
        PairExchangeRule r = switch (exchange) {
            case "auto" -> PairExchangeRule.AUTO;
            case "on" -> PairExchangeRule.SURFACES;
            case "facets" -> PairExchangeRule.FACETS;
            case "off" -> PairExchangeRule.NONE;
            default -> throw new UserError("--exchange: '" + exchange + "' is not one of auto, on, facets, off",
                    ExitCodes.BAD_INPUT);
        };
        if (conductance && r == PairExchangeRule.NONE) {
            throw new UserError("--conductance needs the pair exchange; drop --exchange off", ExitCodes.BAD_INPUT);
        }
        return r;
    }

    boolean conductance() {
        return conductance;
    }

    /** Refuses, before the case is read, an option value or a file that may not be written. */
    void checkFiles(SharedOptions.Force force) {
        rule();
        OutputTarget.check(vtk, force);
        if (csvDir != null) {
            for (String name : List.of(SURFACES, BANDS, VIEW_FACTORS)) {
                OutputTarget.check(csvDir.resolve(name), force);
            }
        }
    }

    /** Refuses, before the solve, --vtk without a geometry, and a pair-exchange file that may not be written. */
    void check(PreparedCase c, SharedOptions.Force force) {
        if (vtk != null && c.description().geometry() == null) {
            throw new UserError(c.file() + ": --vtk needs a case with a \"geometry\" (it writes the facets)",
                    ExitCodes.BAD_INPUT);
        }
        if (conductance && !c.model().enclosure().matrix().isDense()) {
            throw new UserError(c.file() + ": --conductance needs the pair exchange, which needs the dense facet view"
                    + " factors; this model holds them compressed (geometry.options.storage)", ExitCodes.BAD_INPUT);
        }
        if (csvDir != null && rule().applies(c.model().enclosure().size())) {
            OutputTarget.check(csvDir.resolve(PAIRS), force);
        }
    }

    /** Writes the files asked for. */
    void write(PreparedCase c, List<LoadCaseResult> results, SharedOptions.Force force) {
        if (csvDir != null) {
            OutputTarget.write(csvDir.resolve(SURFACES), force, null, ps -> CsvExport.surfaces(results, ps));
            OutputTarget.write(csvDir.resolve(BANDS), force, null, ps -> CsvExport.bands(results, ps));
            List<String> names = results.get(0).result().surfaces().stream().map(SurfaceResult::name).toList();
            double[][] f = surfaceMatrix(c, names);
            OutputTarget.write(csvDir.resolve(VIEW_FACTORS), force, null, ps -> CsvExport.viewFactors(names, f, ps));
            if (results.get(0).result().pairExchange().isPresent()) {
                OutputTarget.write(csvDir.resolve(PAIRS), force, null,
                        ps -> CsvExport.pairExchange(results, conductance, ps));
            }
        }
        if (vtk != null) {
            VtkWriter.Facets facets = facets(c);
            OutputTarget.write(vtk, force, null, ps -> VtkWriter.write(c.model().title(), facets, results, ps));
        }
    }

    /** The surface view factors the solve used, in the order of the reported surfaces. */
    private static double[][] surfaceMatrix(PreparedCase c, List<String> names) {
        if (c.model().facetGroups() == null) {
            return c.model().enclosure().viewFactors();
        }
        List<String> computed = c.viewFactors().surfaceNames();
        double[][] f = new double[names.size()][names.size()];
        for (int i = 0; i < names.size(); i++) {
            for (int j = 0; j < names.size(); j++) {
                f[i][j] = c.viewFactors().matrix()[computed.indexOf(names.get(i))][computed.indexOf(names.get(j))];
            }
        }
        return f;
    }

    /** The geometry's facets in scene order, each with its surface and the node carrying its values. */
    private static VtkWriter.Facets facets(PreparedCase c) {
        boolean onFacets = c.model().facetGroups() != null;
        List<double[]> xyz = new ArrayList<>();
        List<String> surface = new ArrayList<>();
        List<String> node = new ArrayList<>();
        for (Surface s : c.description().geometry().scene().surfaces()) {
            int k = 0;
            for (Facet f : s.facets()) {
                xyz.add(f.coordinates());
                surface.add(s.name());
                node.add(onFacets ? FacetGroups.facetName(s.name(), ++k) : s.name());
            }
        }
        return new VtkWriter.Facets(xyz, surface, node);
    }
}
