package org.exitance.validation;

import java.nio.file.Path;
import java.util.List;

/**
 * The verdict on one validation case.
 *
 * @param file            the case file
 * @param title           its title
 * @param source          the published source of its reference values
 * @param checks          the comparisons
 * @param error           why the case could not be run (null when it ran)
 * @param energyBalanceRelative the solve's relative energy imbalance (NaN when it did not run)
 */
public record CaseVerdict(Path file, String title, String source, List<CheckOutcome> checks, String error,
                          double energyBalanceRelative) {
    public CaseVerdict {
        checks = List.copyOf(checks);
    }

    public boolean passed() {
        return error == null && !checks.isEmpty() && checks.stream().allMatch(CheckOutcome::passed);
    }
}
