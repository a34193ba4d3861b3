package org.exitance.network;

/**
 * The radiosity network of one wavelength band for diffuse surfaces, with band-mean
 * properties held fixed (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §6.3;
 * Modest, Radiative Heat Transfer, 3rd ed., §5.3, band form §5.7):
 *
 * <pre>
 *   J_i = ε_i E_i + ρ_i Σ_j F_ij J_j + τ_i Σ_j F_o(i),j J_j + R_i,   ρ_i = 1 − ε_i − τ_i
 *   G_i = Σ_j F_ij J_j + H_i
 *   q_i = J_i − G_i
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
    private final double[] irradiation;
    private final double[] reflected;
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
        this.n = n;
        this.f = viewFactors;
        this.eps = emissivity.clone();
        this.rho = new double[n];
        this.irradiation = externalIrradiation.clone();
        this.reflected = externalReflected.clone();
        for (int i = 0; i < n; i++) {
            rho[i] = Math.max(0.0, 1.0 - eps[i] - windows.tau(i));
        }
        this.prepared = solver.prepare(f, n, rho, areasM2.clone(), windows);
    }

    /**
     * Solves the band for given emissive powers.
     *
     * @param emissive  E_i (W/m²), not modified
     * @return radiosity, irradiation and net flux of every surface
     */
    public BandState solve(double[] emissive) {
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = eps[i] * emissive[i] + reflected[i];
        }
        double[] j = new double[n];
        prepared.solve(b, j);
        double[] g = irradiationFrom(j, irradiation);
        double[] q = new double[n];
        for (int i = 0; i < n; i++) {
            q[i] = j[i] - g[i];
        }
        return new BandState(j, g, q, prepared.lastIterations(), prepared.lastRelativeResidual());
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
        double[] dg = irradiationFrom(x, new double[n]);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = x[i] - dg[i];
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
