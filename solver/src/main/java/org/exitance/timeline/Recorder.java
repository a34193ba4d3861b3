package org.exitance.timeline;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.BoundaryCondition;
import org.exitance.result.SurfaceResult;

/**
 * Keeps what a run reports while it runs: samples at output instants, each node's extremes at
 * the steps, the first time each target is reached, and the energy sums (trapezoidal over each
 * step from the heats at its two ends).
 */
final class Recorder {
    private final Stepper s;
    private final List<Sample> samples = new ArrayList<>();
    private final double[] minK;
    private final double[] minAt;
    private final double[] maxK;
    private final double[] maxAt;
    private final double[] targetAt;
    private final double storedStart;
    double suppliedJ;
    double lostJ;

    Recorder(Stepper s, State start) {
        this.s = s;
        int m = s.nodes.length;
        minK = new double[m];
        maxK = new double[m];
        minAt = new double[m];
        maxAt = new double[m];
        for (int a = 0; a < m; a++) {
            minK[a] = maxK[a] = start.t()[s.nodes[a]];
        }
        targetAt = new double[s.c.time().targets().size()];
        java.util.Arrays.fill(targetAt, Double.NaN);
        storedStart = s.storedJ(start);
    }

    /** A step from a to b with the thermostat states on over it (not modified). */
    void step(State a, State b, boolean[] on) {
        double h = b.timeS() - a.timeS();
        double pa = s.suppliedW(a, on, a.timeS() + 1e-9 * h);
        double pb = s.suppliedW(b, on, b.timeS() - 1e-9 * h);
        suppliedJ += 0.5 * h * (pa + pb);
        lostJ += 0.5 * h * (s.lostW(a) + s.lostW(b));
        for (int k = 0; k < s.nodes.length; k++) {
            double t = b.t()[s.nodes[k]];
            if (t < minK[k]) {
                minK[k] = t;
                minAt[k] = b.timeS();
            }
            if (t > maxK[k]) {
                maxK[k] = t;
                maxAt[k] = b.timeS();
            }
        }
        List<TimeSettings.Target> targets = s.c.time().targets();
        for (int k = 0; k < targets.size(); k++) {
            int i = s.c.model().enclosure().indexOf(targets.get(k).surface());
            double goal = targets.get(k).temperatureK();
            double ta = a.t()[i];
            double tb = b.t()[i];
            if (Double.isNaN(targetAt[k]) && (ta - goal) * (tb - goal) <= 0 && ta != tb) {
                targetAt[k] = a.timeS() + h * (goal - ta) / (tb - ta);
            } else if (Double.isNaN(targetAt[k]) && ta == goal) {
                targetAt[k] = a.timeS();
            }
        }
    }

    /** Records an output instant at state x, with the thermostat states on at it (not modified). */
    void sample(State x, boolean[] on, double evaluationS) {
        int n = s.n;
        double[] heater = new double[n];
        double[] rad = new double[n];
        double[] conv = new double[n];
        double[] links = new double[n];
        double[] wallIn = new double[n];
        double[] wallOut = new double[n];
        var enc = s.atTime.at(evaluationS, on).enclosure();
        for (int i = 0; i < n; i++) {
            SurfaceResult r = x.solve().surfaces().get(i);
            if (enc.surface(i).boundary() instanceof BoundaryCondition.HeatInput hi) {
                heater[i] = hi.powerW();
            }
            rad[i] = r.netHeatW();
            conv[i] = r.convectionW();
            links[i] = r.conductionW();
            if (s.grids[i] != null) {
                wallIn[i] = s.area[i] * s.grids[i].innerFluxWPerM2(x.t()[i], x.walls()[i]);
                wallOut[i] = s.area[i] * s.grids[i].outerLossWPerM2(x.walls()[i]);
            }
        }
        samples.add(new Sample(x.timeS(), x.t().clone(), heater, rad, conv, links, wallIn, wallOut, s.storedJ(x),
                suppliedJ, lostJ, Stepper.copy(x.walls())));
    }

    List<Sample> samples() {
        return samples;
    }

    double storedStartJ() {
        return storedStart;
    }

    List<TransientResult.Extremes> extremes() {
        List<TransientResult.Extremes> out = new ArrayList<>();
        for (int k = 0; k < s.nodes.length; k++) {
            out.add(new TransientResult.Extremes(s.c.model().enclosure().surface(s.nodes[k]).name(), minK[k], minAt[k],
                    maxK[k], maxAt[k]));
        }
        return out;
    }

    List<TransientResult.TargetTime> targets() {
        List<TransientResult.TargetTime> out = new ArrayList<>();
        List<TimeSettings.Target> targets = s.c.time().targets();
        for (int k = 0; k < targets.size(); k++) {
            out.add(new TransientResult.TargetTime(targets.get(k).surface(), targets.get(k).temperatureK(), targetAt[k]));
        }
        return out;
    }
}
