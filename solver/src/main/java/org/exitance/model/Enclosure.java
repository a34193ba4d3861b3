package org.exitance.model;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Surfaces, their surface-to-surface view factors and, for an open enclosure, the environment
 * that receives each row's remainder. A window contributes two surfaces, its faces, which name
 * each other (see {@link EnclosureSurface}). View factors are F[i][j] = fraction of the diffuse
 * radiation leaving surface i that reaches surface j (dimensionless). Validation of closure
 * and reciprocity against a tolerance happens where the matrix is read; this type only checks
 * shape and ranges.
 *
 * @param surfaces     the surfaces, in case order
 * @param viewFactors  N×N matrix, copied
 * @param environment  the surroundings, or null for a closed enclosure
 * @param links        conductive links between surfaces (by name)
 */
public record Enclosure(List<EnclosureSurface> surfaces, double[][] viewFactors, Environment environment,
                        List<ConductiveLink> links) {

    /** An enclosure without conductive links. */
    public Enclosure(List<EnclosureSurface> surfaces, double[][] viewFactors, Environment environment) {
        this(surfaces, viewFactors, environment, List.of());
    }

    public Enclosure {
        surfaces = List.copyOf(surfaces);
        links = List.copyOf(links);
        int n = surfaces.size();
        if (n == 0) {
            throw new IllegalArgumentException("an enclosure needs at least one surface");
        }
        Objects.requireNonNull(viewFactors, "viewFactors");
        if (viewFactors.length != n) {
            throw new IllegalArgumentException("view-factor matrix has " + viewFactors.length + " rows for " + n + " surfaces");
        }
        double[][] copy = new double[n][];
        for (int i = 0; i < n; i++) {
            if (viewFactors[i].length != n) {
                throw new IllegalArgumentException("view-factor row " + i + " has " + viewFactors[i].length + " entries for " + n + " surfaces");
            }
            copy[i] = viewFactors[i].clone();
        }
        viewFactors = copy;
        Set<String> names = new HashSet<>();
        for (EnclosureSurface s : surfaces) {
            if (!names.add(s.name())) {
                throw new IllegalArgumentException("duplicate surface name: " + s.name());
            }
        }
        for (ConductiveLink l : links) {
            if (!names.contains(l.surfaceA()) || !names.contains(l.surfaceB())) {
                throw new IllegalArgumentException("conductive link names an unknown surface: " + l);
            }
        }
        checkWindows(surfaces);
    }

    /**
     * Windows: a semi-transparent material needs an other face and an opaque one must not have
     * one; faces name each other, share material and area, and exactly one carries the condition.
     */
    private static void checkWindows(List<EnclosureSurface> surfaces) {
        java.util.Map<String, EnclosureSurface> byName = new java.util.HashMap<>();
        surfaces.forEach(s -> byName.put(s.name(), s));
        for (EnclosureSurface s : surfaces) {
            if (s.material().semiTransparent() != s.isWindowFace()) {
                throw new IllegalArgumentException("surface '" + s.name() + "': " + (s.isWindowFace()
                        ? "names an other face but its material '" + s.material().name() + "' is opaque"
                        : "its material '" + s.material().name() + "' is semi-transparent, so it is a window and"
                        + " needs an other face"));
            }
            if (!s.isWindowFace()) {
                continue;
            }
            EnclosureSurface o = byName.get(s.otherFace());
            if (o == null || !s.name().equals(o.otherFace())) {
                throw new IllegalArgumentException("window face '" + s.name() + "' names '" + s.otherFace()
                        + "' as its other face, which does not name it back");
            }
            if (!o.material().equals(s.material()) || o.areaM2() != s.areaM2()) {
                throw new IllegalArgumentException("window faces '" + s.name() + "' and '" + o.name()
                        + "' must have the same material and area");
            }
            boolean here = !(s.boundary() instanceof BoundaryCondition.OnOtherFace);
            boolean there = !(o.boundary() instanceof BoundaryCondition.OnOtherFace);
            if (here == there) {
                throw new IllegalArgumentException("window faces '" + s.name() + "' and '" + o.name()
                        + "': exactly one of them must carry the boundary condition");
            }
        }
    }

    /** True when some surface is a window face. */
    public boolean hasWindows() {
        return surfaces.stream().anyMatch(EnclosureSurface::isWindowFace);
    }

    /**
     * For each surface the index of the other face of its window, or −1 for an opaque surface.
     *
     * @return a new array of length N
     */
    public int[] otherFaceIndices() {
        int[] out = new int[surfaces.size()];
        for (int i = 0; i < out.length; i++) {
            String o = surfaces.get(i).otherFace();
            out[i] = o == null ? -1 : indexOf(o);
        }
        return out;
    }

    /** Index of the surface with this name, or −1. */
    public int indexOf(String name) {
        for (int i = 0; i < surfaces.size(); i++) {
            if (surfaces.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    public int size() {
        return surfaces.size();
    }

    /** A copy of the view-factor matrix. */
    @Override
    public double[][] viewFactors() {
        double[][] copy = new double[viewFactors.length][];
        for (int i = 0; i < copy.length; i++) {
            copy[i] = viewFactors[i].clone();
        }
        return copy;
    }

    /** F[i][j] without copying. */
    public double viewFactor(int i, int j) {
        return viewFactors[i][j];
    }

    /** Row remainder 1 − Σ_j F_ij: the factor from surface i to the environment. */
    public double environmentFactor(int i) {
        double s = 0;
        for (double f : viewFactors[i]) {
            s += f;
        }
        return environment == null ? 0.0 : Math.max(0.0, 1.0 - s);
    }

    public Optional<Environment> environmentIfAny() {
        return Optional.ofNullable(environment);
    }

    public EnclosureSurface surface(int i) {
        return surfaces.get(i);
    }

    /** Same enclosure with surfaces reordered: new index k holds old surface order[k]. */
    public Enclosure permuted(int[] order) {
        int n = size();
        if (order.length != n) {
            throw new IllegalArgumentException("permutation length");
        }
        EnclosureSurface[] s = new EnclosureSurface[n];
        double[][] f = new double[n][n];
        for (int a = 0; a < n; a++) {
            s[a] = surfaces.get(order[a]);
            for (int b = 0; b < n; b++) {
                f[a][b] = viewFactors[order[a]][order[b]];
            }
        }
        return new Enclosure(List.of(s), f, environment, links);
    }
}
