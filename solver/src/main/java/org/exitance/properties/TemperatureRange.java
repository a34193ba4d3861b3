package org.exitance.properties;

/**
 * Surface temperatures from {@code fromK} to {@code toK} in steps of {@code stepK}, all in K. The
 * last temperature is always {@code toK}, even when the range is not a whole number of steps.
 *
 * @param fromK first temperature, finite and &gt; 0
 * @param toK   last temperature, ≥ fromK
 * @param stepK step, &gt; 0
 */
public record TemperatureRange(double fromK, double toK, double stepK) {
    /** Most temperatures a range may hold (a guard against a mistyped step). */
    public static final int MAX_POINTS = 10_000;

    /** @throws IllegalArgumentException with a message in the user's terms */
    public TemperatureRange {
        if (!(fromK > 0) || !Double.isFinite(fromK)) {
            throw new IllegalArgumentException("the first temperature must be finite and above 0 K, got " + fromK);
        }
        if (!(toK >= fromK) || !Double.isFinite(toK)) {
            throw new IllegalArgumentException("the last temperature (" + toK + " K) must not be below the first ("
                    + fromK + " K)");
        }
        if (!(stepK > 0) || !Double.isFinite(stepK)) {
            throw new IllegalArgumentException("the temperature step must be positive, got " + stepK);
        }
        if ((toK - fromK) / stepK + 1 > MAX_POINTS) {
            throw new IllegalArgumentException("the range holds more than " + MAX_POINTS + " temperatures; use a larger step");
        }
    }

    /** The temperatures in K, increasing; from + i·step while below to (by more than 1e-9 step), then to. */
    public double[] temperaturesK() {
        int whole = (int) Math.floor((toK - fromK) / stepK + 1e-9);
        double last = fromK + whole * stepK;
        boolean extra = toK - last > 1e-9 * stepK;
        double[] t = new double[whole + 1 + (extra ? 1 : 0)];
        for (int i = 0; i <= whole; i++) {
            t[i] = fromK + i * stepK;
        }
        if (extra) {
            t[whole + 1] = toK;
        } else {
            t[whole] = toK;
        }
        return t;
    }
}
