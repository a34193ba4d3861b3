package org.exitance.geometry.mesh;

import java.util.List;
import org.exitance.geometry.Surface;

/**
 * A read mesh and what was repaired on the way.
 *
 * @param surfaces surfaces in file order (STL: one per solid; OBJ: one per group/object name)
 * @param droppedDegenerate facets dropped for zero area (repeated or collinear vertices)
 * @param normalConflicts STL facets whose stored normal opposed the winding (resolved by policy)
 * @param splitPolygons OBJ polygons split into triangles (non-planar or non-convex)
 * @param notes one human-readable line per repair kind, empty when nothing was repaired
 */
public record MeshImport(List<Surface> surfaces, int droppedDegenerate, int normalConflicts, int splitPolygons,
        List<String> notes) {

    /** Copies the lists. */
    public MeshImport {
        surfaces = List.copyOf(surfaces);
        notes = List.copyOf(notes);
    }
}
