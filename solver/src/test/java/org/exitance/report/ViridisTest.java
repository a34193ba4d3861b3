package org.exitance.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The colour map of the plots and of the HTML report. */
class ViridisTest {
    /** CIE 1976 L* of an sRGB colour (IEC 61966-2-1 transfer function; CIE 15:2004 for L*). */
    private static double lightness(Color c) {
        double y = 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
        return y > 216.0 / 24389 ? 116 * Math.cbrt(y) - 16 : y * 24389.0 / 27;
    }

    private static double linear(int v) {
        double s = v / 255.0;
        return s <= 0.04045 ? s / 12.92 : Math.pow((s + 0.055) / 1.055, 2.4);
    }

    @Test
    void endsAndMiddleAreViridisOwn() {
        // matplotlib's viridis at 0, 0.5 and 1 (van der Walt & Smith 2015; from memory): #440154, #21918c, #fde725
        assertThat(Viridis.at(0)).isEqualTo(new Color(0x440154));
        assertThat(Viridis.at(0.5)).isEqualTo(new Color(0x21918c));
        assertThat(Viridis.at(1)).isEqualTo(new Color(0xfde725));
    }

    @Test
    void lightnessRisesSteadilySoTheMapReadsInGrey() {
        // the design aim of viridis: lightness monotonic from end to end (van der Walt & Smith 2015)
        double previous = -1;
        for (int i = 0; i <= 200; i++) {
            double l = lightness(Viridis.at(i / 200.0));
            assertThat(l).as("L* at " + i / 200.0).isGreaterThan(previous);
            previous = l;
        }
        assertThat(lightness(Viridis.at(1)) - lightness(Viridis.at(0))).as("lightness span").isGreaterThan(60);
    }

    @Test
    void theReportScriptCarriesTheSameStops() throws Exception {
        String js;
        try (var in = ViridisTest.class.getResourceAsStream("/org/exitance/report/html/report.js")) {
            js = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        Matcher m = Pattern.compile("var VIRIDIS = \\[([^\\]]*)\\]").matcher(js);
        assertThat(m.find()).isTrue();
        List<Color> stops = new ArrayList<>();
        for (String h : m.group(1).replaceAll("[\\s']", "").split(",")) {
            stops.add(new Color(Integer.parseInt(h.substring(1), 16)));
        }
        assertThat(stops).hasSize(11);
        for (int i = 0; i < stops.size(); i++) {
            assertThat(Viridis.at(i / 10.0)).as("stop " + i).isEqualTo(stops.get(i));
        }
    }
}
