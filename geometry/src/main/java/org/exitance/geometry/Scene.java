package org.exitance.geometry;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * The geometric model: named surfaces in a fixed order. Facets are numbered globally in that
 * order (surface 0's facets first); the view-factor matrices use this numbering.
 *
 * <p>Two-sided (thin) surfaces: {@link Builder#addTwoSided} adds a plate that radiates from both
 * faces as two surfaces, {@code name + ".front"} (facets as given, radiating along their normal)
 * and {@code name + ".back"} (same polygons, reversed, radiating the other way). The two are
 * coplanar, so their mutual view factor is zero.
 *
 * <p>Immutable.
 */
public final class Scene {

    /** Suffix of the side of a two-sided surface that radiates along the given facet normals. */
    public static final String FRONT_SUFFIX = ".front";
    /** Suffix of the side of a two-sided surface that radiates against the given facet normals. */
    public static final String BACK_SUFFIX = ".back";

    private final List<Surface> surfaces;
    private final int facetCount;

    private Scene(List<Surface> surfaces) {
        this.surfaces = List.copyOf(surfaces);
        int n = 0;
        for (Surface s : surfaces) {
            n += s.facets().size();
        }
        this.facetCount = n;
    }

    /** @return a new empty builder */
    public static Builder builder() {
        return new Builder();
    }

    /**
     * @param surfaces surfaces in order; names must be unique
     * @return the scene
     */
    public static Scene of(List<Surface> surfaces) {
        Builder b = builder();
        surfaces.forEach(b::add);
        return b.build();
    }

    /** @return the surfaces in order */
    public List<Surface> surfaces() {
        return surfaces;
    }

    /** @return the number of surfaces */
    public int surfaceCount() {
        return surfaces.size();
    }

    /** @return the total number of facets */
    public int facetCount() {
        return facetCount;
    }

    /**
     * @param name a surface name
     * @return its index in {@link #surfaces()}
     * @throws IllegalArgumentException if absent
     */
    public int indexOf(String name) {
        for (int k = 0; k < surfaces.size(); k++) {
            if (surfaces.get(k).name().equals(name)) {
                return k;
            }
        }
        throw new IllegalArgumentException("no surface named '" + name + "'");
    }

    /** @return all facets in global order */
    public List<Facet> facets() {
        List<Facet> all = new ArrayList<>(facetCount);
        for (Surface s : surfaces) {
            all.addAll(s.facets());
        }
        return all;
    }

    /** @return this scene moved by {@code t} */
    public Scene transformed(Transform t) {
        List<Surface> r = new ArrayList<>();
        for (Surface s : surfaces) {
            r.add(s.transformed(t));
        }
        return new Scene(r);
    }

    /** Collects surfaces in order and checks that names are unique. */
    public static final class Builder {
        private final List<Surface> surfaces = new ArrayList<>();
        private final Set<String> names = new HashSet<>();

        private Builder() {
        }

        /**
         * @param s the next surface
         * @return this builder
         * @throws GeometryException on a duplicate name
         */
        public Builder add(Surface s) {
            if (!names.add(s.name())) {
                throw new GeometryException("duplicate surface name '" + s.name() + "'");
            }
            surfaces.add(s);
            return this;
        }

        /**
         * @param name surface name
         * @param facets its facets
         * @return this builder
         */
        public Builder add(String name, List<Facet> facets) {
            return add(new Surface(name, facets));
        }

        /**
         * @param list surfaces in order
         * @return this builder
         */
        public Builder addAll(List<Surface> list) {
            list.forEach(this::add);
            return this;
        }

        /**
         * Adds a thin plate that radiates from both faces: surfaces {@code name.front} (the facets
         * as given) and {@code name.back} (the facets reversed).
         *
         * @param name base name
         * @param facets the plate's facets, normals toward the front side
         * @return this builder
         */
        public Builder addTwoSided(String name, List<Facet> facets) {
            Surface front = new Surface(name + FRONT_SUFFIX, facets);
            add(front);
            return add(front.reversed(name + BACK_SUFFIX));
        }

        /** @return the scene; @throws GeometryException if empty */
        public Scene build() {
            if (surfaces.isEmpty()) {
                throw new GeometryException("a scene needs at least one surface");
            }
            return new Scene(surfaces);
        }
    }
}
