package org.exitance.timeline;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;
import org.exitance.conduction.WallSolveException;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.thermal.IllPosedCaseException;
import org.exitance.thermal.SolveFailedException;

/**
 * Integrates a {@link TransientCase} in time (docs/transient.md): implicit steps ({@link Stepper}:
 * backward Euler after a start or switch, then variable-step BDF2), each step's local error
 * ({@link ErrorEstimate}) held below the stated tolerance in every node and wall-cell temperature.
 * A rejected step is retried with {@code h·max(0.2, 0.9 (tol/err)^{1/3})}; the next step grows by
 * at most 2 (a step ratio below 1 + √2 keeps variable-step BDF2 zero-stable; Hairer and Wanner,
 * Solving ODEs I, §III.5). A step whose solve fails is cut by 4. A step below the floor ends the
 * run ({@link TransientFailedException}). Steps land on output instants, on schedule points (where
 * the method restarts) and on period ends; a thermostat switch is located within the tolerance
 * by shortening the step that crosses its threshold, and the method restarts there.
 */
public final class TransientRun {
    private final TransientCase c;
    private final BandSet bands;
    private final TimeSettings ts;
    private final Stepper s;

    public TransientRun(TransientCase c, BandSet bands) {
        this.c = c;
        this.bands = bands;
        this.ts = c.time();
        double scale = ts.periodic() ? ts.periodS() / 100 : ts.durationS() / 200;
        if (!Double.isNaN(ts.outputEveryS())) {
            scale = Math.min(scale, ts.outputEveryS());
        }
        this.s = new Stepper(c, bands, scale);
    }

    /**
     * @param progress  told the fraction of the duration done (0 to 1); may be null
     * @throws TransientFailedException when a step must be cut below the floor
     * @throws IllPosedCaseException     when the case has no solution as posed at the start
     */
    public TransientResult run(DoubleConsumer progress) {
        Enclosure enc = c.model().enclosure();
        int n = enc.size();
        double[] t0 = new double[n];
        for (int i = 0; i < n; i++) {
            t0[i] = c.initialK(i);
        }
        List<Drivers.Thermostat> thermostats = c.drivers().thermostats();
        boolean[] on = new boolean[thermostats.size()];
        for (int k = 0; k < on.length; k++) {
            on[k] = t0[enc.indexOf(thermostats.get(k).sensor())] <= thermostats.get(k).onBelowK();
        }
        State cur = s.start(0, t0, on);
        Recorder rec = new Recorder(s, cur);
        rec.sample(cur, on, 0);
        boolean fixed = !Double.isNaN(ts.fixedStepS());
        double end = ts.durationS();
        double h = fixed ? ts.fixedStepS() : ts.firstStepS();
        State prev = null;
        State prev2 = null;
        int accepted = 0;
        int rejected = 0;
        int switches = 0;
        double smallest = Double.POSITIVE_INFINITY;
        double largest = 0;
        List<TransientResult.Cycle> cycles = new ArrayList<>();
        List<TransientResult.Switch> switchLog = new ArrayList<>();
        State cycleStart = cur;
        double cycleSupplied = 0;
        double cycleLost = 0;
        boolean repeated = false;
        int locating = 0;
        double nextOutput = nextOutput(0);
        double nextPeriod = ts.periodic() ? ts.periodS() : Double.POSITIVE_INFINITY;
        while (cur.timeS() < end * (1 - 1e-12)) {
            List<Double> knots = s.atTime.knotsIn(cur.timeS(), end);
            double nextKnot = knots.isEmpty() ? Double.POSITIVE_INFINITY : knots.get(0);
            double bp = Math.min(Math.min(end, nextOutput), Math.min(nextKnot, nextPeriod));
            double hTry = fixed ? h : Math.min(h, ts.maxStepS());
            double room = bp - cur.timeS();
            if (hTry >= room * (1 - 1e-9)) {
                hTry = room;
            } else if (!fixed && 2 * hTry > room) {
                hTry = room / 2;
            }
            State cand;
            try {
                cand = s.step(cur, prev, hTry, guess(cur, prev, hTry), on);
            } catch (SolveFailedException | WallSolveException | IllPosedCaseException e) {
                rejected++;
                h = cut(hTry / 4, cur.timeS(), e.getMessage());
                continue;
            }
            double hNext = h;
            if (!fixed) {
                double err = ErrorEstimate.of(cand.vector(s.nodes), cand.timeS(), cur.vector(s.nodes), cur.timeS(),
                        prev == null ? null : prev.vector(s.nodes), prev == null ? 0 : prev.timeS(),
                        prev2 == null ? null : prev2.vector(s.nodes), prev2 == null ? 0 : prev2.timeS());
                double ratio = err / ts.toleranceK();
                if (ratio > 1) {
                    rejected++;
                    h = cut(hTry * Math.max(0.2, 0.9 * Math.pow(ratio, -1.0 / 3)), cur.timeS(),
                            "the local error stays above the tolerance");
                    continue;
                }
                hNext = hTry * (ratio == 0 ? 2 : Math.min(2, Math.max(0.2, 0.9 * Math.pow(ratio, -1.0 / 3))));
            }
            boolean[] flip = new boolean[on.length];
            double shorten = 1;
            for (int k = 0; k < on.length; k++) {
                Drivers.Thermostat th = thermostats.get(k);
                int i = enc.indexOf(th.sensor());
                double ta = cur.t()[i];
                double tb = cand.t()[i];
                double thr = on[k] ? th.offAboveK() : th.onBelowK();
                boolean crosses = on[k] ? tb >= thr : tb <= thr;
                if (crosses) {
                    flip[k] = true;
                    if (!fixed && Math.abs(tb - thr) > ts.toleranceK() && ta != tb) {
                        shorten = Math.min(shorten, Math.max(0.05, (thr - ta) / (tb - ta)));
                    }
                }
            }
            if (shorten < 1 && hTry * shorten >= ts.minStepS() && locating++ < 20) {
                h = hTry * shorten * (1 + 1e-6);
                continue; // locate the switch: retry the step so that it ends at the threshold
            }
            rec.step(cur, cand, on);
            locating = 0;
            accepted++;
            smallest = Math.min(smallest, hTry);
            largest = Math.max(largest, hTry);
            prev2 = prev;
            prev = cur;
            cur = cand;
            boolean restart = cur.timeS() >= nextKnot * (1 - 1e-12);
            for (int k = 0; k < on.length; k++) {
                if (flip[k]) {
                    on[k] = !on[k];
                    switches++;
                    switchLog.add(new TransientResult.Switch(cur.timeS(), thermostats.get(k).heater(), on[k]));
                    restart = true;
                }
            }
            boolean sampled = false;
            if (cur.timeS() >= nextOutput * (1 - 1e-12) || cur.timeS() >= end * (1 - 1e-12)) {
                rec.sample(cur, on, cur.timeS());
                nextOutput = nextOutput(cur.timeS());
                sampled = true;
            }
            if (cur.timeS() >= nextPeriod * (1 - 1e-12)) {
                double change = maxDifference(cur.vector(s.nodes), cycleStart.vector(s.nodes));
                cycles.add(new TransientResult.Cycle(cycles.size() + 1, cycleStart.timeS(), cur.timeS(),
                        rec.suppliedJ - cycleSupplied, rec.lostJ - cycleLost, s.storedJ(cur) - s.storedJ(cycleStart),
                        change));
                cycleSupplied = rec.suppliedJ;
                cycleLost = rec.lostJ;
                cycleStart = cur;
                nextPeriod += ts.periodS();
                if (change <= ts.periodToleranceK()) {
                    repeated = true;
                    if (!sampled) {
                        rec.sample(cur, on, cur.timeS());
                    }
                    break;
                }
            }
            if (restart) {
                prev = null;
                prev2 = null;
                h = fixed ? ts.fixedStepS() : Math.min(ts.firstStepS(), hNext);
            } else {
                h = hNext;
            }
            if (progress != null) {
                progress.accept(Math.min(1, cur.timeS() / end));
            }
        }
        var energy = new TransientResult.Energy(rec.storedStartJ(), s.storedJ(cur), rec.suppliedJ, rec.lostJ);
        var steps = new TransientResult.Steps(accepted, rejected, accepted == 0 ? 0 : smallest, largest, switches);
        return new TransientResult(c.model().title(), names(enc), shown(enc), rec.samples(), rec.extremes(),
                rec.targets(), switchLog, cycles, repeated, energy, steps, fixed ? Double.NaN : ts.toleranceK(), bands.origin());
    }

