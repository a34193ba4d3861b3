package org.exitance.geometry.viewfactor;

import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;

/**
 * The facets of a {@link Scene} flattened into primitive arrays (global facet order), with
 * precomputed area-quadrature rules. Built once per computation, then read-only and shared by
 * the worker threads.
 */
final class FacetTable {

    final int count;
    final int[] vertexStart;
    final double[] xyz;
    final double[] normal;
    /** Area of each facet's polygon (m²): what the polygon methods integrate over. */
    final double[] area;
    /** Exact area (m²): the patch's for a curved facet, else the polygon's. View factors are A F / this. */
    final double[] exactArea;
    /** The exact curved shape behind each facet, or null for a plain polygon. */
    final org.exitance.geometry.Patch[] patch;
    /** Distance bound between a curved facet's patch and its polygon (m; 0 for plain polygons). */
    final double[] sagitta;
    /** The largest sagitta of any facet (m): how far an exact occluder may bulge out of its polygon. */
    final double maxSagitta;
    /** True if any facet carries a patch. */
    final boolean curved;
    final double[] centroid;
    final double[] radius;
    final int[] surfaceOf;
    /**
     * Order-independent key per facet (a mix of its coordinate bits): fixes which facet of a
     * pair plays which role and seeds the pair's random points, so results do not depend on the
     * order of facets or surfaces in the scene.
     */
    final long[] key;
    /** Length of the diagonal of the scene's bounding box (m). */
    final double sceneSize;
    final AreaRules rules;
    /** Round solids made of the facets' exact patches, or null for a scene of plain polygons. */
    final RoundSolids round;
    /** Closed convex round bodies, held exactly where they stand in the way; null for plain polygons. */
    final RoundBodies bodies;
    /**
     * How far a pair's hull is widened when round bodies' facets are sought (m): the largest
     * sagitta when the scene has round bodies (the exact body bulges out of its polygons), else 0.
     */
    final double bodyBulge;

    FacetTable(Scene scene, int maxRuleOrder) {
        List<Facet> facets = scene.facets();
        count = facets.size();
        vertexStart = new int[count + 1];
        for (int f = 0; f < count; f++) {
            int nv = facets.get(f).vertexCount();
            if (nv > Poly.MAX_VERTICES - 2) {
                throw new org.exitance.geometry.GeometryException("facet " + f + " has " + nv
                        + " vertices; at most " + (Poly.MAX_VERTICES - 2) + " are supported: split it");
            }
            vertexStart[f + 1] = vertexStart[f] + nv;
        }
        xyz = new double[3 * vertexStart[count]];
        normal = new double[3 * count];
        area = new double[count];
        exactArea = new double[count];
        patch = new org.exitance.geometry.Patch[count];
        sagitta = new double[count];
        centroid = new double[3 * count];
        radius = new double[count];
        surfaceOf = new int[count];
        key = new long[count];
        int f = 0;
        boolean anyPatch = false;
        for (int s = 0; s < scene.surfaceCount(); s++) {
            Surface surface = scene.surfaces().get(s);
            for (Facet facet : surface.facets()) {
                facet.copyCoordinates(xyz, 3 * vertexStart[f]);
                normal[3 * f] = facet.normal().x();
                normal[3 * f + 1] = facet.normal().y();
                normal[3 * f + 2] = facet.normal().z();
                area[f] = facet.area();
                exactArea[f] = facet.exactArea();
                patch[f] = facet.patch();
                sagitta[f] = patch[f] == null ? 0 : patch[f].sagitta();
                anyPatch |= patch[f] != null;
                centroid[3 * f] = facet.centroid().x();
                centroid[3 * f + 1] = facet.centroid().y();
                centroid[3 * f + 2] = facet.centroid().z();
                radius[f] = facet.circumradius();
                surfaceOf[f] = s;
                long h = 0x243F6A8885A308D3L;
                for (double c : facet.coordinates()) {
                    h = mix(h ^ Double.doubleToLongBits(c));
                }
                key[f] = h;
                f++;
            }
        }
        curved = anyPatch;
        double ms = 0;
        for (double v : sagitta) {
            ms = Math.max(ms, v);
        }
        maxSagitta = ms;
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (int k = 0; k < xyz.length; k++) {
            lo[k % 3] = Math.min(lo[k % 3], xyz[k]);
            hi[k % 3] = Math.max(hi[k % 3], xyz[k]);
        }
        sceneSize = Math.sqrt(sq(hi[0] - lo[0]) + sq(hi[1] - lo[1]) + sq(hi[2] - lo[2]));
        rules = new AreaRules(this, maxRuleOrder);
        round = anyPatch ? new RoundSolids(this, sceneSize) : null;
        bodies = anyPatch ? new RoundBodies(this, round, sceneSize) : null;
        bodyBulge = bodies != null && bodies.bodies.length > 0 ? maxSagitta : 0;
    }

    /** SplitMix64 finaliser (Steele, Lea &amp; Flood, OOPSLA 2014). */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    private static double sq(double v) {
        return v * v;
    }

    int vertexCount(int f) {
        return vertexStart[f + 1] - vertexStart[f];
    }
}
