package org.exitance.conduction;

import java.util.ArrayList;
import java.util.List;
import org.exitance.spectral.PhysicalConstants;

/**
 * A wall cut into finite volumes through its thickness (Patankar, Numerical Heat Transfer and
 * Fluid Flow, 1980, ch. 4: cell-centred control volumes, interface conductances as the series
 * of the two half cells, so that a jump of conductivity between layers is exact). The state is
 * the n cell-centre temperatures followed by the outer-face temperature (n + 1 values, K).
 *
 * <p>Subdivision rule: a layer with {@code cells} given uses that many equal cells; otherwise
 * {@code max(8, ⌈L / Δx_max⌉)} (at most 400), where {@code Δx_max = ½ √(α τ)} for the time scale
 * τ a transient resolves (no limit in steady state, where the cells of a constant-k layer give
 * the exact linear profile). Half a diffusion length √(ατ) per cell keeps the surface response
 * over τ to about a percent of the temperature step, and the error falls as Δx² (tested).
 *
 * <p>Each cell's balance (W/m²), storage plus heat out minus heat in:
 * {@code r ρc Δx (T_j − β_j) + g_{j}(T_j − T_{j+1}) − g_{j−1}(T_{j−1} − T_j) = 0}, where r and β are
 * the time-step terms of the integrator (r = 0 in steady state). The outer face carries no
 * storage: the heat reaching it leaves by its boundary.
 */
public final class WallGrid {
    private static final int MIN_CELLS = 8;
    private static final int MAX_CELLS = 400;
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;

    private final Wall wall;
    private final int n;
    private final double[] dx;
    private final double[] rhoC;
    private final PropertyTable[] k;

    /**
     * @param wall          the wall
     * @param timeScaleS    the time scale τ (s) a transient resolves, or NaN for steady state
     */
    public WallGrid(Wall wall, double timeScaleS) {
        this.wall = wall;
        List<Double> w = new ArrayList<>();
        List<Integer> layerOf = new ArrayList<>();
        for (int l = 0; l < wall.layers().size(); l++) {
            Layer layer = wall.layers().get(l);
            int cells = cellsFor(layer, timeScaleS);
            for (int c = 0; c < cells; c++) {
                w.add(layer.thicknessM() / cells);
                layerOf.add(l);
            }
        }
        n = w.size();
        dx = new double[n];
        rhoC = new double[n];
        k = new PropertyTable[n];
        for (int j = 0; j < n; j++) {
            Layer layer = wall.layers().get(layerOf.get(j));
            dx[j] = w.get(j);
            rhoC[j] = layer.densityKgPerM3() * layer.specificHeatJPerKgK();
            k[j] = layer.conductivity();
        }
    }

    /** The cells of one layer by the rule of the class doc. */
    public static int cellsFor(Layer layer, double timeScaleS) {
        if (layer.cells() > 0) {
            return layer.cells();
        }
        if (!(timeScaleS > 0)) {
            return MIN_CELLS;
        }
        double alpha = layer.diffusivityM2PerS(300.0);
        double most = 0.5 * Math.sqrt(alpha * timeScaleS);
        return (int) Math.min(MAX_CELLS, Math.max(MIN_CELLS, Math.ceil(layer.thicknessM() / most)));
    }

    public Wall wall() {
        return wall;
    }

    /** The number of cells n (the state holds n + 1 values). */
    public int cells() {
        return n;
    }

    /** Cell widths (m), a new array. */
    public double[] widthsM() {
        return dx.clone();
    }

    /** A state with every cell and the outer face at t (K); a new array. */
    public double[] uniformState(double t) {
        double[] s = new double[n + 1];
        java.util.Arrays.fill(s, t);
        return s;
    }

    /** ρc Δx of cell j (J/(m²·K)). */
    public double cellCapacityJPerM2K(int j) {
        return rhoC[j] * dx[j];
    }

    /** Heat stored per unit area, Σ ρc Δx T_j from 0 K (J/m²); state not modified. */
    public double storedJPerM2(double[] state) {
        double s = 0;
        for (int j = 0; j < n; j++) {
            s += rhoC[j] * dx[j] * state[j];
        }
        return s;
    }

    /** Heat leaving the inner face into the wall (W/m²) at surface temperature ts; state not modified. */
    public double innerFluxWPerM2(double ts, double[] state) {
        return surfaceConductance(state[0]) * (ts - state[0]);
    }

    /** Heat leaving the wall through its outer face (W/m²); state not modified. */
    public double outerLossWPerM2(double[] state) {
        if (wall.outside() instanceof OuterBoundary.Insulated) {
            return 0.0;
        }
        return outerConductance(state[n - 1]) * (state[n - 1] - state[n]);
    }

    /**
     * The heat a surface at ts sends into a wall whose cells are held (the start of a transient):
     * out[0] = q (W/m²), out[1] = dq/dts (W/(m²·K)). state not modified; out modified.
     */
    public void frozenFlux(double ts, double[] state, double[] out) {
        double g = surfaceConductance(state[0]);
        out[0] = g * (ts - state[0]);
        out[1] = g;
    }

