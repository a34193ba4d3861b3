package org.exitance.geometry.section;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.exitance.geometry.GeometryException;

/**
 * A 2-D cross-section of an infinitely long geometry: named surfaces, one {@link SectionElement}
 * each, in a fixed order, and the length along the axis (m) used for totals. View factors are
 * those of the infinitely long geometry (end effects are not modelled); totals multiply the
 * per-metre values by the axial length. Immutable.
 *
 * @param surfaces the surfaces, in the order the results use
 * @param axialLength_m length along the axis (m), &gt; 0
 */
public record Section(List<NamedElement> surfaces, double axialLength_m) {

    /**
     * A surface of the section.
     *
     * @param name unique, non-blank name
     * @param element its curve and radiating side
     */
    public record NamedElement(String name, SectionElement element) {
        /** @throws GeometryException if the name is blank or the element missing */
        public NamedElement {
            if (name == null || name.isBlank()) {
                throw new GeometryException("section surface needs a non-blank name");
            }
            if (element == null) {
                throw new GeometryException("section surface '" + name + "' has no element");
            }
        }
    }

    /** @throws GeometryException if there are no surfaces, names repeat or the length is not positive */
    public Section {
        surfaces = List.copyOf(surfaces);
        if (surfaces.isEmpty()) {
            throw new GeometryException("a section needs at least one surface");
        }
        Set<String> names = new HashSet<>();
        for (NamedElement s : surfaces) {
            if (!names.add(s.name())) {
                throw new GeometryException("section surface name '" + s.name() + "' is used twice");
            }
        }
        if (!(axialLength_m > 0) || !Double.isFinite(axialLength_m)) {
            throw new GeometryException("axial length must be a finite length > 0 m, got " + axialLength_m);
        }
    }

    /** @return the number of surfaces */
    public int size() {
        return surfaces.size();
    }

    /** @return a builder of a section of the given axial length (m) */
    public static Builder builder(double axialLength_m) {
        return new Builder(axialLength_m);
    }

    /** Collects surfaces in order. */
    public static final class Builder {
        private final double axialLength_m;
        private final List<NamedElement> list = new ArrayList<>();

        private Builder(double axialLength_m) {
            this.axialLength_m = axialLength_m;
        }

        /**
         * @param name surface name
         * @param element its curve
         * @return this builder
         */
        public Builder add(String name, SectionElement element) {
            list.add(new NamedElement(name, element));
            return this;
        }

        /**
         * Adds a strip from (x0, y0) to (x1, y1) radiating to its left.
         *
         * @return this builder
         */
        public Builder segment(String name, double x0, double y0, double x1, double y1) {
            return add(name, new SectionElement.Segment(x0, y0, x1, y1));
        }

        /**
         * Adds a tube or rod of the given radius (m) radiating outward.
         *
         * @return this builder
         */
        public Builder tube(String name, double cx, double cy, double radius) {
            return add(name, new SectionElement.Circle(cx, cy, radius, SectionElement.Side.CONVEX));
        }

        /** @return the section */
        public Section build() {
            return new Section(list, axialLength_m);
        }
    }
}
