package org.exitance.pipeline;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseGeometry;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Surface;
import org.exitance.geometry.hierarchy.CompressedOperator;
import org.exitance.geometry.hierarchy.OperatorBuilder;
import org.exitance.geometry.hierarchy.OperatorOptions;
import org.exitance.geometry.hierarchy.OperatorReport;

/**
 * The view factors of a large geometry as a compressed operator (docs/view-factors.md,
 * "Compressed operator"), never forming the N×N facet matrix: built by {@link OperatorBuilder}
 * with the block tolerance a hundredth of the case's view-factor tolerance, closed by symmetric
 * scaling when the geometry is closed. The surface matrix is formed from it by products with the
 * surfaces' indicator vectors (A_S F_ST = Σ_{i∈S} (K' e_T)_i), so reports and the surface solve
 * read it as they read the dense path's.
 *
 * <p>Which storage a case gets ({@link #chosen}): {@code geometry.options.storage}; with
 * {@code auto} (the default) the compressed operator from {@link #AUTO_ABOVE} facets up.
 */
final class CompressedStage {
    /**
     * Facets from which {@code auto} storage compresses. Measured through the tool on the closed
     * benchmark cube, one band, a third unknown, no audit (docs/performance.md): at 4,056 facets
     * dense 15.7 s and 0.86 GB resident against compressed 20.8 s and 0.64 GB; at 10,086 dense
     * 50.9 s and 2.06 GB against compressed 36.0 s and 0.65 GB. The paths cross between the two.
     */
    static final int AUTO_ABOVE = 8_000;
    /**
     * The block tolerance of cross approximation as a share of the case's view-factor tolerance.
     * A tenth was not enough: a 100,000-facet box of elongated facets (200 × 200 × 25 cells) had a
     * sampled row error of 6.0e-6 and a closure change of 8.6e-6 at block tolerance 1e-6, an
     * estimate of 2.1e-5 against the default tolerance 1e-5; a hundredth meets it (docs/performance.md).
     */
    static final double BLOCK_SHARE = 0.01;
    /** Surface columns per product when the surface matrix is formed. */
    private static final int COLUMNS = 32;

    private CompressedStage() {
    }

    /** Whether a geometry's view factors are held compressed. */
    static boolean chosen(CaseGeometry g) {
        return switch (g.storage()) {
            case DENSE -> false;
            case COMPRESSED -> true;
            case AUTO -> g.scene().facetCount() >= AUTO_ABOVE;
        };
    }

    /**
     * @param open     whether an environment takes what the rows leave (then no closure scaling)
     * @param facets   keep the facet operator for a solve on facets
     * @throws CaseException at {@code $.geometry} when it does not fit in memory or is cancelled
     */
    static ComputedViewFactors compute(Path caseFile, CaseGeometry g, ViewFactorStage.Request req, boolean open,
                                       boolean facets) throws CaseException {
        double blockTolerance = Math.min(0.01, Math.max(1e-12, g.tolerance() * BLOCK_SHARE));
        OperatorOptions o = OperatorOptions.defaults().withTolerance(blockTolerance).withClosed(!open)
                .withThreads(g.options().threads());
        CompressedOperator op;
        try {
            op = OperatorBuilder.build(g.scene(), g.options(), o, fraction -> {
                if (req.cancel().getAsBoolean()) {
                    throw new CancellationException("cancelled");
                }
                req.progress().progress(fraction);
            });
        } catch (CancellationException e) {
            throw new CaseException(caseFile, "$.geometry", "view-factor computation cancelled; nothing was cached");
        } catch (GeometryException e) {
            throw new CaseException(caseFile, "$.geometry", e.getMessage());
        }
        return summarize(g, op, open, facets);
    }

