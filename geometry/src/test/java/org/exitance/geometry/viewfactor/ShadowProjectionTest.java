package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.mesh.MeshOptions;
import org.exitance.geometry.mesh.ObjReader;
import org.exitance.geometry.mesh.StlReader;
import org.exitance.geometry.shape.Enclosures;
import org.exitance.geometry.shape.Facing;
import org.exitance.geometry.shape.Shapes;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.triangulate.polygon.ConstrainedDelaunayTriangulator;

/**
 * Partly hidden pairs by shadow projection ({@link ShadowIntegral}, {@link VisiblePart}) against
 * references computed here by other means, and the closure of a closed box with a block inside.
 */
class ShadowProjectionTest {

    @TempDir
    Path dir;

    /**
     * The shielded plates of {@link ObstructionTest}: for a point (x, y) of the bottom the
     * shadow of the 0.5 m shield on the top is the square [0.5 − x, 1.5 − x] × [0.5 − y, 1.5 − y]
     * (central projection, scale 2), so the visible factor is the top minus that square, both by
     * the corner formula of Howell's catalog (B-3, from memory; {@link ObstructionTest#corner},
     * whose integral reproduces case C-11 there). The integrand is smooth on each quarter of the
     * bottom (the shadow's edges cross the top's edges at x = 0.5 and y = 0.5), so a 24-point
     * Gauss–Legendre rule (Commons Math) per quarter and direction is exact to rounding.
     */
    static double shieldedPlatesReference() {
        GaussIntegrator g = new GaussIntegratorFactory().legendre(24, 0, 0.5);
        GaussIntegrator h = new GaussIntegratorFactory().legendre(24, 0.5, 1);
        double sum = 0;
        for (GaussIntegrator gx : new GaussIntegrator[] {g, h}) {
            for (GaussIntegrator gy : new GaussIntegrator[] {g, h}) {
                for (int a = 0; a < gx.getNumberOfPoints(); a++) {
                    for (int b = 0; b < gy.getNumberOfPoints(); b++) {
                        double x = gx.getPoint(a), y = gy.getPoint(b);
                        double sx0 = Math.max(0, 0.5 - x), sx1 = Math.min(1, 1.5 - x);
                        double sy0 = Math.max(0, 0.5 - y), sy1 = Math.min(1, 1.5 - y);
                        double v = ObstructionTest.pointToRect(x, y, 0, 1, 0, 1, 1)
                                - ObstructionTest.pointToRect(x, y, sx0, sx1, sy0, sy1, 1);
                        sum += gx.getWeight(a) * gy.getWeight(b) * v;
                    }
                }
            }
        }
        return sum;
    }

    /**
     * The closed form of {@link PointFactor} for a unit square 1 m above the element, at points
     * under it, under a corner and beside it, against the corner formula of Howell's catalogue
     * (case B-3, from memory; its integral reproduces case C-11 in {@link ObstructionTest}).
     */
    @Test
    void pointFactorMatchesTheCornerFormula() {
        Poly square = new Poly();
        square.n = 4;
        double[] v = {0, 0, 1, 0, 1, 1, 1, 1, 1, 1, 0, 1}; // at z = 1, counter-clockwise about −z
        System.arraycopy(v, 0, square.xyz, 0, v.length);
        square.nz = -1;
        for (double[] at : new double[][] {{0.5, 0.5}, {0, 0}, {-0.3, 0.2}, {1.7, 2.1}}) {
            double expected = ObstructionTest.pointToRect(at[0], at[1], 0, 1, 0, 1, 1);
            assertThat(PointFactor.toPolygon(at[0], at[1], 0, 0, 0, 1, square)).isCloseTo(expected, within(1e-14));
        }
    }

    @Test
    void shieldedPlatesMatchTheReferenceAtTheDefaultTolerance() {
        double reference = shieldedPlatesReference();
        // the independent midpoint reference of ObstructionTest agrees to its own accuracy
        assertThat(ObstructionTest.reference(400)).isCloseTo(reference, within(2e-5));
        for (int div : new int[] {1, 2, 3, 8}) {
            // default: each partly hidden pair within 1e-5 of its unobstructed value
            ViewFactorResult r = ViewFactorCalculator.compute(ObstructionTest.plates(div), ViewFactorOptions.defaults(),
                    ProgressListener.NONE);
            assertThat(r.surfaceFactor(0, 1)).as("%d × %d facets", div, div).isCloseTo(reference, within(1e-5 * reference));
            assertThat(r.methodCounts().raySampled()).isZero();
            // a hundred times tighter
            ViewFactorResult tight = ViewFactorCalculator.compute(ObstructionTest.plates(div),
                    ViewFactorOptions.defaults().withPairTolerance(1e-9), ProgressListener.NONE);
            assertThat(tight.surfaceFactor(0, 1)).isCloseTo(reference, within(1e-7 * reference));
        }
    }

