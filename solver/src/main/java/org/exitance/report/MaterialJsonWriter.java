package org.exitance.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.exitance.properties.MaterialSurvey;
import org.exitance.properties.SurveyRow;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * The machine-readable form of material property surveys (documented in docs/command-line.md).
 * Keys carry their units; an α/ε that is not finite (ε = 0) is written as null.
 */
public final class MaterialJsonWriter {

    private MaterialJsonWriter() {
    }

    /**
     * @param file    the file the materials came from
     * @param isCase  whether it is a case file (else a material file)
     * @param title   its title, may be empty
     * @param surveys one per material, all with the same sources
     */
    public static ObjectNode toJson(String file, boolean isCase, String title, List<MaterialSurvey> surveys) {
        ObjectNode root = SolveJsonWriter.document();
        root.put("file", file);
        root.put("fileKind", isCase ? "case" : "materials");
        root.put("title", title);
        ArrayNode sources = root.putArray("sources");
        List<IrradiationSource> list = surveys.isEmpty() ? List.of() : surveys.get(0).sources();
        for (IrradiationSource s : list) {
            source(sources.addObject(), s, true);
        }
        ArrayNode materials = root.putArray("materials");
        for (MaterialSurvey m : surveys) {
            ObjectNode o = materials.addObject();
            o.put("name", m.material().name());
            o.put("description", m.material().description());
            o.put("gray", m.gray());
            o.put("temperatureDependent", m.temperatureDependent());
            ArrayNode rows = o.putArray("temperatures");
            for (SurveyRow r : m.rows()) {
                ObjectNode ro = rows.addObject();
                ro.put("temperature_K", r.temperatureK());
                ro.put("totalEmissivity", r.totalEmissivity());
                if (r.window()) {
                    ro.put("totalTransmissivity", r.totalTransmissivity());
                }
                ro.put("totalReflectivity", r.totalReflectivity());
                ArrayNode ab = ro.putArray("absorptivity");
                for (int k = 0; k < m.sources().size(); k++) {
                    ObjectNode a = ab.addObject();
                    source(a, m.sources().get(k), false);
                    a.put("totalAbsorptivity", r.absorptivity(k));
                    if (r.window()) {
                        a.put("totalTransmissivity", r.transmissivity()[k]);
                    }
                    double q = r.alphaOverEpsilon(k);
                    if (Double.isFinite(q)) {
                        a.put("alphaOverEpsilon", q);
                    } else {
                        a.putNull("alphaOverEpsilon");
                    }
                }
            }
        }
        root.put("caution", Caution.SHORT);
        return root;
    }

    /** Identifies a source; {@code full} adds a spectrum's range and total irradiance. */
    private static void source(ObjectNode o, IrradiationSource s, boolean full) {
        if (s instanceof SourceSpectrum g) {
            o.put("source", "spectrum");
            o.put("sourceFile", g.label());
            if (!full) {
                return;
            }
            o.put("sourceFrom_um", g.firstUm());
            o.put("sourceTo_um", g.lastUm());
            o.put("sourceIrradiance_W_m2", g.totalIrradianceWM2());
        } else {
            o.put("source", "blackbody");
            o.put("sourceTemperature_K", ((BlackbodySource) s).temperatureK());
        }
    }
}
