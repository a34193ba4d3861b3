package org.exitance.audit;

import java.util.List;
import org.exitance.result.SolveResult;

/**
 * The gray-body audit of one case (or load case).
 *
 * @param name          load-case name, or "as given"
 * @param thresholdPct  flagging threshold (%)
 * @param rows          one per surface, in case order
 * @param band          the band-wise solution (reference)
 * @param gray          the gray-shortcut solution
 * @param twoBand       the solar/infrared two-band solution, or null when the case has no external source
 */
public record AuditResult(String name, double thresholdPct, List<AuditRow> rows, SolveResult band, SolveResult gray,
                          SolveResult twoBand) {
    public AuditResult {
        rows = List.copyOf(rows);
    }

    public long flaggedCount() {
        return rows.stream().filter(AuditRow::flagged).count();
    }
}
