package org.exitance.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.io.OutputStream;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/** A PNG of temperature against time for the shown nodes of a transient run (JFreeChart). */
public final class TemperatureHistoryPlot {
    public static final int WIDTH_PX = 1000;
    public static final int HEIGHT_PX = 600;
    /** Distinct line colours, cycled. */
    private static final Color[] LINES = {new Color(200, 45, 30), new Color(40, 90, 190), new Color(30, 150, 70),
        new Color(215, 145, 0), new Color(150, 60, 170), new Color(20, 20, 20), new Color(0, 150, 160)};

    static {
        System.setProperty("java.awt.headless", "true");
    }

    private TemperatureHistoryPlot() {
    }

    /**
     * @param r    the run (its shown nodes are drawn; time in hours when it exceeds two hours)
     * @param out  receives the PNG bytes (not closed)
     */
    public static void writePng(TransientResult r, OutputStream out) throws IOException {
        double end = r.samples().get(r.samples().size() - 1).timeS();
        boolean hours = end > 7200;
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, r.samples().size() < 60);
        int n = 0;
        for (String s : r.shown()) {
            XYSeries series = new XYSeries(s, false, true);
            int i = r.indexOf(s);
            for (Sample x : r.samples()) {
                series.add(hours ? x.timeS() / 3600 : x.timeS(), x.temperatureK()[i]);
            }
            data.addSeries(series);
            renderer.setSeriesPaint(n, LINES[n % LINES.length]);
            renderer.setSeriesStroke(n++, new BasicStroke(2.2f));
        }
        NumberAxis x = new NumberAxis(hours ? "Time (h)" : "Time (s)");
        NumberAxis y = new NumberAxis("Temperature (K)");
        y.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(data, x, y, renderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(215, 215, 215));
        plot.setRangeGridlinePaint(new Color(215, 215, 215));
        JFreeChart chart = new JFreeChart(r.title().isEmpty() ? "Temperature against time" : r.title(),
                new Font("SansSerif", Font.BOLD, 16), plot, false);
        chart.setBackgroundPaint(Color.WHITE);
        LegendTitle legend = new LegendTitle(plot);
        legend.setPosition(RectangleEdge.RIGHT);
        chart.addSubtitle(legend);
        TextTitle caution = new TextTitle(Caution.SHORT, new Font("SansSerif", Font.PLAIN, 10));
        caution.setPosition(RectangleEdge.BOTTOM);
        chart.addSubtitle(caution);
        ChartUtils.writeChartAsPNG(out, chart, WIDTH_PX, HEIGHT_PX);
    }
}
