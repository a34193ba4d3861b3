package org.exitance.thermal;

import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.exitance.bands.BandProperties;
import org.exitance.model.Band;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.network.BandNetwork;
import org.exitance.network.BandState;
import org.exitance.network.ConjugateGradientRadiositySolver;
import org.exitance.network.RadiositySolver;
import org.exitance.result.SolveResult;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.Planck;

/**
 * Band-wise radiosity solve with unknown temperatures.
 *
 * <p>Unknowns are the temperatures of surfaces without a fixed temperature. The residual of
 * each is its radiative heat balance summed over bands, {@code R_u = A_u Σ_k q_uk(T) − Q_u}.
 * With band properties held fixed each band is linear in the emissive powers, so the Jacobian
 * is exact and cheap: {@code ∂R_u/∂T_v = A_u Σ_k (∂q_uk/∂E_vk)(dE_vk/dT_v)}, with ∂q/∂E from one
 * extra solve per unknown and band ({@link BandNetwork#fluxSensitivity}) and dE/dT analytic
 * ({@link Planck#bandEmissivePowerDerivative}). Newton's method (Kelley, Solving Nonlinear
 * Equations with Newton's Method, SIAM 2003, ch. 1–2) is damped so no temperature changes by
 * more than half its value in a step, and a backtracking line search (Armijo) keeps the residual
 * decreasing. Band-mean properties depend on temperature (Planck weighting, and ε(λ, T) tables);
 * an outer loop updates them until the temperatures stop moving.
 *
 * <p>With more than one band and unknown temperatures, a one-band gray solve (each surface's
 * total hemispherical emissivity at its temperature) runs first as the starting point.
 *
 * <p>A window is one thermal node with two faces: both faces carry the node's temperature, its
 * residual adds both faces' net heat (and the convection and links of either face), and its
 * Jacobian column adds both faces' sensitivities, since raising the window's temperature raises
 * the emission of both faces.
 */
public final class TemperatureSolver {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;
    private final RadiationCase radiationCase;
    private final SolverSettings settings;
    private final RadiositySolver linear;
    private final String linearName;
    private ExternalAbsorption absorption = ExternalAbsorption.SOURCE_SPECTRUM;

    /** A solver that picks the linear strategy by {@link RadiositySolver#forSize}. */
    public TemperatureSolver(RadiationCase c) {
        this(c, RadiositySolver.forSize(c.enclosure().size(), c.enclosure().hasWindows()));
    }

    /**
     * @throws IllegalArgumentException when the case has windows and the strategy is conjugate
     *                                  gradients (which need a symmetric matrix)
     */
    public TemperatureSolver(RadiationCase c, RadiositySolver linear) {
        if (c.enclosure().hasWindows() && linear instanceof ConjugateGradientRadiositySolver) {
            throw new IllegalArgumentException("an enclosure with windows needs the direct radiosity solver");
        }
        this.radiationCase = c;
        this.settings = c.settings();
        this.linear = linear;
        this.linearName = linear instanceof ConjugateGradientRadiositySolver ? "conjugate gradients" : "direct LU";
    }

    /**
     * Chooses how external irradiation (environment, sources) is absorbed; the default is
     * {@link ExternalAbsorption#SOURCE_SPECTRUM}. Returns this solver.
     */
    public TemperatureSolver withExternalAbsorption(ExternalAbsorption mode) {
        this.absorption = java.util.Objects.requireNonNull(mode);
        return this;
    }

    /**
     * Solves the case with the given bands.
     *
     * @throws IllPosedCaseException when the case has no solution as posed
     * @throws SolveFailedException  when Newton or the property loop does not converge
     */
    public SolveResult solve(BandSet bandSet) {
        Enclosure enc = radiationCase.enclosure();
        int n = enc.size();
        List<Band> bands = bandSet.bands();
        Problem p = new Problem(enc, linear);
        checkPosed(enc);
        double[] t = startingTemperatures(p, radiationCase.sources());
        Counters counters = new Counters();
        if (p.unknown.length > 0 && bands.size() > 1) {
            // gray start: one band, total hemispherical emissivity at each temperature
            t = converge(p, BandSet.gray("gray start").bands(), t, counters);
        }
        t = converge(p, bands, t, counters);
        // final state with converged properties
        double[][] eps = BandProperties.emissivities(enc.surfaces(), bands, t);
        BandNetwork[] nets = new NetworkBuilder(radiationCase, linear, absorption).networks(p, bands, eps, t);
        BandState[] states = solveBands(p, bands, nets, t, counters);
        SolveResult r = new ResultAssembler(radiationCase, linearName).assemble(p, bandSet, bands, eps, states, t, counters);
        return radiationCase.facetGroups() == null ? r : FacetAggregation.bySurface(r, radiationCase.facetGroups());
    }

