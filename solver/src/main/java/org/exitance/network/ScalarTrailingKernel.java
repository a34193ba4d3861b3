package org.exitance.network;

/** {@link TrailingKernel} in plain Java: row by row, one fused multiply-add per term. */
final class ScalarTrailingKernel implements TrailingKernel {
    static final ScalarTrailingKernel INSTANCE = new ScalarTrailingKernel();

    private ScalarTrailingKernel() {
    }

    @Override
    public void update(double[] l, int ldl, double[] c, int ldc, int k0, int k1, int i0, int i1, int j0, int j1) {
        for (int i = i0; i < i1; i++) {
            int li = i * ldl;
            int ci = i * ldc;
            for (int k = k0; k < k1; k++) {
                double f = -l[li + k];
                if (f != 0) {
                    int ck = k * ldc;
                    for (int j = j0; j < j1; j++) {
                        c[ci + j] = Math.fma(f, c[ck + j], c[ci + j]);
                    }
                }
            }
        }
    }

    @Override
    public String describe() {
        return "scalar";
    }
}
