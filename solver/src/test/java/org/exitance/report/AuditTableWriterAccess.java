package org.exitance.report;

import org.exitance.audit.AuditRow;

/** The audit table's cause line, for tests in other packages. */
public final class AuditTableWriterAccess {
    private AuditTableWriterAccess() {
    }

    public static String causeLine(AuditRow r) {
        return AuditTableWriter.causeLine(r);
    }
}
