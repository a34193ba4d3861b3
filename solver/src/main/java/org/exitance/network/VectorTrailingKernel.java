package org.exitance.network;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * {@link TrailingKernel} on the JDK's vector API (incubator module {@code jdk.incubator.vector}):
 * tiles of four rows by two vectors of columns held in registers over the whole k range, so each
 * loaded piece of U serves four rows and each entry of C is loaded and stored once. Columns left
 * over after the last full pair of vectors, and rows after the last tile of four, go one vector or
 * one entry at a time ({@link Math#fma} rounds exactly as a vector lane does).
 *
 * <p>Loaded only by name ({@link VectorKernels}), when the module is present.
 */
final class VectorTrailingKernel implements TrailingKernel {
    private static final VectorSpecies<Double> S = DoubleVector.SPECIES_PREFERRED;
    private static final int L = S.length();

    @Override
    public void update(double[] l, int ldl, double[] c, int ldc, int k0, int k1, int i0, int i1, int j0, int j1) {
        int jt = j0 + (j1 - j0) / (2 * L) * (2 * L);
        int jv = j0 + (j1 - j0) / L * L;
        int i = i0;
        for (; i + 3 < i1; i += 4) {
            for (int j = j0; j < jt; j += 2 * L) {
                tile(l, ldl, c, ldc, k0, k1, i, j);
            }
        }
        for (int r = i0; r < i1; r++) {
            int li = r * ldl;
            int ci = r * ldc;
            for (int j = r < i ? jt : j0; j < jv; j += L) {
                DoubleVector acc = DoubleVector.fromArray(S, c, ci + j);
                for (int k = k0; k < k1; k++) {
                    acc = DoubleVector.fromArray(S, c, k * ldc + j).fma(DoubleVector.broadcast(S, -l[li + k]), acc);
                }
                acc.intoArray(c, ci + j);
            }
            for (int j = jv; j < j1; j++) {
                double acc = c[ci + j];
                for (int k = k0; k < k1; k++) {
                    acc = Math.fma(-l[li + k], c[k * ldc + j], acc);
                }
                c[ci + j] = acc;
            }
        }
    }

    /** Rows i..i+4, columns j..j+2L. */
    private static void tile(double[] l, int ldl, double[] c, int ldc, int k0, int k1, int i, int j) {
        int c0 = i * ldc + j;
        int c1 = c0 + ldc;
        int c2 = c1 + ldc;
        int c3 = c2 + ldc;
        int l0 = i * ldl;
        int l1 = l0 + ldl;
        int l2 = l1 + ldl;
        int l3 = l2 + ldl;
        DoubleVector s00 = DoubleVector.fromArray(S, c, c0);
        DoubleVector s01 = DoubleVector.fromArray(S, c, c0 + L);
        DoubleVector s10 = DoubleVector.fromArray(S, c, c1);
        DoubleVector s11 = DoubleVector.fromArray(S, c, c1 + L);
        DoubleVector s20 = DoubleVector.fromArray(S, c, c2);
        DoubleVector s21 = DoubleVector.fromArray(S, c, c2 + L);
        DoubleVector s30 = DoubleVector.fromArray(S, c, c3);
        DoubleVector s31 = DoubleVector.fromArray(S, c, c3 + L);
        for (int k = k0; k < k1; k++) {
            int ck = k * ldc + j;
            DoubleVector u0 = DoubleVector.fromArray(S, c, ck);
            DoubleVector u1 = DoubleVector.fromArray(S, c, ck + L);
            DoubleVector f0 = DoubleVector.broadcast(S, -l[l0 + k]);
            DoubleVector f1 = DoubleVector.broadcast(S, -l[l1 + k]);
            DoubleVector f2 = DoubleVector.broadcast(S, -l[l2 + k]);
            DoubleVector f3 = DoubleVector.broadcast(S, -l[l3 + k]);
            s00 = u0.fma(f0, s00);
            s01 = u1.fma(f0, s01);
            s10 = u0.fma(f1, s10);
            s11 = u1.fma(f1, s11);
            s20 = u0.fma(f2, s20);
            s21 = u1.fma(f2, s21);
            s30 = u0.fma(f3, s30);
            s31 = u1.fma(f3, s31);
        }
        s00.intoArray(c, c0);
        s01.intoArray(c, c0 + L);
        s10.intoArray(c, c1);
        s11.intoArray(c, c1 + L);
        s20.intoArray(c, c2);
        s21.intoArray(c, c2 + L);
        s30.intoArray(c, c3);
        s31.intoArray(c, c3 + L);
    }

    @Override
    public String describe() {
        return "vector " + L + " × 64-bit";
    }
}
