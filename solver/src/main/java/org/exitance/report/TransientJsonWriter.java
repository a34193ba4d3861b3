package org.exitance.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.exitance.timeline.Sample;
import org.exitance.timeline.TransientResult;

/**
 * The JSON of a transient run (docs/transient.md, "Output"): per output instant every surface's
 * temperature and heats, events, periods, the energy account and step statistics. A time a
 * target was not reached is null.
 */
public final class TransientJsonWriter {
    private TransientJsonWriter() {
    }

    public static ObjectNode toJson(TransientResult r, String file, List<String> warnings) {
        ObjectNode root = SolveJsonWriter.MAPPER.createObjectNode();
        root.put("case", file);
        root.put("title", r.title());
        root.put("bands", r.bands());
        if (Double.isNaN(r.toleranceK())) {
            root.putNull("stepTolerance_K");
        } else {
            root.put("stepTolerance_K", r.toleranceK());
        }
        ArrayNode names = root.putArray("surfaces");
        r.surfaces().forEach(names::add);
        ArrayNode samples = root.putArray("samples");
        for (Sample s : r.samples()) {
            ObjectNode o = samples.addObject();
            o.put("time_s", s.timeS());
            o.put("stored_J", s.storedJ());
            o.put("supplied_J", s.suppliedJ());
            o.put("lost_J", s.lostJ());
            o.put("drift_J", s.storedJ() - r.energy().storedStartJ() - (s.suppliedJ() - s.lostJ()));
            put(o.putArray("temperature_K"), s.temperatureK());
            put(o.putArray("heater_W"), s.heaterW());
            put(o.putArray("netRadiation_W"), s.radiationW());
            put(o.putArray("convection_W"), s.convectionW());
            put(o.putArray("conduction_W"), s.linksW());
            put(o.putArray("wallIn_W"), s.wallInW());
            put(o.putArray("wallOut_W"), s.wallOutW());
        }
        ArrayNode ex = root.putArray("extremes");
        for (TransientResult.Extremes e : r.extremes()) {
            ex.addObject().put("surface", e.surface()).put("min_K", e.minK()).put("minTime_s", e.minTimeS())
                    .put("max_K", e.maxK()).put("maxTime_s", e.maxTimeS());
        }
        ArrayNode tg = root.putArray("targets");
        for (TransientResult.TargetTime g : r.targets()) {
            ObjectNode o = tg.addObject().put("surface", g.surface()).put("temperature_K", g.targetK());
            if (Double.isNaN(g.timeS())) {
                o.putNull("time_s");
            } else {
                o.put("time_s", g.timeS());
            }
        }
        ArrayNode sw = root.putArray("switches");
        for (TransientResult.Switch s : r.switches()) {
            sw.addObject().put("time_s", s.timeS()).put("heater", s.heater()).put("on", s.on());
        }
        ArrayNode cy = root.putArray("periods");
        for (TransientResult.Cycle c : r.cycles()) {
            cy.addObject().put("number", c.number()).put("start_s", c.startS()).put("end_s", c.endS())
                    .put("supplied_J", c.suppliedJ()).put("lost_J", c.lostJ()).put("storedChange_J", c.storedChangeJ())
                    .put("maxChange_K", c.maxChangeK());
        }
        root.put("repeated", r.repeated());
        TransientResult.Energy e = r.energy();
        root.putObject("energy").put("storedStart_J", e.storedStartJ()).put("storedEnd_J", e.storedEndJ())
                .put("supplied_J", e.suppliedJ()).put("lost_J", e.lostJ()).put("drift_J", e.driftJ())
                .put("driftRelative", e.driftRelative());
        TransientResult.Steps st = r.steps();
        root.putObject("steps").put("accepted", st.accepted()).put("rejected", st.rejected())
                .put("smallest_s", st.smallestS()).put("largest_s", st.largestS()).put("switches", st.switches());
        ArrayNode w = root.putArray("warnings");
        warnings.forEach(w::add);
        return root;
    }

    private static void put(ArrayNode a, double[] v) {
        for (double x : v) {
            a.add(x);
        }
    }
}
