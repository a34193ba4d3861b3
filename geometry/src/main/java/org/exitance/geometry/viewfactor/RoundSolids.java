package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.exitance.geometry.Patch;

/**
 * Round solids of a scene: full cylinders of revolution built from exact cylinder-wall patches
 * (a billet, an inner tube), each end closed by plane patches that cover its disc or left open.
 * Found once per computation from the facets' patches: cylinder patches on one axis line with one
 * radius are grouped, and every stretch of the axis over which their azimuth ranges cover the
 * whole turn is one solid; an end counts as closed when plane patches at its height on the same
 * axis cover the disc 0 ≤ ρ ≤ r over the whole turn. A facet is a member of a solid when it is
 * one of those wall patches, or a plane patch of a closed end lying within the disc.
 *
 * <p>Per solid: a point on the axis o (3), the axis direction e (3, canonical sign), radius r,
 * heights z0 &lt; z1 along e from o (m). Read-only after construction but for the thread-safe
 * {@link #results}, shared by threads.
 */
final class RoundSolids {

    static final int FIELDS = 9;
    /** Per solid: ox, oy, oz, ex, ey, ez, r, z0, z1. */
    final double[] data;
    final int count;
    /** Per facet: the solid it bounds, or −1. */
    final int[] solidOf;
    /**
     * Per solid: closed at both ends, its wall and end patches all radiating outward: a convex
     * body that may stand in the way of other pairs ({@link RoundBodies}).
     */
    final boolean[] body;
    /** Height grid of {@link AxialProfile} (m). */
    final double grid;
    /**
     * Results of {@link CoaxialPairs} by their {@link AxialProfile.Key}: exchange area and
     * estimate (m²); filled as pairs are computed, by any thread (each result is a function of
     * its key alone).
     */
    final java.util.concurrent.ConcurrentHashMap<AxialProfile.Key, double[]> results = new java.util.concurrent.ConcurrentHashMap<>();

    RoundSolids(FacetTable t, double scale) {
        solidOf = new int[t.count];
        Arrays.fill(solidOf, -1);
        grid = AxialProfile.grid(scale);
        double eps = 1e-9 * scale;
        List<double[]> solids = new ArrayList<>();
        List<Boolean> bodies = new ArrayList<>();
        boolean[] used = new boolean[t.count];
        for (int f = 0; f < t.count; f++) {
            if (used[f] || !cylinder(t.patch[f])) {
                continue;
            }
            double[] axis = axisOf(t.patch[f]);
            List<Integer> group = new ArrayList<>();
            for (int g = f; g < t.count; g++) {
                if (!used[g] && cylinder(t.patch[g]) && Math.abs(t.patch[g].shapeA() - t.patch[f].shapeA()) <= eps
                        && sameLine(axis, axisOf(t.patch[g]), eps)) {
                    used[g] = true;
                    group.add(g);
                }
            }
            addSolids(t, axis, t.patch[f].shapeA(), group, eps, solids, bodies);
        }
        count = solids.size();
        data = new double[FIELDS * count];
        body = new boolean[count];
        for (int k = 0; k < count; k++) {
            body[k] = bodies.get(k);
            System.arraycopy(solids.get(k), 0, data, FIELDS * k, FIELDS);
        }
    }

    /**
     * Whether pairs with the plane or cone patch p may be computed through solid s by
     * {@link CoaxialPairs}: p lies on the solid's axis and outside it, either at radii ≥ r
     * everywhere or wholly above or below the solid's heights (a lid or base disc past a billet).
     * A segment between two such patches meets the solid exactly when its horizontal projection
     * meets the circle r at a point whose height lies within the solid's: visibility through the
     * solid's wall and its end discs alike. When the solid spans both patches' heights (the inner
     * of two concentric cylinders) the height never matters and the outer integrand is smooth but
     * for mild kinks (2-D adaptive cells); when it ends between them (a billet between two wall
     * bands) its rims add shadow edges whose onsets make the outer integrand behave like a square
     * root along explicit curves, and {@link RimCells} cuts the (u, v) integral along them.
     */
    boolean admits(int s, Patch p, double scale) {
        double eps = 1e-9 * scale;
        int o = FIELDS * s;
        double[] axis = Arrays.copyOfRange(data, o, o + 6);
        if (p.kind() == Patch.Kind.SPHERE || !sameLine(axis, axisOf(p), eps)) {
            return false;
        }
        boolean plane = p.kind() == Patch.Kind.PLANE;
        double[] pl = place(p, axis);
        double za = pl[0] + pl[1] * (plane ? 0 : p.u0()), zb = pl[0] + pl[1] * (plane ? 0 : p.u1());
        double ra = plane ? p.u0() : p.shapeA() + p.shapeB() * p.u0();
        double rb = plane ? p.u1() : p.shapeA() + p.shapeB() * p.u1();
        double r = data[o + 6], z0 = data[o + 7], z1 = data[o + 8];
        return Math.min(ra, rb) >= r - eps || Math.max(za, zb) <= z0 - eps || Math.min(za, zb) >= z1 + eps;
    }

