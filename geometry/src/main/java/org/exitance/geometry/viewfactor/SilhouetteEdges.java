package org.exitance.geometry.viewfactor;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Which edges and vertices of the occluder facets can bound a shadow. An edge shared by two
 * occluder facets in one plane facing the same way (an inner edge of a meshed face) never does:
 * the merged face has no edge there. (The front and back of a thin plate share their outline,
 * but face opposite ways: their edges are real.) A vertex can be a corner of a shadow only if both its edges can bound one and
 * they are not collinear (a mesh node along a straight edge is not a corner). Only these enter
 * the event lines of {@link EventLines}; leaving out the others only saves splits, it does not
 * change a value. Built once, then read-only.
 */
final class SilhouetteEdges {

    /** realEdge[v]: the edge from global vertex v to the next vertex of its facet can bound a shadow. */
    final boolean[] realEdge;
    /** realVertex[v]: global vertex v can be a shadow's corner. */
    final boolean[] realVertex;
    /**
     * closed[f]: occluder facet f belongs to a closed, consistently oriented surface (every
     * edge of every facet of its connected piece is shared, in opposite directions, with exactly
     * one other facet). A segment between two points outside such a solid that crosses one of
     * its facets from behind has entered it before through a facet it crossed from the front,
     * so facets facing away from the segment's start can be skipped. A thin two-sided plate
     * (front and back facets on one outline) counts as closed.
     */
    final boolean[] closed;
    /** solid[f]: the closed solid (an id shared by its facets) of facet f, or −1. */
    final int[] solid;
    /**
     * neighbour[v]: the facet on the other side of the edge from global vertex v to the next
     * vertex of its facet (the one holding the same edge in the opposite direction), or −1.
     */
    final int[] neighbour;

    /**
     * @param t the facets
     * @param occluder which facets are occluders (not modified)
     * @param planes their coplanar groups
     */
    SilhouetteEdges(FacetTable t, boolean[] occluder, CoplanarOccluders planes) {
        int nv = t.vertexStart[t.count];
        realEdge = new boolean[nv];
        realVertex = new boolean[nv];
        double step = 1e-9 * t.sceneSize;
        Map<List<Long>, Integer> uses = new HashMap<>();
        for (int pass = 0; pass < 2; pass++) {
            for (int f = 0; f < t.count; f++) {
                if (!occluder[f]) {
                    continue;
                }
                int v0 = t.vertexStart[f], n = t.vertexStart[f + 1] - v0;
                for (int k = 0; k < n; k++) {
                    List<Long> key = key(t, 2L * planes.group(f) + (facesPositive(t, planes, f) ? 1 : 0), v0 + k,
                            v0 + (k + 1) % n, step);
                    if (pass == 0) {
                        uses.merge(key, 1, Integer::sum);
                    } else {
                        realEdge[v0 + k] = uses.get(key) == 1;
                    }
                }
            }
        }
        neighbour = new int[nv];
        java.util.Arrays.fill(neighbour, -1);
        solid = closedSolids(t, occluder, step, neighbour);
        closed = new boolean[t.count];
        for (int f = 0; f < t.count; f++) {
            closed[f] = solid[f] >= 0;
        }
        for (int f = 0; f < t.count; f++) {
            if (!occluder[f]) {
                continue;
            }
            int v0 = t.vertexStart[f], n = t.vertexStart[f + 1] - v0;
            for (int k = 0; k < n; k++) {
                int prev = v0 + (k + n - 1) % n, here = v0 + k, next = v0 + (k + 1) % n;
                realVertex[here] = realEdge[prev] && realEdge[here] && !collinear(t, prev, here, next);
            }
        }
    }

