package org.exitance.model;

import java.util.Map;
import org.exitance.conduction.Wall;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * Surfaces, their surface-to-surface view factors and, for an open enclosure, the environment
 * that receives each row's remainder. A window contributes two surfaces, its faces, which name
 * each other (see {@link EnclosureSurface}). View factors are F[i][j] = fraction of the diffuse
 * radiation leaving surface i that reaches surface j (dimensionless). Validation of closure
 * and reciprocity against a tolerance happens where the matrix is read; this type only checks
 * shape and ranges.
 *
 * <p>The view-factor matrix is held once ({@link ViewFactorMatrix}): an enclosure built from rows
 * copies them once; one built from a matrix shares it (as do {@link #withSurfaces} and the load
 * cases derived from it).
 */
public final class Enclosure {
    private final List<EnclosureSurface> surfaces;
    private final ViewFactorMatrix viewFactors;
    private final Environment environment;
    private final List<ConductiveLink> links;
    private final Map<String, Wall> walls;

    /** An enclosure without conductive links; the rows are copied once. */
    public Enclosure(List<EnclosureSurface> surfaces, double[][] viewFactors, Environment environment) {
        this(surfaces, viewFactors, environment, List.of());
    }

    /**
     * @param surfaces     the surfaces, in case order
     * @param viewFactors  N×N matrix as rows; copied once, not modified
     * @param environment  the surroundings, or null for a closed enclosure
     * @param links        conductive links between surfaces (by name)
     */
    public Enclosure(List<EnclosureSurface> surfaces, double[][] viewFactors, Environment environment,
                     List<ConductiveLink> links) {
        this(surfaces, rows(viewFactors, surfaces.size()), environment, links);
    }

    /**
     * @param surfaces     the surfaces, in case order
     * @param viewFactors  the N×N matrix, shared (not copied)
     * @param environment  the surroundings, or null for a closed enclosure
     * @param links        conductive links between surfaces (by name)
     */
    public Enclosure(List<EnclosureSurface> surfaces, ViewFactorMatrix viewFactors, Environment environment,
                     List<ConductiveLink> links) {
        this(surfaces, viewFactors, environment, links, Map.of());
    }

    /**
     * @param surfaces     the surfaces, in case order
     * @param viewFactors  the N×N matrix, shared (not copied)
     * @param environment  the surroundings, or null for a closed enclosure
     * @param links        conductive links between surfaces (by name)
     * @param walls        layered walls behind surfaces, by surface name (copied; empty for none)
     */
    public Enclosure(List<EnclosureSurface> surfaces, ViewFactorMatrix viewFactors, Environment environment,
                     List<ConductiveLink> links, Map<String, Wall> walls) {
        this.walls = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(walls));
        this.surfaces = List.copyOf(surfaces);
        this.links = List.copyOf(links);
        this.environment = environment;
        int n = this.surfaces.size();
        if (n == 0) {
            throw new IllegalArgumentException("an enclosure needs at least one surface");
        }
        Objects.requireNonNull(viewFactors, "viewFactors");
        if (viewFactors.size() != n) {
            throw new IllegalArgumentException("view-factor matrix has " + viewFactors.size() + " rows for " + n + " surfaces");
        }
        this.viewFactors = viewFactors;
        Set<String> names = new HashSet<>();
        for (EnclosureSurface s : surfaces) {
            if (!names.add(s.name())) {
                throw new IllegalArgumentException("duplicate surface name: " + s.name());
            }
        }
        for (ConductiveLink l : links) {
            if (!names.contains(l.surfaceA()) || !names.contains(l.surfaceB())) {
                throw new IllegalArgumentException("a conductive link between '" + l.surfaceA() + "' and '" + l.surfaceB()
                        + "' names an unknown surface");
            }
        }
        checkWindows(this.surfaces);
        for (String w : this.walls.keySet()) {
            if (!names.contains(w)) {
                throw new IllegalArgumentException("a wall behind '" + w + "' names an unknown surface");
            }
        }
    }

    private static ViewFactorMatrix rows(double[][] viewFactors, int n) {
        Objects.requireNonNull(viewFactors, "viewFactors");
        if (viewFactors.length != n) {
            throw new IllegalArgumentException("view-factor matrix has " + viewFactors.length + " rows for " + n + " surfaces");
        }
        return ViewFactorMatrix.copyOf(viewFactors);
    }

    /** The surfaces, in case order. */
    public List<EnclosureSurface> surfaces() {
        return surfaces;
    }

    /** The surroundings, or null for a closed enclosure. */
    public Environment environment() {
        return environment;
    }

    /** Conductive links between surfaces (by name). */
    public List<ConductiveLink> links() {
        return links;
    }

    /** Layered walls behind surfaces, by surface name (unmodifiable; empty for none). */
    public Map<String, Wall> walls() {
        return walls;
    }

    /** The same enclosure with these walls behind its surfaces (by name). */
    public Enclosure withWalls(Map<String, Wall> replaced) {
        return new Enclosure(surfaces, viewFactors, environment, links, replaced);
    }

    /** The same enclosure with another environment (null: closed), sharing the view factors. */
    public Enclosure withEnvironment(Environment replaced) {
        return new Enclosure(surfaces, viewFactors, replaced, links, walls);
    }

    /** The view-factor matrix, shared (read only). */
    public ViewFactorMatrix matrix() {
        return viewFactors;
    }

    /** The same view factors, environment and links with other surfaces (same count and order). */
    public Enclosure withSurfaces(List<EnclosureSurface> replaced) {
        return new Enclosure(replaced, viewFactors, environment, links, walls);
    }

    /**
     * Nodes with two faces: a semi-transparent material needs an other face (a window); faces name
     * each other and have the same area; a window's faces share their material (a two-sided opaque
     * plate's may differ); exactly one face carries the condition.
     */
    private static void checkWindows(List<EnclosureSurface> surfaces) {
        java.util.Map<String, EnclosureSurface> byName = new java.util.HashMap<>();
        surfaces.forEach(s -> byName.put(s.name(), s));
        for (EnclosureSurface s : surfaces) {
            if (s.material().semiTransparent() && !s.hasOtherFace()) {
                throw new IllegalArgumentException("surface '" + s.name() + "': its material '" + s.material().name()
                        + "' is semi-transparent, so it is a window and needs an other face");
            }
            if (!s.hasOtherFace()) {
                continue;
            }
            EnclosureSurface o = byName.get(s.otherFace());
            if (o == null || !s.name().equals(o.otherFace())) {
                throw new IllegalArgumentException("face '" + s.name() + "' names '" + s.otherFace()
                        + "' as its other face, which does not name it back");
            }
            if (s.material().semiTransparent() != o.material().semiTransparent()
                    || s.material().semiTransparent() && !o.material().equals(s.material())) {
                throw new IllegalArgumentException("window faces '" + s.name() + "' and '" + o.name()
                        + "' must have the same material");
            }
            if (o.areaM2() != s.areaM2()) {
                throw new IllegalArgumentException("faces '" + s.name() + "' and '" + o.name()
                        + "' of one node must have the same area");
            }
            boolean here = !(s.boundary() instanceof BoundaryCondition.OnOtherFace);
            boolean there = !(o.boundary() instanceof BoundaryCondition.OnOtherFace);
            if (here == there) {
                throw new IllegalArgumentException("faces '" + s.name() + "' and '" + o.name()
                        + "': exactly one of them must carry the boundary condition");
            }
        }
    }

    /** True when some surface is a window face. */
    public boolean hasWindows() {
        return surfaces.stream().anyMatch(EnclosureSurface::isWindowFace);
    }

    /**
     * For each surface the index of its other face (window or two-sided plate), or −1.
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

    /** A copy of the view-factor matrix as rows (8·N² bytes: prefer {@link #matrix()}). */
    public double[][] viewFactors() {
        return viewFactors.toRows();
    }

    /** F[i][j] without copying. */
    public double viewFactor(int i, int j) {
        return viewFactors.get(i, j);
    }

    /** Row remainder 1 − Σ_j F_ij: the factor from surface i to the environment. */
    public double environmentFactor(int i) {
        return environment == null ? 0.0 : Math.max(0.0, 1.0 - viewFactors.rowSum(i));
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
        for (int a = 0; a < n; a++) {
            s[a] = surfaces.get(order[a]);
        }
        return new Enclosure(List.of(s), viewFactors.permuted(order), environment, links, walls);
    }
}
