package org.exitance.geometry.section;

import org.exitance.geometry.GeometryException;

/**
 * One curve of a 2-D cross-section (an infinitely long surface seen end-on), in metres in the
 * section plane (x, y). Each element radiates from one stated side only; its back is opaque and
 * takes part in the exchange only as an obstacle.
 *
 * <ul>
 * <li>{@link Segment}: a straight strip from (x0, y0) to (x1, y1); it radiates to its
 * <b>left</b> when walking from the start to the end (so a polygon listed counter-clockwise
 * radiates into its interior).</li>
 * <li>{@link Arc}: a circular arc from the start angle, counter-clockwise over the sweep
 * (radians, 0 &lt; sweep &lt; 2π), radiating on its {@link Side#CONVEX} side (away from the
 * centre) or its {@link Side#CONCAVE} side (toward the centre).</li>
 * <li>{@link Circle}: a full circle, a tube or rod radiating {@link Side#CONVEX outward}, or a
 * shell radiating {@link Side#CONCAVE inward} that encloses the rest of the section.</li>
 * </ul>
 */
public sealed interface SectionElement permits SectionElement.Segment, SectionElement.Arc, SectionElement.Circle {

    /** Which side of a curved element radiates. */
    enum Side {
        /** away from the centre of curvature */
        CONVEX,
        /** toward the centre of curvature */
        CONCAVE
    }

    /** @return the length of the element (m per m of axial length) */
    double length();

    /**
     * A straight strip, radiating to its left seen from start to end.
     *
     * @param x0 start x (m)
     * @param y0 start y (m)
     * @param x1 end x (m)
     * @param y1 end y (m)
     */
    record Segment(double x0, double y0, double x1, double y1) implements SectionElement {
        /** @throws GeometryException if a coordinate is not finite or the segment has no length */
        public Segment {
            finite(x0, y0, x1, y1);
            if (!(Math.hypot(x1 - x0, y1 - y0) > 0)) {
                throw new GeometryException("segment from (" + x0 + ", " + y0 + ") to (" + x1 + ", " + y1
                        + ") has zero length");
            }
        }

        @Override
        public double length() {
            return Math.hypot(x1 - x0, y1 - y0);
        }
    }

    /**
     * A circular arc, counter-clockwise from {@code startAngle} over {@code sweep}.
     *
     * @param cx centre x (m)
     * @param cy centre y (m)
     * @param radius radius (m), &gt; 0
     * @param startAngle angle of the start point about the centre (rad, from +x, counter-clockwise)
     * @param sweep angular extent (rad), 0 &lt; sweep &lt; 2π
     * @param side the radiating side
     */
    record Arc(double cx, double cy, double radius, double startAngle, double sweep, Side side)
            implements SectionElement {
        /** @throws GeometryException if a value is not finite, the radius not positive or the sweep out of (0, 2π) */
        public Arc {
            finite(cx, cy, radius, startAngle, sweep);
            if (!(radius > 0)) {
                throw new GeometryException("arc radius must be > 0 m, got " + radius);
            }
            if (!(sweep > 0 && sweep < 2 * Math.PI)) {
                throw new GeometryException("arc sweep must lie in (0, 2π) rad, got " + sweep
                        + " (use a circle for a full turn)");
            }
            if (side == null) {
                throw new GeometryException("arc needs a radiating side");
            }
        }

        @Override
        public double length() {
            return radius * sweep;
        }
    }

    /**
     * A full circle.
     *
     * @param cx centre x (m)
     * @param cy centre y (m)
     * @param radius radius (m), &gt; 0
     * @param side {@link Side#CONVEX}: a tube or rod radiating outward; {@link Side#CONCAVE}: a
     *        shell radiating inward around everything else
     */
    record Circle(double cx, double cy, double radius, Side side) implements SectionElement {
        /** @throws GeometryException if a value is not finite or the radius not positive */
        public Circle {
            finite(cx, cy, radius);
            if (!(radius > 0)) {
                throw new GeometryException("circle radius must be > 0 m, got " + radius);
            }
            if (side == null) {
                throw new GeometryException("circle needs a radiating side");
            }
        }

        @Override
        public double length() {
            return 2 * Math.PI * radius;
        }
    }

    private static void finite(double... values) {
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new GeometryException("section coordinates must be finite, got " + v);
            }
        }
    }
}
