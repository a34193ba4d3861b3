package org.exitance.validation;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.exitance.cases.CaseDescription;
import org.exitance.cases.CaseException;
import org.exitance.cases.JsonCursor;

/**
 * Reads the {@code expected} block of a validation case (docs/case-format.md, "expected"): the
 * published source, the tolerances and the reference values per surface or environment.
 */
public final class ExpectedReader {
    private ExpectedReader() {
    }

    /** The case's expected values, or null when it has no {@code expected} block. */
    public static ExpectedValues read(CaseDescription c) throws CaseException {
        JsonCursor e = c.expected();
        if (e == null) {
            return null;
        }
        e.allowOnly("source", "derivation", "relativeTolerance", "absoluteTolerance", "surfaces", "environment");
        String source = e.field("source").nonEmptyText();
        String derivation = e.has("derivation") ? e.field("derivation").text() : "";
        double rel = e.has("relativeTolerance") ? e.field("relativeTolerance").nonNegative() : 0;
        double abs = e.has("absoluteTolerance") ? e.field("absoluteTolerance").nonNegative() : 0;
        if (rel == 0 && abs == 0) {
            throw e.error("needs relativeTolerance or absoluteTolerance");
        }
        List<Expectation> values = new ArrayList<>();
        if (e.has("surfaces")) {
            for (Map.Entry<String, JsonCursor> s : e.field("surfaces").entries()) {
                if (c.surfaces().stream().noneMatch(x -> x.name().equals(s.getKey()))) {
                    throw s.getValue().error("no surface named '" + s.getKey() + "'");
                }
                quantities(s.getKey(), s.getValue(), values, true);
            }
        }
        if (e.has("environment")) {
            if (c.environment() == null) {
                throw e.field("environment").error("the case has no environment");
            }
            quantities(c.environment().name(), e.field("environment"), values, false);
        }
        if (values.isEmpty()) {
            throw e.error("lists no expected values");
        }
        return new ExpectedValues(source, derivation, rel, abs, values);
    }

    private static void quantities(String target, JsonCursor q, List<Expectation> out, boolean surface)
            throws CaseException {
        if (surface) {
            q.allowOnly("netHeat_W", "netFlux_W_m2", "temperature_K");
        } else {
            q.allowOnly("netHeat_W");
        }
        for (Map.Entry<String, JsonCursor> v : q.entries()) {
            out.add(new Expectation(target, v.getKey(), v.getValue().number()));
        }
    }
}
