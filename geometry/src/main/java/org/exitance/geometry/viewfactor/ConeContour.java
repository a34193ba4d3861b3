package org.exitance.geometry.viewfactor;

/**
 * A closed curve of straight segments and circular arcs in space that bounds a convex cone of
 * directions seen from an apex x: the silhouette of a round body ({@link RoundOccluder}), cut to
 * the pyramid over a receiver piece. Only the directions from x matter, so points of one curve
 * may lie at any distance from x.
 *
 * <p>Cutting by a plane through x keeps the part of the curve on the plane's inner side and
 * closes each gap by a straight segment between the exit and the re-entry point, both in the
 * plane: the cone over that segment is the plane's part of the cut cone's boundary (the cone is
 * convex, so its part in a half-space is convex too).
 *
 * <p>The factor from a differential element at x (unit normal n) to the cone is the contour form
 * (Siegel &amp; Howell, 4th ed., §4.3, the contour integral for a differential area, which
 * depends on the curve's directions only):
 *
 * <pre>  F = (1/2π) |∮ n·(R × dR) / |R|²|,   R = point − x, </pre>
 *
 * valid while the cone lies in front of the element. A segment gives the polygon term
 * γ n·(a × b)/|a × b|; an arc's term is in closed form too ({@link ArcTerm}).
 *
 * <p>Mutable scratch; one instance per thread.
 */
final class ConeContour {

    static final int SEGMENT = 0, ARC = 1;
    /** Largest number of pieces. */
    static final int MAX_PIECES = 64;
    private static final int STRIDE = 11;
    private static final double TWO_PI = 2 * Math.PI;

    private int n;
    private int[] kind = new int[MAX_PIECES];
    private int[] origin = new int[MAX_PIECES];
    /** Segment: A(3), B(3). Arc: centre(3), U(3), W(3), φ start, φ end (either order). */
    private double[] data = new double[STRIDE * MAX_PIECES];
    private int[] kind2 = new int[MAX_PIECES];
    private int[] origin2 = new int[MAX_PIECES];
    private double[] data2 = new double[STRIDE * MAX_PIECES];
    private boolean overflow;
    private final double[] point = new double[6];

    /** Makes this a copy of o (not modified). */
    void copyFrom(ConeContour o) {
        n = o.n;
        overflow = o.overflow;
        System.arraycopy(o.kind, 0, kind, 0, n);
        System.arraycopy(o.origin, 0, origin, 0, n);
        System.arraycopy(o.data, 0, data, 0, STRIDE * n);
    }

    /** Empties the curve. */
    void clear() {
        n = 0;
        overflow = false;
    }

    /** @return the number of pieces (0: the cone is empty) */
    int size() {
        return n;
    }

    /** @return whether a cut needed more than {@value #MAX_PIECES} pieces (then the curve is unusable) */
    boolean overflowed() {
        return overflow;
    }

    /** Appends the segment from a to b (m). @param code what the piece stands for (signatures) */
    void segment(double ax, double ay, double az, double bx, double by, double bz, int code) {
        int o = slot(code, SEGMENT);
        if (o < 0) {
            return;
        }
        data[o] = ax;
        data[o + 1] = ay;
        data[o + 2] = az;
        data[o + 3] = bx;
        data[o + 4] = by;
        data[o + 5] = bz;
    }

    /**
     * Appends the arc centre + U cos φ + W sin φ, φ from f0 to f1 (either order, at most π apart).
     *
     * @param c centre (m; not modified)
     * @param u first radius vector (m; not modified)
     * @param w second radius vector, perpendicular to u and as long (m; not modified)
     */
    void arc(double[] c, double[] u, double[] w, double f0, double f1, int code) {
        int o = slot(code, ARC);
        if (o < 0) {
            return;
        }
        for (int k = 0; k < 3; k++) {
            data[o + k] = c[k];
            data[o + 3 + k] = u[k];
            data[o + 6 + k] = w[k];
        }
        data[o + 9] = f0;
        data[o + 10] = f1;
    }

    private int slot(int code, int type) {
        if (n == MAX_PIECES) {
            overflow = true;
            return -1;
        }
        kind[n] = type;
        origin[n] = code;
        return STRIDE * n++;
    }

