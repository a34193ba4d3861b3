package org.exitance.report.html;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;
import org.junit.jupiter.api.Test;

/**
 * The transient report's writer on a small run made up here (two surfaces, three instants, one
 * thermostat): the page's data carries the run's samples unchanged, the charts and the model's
 * frames hold them, a non-finite number is refused, and the heater's on intervals follow from
 * its switches. The numbers are arbitrary inputs, not physics.
 */
class TransientReportTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    private static Sample sample(double t, double a, double b, double heater) {
        double[] none = {0, 0};
        return new Sample(t, new double[] {a, b}, new double[] {heater, 0}, new double[] {5.5, -5.5}, none, none,
                none, none, 1e6 + t, 10 * t, 2 * t, new double[2][]);
    }

    private static TransientResult run(List<Sample> samples, List<TransientResult.Switch> switches) {
        return new TransientResult("A made-up run", List.of("plate", "shell"), List.of("plate"), samples,
                List.of(new TransientResult.Extremes("plate", 300, 0, 412.5, 7200)),
                List.of(new TransientResult.TargetTime("plate", 400, Double.NaN)), switches, List.of(), false,
                new TransientResult.Energy(1e6, 1.2e6, 3e5, 1e5), new TransientResult.Steps(12, 1, 0.5, 600, 2),
                0.01, "2 bands (test)");
    }

    private static List<Sample> samples() {
        return List.of(sample(0, 300, 290, 50), sample(3600, 350.25, 295.5, 0), sample(7200, 412.5, 301.75, 50));
    }

    private static ReportCase reportCase(String title, Scene scene) {
        return new ReportCase("case.json", title, "", List.of(), Map.of(), List.of(), Double.NaN, scene, List.of(),
                List.of());
    }

    /** The JSON the page's script reads, cut out of the page. */
    static JsonNode data(String page) throws Exception {
        String open = "<script type=\"application/json\" id=\"report-data\">";
        int from = page.indexOf(open) + open.length();
        return JSON.readTree(page.substring(from, page.indexOf("</script>", from)));
    }

    @Test
    void thePageCarriesTheRunsSamplesUnchanged() throws Exception {
        TransientResult r = run(samples(), List.of());
        JsonNode d = data(HtmlReport.transientRun(reportCase("A made-up run", null), r));
        JsonNode time = d.get("time");
        assertThat(time.get("instants")).hasSize(3);
        assertThat(time.get("first").asInt()).as("the last instant is shown first").isEqualTo(2);
        for (int k = 0; k < 3; k++) {
            Sample x = r.samples().get(k);
            for (int i = 0; i < 2; i++) {
                assertThat(time.get("temperatureK").get(k).get(i).asDouble()).isEqualTo(x.temperatureK()[i]);
                assertThat(time.get("netRadiationW").get(k).get(i).asDouble()).isEqualTo(x.radiationW()[i]);
                assertThat(time.get("heaterW").get(k).get(i).asDouble()).isEqualTo(x.heaterW()[i]);
            }
        }
        assertThat(time.get("rangeK").get(0).asDouble()).isEqualTo(290);
        assertThat(time.get("rangeK").get(1).asDouble()).isEqualTo(412.5);
        JsonNode temperature = d.get("charts").get(0);
        assertThat(temperature.get("kind").asText()).isEqualTo("lines");
        // the run ends at 2 h, so time is in seconds
        assertThat(temperature.get("x").get(2).asDouble()).isEqualTo(7200);
        assertThat(temperature.get("series").get(1).get("name").asText()).isEqualTo("shell");
        assertThat(temperature.get("series").get(1).get("shown").asBoolean()).as("only the shown node is on").isFalse();
        assertThat(temperature.get("series").get(0).get("values").get(1).asDouble()).isEqualTo(350.25);
        JsonNode heater = d.get("charts").get(1);
        assertThat(heater.get("series")).as("only the heated surface").hasSize(1);
    }

    @Test
    void aGeometryCaseColoursItsFacetsAtEveryInstant() throws Exception {
        Surface plate = new Surface("plate", List.of(Facet.of(new Vec3(0, 0, 0), new Vec3(2, 0, 0), new Vec3(2, 1, 0),
                new Vec3(0, 1, 0))));
        Surface shell = new Surface("shell", List.of(Facet.of(new Vec3(0, 0, 1), new Vec3(0, 1, 1), new Vec3(2, 1, 1))));
        TransientResult r = run(samples(), List.of());
        JsonNode m = data(HtmlReport.transientRun(reportCase("A made-up run", Scene.of(List.of(plate, shell))), r))
                .get("model");
        assertThat(m.get("commonScale").asBoolean()).isTrue();
        assertThat(m.get("frames")).hasSize(3);
        assertThat(m.get("stillFrames").toString()).isEqualTo("[0,1,2]");
        JsonNode f = m.get("frames").get(1);
        assertThat(f.get("facetTemperatureK").toString()).isEqualTo("[350.25,295.5]");
        // net flux = net heat / area: 5.5 W over the 2 m² plate, −5.5 W over the 1 m² triangle
        assertThat(f.get("facetNetFluxWPerM2").get(0).asDouble()).isEqualTo(2.75);
        assertThat(f.get("facetNetFluxWPerM2").get(1).asDouble()).isEqualTo(-5.5);
        assertThat(f.get("surfaces").get(0).get("temperatureK").asDouble()).isEqualTo(350.25);
    }

    @Test
    void aNonFiniteTemperatureIsRefusedNotWritten() {
        List<Sample> bad = List.of(sample(0, 300, 290, 0), sample(60, Double.NaN, 290, 0));
        assertThatThrownBy(() -> HtmlReport.transientRun(reportCase("", null), run(bad, List.of())))
                .hasMessageContaining("not a number JSON can hold");
    }

    @Test
    void aCaseWithoutGeometryShowsATableOfItsSurfacesInstead() {
        String page = HtmlReport.transientRun(reportCase("Demo (invented demo data)", null), run(samples(), List.of()));
        assertThat(page).contains("has no geometry to draw", "id=\"instant-nodes\"", "data-index=\"1\"",
                "id=\"instant\"", "Invented data");
        assertThat(page).doesNotContain("id=\"view3d\"", "three.js " + Libraries.THREE_VERSION + " (MIT");
        assertThat(HtmlReport.transientRun(reportCase("A measured run", null), run(samples(), List.of())))
                .doesNotContain("Invented data");
    }

    @Test
    void aThermostatsHeaterIsOnBetweenItsSwitches() {
        // first switch "off": on from the start; the last "on" lasts to the end of the run
        List<TransientResult.Switch> switches = List.of(new TransientResult.Switch(100, "h", false),
                new TransientResult.Switch(200, "h", true), new TransientResult.Switch(250, "g", true),
                new TransientResult.Switch(300, "h", false), new TransientResult.Switch(400, "h", true),
                new TransientResult.Switch(450, "g", false));
        List<double[]> on = TransientTables.onIntervals(run(samples(), switches), 7200);
        assertThat(on).extracting(a -> a[0] + "-" + a[1])
                .containsExactly("0.0-100.0", "200.0-300.0", "250.0-450.0", "400.0-7200.0");
    }

    @Test
    void theStillPicturesSpreadOverTheRun() {
        assertThat(TransientReport.stills(1)).containsExactly(0);
        assertThat(TransientReport.stills(4)).containsExactly(0, 1, 2, 3);
        assertThat(TransientReport.stills(73)).containsExactly(0, 14, 29, 43, 58, 72);
    }
}
