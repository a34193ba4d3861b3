package org.exitance.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.support.Cases;
import org.junit.jupiter.api.Test;

/**
 * The audit's cause for a gray surface: it absorbs every spectrum with α = ε (Kirchhoff, for a
 * diffuse gray surface; Siegel &amp; Howell, 5th ed., §3.4), so a gray error on it can only come
 * from the other surfaces, and the audit says exactly that instead of "0 % of the difference".
 */
class GrayCauseTest {
    /** A hot gray emitter, a strongly selective plate at a fixed temperature, and an adiabatic gray wall. */
    private static AuditResult audit() {
        Material emitter = new Material("emitter", new GrayEmissivity(0.9), "");
        Material wall = new Material("wall", new GrayEmissivity(0.5), "");
        Material selective = new Material("selective",
                new TabulatedEmissivity(new double[] {2, Math.nextUp(2.0)}, new double[] {0.95, 0.05}), "");
        List<EnclosureSurface> s = List.of(
                new EnclosureSurface("emitter", emitter, 1, new BoundaryCondition.FixedTemperature(1500), Double.NaN),
                new EnclosureSurface("plate", selective, 1, new BoundaryCondition.FixedTemperature(400), Double.NaN),
                new EnclosureSurface("wall", wall, 1, new BoundaryCondition.Adiabatic(), Double.NaN));
        double[][] f = {{0, 0.5, 0.5}, {0.5, 0, 0.5}, {0.5, 0.5, 0}};
        return GrayAudit.run(Cases.of(new Enclosure(s, f, null), null), new BandSet(new double[] {2}, "t"), 1, "t");
    }

    @Test
    void aGraySurfaceFlaggedOnlyBecauseOthersAreNotGrayIsSaidToBeSo() {
        AuditResult a = audit();
        AuditRow wall = a.rows().stream().filter(r -> r.surface().equals("wall")).findFirst().orElseThrow();
        assertThat(wall.flagged()).as("the wall's gray error %s %%", wall.grayErrorPct()).isTrue();
        assertThat(wall.cause().kind()).isEqualTo(GrayCause.Kind.OTHER_SURFACES);
        assertThat(wall.cause().nonGraySurfaces()).containsExactly("plate");
        String line = org.exitance.report.AuditTableWriterAccess.causeLine(wall);
        assertThat(line).contains("is gray", "plate").doesNotContain("% of that difference");
    }

    /** Control: the selective plate itself has a cause of its own, in its own spectrum. */
    @Test
    void theSelectiveSurfaceHasItsOwnSpectrumAsCause() {
        AuditRow plate = audit().rows().stream().filter(r -> r.surface().equals("plate")).findFirst().orElseThrow();
        assertThat(plate.cause().kind()).isEqualTo(GrayCause.Kind.OWN_SPECTRUM);
        assertThat(plate.cause().shareOfDifference()).isPositive();
    }
}