    /**
     * Keeps the part of the cone on the inner side m·p ≥ d of a plane through the apex.
     *
     * @param code what the closing segments stand for (signatures)
     * @param tol distance within which a point counts as on the plane (m)
     */
    void cut(double mx, double my, double mz, double d, int code, double tol) {
        if (n == 0 || overflow) {
            return;
        }
        // the pieces split at the plane, each with its side
        int m = 0;
        boolean anyOut = false, anyIn = false;
        int[] sideOf = sides;
        for (int k = 0; k < n && !overflow; k++) {
            int o = STRIDE * k;
            if (kind[k] == SEGMENT) {
                double sa = mx * data[o] + my * data[o + 1] + mz * data[o + 2] - d;
                double sb = mx * data[o + 3] + my * data[o + 4] + mz * data[o + 5] - d;
                if (sa >= -tol && sb >= -tol) {
                    m = copy(k, m, 1, sideOf);
                } else if (sa <= tol && sb <= tol) {
                    m = copy(k, m, -1, sideOf);
                } else {
                    double t = sa / (sa - sb);
                    double px = data[o] + t * (data[o + 3] - data[o]);
                    double py = data[o + 1] + t * (data[o + 4] - data[o + 1]);
                    double pz = data[o + 2] + t * (data[o + 5] - data[o + 2]);
                    int first = m;
                    m = copy(k, m, sa > 0 ? 1 : -1, sideOf);
                    m = copy(k, m, sb > 0 ? 1 : -1, sideOf);
                    if (overflow) {
                        break;
                    }
                    int a = STRIDE * first, b = STRIDE * (first + 1);
                    data2[a + 3] = px;
                    data2[a + 4] = py;
                    data2[a + 5] = pz;
                    data2[b] = px;
                    data2[b + 1] = py;
                    data2[b + 2] = pz;
                }
            } else {
                m = splitArc(k, m, mx, my, mz, d, sideOf);
            }
        }
        if (overflow) {
            return;
        }
        for (int k = 0; k < m; k++) {
            anyIn |= sideOf[k] > 0;
            anyOut |= sideOf[k] < 0;
        }
        if (!anyOut) {
            return; // wholly inside: unchanged
        }
        if (!anyIn) {
            n = 0; // wholly outside: nothing left
            return;
        }
        int start = 0;
        while (!(sideOf[start] > 0 && sideOf[(start + m - 1) % m] < 0)) {
            start++;
        }
        int count = 0;
        boolean gap = false;
        double[] last = lastPoint;
        for (int s = 0; s < m && !overflow; s++) {
            int k = (start + s) % m;
            if (sideOf[k] < 0) {
                gap = true;
                continue;
            }
            if (gap) {
                endPoint(data2, kind2[k], STRIDE * k, false, point);
                count = join(count, last, point, code);
                gap = false;
            }
            count = move(k, count);
            endPoint(data2, kind2[k], STRIDE * k, true, last);
        }
        if (gap && !overflow) {
            int k = start;
            endPoint(data2, kind2[k], STRIDE * k, false, point);
            count = join(count, last, point, code);
        }
        if (overflow) {
            return;
        }
        // the new curve is in kind/origin/data (written by move and join)
        System.arraycopy(newKind, 0, kind, 0, count);
        System.arraycopy(newOrigin, 0, origin, 0, count);
        System.arraycopy(newData, 0, data, 0, STRIDE * count);
        n = count;
    }

    private final int[] sides = new int[3 * MAX_PIECES];
    private final double[] lastPoint = new double[3];
    private final int[] newKind = new int[MAX_PIECES];
    private final int[] newOrigin = new int[MAX_PIECES];
    private final double[] newData = new double[STRIDE * MAX_PIECES];

    private int move(int k, int count) {
        if (count == MAX_PIECES) {
            overflow = true;
            return count;
        }
        newKind[count] = kind2[k];
        newOrigin[count] = origin2[k];
        System.arraycopy(data2, STRIDE * k, newData, STRIDE * count, STRIDE);
        return count + 1;
    }

    private int join(int count, double[] a, double[] b, int code) {
        if (count == MAX_PIECES) {
            overflow = true;
            return count;
        }
        newKind[count] = SEGMENT;
        newOrigin[count] = code;
        int o = STRIDE * count;
        newData[o] = a[0];
        newData[o + 1] = a[1];
        newData[o + 2] = a[2];
        newData[o + 3] = b[0];
        newData[o + 4] = b[1];
        newData[o + 5] = b[2];
        return count + 1;
    }

    /** Copies piece k into the split buffer at m with the given side. @return m + 1 */
    private int copy(int k, int m, int side, int[] sideOf) {
        if (m >= MAX_PIECES) {
            overflow = true;
            return m;
        }
        kind2[m] = kind[k];
        origin2[m] = origin[k];
        System.arraycopy(data, STRIDE * k, data2, STRIDE * m, STRIDE);
        sideOf[m] = side;
        return m + 1;
    }

