package org.exitance.network;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * {@link RowProductKernel} on the JDK's vector API: the columns of V in vectors (8 bands fill one
 * 512-bit vector), two rows of F at once; columns after the last full vector go through the
 * plain-Java kernel, whose fused multiply-adds round as the lanes do.
 *
 * <p>Loaded only by name ({@link VectorKernels}), when the module is present.
 */
final class VectorRowProductKernel implements RowProductKernel {
    private static final VectorSpecies<Double> S = DoubleVector.SPECIES_PREFERRED;
    private static final int L = S.length();

    @Override
    public void rows(double[] f, int n, int ia, int ib, double[] v, int b, double[] w, int oa, int ob) {
        int cv = b / L * L;
        int fa = ia * n;
        int fb = ib * n;
        for (int c = 0; c < cv; c += L) {
            DoubleVector sa = DoubleVector.zero(S);
            if (ib >= 0) {
                DoubleVector sb = DoubleVector.zero(S);
                for (int k = 0; k < n; k++) {
                    DoubleVector vk = DoubleVector.fromArray(S, v, k * b + c);
                    sa = vk.fma(DoubleVector.broadcast(S, f[fa + k]), sa);
                    sb = vk.fma(DoubleVector.broadcast(S, f[fb + k]), sb);
                }
                sb.intoArray(w, ob + c);
            } else {
                for (int k = 0; k < n; k++) {
                    sa = DoubleVector.fromArray(S, v, k * b + c).fma(DoubleVector.broadcast(S, f[fa + k]), sa);
                }
            }
            sa.intoArray(w, oa + c);
        }
        if (cv < b) {
            ScalarRowProductKernel.row(f, n, ia, v, b, w, oa, cv);
            if (ib >= 0) {
                ScalarRowProductKernel.row(f, n, ib, v, b, w, ob, cv);
            }
        }
    }

    @Override
    public String describe() {
        return "vector " + L + " × 64-bit";
    }
}
