package org.exitance.network;

/**
 * The radiosity network of one wavelength band for diffuse surfaces, with band-mean
 * properties held fixed (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §6.3;
 * Modest, Radiative Heat Transfer, 3rd ed., §5.3, band form §5.7):
 *
 * <pre>
 *   J_i = ε_i E_i + ρ_i Σ_j F_ij J_j + τ_i Σ_j F_o(i),j J_j + R_i,   ρ_i = 1 − ε_i − τ_i
 *   G_i = Σ_j F_ij J_j + H_i
 *   q_i = J_i − G_i = ε_i E_i − (ε_i + τ_i) Σ_j F_ij J_j + τ_i Σ_j F_o(i),j J_j − (H_i − R_i)
 * </pre>
 *
 * For an opaque surface τ_i = 0. For a face i of a window, o(i) is its other face: what arrives
 * at the other face from the surfaces and is transmitted leaves face i (Siegel &amp; Howell,
 * 5th ed., enclosures with partially transparent windows, from memory). The external part R_i
 * then holds the reflected part of face i's own external irradiation and the transmitted part of
 * its other face's; the caller builds it.
 *
 * E_i is the band emissive power of surface i (W/m²). H_i is the irradiation from outside the
 * set of surfaces (the environment, the sun, a planet) and R_i the part of it that is reflected,
 * {@code Σ_s (1 − α_s,i) H_s,i}: each external source is absorbed with a band absorptivity
 * weighted by its own spectrum, radiation between surfaces with the band-mean ε_i. The matrix
 * {@code I − diag(ρ)F} is prepared once; every right-hand side after that costs one solve.
 *
 * <p>Arrays passed in are not modified; the network keeps its own copies of ε, H and R but shares
 * the view-factor array (read only).
 */
public final class BandNetwork {
    private final int n;
    private final double[] f;
    private final double[] eps;
    private final double[] rho;
    private final double[] tau;
    private final int[] other;
    private final double[] irradiation;
    private final double[] reflected;
    private final double[] retained;
    private final double[] retainedMagnitude;
    private final RadiositySolver.Prepared prepared;

    /**
     * @param viewFactors          F, N×N row-major (not modified, not copied)
     * @param n                    N
     * @param areasM2              surface areas (m²), for the symmetric form of iterative solvers
     * @param emissivity           band-mean ε per surface in [0, 1]
     * @param externalIrradiation  H_i, band irradiation from outside the surfaces (W/m²)
     * @param externalReflected    R_i, the reflected part of H_i (W/m²), 0 ≤ R_i ≤ H_i
     * @param solver               linear-solver strategy
     */
    public BandNetwork(double[] viewFactors, int n, double[] areasM2, double[] emissivity,
                       double[] externalIrradiation, double[] externalReflected, RadiositySolver solver) {
        this(viewFactors, n, areasM2, emissivity, WindowCoupling.none(), externalIrradiation, externalReflected,
                solver);
    }

    /**
     * A band with windows.
     *
     * @param windows              band τ and other face per surface (not modified); ρ_i = 1 − ε_i − τ_i
     * @param externalReflected    R_i, the external irradiation that leaves face i: reflected from
     *                             H_i and, for a window face, transmitted from the other face's H (W/m²)
     */
    public BandNetwork(double[] viewFactors, int n, double[] areasM2, double[] emissivity, WindowCoupling windows,
                       double[] externalIrradiation, double[] externalReflected, RadiositySolver solver) {
        this(viewFactors, n, areasM2, emissivity, windows, externalIrradiation, externalReflected,
                difference(externalIrradiation, externalReflected), sum(externalIrradiation, externalReflected), solver);
    }

    /**
     * A band whose external irradiation also states what it leaves behind, computed without
     * cancellation by whoever split it into absorbed, reflected and transmitted parts.
     *
     * @param externalRetained   H_i − R_i (W/m²): what face i keeps of the external irradiation
     *                           (absorbed, or transmitted to the other face) less what is transmitted
     *                           to it from the other face
     * @param externalMagnitude  the sum of the magnitudes of the terms of H_i − R_i (W/m²), for the
     *                           node's throughput
     */
    public BandNetwork(double[] viewFactors, int n, double[] areasM2, double[] emissivity, WindowCoupling windows,
                       double[] externalIrradiation, double[] externalReflected, double[] externalRetained,
                       double[] externalMagnitude, RadiositySolver solver) {
        this.n = n;
        this.f = viewFactors;
        this.eps = emissivity.clone();
        this.rho = new double[n];
        this.tau = new double[n];
        this.other = new int[n];
        this.irradiation = externalIrradiation.clone();
        this.reflected = externalReflected.clone();
        this.retained = externalRetained.clone();
        this.retainedMagnitude = externalMagnitude.clone();
        for (int i = 0; i < n; i++) {
            tau[i] = windows.tau(i);
            other[i] = windows.other(i);
            rho[i] = Math.max(0.0, 1.0 - eps[i] - tau[i]);
        }
        this.prepared = solver.prepare(f, n, rho, areasM2.clone(), windows);
    }

