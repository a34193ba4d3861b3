package org.exitance.sensitivity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.spectral.GrayEmissivity;
import org.junit.jupiter.api.Test;

/**
 * Emissivity sensitivities of an adiabatic two-sided plate (front ε_f, back ε_b) between a hot
 * black wall seen by the front and a cold black wall seen by the back (infinite parallel planes).
 * The plate balances ε_f(T⁴ − T_h⁴) + ε_b(T⁴ − T_c⁴) = 0 (Incropera et al., 6th ed., Table 13.3 with
 * ε₂ = 1), so T⁴ = (ε_f T_h⁴ + ε_b T_c⁴)/(ε_f + ε_b), and differentiating by hand:
 * ∂T/∂ε_f = ε_b (T_h⁴ − T_c⁴) / [4T³ (ε_f + ε_b)²], ∂T/∂ε_b = −ε_f (T_h⁴ − T_c⁴) / [4T³ (ε_f + ε_b)²];
 * the hot wall's heat Q_h = σA ε_f ε_b (T_h⁴ − T_c⁴)/(ε_f + ε_b) gives ∂Q_h/∂ε_f = σA ε_b² (T_h⁴ − T_c⁴)/(ε_f + ε_b)².
 */
class TwoSidedSensitivityTest {
    private static final double SIGMA = 5.670374419e-8; // CODATA 2018

    @Test
    void eachFacesEmissivityMovesThePlateAsTheClosedFormDerivativeSays() {
        double ef = 0.7;
        double eb = 0.2;
        double th = 1100;
        double tc = 350;
        double area = 1.5;
        Material black = new Material("black", new GrayEmissivity(1), "");
        Material front = new Material("front_coat", new GrayEmissivity(ef), "");
        Material back = new Material("back_coat", new GrayEmissivity(eb), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", black, area, new BoundaryCondition.FixedTemperature(th), Double.NaN),
                new EnclosureSurface("front", front, area, new BoundaryCondition.OnOtherFace(), Double.NaN, null, "back"),
                new EnclosureSurface("back", back, area, new BoundaryCondition.Adiabatic(), Double.NaN, null, "front"),
                new EnclosureSurface("cold", black, area, new BoundaryCondition.FixedTemperature(tc), Double.NaN));
        double[][] f = {{0, 1, 0, 0}, {1, 0, 0, 0}, {0, 0, 0, 1}, {0, 0, 1, 0}};
        RadiationCase c = new RadiationCase("sensitivity", "", List.of(black, front, back), new Enclosure(s, f, null),
                null, SolverSettings.DEFAULT);
        EmissivitySensitivities d = TangentLinear.compute(c, BandSet.gray("gray"));
        double diff = Math.pow(th, 4) - Math.pow(tc, 4);
        double t = Math.pow((ef * Math.pow(th, 4) + eb * Math.pow(tc, 4)) / (ef + eb), 0.25);
        double sum2 = (ef + eb) * (ef + eb);
        double dTdEf = eb * diff / (4 * t * t * t * sum2);
        double dTdEb = -ef * diff / (4 * t * t * t * sum2);
        assertThat(d.solved().surface("front").temperatureK()).isCloseTo(t, within(1e-9 * t));
        for (int face : new int[] {1, 2}) { // both faces carry the node's temperature
            assertThat(d.temperature()[face][1][0]).isCloseTo(dTdEf, within(1e-6 * Math.abs(dTdEf)));
            assertThat(d.temperature()[face][2][0]).isCloseTo(dTdEb, within(1e-6 * Math.abs(dTdEb)));
        }
        double dQhdEf = SIGMA * area * eb * eb * diff / sum2;
        assertThat(d.netHeat()[0][1][0]).isCloseTo(dQhdEf, within(1e-6 * dQhdEf));
        // the walls are fixed: their temperatures do not move
        assertThat(d.temperature()[0][1][0]).isZero();
    }
}