    private static ComputedViewFactors summarize(CaseGeometry g, CompressedOperator op, boolean open, boolean facets) {
        List<Surface> surfaces = g.scene().surfaces();
        int m = surfaces.size(), n = op.size();
        int[] surfaceOf = new int[n];
        List<String> names = new ArrayList<>();
        double[] facetArea = new double[n], surfaceArea = new double[m];
        for (int s = 0, f = 0; s < m; s++) {
            names.add(surfaces.get(s).name());
            for (int k = 0; k < surfaces.get(s).facets().size(); k++, f++) {
                surfaceOf[f] = s;
                facetArea[f] = op.area(f);
                surfaceArea[s] += facetArea[f];
            }
        }
        double[][] exchange = surfaceExchange(op, surfaceOf, m);
        double[][] matrix = new double[m][m];
        double[] env = new double[m];
        for (int s = 0; s < m; s++) {
            double sum = 0;
            for (int t = 0; t < m; t++) {
                matrix[s][t] = exchange[s][t] / surfaceArea[s];
                sum += matrix[s][t];
            }
            env[s] = Math.max(0.0, 1 - sum); // a closed geometry's rounding below 0 is no share leaving
        }
        double[] rows = op.rowSums();
        double deviation = 0, excess = 0;
        int worst = 0;
        for (int i = 0; i < n; i++) {
            if (Math.abs(1 - rows[i]) > deviation) {
                deviation = Math.abs(1 - rows[i]);
                worst = i;
            }
            excess = Math.max(excess, rows[i] - 1);
        }
        OperatorReport r = op.report();
        if (!open) { // the closure scaling made the rows 1: state the raw error it removed
            deviation = r.rawRowSumError();
            worst = r.worstRawRow();
        }
        String methods = String.format(Locale.ROOT, "compressed operator: %d near blocks (exact), %d far blocks by"
                + " cross approximation (ranks %d..%d, mean %.1f), %d exchanging nothing; %d pair evaluations"
                + " (%.2f%% of the dense matrix's); %.1f MB (dense: %.1f MB); reciprocal by symmetric storage;"
                + " row error estimate %.2e from %d exact rows (largest sampled %.2e, doubled, plus the closure's"
                + " change) and %.2e of the pairs' own estimates",
                r.nearBlocks(), r.farBlocks() + r.denseFarBlocks(), r.minRank(), r.maxRank(), r.meanRank(),
                r.zeroBlocks(), r.evaluations(), 100.0 * r.evaluations() / Math.max(1, 0.5 * n * (n - 1.0)),
                r.bytes() / 1e6, r.denseBytes() / 1e6, r.errorEstimate(), r.sampledRows(), r.maxRowError(),
                r.pairErrorEstimate());
        String smoothing = r.closureNote() == null ? String.format(Locale.ROOT,
                "closure by symmetric scaling: raw row error %.3g, largest change %.3g, in %d products",
                r.rawRowSumError(), 2 * r.maxScaleDeviation() + r.maxScaleDeviation() * r.maxScaleDeviation(),
                r.closureIterations()) : "none (" + r.closureNote() + ")";
        String hash = org.exitance.geometry.viewfactor.GeometryHash.of(g.scene(), g.options()) + "-compressed";
        return new ComputedViewFactors(names, surfaceArea, matrix, env, n, deviation, Math.max(0, excess), 0,
                worstName(names, surfaceOf, worst), r.totalErrorEstimate(), methods, smoothing, hash, r.buildSeconds(),
                false, facets ? ComputedViewFactors.FacetFactors.ofOperator(facetArea, surfaceOf,
                        new OperatorProducts(op)) : null);
    }

    /** Σ_{i∈S} (K' e_T)_i for every pair of surfaces (m²), by products in blocks of columns. */
    private static double[][] surfaceExchange(CompressedOperator op, int[] surfaceOf, int m) {
        int n = op.size();
        double[][] out = new double[m][m];
        for (int t0 = 0; t0 < m; t0 += COLUMNS) {
            int b = Math.min(COLUMNS, m - t0);
            double[] e = new double[n * b], y = new double[n * b];
            for (int j = 0; j < n; j++) {
                int t = surfaceOf[j] - t0;
                if (t >= 0 && t < b) {
                    e[j * b + t] = 1;
                }
            }
            op.multiplyExchangeAreas(e, b, y);
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < b; c++) {
                    out[surfaceOf[i]][t0 + c] += y[i * b + c];
                }
            }
        }
        return out;
    }

    private static String worstName(List<String> names, int[] surfaceOf, int facet) {
        int k = 0;
        for (int f = 0; f < facet; f++) {
            k += surfaceOf[f] == surfaceOf[facet] ? 1 : 0;
        }
        return org.exitance.model.FacetGroups.facetName(names.get(surfaceOf[facet]), k + 1);
    }
}
