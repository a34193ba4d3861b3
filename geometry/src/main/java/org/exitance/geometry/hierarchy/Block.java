package org.exitance.geometry.hierarchy;

/**
 * One block of the symmetric exchange-area matrix K (K_ij = A_i F_ij, m²), rows = positions of
 * cluster {@code s}, columns = positions of cluster {@code t} (tree order). Only blocks on or
 * above the diagonal are stored; the block (t, s) is this one transposed. Exactly one form is
 * set after the build: zero (nothing exchanged), {@link #dense} (m × n row-major, exact entries)
 * or the low-rank terms K_block ≈ Σ_l u[l] w[l]ᵀ.
 */
final class Block {
    final int s, t;
    /** Rows and columns. */
    final int m, n;
    /** Admissible (far) by the partition: compressed by cross approximation. */
    final boolean far;
    boolean zero;
    double[] dense;
    /** Low-rank factors: rank × m and rank × n. */
    double[][] u, w;
    /** Pair evaluations spent on this block. */
    long evaluations;

    Block(int s, int t, int m, int n, boolean far) {
        this.s = s;
        this.t = t;
        this.m = m;
        this.n = n;
        this.far = far;
    }

    boolean diagonal() {
        return s == t;
    }

    int rank() {
        return u == null ? 0 : u.length;
    }

    /** @return bytes held by the entries of this block */
    long bytes() {
        if (dense != null) {
            return 8L * dense.length;
        }
        return 8L * rank() * (m + n);
    }
}
