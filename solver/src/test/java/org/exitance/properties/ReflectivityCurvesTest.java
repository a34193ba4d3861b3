package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.exitance.cases.MaterialFileReader;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The ρ(λ) curves and total ρ of {@code exitance material}. For an opaque diffuse surface
 * α + ρ = 1 and α = ε (Kirchhoff), so ρ_λ = 1 − ε_λ; for a window α + ρ + τ = 1 (Incropera,
 * DeWitt, Bergman &amp; Lavine, 6th ed., Sec. 12.5 and 12.7, from memory). A window's given ρ is
 * checked against the table written in the test.
 */
class ReflectivityCurvesTest {
    @TempDir
    Path dir;

    @Test
    void anOpaqueStepMaterialsReflectivityIsOneMinusItsEmissivityAtEveryPoint() {
        Material step = new Material("step",
                new TabulatedEmissivity(new double[] {2, Math.nextUp(2.0)}, new double[] {0.9, 0.1}), "");
        SpectralCurves c = SpectralCurves.of(step, new double[] {300, 1500}, List.of(new BlackbodySource(5772)));
        assertThat(c.reflectivity()).hasSize(1);
        double[] x = c.reflectivity().get(0).wavelengthUm();
        double[] y = c.reflectivity().get(0).value();
        assertThat(x).contains(2.0, Math.nextUp(2.0));
        for (int i = 0; i < x.length; i++) {
            assertThat(y[i]).as("at %s µm", x[i]).isCloseTo(x[i] <= 2.0 ? 0.1 : 0.9, within(1e-15));
        }
        assertThat(c.transmissivity()).isEmpty();
    }

    @Test
    void anOpaqueSurveyReportsTotalReflectivityOneMinusEmissivity() {
        Material gray = new Material("g", new GrayEmissivity(0.3), "");
        SurveyRow r = MaterialSurvey.of(gray, new double[] {400}, List.of(new BlackbodySource(5772))).rows().get(0);
        assertThat(r.window()).isFalse();
        assertThat(r.totalReflectivity()).isCloseTo(0.7, within(1e-15)); // α + ρ = 1 with α = ε = 0.3
    }

    @Test
    void aWindowsGivenReflectivityIsDrawnPerTemperatureWhereItsTransmissivityDependsOnTemperature() throws Exception {
        Path f = dir.resolve("glass.json");
        Files.writeString(f, """
                {"materials": {"glass": {
                  "spectralReflectivity": {"wavelength_um": [0.5, 3, 6], "reflectivity": [0.08, 0.1, 0.2]},
                  "spectralTransmissivity": {"byTemperature": [
                    {"temperature_K": 300, "wavelength_um": [0.5, 3, 6], "transmissivity": [0.9, 0.6, 0]},
                    {"temperature_K": 900, "wavelength_um": [0.5, 3, 6], "transmissivity": [0.8, 0.4, 0]}]}}}}
                """);
        Material glass = MaterialFileReader.read(f).materials().get(0);
        SpectralCurves c = SpectralCurves.of(glass, new double[] {300, 600, 900}, List.of());
        assertThat(c.reflectivity()).hasSize(3);
        assertThat(c.transmissivity()).hasSize(3);
        double[] nodes = {0.5, 3, 6};
        double[] rho = {0.08, 0.1, 0.2}; // the given table: ρ does not depend on T
        for (SpectralCurves.Curve curve : c.reflectivity()) {
            double[] x = curve.wavelengthUm();
            double[] y = curve.value();
            for (int i = 0; i < x.length; i++) {
                double expected = x[i] <= nodes[0] ? rho[0] : x[i] >= nodes[2] ? rho[2]
                        : x[i] <= nodes[1] ? rho[0] + (rho[1] - rho[0]) * (x[i] - nodes[0]) / (nodes[1] - nodes[0])
                        : rho[1] + (rho[2] - rho[1]) * (x[i] - nodes[1]) / (nodes[2] - nodes[1]);
                assertThat(y[i]).as("%s at %s µm", curve.label(), x[i]).isCloseTo(expected, within(1e-12));
            }
        }
        assertThat(c.reflectivity().get(1).label()).contains("600 K");
    }
}
