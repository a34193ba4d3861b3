package org.exitance.geometry.viewfactor;

/**
 * The convex hull of two convex polygons as a list of bounding planes, for shaft culling
 * (Haines &amp; Wallace, "Shaft culling for efficient ray-traced radiosity", Eurographics Workshop
 * on Rendering, 1991, use a hull of bounding boxes; here the hull of the polygons themselves is
 * used, which is tighter). Every face of the hull of P ∪ Q lies in the plane of P, of Q, or of an
 * edge of one polygon and a vertex of the other; all such candidate planes with every vertex on
 * one side are kept. Any segment joining a point of P to a point of Q lies inside the hull, so an
 * occluder entirely outside one plane cannot block the pair.
 *
 * <p>Planes are stored as (nx, ny, nz, d) with n pointing outward (outside: n·x − d &gt; 0).
 * Mutable; one per thread.
 */
final class Shaft {

    final double[] planes = new double[4 * (2 + 2 * Poly.MAX_VERTICES * Poly.MAX_VERTICES)];
    int count;
    double tolerance;

    /** Rebuilds the planes for polygons p and q (not modified). Modifies this. */
    void build(Poly p, Poly q) {
        count = 0;
        double size = p.radius + q.radius + Math.sqrt(sq(p.cx - q.cx) + sq(p.cy - q.cy) + sq(p.cz - q.cz));
        tolerance = 1e-9 * size;
        add(-p.nx, -p.ny, -p.nz, -(p.nx * p.cx + p.ny * p.cy + p.nz * p.cz));
        add(-q.nx, -q.ny, -q.nz, -(q.nx * q.cx + q.ny * q.cy + q.nz * q.cz));
        edgeVertexPlanes(p, q);
        edgeVertexPlanes(q, p);
    }

    private static double sq(double v) {
        return v * v;
    }

    private void add(double nx, double ny, double nz, double d) {
        planes[4 * count] = nx;
        planes[4 * count + 1] = ny;
        planes[4 * count + 2] = nz;
        planes[4 * count + 3] = d;
        count++;
    }

    private void edgeVertexPlanes(Poly e, Poly v) {
        for (int k = 0; k < e.n; k++) {
            int l = (k + 1) % e.n;
            double x0 = e.xyz[3 * k], y0 = e.xyz[3 * k + 1], z0 = e.xyz[3 * k + 2];
            double ex = e.xyz[3 * l] - x0, ey = e.xyz[3 * l + 1] - y0, ez = e.xyz[3 * l + 2] - z0;
            for (int m = 0; m < v.n; m++) {
                double wx = v.xyz[3 * m] - x0, wy = v.xyz[3 * m + 1] - y0, wz = v.xyz[3 * m + 2] - z0;
                double nx = ey * wz - ez * wy, ny = ez * wx - ex * wz, nz = ex * wy - ey * wx;
                double len = Math.sqrt(nx * nx + ny * ny + nz * nz);
                if (len < 1e-12 * (ex * ex + ey * ey + ez * ez + wx * wx + wy * wy + wz * wz)) {
                    continue;
                }
                nx /= len;
                ny /= len;
                nz /= len;
                double d = nx * x0 + ny * y0 + nz * z0;
                int side = side(e, nx, ny, nz, d);
                if (side == 2) {
                    continue;
                }
                int side2 = side(v, nx, ny, nz, d);
                if (side2 == 2 || (side != 0 && side2 != 0 && side != side2)) {
                    continue;
                }
                int s = side != 0 ? side : side2;
                if (s > 0) {
                    add(-nx, -ny, -nz, -d);
                } else {
                    add(nx, ny, nz, d);
                }
            }
        }
    }

    /** @return 0 all on the plane, −1 all on or below, +1 all on or above, 2 both sides */
    private int side(Poly p, double nx, double ny, double nz, double d) {
        boolean below = false, above = false;
        for (int k = 0; k < p.n; k++) {
            double s = nx * p.xyz[3 * k] + ny * p.xyz[3 * k + 1] + nz * p.xyz[3 * k + 2] - d;
            if (s > tolerance) {
                above = true;
            } else if (s < -tolerance) {
                below = true;
            }
            if (above && below) {
                return 2;
            }
        }
        return above ? 1 : (below ? -1 : 0);
    }
}
