package org.exitance.network;

import java.util.stream.IntStream;

/**
 * The networks of all bands of one property update, which share one view-factor array: solves
 * and flux responses of every band at once. When every band uses conjugate gradients the bands
 * iterate together and each pass over F serves all of them ({@link RadiationOperator#multiply}: for the
 * dense matrix, the memory traffic of one product for B bands); otherwise the bands are solved side by side in parallel.
 * Either way each band's numbers are those of its own solve, whatever the thread count.
 */
public final class NetworkGroup {
    private NetworkGroup() {
    }

    /**
     * Solves every band.
     *
     * @param nets      the bands' networks, sharing one F
     * @param emissive  E per band and surface (W/m²), not modified
     * @return one state per band, in band order
     */
    public static BandState[] solve(BandNetwork[] nets, double[][] emissive) {
        int nb = nets.length;
        BandState[] states = new BandState[nb];
        SymmetricBand[] cg = fused(nets);
        if (cg == null) {
            IntStream.range(0, nb).parallel().forEach(k -> states[k] = nets[k].solve(emissive[k]));
            return states;
        }
        int n = nets[0].size();
        double[][] b = new double[nb][];
        double[][] j = new double[nb][n];
        for (int k = 0; k < nb; k++) {
            b[k] = nets[k].source(emissive[k]);
        }
        double[][] start = new double[nb][];
        double[][] startFj = new double[nb][];
        boolean warm = true;
        for (int k = 0; k < nb; k++) {
            start[k] = nets[k].lastRadiosity;
            startFj[k] = nets[k].lastIrradiationProduct;
            warm &= start[k] != null;
        }
        FusedConjugateGradients.solve(cg, b, j, 1.0, false, warm ? start : null, warm ? startFj : null, null);
        // the residual check and the net fluxes use a fresh product F·J (not the recurrence)
        double[] fj = product(nets[0].operator(), n, j);
        for (int k = 0; k < nb; k++) {
            double[] col = new double[n];
            for (int i = 0; i < n; i++) {
                col[i] = fj[i * nb + k];
            }
            states[k] = nets[k].finish(emissive[k], b[k], j[k], col);
            nets[k].lastRadiosity = j[k];
            nets[k].lastIrradiationProduct = col;
        }
        return states;
    }

    /**
     * The net-flux change of the given surfaces in every band for emissive-power changes δE at
     * fixed properties ({@link BandNetwork#fluxResponse}, all bands at once). With conjugate
     * gradients the responses are solved to the bands' tolerance times {@code relax} (they steer
     * Newton steps only), from a zero start, and F·x comes from the iterations' own products.
     *
     * @param delta  δE per band and surface (W/m²), not modified
     * @param rows   the surfaces wanted, not modified
     * @param relax  factor on the conjugate-gradient tolerance (ignored by the direct strategy)
     * @return δq per band, in the order of rows (W/m²)
     */
    public static double[][] fluxResponses(BandNetwork[] nets, double[][] delta, int[] rows, double relax) {
        int nb = nets.length;
        double[][] out = new double[nb][];
        SymmetricBand[] cg = fused(nets);
        if (cg == null) {
            IntStream.range(0, nb).parallel().forEach(k -> out[k] = nets[k].fluxResponse(delta[k], rows));
            return out;
        }
        int n = nets[0].size();
        double[][] b = new double[nb][];
        double[][] x = new double[nb][n];
        for (int k = 0; k < nb; k++) {
            b[k] = nets[k].responseSource(delta[k]);
        }
        double[][] fx = new double[nb][n];
        FusedConjugateGradients.solve(cg, b, x, relax, true, null, null, fx);
        for (int k = 0; k < nb; k++) {
            out[k] = new double[rows.length];
            for (int r = 0; r < rows.length; r++) {
                out[k][r] = nets[k].response(rows[r], b[k], fx[k][rows[r]], 0.0); // CG: no windows
            }
        }
        return out;
    }

    /**
     * Gives {@code to} the last radiosities (and their product F·J, which depends on J and F alone)
     * of {@code from} as the warm start of its next fused solve, when both share one operator.
     */
    public static void warmStart(BandNetwork to, BandNetwork from) {
        if (to.operator() == from.operator() && from.lastRadiosity != null) {
            to.lastRadiosity = from.lastRadiosity;
            to.lastIrradiationProduct = from.lastIrradiationProduct;
        }
    }

    /** The bands' CG operators when all bands use conjugate gradients on one F, else null. */
    private static SymmetricBand[] fused(BandNetwork[] nets) {
        SymmetricBand[] cg = new SymmetricBand[nets.length];
        for (int k = 0; k < nets.length; k++) {
            if (!(nets[k].prepared() instanceof SymmetricBand s) || s.op != nets[0].operator()) {
                return null;
            }
            cg[k] = s;
        }
        return nets.length > 0 ? cg : null;
    }

    /** F · [j_0 … j_B−1] as N×B row-major. */
    private static double[] product(RadiationOperator op, int n, double[][] j) {
        double[] w = new double[n * j.length];
        op.multiply(interleave(j, n), j.length, w);
        return w;
    }

    private static double[] interleave(double[][] cols, int n) {
        int nb = cols.length;
        double[] v = new double[n * nb];
        for (int k = 0; k < nb; k++) {
            for (int i = 0; i < n; i++) {
                v[i * nb + k] = cols[k][i];
            }
        }
        return v;
    }
}
