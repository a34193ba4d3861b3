package org.exitance.network;

import java.util.stream.IntStream;

/**
 * Gebhart's absorption factors of one band network: {@code B_ji}, the fraction of the power that
 * leaves surface j as a source (its emission ε_j E_j A_j, or the part of an external irradiation
 * it releases unabsorbed) and is taken by surface i after any number of diffuse reflections and
 * transmissions; the last column is the part that leaves through the opening to the environment.
 * (Gebhart, Int. J. Heat Mass Transfer 3, 1961, 341–346; Siegel &amp; Howell, Thermal Radiation Heat
 * Transfer, 5th ed., the absorption-factor method of Ch. 6, from memory. For opaque surfaces
 * {@code B_ji = F_ji ε_i + Σ_m F_jm ρ_m B_mi}.)
 *
 * <p>Computed from the band's own operator: one blocked solve of {@code (I − ρF − TF) Y = I} (one
 * factorization, all N right-hand sides at once: {@link RadiositySolver.Prepared#solveBlock}), then
 * the product {@code F·Y}. Column j of Y is the radiosity a unit source at j produces. What surface
 * i takes is the net-flux form of {@link BandNetwork#solve}: {@code A_i[(ε_i + τ_i)(FY)_ij −
 * τ_i (FY)_o(i),j]}; for a window face that is what it absorbs plus what it passes to its other
 * face less what its other face passes to it, so a face's factor can be negative while the
 * window's two faces together take what the window absorbs. What leaves to the environment is
 * {@code Σ_m A_m F_m,env Y_mj}. With F reciprocal and each row closed by the environment factor,
 * every row sums to 1 (conservation) and {@code A_j ε_j B_ji = A_i ε_i B_ij} for opaque surfaces
 * (reciprocity).
 *
 * <p>Cost per band: about (2/3 + 2 + 2)·N³ flops and three N×N arrays at the peak (the identity
 * block solved in place, F·Y, the factors), which the caller checks with the memory budget.
 */
public final class AbsorptionFactors {
    private AbsorptionFactors() {
    }

    /** Bytes this computation holds at its peak for N surfaces. */
    public static long peakBytes(int n) {
        double b = 3.0 * Double.BYTES * n * (double) (n + 1);
        return b >= Long.MAX_VALUE ? Long.MAX_VALUE : (long) b;
    }

    /**
     * @param net        the band's prepared network (its F, ε, τ and operator)
     * @param envFactor  F_i,env per surface (0 for a closed enclosure); not modified
     * @return B, N×(N+1) row-major: row j the source surface, column i &lt; N the surface that takes
     *         the power, column N the environment (a new array)
     */
    public static double[] of(BandNetwork net, double[] envFactor) {
        int n = net.n;
        double[] y = new double[n * n];
        for (int i = 0; i < n; i++) {
            y[i * n + i] = 1.0;
        }
        net.prepared().solveBlock(y, n, y);
        double[] f = net.f;
        double[] fy = new double[n * n];
        // each entry is one sequential sum: the same bits whatever the thread count
        IntStream.range(0, n).parallel().forEach(i -> {
            int row = i * n;
            for (int m = 0; m < n; m++) {
                double fim = f[row + m];
                if (fim == 0) {
                    continue;
                }
                int ym = m * n;
                for (int j = 0; j < n; j++) {
                    fy[row + j] += fim * y[ym + j];
                }
            }
        });
        double[] b = new double[n * (n + 1)];
        for (int i = 0; i < n; i++) {
            double gain = net.eps[i] + net.tau[i];
            int o = net.other[i];
            double out = o >= 0 ? net.tau[i] : 0.0;
            for (int j = 0; j < n; j++) {
                double taken = gain * fy[i * n + j] - (out != 0 ? out * fy[o * n + j] : 0.0);
                b[j * (n + 1) + i] = net.area[i] * taken / net.area[j];
            }
        }
        for (int j = 0; j < n; j++) {
            double leaving = 0;
            for (int m = 0; m < n; m++) {
                leaving += net.area[m] * envFactor[m] * y[m * n + j];
            }
            b[j * (n + 1) + n] = leaving / net.area[j];
        }
        return b;
    }
}
