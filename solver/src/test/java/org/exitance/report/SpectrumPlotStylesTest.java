package org.exitance.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.exitance.model.Material;
import org.exitance.properties.SpectralCurves;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRenderer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/**
 * The plot of {@code exitance material} draws ε, ρ and τ, each kind with its own line pattern so
 * that it reads in grey print (common practice: never tell curves apart by colour alone).
 */
class SpectrumPlotStylesTest {
    @Test
    void emissivityReflectivityAndTransmissivityHaveDistinctLinePatterns() {
        double[] nodes = {0.5, 3, 6};
        Material window = new Material("w", new TabulatedEmissivity(nodes, new double[] {0.05, 0.3, 0.9}),
                new TabulatedEmissivity(nodes, new double[] {0.9, 0.5, 0}), "");
        SpectralCurves curves = SpectralCurves.of(window, new double[] {500}, List.of(new BlackbodySource(5772)));
        JFreeChart chart = SpectrumPlot.chart("w", "", curves);
        XYPlot plot = chart.getXYPlot();
        XYDataset data = plot.getDataset();
        XYItemRenderer r = plot.getRenderer();
        String eps = null;
        String rho = null;
        String tau = null;
        List<String> others = new ArrayList<>();
        for (int i = 0; i < data.getSeriesCount(); i++) {
            String key = data.getSeriesKey(i).toString();
            String pattern = pattern((BasicStroke) r.getSeriesStroke(i));
            if (key.startsWith("ε(λ)")) {
                eps = pattern;
            } else if (key.startsWith("ρ(λ)")) {
                rho = pattern;
            } else if (key.startsWith("τ(λ)")) {
                tau = pattern;
            } else {
                others.add(pattern);
            }
        }
        assertThat(eps).isNotNull();
        assertThat(rho).as("a ρ curve is drawn").isNotNull();
        assertThat(tau).isNotNull();
        Set<String> distinct = new HashSet<>(List.of(eps, rho, tau));
        assertThat(distinct).as("ε, ρ, τ patterns").hasSize(3);
        assertThat(others).doesNotContain(eps, rho, tau);
    }

    /** The dash pattern and width of a stroke, as text ("solid" when it has none). */
    private static String pattern(BasicStroke s) {
        return (s.getDashArray() == null ? "solid" : Arrays.toString(s.getDashArray())) + " cap " + s.getEndCap()
                + " width " + s.getLineWidth();
    }
}
