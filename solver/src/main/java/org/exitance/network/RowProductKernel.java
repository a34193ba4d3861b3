package org.exitance.network;

/**
 * Rows of {@code W = F V} for {@link FusedProduct}, two rows at a time so that each loaded row of
 * V serves both. Every entry is the same chain whatever the kernel, the pairing or the number of
 * columns: {@code w ← fma(F[i][k], V[k][c], w)} from 0 for k ascending, so products do not depend
 * on the thread count, on whether the vector API is in use, or on how many columns are multiplied
 * together.
 */
interface RowProductKernel {

    /**
     * Rows {@code ia} and, when {@code ib ≥ 0}, {@code ib} of F V.
     *
     * @param f   F, N×N row-major; not modified
     * @param v   V, N×b row-major; not modified
     * @param w   receives row ia at [oa, oa+b) and row ib at [ob, ob+b); modified
     */
    void rows(double[] f, int n, int ia, int ib, double[] v, int b, double[] w, int oa, int ob);

    /** A short name for reports and benchmarks ("vector 8 × 64-bit", "scalar"). */
    String describe();

    /** The fastest kernel this JVM can run ({@link VectorKernels}). */
    static RowProductKernel best() {
        return Best.KERNEL;
    }

    /** The plain-Java kernel (tests and comparisons). */
    static RowProductKernel scalar() {
        return ScalarRowProductKernel.INSTANCE;
    }

    /** Chosen once per JVM. */
    final class Best {
        static final RowProductKernel KERNEL = VectorKernels.load("org.exitance.network.VectorRowProductKernel",
                RowProductKernel.class, ScalarRowProductKernel.INSTANCE);

        private Best() {
        }
    }
}
