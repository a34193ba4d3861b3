package org.exitance.network;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorSpecies;

/**
 * {@link TrailingKernel} on the JDK's vector API (incubator module {@code jdk.incubator.vector}):
 * tiles of four rows by two vectors of columns held in registers over the whole k range, so each
 * loaded piece of U12 serves four rows and each entry of A22 is loaded and stored once. Columns
 * left over after the last full vector, and rows after the last tile of four, go entry by entry
 * with {@link Math#fma}, which rounds exactly as a vector lane does.
 *
 * <p>Loaded only by name from {@link TrailingKernel.Choice}, when the module is present.
 */
final class VectorTrailingKernel implements TrailingKernel {
    private static final VectorSpecies<Double> S = DoubleVector.SPECIES_PREFERRED;
    private static final int L = S.length();

    @Override
    public void update(double[] a, int n, int kb, int ke, int i0, int i1, int j0, int j1) {
        int jv = j0 + (j1 - j0) / (2 * L) * (2 * L);
        int i = i0;
        for (; i + 3 < i1; i += 4) {
            for (int j = j0; j < jv; j += 2 * L) {
                tile(a, n, kb, ke, i, j);
            }
        }
        for (; i < i1; i++) {
            for (int j = j0; j < jv; j += L) {
                int c = i * n + j;
                DoubleVector acc = DoubleVector.fromArray(S, a, c);
                for (int k = kb; k < ke; k++) {
                    acc = DoubleVector.fromArray(S, a, k * n + j).fma(DoubleVector.broadcast(S, -a[i * n + k]), acc);
                }
                acc.intoArray(a, c);
            }
        }
        if (jv < j1) {
            for (int r = i0; r < i1; r++) {
                int ri = r * n;
                for (int j = jv; j < j1; j++) {
                    double acc = a[ri + j];
                    for (int k = kb; k < ke; k++) {
                        acc = Math.fma(-a[ri + k], a[k * n + j], acc);
                    }
                    a[ri + j] = acc;
                }
            }
        }
    }

    /** Rows i..i+4, columns j..j+2L. */
    private static void tile(double[] a, int n, int kb, int ke, int i, int j) {
        int r0 = i * n;
        int r1 = r0 + n;
        int r2 = r1 + n;
        int r3 = r2 + n;
        DoubleVector c00 = DoubleVector.fromArray(S, a, r0 + j);
        DoubleVector c01 = DoubleVector.fromArray(S, a, r0 + j + L);
        DoubleVector c10 = DoubleVector.fromArray(S, a, r1 + j);
        DoubleVector c11 = DoubleVector.fromArray(S, a, r1 + j + L);
        DoubleVector c20 = DoubleVector.fromArray(S, a, r2 + j);
        DoubleVector c21 = DoubleVector.fromArray(S, a, r2 + j + L);
        DoubleVector c30 = DoubleVector.fromArray(S, a, r3 + j);
        DoubleVector c31 = DoubleVector.fromArray(S, a, r3 + j + L);
        for (int k = kb; k < ke; k++) {
            int rk = k * n + j;
            DoubleVector u0 = DoubleVector.fromArray(S, a, rk);
            DoubleVector u1 = DoubleVector.fromArray(S, a, rk + L);
            DoubleVector l0 = DoubleVector.broadcast(S, -a[r0 + k]);
            DoubleVector l1 = DoubleVector.broadcast(S, -a[r1 + k]);
            DoubleVector l2 = DoubleVector.broadcast(S, -a[r2 + k]);
            DoubleVector l3 = DoubleVector.broadcast(S, -a[r3 + k]);
            c00 = u0.fma(l0, c00);
            c01 = u1.fma(l0, c01);
            c10 = u0.fma(l1, c10);
            c11 = u1.fma(l1, c11);
            c20 = u0.fma(l2, c20);
            c21 = u1.fma(l2, c21);
            c30 = u0.fma(l3, c30);
            c31 = u1.fma(l3, c31);
        }
        c00.intoArray(a, r0 + j);
        c01.intoArray(a, r0 + j + L);
        c10.intoArray(a, r1 + j);
        c11.intoArray(a, r1 + j + L);
        c20.intoArray(a, r2 + j);
        c21.intoArray(a, r2 + j + L);
        c30.intoArray(a, r3 + j);
        c31.intoArray(a, r3 + j + L);
    }

    @Override
    public String describe() {
        return "vector " + L + " × 64-bit";
    }
}
