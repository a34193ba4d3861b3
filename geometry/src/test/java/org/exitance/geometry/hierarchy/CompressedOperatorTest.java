package org.exitance.geometry.hierarchy;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.exitance.geometry.viewfactor.ClosedForms;
import org.exitance.geometry.viewfactor.ProgressListener;
import org.exitance.geometry.viewfactor.ViewFactorCalculator;
import org.exitance.geometry.viewfactor.ViewFactorOptions;
import org.exitance.geometry.viewfactor.ViewFactorResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The compressed operator against the dense facet matrix of the same pair evaluator (the
 * reference; its own accuracy is checked in the viewfactor tests), against closed forms, and
 * against the summation rule of a closed enclosure (Siegel &amp; Howell, <i>Thermal Radiation
 * Heat Transfer</i>, 4th ed., eq. 4.19: Σ_j F_ij = 1). Invented geometry.
 */
class CompressedOperatorTest {

    /** Closed box 1 × 1 × 0.75 m, 20 × 20 × 15 cells: 2,000 square facets. */
    static Scene closedBox() {
        return Scene.of(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 0.75), 20, 20, 15));
    }

    /** Unit box, 18 cells a side (1,944 facets) around a 0.4 × 0.4 × 0.2 m block (8 × 8 × 4 cells: 256 facets). */
    static Scene boxWithBlock() {
        List<Surface> s = new ArrayList<>(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), 18, 18, 18));
        s.addAll(Enclosures.box("block.", new Vec3(0.3, 0.3, 0.4), new Vec3(0.7, 0.7, 0.6), 8, 8, 4, Facing.OUTWARD));
        return Scene.of(s);
    }

    static ViewFactorResult closedDense, blockDense;
    static double[] closedF, blockF;
    static CompressedOperator closedOp, blockOp;

    /** Small leaves, so that these test sizes have far blocks (the default of 96 pays from ~10,000 facets). */
    static OperatorOptions options() {
        return OperatorOptions.defaults().withLeafSize(32);
    }

    @BeforeAll
    static void build() {
        ViewFactorOptions vf = ViewFactorOptions.defaults();
        closedDense = ViewFactorCalculator.compute(closedBox(), vf, ProgressListener.NONE);
        closedF = dense(closedDense);
        closedOp = OperatorBuilder.build(closedBox(), vf, options(), ProgressListener.NONE);
        blockDense = ViewFactorCalculator.compute(boxWithBlock(), vf, ProgressListener.NONE);
        blockF = dense(blockDense);
        // the dense path's obstructed rows are not closed (visibility error ~1e-5 per pair): compare unscaled
        blockOp = OperatorBuilder.build(boxWithBlock(), vf, options().withClosed(false), ProgressListener.NONE);
        System.out.println(closedOp.report().summary());
        System.out.println(blockOp.report().summary());
    }

    static double[] dense(ViewFactorResult r) {
        int n = r.facetCount();
        double[] f = new double[n * n], row = new double[n];
        for (int i = 0; i < n; i++) {
            r.copyFacetRow(i, row);
            System.arraycopy(row, 0, f, i * n, n);
        }
        return f;
    }

    /** Per row Σ_j |F'_ij − F_ij|, F' read column block by column block from products with unit vectors. */
    static double[] rowErrors(CompressedOperator op, double[] f) {
        int n = op.size(), chunk = 64;
        double[] err = new double[n];
        for (int c0 = 0; c0 < n; c0 += chunk) {
            int b = Math.min(chunk, n - c0);
            double[] e = new double[n * b], y = new double[n * b];
            for (int c = 0; c < b; c++) {
                e[(c0 + c) * b + c] = 1;
            }
            op.multiplyViewFactors(e, b, y);
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < b; c++) {
                    err[i] += Math.abs(y[i * b + c] - f[i * n + c0 + c]);
                }
            }
        }
        return err;
    }

    static double max(double[] v) {
        return java.util.Arrays.stream(v).max().orElse(0);
    }

    static double productError(CompressedOperator op, double[] f, int b, long seed) {
        int n = op.size();
        double[] v = new double[n * b], y = new double[n * b];
        Random rnd = new Random(seed);
        for (int k = 0; k < v.length; k++) {
            v[k] = rnd.nextDouble();
        }
        op.multiplyViewFactors(v, b, y);
        double err = 0, scale = 0;
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < b; c++) {
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += f[i * n + j] * v[j * b + c];
                }
                err = Math.max(err, Math.abs(s - y[i * b + c]));
                scale = Math.max(scale, Math.abs(s));
            }
        }
        return err / scale;
    }

    /** Random V (N × b, uniform in [0, 1)): max |(F' V − F V)_ic| / max |(F V)_ic|. */
    static double relativeProductError(CompressedOperator op, double[] f, int b, long seed) {
        return productError(op, f, b, seed);
    }

    @Test
    void closedBoxProductsAgreeWithDenseToTheTolerance() {
        // common practice: a compressed operator is judged by its products against the dense matrix
        OperatorReport r = closedOp.report();
        assertThat(r.farBlocks()).as("far blocks compressed").isGreaterThan(20);
        assertThat(relativeProductError(closedOp, closedF, 3, 1)).isLessThan(r.tolerance());
        double[] rows = rowErrors(closedOp, closedF);
        assertThat(max(rows)).as("measured worst row (l1)").isLessThan(r.errorEstimate());
        assertThat(r.errorEstimate()).isLessThan(10 * r.tolerance());
    }

    @Test
    void obstructedBoxProductsAgreeWithDenseToTheTolerance() {
        // far blocks sampled from the same evaluator see the block in the way
        OperatorReport r = blockOp.report();
        assertThat(r.farBlocks()).as("far blocks compressed").isGreaterThan(5);
        assertThat(relativeProductError(blockOp, blockF, 3, 2)).isLessThan(r.tolerance());
        assertThat(max(rowErrors(blockOp, blockF))).as("measured worst row (l1)").isLessThan(r.errorEstimate());
    }

    @Test
    void meshedCylinderWithManyPlanesAgreesWithDense() {
        // 64 facet columns around: clusters with many planes, normals turning from facet to facet
        Scene cylinder = Scene.of(Enclosures.cylindricalCavity(Vec3.ZERO, new Vec3(0, 0, 1), 0.5, 1.2, 64, 20, 6));
        ViewFactorOptions vf = ViewFactorOptions.defaults();
        double[] f = dense(ViewFactorCalculator.compute(cylinder, vf, ProgressListener.NONE));
        CompressedOperator op = OperatorBuilder.build(cylinder, vf, options(), ProgressListener.NONE);
        System.out.println(op.report().summary());
        assertThat(op.report().farBlocks()).isGreaterThan(20);
        assertThat(relativeProductError(op, f, 2, 4)).isLessThan(op.report().tolerance());
        assertThat(max(rowErrors(op, f))).as("measured worst row (l1)").isLessThan(op.report().errorEstimate());
        assertRowsSumToOne(op);
    }

    /**
     * The self factors of exact concave patches (the wall of a closed cylinder, 16 × 2 patches),
     * read from the near blocks, are the dense matrix's (closure scaling included, within the
     * stated estimate); flat patches give 0.
     */
    @Test
    void selfFactorsOfConcavePatchesComeFromTheNearBlocks() {
        List<Surface> s = new ArrayList<>();
        s.add(new Surface("wall", Shapes.cylinderWall(Vec3.ZERO, Vec3.Z, 0.5, 1, 16, 2,
                Facing.INWARD)));
        s.add(new Surface("base", Shapes.disc(Vec3.ZERO, Vec3.Z, 0.5, 1, 8)));
        s.add(new Surface("lid", Shapes.disc(new Vec3(0, 0, 1), new Vec3(0, 0, -1), 0.5, 1,
                8)));
        Scene cylinder = Scene.of(s);
        ViewFactorOptions vf = ViewFactorOptions.defaults();
        double[] f = dense(ViewFactorCalculator.compute(cylinder, vf, ProgressListener.NONE));
        CompressedOperator op = OperatorBuilder.build(cylinder, vf, options().withLeafSize(8), ProgressListener.NONE);
        int n = op.size(), concave = 0;
        for (int i = 0; i < n; i++) {
            assertThat(op.diagonal(i)).as("F_ii of facet %d", i).isCloseTo(f[i * n + i],
                    within(op.report().errorEstimate()));
            concave += f[i * n + i] > 1e-3 ? 1 : 0;
        }
        assertThat(concave).isEqualTo(32);
    }

    /**
     * Selected rows of F'V, formed row by row from the blocks (few rows) or picked from one full
     * product (many rows), equal the full product's rows to rounding.
     */
    @Test
    void selectedRowsAreTheFullProductsRows() {
        int n = closedOp.size(), b = 3;
        double[] v = new double[n * b];
        java.util.Random r = new java.util.Random(7);
        for (int k = 0; k < v.length; k++) {
            v[k] = r.nextDouble() - 0.5;
        }
        double[] full = new double[n * b];
        closedOp.multiplyViewFactors(v, b, full);
        for (int count : new int[] {5, n / 2}) {
            int[] rows = new int[count];
            for (int k = 0; k < count; k++) {
                rows[k] = (int) ((k * 7919L) % n);
            }
            double[] w = new double[count * b];
            closedOp.multiplyViewFactorRows(rows, v, b, w);
            for (int k = 0; k < count; k++) {
                for (int c = 0; c < b; c++) {
                    assertThat(w[k * b + c]).isCloseTo(full[rows[k] * b + c], within(1e-13));
                }
            }
        }
    }

    @Test
    void rowsOfClosedEnclosuresSumToOneAfterTheClosureScaling() {
        // summation rule, Siegel & Howell 4th ed. eq. 4.19
        double[] unscaled = blockOp.scale;
        Closure closure = new Closure();
        closure.apply(blockOp);
        try {
            assertThat(closure.refused).isNull();
            assertThat(closure.maxDeviation).as("the dense rows' own closure error").isLessThan(1e-2);
            assertRowsSumToOne(blockOp);
        } finally {
            blockOp.scale = unscaled;
        }
        assertRowsSumToOne(closedOp);
        assertThat(closedOp.report().closureNote()).isNull();
        assertThat(closedOp.report().maxScaleDeviation()).isLessThan(closedOp.report().tolerance());
        assertThat(blockOp.report().closureNote()).contains("not applied");
    }

    static void assertRowsSumToOne(CompressedOperator op) {
        {
            int n = op.size();
            double[] one = new double[n], y = new double[n];
            java.util.Arrays.fill(one, 1);
            op.multiplyViewFactors(one, 1, y);
            for (int i = 0; i < n; i++) {
                assertThat(Math.abs(y[i] - 1)).as("row %d", i).isLessThan(1e-10);
            }
        }
    }

    @Test
    void faceToFaceFactorsMatchClosedForms() {
        // Howell's catalog C-11 (parallel) and C-14 (perpendicular, common edge), via ClosedForms;
        // facets of a face partition it, so the face sums carry no discretisation error
        Scene box = closedBox();
        int n = closedOp.size();
        int[] surfaceOf = closedDense.facetSurfaces();
        List<String> names = closedDense.surfaceNames();
        int bottom = names.indexOf("bottom"), top = names.indexOf("top"), front = names.indexOf("front");
        double[] v = new double[2 * n], y = new double[2 * n];
        for (int i = 0; i < n; i++) {
            v[2 * i] = surfaceOf[i] == top ? 1 : 0;
            v[2 * i + 1] = surfaceOf[i] == front ? 1 : 0;
        }
        closedOp.multiplyExchangeAreas(v, 2, y);
        double toTop = 0, toFront = 0, area = 0;
        for (int i = 0; i < n; i++) {
            if (surfaceOf[i] == bottom) {
                toTop += y[2 * i];
                toFront += y[2 * i + 1];
                area += closedOp.area(i);
            }
        }
        assertThat(box.facets()).hasSize(n);
        assertThat(toTop / area).isCloseTo(ClosedForms.parallelRectangles(1, 1, 0.75), within(1e-6));
        assertThat(toFront / area).isCloseTo(ClosedForms.perpendicularRectangles(1, 1, 0.75), within(1e-6));
    }

    @Test
    void memoryIsWellBelowTheDenseMatrix() {
        assertThat((double) closedOp.bytes()).isLessThan(0.6 * closedOp.report().denseBytes());
        assertThat(closedOp.report().bytes()).isEqualTo(closedOp.bytes());
    }

    @Test
    void resultsDoNotDependOnThreadsOrSurfaceOrder() {
        Scene box = closedBox();
        List<Surface> reversed = new ArrayList<>(box.surfaces());
        java.util.Collections.reverse(reversed);
        Scene other = Scene.of(reversed);
        CompressedOperator one = OperatorBuilder.build(other, ViewFactorOptions.defaults(), options().withThreads(1),
                ProgressListener.NONE);
        int n = box.facets().size();
        // facet index in the reversed scene of each facet of the original
        int[] map = new int[n];
        int offset = 0;
        int[] start = new int[reversed.size()];
        for (int s = 0; s < reversed.size(); s++) {
            start[s] = offset;
            offset += reversed.get(s).facets().size();
        }
        int i = 0;
        for (int s = 0; s < box.surfaces().size(); s++) {
            int rs = reversed.size() - 1 - s;
            for (int k = 0; k < box.surfaces().get(s).facets().size(); k++) {
                map[i++] = start[rs] + k;
            }
        }
        Random rnd = new Random(3);
        double[] v = new double[2 * n], w = new double[2 * n], y = new double[2 * n], z = new double[2 * n];
        for (int k = 0; k < n; k++) {
            v[2 * k] = rnd.nextDouble();
            v[2 * k + 1] = rnd.nextDouble();
            w[2 * map[k]] = v[2 * k];
            w[2 * map[k] + 1] = v[2 * k + 1];
        }
        closedOp.multiplyViewFactors(v, 2, y);
        one.multiplyViewFactors(w, 2, z);
        for (int k = 0; k < n; k++) {
            assertThat(z[2 * map[k]]).isEqualTo(y[2 * k]);
            assertThat(z[2 * map[k] + 1]).isEqualTo(y[2 * k + 1]);
        }
    }

    @Test
    void droppingOneBlockMakesTheProductCheckFail() {
        // the property checks above can fail: remove the largest far block's terms
        Block worst = null;
        for (Block b : closedOp.blocks) {
            if (b.far && b.u != null && (worst == null || b.m * b.n > worst.m * worst.n)) {
                worst = b;
            }
        }
        double[][] u = worst.u;
        try {
            worst.u = new double[u.length][worst.m];
            assertThat(relativeProductError(closedOp, closedF, 3, 1)).isGreaterThan(closedOp.report().tolerance());
            assertThat(max(rowErrors(closedOp, closedF))).isGreaterThan(closedOp.report().errorEstimate());
        } finally {
            worst.u = u;
        }
    }

    @Test
    void aModelTooLargeForTheBudgetEndsWithOneLine() {
        assertThatThrownBy(() -> OperatorBuilder.build(closedBox(), ViewFactorOptions.defaults(), options(),
                ProgressListener.NONE, new MemoryBudget(5_000_000)))
                .isInstanceOf(GeometryException.class)
                .hasMessageContaining("needs more than")
                .hasMessageNotContaining("\n");
    }
}