    /** The next output instant after t (s): a multiple of the spacing, a listed instant, or the end. */
    private double nextOutput(double t) {
        double next = ts.durationS();
        if (!Double.isNaN(ts.outputEveryS())) {
            double k = Math.floor(t / ts.outputEveryS() + 1e-9) + 1;
            next = Math.min(next, k * ts.outputEveryS());
        }
        for (double a : ts.outputAtS()) {
            if (a > t * (1 + 1e-12) && a < next) {
                next = a;
            }
        }
        return next;
    }

    private double cut(double h, double at, String why) {
        if (h < ts.minStepS()) {
            throw new TransientFailedException("the step fell below its floor of " + fmt(ts.minStepS()) + " s at t = "
                    + fmt(at) + " s: " + why);
        }
        return h;
    }

    /** The start of a step's Newton solve: the linear extrapolation of the temperatures (a new array). */
    private static double[] guess(State cur, State prev, double h) {
        double[] g = cur.t().clone();
        if (prev != null) {
            double w = h / (cur.timeS() - prev.timeS());
            for (int i = 0; i < g.length; i++) {
                double x = cur.t()[i] + w * (cur.t()[i] - prev.t()[i]);
                g[i] = x > 0.5 * cur.t()[i] ? x : cur.t()[i];
            }
        }
        return g;
    }

    private static double maxDifference(double[] a, double[] b) {
        double m = 0;
        for (int i = 0; i < a.length; i++) {
            m = Math.max(m, Math.abs(a[i] - b[i]));
        }
        return m;
    }

    private List<String> names(Enclosure enc) {
        return enc.surfaces().stream().map(x -> x.name()).toList();
    }

    private List<String> shown(Enclosure enc) {
        if (!ts.plotNodes().isEmpty()) {
            return ts.plotNodes();
        }
        List<String> out = new ArrayList<>();
        for (int i : s.nodes) {
            if (!(enc.surface(i).boundary() instanceof BoundaryCondition.OnOtherFace)) {
                out.add(enc.surface(i).name());
            }
        }
        return out;
    }

    static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.6g", v);
    }
}