    /** The box-with-block scene: unit box, n cells a side, block [0.3, 0.7]² × [0.4, 0.6] with b × b × b/2 cells. */
    static List<Surface> boxWithBlock(int n, int b) {
        List<Surface> s = new ArrayList<>(Enclosures.box(Vec3.ZERO, new Vec3(1, 1, 1), n, n, n));
        s.addAll(Enclosures.box("block.", new Vec3(0.3, 0.3, 0.4), new Vec3(0.7, 0.7, 0.6), b, b, Math.max(1, b / 2),
                Facing.OUTWARD));
        return s;
    }

    /**
     * One pair seen past the block's edge, against a reference built differently: for each
     * point of the emitter the block's shadow on the receiver's plane is the convex hull of its
     * eight projected corners (a convex body's shadow), cut from the receiver by the JTS
     * Topology Suite's overlay, triangulated by JTS, and integrated by the closed form of
     * {@link PointFactor} (checked above); the emitter integral by a 4 × 4-point Gauss rule on
     * 200 × 200 cells. Its own accuracy (the integrand has kinks inside cells): 30, 60, 120 and
     * 200 cells a side gave 2.74336e-4, 2.74309e-4, 2.74299e-4, 2.74302e-4, so the comparison
     * allows 3e-5 relative.
     */
    @Test
    void aPairPastTheBlockEdgeMatchesAnOverlayReference() {
        Scene scene = Scene.of(boxWithBlock(8, 4));
        FacetTable t = new FacetTable(scene, ProximityRule.MAX_ORDER);
        int emitter = nearest(t, 0.4375, 0, 0.4375, 1), receiver = nearest(t, 0.3125, 1, 0.4375, -1);
        double reference = blockShadowReference(t, emitter, receiver, 200);
        ViewFactorResult r = ViewFactorCalculator.compute(scene, ViewFactorOptions.defaults(), ProgressListener.NONE);
        assertThat(r.facetFactor(emitter, receiver)).isCloseTo(reference, within(3e-5 * reference));
        // the pair is partly hidden: without the block it sees more
        assertThat(reference).isLessThan(0.99 * IndependentFactor.factor(scene.facets().get(emitter),
                scene.facets().get(receiver), 12));
    }

    /**
     * The closed box with a block inside, built three ways (analytic builder, ASCII STL of
     * triangles, OBJ of quadrilaterals), closes row by row within 1e-5 with no smoothing (the
     * summation rule of a closed enclosure, Σ_j F_ij = 1: common practice; Siegel &amp; Howell
     * 4th ed. eq. 4.28). (With
     * the ray sampling used before shadow projection the same rows were off by up to 6e-3.)
     */
    @Test
    void closedBoxWithABlockClosesRowByRowBuiltThreeWays() throws IOException {
        List<Surface> built = boxWithBlock(6, 2);
        Path stl = dir.resolve("box.stl"), obj = dir.resolve("box.obj");
        Files.writeString(stl, asciiStl(built));
        Files.writeString(obj, objText(built));
        List<Scene> scenes = List.of(Scene.of(built),
                Scene.of(StlReader.read(stl, MeshOptions.defaults()).surfaces()),
                Scene.of(ObjReader.read(obj, MeshOptions.defaults()).surfaces()));
        for (Scene s : scenes) {
            ViewFactorResult r = ViewFactorCalculator.compute(s, ViewFactorOptions.defaults(), ProgressListener.NONE);
            assertThat(r.methodCounts().partlyHidden()).isPositive();
            assertThat(r.methodCounts().raySampled()).isZero();
            assertThat(r.facetClosure().maxRowSumError()).as("%d facets", r.facetCount()).isLessThan(1e-5);
        }
    }

