package org.exitance.network;

/**
 * The inner product of the blocked LU ({@link DenseLu}): {@code C −= L U} on a rectangle, where C
 * and U are rows of one row-major array (the trailing update {@code A22 −= L21 U12}, or the
 * right-hand sides of a blocked triangular solve) and L is a row-major array of its own stride.
 * Every entry is computed the same way by every implementation and for any split of the
 * rectangle: {@code c ← fma(−l[i][k], u[k][j], c)} for k ascending, one rounding per step. So the factors do not depend on the thread count, nor on whether the vector kernel is
 * in use.
 *
 * <p>Two implementations: {@link VectorTrailingKernel} (the JDK's vector API, module
 * {@code jdk.incubator.vector}, which the launcher adds; on an AVX-512 machine about five times the
 * scalar speed) and {@link ScalarTrailingKernel}. {@link #best()} takes the vector one when
 * {@link VectorKernels#ON}.
 */
interface TrailingKernel {

    /**
     * {@code c[i][j] −= Σ_{k = k0}^{k1−1} l[i][k] c[k][j]} for i in [i0, i1), j in [j0, j1), where
     * {@code l[i][k] = l[i·ldl + k]} and {@code c[i][j] = c[i·ldc + j]}. Rows k0..k1 of c are read
     * only and must not be among the rows i0..i1; l may be c itself (the LU's trailing update).
     *
     * @param l  row-major, stride ldl; read only outside the rectangle
     * @param c  row-major, stride ldc; modified in the rectangle only
     */
    void update(double[] l, int ldl, double[] c, int ldc, int k0, int k1, int i0, int i1, int j0, int j1);

    /** A short name for reports and benchmarks ("vector 8 × 64-bit", "scalar"). */
    String describe();

    /** The fastest kernel this JVM can run ({@link VectorKernels}). */
    static TrailingKernel best() {
        return Best.KERNEL;
    }

    /** The scalar kernel, whatever the JVM has (tests and comparisons). */
    static TrailingKernel scalar() {
        return ScalarTrailingKernel.INSTANCE;
    }

    /** Chosen once per JVM. */
    final class Best {
        static final TrailingKernel KERNEL = VectorKernels.load("org.exitance.network.VectorTrailingKernel",
                TrailingKernel.class, ScalarTrailingKernel.INSTANCE);

        private Best() {
        }
    }
}
