package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.List;

/**
 * A second proof that a pair is entirely hidden, for occluders that are closed convex solids
 * (a block, a billet, a meshed sphere): take the plane through the solid's centroid
 * perpendicular to the line between the pair's centroids; if it separates the two polygons and
 * every point where a segment between their vertices crosses it lies inside the solid, then the
 * hull's cross-section (the convex hull of those points) lies inside the convex solid, so every
 * segment from one polygon to the other passes through the solid. Inside means behind every face
 * plane. Built once, read-only; {@link #hides} keeps no state but a per-call stamp array, so each
 * thread uses its own {@link #view()}.
 */
final class ConvexOccluders {

    /** Largest solid (facets) tested for convexity. */
    static final int MAX_FACETS = 20_000;

    private final int[] convexOf; // per facet: index of its convex solid, or −1
    private final double[][] planes; // per solid: packed (n, d) of its distinct face planes
    private final double[][] centroid;

    /**
     * @param t the facets
     * @param edges their closed solids ({@link SilhouetteEdges#solid})
     */
    ConvexOccluders(FacetTable t, SilhouetteEdges edges) {
        convexOf = new int[t.count];
        java.util.Arrays.fill(convexOf, -1);
        java.util.Map<Integer, List<Integer>> solids = new java.util.TreeMap<>();
        for (int f = 0; f < t.count; f++) {
            if (edges.solid[f] >= 0) {
                solids.computeIfAbsent(edges.solid[f], k -> new ArrayList<>()).add(f);
            }
        }
        List<double[]> pl = new ArrayList<>();
        List<double[]> cs = new ArrayList<>();
        double tol = 1e-9 * t.sceneSize;
        for (List<Integer> facets : solids.values()) {
            if (facets.size() > MAX_FACETS) {
                continue;
            }
            double[] packed = convexPlanes(t, facets, tol);
            if (packed == null) {
                continue;
            }
            double cx = 0, cy = 0, cz = 0, area = 0;
            for (int f : facets) {
                cx += t.area[f] * t.centroid[3 * f];
                cy += t.area[f] * t.centroid[3 * f + 1];
                cz += t.area[f] * t.centroid[3 * f + 2];
                area += t.area[f];
            }
            for (int f : facets) {
                convexOf[f] = pl.size();
            }
            pl.add(packed);
            cs.add(new double[] {cx / area, cy / area, cz / area});
        }
        planes = pl.toArray(new double[0][]);
        centroid = cs.toArray(new double[0][]);
    }

    /** @return the distinct face planes of a convex solid, packed, or null if it is not convex */
    private static double[] convexPlanes(FacetTable t, List<Integer> facets, double tol) {
        List<double[]> distinct = new ArrayList<>();
        for (int f : facets) {
            double nx = t.normal[3 * f], ny = t.normal[3 * f + 1], nz = t.normal[3 * f + 2];
            double d = nx * t.centroid[3 * f] + ny * t.centroid[3 * f + 1] + nz * t.centroid[3 * f + 2];
            boolean seen = false;
            for (double[] q : distinct) {
                if (q[0] * nx + q[1] * ny + q[2] * nz > 1 - 1e-12 && Math.abs(q[3] - d) <= tol) {
                    seen = true;
                    break;
                }
            }
            if (!seen) {
                distinct.add(new double[] {nx, ny, nz, d});
            }
        }
        for (double[] q : distinct) {
            for (int f : facets) {
                for (int v = t.vertexStart[f]; v < t.vertexStart[f + 1]; v++) {
                    if (q[0] * t.xyz[3 * v] + q[1] * t.xyz[3 * v + 1] + q[2] * t.xyz[3 * v + 2] - q[3] > tol) {
                        return null; // a vertex in front of a face plane: not convex
                    }
                }
            }
        }
        double[] packed = new double[4 * distinct.size()];
        for (int k = 0; k < distinct.size(); k++) {
            System.arraycopy(distinct.get(k), 0, packed, 4 * k, 4);
        }
        return packed;
    }

    /** @return a view for one thread */
    View view() {
        return new View();
    }

    /** One thread's view. Not thread-safe. */
    final class View {
        private final int[] seen = new int[planes.length];
        private int stamp;

        /**
         * @param p one polygon (not modified)
         * @param q the other (not modified)
         * @param occ occluder facets in their hull (not modified)
         * @param count entries of occ used
         * @return true if one convex solid provably hides q from p entirely
         */
        boolean hides(Poly p, Poly q, int[] occ, int count) {
            if (planes.length == 0) {
                return false;
            }
            stamp++;
            for (int k = 0; k < count; k++) {
                int s = convexOf[occ[k]];
                if (s < 0 || seen[s] == stamp) {
                    continue;
                }
                seen[s] = stamp;
                if (blocksAll(s, p, q)) {
                    return true;
                }
            }
            return false;
        }

        private boolean blocksAll(int s, Poly p, Poly q) {
            double mx = q.cx - p.cx, my = q.cy - p.cy, mz = q.cz - p.cz;
            double len = Math.sqrt(mx * mx + my * my + mz * mz);
            mx /= len;
            my /= len;
            mz /= len;
            double[] c = centroid[s];
            double d = mx * c[0] + my * c[1] + mz * c[2];
            for (int a = 0; a < p.n; a++) {
                if (mx * p.xyz[3 * a] + my * p.xyz[3 * a + 1] + mz * p.xyz[3 * a + 2] - d >= 0) {
                    return false; // the plane does not separate them
                }
            }
            for (int b = 0; b < q.n; b++) {
                if (mx * q.xyz[3 * b] + my * q.xyz[3 * b + 1] + mz * q.xyz[3 * b + 2] - d <= 0) {
                    return false;
                }
            }
            double[] pl = planes[s];
            for (int a = 0; a < p.n; a++) {
                double ax = p.xyz[3 * a], ay = p.xyz[3 * a + 1], az = p.xyz[3 * a + 2];
                double da = mx * ax + my * ay + mz * az - d;
                for (int b = 0; b < q.n; b++) {
                    double bx = q.xyz[3 * b], by = q.xyz[3 * b + 1], bz = q.xyz[3 * b + 2];
                    double db = mx * bx + my * by + mz * bz - d;
                    double u = da / (da - db);
                    double x = ax + u * (bx - ax), y = ay + u * (by - ay), z = az + u * (bz - az);
                    for (int k = 0; k < pl.length; k += 4) {
                        if (pl[k] * x + pl[k + 1] * y + pl[k + 2] * z - pl[k + 3] >= 0) {
                            return false; // on or outside a face plane: not strictly inside
                        }
                    }
                }
            }
            return true;
        }
    }
}
