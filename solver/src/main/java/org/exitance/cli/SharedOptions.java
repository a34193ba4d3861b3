package org.exitance.cli;

import java.nio.file.Path;
import org.exitance.cases.Limits;
import org.exitance.model.BandSet;
import picocli.CommandLine.Option;

/**
 * The options several commands share, declared once as picocli mixins: {@code --json},
 * {@code -o/--output}, {@code --force} and the band options. A command mixes in the ones it has
 * ({@code @Mixin SharedOptions.Json json;}). Names, parsing and checks live here; each command's
 * help text for an option is in {@link OptionHelp}, under the command's name.
 */
final class SharedOptions {
    private SharedOptions() {
    }

    /** {@code --json}: machine-readable output instead of tables. */
    static final class Json {
        @Option(names = "--json", descriptionKey = "json", description = "Write JSON.")
        private boolean json;

        boolean on() {
            return json;
        }
    }

    /** {@code -o/--output FILE}: write there instead of standard output (see {@link OutputTarget}). */
    static final class Output {
        @Option(names = {"-o", "--output"}, paramLabel = "FILE", descriptionKey = "output",
                description = "Write to FILE instead of standard output.")
        private Path output;

        /** The file, or null for standard output. */
        Path file() {
            return output;
        }
    }

    /**
     * How the command may write files: {@code --force} lets them replace existing ones,
     * {@code --create-dirs} lets a missing directory of theirs be created (without it, a file
     * in a directory that does not exist is an error).
     */
    static final class Force {
        @Option(names = "--force", descriptionKey = "force", description = "Allow replacing existing files.")
        private boolean force;

        @Option(names = "--create-dirs", descriptionKey = "create-dirs",
                description = "Create the missing directories of the files written.")
        private boolean createDirs;

        boolean on() {
            return force;
        }

        boolean createDirs() {
            return createDirs;
        }
    }

    /**
     * {@code --report DIR}: also write the offline HTML report into DIR, as
     * {@code CASE-solve.html}, {@code CASE-audit.html}, {@code CASE-transient.html} or {@code FILE-material.html}.
     */
    static final class Report {
        @Option(names = "--report", paramLabel = "DIR", descriptionKey = "report",
                description = "Also write an offline HTML report into DIR.")
        private Path dir;

        /**
         * The report's file for an input file, or null without {@code --report}.
         *
         * @param input the case or material file
         * @param kind  "solve", "audit", "transient" or "material"
         */
        Path file(Path input, String kind) {
            if (dir == null) {
                return null;
            }
            if (java.nio.file.Files.exists(dir) && !java.nio.file.Files.isDirectory(dir)) {
                throw new UserError("--report " + dir + ": is not a directory (name a directory for the report)",
                        ExitCodes.BAD_INPUT);
            }
            String stem = input.getFileName().toString().replaceAll("(?i)\\.json$", "");
            return dir.resolve(stem + "-" + kind + ".html");
        }
    }

    /** {@code --gray}: one band. */
    static final class Gray {
        @Option(names = "--gray", descriptionKey = "gray", description = "Solve with one band.")
        private boolean gray;

        boolean on() {
            return gray;
        }
    }

    /** {@code --band-edges 1.5,3,6}: interior band edges in µm. */
    static final class BandEdges {
        @Option(names = "--band-edges", paramLabel = "µm,µm,...", descriptionKey = "band-edges",
                description = "Interior band edges in µm.")
        private String edges;

        /** The bands the options ask for, or null when they leave the choice to the case and the default rule. */
        BandSet bands() {
            return bands(null);
        }

        /** As {@link #bands()}, with {@code --gray} (null when the command has no such option). */
        BandSet bands(Gray gray) {
            boolean oneBand = gray != null && gray.on();
            if (oneBand && edges != null) {
                throw new UserError("give --gray or --band-edges, not both", ExitCodes.BAD_INPUT);
            }
            if (oneBand) {
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
                    throw new UserError("--band-edges: '" + parts[i].trim() + "' is not a number (write e.g. 1.5,3,6"
                            + " in µm)", ExitCodes.BAD_INPUT);
                }
            }
            if (e.length > Limits.BAND_EDGES.max()) {
                throw new UserError("--band-edges: at most " + Limits.number(Limits.BAND_EDGES.max()) + " edges, got "
                        + e.length, ExitCodes.BAD_INPUT);
            }
            for (double x : e) {
                if (Double.isFinite(x) && x > 0 && !Limits.WAVELENGTH_UM.contains(x)) {
                    throw new UserError("--band-edges: an edge must lie " + Limits.WAVELENGTH_UM.describe() + ", got "
                            + Limits.number(x) + " µm", ExitCodes.BAD_INPUT);
                }
            }
            try {
                return new BandSet(e, "command line: --band-edges");
            } catch (IllegalArgumentException ex) {
                throw new UserError("--band-edges: " + ex.getMessage(), ExitCodes.BAD_INPUT);
            }
        }
    }

    /** {@code --vf-tolerance T}: the view-factor tolerance, replacing the case's. */
    static final class VfTolerance {
        @Option(names = "--vf-tolerance", paramLabel = "T", descriptionKey = "vf-tolerance",
                description = "Target of the facet rows of a geometry's view factors (estimated error, and closure"
                        + " of a closed geometry); replaces geometry.options.tolerance (default 1e-5). Exit 3 if not met.")
        private Double value;

        /** @return the tolerance, or null when not given */
        Double value() {
            if (value != null && !(value >= 1e-10 && value <= 0.1)) {
                throw new UserError("--vf-tolerance must be between 1e-10 and 0.1, got " + value, ExitCodes.BAD_INPUT);
            }
            return value;
        }

        /** @return the cached, quiet request with this override */
        org.exitance.pipeline.ViewFactorStage.Request request() {
            return org.exitance.pipeline.ViewFactorStage.Request.DEFAULT.withTolerance(value());
        }
    }

    /** {@code --band-tolerance PERCENT}: when adaptive band refinement stops. */
    static final class BandTolerance {
        @Option(names = "--band-tolerance", paramLabel = "PERCENT", defaultValue = "0.1", descriptionKey = "band-tolerance",
                description = "Adaptive bands stop at this percent (default ${DEFAULT-VALUE}).")
        private double percent;

        /** The tolerance as a fraction of the largest |net heat|. */
        double fraction() {
            if (!(percent > 0) || !Double.isFinite(percent)) {
                throw new UserError("--band-tolerance must be a positive number of percent", ExitCodes.BAD_INPUT);
            }
            return percent / 100;
        }
    }
}
