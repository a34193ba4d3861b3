package org.exitance.spectral;

/**
 * Physical constants, CODATA 2018 (P. J. Mohr et al., Rev. Mod. Phys. 93, 025010 (2021)).
 *
 * <p>{@code h}, {@code c} and {@code k} are exact in the 2019 SI. The radiation constants
 * {@link #C1_W_UM4_PER_M2} and {@link #C2_UM_K} are derived here from them (so they carry no
 * rounding beyond one ulp). {@link #STEFAN_BOLTZMANN_W_M2_K4} and {@link #WIEN_UM_K} are the
 * published CODATA values (10 significant digits); the value of σ derived from h, c, k,
 * {@code 2π⁵k⁴/(15h³c²) = 5.670374419184…e-8}, differs from it by 3e-11 relative, which is far
 * below every tolerance in this code base (see {@code PhysicalConstantsTest}).
 */
public final class PhysicalConstants {

    /** Planck constant h, J·s (exact). */
    public static final double PLANCK_J_S = 6.62607015e-34;
    /** Speed of light in vacuum c, m/s (exact). */
    public static final double SPEED_OF_LIGHT_M_S = 299792458;
    /** Boltzmann constant k, J/K (exact). */
    public static final double BOLTZMANN_J_PER_K = 1.380649e-23;
    /** Stefan–Boltzmann constant σ, W/(m²·K⁴) (CODATA 2018 published value). */
    public static final double STEFAN_BOLTZMANN_W_M2_K4 = 5.670374419e-8;

    /**
     * First radiation constant for spectral emissive power, C1 = 2πhc², expressed in W·µm⁴/m²
     * (≈ 3.741771852e8); E_bλ = C1 / (λ⁵ (exp(C2/(λT)) − 1)) with λ in µm gives W/(m²·µm).
     */
    public static final double C1_W_UM4_PER_M2 =
            2.0 * Math.PI * PLANCK_J_S * SPEED_OF_LIGHT_M_S * SPEED_OF_LIGHT_M_S * 1e24;

    /** Second radiation constant C2 = hc/k in µm·K (≈ 14387.76877). */
    public static final double C2_UM_K = PLANCK_J_S * SPEED_OF_LIGHT_M_S / BOLTZMANN_J_PER_K * 1e6;

    /**
     * Wien displacement constant b = λ_max·T in µm·K (CODATA 2018: 2.897771955e-3 m·K),
     * equal to C2/x* where x* = 4.965114231744276… solves x = 5(1 − e^{−x}).
     */
    public static final double WIEN_UM_K = 2897.771955;

    private PhysicalConstants() {
    }
}