    /**
     * A billet standing free in a cylindrical hot zone, meshed from STL (plain polygons: the
     * geometry that motivated the method, a polygonal curved occluder with many silhouette edges):
     * closed, so every facet row must sum to 1 (the summation rule, common practice); the rows
     * close within the estimate, and the estimate meets the default tolerance.
     */
    @Test
    void aBilletInAHotZoneClosesWithinItsEstimate() {
        ViewFactorResult r = ViewFactorCalculator.compute(Scene.of(billetInHotZone(true)), ViewFactorOptions.defaults(),
                ProgressListener.NONE);
        assertThat(r.methodCounts().partlyHidden()).isPositive();
        assertThat(r.methodCounts().raySampled()).isZero();
        assertThat(r.maxRowErrorEstimate()).isLessThan(1e-5);
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(r.maxRowErrorEstimate());
    }

    /**
     * The same billet built from the exact shapes: its rims end between the heights of the pairs
     * it hides in part, and those pairs are computed exactly ({@link RimCells}), none on the
     * polygons; closed, so every facet row of the raw (unsmoothed) matrix sums to 1 within the
     * default tolerance 1e-5 and every surface row within 1e-6 (the summation rule, common
     * practice), and the estimate meets the tolerance.
     */
    @Test
    void anExactBilletMeetsTheDefaultTolerance() {
        ViewFactorResult r = ViewFactorCalculator.compute(Scene.of(billetInHotZone(false)), ViewFactorOptions.defaults(),
                ProgressListener.NONE);
        assertThat(r.options().smoothing()).isEqualTo(Smoothing.NONE);
        assertThat(r.methodCounts().curvedOnPolygons()).isZero();
        assertThat(r.methodCounts().raySampled()).isZero();
        assertThat(r.methodCounts().partlyHidden()).isPositive();
        assertThat(r.maxRowErrorEstimate()).isLessThan(1e-5);
        assertThat(r.facetClosure().maxRowSumError()).isLessThan(1e-5);
        assertThat(r.surfaceClosure().maxRowSumError()).isLessThan(1e-6);
    }

    /** @param polygons true: the plain polygons only (as read from a mesh file), no exact patches */
    static List<Surface> billetInHotZone(boolean polygons) {
        List<Surface> s = new ArrayList<>(Enclosures.cylindricalCavity(Vec3.ZERO, Vec3.Z, 0.5, 1.0, 12, 2, 1));
        s.add(new Surface("billet", Shapes.cylinderWall(new Vec3(0, 0, 0.3), Vec3.Z, 0.15, 0.4, 8, 1, Facing.OUTWARD)));
        s.add(new Surface("billet_top", Shapes.disc(new Vec3(0, 0, 0.7), Vec3.Z, 0.15, 1, 8)));
        s.add(new Surface("billet_bottom", Shapes.disc(new Vec3(0, 0, 0.3), new Vec3(0, 0, -1), 0.15, 1, 8)));
        if (!polygons) {
            return s;
        }
        List<Surface> plain = new ArrayList<>();
        for (Surface x : s) {
            List<org.exitance.geometry.Facet> f = new ArrayList<>();
            x.facets().forEach(g -> f.add(org.exitance.geometry.Facet.of(g.vertices())));
            plain.add(new Surface(x.name(), f));
        }
        return plain;
    }

    static int nearest(FacetTable t, double x, double y, double z, double ny) {
        int best = -1;
        double bestD = Double.MAX_VALUE;
        for (int f = 0; f < t.count; f++) {
            double d = Math.pow(t.centroid[3 * f] - x, 2) + Math.pow(t.centroid[3 * f + 1] - y, 2)
                    + Math.pow(t.centroid[3 * f + 2] - z, 2);
            if (t.normal[3 * f + 1] == ny && d < bestD) {
                bestD = d;
                best = f;
            }
        }
        return best;
    }