    private static boolean cylinder(Patch p) {
        return p != null && p.kind() == Patch.Kind.CONE && p.shapeB() == 0 && p.shapeA() > 0;
    }

    /** The axis line of a patch: the foot of the world origin on it (3), its canonical direction (3). */
    static double[] axisOf(Patch p) {
        double ex = p.frame(9), ey = p.frame(10), ez = p.frame(11);
        double big = Math.abs(ex) >= Math.abs(ey) && Math.abs(ex) >= Math.abs(ez) ? ex : Math.abs(ey) >= Math.abs(ez) ? ey : ez;
        if (big < 0) {
            ex = -ex;
            ey = -ey;
            ez = -ez;
        }
        double d = p.frame(0) * ex + p.frame(1) * ey + p.frame(2) * ez;
        return new double[] {p.frame(0) - d * ex, p.frame(1) - d * ey, p.frame(2) - d * ez, ex, ey, ez};
    }

    static boolean sameLine(double[] a, double[] b, double eps) {
        return Math.abs(a[0] - b[0]) <= eps && Math.abs(a[1] - b[1]) <= eps && Math.abs(a[2] - b[2]) <= eps
                && Math.abs(a[3] - b[3]) <= 1e-12 && Math.abs(a[4] - b[4]) <= 1e-12 && Math.abs(a[5] - b[5]) <= 1e-12;
    }

    /** Height (along the canonical axis from its foot point) of a patch's u, and the azimuth map. */
    static double[] place(Patch p, double[] axis) {
        double s = Math.signum(p.frame(9) * axis[3] + p.frame(10) * axis[4] + p.frame(11) * axis[5]);
        double off = (p.frame(0) - axis[0]) * axis[3] + (p.frame(1) - axis[1]) * axis[4] + (p.frame(2) - axis[2]) * axis[5];
        // azimuth of the patch's e1 about the canonical axis, against a fixed reference direction
        double[] ref = reference(axis);
        double c1 = p.frame(3) * ref[0] + p.frame(4) * ref[1] + p.frame(5) * ref[2];
        double c2 = p.frame(3) * ref[3] + p.frame(4) * ref[4] + p.frame(5) * ref[5];
        return new double[] {off, s, Math.atan2(c2, c1)};
    }

    /** A fixed orthonormal pair perpendicular to the canonical axis (6 numbers). */
    private static double[] reference(double[] axis) {
        double ex = axis[3], ey = axis[4], ez = axis[5];
        double ax = Math.abs(ex) < 0.6 ? 1 : 0, ay = ax == 1 ? 0 : 1;
        double d = ax * ex + ay * ey;
        double ux = ax - d * ex, uy = ay - d * ey, uz = -d * ez;
        double n = Math.sqrt(ux * ux + uy * uy + uz * uz);
        ux /= n;
        uy /= n;
        uz /= n;
        return new double[] {ux, uy, uz, ey * uz - ez * uy, ez * ux - ex * uz, ex * uy - ey * ux};
    }

    private void addSolids(FacetTable t, double[] axis, double r, List<Integer> group, double eps, List<double[]> out,
            List<Boolean> bodies) {
        int m = group.size();
        double[] z0 = new double[m], z1 = new double[m], f0 = new double[m], f1 = new double[m];
        double[] cuts = new double[2 * m];
        for (int k = 0; k < m; k++) {
            Patch p = t.patch[group.get(k)];
            double[] pl = place(p, axis);
            double a = pl[0] + pl[1] * p.u0(), b = pl[0] + pl[1] * p.u1();
            z0[k] = Math.min(a, b);
            z1[k] = Math.max(a, b);
            double g0 = pl[2] + pl[1] * p.phi0(), g1 = pl[2] + pl[1] * p.phi1();
            f0[k] = Math.min(g0, g1);
            f1[k] = Math.max(g0, g1);
            cuts[2 * k] = z0[k];
            cuts[2 * k + 1] = z1[k];
        }
        double[] z = distinct(cuts, eps);
        double start = Double.NaN;
        for (int c = 0; c + 1 < z.length; c++) {
            double mid = 0.5 * (z[c] + z[c + 1]);
            boolean covered = coversTurn(f0, f1, k -> z0[k] < mid && z1[k] > mid, m);
            if (covered && Double.isNaN(start)) {
                start = z[c];
            }
            boolean last = c + 2 >= z.length;
            if ((!covered || last) && !Double.isNaN(start)) {
                finish(t, axis, r, start, covered ? z[c + 1] : z[c], group, z0, z1, eps, out, bodies);
                start = Double.NaN;
            }
        }
    }