    /** Splits arc k at the plane (α + β cos φ + γ sin φ = 0) into the buffer. @return the new m */
    private int splitArc(int k, int m, double mx, double my, double mz, double d, int[] sideOf) {
        int o = STRIDE * k;
        double al = mx * data[o] + my * data[o + 1] + mz * data[o + 2] - d;
        double be = mx * data[o + 3] + my * data[o + 4] + mz * data[o + 5];
        double ga = mx * data[o + 6] + my * data[o + 7] + mz * data[o + 8];
        double f0 = data[o + 9], f1 = data[o + 10];
        double lo = Math.min(f0, f1), hi = Math.max(f0, f1);
        double[] cuts = arcCuts;
        int c = 0;
        double rho = Math.hypot(be, ga);
        if (rho > Math.abs(al)) {
            double base = Math.atan2(ga, be), delta = Math.acos(-al / rho);
            for (int sgn = -1; sgn <= 1; sgn += 2) {
                // the root's turn inside (lo, hi), if any
                double root = base + sgn * delta;
                double r = root + TWO_PI * Math.ceil((lo - root) / TWO_PI);
                if (r > lo + 1e-12 && r < hi - 1e-12) {
                    cuts[c++] = r;
                }
            }
        }
        if (c == 2 && cuts[0] > cuts[1]) {
            double s = cuts[0];
            cuts[0] = cuts[1];
            cuts[1] = s;
        }
        boolean forward = f1 >= f0;
        double prev = f0;
        for (int s = 0; s <= c; s++) {
            double next = s == c ? f1 : (forward ? cuts[s] : cuts[c - 1 - s]);
            double mid = 0.5 * (prev + next);
            double side = al + be * Math.cos(mid) + ga * Math.sin(mid);
            int first = m;
            m = copy(k, m, side >= 0 ? 1 : -1, sideOf);
            if (overflow) {
                return m;
            }
            data2[STRIDE * first + 9] = prev;
            data2[STRIDE * first + 10] = next;
            prev = next;
        }
        return m;
    }

    private final double[] arcCuts = new double[2];

    /** Writes the start (or end) point of a piece into out (modified). */
    private static void endPoint(double[] d, int type, int o, boolean end, double[] out) {
        if (type == SEGMENT) {
            int b = end ? o + 3 : o;
            out[0] = d[b];
            out[1] = d[b + 1];
            out[2] = d[b + 2];
            return;
        }
        double f = d[o + (end ? 10 : 9)], cs = Math.cos(f), sn = Math.sin(f);
        for (int k = 0; k < 3; k++) {
            out[k] = d[o + k] + cs * d[o + 3 + k] + sn * d[o + 6 + k];
        }
    }

    /**
     * A number that changes when the curve's make-up changes: a cyclic-invariant hash of the
     * sequence of piece codes, runs of one code counted once.
     */
    long signature() {
        if (n == 0) {
            return 0x9E3779B97F4A7C15L;
        }
        long h = 0;
        int first = -1;
        for (int k = 0; k < n; k++) {
            if (origin[k] != origin[(k + n - 1) % n]) {
                first = k;
                break;
            }
        }
        if (first < 0) {
            return FacetTable.mix(origin[0] * 7919L + 1);
        }
        int prev = origin[first];
        for (int s = 1; s <= n; s++) {
            int c = origin[(first + s) % n];
            if (c != prev) {
                h += FacetTable.mix(prev * 65_537L + c);
                prev = c;
            }
        }
        return h;
    }

    /**
     * @return the factor from the element at x with unit normal n to the cone (the cone must lie
     *         in front of the element)
     */
    double factor(double x, double y, double z, double nx, double ny, double nz) {
        double sum = 0;
        for (int k = 0; k < n; k++) {
            int o = STRIDE * k;
            if (kind[k] == SEGMENT) {
                double ax = data[o] - x, ay = data[o + 1] - y, az = data[o + 2] - z;
                double bx = data[o + 3] - x, by = data[o + 4] - y, bz = data[o + 5] - z;
                double cx = ay * bz - az * by, cy = az * bx - ax * bz, cz = ax * by - ay * bx;
                double len = Math.sqrt(cx * cx + cy * cy + cz * cz);
                if (len > 0) {
                    sum += Math.atan2(len, ax * bx + ay * by + az * bz) * (nx * cx + ny * cy + nz * cz) / len;
                }
            } else {
                sum += ArcTerm.of(data, o, x, y, z, nx, ny, nz);
            }
        }
        return Math.abs(sum) / TWO_PI;
    }
}
