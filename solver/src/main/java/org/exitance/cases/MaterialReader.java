package org.exitance.cases;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.TemperatureTabulatedEmissivity;

/**
 * Reads the {@code materials} object of a case. A material is gray ({@code "emissivity": 0.8})
 * or spectral ({@code "spectralEmissivity": {...}}) given inline, by temperature, or from a CSV
 * file beside the case. A semi-transparent material (a window) gives any two of emissivity,
 * transmissivity and reflectivity, or all three, each gray or as a table or steps in λ
 * ({@link SemiTransparentProperties} checks and completes them).
 */
final class MaterialReader {
    private MaterialReader() {
    }

    static Map<String, Material> readAll(JsonCursor materials, Path caseDir) throws CaseException {
        return readAll(materials, caseDir, null);
    }

    /**
     * @param warnings where a window whose measured α + ρ + τ misses 1 by more than its measurement
     *                 tolerance is recorded (modified: lines are added), or null to make that an error
     */
    static Map<String, Material> readAll(JsonCursor materials, Path caseDir, List<String> warnings)
            throws CaseException {
        Map<String, Material> out = new LinkedHashMap<>();
        List<Map.Entry<String, JsonCursor>> entries = materials.entries();
        if (entries.isEmpty()) {
            throw materials.error("needs at least one material");
        }
        for (Map.Entry<String, JsonCursor> e : entries) {
            String name = e.getKey();
            if (name.isBlank()) {
                throw e.getValue().error("material name must not be empty");
            }
            out.put(name, read(name, e.getValue(), caseDir, warnings));
        }
        return out;
    }

    /**
     * The measurement tolerances of the windows whose ε, ρ and τ are all given, by material name in
     * file order; call after {@link #readAll} has accepted the materials.
     */
    static Map<String, MeasurementTolerance> measurementTolerances(JsonCursor materials) throws CaseException {
        Map<String, MeasurementTolerance> out = new LinkedHashMap<>();
        for (Map.Entry<String, JsonCursor> e : materials.entries()) {
            MeasurementTolerance t = SemiTransparentProperties.tolerance(e.getValue());
            if (t != null) {
                out.put(e.getKey(), t);
            }
        }
        return out;
    }

    private static Material read(String name, JsonCursor m, Path caseDir, List<String> warnings)
            throws CaseException {
        Material base = readProperties(name, m, caseDir, warnings);
        return m.has("emissivityUncertainty")
                ? base.withEmissivityUncertainty(m.field("emissivityUncertainty").fraction()) : base;
    }

    private static Material readProperties(String name, JsonCursor m, Path caseDir, List<String> warnings)
            throws CaseException {
        m.allowOnly(allowedKeys());
        String description = m.has("description") ? m.field("description").text() : "";
        boolean window = m.has("transmissivity") || m.has("spectralTransmissivity") || m.has("reflectivity")
                || m.has("spectralReflectivity");
        if (window && MeasuredEmissivityReader.applies(m)) {
            throw m.error("a window gives its transmissivity with emissivity or reflectivity; opaque measured data"
                    + " (opaqueReflectivity, normalEmissivity, directionalEmissivity) are for opaque materials");
        }
        if (window) {
            return SemiTransparentProperties.read(name, m, caseDir, description, warnings);
        }
        if (m.has("measurementTolerance")) {
            throw m.field("measurementTolerance").error("applies to a window that gives all three of emissivity,"
                    + " reflectivity and transmissivity");
        }
        if (MeasuredEmissivityReader.applies(m)) {
            return new Material(name, MeasuredEmissivityReader.read(m), description);
        }
        if (m.has("normalToHemispherical")) {
            throw m.field("normalToHemispherical").error("goes with \"normalEmissivity\" only");
        }
        String which = m.exactlyOneOf("emissivity", "spectralEmissivity");
        SpectralEmissivity model;
        if (which.equals("emissivity")) {
            model = new GrayEmissivity(m.field("emissivity").fraction());
        } else {
            model = spectral(m.field("spectralEmissivity"), caseDir);
        }
        return new Material(name, model, description);
    }

    private static String[] allowedKeys() {
        List<String> keys = new java.util.ArrayList<>(List.of("emissivity", "spectralEmissivity", "transmissivity",
                "spectralTransmissivity", "reflectivity", "spectralReflectivity", "emissivityUncertainty", "measurementTolerance",
                "description"));
        keys.addAll(MeasuredEmissivityReader.KEYS);
        return keys.toArray(String[]::new);
    }

    static SpectralEmissivity spectral(JsonCursor s, Path caseDir) throws CaseException {
        return spectral(s, caseDir, "emissivity");
    }

