package org.exitance.report;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.exitance.audit.AuditResult;
import org.exitance.audit.AuditRow;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.CategoryLabelPositions;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * The audit as bar charts (PNG, JFreeChart) comparing the models per surface: net heat (W) for
 * surfaces at a fixed temperature, temperature (K) for surfaces whose temperature is solved. The
 * two quantities get a chart each, drawn one above the other in one image.
 */
public final class AuditPlot {
    private static final int WIDTH_PX = 1000;
    private static final int CHART_HEIGHT_PX = 420;

    private AuditPlot() {
    }

    /** Writes one PNG; {@code out} is not closed. */
    public static void writePng(String title, AuditResult a, OutputStream out) throws IOException {
        List<JFreeChart> charts = charts(title, a);
        BufferedImage img = new BufferedImage(WIDTH_PX, CHART_HEIGHT_PX * charts.size(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        draw(charts, g);
        g.dispose();
        ImageIO.write(img, "png", out);
    }

    /** Width of the drawing in pixels. */
    public static int widthPx() {
        return WIDTH_PX;
    }

    /** Height of the drawing of these charts in pixels. */
    public static int heightPx(List<JFreeChart> charts) {
        return CHART_HEIGHT_PX * charts.size();
    }

    /** Draws the charts one above the other, each {@link #widthPx()} wide, from the top left of {@code g}. */
    public static void draw(List<JFreeChart> charts, Graphics2D g) {
        for (int i = 0; i < charts.size(); i++) {
            charts.get(i).draw(g, new Rectangle2D.Double(0, i * CHART_HEIGHT_PX, WIDTH_PX, CHART_HEIGHT_PX));
        }
    }

    /**
     * The audit's charts: net heat of the fixed-temperature surfaces, temperatures of the solved
     * ones (each only when there are such surfaces), the caution under the last.
     */
    public static List<JFreeChart> charts(String title, AuditResult a) {
        DefaultCategoryDataset heat = new DefaultCategoryDataset();
        DefaultCategoryDataset temp = new DefaultCategoryDataset();
        for (AuditRow r : a.rows()) {
            String label = r.surface() + (r.flagged() ? " (flagged)" : "");
            DefaultCategoryDataset d = r.temperatureSolved() ? temp : heat;
            add(d, r.temperatureSolved() ? r.bandTemperatureK() : r.bandNetHeatW(), "band-wise", label);
            add(d, r.temperatureSolved() ? r.grayTemperatureK() : r.grayNetHeatW(), "gray shortcut", label);
            if (a.twoBand() != null) {
                add(d, r.temperatureSolved() ? r.twoBandTemperatureK() : r.twoBandNetHeatW(), "solar + infrared", label);
            }
        }
        String heading = "Gray-body audit" + (title.isEmpty() ? "" : ": " + title)
                + (a.name().equals("as given") ? "" : " — " + a.name());
        List<JFreeChart> charts = new ArrayList<>();
        if (heat.getColumnCount() > 0) {
            charts.add(chart(heading, "Surfaces at a fixed temperature", heat, "Net heat, W (positive: loses heat)"));
        }
        if (temp.getColumnCount() > 0) {
            charts.add(chart(charts.isEmpty() ? heading : null, "Surfaces whose temperature is solved", temp,
                    "Temperature, K"));
        }
        JFreeChart last = charts.get(charts.size() - 1);
        TextTitle note = new TextTitle(Caution.SHORT, new Font(Font.SANS_SERIF, Font.PLAIN, 10));
        note.setPosition(RectangleEdge.BOTTOM);
        note.setHorizontalAlignment(HorizontalAlignment.LEFT);
        last.addSubtitle(note);
        return charts;
    }

    private static void add(DefaultCategoryDataset d, double v, String series, String label) {
        if (Double.isFinite(v)) {
            d.addValue(v, series, label);
        }
    }

    private static JFreeChart chart(String heading, String subtitle, DefaultCategoryDataset d, String rangeLabel) {
        CategoryAxis x = new CategoryAxis(null);
        x.setCategoryLabelPositions(CategoryLabelPositions.UP_45);
        NumberAxis y = new NumberAxis(rangeLabel);
        y.setAutoRangeIncludesZero(!rangeLabel.startsWith("Temperature"));
        BarRenderer r = new BarRenderer();
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        // three steps of viridis, dark to light: apart in grey print and for colour-blind readers
        r.setSeriesPaint(0, Viridis.at(0.08));
        r.setSeriesPaint(1, Viridis.at(0.5));
        r.setSeriesPaint(2, Viridis.at(0.88));
        CategoryPlot p = new CategoryPlot(d, x, y, r);
        p.setBackgroundPaint(Color.WHITE);
        p.setRangeGridlinePaint(Color.LIGHT_GRAY);
        JFreeChart c = new JFreeChart(heading, new Font(Font.SANS_SERIF, Font.BOLD, 15), p, true);
        c.addSubtitle(new TextTitle(subtitle, new Font(Font.SANS_SERIF, Font.PLAIN, 12)));
        c.setBackgroundPaint(Color.WHITE);
        return c;
    }
}
