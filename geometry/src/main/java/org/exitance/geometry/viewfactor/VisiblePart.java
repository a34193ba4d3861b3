package org.exitance.geometry.viewfactor;

/**
 * The factor from a differential element to the part of a receiver polygon q that it sees past
 * occluder facets: the closed form of {@link PointFactor} summed over the convex pieces of the
 * visible part.
 *
 * <p>Shadows. An occluder facet is first clipped to the pyramid with apex x over q (the planes
 * through x and each edge of q, and the plane of q): only that part can lie on a segment from x
 * to q. The shadow of the clipped convex polygon O is the part of q inside the cone from x over
 * O, bounded by the planes through x and each edge of O. Cutting it from a convex piece of V is
 * a sequence of half-space splits (what {@link Poly#clip} does): the part outside the first
 * cone plane is kept, the rest goes on to the next plane, and what is inside every plane is
 * hidden. V stays a list of disjoint convex pieces; overlapping shadows need no union.
 *
 */
final class VisiblePart {

    /** Largest number of convex visible pieces of one receiver at one point. */
    static final int MAX_PIECES = 96;

    private final FacetTable t;
    private final Poly[] pieces = new Poly[2 * MAX_PIECES + 2];
    private final Poly occ = new Poly();
    private final Poly rest = new Poly();
    private final double[] pyramid = new double[4 * Poly.MAX_VERTICES];
    private final double[] cone = new double[4 * Poly.MAX_VERTICES];
    private final double[] scratch = new double[3 * Poly.MAX_VERTICES];
    private int occluderCount;
    private int[] occluders;
    private boolean overflow;
    /** The round body cut exactly at this point, or null. */
    private RoundOccluder body;
    private final ConeContour outline = new ConeContour();
    private final ConeContour cutOutline = new ConeContour();
    private long signature;

    private final boolean[] closed;

    /**
     * @param t the facets
     * @param closed per facet: part of a closed solid, so it blocks nothing when it faces away
     *        from the point (not modified; see {@link SilhouetteEdges#closed})
     * @param groups merged coplanar occluder faces: a convex one is cut as one polygon
     */
    private final CoplanarOccluders groups;
    private final int[] seenGroup;
    /** Per merged face: every facet of it belongs to a closed solid. */
    private final boolean[] groupClosed;
    private int stamp;

    VisiblePart(FacetTable t, boolean[] closed, CoplanarOccluders groups) {
        this.t = t;
        this.closed = closed;
        this.groups = groups;
        this.seenGroup = new int[groups.groups()];
        this.groupClosed = new boolean[groups.groups()];
        java.util.Arrays.fill(groupClosed, true);
        for (int f = 0; f < t.count; f++) {
            if (groups.group(f) >= 0 && !closed[f]) {
                groupClosed[groups.group(f)] = false;
            }
        }
        for (int k = 0; k < pieces.length; k++) {
            pieces[k] = new Poly();
        }
    }

    /**
     * @param x element position (m)
     * @param y element position (m)
     * @param z element position (m)
     * @param p polygon the element lies on (its normal is the element's; not modified)
     * @param q receiver, in front of p (not modified)
     * @param occ occluder facets that may block (not modified)
     * @param count entries of occ used
     * @return F from the element to the visible part of q, or NaN if that part had more than
     *         {@value #MAX_PIECES} convex pieces
     */
    double factor(double x, double y, double z, Poly p, Poly q, int[] occ, int count) {
        return factor(x, y, z, p, q, occ, count, null);
    }

    /**
     * As {@link #factor(double, double, double, Poly, Poly, int[], int)}, with one round body in
     * the way held exactly: its shadow is cut from each convex piece of the part the polygon
     * occluders leave, as the factor of its silhouette cut to the piece's pyramid
     * ({@link ConeContour}). The body must lie wholly on x's side of q's plane.
     *
     * @param round the body, or null
     */
    double factor(double x, double y, double z, Poly p, Poly q, int[] occ, int count, RoundOccluder round) {
        occluders = occ;
        occluderCount = count;
        overflow = false;
        body = round;
        double f = visibleFactor(x, y, z, p, q);
        return overflow ? Double.NaN : f;
    }

    /**
     * @return a number that changes when the make-up of the last point's visible part changes:
     *         its convex pieces and their vertex counts, and the pieces of each cut silhouette
     */
    long signature() {
        return signature;
    }

