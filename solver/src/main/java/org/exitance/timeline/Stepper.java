package org.exitance.timeline;

import java.util.ArrayList;
import java.util.List;
import org.exitance.conduction.HeatCapacity;
import org.exitance.conduction.WallGrid;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.RadiationCase;
import org.exitance.result.SolveResult;
import org.exitance.thermal.SurfacePaths;
import org.exitance.thermal.TemperatureSolver;

/**
 * One implicit step of the node and wall temperatures: backward Euler (order 1) after a start or
 * a switch, else the variable-step BDF2 (Hairer and Wanner, Solving ODEs II, 2nd ed., §III.5,
 * eq. 5.8 with ω = h_n/h_{n−1}):
 * {@code E_{n+1} − (1+ω)²/(1+2ω) E_n + ω²/(1+2ω) E_{n−1} = h (1+ω)/(1+2ω) · (heat in)_{n+1}}.
 * Each step is one solve of the steady machinery ({@link TemperatureSolver#solveWith}: band
 * networks, Newton with the exact Jacobian) with the storage and wall terms of {@link StepPaths}
 * on the diagonal.
 */
final class Stepper {
    final TransientCase c;
    final BandSet bands;
    final CaseAtTime atTime;
    final int n;
    final HeatCapacity[] capacity;
    final WallGrid[] grids;
    final double[] area;
    /** The surfaces that carry an unknown node's condition. */
    final int[] nodes;
    /** Per surface: a face of a node that counts every path (the system whose energy is kept). */
    final boolean[] inSystem;

    Stepper(TransientCase c, BandSet bands, double timeScaleS) {
        this.c = c;
        this.bands = bands;
        this.atTime = new CaseAtTime(c);
        Enclosure enc = c.model().enclosure();
        n = enc.size();
        capacity = new HeatCapacity[n];
        grids = new WallGrid[n];
        area = new double[n];
        inSystem = new boolean[n];
        List<Integer> u = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            area[i] = enc.surface(i).areaM2();
            capacity[i] = c.capacities().get(enc.surface(i).name());
            var w = enc.walls().get(enc.surface(i).name());
            grids[i] = w == null ? null : new WallGrid(w, timeScaleS);
            BoundaryCondition bc = enc.surface(i).boundary();
            if (bc.temperatureUnknown()) {
                u.add(i);
            }
            int carrier = bc instanceof BoundaryCondition.OnOtherFace ? enc.indexOf(enc.surface(i).otherFace()) : i;
            inSystem[i] = enc.surface(carrier).boundary().balancesAllPaths();
        }
        nodes = u.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The state at t0 from starting temperatures: nodes without capacity solved, walls held. */
    State start(double t0, double[] t, boolean[] on) {
        RadiationCase m = atTime.at(t0, on);
        Enclosure enc = m.enclosure();
        List<org.exitance.model.EnclosureSurface> held = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            var s = enc.surface(i);
            held.add(capacity[i] != null ? s.withBoundary(new BoundaryCondition.FixedTemperature(t[i]), Double.NaN) : s);
        }
        double[][] walls = new double[n][];
        for (int i = 0; i < n; i++) {
            walls[i] = grids[i] == null ? null : grids[i].uniformState(c.initialK(i));
        }
        double[][] work = copy(walls);
        SurfacePaths frozen = new StepPaths(capacity, grids, area, Double.POSITIVE_INFINITY, null, null, work);
        SolveResult r = new TemperatureSolver(m.withEnclosure(enc.withSurfaces(held))).solveWith(bands, frozen, t);
        return new State(t0, temperatures(r), walls, r);
    }

    /**
     * One step to t1 = cur.timeS + h.
     *
     * @param prev  the state before cur for BDF2, or null for backward Euler
     * @param guess starting temperatures per surface (K); not modified
     * @param on    thermostat states over the step; not modified
     * @throws RuntimeException (a failed solve) when Newton or a wall does not converge
     */
    State step(State cur, State prev, double h, double[] guess, boolean[] on) {
        double gamma = 1;
        double a1 = 1;
        double a2 = 0;
        if (prev != null) {
            double w = h / (cur.timeS() - prev.timeS());
            gamma = (1 + w) / (1 + 2 * w);
            a1 = (1 + w) * (1 + w) / (1 + 2 * w);
            a2 = w * w / (1 + 2 * w);
        }
        double rate = 1.0 / (gamma * h);
        double[] betaE = new double[n];
        double[][] betaCells = new double[n][];
        double[][] work = new double[n][];
        for (int i = 0; i < n; i++) {
            if (capacity[i] != null) {
                betaE[i] = a1 * capacity[i].energyJ(cur.t()[i])
                        - (prev == null ? 0 : a2 * capacity[i].energyJ(prev.t()[i]));
            }
            if (grids[i] != null) {
                double[] s = cur.walls()[i];
                betaCells[i] = new double[s.length];
                work[i] = s.clone();
                for (int j = 0; j < s.length; j++) {
                    betaCells[i][j] = a1 * s[j] - (prev == null ? 0 : a2 * prev.walls()[i][j]);
                }
            }
        }
        double t1 = cur.timeS() + h;
        // the inputs of a step are those just before its end: a jump at t1 acts from t1 on
        RadiationCase m = atTime.at(t1 - 1e-9 * h, on);
        StepPaths paths = new StepPaths(capacity, grids, area, rate, betaE, betaCells, work);
        SolveResult r = new TemperatureSolver(m).solveWith(bands, paths, guess);
        return new State(t1, temperatures(r), work, r);
    }

    /** Heat stored in the node capacities and the walls (J, from 0 K). */
    double storedJ(State s) {
        double e = 0;
        for (int i = 0; i < n; i++) {
            if (capacity[i] != null) {
                e += capacity[i].energyJ(s.t()[i]);
            }
            if (grids[i] != null) {
                e += area[i] * grids[i].storedJPerM2(s.walls()[i]);
            }
        }
        return e;
    }

    /** Heat supplied to the system at the state (W), inputs taken at evaluationS: dissipation of its nodes, and what held surfaces send into their walls. */
    double suppliedW(State s, boolean[] on, double evaluationS) {
        double p = 0;
        Enclosure enc = atTime.at(evaluationS, on).enclosure();
        for (int i = 0; i < n; i++) {
            if (inSystem[i] && enc.surface(i).boundary() instanceof BoundaryCondition.HeatInput h) {
                p += h.powerW();
            }
            if (!inSystem[i] && grids[i] != null) {
                p += area[i] * grids[i].innerFluxWPerM2(s.t()[i], s.walls()[i]);
            }
        }
        return p;
    }

    /** Heat the system loses at the state (W): radiation, convection and links of its nodes, and every wall's outer face. */
    double lostW(State s) {
        double q = 0;
        for (int i = 0; i < n; i++) {
            var sr = s.solve().surfaces().get(i);
            if (inSystem[i]) {
                q += sr.netHeatW() + sr.convectionW() + sr.conductionW();
            }
            if (grids[i] != null) {
                q += area[i] * grids[i].outerLossWPerM2(s.walls()[i]);
            }
        }
        return q;
    }

    private static double[] temperatures(SolveResult r) {
        return r.surfaces().stream().mapToDouble(x -> x.temperatureK()).toArray();
    }

    static double[][] copy(double[][] a) {
        double[][] out = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            out[i] = a[i] == null ? null : a[i].clone();
        }
        return out;
    }
}
