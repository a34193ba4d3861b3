package org.exitance.geometry.viewfactor;

/** How the calculator treats obstruction between facets. */
public enum Obstruction {
    /**
     * Detect it: facets whose plane has scene vertices strictly on both sides are potential
     * occluders (a facet with the whole scene on one side of its plane cannot block any segment
     * between two scene points); pairs whose hull contains one are ray-tested.
     */
    AUTO,
    /** Assume every pair is unobstructed (faster; wrong if something blocks). */
    NONE
}
