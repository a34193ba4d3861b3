package org.exitance.geometry.shape;

import java.util.ArrayList;
import java.util.List;
import org.exitance.geometry.Facet;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;

/**
 * Ready-made enclosures and bodies, as lists of named surfaces (add them to a
 * {@link org.exitance.geometry.Scene}). Lengths in m.
 *
 * <p>Box face names (axis-aligned, min corner (x0, y0, z0), max corner (x1, y1, z1)):
 * {@code bottom} z = z0, {@code top} z = z1, {@code front} y = y0, {@code back} y = y1,
 * {@code left} x = x0, {@code right} x = x1, each with an optional prefix.
 */
public final class Enclosures {

    /** Face names of a box, in the order the surfaces are returned. */
    public static final List<String> BOX_FACES = List.of("bottom", "top", "front", "back", "left", "right");

    private Enclosures() {
    }

    /**
     * A closed box radiating inward (an enclosure), faces divided into nx × ny × nz cells.
     *
     * @param min min corner (m)
     * @param max max corner (m)
     * @param nx divisions along x (≥ 1)
     * @param ny divisions along y (≥ 1)
     * @param nz divisions along z (≥ 1)
     * @return six surfaces named as in {@link #BOX_FACES}
     */
    public static List<Surface> box(Vec3 min, Vec3 max, int nx, int ny, int nz) {
        return box("", min, max, nx, ny, nz, Facing.INWARD);
    }

    /**
     * A box radiating inward (an enclosure) or outward (a solid body).
     *
     * @param prefix prepended to each face name (may be empty)
     * @param min min corner (m)
     * @param max max corner (m)
     * @param nx divisions along x
     * @param ny divisions along y
     * @param nz divisions along z
     * @param facing INWARD for an enclosure, OUTWARD for a body
     * @return six surfaces, prefix + {@link #BOX_FACES}
     */
    public static List<Surface> box(String prefix, Vec3 min, Vec3 max, int nx, int ny, int nz, Facing facing) {
        double lx = max.x() - min.x(), ly = max.y() - min.y(), lz = max.z() - min.z();
        if (!(lx > 0 && ly > 0 && lz > 0)) {
            throw new GeometryException("box needs max > min on every axis: " + min + " " + max);
        }
        Vec3 ex = new Vec3(lx, 0, 0), ey = new Vec3(0, ly, 0), ez = new Vec3(0, 0, lz);
        Vec3 top = new Vec3(min.x(), min.y(), max.z());
        Vec3 back = new Vec3(min.x(), max.y(), min.z());
        Vec3 right = new Vec3(max.x(), min.y(), min.z());
        List<List<Facet>> faces = List.of(
                Shapes.parallelogram(min, ex, ey, nx, ny),   // bottom, +z
                Shapes.parallelogram(top, ey, ex, ny, nx),   // top, −z
                Shapes.parallelogram(min, ez, ex, nz, nx),   // front, +y
                Shapes.parallelogram(back, ex, ez, nx, nz),  // back, −y
                Shapes.parallelogram(min, ey, ez, ny, nz),   // left, +x
                Shapes.parallelogram(right, ez, ey, nz, ny)); // right, −x
        List<Surface> out = new ArrayList<>(6);
        for (int k = 0; k < 6; k++) {
            Surface s = new Surface(prefix + BOX_FACES.get(k), faces.get(k));
            out.add(facing == Facing.INWARD ? s : s.reversed(s.name()));
        }
        return out;
    }

    /**
     * A closed cylindrical cavity radiating inward: surfaces {@code wall}, {@code base} (at
     * {@code baseCenter}) and {@code lid} (at the other end), with matching azimuthal divisions.
     *
     * @param baseCenter centre of the base (m)
     * @param axis direction from base to lid
     * @param radius radius (m)
     * @param height length (m)
     * @param azimuthal divisions around (≥ 3)
     * @param axial divisions of the wall along the axis (≥ 1)
     * @param radial rings of each end disc (≥ 1)
     * @return [wall, base, lid]
     */
    public static List<Surface> cylindricalCavity(Vec3 baseCenter, Vec3 axis, double radius, double height,
            int azimuthal, int axial, int radial) {
        Vec3 a = axis.normalized();
        List<Facet> wall = Shapes.cylinderWall(baseCenter, a, radius, height, azimuthal, axial, Facing.INWARD);
        List<Facet> base = Shapes.disc(baseCenter, a, radius, radial, azimuthal);
        List<Facet> lid = new ArrayList<>();
        for (Facet f : Shapes.disc(baseCenter.plus(a.times(height)), a, radius, radial, azimuthal)) {
            lid.add(f.reversed());
        }
        return List.of(new Surface("wall", wall), new Surface("base", base), new Surface("lid", lid));
    }
}
