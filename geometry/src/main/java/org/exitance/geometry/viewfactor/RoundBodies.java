package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.exitance.geometry.Patch;

/**
 * The closed convex round bodies of a scene, as exact occluders for the shadow projection: the
 * round solids closed at both ends with every patch radiating outward ({@link RoundSolids#body}),
 * and whole spheres (sphere patches about one centre with one radius, radiating outward, whose
 * exact areas add up to 4πr²). Their facets' polygons are replaced, where they stand in the way of
 * another pair, by the exact shape ({@link RoundOccluder}).
 *
 * <p>Read-only after construction; shared by threads.
 */
final class RoundBodies {

    /** The bodies. */
    final RoundOccluder[] bodies;
    /** Per facet: the body it bounds, or −1. */
    final int[] bodyOf;
    /**
     * Per body: the largest relative difference between a member's exact area and its polygon's,
     * the size of the shape error where the polygons stand in for the body.
     */
    final double[] shapeError;

    RoundBodies(FacetTable t, RoundSolids solids, double scale) {
        bodyOf = new int[t.count];
        Arrays.fill(bodyOf, -1);
        List<RoundOccluder> found = new ArrayList<>();
        for (int s = 0; s < solids.count; s++) {
            if (!solids.body[s]) {
                continue;
            }
            int o = RoundSolids.FIELDS * s;
            double[] d = solids.data;
            double[] base = {d[o] + d[o + 7] * d[o + 3], d[o + 1] + d[o + 7] * d[o + 4], d[o + 2] + d[o + 7] * d[o + 5]};
            for (int f = 0; f < t.count; f++) {
                if (solids.solidOf[f] == s) {
                    bodyOf[f] = found.size();
                }
            }
            found.add(RoundOccluder.cylinder(base, new double[] {d[o + 3], d[o + 4], d[o + 5]}, d[o + 6], d[o + 8] - d[o + 7]));
        }
        spheres(t, scale, found);
        bodies = found.toArray(new RoundOccluder[0]);
        shapeError = new double[bodies.length];
        for (int f = 0; f < t.count; f++) {
            if (bodyOf[f] >= 0) {
                shapeError[bodyOf[f]] = Math.max(shapeError[bodyOf[f]], Math.abs(t.exactArea[f] / t.area[f] - 1));
            }
        }
    }

    private void spheres(FacetTable t, double scale, List<RoundOccluder> found) {
        double eps = 1e-9 * scale;
        boolean[] used = new boolean[t.count];
        for (int f = 0; f < t.count; f++) {
            Patch p = t.patch[f];
            if (used[f] || p == null || p.kind() != Patch.Kind.SPHERE) {
                continue;
            }
            List<Integer> group = new ArrayList<>();
            double area = 0;
            boolean outward = true;
            for (int g = f; g < t.count; g++) {
                Patch o = t.patch[g];
                if (!used[g] && o != null && o.kind() == Patch.Kind.SPHERE && Math.abs(o.shapeA() - p.shapeA()) <= eps
                        && Math.abs(o.frame(0) - p.frame(0)) <= eps && Math.abs(o.frame(1) - p.frame(1)) <= eps
                        && Math.abs(o.frame(2) - p.frame(2)) <= eps) {
                    used[g] = true;
                    group.add(g);
                    area += t.exactArea[g];
                    outward &= o.sign() > 0;
                }
            }
            double r = p.shapeA();
            if (outward && Math.abs(area - 4 * Math.PI * r * r) <= 1e-9 * area) {
                for (int g : group) {
                    bodyOf[g] = found.size();
                }
                found.add(RoundOccluder.sphere(new double[] {p.frame(0), p.frame(1), p.frame(2)}, r));
            }
        }
    }
}
