package org.exitance.network;

/**
 * The radiosity network of one wavelength band for diffuse opaque surfaces, with band-mean
 * properties held fixed (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §6.3;
 * Modest, Radiative Heat Transfer, 3rd ed., §5.3, band form §5.7):
 *
 * <pre>
 *   J_i = ε_i E_i + ρ_i G_i,   ρ_i = 1 − ε_i
 *   G_i = Σ_j F_ij J_j + H_i
 *   q_i = J_i − G_i = ε_i (E_i − G_i)
 * </pre>
 *
 * E_i is the band emissive power of surface i (W/m²), H_i the external irradiation reaching it
 * (W/m²): here the environment's band emissive power times the row remainder F_i,env. The
 * matrix {@code I − diag(ρ)F} is prepared once; every right-hand side after that costs one solve.
 *
 * <p>Arrays passed in are not modified; the network keeps its own copies of ε and H but shares
 * the view-factor array (read only).
 */
public final class BandNetwork {
    private final int n;
    private final double[] f;
    private final double[] areasM2;
    private final double[] envFactor;
    private final double[] eps;
    private final double[] rho;
    private final double envEmissive;
    private final double[] irradiation;
    private final RadiositySolver.Prepared prepared;

    /**
     * @param viewFactors          F, N×N row-major (not modified, not copied)
     * @param n                    N
     * @param areasM2              surface areas (m²)
     * @param environmentFactors   F_i,env per surface (0 for a closed enclosure)
     * @param emissivity           band-mean ε per surface in [0, 1]
     * @param environmentEmissive  the environment's band emissive power (W/m²)
     * @param solver               linear-solver strategy
     */
    public BandNetwork(double[] viewFactors, int n, double[] areasM2, double[] environmentFactors,
                       double[] emissivity, double environmentEmissive, RadiositySolver solver) {
        this.n = n;
        this.f = viewFactors;
        this.areasM2 = areasM2.clone();
        this.envFactor = environmentFactors.clone();
        this.eps = emissivity.clone();
        this.rho = new double[n];
        this.irradiation = new double[n];
        this.envEmissive = environmentEmissive;
        for (int i = 0; i < n; i++) {
            rho[i] = 1.0 - eps[i];
            irradiation[i] = envFactor[i] * environmentEmissive;
        }
        this.prepared = solver.prepare(f, n, rho, this.areasM2);
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
            b[i] = eps[i] * emissive[i] + rho[i] * irradiation[i];
        }
        double[] j = new double[n];
        prepared.solve(b, j);
        double[] g = irradiationFrom(j, irradiation);
        double[] q = new double[n];
        double envNet = 0;
        for (int i = 0; i < n; i++) {
            q[i] = eps[i] * (emissive[i] - g[i]);
            envNet += areasM2[i] * envFactor[i] * (envEmissive - j[i]);
        }
        return new BandState(j, g, q, envNet, prepared.lastIterations(), prepared.lastRelativeResidual());
    }

    /**
     * Sensitivity of every surface's net flux to surface k's emissive power, ∂q_i/∂E_k
     * (dimensionless), from one extra solve: {@code (I − ρF) x = ε_k e_k}, then
     * {@code ∂q_i/∂E_k = ε_i (δ_ik − Σ_j F_ij x_j)}.
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
            out[i] = eps[i] * ((i == k ? 1.0 : 0.0) - dg[i]);
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
