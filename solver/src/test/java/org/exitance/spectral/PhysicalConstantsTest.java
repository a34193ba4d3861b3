package org.exitance.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

class PhysicalConstantsTest {

    @Test
    void radiationConstantsMatchCodata2018() {
        // CODATA 2018 (Rev. Mod. Phys. 93, 025010): c1 = 3.741771852e-16 W·m², c2 = 1.438776877e-2 m·K.
        assertThat(PhysicalConstants.C1_W_UM4_PER_M2).isCloseTo(3.741771852e8, within(1e-9 * 3.741771852e8));
        assertThat(PhysicalConstants.C2_UM_K).isCloseTo(14387.76877, within(1e-9 * 14387.76877));
    }

    @Test
    void stefanBoltzmannLiteralAgreesWithValueDerivedFromExactConstants() {
        // σ = 2π⁵k⁴/(15h³c²) (Siegel & Howell 7th ed. Ch. 1); CODATA 2018 quotes 5.670374419e-8.
        double h = PhysicalConstants.PLANCK_J_S;
        double c = PhysicalConstants.SPEED_OF_LIGHT_M_S;
        double k = PhysicalConstants.BOLTZMANN_J_PER_K;
        double derived = 2 * Math.pow(Math.PI, 5) * Math.pow(k, 4) / (15 * h * h * h * c * c);
        assertThat(PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4).isCloseTo(derived, within(1e-10 * derived));
        // Equivalently σ = C1 π⁴ / (15 C2⁴) in the µm units used here.
        double fromC = PhysicalConstants.C1_W_UM4_PER_M2 * Math.pow(Math.PI, 4)
                / (15 * Math.pow(PhysicalConstants.C2_UM_K, 4));
        assertThat(fromC).isCloseTo(derived, within(1e-14 * derived));
    }

    @Test
    void wienConstantIsC2OverRootOfFiveOneMinusExp() {
        // dE_bλ/dλ = 0  ⇔  x = 5(1 − e^{−x}), x = C2/(λT) (Wien's displacement law, Modest 3rd ed. Ch. 1); root x* = 4.965114231744276.
        double x = new BrentSolver(1e-15, 1e-15).solve(100, v -> v - 5 * (1 - Math.exp(-v)), 3, 7);
        assertThat(x).isCloseTo(4.965114231744276, within(1e-13));
        assertThat(PhysicalConstants.C2_UM_K / x).isCloseTo(PhysicalConstants.WIEN_UM_K, withinPercentage(1e-7));
    }
}
