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
            {"exitance.solve.force", "Allow --output, --csv and --vtk to replace existing files."},
            {"exitance.solve.create-dirs", "Create the directory of --output, --csv or --vtk when it does not exist (without this option a missing directory is an error)."},
            {"exitance.solve.band-edges", "Interior band edges in µm, overriding the case and the default rule"
                    + " (e.g. 1.5,3,6)."},
            {"exitance.solve.gray", "Solve with one band (the gray solution)."},
            {"exitance.solve.band-tolerance", BAND_TOLERANCE},
            {"exitance.solve.exchange", "Pair exchange (net heat between every pair of surfaces, with the environment and"
                    + " the sources; Gebhart factors per band): auto (when the solved enclosure has at most 200 surfaces or"
                    + " facets), on, facets (also facet by facet, for a case solved on facets) or off (default"
                    + " ${DEFAULT-VALUE})."},
            {"exitance.solve.conductance", "Also give the linearised radiative conductance of each pair at the solved"
                    + " temperatures, G = Q/(T_i - T_j) in W/K, in the table, JSON and CSV."},
            {"exitance.solve.csv", "Also write surfaces.csv, bands.csv, view-factors.csv and (with the pair exchange)"
                    + " pair-exchange.csv into DIR (never overwrites without --force; a missing DIR needs --create-dirs)."},
            {"exitance.solve.vtk", "Also write the facets of a geometry case with their results (surface id and name"
                    + " lookup, temperature, net flux, per-band flux) as VTK legacy polydata to FILE."},
            {"exitance.audit.json", "Write the audit as JSON."},
            {"exitance.audit.output", "Write to FILE (never overwrites without --force)."},
            {"exitance.audit.force", "Allow --output and --plot to replace existing files."},
            {"exitance.audit.create-dirs", "Create the directory of --output or --plot when it does not exist (without this option a missing directory is an error)."},
            {"exitance.audit.band-edges", "Reference band edges in µm (default: the case's, or the default rule)."},
            {"exitance.audit.band-tolerance", BAND_TOLERANCE},
            {"exitance.sensitivity.json", "Write the ranking as JSON."},
            {"exitance.sensitivity.band-edges", "Band edges in µm (default: the case's, or adaptive bands)."},
            {"exitance.material.json", "Write JSON instead of tables."},
            {"exitance.material.output", "Write the table or JSON to FILE instead of standard output."},
            {"exitance.material.force", "Allow --output and --plot to replace existing files."},
            {"exitance.material.create-dirs", "Create the directory of --output or --plot when it does not exist (without this option a missing directory is an error)."},
            {"exitance.view-factors.json", "Write the matrix and diagnostics as JSON."},
            {"exitance.view-factors.force", "Allow --csv to replace an existing file."},
            {"exitance.view-factors.create-dirs", "Create the directory of --csv when it does not exist (without this option a missing directory is an error)."},
            {"exitance.verify.json", "Write the verdicts as JSON."},
        };
    }
}
