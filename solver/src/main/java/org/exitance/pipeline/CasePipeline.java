package org.exitance.pipeline;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.exitance.cases.CaseDescription;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseGeometry;
import org.exitance.cases.CaseReader;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.model.ViewFactorMatrix;

/**
 * From a case file to the model a solve takes, in one step that the command line and the
 * validation runner share:
 * <pre>
 *   read (CaseReader: parse and validate, compute nothing)
 *     → view factors (geometry cases: the cache beside the case, or computed: ViewFactorStage)
 *     → facet expansion (cases solved on facets: FacetExpansion)
 *     → source incidence from the geometry (SourceIncidence)
 *     → RadiationCase
 * </pre>
 * The solve ({@code thermal.CaseSolver}), the gray-body audit and the writers follow it.
 * A library user who only wants what the file says calls {@link CaseReader#read} instead, which
 * computes no view factors and writes no cache. Checks that need the view factors (a geometry
 * without an environment must be closed) run here, after every check of the reader; a given
 * matrix that is not reciprocal and closed is made so here ({@link ConsistentViewFactors}).
 */
public final class CasePipeline {
    private CasePipeline() {
    }

    /** Reads a case and prepares it, with the view-factor cache on. */
    public static PreparedCase prepare(Path file) throws CaseException {
        return prepare(file, ViewFactorStage.Request.DEFAULT);
    }

    /** As {@link #prepare(Path)}, with control over the cache, progress and cancellation of view factors. */
    public static PreparedCase prepare(Path file, ViewFactorStage.Request request) throws CaseException {
        return prepare(CaseReader.read(file), request);
    }

    /** Prepares a case already read: view factors, facet expansion, source incidence, the model. */
    public static PreparedCase prepare(CaseDescription d, ViewFactorStage.Request request) throws CaseException {
        CaseGeometry g = d.geometry() != null && request.tolerance() != null
                ? d.geometry().withTolerance(request.tolerance()) : d.geometry();
        List<String> warnings = new ArrayList<>(d.warnings());
        boolean open = d.environment() != null;
        if (d.section() != null) {
            double[][] f = ConsistentViewFactors.forSolve(SectionStage.viewFactors(d, warnings), d.surfaces(), open,
                    d.file(), "$.section", warnings);
            return new PreparedCase(d, surfaceModel(d, f, SourceIncidence.place(d.sources(), null, null)), warnings,
                    null, null, Double.NaN);
        }
        if (g == null) {
            double[][] f = ConsistentViewFactors.forSolve(d.viewFactors(), d.surfaces(), open, d.file(),
                    "$.viewFactors.matrix", warnings);
            RadiationCase model = surfaceModel(d, f, SourceIncidence.place(d.sources(), null, null));
            return new PreparedCase(d, model, warnings, null, null, Double.NaN);
        }
        ComputedViewFactors computed = ViewFactorStage.obtain(d.file(), g, request, g.solveOnFacets(), open);
        String shortfall = ViewFactorAccuracy.shortfall(computed, open, g.tolerance());
        if (shortfall != null) {
            warnings.add(shortfall);
        }
        double[][] f = GeometryViewFactors.inCaseOrder(computed, d.surfaces(), open, d.file(), warnings);
        if (!g.solveOnFacets()) {
            f = ConsistentViewFactors.forSolve(f, d.surfaces(), open, d.file(), "$.geometry", warnings);
            RadiationCase model = surfaceModel(d, f, SourceIncidence.place(d.sources(), g.scene(), null));
            return new PreparedCase(d, model, warnings, computed, shortfall, g.tolerance());
        }
        FacetExpansion.Result facets = FacetExpansion.expand(computed, d.surfaces(), open, d.file(), warnings);
        Enclosure enclosure = enclosure(d, facets.surfaces(), facets.matrix());  // shares the facet matrix
        List<ExternalSource> sources = FacetExpansion.spreadOverFacets(
                SourceIncidence.place(d.sources(), g.scene(), facets.sceneOrder()), facets.groups());
        return new PreparedCase(d, model(d, enclosure, sources, facets), warnings, computed, shortfall,
                g.tolerance());
    }

    /**
     * The model of a case solved on its surfaces: covered surfaces expanded into their packs
     * ({@link CoverExpansion}), the external irradiation aimed at a covered surface moved to its
     * outer face.
     *
     * @param f view factors in case order; not modified
     */
    private static RadiationCase surfaceModel(CaseDescription d, double[][] f, List<ExternalSource> sources)
            throws CaseException {
        if (d.covers().isEmpty()) {
            return model(d, enclosure(d, d.surfaces(), f), sources, null);
        }
        CoverExpansion.Result x = CoverExpansion.expand(d.surfaces(), f, d.covers());
        return model(d, enclosure(d, x.surfaces(), x.matrix()), CoverExpansion.aimAtOuterFaces(sources, x.outer()),
                null);
    }

    /**
     * @param f view factors in the order of {@code surfaces}; not modified (the enclosure copies it)
     */
    private static Enclosure enclosure(CaseDescription d, List<EnclosureSurface> surfaces, double[][] f)
            throws CaseException {
        return enclosure(d, surfaces, ViewFactorMatrix.copyOf(f));
    }

    /** @param f view factors in the order of {@code surfaces}, shared by the enclosure (held once) */
    private static Enclosure enclosure(CaseDescription d, List<EnclosureSurface> surfaces, ViewFactorMatrix f)
            throws CaseException {
        try {
            return new Enclosure(surfaces, f, d.environment(), d.links(), d.walls());
        } catch (IllegalArgumentException e) {
            throw new CaseException(d.file(), "$", e.getMessage());
        }
    }

    private static RadiationCase model(CaseDescription d, Enclosure enclosure, List<ExternalSource> sources,
                                       FacetExpansion.Result facets) {
        return new RadiationCase(d.title(), d.notes(), d.materials(), enclosure, d.bands(), d.settings(), sources,
                d.loadCases(), facets == null ? null : facets.groups());
    }
}