    /**
     * Solves the wall for surface temperature ts (Newton on the tridiagonal system; one step when
     * k is constant and the outer face is held or insulated) and returns the heat into the wall
     * with its total derivative, the Schur complement of the cells:
     * out[0] = q_in (W/m²), out[1] = dq_in/dts (W/(m²·K)).
     *
     * @param state    starting cell and outer-face temperatures (K); modified: the solution
     * @param history  β_j per cell (K), not modified; ignored when rate is 0
     * @param rate     r (1/s): storage weight of the time step, 0 for steady state
     * @param out      modified
     * @throws WallSolveException when Newton does not converge
     */
    public void solve(double ts, double[] state, double[] history, double rate, double[] out) {
        int m = n + 1;
        double[] lo = new double[m];
        double[] di = new double[m];
        double[] up = new double[m];
        double[] r = new double[m];
        double[] d = new double[m];
        for (int it = 0; it < 100; it++) {
            assemble(ts, state, history, rate, lo, di, up, r);
            for (int j = 0; j < m; j++) {
                d[j] = -r[j];
            }
            Tridiagonal.solve(lo, di.clone(), up, d);
            double move = 0;
            double lambda = 1;
            for (int j = 0; j < m; j++) {
                if (Math.abs(d[j]) > 0.5 * state[j]) {
                    lambda = Math.min(lambda, 0.5 * state[j] / Math.abs(d[j]));
                }
            }
            for (int j = 0; j < m; j++) {
                state[j] += lambda * d[j];
                move = Math.max(move, Math.abs(lambda * d[j]));
            }
            if (!Double.isFinite(move)) {
                break;
            }
            if (move <= 1e-10 * Math.max(1.0, ts)) {
                assemble(ts, state, history, rate, lo, di, up, r);
                double g = surfaceConductance(state[0]);
                double dg = 2 * k[0].slope(state[0]) / dx[0];
                double[] sens = new double[m];
                sens[0] = g; // −∂F_0/∂ts
                Tridiagonal.solve(lo, di, up, sens);
                double dqdT0 = -g + (ts - state[0]) * dg;
                out[0] = g * (ts - state[0]);
                out[1] = g + dqdT0 * sens[0];
                return;
            }
        }
        throw new WallSolveException("the conduction through a wall did not converge at a surface temperature of "
                + String.format(java.util.Locale.ROOT, "%.6g", ts) + " K");
    }

    /** Residuals r and their tridiagonal Jacobian (lo, di, up) at the state; all four arrays modified. */
    private void assemble(double ts, double[] s, double[] beta, double rate, double[] lo, double[] di, double[] up,
                          double[] r) {
        int m = n + 1;
        java.util.Arrays.fill(lo, 0);
        java.util.Arrays.fill(di, 0);
        java.util.Arrays.fill(up, 0);
        for (int j = 0; j < n; j++) {
            r[j] = rate == 0 ? 0 : rate * rhoC[j] * dx[j] * (s[j] - beta[j]);
            di[j] = rate * rhoC[j] * dx[j];
        }
        // surface face to cell 0: heat in g_s (ts − T_0)
        double gs = surfaceConductance(s[0]);
        double dgs = 2 * k[0].slope(s[0]) / dx[0];
        r[0] -= gs * (ts - s[0]);
        di[0] += gs - (ts - s[0]) * dgs;
        for (int j = 0; j + 1 < n; j++) {
            double a = 0.5 * dx[j];
            double b = 0.5 * dx[j + 1];
            double k1 = k[j].at(s[j]);
            double k2 = k[j + 1].at(s[j + 1]);
            double g = 1.0 / (a / k1 + b / k2);
            double dg1 = g * g * a * k[j].slope(s[j]) / (k1 * k1);
            double dg2 = g * g * b * k[j + 1].slope(s[j + 1]) / (k2 * k2);
            double dT = s[j] - s[j + 1];
            double q = g * dT;
            double dq1 = g + dT * dg1;
            double dq2 = -g + dT * dg2;
            r[j] += q;
            r[j + 1] -= q;
            di[j] += dq1;
            up[j] += dq2;
            lo[j + 1] -= dq1;
            di[j + 1] -= dq2;
        }
        int last = n - 1;
        OuterBoundary ob = wall.outside();
        if (ob instanceof OuterBoundary.Insulated) {
            r[n] = s[n] - s[last];
            di[n] = 1;
            lo[n] = -1;
            return;
        }
        double go = outerConductance(s[last]);
        double dgo = 2 * k[last].slope(s[last]) / dx[last];
        double dT = s[last] - s[n];
        double q = go * dT;
        r[last] += q;
        di[last] += go + dT * dgo;
        up[last] += -go;
        if (ob instanceof OuterBoundary.Held h) {
            r[n] = s[n] - h.temperatureK();
            di[n] = 1;
            return;
        }
        OuterBoundary.Exposed e = (OuterBoundary.Exposed) ob;
        double ta = e.ambientK();
        double to = s[n];
        r[n] = e.convectionWPerM2K() * (to - ta) + e.emissivity() * SIGMA * (Math.pow(to, 4) - Math.pow(ta, 4)) - q;
        di[n] = e.convectionWPerM2K() + 4 * e.emissivity() * SIGMA * Math.pow(to, 3) + go;
        lo[n] = -(go + dT * dgo);
    }

    private double surfaceConductance(double t0) {
        return 2 * k[0].at(t0) / dx[0];
    }

    private double outerConductance(double tLast) {
        return 2 * k[n - 1].at(tLast) / dx[n - 1];
    }
}
