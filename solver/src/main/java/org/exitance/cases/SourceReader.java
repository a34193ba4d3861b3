package org.exitance.cases;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.exitance.model.ExternalSource;
import org.exitance.properties.BlackbodySource;
import org.exitance.properties.IrradiationSource;
import org.exitance.properties.SourceSpectrum;

/**
 * Reads the {@code sources} array of a case: external irradiation with a spectrum (a blackbody
 * temperature or a CSV spectrum beside the case), an irradiance and an incidence factor per
 * surface.
 */
final class SourceReader {
    private SourceReader() {
    }

    static List<ExternalSource> read(JsonCursor arr, Set<String> surfaceNames, Path caseDir) throws CaseException {
        List<ExternalSource> out = new ArrayList<>();
        Set<String> names = new java.util.HashSet<>();
        for (JsonCursor s : arr.elements()) {
            s.allowOnly("name", "spectrum", "irradiance_W_m2", "incidence", "description");
            JsonCursor nameCursor = s.field("name");
            String name = nameCursor.nonEmptyText();
            if (!names.add(name)) {
                throw nameCursor.error("duplicate source name '" + name + "'");
            }
            JsonCursor spec = s.field("spectrum").allowOnly("blackbody_K", "csv");
            String which = spec.exactlyOneOf("blackbody_K", "csv");
            IrradiationSource spectrum;
            double irradiance;
            if (which.equals("blackbody_K")) {
                spectrum = new BlackbodySource(spec.field("blackbody_K").positive());
                irradiance = s.field("irradiance_W_m2").nonNegative();
            } else {
                JsonCursor ref = spec.field("csv");
                Path csv = caseDir.resolve(ref.nonEmptyText()).normalize();
                if (!Files.isRegularFile(csv)) {
                    throw ref.error("spectrum file not found: " + csv);
                }
                SourceSpectrum table = SourceSpectrumCsvReader.read(csv);
                irradiance = s.has("irradiance_W_m2") ? s.field("irradiance_W_m2").nonNegative()
                        : table.totalIrradianceWM2();
                spectrum = table;
            }
            Map<String, Double> incidence = new LinkedHashMap<>();
            JsonCursor inc = s.field("incidence");
            for (Map.Entry<String, JsonCursor> e : inc.entries()) {
                if (!surfaceNames.contains(e.getKey())) {
                    throw e.getValue().error("no surface named '" + e.getKey() + "'");
                }
                incidence.put(e.getKey(), e.getValue().fraction());
            }
            out.add(new ExternalSource(name, spectrum, irradiance, incidence));
        }
        return out;
    }
}
