package org.exitance.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.exitance.audit.AuditResult;
import org.exitance.audit.AuditRow;
import org.exitance.audit.GrayCause;

/** The gray-body audit as JSON: {@code audits[] {name, thresholdPct, surfaces[] {...}}}. */
public final class AuditJsonWriter {
    private AuditJsonWriter() {
    }

    public static ObjectNode toJson(String caseFile, List<AuditResult> audits) {
        ObjectNode root = SolveJsonWriter.document();
        root.put("case", caseFile);
        ArrayNode arr = root.putArray("audits");
        for (AuditResult a : audits) {
            ObjectNode o = arr.addObject();
            o.put("name", a.name());
            o.put("referenceBands", a.band().bands().size());
            o.put("thresholdPct", a.thresholdPct());
            o.put("flagged", a.flaggedCount());
            ArrayNode s = o.putArray("surfaces");
            for (AuditRow r : a.rows()) {
                ObjectNode x = s.addObject();
                x.put("name", r.surface());
                x.put("temperatureSolved", r.temperatureSolved());
                ObjectNode q = x.putObject("netHeat_W");
                q.put("band", r.bandNetHeatW());
                q.put("gray", r.grayNetHeatW());
                putOrNull(q, "twoBand", r.twoBandNetHeatW());
                ObjectNode t = x.putObject("temperature_K");
                t.put("band", r.bandTemperatureK());
                t.put("gray", r.grayTemperatureK());
                putOrNull(t, "twoBand", r.twoBandTemperatureK());
                x.put("grayError_W", r.grayErrorW());
                x.put("grayError_K", r.grayErrorK());
                x.put("grayError_pct", r.grayErrorPct());
                x.put("flagged", r.flagged());
                ObjectNode c = x.putObject("cause");
                c.put("effectiveAbsorptivity", r.cause().effectiveAbsorptivity());
                c.put("emissivityAtOwnTemperature", r.cause().emissivityAtOwnTemperature());
                c.put("lower_um", r.cause().lowerUm());
                putOrNull(c, "upper_um", r.cause().upperUm());
                c.put("shareOfDifference", r.cause().shareOfDifference());
                c.put("kind", r.cause().kind() == GrayCause.Kind.OWN_SPECTRUM ? "ownSpectrum" : "otherSurfaces");
                ArrayNode others = c.putArray("nonGraySurfaces");
                r.cause().nonGraySurfaces().forEach(others::add);
            }
        }
        root.put("caution", Caution.SHORT);
        return root;
    }

    private static void putOrNull(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }
}
