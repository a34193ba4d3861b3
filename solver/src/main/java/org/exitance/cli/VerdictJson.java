package org.exitance.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.exitance.report.SolveJsonWriter;
import org.exitance.validation.CaseVerdict;
import org.exitance.validation.CheckOutcome;

/** JSON form of validation verdicts. */
final class VerdictJson {
    private VerdictJson() {
    }

    static ObjectNode toJson(List<CaseVerdict> verdicts) {
        ObjectNode root = SolveJsonWriter.MAPPER.createObjectNode();
        root.put("passed", verdicts.stream().allMatch(CaseVerdict::passed));
        ArrayNode cases = root.putArray("cases");
        for (CaseVerdict v : verdicts) {
            ObjectNode o = cases.addObject();
            o.put("file", v.file().toString());
            o.put("title", v.title());
            o.put("source", v.source());
            o.put("passed", v.passed());
            if (v.error() != null) {
                o.put("error", v.error());
            }
            if (Double.isFinite(v.energyBalanceRelative())) {
                o.put("energyBalanceRelative", v.energyBalanceRelative());
            }
            ArrayNode checks = o.putArray("checks");
            for (CheckOutcome c : v.checks()) {
                ObjectNode co = checks.addObject();
                co.put("target", c.target());
                co.put("quantity", c.quantity());
                co.put("expected", c.expected());
                if (Double.isFinite(c.computed())) {
                    co.put("computed", c.computed());
                } else {
                    co.putNull("computed"); // the solve did not run
                }
                co.put("allowed", c.allowed());
                co.put("passed", c.passed());
            }
        }
        return root;
    }
}
