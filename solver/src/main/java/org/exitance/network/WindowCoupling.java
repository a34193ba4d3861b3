package org.exitance.network;

/**
 * The coupling of the two faces of each window in one band: radiation arriving at one face and
 * transmitted leaves the other. Row i of the radiosity system gains {@code −τ_i Σ_j F_o(i),j J_j},
 * where o(i) is the other face of i (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed.,
 * enclosures with partially transparent windows, from memory). The resulting matrix
 * {@code I − diag(ρ)F − T F} is not symmetric in any row scaling, which is why windows need the
 * direct solver.
 *
 * @param transmissivity  band τ per surface (0 for opaque surfaces); empty for no windows
 * @param otherFace       index of the other face per surface, −1 for opaque; empty for no windows
 */
public record WindowCoupling(double[] transmissivity, int[] otherFace) {
    private static final WindowCoupling NONE = new WindowCoupling(new double[0], new int[0]);

    public WindowCoupling {
        if (transmissivity.length != otherFace.length) {
            throw new IllegalArgumentException("window coupling: " + transmissivity.length + " transmissivities for "
                    + otherFace.length + " surfaces");
        }
        transmissivity = transmissivity.clone();
        otherFace = otherFace.clone();
    }

    /** No windows. */
    public static WindowCoupling none() {
        return NONE;
    }

    /**
     * True when no surface transmits in this band (no coupling at all): two-sided opaque plates
     * (τ = 0) couple nothing, and a window with τ = 0 in a band couples nothing in it.
     */
    public boolean isEmpty() {
        for (int i = 0; i < otherFace.length; i++) {
            if (otherFace[i] >= 0 && transmissivity[i] != 0) {
                return false;
            }
        }
        return true;
    }

    /** τ of surface i (0 when there are no windows). */
    public double tau(int i) {
        return otherFace.length == 0 ? 0.0 : transmissivity[i];
    }

    /** Other face of surface i, or −1. */
    public int other(int i) {
        return otherFace.length == 0 ? -1 : otherFace[i];
    }

    /**
     * Row i of the coupled operator applied to x: {@code x_i − ρ_i Σ_j F_ij x_j − τ_i Σ_j F_o(i),j x_j}.
     * Arrays are not modified.
     */
    double rowTimes(double[] f, int n, double[] rho, double[] x, int i) {
        double s = 0;
        int row = i * n;
        for (int k = 0; k < n; k++) {
            s += f[row + k] * x[k];
        }
        double v = x[i] - rho[i] * s;
        int o = other(i);
        if (o >= 0 && tau(i) != 0) {
            double t = 0;
            int orow = o * n;
            for (int k = 0; k < n; k++) {
                t += f[orow + k] * x[k];
            }
            v -= tau(i) * t;
        }
        return v;
    }
}