    /** @return F from the element at (x, y, z) with p's normal to the part of q seen from there */
    private double visibleFactor(double x, double y, double z, Poly p, Poly q) {
        stamp++;
        int n = buildPyramid(x, y, z, q);
        double qd = q.nx * q.cx + q.ny * q.cy + q.nz * q.cz;
        pieces[0].copyFrom(q);
        int count = 1;
        // with a round body (nested emitter lines), slivers of touching facets would make the
        // make-up flicker from point to point: parts below 1e-10 of q are dropped (an error
        // below 1e-10 of the pair, far under any tolerance)
        double minArea = (body != null ? 1e-10 : 1e-14) * q.area;
        for (int k = 0; k < occluderCount && count > 0; k++) {
            int f = occluders[k];
            int g = groups.group(f);
            double[] outline = groups.outline(f);
            if (outline != null) {
                // the whole merged face, once: one cone instead of one per facet
                if (seenGroup[g] == stamp) {
                    continue;
                }
                seenGroup[g] = stamp;
                double[] pl = groups.plane(g);
                int facing = groups.facing(g);
                if (groupClosed[g] && facing != 2 && facing * (pl[0] * x + pl[1] * y + pl[2] * z - pl[3]) <= 0) {
                    continue; // a closed solid's face turned away from the point
                }
                occ.set(outline, outline.length / 3, pl[0], pl[1], pl[2]);
            } else {
                if (closed[f] && t.normal[3 * f] * (x - t.centroid[3 * f]) + t.normal[3 * f + 1] * (y - t.centroid[3 * f + 1])
                        + t.normal[3 * f + 2] * (z - t.centroid[3 * f + 2]) <= 0) {
                    continue; // faces away from the point: a front facet of the same solid blocks first
                }
                occ.load(t, f);
            }
            int inside = classify(occ, q.nx, q.ny, q.nz, qd, n);
            if (inside < 0) {
                continue; // entirely behind q's plane or outside a side of the pyramid
            }
            if (inside == 0) {
                occ.clipAreaOnly(q.nx, q.ny, q.nz, qd, scratch); // the side facing x
                for (int e = 0; e < n && occ.n >= 3; e++) {
                    occ.clipAreaOnly(pyramid[4 * e], pyramid[4 * e + 1], pyramid[4 * e + 2], pyramid[4 * e + 3], scratch);
                }
            }
            if (occ.n < 3 || occ.area <= minArea) {
                continue;
            }
            int planes = buildCone(x, y, z, occ);
            if (planes < 3) {
                continue;
            }
            count = cut(count, planes, minArea);
            if (overflow) {
                return 0;
            }
        }
        if (body == null) {
            double f = 0;
            for (int k = 0; k < count; k++) {
                f += PointFactor.toPolygon(x, y, z, p.nx, p.ny, p.nz, pieces[k]);
            }
            return f;
        }
        // with a round body: its shadow from each piece, and the make-up for the signature
        long sig = FacetTable.mix(count);
        for (int k = 0; k < count; k++) {
            sig = FacetTable.mix(sig + pieces[k].n);
        }
        double tol = 1e-9 * (q.radius + Math.sqrt((x - q.cx) * (x - q.cx) + (y - q.cy) * (y - q.cy) + (z - q.cz) * (z - q.cz)));
        boolean seen = count == 0 || body.silhouette(x, y, z, outline, tol);
        sig = FacetTable.mix(sig + (seen ? 3 : 5));
        signature = sig;
        if (!seen) {
            return 0; // the point lies on the body: it sees nothing past it
        }
        double f = 0;
        for (int k = 0; k < count; k++) {
            double fk = PointFactor.toPolygon(x, y, z, p.nx, p.ny, p.nz, pieces[k]);
            cutOutline.copyFrom(outline);
            int planes = planesThrough(x, y, z, pieces[k], cone);
            for (int e = 0; e < planes && cutOutline.size() > 0; e++) {
                cutOutline.cut(cone[4 * e], cone[4 * e + 1], cone[4 * e + 2], cone[4 * e + 3], 16 + e, tol);
            }
            if (cutOutline.overflowed()) {
                overflow = true;
                return 0;
            }
            sig = FacetTable.mix(sig + cutOutline.signature());
            f += Math.max(0, fk - cutOutline.factor(x, y, z, p.nx, p.ny, p.nz));
        }
        signature = sig;
        return f;
    }

