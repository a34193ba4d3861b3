package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.exitance.model.Material;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.junit.jupiter.api.Test;

/** The curves drawn on a spectrum plot. */
class SpectralCurvesTest {
    private static final Material STEP = new Material("step",
            new TabulatedEmissivity(new double[] {2, Math.nextUp(2.0)}, new double[] {0.9, 0.1}), "");

    @Test
    void normalizedPlanckCurvePeaksAtOneWhereIndependentPlanckPeaks() {
        double t = 1000;
        // Commons Math BrentOptimizer on the independently written Planck's law finds the peak wavelength
        UnivariatePointValuePair peak = new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(500),
                new UnivariateObjectiveFunction(l -> Independent.planck(l, t)), GoalType.MAXIMIZE,
                new SearchInterval(1, 10));
        double[] at = SpectralCurves.normalizedPlanck(t, new double[] {peak.getPoint(), 1.0, 10.0});
        assertThat(at[0]).isCloseTo(1.0, within(1e-9));
        assertThat(at[1]).isCloseTo(Independent.planck(1.0, t) / peak.getValue(), within(1e-9));
        assertThat(at[2]).isCloseTo(Independent.planck(10.0, t) / peak.getValue(), within(1e-9));
    }

    @Test
    void axisSpansWholeDecadesAroundTheTemperaturesAndTheStepIsDrawnSharply() {
        SpectralCurves c = SpectralCurves.of(STEP, new double[] {300, 1500}, List.of(new BlackbodySource(5772)));
        // 800 µm·K / 5772 K = 0.139 µm → 0.1 µm; 30,000 µm·K / 300 K = 100 µm → 100 µm
        assertThat(c.fromUm()).isCloseTo(0.1, within(1e-15));
        assertThat(c.toUm()).isCloseTo(100, within(1e-12));
        assertThat(c.emissivity()).hasSize(1);
        assertThat(c.planck()).hasSize(2);
        assertThat(c.sources()).hasSize(1);
        double[] x = c.emissivity().get(0).wavelengthUm();
        double[] y = c.emissivity().get(0).value();
        assertThat(x).contains(2.0, Math.nextUp(2.0));
        for (int i = 0; i < x.length; i++) {
            assertThat(y[i]).isEqualTo(x[i] <= 2.0 ? 0.9 : 0.1);
        }
    }

    @Test
    void manyTemperaturesAreThinnedEvenlyKeepingTheEnds() {
        double[] t = new TemperatureRange(300, 1500, 100).temperaturesK();
        assertThat(SpectralCurves.pickForPlot(t, 5)).containsExactly(300.0, 600.0, 900.0, 1200.0, 1500.0);
        assertThat(SpectralCurves.pickForPlot(new double[] {300, 400}, 5)).containsExactly(300.0, 400.0);
    }
}
