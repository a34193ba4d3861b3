package org.exitance.network;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/**
 * The solver rule for windows: their coupling makes the radiosity matrix unsymmetric, so the
 * direct solver is chosen at any size and conjugate gradients refuse it (common practice: CG needs
 * a symmetric positive definite matrix; Saad, Iterative Methods for Sparse Linear Systems, 2nd ed., §6.7).
 */
class WindowSolverRuleTest {
    @Test
    void windowsChooseTheDirectSolverAtAnySize() {
        assertThat(RadiositySolver.forSize(5000, true)).isInstanceOf(DirectRadiositySolver.class);
        assertThat(RadiositySolver.forSize(5000, false)).isInstanceOf(ConjugateGradientRadiositySolver.class);
    }

    @Test
    void conjugateGradientsRefuseAWindowCoupling() {
        double[] f = {0, 1, 0, 1, 0, 0, 0, 0, 0};
        WindowCoupling w = new WindowCoupling(new double[] {0, 0.5, 0.5}, new int[] {-1, 2, 1});
        assertThatThrownBy(() -> new ConjugateGradientRadiositySolver(1e-12, 100)
                .prepare(f, 3, new double[] {0, 0.2, 0.2}, new double[] {1, 1, 1}, w))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("direct solver");
    }

    @Test
    void theDirectSolverSolvesTheCoupledSystemToRoundOff() {
        // plate 0 (black) | window faces 1 (sees 0) and 2 (sees the outside: nothing): J1 = ρ J0 + τ·0 + b1,
        // J2 = τ J0 + b2, J0 = b0 — solved by hand from the rows of (I − ρF − TF) J = b
        double[] f = {0, 1, 0, 1, 0, 0, 0, 0, 0};
        WindowCoupling w = new WindowCoupling(new double[] {0, 0.6, 0.6}, new int[] {-1, 2, 1});
        double[] rho = {0, 0.1, 0.1};
        double[] b = {1000, 50, 50};
        double[] j = new double[3];
        new DirectRadiositySolver().prepare(f, 3, rho, new double[] {1, 1, 1}, w).solve(b, j);
        assertThat(j[0]).isCloseTo(1000, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(j[1]).isCloseTo(0.1 * 1000 + 50, org.assertj.core.api.Assertions.within(1e-9));
        assertThat(j[2]).isCloseTo(0.6 * 1000 + 50, org.assertj.core.api.Assertions.within(1e-9));
    }
}
