package org.exitance.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.util.List;
import java.util.Locale;
import org.exitance.sensitivity.EmissivitySensitivities;
import org.exitance.sensitivity.UncertaintyPropagation;

/** Writes an emissivity-sensitivity ranking as a table or as JSON; computes nothing. */
public final class SensitivityWriter {
    private SensitivityWriter() {
    }

    /**
     * What was studied.
     *
     * @param caseFile     the case file as given
     * @param surface      the surface studied
     * @param temperature  true for its temperature (K), false for its net heat (W)
     * @param loadCase     the load case named, or null
     */
    public record Study(String caseFile, String surface, boolean temperature, String loadCase) {
        String unit() {
            return temperature ? "K" : "W";
        }

        double value(EmissivitySensitivities s) {
            var r = s.solved().surface(surface);
            return temperature ? r.temperatureK() : r.netHeatW();
        }
    }

    /** The ranking as JSON (every band emissivity, largest effect first). */
    public static void json(Study study, EmissivitySensitivities s, UncertaintyPropagation.Ranking ranking,
                            PrintStream out) throws IOException {
        ObjectNode root = SolveJsonWriter.MAPPER.createObjectNode();
        root.put("case", study.caseFile());
        root.put("surface", study.surface());
        root.put("quantity", study.temperature() ? "temperature_K" : "netHeat_W");
        root.put("value", study.value(s));
        ArrayNode arr = root.putArray("sensitivities");
        for (UncertaintyPropagation.Effect r : ranking.effects()) {
            ObjectNode o = arr.addObject();
            o.put("surface", r.surface());
            o.put("lower_um", r.band().lowerUm());
            if (Double.isInfinite(r.band().upperUm())) {
                o.putNull("upper_um");
            } else {
                o.put("upper_um", r.band().upperUm());
            }
            o.put("emissivity", r.emissivity());
            o.put("derivative", r.derivative());
            o.put("effect", r.effect());
            o.put("effectFromStatedBound", r.bounded());
        }
        if (ranking.anyStatedBound()) {
            ObjectNode p = root.putObject("propagatedUncertainty");
            p.put("independentBands", ranking.independentBands());
            p.put("correlatedWithinMaterial", ranking.correlatedWithinMaterial());
        }
        root.put("caution", Caution.SHORT);
        out.println(SolveJsonWriter.MAPPER.writeValueAsString(root));
    }

    /** The first {@code top} rows of the ranking as a table, with the propagated uncertainty. */
    public static void table(Study study, EmissivitySensitivities s, UncertaintyPropagation.Ranking ranking, int top,
                             PrintStream out) {
        String unit = study.unit();
        double value = study.value(s);
        out.println("Sensitivity of the " + (study.temperature() ? "temperature" : "net heat") + " of '" + study.surface()
                + "' = " + (study.temperature() ? Numbers.temperature(value) : Numbers.power(value)) + " " + unit
                + " to band-mean emissivities (" + s.solved().bands().size() + " bands"
                + (study.loadCase() == null ? "" : ", load case " + study.loadCase()) + ")");
        TextTable t = new TextTable(List.of("Rank", "Surface", "Band µm", "ε", "∂/∂ε " + unit, "Effect " + unit, ""),
                new boolean[] {true, false, false, true, true, true, false});
        int rank = 1;
        for (UncertaintyPropagation.Effect r : ranking.effects().subList(0, Math.min(top, ranking.effects().size()))) {
            t.row(List.of(Integer.toString(rank++), r.surface(), Numbers.wavelength(r.band().lowerUm()) + "–"
                    + Numbers.wavelength(r.band().upperUm()), Numbers.ratio(r.emissivity()),
                    String.format(Locale.ROOT, "%.4g", r.derivative()), String.format(Locale.ROOT, "%.4g", r.effect()),
                    r.bounded() ? "± stated" : "± 0.01"));
        }
        t.render(0).forEach(out::println);
        out.println("  (effect: |∂/∂ε| times the material's stated ± bound on ε, or times 0.01 where none is stated)");
        if (ranking.anyStatedBound()) {
            out.println(String.format(Locale.ROOT, "Propagated uncertainty from stated bounds: ±%.4g %s with independent"
                    + " bands (root-sum-square), ±%.4g %s with each material's error the same in every band",
                    ranking.independentBands(), unit, ranking.correlatedWithinMaterial(), unit));
        }
        TableFooter.write(out);
    }
}
