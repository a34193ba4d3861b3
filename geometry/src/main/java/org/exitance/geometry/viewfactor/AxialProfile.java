package org.exitance.geometry.viewfactor;

import java.util.Arrays;
import org.exitance.geometry.Patch;

/**
 * What {@link CoaxialPairs} reads of a plane or cone patch, in the axis frame of the pair's
 * first patch a: the radius ρ(u) = ρ0 + ρ1 u (m), the height z(u) = z0 + zs u along a's axis
 * (m), the radiating normal's radial and axial parts n_r, n_z (constant on a plane or cone) and
 * the area element dA/(du dφ) = j ρ(u). Seven numbers per patch, {@link #SIZE}.
 *
 * <p>Heights are rounded to a power-of-two grid of 2⁻⁴⁰ of the scene size, azimuths (shifted so
 * that a's range starts at 0, which changes nothing: kernel, weight and visibility depend only
 * on differences) to 2⁻⁴⁰ rad, and the pair tolerance to 8 significant bits. Two pairs congruent
 * under a rotation about the axis (a cylinder built of equal facets around) then give equal
 * numbers, so one computes and the other reuses the result ({@link Key}); since the result is a
 * function of these numbers only, it does not depend on which of the two ran first, nor on the
 * thread count. Stateless.
 */
final class AxialProfile {

    static final int SIZE = 7;

    private AxialProfile() {
    }

    /**
     * @param p a PLANE or CONE patch on the axis (not modified)
     * @param axis a's origin (3) and axis direction (3), m (not modified)
     * @param grid the height grid (m, a power of two)
     * @param out receives the 7 numbers at [off, off + 7) (modified)
     */
    static void of(Patch p, double[] axis, double grid, double[] out, int off) {
        double[] ring = new double[16];
        p.ring(p.u0(), ring, 0);
        double s = Math.signum(p.frame(9) * axis[3] + p.frame(10) * axis[4] + p.frame(11) * axis[5]);
        double z = (p.frame(0) - axis[0]) * axis[3] + (p.frame(1) - axis[1]) * axis[4] + (p.frame(2) - axis[2]) * axis[5];
        boolean plane = p.kind() == Patch.Kind.PLANE;
        out[off] = plane ? 0 : p.shapeA();
        out[off + 1] = plane ? 1 : p.shapeB();
        out[off + 2] = round(z, grid);
        out[off + 3] = plane ? 0 : s;
        out[off + 4] = ring[4];
        out[off + 5] = s * ring[5];
        out[off + 6] = plane ? 1 : Math.sqrt(1 + p.shapeB() * p.shapeB());
    }

    /**
     * The canonical azimuth ranges of a pair: a's [0, α], b's [g0, g1] (either order) shifted by
     * whole turns to start in [0, 2π) (the integrand is periodic in ψ), and replaced by its mirror
     * image across the azimuth α/2 (a onto itself, b onto [α − hi, α − lo], the same exchange
     * area) when that starts earlier; all rounded to 2⁻⁴⁰ rad.
     *
     * @param out receives 0, α, lo, hi (rad) (modified)
     */
    static void azimuths(double alphaIn, double g0, double g1, double[] out) {
        double turn = 0x1p-40, alpha = round(alphaIn, turn);
        double lo = round(wrap(Math.min(g0, g1)), turn), hi = lo + round(Math.abs(g1 - g0), turn);
        double mirrored = round(wrap(alpha - hi), turn);
        if (mirrored < lo) {
            hi = mirrored + (hi - lo);
            lo = mirrored;
        }
        out[0] = 0;
        out[1] = alpha;
        out[2] = lo;
        out[3] = hi;
    }

    /** @return the angle shifted by whole turns into [0, 2π) (rad) */
    private static double wrap(double x) {
        return x - 2 * Math.PI * Math.floor(x / (2 * Math.PI));
    }

    static double rho(double[] q, int off, double u) {
        return q[off] + q[off + 1] * u;
    }

    static double height(double[] q, int off, double u) {
        return q[off + 2] + q[off + 3] * u;
    }

    /** @return x rounded to the nearest multiple of grid (exact for a power-of-two grid) */
    static double round(double x, double grid) {
        return Math.rint(x / grid) * grid;
    }

    /** @return the power of two nearest above 2⁻⁴⁰ of the scale */
    static double grid(double scale) {
        return Math.scalb(1.0, Math.getExponent(Math.max(scale, Double.MIN_NORMAL)) + 1 - 40);
    }

    /** @return tol with its mantissa rounded to 8 bits */
    static double tolerance(double tol) {
        int e = Math.getExponent(tol);
        return Math.scalb(Math.rint(Math.scalb(tol, 8 - e)), e - 8);
    }

    /**
     * @return the key of the numbers of first and second (all) and of last[0, lastCount) (none
     *         modified)
     */
    static Key key(double[] first, double[] second, double[] last, int lastCount) {
        double[] v = new double[first.length + second.length + lastCount];
        System.arraycopy(first, 0, v, 0, first.length);
        System.arraycopy(second, 0, v, first.length, second.length);
        System.arraycopy(last, 0, v, first.length + second.length, lastCount);
        return new Key(v, v.length);
    }

    /** The numbers a result depends on, compared bit for bit. Immutable. */
    static final class Key {
        private final long[] bits;
        private final int hash;

        /** @param v the numbers, [0, n) (not modified) */
        Key(double[] v, int n) {
            bits = new long[n];
            for (int k = 0; k < n; k++) {
                bits[k] = Double.doubleToLongBits(v[k] + 0.0);
            }
            hash = Arrays.hashCode(bits);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && k.hash == hash && Arrays.equals(k.bits, bits);
        }

        @Override
        public int hashCode() {
            return hash;
        }
    }
}
