package org.exitance.spectral;

import java.util.Arrays;

/**
 * Temperature-independent tabulated spectral emissivity ε(λ): piecewise linear in λ between the
 * table nodes, and constant extrapolation outside the table (the first value is held for
 * λ below the first node, the last value for λ above the last node).
 *
 * <p>Piecewise-linear interpolation keeps band averages exact in closed form
 * (see {@link BandAverages}); the held end values avoid the unbounded or unphysical values a
 * linear extrapolation would produce (ε must stay in [0, 1]).
 */
public final class TabulatedEmissivity implements SpectralEmissivity {

    private final double[] wavelengthUm;
    private final double[] emissivity;
    private final boolean gray;

    /**
     * @param wavelengthUm strictly increasing, finite, &gt; 0 (µm); at least one node
     * @param emissivity   same length, each in [0, 1]
     * @throws IllegalArgumentException naming the offending index
     */
    public TabulatedEmissivity(double[] wavelengthUm, double[] emissivity) {
        if (wavelengthUm == null || emissivity == null) {
            throw new IllegalArgumentException("wavelength and emissivity arrays must not be null");
        }
        if (wavelengthUm.length < 1) {
            throw new IllegalArgumentException("emissivity table needs at least one node, got none");
        }
        if (wavelengthUm.length != emissivity.length) {
            throw new IllegalArgumentException("emissivity table: " + wavelengthUm.length
                    + " wavelengths but " + emissivity.length + " emissivity values");
        }
        for (int i = 0; i < wavelengthUm.length; i++) {
            double l = wavelengthUm[i];
            if (!(l > 0.0) || l == Double.POSITIVE_INFINITY) {
                throw new IllegalArgumentException("emissivity table: wavelength[" + i + "] = " + l
                        + " µm must be finite and > 0");
            }
            if (i > 0 && !(l > wavelengthUm[i - 1])) {
                throw new IllegalArgumentException("emissivity table: wavelengths must be strictly increasing, but wavelength["
                        + i + "] = " + l + " µm <= wavelength[" + (i - 1) + "] = " + wavelengthUm[i - 1] + " µm");
            }
            double e = emissivity[i];
            if (!(e >= 0.0 && e <= 1.0)) {
                throw new IllegalArgumentException("emissivity table: emissivity[" + i + "] = " + e
                        + " (at " + l + " µm) must be in [0, 1]");
            }
        }
        this.wavelengthUm = wavelengthUm.clone();
        this.emissivity = emissivity.clone();
        boolean allEqual = true;
        for (double e : emissivity) {
            allEqual &= e == emissivity[0];
        }
        this.gray = allEqual;
    }

    /** ε(λ) by linear interpolation; end values held outside the table. T is ignored. */
    @Override
    public double at(double wavelengthUm, double temperatureK) {
        return valueAt(wavelengthUm);
    }

    /** ε(λ), temperature-independent. */
    public double valueAt(double lambdaUm) {
        if (Double.isNaN(lambdaUm)) {
            throw new IllegalArgumentException("wavelength is NaN");
        }
        double[] x = wavelengthUm;
        int n = x.length;
        if (lambdaUm <= x[0]) {
            return emissivity[0];
        }
        if (lambdaUm >= x[n - 1]) {
            return emissivity[n - 1];
        }
        int i = Arrays.binarySearch(x, lambdaUm);
        if (i >= 0) {
            return emissivity[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (lambdaUm - x[lo]) / (x[hi] - x[lo]);
        return emissivity[lo] + w * (emissivity[hi] - emissivity[lo]);
    }

    @Override
    public double[] breakpointsUm() {
        return wavelengthUm.clone();
    }

    /** Internal node array, not copied; callers must not modify it. */
    double[] nodesNoCopy() {
        return wavelengthUm;
    }

    /** The table's wavelengths (copy), µm. */
    public double[] wavelengthsUm() {
        return wavelengthUm.clone();
    }

    /** The table's emissivities (copy). */
    public double[] emissivities() {
        return emissivity.clone();
    }

    /** True when all tabulated values are equal (ε then does not depend on λ). */
    @Override
    public boolean isGray() {
        return gray;
    }

    @Override
    public boolean dependsOnTemperature() {
        return false;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TabulatedEmissivity t
                && Arrays.equals(wavelengthUm, t.wavelengthUm)
                && Arrays.equals(emissivity, t.emissivity);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(wavelengthUm) + Arrays.hashCode(emissivity);
    }

    @Override
    public String toString() {
        return "TabulatedEmissivity[wavelengthUm=" + Arrays.toString(wavelengthUm)
                + ", emissivity=" + Arrays.toString(emissivity) + "]";
    }
}
