package org.exitance.geometry;

/** Thrown when a shape, facet or scene violates a geometric requirement (degenerate, non-planar, ...). */
public class GeometryException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /** @param message what is wrong, with the offending values */
    public GeometryException(String message) {
        super(message);
    }
}
