package org.exitance.spectral;

import java.util.Arrays;

/**
 * Spectral emissivity tabulated at several temperatures, ε(λ, T). At a given T the value is the
 * linear interpolation in T between the two bracketing tables (each itself piecewise linear in λ
 * with held end values); outside the temperature range the first/last table is held.
 *
 * <p>At a fixed T the model is therefore piecewise linear in λ on the union of all tables' node
 * sets, which {@link #breakpointsUm()} returns, so {@link BandAverages} stays exact.
 */
public final class TemperatureTabulatedEmissivity implements SpectralEmissivity {

    private final double[] temperaturesK;
    private final TabulatedEmissivity[] tables;
    private final double[] unionNodes;
    private final boolean gray;

    /**
     * @param temperaturesK strictly increasing, finite, &gt; 0 (K); at least one
     * @param tables        one non-null table per temperature
     * @throws IllegalArgumentException naming the offending index
     */
    public TemperatureTabulatedEmissivity(double[] temperaturesK, TabulatedEmissivity[] tables) {
        if (temperaturesK == null || tables == null) {
            throw new IllegalArgumentException("temperatures and tables must not be null");
        }
        if (temperaturesK.length < 1) {
            throw new IllegalArgumentException("temperature-dependent emissivity needs at least one table, got none");
        }
        if (temperaturesK.length != tables.length) {
            throw new IllegalArgumentException("temperature-dependent emissivity: " + temperaturesK.length
                    + " temperatures but " + tables.length + " tables");
        }
        for (int i = 0; i < temperaturesK.length; i++) {
            double t = temperaturesK[i];
            if (!(t > 0.0) || t == Double.POSITIVE_INFINITY) {
                throw new IllegalArgumentException("temperature-dependent emissivity: temperature[" + i + "] = "
                        + t + " K must be finite and > 0");
            }
            if (i > 0 && !(t > temperaturesK[i - 1])) {
                throw new IllegalArgumentException("temperature-dependent emissivity: temperatures must be strictly increasing, but temperature["
                        + i + "] = " + t + " K <= temperature[" + (i - 1) + "] = " + temperaturesK[i - 1] + " K");
            }
            if (tables[i] == null) {
                throw new IllegalArgumentException("temperature-dependent emissivity: table[" + i + "] is null");
            }
        }
        this.temperaturesK = temperaturesK.clone();
        this.tables = tables.clone();
        this.unionNodes = Arrays.stream(tables)
                .flatMapToDouble(t -> Arrays.stream(t.breakpointsUm()))
                .sorted().distinct().toArray();
        boolean allGray = true;
        for (TabulatedEmissivity t : tables) {
            allGray &= t.isGray();
        }
        this.gray = allGray;
    }

    @Override
    public double at(double wavelengthUm, double temperatureK) {
        Planck.requireTemperature(temperatureK, "temperatureK");
        double[] t = temperaturesK;
        int n = t.length;
        if (temperatureK <= t[0]) {
            return tables[0].valueAt(wavelengthUm);
        }
        if (temperatureK >= t[n - 1]) {
            return tables[n - 1].valueAt(wavelengthUm);
        }
        int i = Arrays.binarySearch(t, temperatureK);
        if (i >= 0) {
            return tables[i].valueAt(wavelengthUm);
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (temperatureK - t[lo]) / (t[hi] - t[lo]);
        double a = tables[lo].valueAt(wavelengthUm);
        double b = tables[hi].valueAt(wavelengthUm);
        return a + w * (b - a);
    }

    /** Union of the node wavelengths of all tables (sorted, distinct), µm. */
    @Override
    public double[] breakpointsUm() {
        return unionNodes.clone();
    }

    /** Internal union node array, not copied; callers must not modify it. */
    double[] nodesNoCopy() {
        return unionNodes;
    }

    /** The temperatures (copy), K. */
    public double[] temperaturesK() {
        return temperaturesK.clone();
    }

    /** The tables (copy of the array; tables are immutable). */
    public TabulatedEmissivity[] tables() {
        return tables.clone();
    }

    /** True when every table is spectrally flat. */
    @Override
    public boolean isGray() {
        return gray;
    }

    /** True when there is more than one table. */
    @Override
    public boolean dependsOnTemperature() {
        return tables.length > 1;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TemperatureTabulatedEmissivity t
                && Arrays.equals(temperaturesK, t.temperaturesK)
                && Arrays.equals(tables, t.tables);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(temperaturesK) + Arrays.hashCode(tables);
    }

    @Override
    public String toString() {
        return "TemperatureTabulatedEmissivity[temperaturesK=" + Arrays.toString(temperaturesK)
                + ", tables=" + Arrays.toString(tables) + "]";
    }
}