    /** Emitter on y = 0 facing +y, receiver on y = 1 facing −y; the block between them. */
    static double blockShadowReference(FacetTable t, int emitter, int receiver, int cells) {
        Poly p = new Poly();
        p.load(t, emitter);
        Poly q = new Poly();
        q.load(t, receiver);
        GeometryFactory gf = new GeometryFactory();
        Coordinate[] qc = new Coordinate[q.n + 1];
        for (int v = 0; v < q.n; v++) {
            qc[v] = new Coordinate(q.xyz[3 * v], q.xyz[3 * v + 2]);
        }
        qc[q.n] = qc[0];
        Polygon top = gf.createPolygon(qc);
        double x0 = 1e9, x1 = -1e9, z0 = 1e9, z1 = -1e9;
        for (int v = 0; v < p.n; v++) {
            x0 = Math.min(x0, p.xyz[3 * v]);
            x1 = Math.max(x1, p.xyz[3 * v]);
            z0 = Math.min(z0, p.xyz[3 * v + 2]);
            z1 = Math.max(z1, p.xyz[3 * v + 2]);
        }
        GaussIntegrator g = new GaussIntegratorFactory().legendre(4, 0, 1);
        Poly tri = new Poly();
        tri.n = 3;
        tri.ny = q.ny;
        double sum = 0;
        for (int cx = 0; cx < cells; cx++) {
            for (int cz = 0; cz < cells; cz++) {
                for (int u = 0; u < 4; u++) {
                    for (int w = 0; w < 4; w++) {
                        double x = x0 + (x1 - x0) * (cx + g.getPoint(u)) / cells;
                        double z = z0 + (z1 - z0) * (cz + g.getPoint(w)) / cells;
                        double weight = g.getWeight(u) * g.getWeight(w) * (x1 - x0) * (z1 - z0) / ((double) cells * cells);
                        Coordinate[] corners = new Coordinate[8];
                        int k = 0;
                        for (double bx : new double[] {0.3, 0.7}) {
                            for (double by : new double[] {0.3, 0.7}) {
                                for (double bz : new double[] {0.4, 0.6}) {
                                    double s = (q.cy - p.cy) / (by - p.cy);
                                    corners[k++] = new Coordinate(x + (bx - x) * s, z + (bz - z) * s);
                                }
                            }
                        }
                        Geometry visible = top.difference(gf.createMultiPointFromCoords(corners).convexHull());
                        double f = 0;
                        for (int gi = 0; gi < visible.getNumGeometries(); gi++) {
                            Geometry part = visible.getGeometryN(gi);
                            if (part.isEmpty() || part.getArea() <= 0) {
                                continue;
                            }
                            Geometry tris = ConstrainedDelaunayTriangulator.triangulate(part);
                            for (int ti = 0; ti < tris.getNumGeometries(); ti++) {
                                Coordinate[] c = tris.getGeometryN(ti).getCoordinates();
                                for (int v = 0; v < 3; v++) {
                                    tri.xyz[3 * v] = c[v].x;
                                    tri.xyz[3 * v + 1] = q.cy;
                                    tri.xyz[3 * v + 2] = c[v].y;
                                }
                                f += Math.abs(PointFactor.toPolygon(x, p.cy, z, p.nx, p.ny, p.nz, tri));
                            }
                        }
                        sum += weight * f;
                    }
                }
            }
        }
        return sum / p.area;
    }

    static String asciiStl(List<Surface> surfaces) {
        StringBuilder b = new StringBuilder();
        for (Surface s : surfaces) {
            b.append("solid ").append(s.name()).append('\n');
            for (Facet f : s.facets()) {
                for (int k = 1; k + 1 < f.vertexCount(); k++) {
                    Vec3 n = f.normal();
                    b.append(String.format("facet normal %s %s %s%n outer loop%n", n.x(), n.y(), n.z()));
                    for (Vec3 v : new Vec3[] {f.vertex(0), f.vertex(k), f.vertex(k + 1)}) {
                        b.append(String.format("  vertex %s %s %s%n", v.x(), v.y(), v.z()));
                    }
                    b.append(" endloop\nendfacet\n");
                }
            }
            b.append("endsolid ").append(s.name()).append('\n');
        }
        return b.toString();
    }

    static String objText(List<Surface> surfaces) {
        StringBuilder b = new StringBuilder("# invented test geometry\n");
        int next = 1;
        for (Surface s : surfaces) {
            b.append("g ").append(s.name()).append('\n');
            for (Facet f : s.facets()) {
                StringBuilder face = new StringBuilder("f");
                for (Vec3 v : f.vertices()) {
                    b.append(String.format("v %s %s %s%n", v.x(), v.y(), v.z()));
                    face.append(' ').append(next++);
                }
                b.append(face).append('\n');
            }
        }
        return b.toString();
    }
}