    /**
     * Cuts the cone in {@link #cone} (planes, inner side m·x ≥ d) from the pieces [0, count):
     * each piece is split by the planes in turn, the part outside a plane is kept, the part
     * inside every plane is hidden. @return the new count
     */
    private int cut(int count, int planes, double minArea) {
        int out = count; // new pieces are written after the old ones, then moved down
        for (int k = 0; k < count; k++) {
            rest.copyFrom(pieces[k]);
            for (int e = 0; e < planes; e++) {
                double mx = cone[4 * e], my = cone[4 * e + 1], mz = cone[4 * e + 2], d = cone[4 * e + 3];
                int side = side(rest, mx, my, mz, d);
                if (side > 0) {
                    continue; // inside this plane: the next one decides
                }
                if (out >= pieces.length) {
                    overflow = true;
                    return 0;
                }
                Poly keep = pieces[out];
                keep.copyFrom(rest);
                if (side < 0) {
                    out++; // entirely outside this plane: all of it stays visible
                    rest.n = 0;
                    break;
                }
                keep.clipAreaOnly(-mx, -my, -mz, -d, scratch);
                if (keep.n >= 3 && keep.area > minArea) {
                    out++;
                }
                rest.clipAreaOnly(mx, my, mz, d, scratch);
                if (rest.n < 3 || rest.area <= minArea) {
                    break;
                }
            }
            // whatever is left of rest is inside every plane: hidden
        }
        int kept = out - count;
        if (kept > MAX_PIECES) {
            overflow = true;
            return 0;
        }
        for (int k = 0; k < kept; k++) {
            Poly tmp = pieces[k];
            pieces[k] = pieces[count + k];
            pieces[count + k] = tmp;
        }
        return kept;
    }

    /** @return +1 all vertices on or inside (m·x ≥ d), −1 all on or outside, 0 both */
    private static int side(Poly poly, double mx, double my, double mz, double d) {
        boolean in = false, outside = false;
        double tol = 1e-12 * poly.radius;
        for (int k = 0; k < poly.n; k++) {
            double s = mx * poly.xyz[3 * k] + my * poly.xyz[3 * k + 1] + mz * poly.xyz[3 * k + 2] - d;
            if (s > tol) {
                in = true;
            } else if (s < -tol) {
                outside = true;
            }
        }
        return in && outside ? 0 : (outside ? -1 : 1);
    }

    /**
     * Where facet f lies relative to the pyramid (q's plane, normal side, and the {@code n}
     * planes in {@link #pyramid}): −1 entirely outside one plane (on it counts as outside),
     * 1 entirely inside all, 0 otherwise.
     */
    private int classify(Poly o, double qx, double qy, double qz, double qd, int n) {
        boolean allInside = true;
        for (int e = -1; e < n; e++) {
            double mx, my, mz, d;
            if (e < 0) {
                mx = qx;
                my = qy;
                mz = qz;
                d = qd;
            } else {
                mx = pyramid[4 * e];
                my = pyramid[4 * e + 1];
                mz = pyramid[4 * e + 2];
                d = pyramid[4 * e + 3];
            }
            boolean anyIn = false, anyOut = false;
            for (int v = 0; v < o.n; v++) {
                double sd = mx * o.xyz[3 * v] + my * o.xyz[3 * v + 1] + mz * o.xyz[3 * v + 2] - d;
                if (sd > 0) {
                    anyIn = true;
                } else {
                    anyOut = true;
                }
            }
            if (!anyIn) {
                return -1;
            }
            allInside &= !anyOut;
        }
        return allInside ? 1 : 0;
    }

    /** Planes through the apex and each edge of q, inner side toward q's centroid; @return count */
    private int buildPyramid(double x, double y, double z, Poly q) {
        return planesThrough(x, y, z, q, pyramid);
    }

    private int buildCone(double x, double y, double z, Poly o) {
        return planesThrough(x, y, z, o, cone);
    }

    private static int planesThrough(double x, double y, double z, Poly poly, double[] out) {
        int c = 0;
        // an interior point: the vertex average (the centroid of a clipped copy is not updated)
        double ix = 0, iy = 0, iz = 0;
        for (int k = 0; k < poly.n; k++) {
            ix += poly.xyz[3 * k];
            iy += poly.xyz[3 * k + 1];
            iz += poly.xyz[3 * k + 2];
        }
        ix /= poly.n;
        iy /= poly.n;
        iz /= poly.n;
        for (int k = 0; k < poly.n; k++) {
            int l = (k + 1) % poly.n;
            double ax = poly.xyz[3 * k] - x, ay = poly.xyz[3 * k + 1] - y, az = poly.xyz[3 * k + 2] - z;
            double bx = poly.xyz[3 * l] - x, by = poly.xyz[3 * l + 1] - y, bz = poly.xyz[3 * l + 2] - z;
            double mx = ay * bz - az * by, my = az * bx - ax * bz, mz = ax * by - ay * bx;
            double len = Math.sqrt(mx * mx + my * my + mz * mz);
            if (!(len > 1e-300)) {
                continue;
            }
            mx /= len;
            my /= len;
            mz /= len;
            double d = mx * x + my * y + mz * z;
            if (mx * ix + my * iy + mz * iz - d < 0) {
                mx = -mx;
                my = -my;
                mz = -mz;
                d = -d;
            }
            out[4 * c] = mx;
            out[4 * c + 1] = my;
            out[4 * c + 2] = mz;
            out[4 * c + 3] = d;
            c++;
        }
        return c;
    }
}
