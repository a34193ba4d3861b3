package org.exitance.conduction;

import java.util.Arrays;

/**
 * A property against temperature (conductivity in W/(m·K), specific heat in J/(kg·K)), linear
 * between its points and constant beyond the first and last (common practice for tabulated
 * property data). A table of one point is a constant.
 *
 * @param temperatureK  increasing temperatures (K); copied
 * @param value         the property at each temperature, positive; copied
 */
public record PropertyTable(double[] temperatureK, double[] value) {
    public PropertyTable {
        if (temperatureK.length == 0 || temperatureK.length != value.length) {
            throw new IllegalArgumentException("a property table needs as many values as temperatures, at least one");
        }
        temperatureK = temperatureK.clone();
        value = value.clone();
        for (int i = 0; i < value.length; i++) {
            if (!(value[i] > 0) || !Double.isFinite(value[i])) {
                throw new IllegalArgumentException("property values must be positive and finite: " + value[i]);
            }
            if (i > 0 && !(temperatureK[i] > temperatureK[i - 1])) {
                throw new IllegalArgumentException("table temperatures must increase");
            }
        }
    }

    /** A constant property. */
    public static PropertyTable constant(double v) {
        return new PropertyTable(new double[] {0.0}, new double[] {v});
    }

    /** True when the property does not vary. */
    public boolean isConstant() {
        return Arrays.stream(value).allMatch(v -> v == value[0]);
    }

    /** The property at temperature t (K). */
    public double at(double t) {
        int n = value.length;
        if (n == 1 || t <= temperatureK[0]) {
            return value[0];
        }
        if (t >= temperatureK[n - 1]) {
            return value[n - 1];
        }
        int i = segment(t);
        double w = (t - temperatureK[i]) / (temperatureK[i + 1] - temperatureK[i]);
        return value[i] + w * (value[i + 1] - value[i]);
    }

    /** d(property)/dT at t (per K): the slope of the segment, 0 beyond the ends. */
    public double slope(double t) {
        int n = value.length;
        if (n == 1 || t <= temperatureK[0] || t >= temperatureK[n - 1]) {
            return 0.0;
        }
        int i = segment(t);
        return (value[i + 1] - value[i]) / (temperatureK[i + 1] - temperatureK[i]);
    }

    /** ∫₀^t property dT' (property·K), exact for the piecewise-linear table; t ≥ 0. */
    public double integralFromZero(double t) {
        int n = value.length;
        double lo = temperatureK[0];
        if (n == 1 || t <= lo) {
            return value[0] * t;
        }
        double s = value[0] * lo;
        for (int i = 0; i + 1 < n; i++) {
            double a = temperatureK[i];
            double b = Math.min(temperatureK[i + 1], t);
            if (b <= a) {
                break;
            }
            s += 0.5 * (value[i] + at(b)) * (b - a);
        }
        if (t > temperatureK[n - 1]) {
            s += value[n - 1] * (t - temperatureK[n - 1]);
        }
        return s;
    }

    private int segment(double t) {
        int i = Arrays.binarySearch(temperatureK, t);
        return i >= 0 ? Math.min(i, value.length - 2) : -i - 2;
    }
}
