package org.exitance.report.html;

import java.awt.RenderingHints;
import java.util.List;
import java.util.function.Consumer;
import org.exitance.audit.AuditResult;
import org.exitance.properties.SpectralCurves;
import org.exitance.report.AuditPlot;
import org.exitance.report.SpectrumPlot;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/**
 * The project's JFreeChart plots drawn as SVG (JFreeSVG's SVGGraphics2D), for inlining in the
 * page: vector pictures that print sharply and hold their text as text.
 */
final class Svg {
    private Svg() {
    }

    /** ε(λ), ρ(λ), τ(λ) of a material with normalised Planck curves ({@link SpectrumPlot#chart}). */
    static String spectrum(String title, String subtitle, SpectralCurves curves) {
        JFreeChart chart = SpectrumPlot.chart(title, subtitle, curves);
        return draw(SpectrumPlot.WIDTH_PX, SpectrumPlot.HEIGHT_PX, g -> chart.draw(g,
                new java.awt.geom.Rectangle2D.Double(0, 0, SpectrumPlot.WIDTH_PX, SpectrumPlot.HEIGHT_PX)));
    }

    /** The audit's bar charts ({@link AuditPlot#charts}). */
    static String audit(String title, AuditResult a) {
        List<JFreeChart> charts = AuditPlot.charts(title, a);
        return draw(AuditPlot.widthPx(), AuditPlot.heightPx(charts), g -> AuditPlot.draw(charts, g));
    }

    private static String draw(int w, int h, Consumer<SVGGraphics2D> body) {
        SVGGraphics2D g = new SVGGraphics2D(w, h);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        body.accept(g);
        String svg = g.getSVGElement();
        // scale with the page: a viewBox, and the fixed size left to CSS
        return svg.replaceFirst("<svg ", "<svg role=\"img\" viewBox=\"0 0 " + w + " " + h + "\" ");
    }
}
