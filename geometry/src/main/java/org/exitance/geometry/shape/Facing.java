package org.exitance.geometry.shape;

/** Which side of a curved surface radiates: toward its axis/centre or away from it. */
public enum Facing {
    /** Normals point toward the axis or centre (the inside of a cavity). */
    INWARD,
    /** Normals point away from the axis or centre (the outside of a body). */
    OUTWARD
}
