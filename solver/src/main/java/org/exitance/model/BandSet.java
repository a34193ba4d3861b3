package org.exitance.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A partition of the spectrum [0, ∞) into contiguous bands, given by its interior edges in µm.
 * No interior edges means one band: the gray solution.
 *
 * @param interiorEdgesUm strictly increasing, positive, finite edges (µm); copied
 * @param origin          how the edges were chosen, for reports ("case", "command line", "default rule")
 */
public record BandSet(double[] interiorEdgesUm, String origin) {
    public BandSet {
        interiorEdgesUm = interiorEdgesUm.clone();
        for (int i = 0; i < interiorEdgesUm.length; i++) {
            double e = interiorEdgesUm[i];
            if (!(e > 0) || !Double.isFinite(e)) {
                throw new IllegalArgumentException("band edge " + i + " must be positive and finite: " + e);
            }
            if (i > 0 && !(e > interiorEdgesUm[i - 1])) {
                throw new IllegalArgumentException("band edges must increase: edge " + i + " = " + e
                        + " after " + interiorEdgesUm[i - 1]);
            }
        }
    }

    /** One band covering the whole spectrum. */
    public static BandSet gray(String origin) {
        return new BandSet(new double[0], origin);
    }

    /** The bands, from short to long wavelength. */
    public List<Band> bands() {
        List<Band> out = new ArrayList<>(interiorEdgesUm.length + 1);
        double lower = 0;
        for (double e : interiorEdgesUm) {
            out.add(new Band(lower, e));
            lower = e;
        }
        out.add(new Band(lower, Double.POSITIVE_INFINITY));
        return out;
    }

    public int size() {
        return interiorEdgesUm.length + 1;
    }

    @Override
    public double[] interiorEdgesUm() {
        return interiorEdgesUm.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof BandSet b && Arrays.equals(interiorEdgesUm, b.interiorEdgesUm) && origin.equals(b.origin);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(interiorEdgesUm) * 31 + origin.hashCode();
    }

    @Override
    public String toString() {
        return "BandSet" + Arrays.toString(interiorEdgesUm) + " (" + origin + ")";
    }
}
