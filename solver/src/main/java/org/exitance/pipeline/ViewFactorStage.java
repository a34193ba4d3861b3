package org.exitance.pipeline;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseGeometry;
import org.exitance.geometry.viewfactor.ClosureDiagnostics;
import org.exitance.geometry.viewfactor.MethodCounts;
import org.exitance.geometry.viewfactor.ProgressListener;
import org.exitance.geometry.viewfactor.SmoothingReport;
import org.exitance.geometry.viewfactor.ViewFactorCalculator;
import org.exitance.geometry.viewfactor.ViewFactorResult;
import org.exitance.model.MemoryBudget;

/**
 * Gets a geometry's surface view factors: from the cache beside the case when its geometry hash
 * matches, else by computing them (and then writing the cache). The cache file is
 * {@code <case file name>.vfcache} (JSON) in the case's directory; it is written to a temporary
 * file and moved into place, so an interrupted run never leaves a corrupt cache, and a cache whose
 * hash or content does not match is ignored and replaced.
 */
public final class ViewFactorStage {
    private static final ObjectMapper JSON = new ObjectMapper();
    static final String SUFFIX = ".vfcache";

    /**
     * How to get view factors.
     *
     * @param useCache  read and write the cache
     * @param progress  progress listener (fraction of facet pairs done)
     * @param cancel    polled between facet rows; true stops the computation
     * @param tolerance view-factor tolerance that replaces the case's, or null to keep it
     */
    public record Request(boolean useCache, ProgressListener progress, BooleanSupplier cancel, Double tolerance) {
        /** Cache on, no progress, no cancellation. */
        public static final Request DEFAULT = new Request(true, ProgressListener.NONE, () -> false, null);

        /** Without a tolerance override. */
        public Request(boolean useCache, ProgressListener progress, BooleanSupplier cancel) {
            this(useCache, progress, cancel, null);
        }

        /** @return a copy with this tolerance override (null: none) */
        public Request withTolerance(Double tol) {
            return new Request(useCache, progress, cancel, tol);
        }
    }

    private ViewFactorStage() {
    }

    /** Whether a geometry's view factors are held compressed (its storage, or the size rule of {@code auto}). */
    public static boolean compresses(CaseGeometry g) {
        return CompressedStage.chosen(g);
    }

    /** The cache file of a case. */
    public static Path cacheFile(Path caseFile) {
        Path abs = caseFile.toAbsolutePath();
        return abs.resolveSibling(abs.getFileName() + SUFFIX);
    }

    /**
     * @param facets also keep the facet-level factors (for a case solved on facets); the cache holds
     *               surface factors only, so it is then neither read nor written
     */
    static ComputedViewFactors obtain(Path caseFile, CaseGeometry g, Request req, boolean facets)
            throws CaseException {
        return obtain(caseFile, g, req, facets, false);
    }

    /**
     * @param open whether an environment takes what the rows leave (a compressed operator is then
     *             not closed by scaling)
     */
    static ComputedViewFactors obtain(Path caseFile, CaseGeometry g, Request req, boolean facets, boolean open)
            throws CaseException {
        boolean compressed = CompressedStage.chosen(g);
        String hash = org.exitance.geometry.viewfactor.GeometryHash.of(g.scene(), g.options())
                + (compressed ? "-compressed" : "");
        Path cache = cacheFile(caseFile);
        boolean useCache = req.useCache() && !facets;
        if (useCache) {
            ComputedViewFactors hit = read(cache, hash);
            if (hit != null) {
                return hit;
            }
        }
        if (compressed) {
            ComputedViewFactors out = CompressedStage.compute(caseFile, g, req, open, facets);
            if (useCache) {
                write(cache, out);
            }
            return out;
        }
        int n = g.scene().facetCount();
        try {
            MemoryBudget.require(what(n), memoryNeed(n, facets));
        } catch (MemoryBudget.Exceeded e) {
            throw new CaseException(caseFile, "$.geometry", e.getMessage());
        }
        ViewFactorResult r;
        try {
            r = ViewFactorCalculator.compute(g.scene(), g.options(), req.progress(), req.cancel());
        } catch (java.util.concurrent.CancellationException e) {
            throw new CaseException(caseFile, "$.geometry", "view-factor computation cancelled; nothing was cached");
        } catch (org.exitance.geometry.GeometryException e) {
            throw new CaseException(caseFile, "$.geometry", e.getMessage());
        }
        ComputedViewFactors out = summarize(r, facets);
        if (useCache) {
            write(cache, out);
        }
        return out;
    }

    /**
     * Bytes the view factors of a geometry need at their peak: the facet matrix (N² doubles) and
     * the per-chunk row errors; for a case solved on facets also the facet factors kept for the
     * solve and their copy in the solve's order.
     *
     * @param facets   facets of the geometry
     * @param onFacets whether the case is solved on facets
     */
    public static long memoryNeed(int facets, boolean onFacets) {
        long matrix = MemoryBudget.squareMatrixBytes(facets);
        long chunks = MemoryBudget.saturatedProduct(64L * facets, MemoryBudget.DOUBLE_BYTES);
        return MemoryBudget.saturatedSum(MemoryBudget.saturatedProduct(matrix, onFacets ? 3 : 1), chunks);
    }

    /**
     * The memory check of {@link #obtain} against given figures, so that a model can be tried
     * under a small heap without allocating it.
     *
     * @throws CaseException at {@code $.geometry} when the view factors do not fit
     */
    public static void requireMemory(Path caseFile, int facets, boolean onFacets, long availableBytes, long maxBytes)
            throws CaseException {
        try {
            MemoryBudget.require(what(facets), memoryNeed(facets, onFacets), availableBytes, maxBytes);
        } catch (MemoryBudget.Exceeded e) {
            throw new CaseException(caseFile, "$.geometry", e.getMessage());
        }
    }

