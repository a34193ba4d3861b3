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
    final int n;
    /** F as a dense array, or null when the network works from {@link #op} alone. */
    final double[] f;
    /** F as an operator: every F product of this class and of the fused band solves. */
    final RadiationOperator op;
    final double[] eps;
    private final double[] rho;
    final double[] tau;
    final int[] other;
    private final double[] irradiation;
    private final double[] reflected;
    private final double[] retained;
    private final double[] retainedMagnitude;
    final double[] area;
    final RadiositySolver.Prepared prepared;
    /** The last fused solve's J and F·J (NetworkGroup): the next CG solve's warm start; null before. */
    double[] lastRadiosity;
    double[] lastIrradiationProduct;

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
        this(RadiationOperator.dense(viewFactors, n), viewFactors, areasM2, emissivity, windows, externalIrradiation,
                externalReflected, externalRetained, externalMagnitude, solver);
    }

    /**
     * A band over a {@link RadiationOperator}; the other arguments as above.
     *
     * @param operator     F as an operator (shared, not modified)
     * @param viewFactors  F, N×N row-major (shared, not modified), or null when the strategy works from
     *                     the operator alone (conjugate gradients)
     */
    public BandNetwork(RadiationOperator operator, double[] viewFactors, double[] areasM2, double[] emissivity,
                       WindowCoupling windows, double[] externalIrradiation, double[] externalReflected,
                       double[] externalRetained, double[] externalMagnitude, RadiositySolver solver) {
        this.op = operator;
        this.n = operator.size();
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
        this.area = areasM2.clone();
        this.prepared = solver.prepare(op, f, rho, area, windows);
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
        double[] b = source(emissive);
        double[] j = new double[n];
        prepared.solve(b, j);
        return finish(emissive, b, j, irradiationFrom(j, new double[n]));
    }

    /** The right-hand side ε_i E_i + R_i of a solve (a new array; emissive not modified). */
    double[] source(double[] emissive) {
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = eps[i] * emissive[i] + reflected[i];
        }
        return b;
    }

    /**
     * The band state of a solved J, with its residual checked ({@link #checkedResidual}).
     *
     * @param emissive  E (W/m²), b its right-hand side, j the solution, fj = F·J; none modified
     */
    BandState finish(double[] emissive, double[] b, double[] j, double[] fj) {
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
        double residual = checkedResidual(b, j, fj);
        return new BandState(j, g, q, through, prepared.lastIterations(), residual);
    }

    /** The prepared linear operator of this band. */
    RadiositySolver.Prepared prepared() {
        return prepared;
    }

    /** The view-factor operator (shared). */
    RadiationOperator operator() {
        return op;
    }

    /** ε_i δE_i (a new array; not modified). */
    double[] responseSource(double[] deltaEmissive) {
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = eps[i] * deltaEmissive[i];
        }
        return b;
    }

    /** δq_i from the source b_i = ε_i δE_i, (Fx)_i and (Fx)_o(i) (the latter ignored without a window). */
    double response(int i, double[] b, double fxi, double fxo) {
        double v = b[i] - (eps[i] + tau[i]) * fxi;
        if (other[i] >= 0 && tau[i] != 0) {
            v += tau[i] * fxo;
        }
        return v;
    }

    /** Surface i's other face, or −1. */
    int otherFace(int i) {
        return other[i];
    }

    /**
     * The relative residual ‖b − (I − ρF − TF)J‖∞ / ‖b‖∞ of a solve, from the product F·J already
     * formed (no extra pass over F).
     *
     * @param b   right-hand side, not modified
     * @param j   solution, not modified
     * @param fj  F·J, not modified
     * @throws NetworkConvergenceException when it exceeds what the strategy accepts (a singular or
     *         too ill-conditioned band)
     */
    private double checkedResidual(double[] b, double[] j, double[] fj) {
        double worst = 0;
        double scale = 0;
        for (int i = 0; i < n; i++) {
            double v = j[i] - rho[i] * fj[i] - (other[i] >= 0 ? tau[i] * fj[other[i]] : 0.0);
            worst = Math.max(worst, Math.abs(b[i] - v));
            scale = Math.max(scale, Math.abs(b[i]));
        }
        double residual = scale > 0 ? worst / scale : worst;
        if (!(residual <= prepared.acceptedResidual())) {
            throw new NetworkConvergenceException("radiosity matrix is singular or too ill-conditioned (relative"
                    + " residual " + residual + " after " + prepared.lastIterations() + " iteration(s) of "
                    + "the band solve): a closed part of the enclosure reflects (almost) everything in this band",
                    prepared.lastIterations(), residual);
        }
        return residual;
    }

    /**
     * The heat sensitivities of the unknown nodes in this band, from one blocked solve for all
     * nodes' columns ({@link RadiositySolver.Prepared#solveBlock}): entry {@code [a·m + c]} is
     * {@code Σ_{i ∈ a} A_i ∂q_i/∂E_c} (m²), where raising node c's emissive power raises that of all
     * its faces. The flux derivative is that of the net-flux form of {@link #solve}, exact and free
     * of cancellation as ε → 0. Memory: one N×m array for the block besides the m×m result.
     *
     * @param nodeFaces  per node, its faces (a surface, or a window's two faces); not modified
     * @return a new m×m row-major array
     */
    public double[] nodeHeatSensitivities(int[][] nodeFaces) {
        return NodeSensitivities.of(this, nodeFaces);
    }

    /**
     * The change of the net flux of the given surfaces when the emissive powers change by δE, at
     * fixed properties: one band solve, {@code (I − ρF − TF) x = ε δE}, then
     * {@code δq_i = ε_i δE_i − (ε_i + τ_i)(Fx)_i + τ_i (Fx)_o(i)} (W/m²). This is the band's part of
     * a Jacobian–vector product of Newton–Krylov; only the rows asked for are formed.
     *
     * @param deltaEmissive  δE per surface (W/m²), not modified
     * @param rows           the surfaces whose δq is wanted; not modified
     * @return δq of those surfaces, in the order of {@code rows} (a new array)
     */
    public double[] fluxResponse(double[] deltaEmissive, int[] rows) {
        double[] b = responseSource(deltaEmissive);
        double[] x = new double[n];
        prepared.solve(b, x);
        int[] slot = new int[n];
        int[] need = NodeSensitivities.withOtherFaces(rows, other, slot); // the rows and their windows' other faces
        double[] fx = new double[need.length];
        op.multiplyRows(need, x, 1, fx);
        double[] out = new double[rows.length];
        for (int r = 0; r < rows.length; r++) {
            int i = rows[r];
            out[r] = response(i, b, fx[slot[i]], other[i] >= 0 ? fx[slot[other[i]]] : 0.0);
        }
        return out;
    }

    /** Iterations of the last linear solve of this band. */
    public int lastIterations() {
        return prepared.lastIterations();
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
        checkedResidual(b, x, fx);
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
        checkedResidual(b, x, fx);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = x[i] - fx[i];
        }
        return out;
    }

    private static double[] difference(double[] a, double[] b) {
        return java.util.stream.IntStream.range(0, a.length).mapToDouble(i -> a[i] - b[i]).toArray();
    }

    private static double[] sum(double[] a, double[] b) {
        return java.util.stream.IntStream.range(0, a.length).mapToDouble(i -> Math.abs(a[i]) + Math.abs(b[i])).toArray();
    }

    /** G = F J + H ({@link RadiationOperator#multiply}); arrays not modified, result new. */
    private double[] irradiationFrom(double[] j, double[] external) {
        double[] g = new double[n];
        op.multiply(j, 1, g);
        for (int i = 0; i < n; i++) {
            g[i] += external[i];
        }
        return g;
    }

    public int size() {
        return n;
    }
}
