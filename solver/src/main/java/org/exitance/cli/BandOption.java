package org.exitance.cli;

import org.exitance.model.BandSet;

/** Parses {@code --band-edges 1.5,3,6} (interior edges in µm) into a band set. */
final class BandOption {
    private BandOption() {
    }

    static BandSet parse(String edges, boolean gray) {
        if (gray && edges != null) {
            throw new UserError("give --gray or --band-edges, not both", ExitCodes.BAD_INPUT);
        }
        if (gray) {
            return BandSet.gray("command line: --gray");
        }
        if (edges == null) {
            return null;
        }
        String[] parts = edges.trim().isEmpty() ? new String[0] : edges.split(",");
        double[] e = new double[parts.length];
        for (int i = 0; i < e.length; i++) {
            try {
                e[i] = Double.parseDouble(parts[i].trim());
            } catch (NumberFormatException ex) {
                throw new UserError("--band-edges: '" + parts[i].trim() + "' is not a number (write e.g. 1.5,3,6 in µm)",
                        ExitCodes.BAD_INPUT);
            }
        }
        try {
            return new BandSet(e, "command line: --band-edges");
        } catch (IllegalArgumentException ex) {
            throw new UserError("--band-edges: " + ex.getMessage(), ExitCodes.BAD_INPUT);
        }
    }
}