    private static String what(int facets) {
        return "the view factors of " + facets + " facets";
    }

    private static ComputedViewFactors summarize(ViewFactorResult r, boolean facets) {
        ClosureDiagnostics c = r.facetClosure();
        MethodCounts m = r.methodCounts();
        String methods = String.format(java.util.Locale.ROOT,
                "%d pairs: %d contour integral, %d area quadrature, %d clipped, %d partly hidden (sampled),"
                        + " %d hidden, %d facing away or coplanar",
                m.total(), m.contour(), m.quadrature(), m.clipped(), m.partlyHidden(), m.hidden(), m.zero())
                + (m.curvedExact() + m.curvedOnPolygons() == 0 ? "" : String.format(java.util.Locale.ROOT,
                        "; with a curved side: %d on the exact shapes, %d on their polygons (something round may be in"
                                + " the way; the shape error is in the estimate)", m.curvedExact(), m.curvedOnPolygons()));
        SmoothingReport s = r.smoothing();
        String smoothing = s.applied() ? String.format(java.util.Locale.ROOT,
                "%s: largest change %.3g, rms change %.3g, %d entries held at 0", s.mode(), s.maxChange(),
                s.rmsChange(), s.clampedToZero()) : "none";
        return new ComputedViewFactors(r.surfaceNames(), r.surfaceAreas(), r.surfaceMatrix(), r.environmentFactors(),
                r.facetCount(), c.maxRowSumError(), c.maxNegativeRemainder(), c.maxReciprocityError(), c.worstRow(),
                r.maxRowErrorEstimate(), methods, smoothing, r.geometryHash(), r.seconds(), false,
                facets ? facetFactors(r) : null);
    }

    private static ComputedViewFactors.FacetFactors facetFactors(ViewFactorResult r) {
        int n = r.facetCount();
        double[] f = new double[n * n];
        double[] row = new double[n];
        for (int i = 0; i < n; i++) {
            r.copyFacetRow(i, row);
            System.arraycopy(row, 0, f, i * n, n);
        }
        return new ComputedViewFactors.FacetFactors(r.facetAreas(), r.facetSurfaces(), f);
    }

    /** The cached numbers if the file exists, parses and carries this hash; else null. */
    private static ComputedViewFactors read(Path cache, String hash) {
        if (!Files.isRegularFile(cache)) {
            return null;
        }
        try {
            JsonNode n = JSON.readTree(cache.toFile());
            if (!hash.equals(n.path("geometryHash").asText())) {
                return null;
            }
            List<String> names = new ArrayList<>();
            n.get("surfaceNames").forEach(x -> names.add(x.asText()));
            int k = names.size();
            double[] areas = doubles(n.get("areas_m2"), k);
            double[] env = doubles(n.get("environmentFactors"), k);
            double[][] f = new double[k][];
            for (int i = 0; i < k; i++) {
                f[i] = doubles(n.get("matrix").get(i), k);
            }
            return new ComputedViewFactors(names, areas, f, env, n.get("facetCount").asInt(),
                    n.get("maxRowSumDeviation").asDouble(), n.get("maxRowSumExcess").asDouble(),
                    n.get("maxReciprocityError").asDouble(), n.get("worstRow").asText(),
                    n.get("maxRowErrorEstimate").asDouble(), n.get("methods").asText(), n.get("smoothing").asText(),
                    hash, 0, true, null);
        } catch (IOException | RuntimeException e) {
            return null; // unreadable or from another version: recompute and replace
        }
    }

    private static double[] doubles(JsonNode a, int k) {
        if (a == null || !a.isArray() || a.size() != k) {
            throw new IllegalStateException("cache entry of the wrong size");
        }
        double[] out = new double[k];
        for (int i = 0; i < k; i++) {
            out[i] = a.get(i).doubleValue();
        }
        return out;
    }

    private static void write(Path cache, ComputedViewFactors v) throws CaseException {
        ObjectNode n = JSON.createObjectNode();
        n.put("program", "exitance");
        n.put("note", "view-factor cache: written by exitance, safe to delete");
        n.put("geometryHash", v.geometryHash());
        ArrayNode names = n.putArray("surfaceNames");
        v.surfaceNames().forEach(names::add);
        ArrayNode areas = n.putArray("areas_m2");
        for (double a : v.areasM2()) {
            areas.add(a);
        }
        ArrayNode env = n.putArray("environmentFactors");
        for (double a : v.environmentFactors()) {
            env.add(a);
        }
        ArrayNode m = n.putArray("matrix");
        for (double[] row : v.matrix()) {
            ArrayNode r = m.addArray();
            for (double x : row) {
                r.add(x);
            }
        }
        n.put("facetCount", v.facetCount());
        n.put("maxRowSumDeviation", v.maxRowSumDeviation());
        n.put("maxRowSumExcess", v.maxRowSumExcess());
        n.put("maxReciprocityError", v.maxReciprocityError());
        n.put("worstRow", v.worstRow());
        n.put("maxRowErrorEstimate", v.maxRowErrorEstimate());
        n.put("methods", v.methodSummary());
        n.put("smoothing", v.smoothing());
        try {
            Path tmp = Files.createTempFile(cache.getParent(), ".exitance-", ".tmp");
            try {
                JSON.writeValue(tmp.toFile(), n);
                Files.move(tmp, cache, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(tmp);
            }
        } catch (IOException e) {
            // a cache that cannot be written costs time next run, not correctness
        }
    }
}