    /** Outer loop over property updates around a Newton solve; returns converged temperatures. */
    private double[] converge(Problem p, List<Band> bands, double[] start, Counters counters) {
        double[] t = start.clone();
        if (p.unknown.length == 0) {
            counters.propertyIterations = Math.max(counters.propertyIterations, 1);
            return t;
        }
        for (int outer = 1; outer <= settings.maxPropertyIterations(); outer++) {
            counters.propertyIterations++;
            double[][] eps = BandProperties.emissivities(p.enc.surfaces(), bands, t);
            requireEmission(p, eps);
            BandNetwork[] nets = new NetworkBuilder(radiationCase, linear, absorption).networks(p, bands, eps, t);
            double[] before = t.clone();
            t = newton(p, bands, nets, t, counters);
            double move = 0;
            for (int u : p.unknown) {
                move = Math.max(move, Math.abs(t[u] - before[u]));
            }
            if (move == 0 || outer > 1 && move <= settings.temperatureToleranceK()) {
                return t;
            }
            counters.lastOuterMove = move;
        }
        throw new SolveFailedException("band properties did not settle in " + settings.maxPropertyIterations()
                + " updates (last temperature change " + fmt(counters.lastOuterMove) + " K)",
                counters.newtonIterations, counters.residualW);
    }

    /** An unknown-temperature surface that emits in no band has no defined temperature. */
    private static void requireEmission(Problem p, double[][] eps) {
        for (int a = 0; a < p.unknown.length; a++) {
            int u = p.unknown[a];
            boolean emits = false;
            for (double[] band : eps) {
                for (int i : p.faces[a]) {
                    emits |= band[i] > 0;
                }
            }
            if (!emits) {
                throw new IllPosedCaseException("surface '" + p.enc.surface(u).name() + "' has zero emissivity in every"
                        + " band, so its temperature is undefined; give it a temperature or a nonzero emissivity");
            }
        }
    }

    /** ∂q_i/∂E_v per band and unknown node v, [band][node][surface]; a window node adds both faces. */
    private static double[][][] nodeSensitivities(Problem p, int nb, BandNetwork[] nets) {
        int m = p.unknown.length;
        double[][][] sens = new double[nb][m][];
        for (int k = 0; k < nb; k++) {
            for (int b = 0; b < m; b++) {
                // a window node emits from both faces: the sensitivities add (the network is linear in E)
                sens[k][b] = nets[k].fluxSensitivity(p.faces[b][0]);
                for (int f = 1; f < p.faces[b].length; f++) {
                    double[] more = nets[k].fluxSensitivity(p.faces[b][f]);
                    for (int i = 0; i < more.length; i++) {
                        sens[k][b][i] += more[i];
                    }
                }
            }
        }
        return sens;
    }

