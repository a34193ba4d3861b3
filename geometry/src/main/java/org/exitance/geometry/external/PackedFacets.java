package org.exitance.geometry.external;

import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.bvh.TriangleBvh;

/**
 * The facets of a scene on primitive arrays (global facet order), with the area weighting of
 * facet values into surface values. Immutable after construction.
 */
final class PackedFacets {

    final int count;
    /** Packed vertex coordinates of all facets (m). */
    final double[] xyz;
    /** First vertex of facet f; vertexStart[count] = total vertices. */
    final int[] vertexStart;
    /** Unit normals, 3 per facet. */
    final double[] normal;
    /** Areas (m²). */
    final double[] area;
    /** Surface index of each facet. */
    final int[] surfaceOf;
    final List<String> surfaceNames;
    /** Bounding-box diagonal (m) and largest absolute coordinate (m). */
    final double size;
    final double magnitude;

    PackedFacets(Scene scene) {
        List<Facet> facets = scene.facets();
        count = facets.size();
        vertexStart = new int[count + 1];
        normal = new double[3 * count];
        area = new double[count];
        surfaceOf = new int[count];
        List<String> names = new ArrayList<>();
        int f = 0;
        for (int s = 0; s < scene.surfaceCount(); s++) {
            Surface surface = scene.surfaces().get(s);
            names.add(surface.name());
            for (Facet facet : surface.facets()) {
                surfaceOf[f] = s;
                vertexStart[f + 1] = vertexStart[f] + facet.vertexCount();
                f++;
            }
        }
        surfaceNames = List.copyOf(names);
        xyz = new double[3 * vertexStart[count]];
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        double mag = 0;
        for (f = 0; f < count; f++) {
            Facet facet = facets.get(f);
            facet.copyCoordinates(xyz, 3 * vertexStart[f]);
            normal[3 * f] = facet.normal().x();
            normal[3 * f + 1] = facet.normal().y();
            normal[3 * f + 2] = facet.normal().z();
            area[f] = facet.area();
        }
        for (int v = 0; v < vertexStart[count]; v++) {
            for (int k = 0; k < 3; k++) {
                double c = xyz[3 * v + k];
                lo[k] = Math.min(lo[k], c);
                hi[k] = Math.max(hi[k], c);
                mag = Math.max(mag, Math.abs(c));
            }
        }
        double dx = hi[0] - lo[0], dy = hi[1] - lo[1], dz = hi[2] - lo[2];
        size = Math.sqrt(dx * dx + dy * dy + dz * dz);
        magnitude = mag;
    }

    int vertexCount(int f) {
        return vertexStart[f + 1] - vertexStart[f];
    }

    /**
     * @return a BVH over the fan triangles of every facet (owner = global facet index); every
     *     facet blocks rays whichever way it faces (the watertight test is two-sided)
     */
    TriangleBvh allFacetsBvh() {
        int triangles = vertexStart[count] - 2 * count;
        double[] tri = new double[9 * triangles];
        int[] owner = new int[triangles];
        int k = 0;
        for (int f = 0; f < count; f++) {
            int v0 = vertexStart[f];
            for (int a = 1; a + 1 < vertexCount(f); a++) {
                System.arraycopy(xyz, 3 * v0, tri, 9 * k, 3);
                System.arraycopy(xyz, 3 * (v0 + a), tri, 9 * k + 3, 3);
                System.arraycopy(xyz, 3 * (v0 + a + 1), tri, 9 * k + 6, 3);
                owner[k++] = f;
            }
        }
        return new TriangleBvh(tri, owner);
    }

    /**
     * Area-weights facet values into surface values, Σ_f A_f v_f / Σ_f A_f, summed in facet order.
     *
     * @param facetValues one value per facet; not modified
     * @return one value per surface
     */
    double[] surfaceAverages(double[] facetValues) {
        double[] num = new double[surfaceNames.size()];
        double[] den = new double[surfaceNames.size()];
        for (int f = 0; f < count; f++) {
            num[surfaceOf[f]] += area[f] * facetValues[f];
            den[surfaceOf[f]] += area[f];
        }
        for (int s = 0; s < num.length; s++) {
            num[s] /= den[s];
        }
        return num;
    }
}