    /** @return per facet, the id of its closed solid (the lowest facet index in it), or −1 */
    private static int[] closedSolids(FacetTable t, boolean[] occluder, double step, int[] neighbour) {
        Map<List<Long>, int[]> directed = new HashMap<>(); // directed edge → {facet, count}
        for (int f = 0; f < t.count; f++) {
            if (!occluder[f]) {
                continue;
            }
            int v0 = t.vertexStart[f], n = t.vertexStart[f + 1] - v0;
            for (int k = 0; k < n; k++) {
                int facet = f;
                int[] e = directed.computeIfAbsent(directedKey(t, v0 + k, v0 + (k + 1) % n, step), x -> new int[] {facet, 0});
                e[1]++;
            }
        }
        // union-find over facets joined by an edge used once each way
        int[] parent = new int[t.count];
        boolean[] open = new boolean[t.count];
        for (int f = 0; f < t.count; f++) {
            parent[f] = f;
        }
        for (int f = 0; f < t.count; f++) {
            if (!occluder[f]) {
                continue;
            }
            int v0 = t.vertexStart[f], n = t.vertexStart[f + 1] - v0;
            for (int k = 0; k < n; k++) {
                int[] here = directed.get(directedKey(t, v0 + k, v0 + (k + 1) % n, step));
                int[] back = directed.get(directedKey(t, v0 + (k + 1) % n, v0 + k, step));
                if (back != null && back[1] == 1 && here[1] == 1) {
                    neighbour[v0 + k] = back[0];
                }
                if (here[1] != 1 || back == null || back[1] != 1) {
                    open[f] = true;
                } else {
                    parent[find(parent, f)] = find(parent, back[0]);
                }
            }
        }
        boolean[] openRoot = new boolean[t.count];
        for (int f = 0; f < t.count; f++) {
            if (occluder[f] && open[f]) {
                openRoot[find(parent, f)] = true;
            }
        }
        int[] result = new int[t.count];
        int[] lowest = new int[t.count];
        java.util.Arrays.fill(lowest, -1);
        for (int f = 0; f < t.count; f++) {
            int r = find(parent, f);
            if (lowest[r] < 0) {
                lowest[r] = f;
            }
            result[f] = occluder[f] && !openRoot[r] ? lowest[r] : -1;
        }
        return result;
    }

    private static int find(int[] parent, int f) {
        while (parent[f] != f) {
            parent[f] = parent[parent[f]];
            f = parent[f];
        }
        return f;
    }

    private static List<Long> directedKey(FacetTable t, int a, int b, double step) {
        long[] pa = quantised(t, a, step), pb = quantised(t, b, step);
        return List.of(pa[0], pa[1], pa[2], pb[0], pb[1], pb[2]);
    }

    /** @return true if facet f faces the positive side of its group's plane */
    private static boolean facesPositive(FacetTable t, CoplanarOccluders planes, int f) {
        double[] pl = planes.plane(planes.group(f));
        return pl[0] * t.normal[3 * f] + pl[1] * t.normal[3 * f + 1] + pl[2] * t.normal[3 * f + 2] > 0;
    }

    private static List<Long> key(FacetTable t, long group, int a, int b, double step) {
        long[] pa = quantised(t, a, step), pb = quantised(t, b, step);
        boolean swap = pa[0] > pb[0] || (pa[0] == pb[0] && (pa[1] > pb[1] || (pa[1] == pb[1] && pa[2] > pb[2])));
        long[] lo = swap ? pb : pa, hi = swap ? pa : pb;
        return List.of(group, lo[0], lo[1], lo[2], hi[0], hi[1], hi[2]);
    }

    private static long[] quantised(FacetTable t, int v, double step) {
        return new long[] {Math.round(t.xyz[3 * v] / step), Math.round(t.xyz[3 * v + 1] / step),
            Math.round(t.xyz[3 * v + 2] / step)};
    }

    private static boolean collinear(FacetTable t, int a, int b, int c) {
        double ux = t.xyz[3 * b] - t.xyz[3 * a], uy = t.xyz[3 * b + 1] - t.xyz[3 * a + 1], uz = t.xyz[3 * b + 2] - t.xyz[3 * a + 2];
        double vx = t.xyz[3 * c] - t.xyz[3 * b], vy = t.xyz[3 * c + 1] - t.xyz[3 * b + 1], vz = t.xyz[3 * c + 2] - t.xyz[3 * b + 2];
        double cx = uy * vz - uz * vy, cy = uz * vx - ux * vz, cz = ux * vy - uy * vx;
        double cross = Math.sqrt(cx * cx + cy * cy + cz * cz);
        return cross <= 1e-9 * Math.sqrt((ux * ux + uy * uy + uz * uz) * (vx * vx + vy * vy + vz * vz));
    }
}
