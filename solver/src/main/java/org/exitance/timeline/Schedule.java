package org.exitance.timeline;

import java.util.ArrayList;
import java.util.List;

/**
 * A quantity against time: linear between its points (a ramp), constant between two equal
 * values (a hold), a jump where two points share a time, constant before the first point and
 * after the last. With a repeat period the pattern repeats: the value at t is the value at
 * t mod period (an orbit).
 *
 * @param timeS    non-decreasing times (s), at most two equal in a row; copied
 * @param value    the value at each time (unit of the key that holds the schedule); copied
 * @param repeatS  repeat period (s), or NaN for none; the times must then lie in [0, period]
 */
public record Schedule(double[] timeS, double[] value, double repeatS) {
    public Schedule {
        if (timeS.length == 0 || timeS.length != value.length) {
            throw new IllegalArgumentException("a schedule needs as many values as times, at least one");
        }
        timeS = timeS.clone();
        value = value.clone();
        for (int i = 1; i < timeS.length; i++) {
            if (timeS[i] < timeS[i - 1] || i > 1 && timeS[i] == timeS[i - 2]) {
                throw new IllegalArgumentException("schedule times must not decrease, and at most two may be equal");
            }
        }
        if (!Double.isNaN(repeatS) && (!(repeatS > 0) || timeS[0] < 0 || timeS[timeS.length - 1] > repeatS)) {
            throw new IllegalArgumentException("a repeating schedule's times must lie within its period");
        }
    }

    /** A constant. */
    public static Schedule constant(double v) {
        return new Schedule(new double[] {0}, new double[] {v}, Double.NaN);
    }

    /**
     * The value at time t (s). At a jump (two points at one time) the later value holds from that
     * time on.
     */
    public double at(double t) {
        double x = Double.isNaN(repeatS) ? t : t - Math.floor(t / repeatS) * repeatS;
        int n = timeS.length;
        if (x < timeS[0]) {
            return value[0];
        }
        for (int i = n - 1; i >= 0; i--) {
            if (x >= timeS[i]) {
                if (i == n - 1 || timeS[i + 1] == timeS[i]) {
                    return value[i == n - 1 ? i : i + 1];
                }
                double w = (x - timeS[i]) / (timeS[i + 1] - timeS[i]);
                return value[i] + w * (value[i + 1] - value[i]);
            }
        }
        return value[0];
    }

    /** The distinct times in (from, to] (s) where the schedule has a point (repeated with its period), in order. */
    public List<Double> knotsIn(double from, double to) {
        List<Double> out = new ArrayList<>();
        if (Double.isNaN(repeatS)) {
            for (double k : timeS) {
                if (k > from && k <= to) {
                    out.add(k);
                }
            }
            return out.stream().distinct().toList();
        }
        long first = (long) Math.floor(from / repeatS);
        for (long c = first; c * repeatS <= to; c++) {
            for (double k : timeS) {
                double t = c * repeatS + k;
                if (t > from && t <= to) {
                    out.add(t);
                }
            }
        }
        return out.stream().distinct().sorted().toList();
    }
}