    /** The values sorted, with those within eps of the previous one dropped. */
    private static double[] distinct(double[] v, double eps) {
        double[] s = v.clone();
        Arrays.sort(s);
        int n = 0;
        for (double x : s) {
            if (n == 0 || x - s[n - 1] > eps) {
                s[n++] = x;
            }
        }
        return Arrays.copyOf(s, n);
    }

    private void finish(FacetTable t, double[] axis, double r, double lo, double hi, List<Integer> group,
            double[] z0, double[] z1, double eps, List<double[]> out, List<Boolean> bodies) {
        int index = out.size();
        double[] s = {axis[0], axis[1], axis[2], axis[3], axis[4], axis[5], r, lo, hi};
        boolean outward = closedEnd(t, axis, r, lo, eps, index, -1) & closedEnd(t, axis, r, hi, eps, index, 1);
        for (int k = 0; k < group.size(); k++) {
            if (z0[k] >= lo - eps && z1[k] <= hi + eps) {
                solidOf[group.get(k)] = index;
                outward &= t.patch[group.get(k)].sign() > 0;
            }
        }
        out.add(s);
        bodies.add(outward);
    }

    /**
     * Whether plane patches at height z on the axis cover the disc of radius r; marks them as
     * members. @param away +1 or −1: the direction along the axis away from the solid
     * @return whether they cover it and all radiate away from the solid
     */
    private boolean closedEnd(FacetTable t, double[] axis, double r, double z, double eps, int index, int away) {
        List<Integer> caps = new ArrayList<>();
        for (int f = 0; f < t.count; f++) {
            Patch p = t.patch[f];
            if (p == null || p.kind() != Patch.Kind.PLANE || !sameLine(axis, axisOf(p), eps)) {
                continue;
            }
            double[] pl = place(p, axis);
            if (Math.abs(pl[0] - z) <= eps && p.u0() < r - eps) {
                caps.add(f);
            }
        }
        int m = caps.size();
        double[] r0 = new double[m], r1 = new double[m], f0 = new double[m], f1 = new double[m];
        double[] cuts = new double[2 * m + 2];
        for (int k = 0; k < m; k++) {
            Patch p = t.patch[caps.get(k)];
            double[] pl = place(p, axis);
            double g0 = pl[2] + pl[1] * p.phi0(), g1 = pl[2] + pl[1] * p.phi1();
            f0[k] = Math.min(g0, g1);
            f1[k] = Math.max(g0, g1);
            r0[k] = p.u0();
            r1[k] = p.u1();
            cuts[2 * k] = Math.min(r, p.u0());
            cuts[2 * k + 1] = Math.min(r, p.u1());
        }
        cuts[2 * m] = 0;
        cuts[2 * m + 1] = r;
        double[] rs = distinct(cuts, eps);
        for (int c = 0; c + 1 < rs.length; c++) {
            double mid = 0.5 * (rs[c] + rs[c + 1]);
            if (!coversTurn(f0, f1, k -> r0[k] < mid && r1[k] > mid, m)) {
                return false;
            }
        }
        boolean outward = true;
        for (int k = 0; k < m; k++) {
            if (r1[k] <= r + eps) {
                solidOf[caps.get(k)] = index;
                Patch p = t.patch[caps.get(k)];
                double along = p.frame(9) * axis[3] + p.frame(10) * axis[4] + p.frame(11) * axis[5];
                outward &= p.sign() * along * away > 0;
            } else {
                outward = false; // a plane patch reaching past the rim: not a closed round body
            }
        }
        return outward;
    }

    /** Whether the azimuth ranges [f0, f1] of the selected pieces cover a whole turn. */
    private static boolean coversTurn(double[] f0, double[] f1, java.util.function.IntPredicate take, int m) {
        double twoPi = 2 * Math.PI;
        List<double[]> iv = new ArrayList<>();
        for (int k = 0; k < m; k++) {
            if (!take.test(k)) {
                continue;
            }
            if (f1[k] - f0[k] >= twoPi - 1e-9) {
                return true;
            }
            double a = f0[k] - twoPi * Math.floor(f0[k] / twoPi), b = a + f1[k] - f0[k];
            iv.add(new double[] {a, b});
            iv.add(new double[] {a - twoPi, b - twoPi});
        }
        iv.sort((x, y) -> Double.compare(x[0], y[0]));
        double reach = 0;
        boolean started = false;
        for (double[] v : iv) {
            if (v[1] <= 0) {
                continue;
            }
            if (!started) {
                if (v[0] > 1e-9) {
                    return false;
                }
                started = true;
                reach = v[1];
                continue;
            }
            if (v[0] > reach + 1e-9) {
                return false;
            }
            reach = Math.max(reach, v[1]);
        }
        return started && reach >= twoPi - 1e-9;
    }
}
