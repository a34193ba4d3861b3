package org.exitance.network;

/** {@link RowProductKernel} in plain Java: each row on its own, four columns at a time. */
final class ScalarRowProductKernel implements RowProductKernel {
    static final ScalarRowProductKernel INSTANCE = new ScalarRowProductKernel();

    private ScalarRowProductKernel() {
    }

    @Override
    public void rows(double[] f, int n, int ia, int ib, double[] v, int b, double[] w, int oa, int ob) {
        row(f, n, ia, v, b, w, oa, 0);
        if (ib >= 0) {
            row(f, n, ib, v, b, w, ob, 0);
        }
    }

    /** Row i of F V, columns c0..b, into w[o + c0 ..); four columns at a time, then one. */
    static void row(double[] f, int n, int i, double[] v, int b, double[] w, int o, int c0) {
        int fr = i * n;
        int c = c0;
        for (; c + 3 < b; c += 4) {
            double a0 = 0;
            double a1 = 0;
            double a2 = 0;
            double a3 = 0;
            for (int k = 0; k < n; k++) {
                double fik = f[fr + k];
                int vk = k * b + c;
                a0 = Math.fma(fik, v[vk], a0);
                a1 = Math.fma(fik, v[vk + 1], a1);
                a2 = Math.fma(fik, v[vk + 2], a2);
                a3 = Math.fma(fik, v[vk + 3], a3);
            }
            w[o + c] = a0;
            w[o + c + 1] = a1;
            w[o + c + 2] = a2;
            w[o + c + 3] = a3;
        }
        for (; c < b; c++) {
            double a0 = 0;
            for (int k = 0; k < n; k++) {
                a0 = Math.fma(f[fr + k], v[k * b + c], a0);
            }
            w[o + c] = a0;
        }
    }

    @Override
    public String describe() {
        return "scalar";
    }
}
