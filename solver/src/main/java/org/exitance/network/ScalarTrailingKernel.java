package org.exitance.network;

/** {@link TrailingKernel} in plain Java: row by row, one fused multiply-add per term. */
final class ScalarTrailingKernel implements TrailingKernel {
    static final ScalarTrailingKernel INSTANCE = new ScalarTrailingKernel();

    private ScalarTrailingKernel() {
    }

    @Override
    public void update(double[] a, int n, int kb, int ke, int i0, int i1, int j0, int j1) {
        for (int i = i0; i < i1; i++) {
            int ri = i * n;
            for (int k = kb; k < ke; k++) {
                double l = -a[ri + k];
                if (l != 0) {
                    int rk = k * n;
                    for (int j = j0; j < j1; j++) {
                        a[ri + j] = Math.fma(l, a[rk + j], a[ri + j]);
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
