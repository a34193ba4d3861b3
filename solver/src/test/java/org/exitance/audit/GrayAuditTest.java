package org.exitance.audit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.PhysicalConstants;
import org.exitance.spectral.Planck;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.support.Cases;
import org.exitance.support.RandomEnclosures;
import org.junit.jupiter.api.Test;

class GrayAuditTest {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;

    @Property(tries = 25)
    void anAllGrayEnclosureHasNoGrayError(@ForAll long seed, @ForAll @IntRange(min = 2, max = 6) int n) {
        AuditResult a = audit(new Random(seed), n, false);
        double scale = a.band().energyScaleW();
        for (AuditRow row : a.rows()) {
            // a gray surface has α = ε for every spectrum (Kirchhoff; common practice)
            assertThat(row.grayErrorW()).isCloseTo(0, within(1e-9 * scale));
            assertThat(row.grayErrorK()).isCloseTo(0, within(1e-9 * row.bandTemperatureK()));
            assertThat(row.flagged()).isFalse();
        }
    }

    @Test
    void oneSelectiveSurfaceGivesAGrayError() {
        // the test above can fail: with surface 0's ε stepping from 0.9 to 0.1 at 3 µm, α ≠ ε for
        // radiation from the others at other temperatures
        for (long seed = 1; seed <= 3; seed++) {
            AuditResult a = audit(new Random(seed), 4, true);
            double worst = 0;
            for (AuditRow row : a.rows()) {
                worst = Math.max(worst, Math.abs(row.grayErrorW()));
            }
            assertThat(worst).as("seed %d", seed).isGreaterThan(1e-6 * a.band().energyScaleW());
        }
    }

    /** Audit of a random enclosure of gray surfaces (surface 0 selective when asked). */
    private static AuditResult audit(Random r, int n, boolean selectiveFirst) {
        Enclosure random = RandomEnclosures.random(r, n, r.nextBoolean(), 0.4);
        List<EnclosureSurface> gray = new ArrayList<>();
        for (EnclosureSurface s : random.surfaces()) {
            double eps = 0.05 + 0.9 * r.nextDouble();
            Material m = selectiveFirst && gray.isEmpty()
                    ? new Material("sel", new TabulatedEmissivity(new double[] {3, Math.nextUp(3.0)},
                            new double[] {0.9, 0.1}), "")
                    : new Material("g" + s.name(), new GrayEmissivity(eps), "");
            gray.add(new EnclosureSurface(s.name(), m, s.areaM2(), s.boundary(), Double.NaN));
        }
        Enclosure e = new Enclosure(gray, random.viewFactors(), random.environment());
        return GrayAudit.run(Cases.of(e, null), new BandSet(new double[] {1, 3, 8}, "t"), 5, "t");
    }

    @Test
    void aSelectiveSurfaceBeforeAHotSourceHasTheGrayErrorOfThePerBandClosedForms() {
        // Infinite parallel plates, two bands split at 3 µm. Band solution: sum over bands of
        // q_k = (F_k(T1) σT1⁴ − F_k(T2) σT2⁴)/(1/ε1k + 1/ε2k − 1); gray shortcut: one band with each
        // plate's total emissivity at its own temperature, ε_i = Σ_k ε_ik F_k(T_i)
        // (Incropera et al., 6th ed., Table 13.3 for the two-plate form; band fractions from the
        // blackbody radiation function).
        double edge = 3;
        double t1 = 1500;
        double t2 = 350;
        double[] e1 = {0.9, 0.9};
        double[] e2 = {0.15, 0.9}; // a selective absorber: poor below 3 µm, good above
        Material hot = new Material("hot", new TabulatedEmissivity(new double[] {edge, Math.nextUp(edge)}, e1), "");
        Material cold = new Material("cold", new TabulatedEmissivity(new double[] {edge, Math.nextUp(edge)}, e2), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("hot", hot, 1, new BoundaryCondition.FixedTemperature(t1), Double.NaN),
                new EnclosureSurface("cold", cold, 1, new BoundaryCondition.FixedTemperature(t2), Double.NaN));
        Enclosure e = new Enclosure(s, new double[][] {{0, 1}, {1, 0}}, null);
        AuditResult a = GrayAudit.run(Cases.of(e, null), new BandSet(new double[] {edge}, "t"), 5, "t");

        double[] f1 = {Planck.fractionBelow(edge * t1), 1 - Planck.fractionBelow(edge * t1)};
        double[] f2 = {Planck.fractionBelow(edge * t2), 1 - Planck.fractionBelow(edge * t2)};
        double band = 0;
        for (int k = 0; k < 2; k++) {
            band += (f1[k] * SIGMA * Math.pow(t1, 4) - f2[k] * SIGMA * Math.pow(t2, 4)) / (1 / e1[k] + 1 / e2[k] - 1);
        }
        double eps1 = e1[0] * f1[0] + e1[1] * f1[1];
        double eps2 = e2[0] * f2[0] + e2[1] * f2[1];
        double gray = SIGMA * (Math.pow(t1, 4) - Math.pow(t2, 4)) / (1 / eps1 + 1 / eps2 - 1);

        AuditRow coldRow = a.rows().get(1);
        assertThat(coldRow.bandNetHeatW()).isCloseTo(-band, within(1e-9 * band));
        assertThat(coldRow.grayNetHeatW()).isCloseTo(-gray, within(1e-9 * band));
        assertThat(coldRow.grayErrorW()).isCloseTo(band - gray, within(1e-9 * band));
        assertThat(coldRow.flagged()).isTrue();
        // the cold absorber receives mostly short waves it absorbs poorly, yet the gray shortcut
        // uses its long-wave emissivity: α_eff < ε(T2), and the difference sits below 3 µm
        assertThat(coldRow.cause().effectiveAbsorptivity()).isLessThan(coldRow.cause().emissivityAtOwnTemperature());
        assertThat(coldRow.cause().upperUm()).isEqualTo(edge);
    }
}
