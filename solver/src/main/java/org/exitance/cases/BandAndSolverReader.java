package org.exitance.cases;

import java.util.List;
import java.util.Optional;
import org.exitance.model.BandSet;
import org.exitance.model.SolverSettings;

/** Reads a case's {@code bands} (edges in µm) and {@code solver} settings (docs/case-format.md). */
final class BandAndSolverReader {
    private BandAndSolverReader() {
    }

    /** The band set the case gives, or null when the default rule decides. */
    static BandSet bands(JsonCursor root) throws CaseException {
        Optional<JsonCursor> o = root.optional("bands");
        if (o.isEmpty()) {
            return null;
        }
        JsonCursor b = o.get().allowOnly("edges_um");
        JsonCursor edges = b.field("edges_um");
        List<JsonCursor> el = edges.elementsWithin(Limits.BAND_EDGES);
        double[] e = new double[el.size()];
        for (int i = 0; i < e.length; i++) {
            e[i] = el.get(i).positiveWithin(Limits.WAVELENGTH_UM);
            if (i > 0 && !(e[i] > e[i - 1])) {
                throw el.get(i).error("band edges must increase: " + e[i] + " after " + e[i - 1]);
            }
        }
        return new BandSet(e, e.length == 0 ? "case (one band: gray)" : "case");
    }

    /** The solver settings, each left out key at its default. */
    static SolverSettings settings(JsonCursor root) throws CaseException {
        Optional<JsonCursor> o = root.optional("solver");
        if (o.isEmpty()) {
            return SolverSettings.DEFAULT;
        }
        JsonCursor s = o.get().allowOnly("temperatureTolerance_K", "relativeHeatTolerance", "maxNewtonIterations",
                "maxPropertyIterations");
        SolverSettings d = SolverSettings.DEFAULT;
        return new SolverSettings(
                s.has("temperatureTolerance_K") ? s.field("temperatureTolerance_K").positiveWithin(Limits.TEMPERATURE_TOLERANCE_K) : d.temperatureToleranceK(),
                s.has("relativeHeatTolerance") ? s.field("relativeHeatTolerance").positiveWithin(Limits.RELATIVE_HEAT_TOLERANCE) : d.relativeHeatTolerance(),
                s.has("maxNewtonIterations") ? s.field("maxNewtonIterations").wholeWithin(Limits.NEWTON_ITERATIONS) : d.maxNewtonIterations(),
                s.has("maxPropertyIterations") ? s.field("maxPropertyIterations").wholeWithin(Limits.PROPERTY_ITERATIONS) : d.maxPropertyIterations());
    }
}
