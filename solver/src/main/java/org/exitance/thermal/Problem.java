package org.exitance.thermal;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.ConductiveLink;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.bands.RadiativeArrays;
import org.exitance.model.ExternalSource;

/**
 * The arrays of a temperature solve, derived once from the enclosure: the radiative arrays the
 * band loop reads ({@link RadiativeArrays}, whose view factors are the enclosure's own, shared)
 * and the thermal nodes: which temperatures are unknown, their targets, convection and links.
 * The fields below repeat the radiative arrays' references for brevity; nothing is copied.
 */
final class Problem {
    final RadiativeArrays radiative;
    final Enclosure enc;
    /** F, N×N row-major: the enclosure's own array, shared, read only. */
    final double[] f;
    final double[] area;
    final double[] envFactor;
    final double envT;
    /** Per surface: the other face of its window, or −1. */
    final int[] other;
    /** Per surface: the surface that carries its boundary condition (itself, or its window's other face). */
    final int[] primary;
    /** Per unknown node: the surface that carries the condition. */
    final int[] unknown;
    /** Per unknown node: its faces (the surface alone, or a window's two faces). */
    final int[][] faces;
    final double[] target;
    /** Per unknown: whether its target counts convection and conduction too. */
    final boolean[] allPaths;
    /** Per surface: h A (W/K) and the fluid temperature (K). */
    final double[] convG;
    final double[] fluidT;
    /** Conductive links: ends and conductances (W/K). */
    final int[] linkA;
    final int[] linkB;
    final double[] linkG;
    /** Heat by paths outside the network (walls, storage), for the all-paths nodes. */
    final SurfacePaths paths;

    /** A problem whose extra paths are the steady conduction through the enclosure's walls. */
    Problem(Enclosure enc, List<ExternalSource> sources) {
        this(enc, sources, WallPaths.of(enc));
    }

    /** @param paths  heat by paths outside the network ({@link SurfacePaths#NONE} for none) */
    Problem(Enclosure enc, List<ExternalSource> sources, SurfacePaths paths) {
        this.paths = paths;
        this.radiative = new RadiativeArrays(enc, sources);
        this.enc = enc;
        int n = enc.size();
        f = radiative.viewFactors;
        area = radiative.area;
        envFactor = radiative.environmentFactor;
        envT = radiative.environmentK;
        other = radiative.otherFace;
        List<Integer> u = new ArrayList<>();
        primary = new int[n];
        for (int i = 0; i < n; i++) {
            primary[i] = enc.surface(i).boundary() instanceof BoundaryCondition.OnOtherFace ? other[i] : i;
            if (enc.surface(i).boundary().temperatureUnknown()) {
                u.add(i);
            }
        }
        unknown = u.stream().mapToInt(Integer::intValue).toArray();
        faces = new int[unknown.length][];
        for (int a = 0; a < unknown.length; a++) {
            int i = unknown[a];
            faces[a] = other[i] >= 0 ? new int[] {i, other[i]} : new int[] {i};
        }
        target = new double[unknown.length];
        allPaths = new boolean[unknown.length];
        for (int a = 0; a < unknown.length; a++) {
            target[a] = enc.surface(unknown[a]).boundary().targetNetHeatW(area[unknown[a]]);
            allPaths[a] = enc.surface(unknown[a]).boundary().balancesAllPaths();
        }
        convG = new double[n];
        fluidT = new double[n];
        for (int i = 0; i < n; i++) {
            EnclosureSurface s = enc.surface(i);
            convG[i] = s.convectionConductanceWPerK();
            fluidT[i] = s.convection() == null ? 0.0 : s.convection().fluidTemperatureK();
        }
        int nl = enc.links().size();
        linkA = new int[nl];
        linkB = new int[nl];
        linkG = new double[nl];
        for (int l = 0; l < nl; l++) {
            ConductiveLink link = enc.links().get(l);
            linkA[l] = enc.indexOf(link.surfaceA());
            linkB[l] = enc.indexOf(link.surfaceB());
            linkG[l] = link.conductanceWPerK();
        }
    }

    /**
     * Per unknown node, d/dT of its extra paths (W/K), 0 for a node whose condition counts
     * radiation only; t not modified; a new array.
     */
    double[] pathDerivativesWPerK(double[] t) {
        double[] d = new double[unknown.length];
        double[] out = new double[2];
        for (int a = 0; a < unknown.length; a++) {
            if (allPaths[a]) {
                for (int i : faces[a]) {
                    paths.heat(i, t[i], out);
                    d[a] += out[1];
                }
            }
        }
        return d;
    }

    /** Heat leaving surface i by convection at temperature ti (W). */
    double convectionW(int i, double ti) {
        return convG[i] * (ti - fluidT[i]);
    }

    /** Heat leaving surface i through its conductive links (W); t not modified. */
    double conductionW(int i, double[] t) {
        double q = 0;
        for (int l = 0; l < linkG.length; l++) {
            if (linkA[l] == i) {
                q += linkG[l] * (t[i] - t[linkB[l]]);
            } else if (linkB[l] == i) {
                q += linkG[l] * (t[i] - t[linkA[l]]);
            }
        }
        return q;
    }

    /** Σ over the links of surface i of |G (T_i − T_j)| (W); t not modified. */
    double conductionMagnitudeW(int i, double[] t) {
        double q = 0;
        for (int l = 0; l < linkG.length; l++) {
            if (linkA[l] == i) {
                q += Math.abs(linkG[l] * (t[i] - t[linkB[l]]));
            } else if (linkB[l] == i) {
                q += Math.abs(linkG[l] * (t[i] - t[linkA[l]]));
            }
        }
        return q;
    }

    /** Σ over the links of surface i of G (|T_i| + |T_j|) (W): the size of the numbers the link heat comes from. */
    double conductionTermsW(int i, double[] t) {
        double q = 0;
        for (int l = 0; l < linkG.length; l++) {
            if (linkA[l] == i || linkB[l] == i) {
                q += linkG[l] * (Math.abs(t[linkA[l]]) + Math.abs(t[linkB[l]]));
            }
        }
        return q;
    }

    /**
     * d/dT_b of the convection and link heat leaving unknown node a (W/K): h A of its faces on
     * the diagonal, and for each link G (T_x − T_y) with x a face of a, G([x ∈ b] − [y ∈ b]).
     * A link between the two faces of one window carries nothing and contributes nothing.
     */
    double otherPathsDerivative(int a, int b) {
        double d = 0;
        if (a == b) {
            for (int i : faces[a]) {
                d += convG[i];
            }
        }
        for (int l = 0; l < linkG.length; l++) {
            for (int end = 0; end < 2; end++) {
                int x = end == 0 ? linkA[l] : linkB[l];
                int y = end == 0 ? linkB[l] : linkA[l];
                if (contains(faces[a], x)) {
                    d += linkG[l] * ((contains(faces[b], x) ? 1 : 0) - (contains(faces[b], y) ? 1 : 0));
                }
            }
        }
        return d;
    }

    private static boolean contains(int[] set, int v) {
        for (int x : set) {
            if (x == v) {
                return true;
            }
        }
        return false;
    }
}
