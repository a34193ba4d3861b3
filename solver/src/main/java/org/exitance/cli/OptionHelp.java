package org.exitance.cli;

import java.util.ListResourceBundle;

/**
 * Each command's help text for the {@link SharedOptions} it has, keyed by the command's full
 * name and the option's description key ({@code exitance.solve.json}): picocli looks them up in
 * this bundle, which {@link ExitanceCommand} names and every subcommand inherits.
 */
public final class OptionHelp extends ListResourceBundle {
    private static final String BAND_TOLERANCE = "Adaptive bands (used when neither the case nor --band-edges gives"
            + " bands) stop when no surface changes by more than this percent of the largest |net heat| (default"
            + " ${DEFAULT-VALUE}).";

    @Override
    protected Object[][] getContents() {
        return new Object[][] {
            {"exitance.solve.json", "Write the machine-readable result (JSON) instead of tables."},
            {"exitance.solve.output", "Write to FILE instead of standard output (never overwrites without --force)."},
            {"exitance.solve.force", "Allow --output, --csv, --vtk and --report to replace existing files."},
            {"exitance.solve.create-dirs", "Create the directory of --output, --csv, --vtk or --report when it does not exist (without this option a missing directory is an error)."},
            {"exitance.solve.band-edges", "Interior band edges in µm, overriding the case and the default rule"
                    + " (e.g. 1.5,3,6)."},
            {"exitance.solve.gray", "Solve with one band (the gray solution)."},
            {"exitance.solve.band-tolerance", BAND_TOLERANCE},
            {"exitance.solve.force", "Allow --output, --csv, --vtk and --report to replace existing files."},
            {"exitance.solve.create-dirs", "Create the directory of --output, --csv, --vtk or --report when it does not exist (without this option a missing directory is an error)."},
            {"exitance.transient.json", "Write the run as JSON instead of tables."},
            {"exitance.transient.output", "Write the table or JSON to FILE (never overwrites without --force)."},
            {"exitance.transient.force", "Allow --output, --csv, --plot and --report to replace existing files."},
            {"exitance.transient.create-dirs", "Create the directories of --output, --csv, --plot and --report when they do not exist (without this option a missing directory is an error)."},
            {"exitance.transient.band-edges", "Interior band edges in µm, overriding the case and the default rule."},
            {"exitance.transient.gray", "Integrate with one band (the gray model)."},
            {"exitance.audit.json", "Write the audit as JSON."},
            {"exitance.audit.output", "Write to FILE (never overwrites without --force)."},
            {"exitance.audit.force", "Allow --output, --plot and --report to replace existing files."},
            {"exitance.audit.create-dirs", "Create the directory of --output, --plot or --report when it does not exist (without this option a missing directory is an error)."},
            {"exitance.audit.band-edges", "Reference band edges in µm (default: the case's, or the default rule)."},
            {"exitance.audit.band-tolerance", BAND_TOLERANCE},
            {"exitance.sensitivity.json", "Write the ranking as JSON."},
            {"exitance.sensitivity.band-edges", "Band edges in µm (default: the case's, or adaptive bands)."},
            {"exitance.material.json", "Write JSON instead of tables."},
            {"exitance.material.output", "Write the table or JSON to FILE instead of standard output."},
            {"exitance.material.force", "Allow --output, --plot and --report to replace existing files."},
            {"exitance.material.create-dirs", "Create the directory of --output, --plot or --report when it does not exist (without this option a missing directory is an error)."},
            {"exitance.view-factors.json", "Write the matrix and diagnostics as JSON."},
            {"exitance.view-factors.force", "Allow --csv to replace an existing file."},
            {"exitance.view-factors.create-dirs", "Create the directory of --csv when it does not exist (without this option a missing directory is an error)."},
            {"exitance.verify.json", "Write the verdicts as JSON."},
        };
    }
}
