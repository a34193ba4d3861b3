package org.exitance.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Stroke;
import java.io.IOException;
import java.io.OutputStream;
import java.text.DecimalFormat;
import org.exitance.properties.SpectralCurves;
import org.exitance.properties.SpectralCurves.Curve;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Draws ε(λ), ρ(λ) and (for a window) τ(λ) of a material with normalized Planck curves E_bλ/E_bλ,max of the chosen
 * temperatures and of the sources, on a logarithmic wavelength axis, as a PNG image
 * (JFreeChart 1.5.6); the HTML report draws the same chart as SVG ({@link #chart}, JFreeSVG). Draws the
 * given curves; computes no physics.
 */
public final class SpectrumPlot {
    /** Image size in pixels. */
    public static final int WIDTH_PX = 1000;
    public static final int HEIGHT_PX = 640;

    /** Temperatures run along viridis from dark (coldest) to this point (hottest), short of its pale yellow end. */
    private static final double HOTTEST_ON_MAP = 0.82;
    /** Blackbody sources take these in turn; a tabulated spectrum is drawn in {@link #SPECTRUM}. */
    private static final Color[] SOURCES = {new Color(215, 145, 0), new Color(30, 150, 70), new Color(150, 60, 170)};
    private static final Color SPECTRUM = new Color(95, 95, 95);
    private static final Color EMISSIVITY = new Color(20, 20, 20);
    /** Transmissivity: a blue that stays distinct in grey print by its long-dash pattern. */
    private static final Color TRANSMISSIVITY = new Color(0, 90, 170);
    /** Reflectivity: a brown told apart in grey print by its round dots. */
    private static final Color REFLECTIVITY = new Color(140, 70, 0);

    static {
        System.setProperty("java.awt.headless", "true");
    }

    private SpectrumPlot() {
    }

    /**
     * Writes the chart as PNG.
     *
     * @param title    chart title, e.g. the material's name
     * @param subtitle a second line (e.g. the material's description), may be empty
     * @param curves   what to draw
     * @param out      receives the PNG bytes (not closed)
     */
    public static void writePng(String title, String subtitle, SpectralCurves curves, OutputStream out)
            throws IOException {
        ChartUtils.writeChartAsPNG(out, chart(title, subtitle, curves), WIDTH_PX, HEIGHT_PX);
    }

    /** The chart {@link #writePng} draws, for a writer that renders it in another format (the HTML report's SVG). */
    public static JFreeChart chart(String title, String subtitle, SpectralCurves curves) {
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(true); // one path per curve, so dash patterns run along it
        int n = 0;
        int blackbodies = 0;
        boolean single = curves.emissivity().size() == 1;
        double tLo = Double.POSITIVE_INFINITY;
        double tHi = 0;
        for (Curve c : curves.planck()) {
            tLo = Math.min(tLo, c.temperatureK());
            tHi = Math.max(tHi, c.temperatureK());
        }
        for (Curve c : curves.emissivity()) {
            add(data, c, n);
            r.setSeriesPaint(n, single ? EMISSIVITY : ramp(c.temperatureK(), tLo, tHi));
            r.setSeriesStroke(n++, new BasicStroke(2.6f));
        }
        for (Curve c : curves.transmissivity()) {
            add(data, c, n);
            r.setSeriesPaint(n, TRANSMISSIVITY);
            r.setSeriesStroke(n++, dashed(2.4f, 14f, 5f));
        }
        boolean singleRho = curves.reflectivity().size() == 1;
        for (Curve c : curves.reflectivity()) {
            add(data, c, n);
            r.setSeriesPaint(n, singleRho ? REFLECTIVITY : ramp(c.temperatureK(), tLo, tHi));
            r.setSeriesStroke(n++, dotted(2.8f));
        }
        for (Curve c : curves.planck()) {
            add(data, c, n);
            r.setSeriesPaint(n, ramp(c.temperatureK(), tLo, tHi));
            r.setSeriesStroke(n++, dashed(1.4f, 7f, 4f));
        }
        for (Curve c : curves.sources()) {
            add(data, c, n);
            boolean bb = !Double.isNaN(c.temperatureK());
            r.setSeriesPaint(n, bb ? SOURCES[blackbodies++ % SOURCES.length] : SPECTRUM);
            r.setSeriesStroke(n++, bb ? dashed(2.0f, 12f, 4f, 2f, 4f) : new BasicStroke(1.2f));
        }

        LogAxis x = new LogAxis("Wavelength λ (µm, log scale)");
        x.setBase(10);
        x.setTickUnit(new NumberTickUnit(1));
        x.setMinorTickCount(9);
        x.setMinorTickMarksVisible(true);
        x.setNumberFormatOverride(new DecimalFormat("0.###"));
        x.setRange(curves.fromUm() * 0.999, curves.toUm() * 1.001); // keeps the end decades' labels
        NumberAxis y = new NumberAxis(curves.transmissivity().isEmpty()
                ? "Spectral ε_λ, reflectivity ρ_λ  and  normalized E_bλ / E_bλ,max  (–)"
                : "Spectral ε_λ, ρ_λ, τ_λ  and  normalized E_bλ / E_bλ,max  (–)");
        y.setRange(0.0, 1.05);
        y.setTickUnit(new NumberTickUnit(0.1));

        XYPlot plot = new XYPlot(data, x, y, r);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(215, 215, 215));
        plot.setRangeGridlinePaint(new Color(215, 215, 215));
        plot.setAxisOffset(RectangleInsets.ZERO_INSETS);

        JFreeChart chart = new JFreeChart(title, new Font("SansSerif", Font.BOLD, 17), plot, false);
        chart.setBackgroundPaint(Color.WHITE);
        LegendTitle legend = new LegendTitle(plot);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setItemFont(new Font("SansSerif", Font.PLAIN, 12));
        legend.setMargin(new RectangleInsets(0, 6, 0, 4));
        chart.addSubtitle(legend);
        if (!subtitle.isEmpty()) {
            chart.addSubtitle(0, text(subtitle, 12, RectangleEdge.TOP, HorizontalAlignment.CENTER));
        }
        // bottom titles stack toward the plot: the caution goes at the very bottom, the key above it
        chart.addSubtitle(text(Caution.SHORT, 10, RectangleEdge.BOTTOM, HorizontalAlignment.LEFT));
        chart.addSubtitle(text("Thick solid: ε_λ. Round dots: "
                + (curves.transmissivity().isEmpty() ? "ρ_λ = 1 − ε_λ (opaque, α = ε)." : "ρ_λ = 1 − ε_λ − τ_λ (α = ε). Long dashes: τ_λ.")
                + " Dashed: Planck curves E_bλ/E_bλ,max of the listed temperatures. Dash-dot: blackbody"
                + " sources; thin solid: a tabulated source; each scaled to its peak. Beyond a table's ends ε holds its"
                + " end values.", 11, RectangleEdge.BOTTOM, HorizontalAlignment.LEFT));
        return chart;
    }

    private static void add(XYSeriesCollection data, Curve c, int index) {
        XYSeries s = new XYSeries(c.label() + (data.getSeriesIndex(c.label()) >= 0 ? " (" + index + ")" : ""),
                false, true);
        double[] xs = c.wavelengthUm();
        double[] ys = c.value();
        for (int i = 0; i < xs.length; i++) {
            s.add(xs[i], ys[i], false);
        }
        data.addSeries(s);
    }

    private static TextTitle text(String s, int size, RectangleEdge edge, HorizontalAlignment align) {
        TextTitle t = new TextTitle(s, new Font("SansSerif", Font.PLAIN, size));
        t.setPosition(edge);
        t.setHorizontalAlignment(align);
        t.setPadding(new RectangleInsets(3, 8, 3, 8));
        return t;
    }

    /**
     * Colour for temperature t between the coldest (dark violet) and hottest (green) plotted, along
     * viridis ({@link Viridis}): told apart by lightness in grey print and by colour-blind readers.
     */
    private static Color ramp(double t, double lo, double hi) {
        double f = hi > lo ? (t - lo) / (hi - lo) : 0.0;
        return Viridis.at(HOTTEST_ON_MAP * f);
    }

    /** Round dots, so the curve reads apart from solid and dashed ones without colour. */
    private static Stroke dotted(float width) {
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {0.1f, 2.4f * width}, 0f);
    }

    private static Stroke dashed(float width, float... dash) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }
}
