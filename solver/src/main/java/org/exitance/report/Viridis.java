package org.exitance.report;

import java.awt.Color;

/**
 * The viridis colour map (van der Walt &amp; Smith, matplotlib, 2015), sampled at tenths and
 * interpolated linearly in sRGB: perceptually uniform and sequential, its lightness rising from
 * dark violet to yellow, so that it reads in grey print and for the common colour-vision
 * deficiencies. The eleven values are recalled from the published map (from memory); the HTML
 * report's script carries the same ones.
 */
public final class Viridis {
    private static final int[] STOPS = {0x440154, 0x482475, 0x414487, 0x355f8d, 0x2a788e, 0x21918c, 0x22a884,
        0x44bf70, 0x7ad151, 0xbddf26, 0xfde725};

    private Viridis() {
    }

    /** The colour at {@code t} in [0, 1] (clamped): 0 dark violet, 1 yellow. */
    public static Color at(double t) {
        double x = Math.min(1, Math.max(0, t)) * (STOPS.length - 1);
        int i = Math.min(STOPS.length - 2, (int) Math.floor(x));
        double f = x - i;
        return new Color(mix(STOPS[i] >> 16, STOPS[i + 1] >> 16, f), mix(STOPS[i] >> 8 & 0xff, STOPS[i + 1] >> 8 & 0xff, f),
                mix(STOPS[i] & 0xff, STOPS[i + 1] & 0xff, f));
    }

    private static int mix(int a, int b, double f) {
        return (int) Math.round(a + (b - a) * f);
    }
}
