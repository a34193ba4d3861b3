package org.exitance.network;


/**
 * Preconditioned conjugate gradients on the symmetric form of the radiosity equations.
 *
 * <p>Row i of {@code (I − diag(ρ)F) J = b} multiplied by {@code A_i/ρ_i} gives
 * {@code S J = c} with {@code S = diag(A/ρ) − diag(A) F} and {@code c_i = A_i b_i / ρ_i}.
 * With reciprocity {@code A_i F_ij = A_j F_ji}, S is symmetric, and positive definite when the
 * enclosure absorbs something in the band (Modest, Radiative Heat Transfer, 3rd ed., §5.5,
 * on the symmetric radiosity matrix; conjugate gradients: Saad, Iterative Methods for Sparse
 * Linear Systems, 2nd ed., Alg. 9.1). Rows with ρ_i = 0 are black: J_i = b_i is known and moves
 * to the right-hand side.
 *
 * <p><b>Preconditioner.</b> The diagonal (Jacobi) plus a one-vector coarse correction on the
 * constant radiosity: {@code M⁻¹ = D⁻¹ + z (zᵀSz)⁻¹ zᵀ}, z = 1 on the non-black rows (additive
 * two-level preconditioner, Saad, 2nd ed., §14.5, with the coarse space of one vector). In a
 * closed, nearly perfectly reflecting enclosure (ρ → 1) the constant is the near-null vector of
 * S (rows of F sum to 1): an isolated small eigenvalue, which CG resolves in a few extra
 * iterations and the coarse term removes. Measured on the 1,014-facet benchmark box at tolerance
 * 1e-13 (docs/performance.md): 14, 17, 17, 16, 14 iterations at ρ = 0.5, 0.9, 0.99, 0.999, 0.9999,
 * against 14, 19, 21, 21, 21 with Jacobi alone (plain Jacobi sweeps would need
 * ln(1e-13)/ln(ρ) ≈ 30,000 at ρ = 0.999).
 *
 * <p><b>Stopping rule, in watts.</b> The heat residual of surface i is {@code A_i r_i = ρ_i (c − SJ)_i}
 * (W), with r = b − (I − ρF)J the radiosity residual; CG updates it by recurrence from the product
 * S·p it computes anyway. It stops when every surface's heat residual is within the tolerance times
 * the power that surface radiates and receives, {@code |A_i r_i| ≤ tol · A_i (|b_i| + |J_i|)}: the
 * same per-node scale as the heat test of the temperature solve. The band network then checks the
 * true residual once with the product F·J it forms for the irradiation anyway.
 * Work: one pass over F per iteration (2N² flops); memory: a few vectors of N, no N² array.
 */
public final class ConjugateGradientRadiositySolver implements RadiositySolver {
    private final double relativeTolerance;
    private final int maxIterations;

    /**
     * @param relativeTolerance stop when every surface's heat residual is within this fraction of
     *                          the power it radiates and receives (see the class doc)
     * @param maxIterations     iterations allowed before {@link NetworkConvergenceException}
     */
    public ConjugateGradientRadiositySolver(double relativeTolerance, int maxIterations) {
        this.relativeTolerance = relativeTolerance;
        this.maxIterations = maxIterations;
    }

    @Override
    public String name() {
        return "conjugate gradients";
    }

    @Override
    public boolean supportsWindows() {
        return false;
    }

    /** A few work vectors of N doubles: the operator is applied from F itself. */
    @Override
    public long preparedBytes(int n) {
        return 16L * Double.BYTES * n;
    }

    /** Opaque enclosures only: a window's coupling breaks the symmetry this method needs. */
    @Override
    public Prepared prepare(double[] f, int n, double[] rho, double[] area, WindowCoupling windows) {
        return prepare(RadiationOperator.dense(f, n), f, rho, area, windows);
    }

    /** Works from the operator's products alone; the dense array is not used (may be null). */
    @Override
    public Prepared prepare(RadiationOperator op, double[] f, double[] rho, double[] area, WindowCoupling windows) {
        if (!windows.isEmpty()) {
            throw new IllegalArgumentException("conjugate gradients need a symmetric radiosity matrix; an enclosure"
                    + " with windows needs the direct solver (RadiositySolver.forSize)");
        }
        return new SymmetricBand(op, rho.clone(), area.clone(), relativeTolerance, maxIterations);
    }
}
