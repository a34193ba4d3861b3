package org.exitance.geometry.mesh;

/**
 * What to do when an STL facet's stored normal points against the normal given by its vertex
 * winding (counter-clockwise seen from the radiating side). A stored zero normal is never a
 * conflict.
 */
public enum NormalPolicy {
    /** Reject the file with the facet number (default: a wrong side is a wrong model). */
    STRICT,
    /** Trust the winding, ignore the stored normal; count the conflicts in the report. */
    USE_WINDING,
    /** Trust the stored normal, reverse the winding; count the flips in the report. */
    USE_STORED_NORMAL
}
