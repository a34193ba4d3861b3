package org.exitance.timeline;

import org.exitance.result.SolveResult;

/**
 * The state at one instant: every surface's temperature, every wall's cells, and the solve of
 * that instant (its heats), kept together; arrays are owned and never modified after building.
 *
 * @param timeS  time (s)
 * @param t      temperature per surface (K)
 * @param walls  per surface, its wall's cell and outer-face temperatures (K), or null
 * @param solve  the steady-model solve at this instant (heats by path)
 */
record State(double timeS, double[] t, double[][] walls, SolveResult solve) {

    /** The values the error control and the periodic test compare: unknown nodes, then wall cells; a new array. */
    double[] vector(int[] nodes) {
        int len = nodes.length;
        for (double[] w : walls) {
            len += w == null ? 0 : w.length;
        }
        double[] v = new double[len];
        int k = 0;
        for (int i : nodes) {
            v[k++] = t[i];
        }
        for (double[] w : walls) {
            if (w != null) {
                System.arraycopy(w, 0, v, k, w.length);
                k += w.length;
            }
        }
        return v;
    }
}