    /**
     * Solves the band for given emissive powers.
     *
     * <p>The net flux is evaluated as {@code q_i = ε_i E_i − (ε_i + τ_i)(FJ)_i + τ_i (FJ)_o(i) −
     * (H_i − R_i)}, which equals {@code J_i − G_i} for a solved J but does not subtract two nearly
     * equal radiosities: for a surface that hardly emits (ε → 0) J_i ≈ G_i, and J_i − G_i would
     * lose every digit of the net flux, while this form keeps the relative accuracy of ε.
     *
     * @param emissive  E_i (W/m²), not modified
     * @return radiosity, irradiation, net flux and throughput of every surface
     */
    public BandState solve(double[] emissive) {
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = eps[i] * emissive[i] + reflected[i];
        }
        double[] j = new double[n];
        prepared.solve(b, j);
        double[] fj = irradiationFrom(j, new double[n]);
        double[] g = new double[n];
        double[] q = new double[n];
        double[] through = new double[n];
        for (int i = 0; i < n; i++) {
            g[i] = fj[i] + irradiation[i];
            double fromOther = other[i] >= 0 ? tau[i] * fj[other[i]] : 0.0;
            double emitted = eps[i] * emissive[i];
            double taken = (eps[i] + tau[i]) * fj[i];
            q[i] = emitted - taken + fromOther - retained[i];
            through[i] = Math.abs(emitted) + Math.abs(taken) + Math.abs(fromOther) + retainedMagnitude[i];
        }
        return new BandState(j, g, q, through, prepared.lastIterations(), prepared.lastRelativeResidual());
    }

    /**
     * Sensitivity of every surface's net flux to surface k's emissive power, ∂q_i/∂E_k
     * (dimensionless), from one extra solve: {@code (I − ρF − TF) x = ε_k e_k}, then
     * {@code ∂q_i/∂E_k = x_i − Σ_j F_ij x_j}.
     *
     * @param k  the surface whose emission is perturbed
     * @return a new array of length N
     */
    public double[] fluxSensitivity(int k) {
        double[] b = new double[n];
        b[k] = eps[k];
        double[] x = new double[n];
        prepared.solve(b, x);
        double[] fx = irradiationFrom(x, new double[n]);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            // the derivative of the net-flux form of solve(): exact, and free of cancellation as ε → 0
            out[i] = (i == k ? eps[i] : 0.0) - (eps[i] + tau[i]) * fx[i] + (other[i] >= 0 ? tau[i] * fx[other[i]] : 0.0);
        }
        return out;
    }

    /**
     * Change of every surface's net flux when surface j's band emissivity (and with it its
     * absorptivity for external irradiation) rises by one, at fixed emissive powers:
     * {@code x = (I − ρF − TF)⁻¹ e_j (E_j − G_j)}, then {@code ∂q/∂ε_j = x − F x} (W/m² per unit ε).
     *
     * @param j                     the surface
     * @param emissiveMinusIrradiation  E_j − G_j of the solved state (W/m²)
     * @return a new array of length N
     */
    public double[] emissivitySensitivity(int j, double emissiveMinusIrradiation) {
        double[] b = new double[n];
        b[j] = emissiveMinusIrradiation;
        double[] x = new double[n];
        prepared.solve(b, x);
        double[] fx = irradiationFrom(x, new double[n]);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = x[i] - fx[i];
        }
        return out;
    }

    private static double[] difference(double[] a, double[] b) {
        double[] d = new double[a.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = a[i] - b[i];
        }
        return d;
    }

    private static double[] sum(double[] a, double[] b) {
        double[] d = new double[a.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = Math.abs(a[i]) + Math.abs(b[i]);
        }
        return d;
    }

    /** G = F J + H; arrays not modified, result new. */
    private double[] irradiationFrom(double[] j, double[] external) {
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            int row = i * n;
            double s = external[i];
            for (int k = 0; k < n; k++) {
                s += f[row + k] * j[k];
            }
            g[i] = s;
        }
        return g;
    }

    public int size() {
        return n;
    }
}