    /**
     * A spectral property whose values sit under {@code valueKey} ("emissivity", "transmissivity",
     * "reflectivity"): a table or steps in λ, one such table per temperature ({@code byTemperature}),
     * or a CSV file (with an optional {@code temperature_K} column).
     */
    static SpectralEmissivity spectral(JsonCursor s, Path caseDir, String valueKey) throws CaseException {
        s.allowOnly("wavelength_um", "bandEdges_um", valueKey, "byTemperature", "csv");
        String which = s.exactlyOneOf("wavelength_um", "bandEdges_um", "byTemperature", "csv");
        switch (which) {
            case "wavelength_um":
            case "bandEdges_um":
                return table(s, valueKey);
            case "byTemperature": {
                if (s.has(valueKey)) {
                    throw s.field(valueKey).error("goes inside each table of byTemperature");
                }
                JsonCursor arr = s.field("byTemperature");
                List<JsonCursor> el = arr.elements();
                if (el.isEmpty()) {
                    throw arr.error("needs at least one table");
                }
                double[] t = new double[el.size()];
                TabulatedEmissivity[] tables = new TabulatedEmissivity[el.size()];
                for (int i = 0; i < t.length; i++) {
                    JsonCursor one = el.get(i).allowOnly("temperature_K", "temperature_C", "wavelength_um",
                            "bandEdges_um", valueKey);
                    one.exactlyOneOf("wavelength_um", "bandEdges_um");
                    t[i] = TemperatureField.read(one, "temperature")
                            .orElseThrow(() -> one.error("missing required key 'temperature_K' (or 'temperature_C')"));
                    if (i > 0 && !(t[i] > t[i - 1])) {
                        throw one.error("temperatures must increase: " + t[i] + " K after " + t[i - 1] + " K");
                    }
                    tables[i] = table(one, valueKey);
                }
                return tables.length == 1 ? tables[0] : new TemperatureTabulatedEmissivity(t, tables);
            }
            default: {
                JsonCursor ref = s.field("csv");
                Path csv = caseDir.resolve(ref.nonEmptyText()).normalize();
                List<PropertyCsvReader.Table> tables = PropertyCsvReader.read(csv, ref, valueKey);
                if (tables.size() == 1) {
                    PropertyCsvReader.Table t = tables.get(0);
                    return new TabulatedEmissivity(t.wavelengthUm(), t.emissivity());
                }
                double[] temps = new double[tables.size()];
                TabulatedEmissivity[] models = new TabulatedEmissivity[tables.size()];
                for (int i = 0; i < temps.length; i++) {
                    temps[i] = tables.get(i).temperatureK();
                    models[i] = new TabulatedEmissivity(tables.get(i).wavelengthUm(), tables.get(i).emissivity());
                }
                return new TemperatureTabulatedEmissivity(temps, models);
            }
        }
    }

    /**
     * An inline table: {@code wavelength_um} and {@code emissivity} arrays of equal length
     * (piecewise linear), or {@code bandEdges_um} and one more {@code emissivity} than edges
     * (piecewise constant, a step at each edge; stored as a table whose two nodes at each step are
     * one floating-point spacing apart, so band means over bands that share those edges are exact).
     */
    private static TabulatedEmissivity table(JsonCursor s) throws CaseException {
        return table(s, "emissivity");
    }

    /** As {@link #table(JsonCursor)}, with the values under {@code valueKey} ("transmissivity", ...). */
    static TabulatedEmissivity table(JsonCursor s, String valueKey) throws CaseException {
        if (s.has("bandEdges_um")) {
            return steps(s, valueKey);
        }
        JsonCursor wc = s.field("wavelength_um");
        JsonCursor ec = s.field(valueKey);
        List<JsonCursor> w = wc.elementsWithin(Limits.TABLE_POINTS);
        List<JsonCursor> e = ec.elementsWithin(Limits.TABLE_POINTS);
        if (w.isEmpty()) {
            throw wc.error("needs at least one wavelength");
        }
        if (w.size() != e.size()) {
            throw ec.error("has " + e.size() + " values for " + w.size() + " wavelengths");
        }
        double[] wl = new double[w.size()];
        double[] em = new double[w.size()];
        for (int i = 0; i < wl.length; i++) {
            wl[i] = w.get(i).positiveWithin(Limits.WAVELENGTH_UM);
            if (i > 0 && !(wl[i] > wl[i - 1])) {
                throw w.get(i).error("wavelengths must increase: " + wl[i] + " µm after " + wl[i - 1] + " µm");
            }
            em[i] = e.get(i).fraction();
        }
        return new TabulatedEmissivity(wl, em);
    }

    private static TabulatedEmissivity steps(JsonCursor s, String valueKey) throws CaseException {
        JsonCursor wc = s.field("bandEdges_um");
        JsonCursor ec = s.field(valueKey);
        List<JsonCursor> w = wc.elementsWithin(Limits.TABLE_POINTS);
        List<JsonCursor> e = ec.elementsWithin(Limits.TABLE_POINTS);
        if (e.size() != w.size() + 1) {
            throw ec.error("needs one more value than bandEdges_um has edges (" + (w.size() + 1) + "), got " + e.size());
        }
        double[] values = new double[e.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = e.get(i).fraction();
        }
        if (w.isEmpty()) {
            return new TabulatedEmissivity(new double[] {1.0}, new double[] {values[0]});
        }
        double[] nodes = new double[2 * w.size()];
        double[] v = new double[2 * w.size()];
        double previous = 0;
        for (int i = 0; i < w.size(); i++) {
            double edge = w.get(i).positiveWithin(Limits.WAVELENGTH_UM);
            if (i > 0 && !(edge > previous)) {
                throw w.get(i).error("band edges must increase: " + edge + " µm after " + previous + " µm");
            }
            previous = edge;
            nodes[2 * i] = edge;
            v[2 * i] = values[i];
            nodes[2 * i + 1] = Math.nextUp(edge);
            v[2 * i + 1] = values[i + 1];
        }
        return new TabulatedEmissivity(nodes, v);
    }
}