    /** ∂R_a/∂T_b (W/K) of the unknown nodes at temperatures t (K, not modified). */
    private static DMatrixRMaj jacobian(Problem p, List<Band> bands, double[][][] sens, double[] t) {
        int[] u = p.unknown;
        int m = u.length;
        DMatrixRMaj jac = new DMatrixRMaj(m, m);
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < m; b++) {
                double s = 0;
                for (int k = 0; k < bands.size(); k++) {
                    double de = BandProperties.emissivePowerDerivative(bands.get(k), t[u[b]]);
                    for (int i : p.faces[a]) {
                        s += p.area[i] * sens[k][b][i] * de;
                    }
                }
                double other = p.allPaths[a] ? p.otherPathsDerivative(a, b) : 0.0;
                jac.set(a, b, s + other);
            }
        }
        return jac;
    }

    /**
     * Sensitivities of every surface's net heat (W) and temperature (K) to the band-mean
     * emissivity of every surface in every band, at the converged state of a solve with these bands.
     * The parameter ε_jk stands for ε_λ of surface j raised uniformly inside band k, so that its
     * absorptivity for external sources in that band rises with it. Tangent-linear method: for each
     * parameter, one solve with the band's factored matrix, {@code (I − ρF − TF) x = e_j (E_j − G_j)},
     * gives the flux change at fixed temperatures, {@code x − F x}; the temperature change follows
     * from Newton's Jacobian, {@code ΔT = −J⁻¹ ∂R/∂ε} (implicit function theorem). The band means'
     * own drift with temperature (Planck weighting, ε(λ, T) tables) is held fixed: exact where ε is
     * constant inside each band.
     *
     * @return [surface i][surface j][band k] derivatives ∂Q_i/∂ε_jk and ∂T_i/∂ε_jk
     */
    public EmissivitySensitivities sensitivities(BandSet bandSet) {
        if (radiationCase.facetGroups() != null) {
            throw new IllPosedCaseException("sensitivities are computed on surfaces: set the geometry's"
                    + " \"resolution\" to \"surfaces\"");
        }
        SolveResult solved = solve(bandSet);
        Enclosure enc = radiationCase.enclosure();
        int n = enc.size();
        List<Band> bands = bandSet.bands();
        int nb = bands.size();
        Problem p = new Problem(enc, linear);
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = solved.surfaces().get(i).temperatureK();
        }
        double[][] eps = BandProperties.emissivities(enc.surfaces(), bands, t);
        BandNetwork[] nets = new NetworkBuilder(radiationCase, linear, absorption).networks(p, bands, eps, t);
        BandState[] states = solveBands(p, bands, nets, t, new Counters());
        int m = p.unknown.length;
        double[][][] sens = nodeSensitivities(p, nb, nets);
        LinearSolverDense<DMatrixRMaj> lu = null;
        if (m > 0) {
            lu = LinearSolverFactory_DDRM.lu(m);
            if (!lu.setA(jacobian(p, bands, sens, t))) {
                throw new IllPosedCaseException("the heat balances do not determine the unknown temperatures"
                        + " (singular Jacobian)");
            }
        }
        double[][][] dq = new double[n][n][nb];
        double[][][] dT = new double[n][n][nb];
        for (int k = 0; k < nb; k++) {
            Band b = bands.get(k);
            for (int j = 0; j < n; j++) {
                double e = Planck.bandEmissivePower(b.lowerUm(), b.upperUm(), t[j]);
                double[] d = nets[k].emissivitySensitivity(j, e - states[k].irradiation()[j]);
                double[] dt = new double[m];
                if (m > 0) {
                    DMatrixRMaj rhs = new DMatrixRMaj(m, 1);
                    for (int a = 0; a < m; a++) {
                        double r = 0;
                        for (int i : p.faces[a]) {
                            r += p.area[i] * d[i];
                        }
                        rhs.set(a, 0, -r);
                    }
                    DMatrixRMaj x = new DMatrixRMaj(m, 1);
                    lu.solve(rhs, x);
                    for (int a = 0; a < m; a++) {
                        dt[a] = x.get(a, 0);
                    }
                }
                for (int i = 0; i < n; i++) {
                    double total = d[i];
                    for (int kk = 0; kk < nb; kk++) {
                        for (int a = 0; a < m; a++) {
                            total += sens[kk][a][i] * BandProperties.emissivePowerDerivative(bands.get(kk), t[p.unknown[a]])
                                    * dt[a];
                        }
                    }
                    dq[i][j][k] = p.area[i] * total;
                }
                for (int a = 0; a < m; a++) {
                    for (int i : p.faces[a]) {
                        dT[i][j][k] = dt[a];
                    }
                }
            }
        }
        return new EmissivitySensitivities(solved, dq, dT);
    }

    /** Damped Newton with fixed band properties. */
    private double[] newton(Problem p, List<Band> bands, BandNetwork[] nets, double[] start, Counters counters) {
        int[] u = p.unknown;
        int m = u.length;
        int nb = bands.size();
        double[][][] sens = nodeSensitivities(p, nb, nets);
        double[] t = start.clone();
        double[] r = residual(p, bands, nets, t, counters);
        for (int it = 0; it < settings.maxNewtonIterations(); it++) {
            double rNorm = maxAbs(r);
            double tol = heatTolerance(p, t);
            counters.residualW = rNorm;
            if (rNorm <= tol) {
                return t;
            }
            DMatrixRMaj jac = jacobian(p, bands, sens, t);
            String dead = zeroColumn(p, jac);
            if (dead != null) {
                throw new IllPosedCaseException("the temperature of surface '" + dead
                        + "' does not affect any heat balance (zero emissivity in every band?): it is undefined");
            }
            LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(m);
            DMatrixRMaj rhs = new DMatrixRMaj(m, 1);
            for (int a = 0; a < m; a++) {
                rhs.set(a, 0, -r[a]);
            }
            DMatrixRMaj dx = new DMatrixRMaj(m, 1);
            if (!lu.setA(jac.copy())) {
                throw new IllPosedCaseException("the heat balances do not determine the unknown temperatures"
                        + " (singular Jacobian)");
            }
            lu.solve(rhs, dx);
            for (int a = 0; a < m; a++) {
                if (!Double.isFinite(dx.get(a, 0))) {
                    throw new IllPosedCaseException("the heat balances do not determine the unknown temperatures"
                            + " (singular Jacobian)");
                }
            }
            double lambda = 1.0;
            for (int a = 0; a < m; a++) {
                double d = Math.abs(dx.get(a, 0));
                if (d > 0.5 * t[u[a]]) {
                    lambda = Math.min(lambda, 0.5 * t[u[a]] / d);
                }
            }
            double[] trial = t.clone();
            double[] rTrial = null;
            for (int ls = 0; ls < 40; ls++) {
                for (int a = 0; a < m; a++) {
                    double ta = t[u[a]] + lambda * dx.get(a, 0);
                    for (int i : p.faces[a]) {
                        trial[i] = ta;
                    }
                }
                rTrial = residual(p, bands, nets, trial, counters);
                if (maxAbs(rTrial) <= (1 - 1e-4 * lambda) * rNorm || maxAbs(rTrial) <= tol) {
                    break;
                }
                lambda *= 0.5;
            }
            double step = 0;
            for (int a = 0; a < m; a++) {
                step = Math.max(step, Math.abs(trial[u[a]] - t[u[a]]));
            }
            counters.lastStep = step;
            counters.newtonIterations++;
            t = trial;
            r = rTrial;
            checkFloor(p, t, r, counters.newtonIterations);
        }
        throw new SolveFailedException("Newton's method did not converge in " + settings.maxNewtonIterations()
                + " iterations: largest heat residual " + fmt(maxAbs(r)) + " W at "
                + p.enc.surface(u[argMaxAbs(r)]).name(), counters.newtonIterations, maxAbs(r));
    }

    /** A demand that needs a temperature at or below 0 K is impossible: say so. */
    private void checkFloor(Problem p, double[] t, double[] r, int iterations) {
        for (int a = 0; a < p.unknown.length; a++) {
            int i = p.unknown[a];
            if (t[i] < 1e-3 && r[a] > 0) {
                EnclosureSurface s = p.enc.surface(i);
                throw new SolveFailedException("surface '" + s.name() + "' cannot reach its " + s.boundary().label()
                        + " demand of " + fmt(p.target[a]) + " W: even near 0 K its net heat would be "
                        + fmt(r[a] + p.target[a]) + " W", iterations, r[a]);
            }
        }
    }

    /** R_u = Σ_faces A_i Σ_k q_ik − Q_u (W) for each unknown node (one face, or a window's two). */
    private double[] residual(Problem p, List<Band> bands, BandNetwork[] nets, double[] t, Counters counters) {
        BandState[] states = solveBands(p, bands, nets, t, counters);
        double[] r = new double[p.unknown.length];
        for (int a = 0; a < r.length; a++) {
            r[a] = -p.target[a];
            for (int i : p.faces[a]) {
                double q = 0;
                for (BandState s : states) {
                    q += s.netFlux()[i];
                }
                r[a] += p.area[i] * q;
                if (p.allPaths[a]) {
                    r[a] += p.convectionW(i, t[i]) + p.conductionW(i, t);
                }
            }
        }
        return r;
    }

    private BandState[] solveBands(Problem p, List<Band> bands, BandNetwork[] nets, double[] t, Counters counters) {
        int n = p.enc.size();
        BandState[] states = new BandState[bands.size()];
        for (int k = 0; k < bands.size(); k++) {
            Band b = bands.get(k);
            double[] e = new double[n];
            for (int i = 0; i < n; i++) {
                e[i] = Planck.bandEmissivePower(b.lowerUm(), b.upperUm(), t[i]);
            }
            states[k] = nets[k].solve(e);
            counters.maxLinearIterations = Math.max(counters.maxLinearIterations, states[k].iterations());
            counters.maxLinearResidual = Math.max(counters.maxLinearResidual, states[k].relativeResidual());
        }
        return states;
    }





    private double heatTolerance(Problem p, double[] t) {
        double scale = 0;
        for (int i = 0; i < t.length; i++) {
            scale = Math.max(scale, p.area[i] * SIGMA * Math.pow(t[i], 4));
        }
        for (double q : p.target) {
            scale = Math.max(scale, Math.abs(q));
        }
        if (p.envT > 0) {
            for (int i = 0; i < t.length; i++) {
                scale = Math.max(scale, p.area[i] * SIGMA * Math.pow(p.envT, 4));
            }
        }
        return Math.max(settings.relativeHeatTolerance() * scale, 1e-300);
    }

    /**
     * Rejects an enclosure whose temperature level nothing fixes: every temperature unknown, no
     * environment, and no surface that convects (on an energy-balance condition) to a fluid.
     *
     * @throws IllPosedCaseException when that is so
     */
    public static void checkPosed(Enclosure enc) {
        boolean anchored = enc.environment() != null || enc.surfaces().stream().anyMatch(s ->
                s.boundary() instanceof BoundaryCondition.FixedTemperature
                        || s.boundary().balancesAllPaths() && s.convectionConductanceWPerK() > 0);
        if (!anchored) {
            throw new IllPosedCaseException("no surface has a fixed temperature, none convects to a fluid and"
                    + " there is no environment: the temperature level is undetermined; fix at least one"
                    + " surface's temperature");
        }
    }

    /**
     * Starting temperatures: given ones, initial guesses, else the area-weighted fourth-power
     * mean of the fixed temperatures (and environment), raised for surfaces that must emit a net
     * flux or that receive external irradiation S: T⁴ = T_ref⁴ + (max(q, 0) + S)/σ.
     */
    private static double[] startingTemperatures(Problem p, List<ExternalSource> sources) {
        Enclosure enc = p.enc;
        int n = enc.size();
        double sumA = 0;
        double sumAT4 = 0;
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            if (enc.surface(i).boundary() instanceof BoundaryCondition.FixedTemperature ft) {
                t[i] = ft.temperatureK();
                sumA += p.area[i];
                sumAT4 += p.area[i] * Math.pow(t[i], 4);
            }
        }
        double ref4;
        if (sumA > 0) {
            ref4 = sumAT4 / sumA;
        } else {
            ref4 = Math.pow(Math.max(p.envT, 3.0), 4);
        }
        if (p.envT > 0 && sumA == 0) {
            ref4 = Math.pow(p.envT, 4);
        }
        for (int a = 0; a < p.unknown.length; a++) {
            int i = p.unknown[a];
            EnclosureSurface s = enc.surface(i);
            if (Double.isFinite(s.initialTemperatureK())) {
                t[i] = s.initialTemperatureK();
            } else {
                double q = p.target[a] / p.area[i];
                double arriving = 0;
                for (int face : p.faces[a]) {
                    for (ExternalSource src : sources) {
                        arriving += src.irradianceOn(enc.surface(face).name());
                    }
                }
                t[i] = Math.max(Math.pow(ref4 + (Math.max(q, 0) + arriving) / SIGMA, 0.25), 1.0);
            }
        }
        // the face of a window without a condition takes the temperature of the face that has it
        for (int i = 0; i < n; i++) {
            if (enc.surface(i).boundary() instanceof BoundaryCondition.OnOtherFace) {
                t[i] = t[p.other[i]];
            }
        }
        return t;
    }


    /** Name of an unknown-temperature surface whose column of the Jacobian is zero, or null. */
    private static String zeroColumn(Problem p, DMatrixRMaj jac) {
        for (int a = 0; a < p.unknown.length; a++) {
            boolean zero = true;
            for (int b = 0; b < p.unknown.length; b++) {
                zero &= jac.get(b, a) == 0;
            }
            if (zero) {
                return p.enc.surface(p.unknown[a]).name();
            }
        }
        return null;
    }

    private static double maxAbs(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    private static int argMaxAbs(double[] v) {
        int best = 0;
        for (int i = 1; i < v.length; i++) {
            if (Math.abs(v[i]) > Math.abs(v[best])) {
                best = i;
            }
        }
        return best;
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.6g", v);
    }
}
