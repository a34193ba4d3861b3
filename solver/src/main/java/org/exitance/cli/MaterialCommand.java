package org.exitance.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.exitance.cases.Limits;
import org.exitance.cases.MaterialFileReader;
import org.exitance.cases.MaterialFileReader.MaterialFile;
import org.exitance.cases.SourceSpectrumCsvReader;
import org.exitance.model.Material;
import org.exitance.properties.MaterialSurvey;
import org.exitance.properties.SpectralCurves;
import org.exitance.properties.TemperatureRange;
import org.exitance.report.MaterialJsonWriter;
import org.exitance.report.MaterialTableWriter;
import org.exitance.report.SolveJsonWriter;
import org.exitance.report.SpectrumPlot;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code exitance material FILE}: total emissivity ε(T) over a temperature range, total
 * absorptivity α for blackbody sources and a tabulated source spectrum, and α/ε; as a table,
 * JSON, and a PNG plot of ε(λ), ρ(λ) and a window's τ(λ) with normalized Planck curves. Definitions: Siegel &amp; Howell,
 * Thermal Radiation Heat Transfer, 7th ed., Ch. 3; Incropera et al., 6th ed., Secs. 12.4–12.7.
 */
@Command(name = "material", mixinStandardHelpOptions = true,
        description = {"Total properties of a material: emissivity ε(T) over a temperature range, absorptivity α"
                + " for a blackbody source or a tabulated source spectrum, and α/ε.",
                "FILE is a case (all its materials, or one with --name) or a material file"
                + " {\"materials\": {...}} (see docs/case-format.md). Without a source option the source is a"
                + " 5772 K blackbody (the sun, common practice).",
                "The plot (--plot FILE.png) shows ε(λ), ρ(λ) and a window's τ(λ) with normalized Planck curves on a log wavelength axis;"
                + " PNG (the HTML report, --report DIR, carries the same plot as SVG)."},
        footer = {"", "Example: exitance material cases/materials/white-paint.json --from-K 250 --to-K 400"
                + " --step-K 50 --plot white-paint.png", "", ExitCodes.HELP})
final class MaterialCommand implements Callable<Integer> {
    /** Most surface temperatures drawn on a plot; more are thinned evenly. */
    static final int PLOT_TEMPERATURES = 5;
    /** The source when none is named: the sun as a blackbody at its effective temperature (common practice). */
    static final double DEFAULT_SOURCE_K = 5772;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A case file or a material file (JSON).")
    private Path file;

    @Option(names = "--name", paramLabel = "MATERIAL", description = "Report only this material.")
    private String name;

    @Option(names = "--from-K", paramLabel = "K", defaultValue = "300",
            description = "First surface temperature in K (default: ${DEFAULT-VALUE}).")
    private double fromK;

    @Option(names = "--to-K", paramLabel = "K", defaultValue = "1500",
            description = "Last surface temperature in K (default: ${DEFAULT-VALUE}).")
    private double toK;

    @Option(names = "--step-K", paramLabel = "K", defaultValue = "100",
            description = "Temperature step in K (default: ${DEFAULT-VALUE}); the last temperature is always --to-K.")
    private double stepK;

    @Option(names = "--source-K", paramLabel = "K", split = ",",
            description = "Blackbody source temperature(s) in K for α, e.g. 5772 or 5772,1200 (repeatable).")
    private List<Double> sourceK = new ArrayList<>();

    @Option(names = "--source-spectrum", paramLabel = "FILE.csv",
            description = "A source spectrum: CSV with header wavelength_um,irradiance_W_m2_um (W/(m²·µm)).")
    private Path sourceSpectrum;

    @Mixin
    private SharedOptions.Json json;

    @Mixin
    private SharedOptions.Output output;

    @Option(names = "--plot", paramLabel = "FILE.png", description = "Also draw ε(λ), ρ(λ), τ(λ) and Planck curves into a PNG file.")
    private Path plot;

    @Mixin
    private SharedOptions.Force force;

    @Mixin
    private SharedOptions.Report report;

    @Override
    public Integer call() throws Exception {
        checkTargets();
        MaterialFile mf = MaterialFileReader.read(file);
        if (mf.isCase()) {
            Runs.load(file); // a case is checked in full, view factors included, as every command checks it
        }
        List<Material> materials = mf.select(name);
        if (plot != null && materials.size() != 1) {
            throw new UserError("--plot draws one material; choose it with --name (materials in " + file + ": "
                    + String.join(", ", materials.stream().map(Material::name).toList()) + ")", ExitCodes.BAD_INPUT);
        }
        double[] temperatures = temperatures();
        List<IrradiationSource> sources = sources();
        List<MaterialSurvey> surveys = new ArrayList<>();
        for (Material m : materials) {
            surveys.add(MaterialSurvey.of(m, temperatures, sources));
        }

        PrintStream stdout = new PrintStream(new WriterOutputStream(spec.commandLine().getOut()), true,
                StandardCharsets.UTF_8);
        if (plot != null) {
            writePlot(materials.get(0), temperatures, sources, stdout);
        }
        Path reportFile = report.file(file, "material");
        if (reportFile != null) {
            Reports.write(reportFile, force, org.exitance.report.html.HtmlReport.material(file.toString(), mf.title(),
                    surveys, temperatures, mf.warnings()));
        }
        if (json.on()) {
            com.fasterxml.jackson.databind.node.ObjectNode doc =
                    MaterialJsonWriter.toJson(file.toString(), mf.isCase(), mf.title(), surveys);
            mf.warnings().forEach(doc.putArray("warnings")::add);
            String text = SolveJsonWriter.MAPPER.writeValueAsString(doc);
            OutputTarget.write(output.file(), force, stdout, ps -> ps.println(text));
        } else {
            String label = file + (mf.isCase() ? " (case)" : " (material file)");
            OutputTarget.write(output.file(), force, stdout, ps -> {
                MaterialTableWriter.write(label, mf.title(), surveys, ps);
                mf.warnings().forEach(w -> ps.println("Warning: " + w));
            });
        }
        return ExitCodes.OK;
    }

    /** Refuses a plot format we cannot write, and existing files, before any work is done. */
    private void checkTargets() {
        if (plot != null) {
            String n = plot.getFileName().toString().toLowerCase(Locale.ROOT);
            if (n.endsWith(".svg")) {
                throw new UserError(plot + ": --plot writes PNG; name a .png file (--report DIR writes an HTML"
                        + " report that carries the plot as SVG)", ExitCodes.BAD_INPUT);
            }
            if (!n.endsWith(".png")) {
                throw new UserError(plot + ": the plot file must end in .png", ExitCodes.BAD_INPUT);
            }
            if (output.file() != null
                    && plot.toAbsolutePath().normalize().equals(output.file().toAbsolutePath().normalize())) {
                throw new UserError(plot + ": --plot and --output name the same file", ExitCodes.BAD_INPUT);
            }
        }
        Path reportFile = report.file(file, "material");
        for (Path p : new Path[] {plot, output.file(), reportFile}) {
            OutputTarget.check(p, force);
        }
    }

    private double[] temperatures() {
        try {
            for (double t : new double[] {fromK, toK}) {
                if (Double.isFinite(t) && t > 0 && !Limits.TEMPERATURE_K.contains(t)) {
                    throw new UserError("--from-K/--to-K: temperatures must lie " + Limits.TEMPERATURE_K.describe()
                            + ", got " + Limits.number(t) + " K", ExitCodes.BAD_INPUT);
                }
            }
            return new TemperatureRange(fromK, toK, stepK).temperaturesK();
        } catch (IllegalArgumentException e) {
            throw new UserError("--from-K/--to-K/--step-K: " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
    }

    private List<IrradiationSource> sources() throws Exception {
        List<IrradiationSource> out = new ArrayList<>();
        List<Double> temps = sourceK.isEmpty() && sourceSpectrum == null ? List.of(DEFAULT_SOURCE_K) : sourceK;
        for (double t : temps) {
            if (Double.isFinite(t) && t > 0 && !Limits.SOURCE_TEMPERATURE_K.contains(t)) {
                throw new UserError("--source-K: a source temperature must lie " + Limits.SOURCE_TEMPERATURE_K.describe()
                        + ", got " + Limits.number(t) + " K", ExitCodes.BAD_INPUT);
            }
            try {
                out.add(new BlackbodySource(t));
            } catch (IllegalArgumentException e) {
                throw new UserError("--source-K: " + e.getMessage(), ExitCodes.BAD_INPUT);
            }
        }
        if (sourceSpectrum != null) {
            out.add(SourceSpectrumCsvReader.read(sourceSpectrum));
        }
        return out;
    }

    private void writePlot(Material m, double[] temperatures, List<IrradiationSource> sources, PrintStream stdout) {
        double[] shown = SpectralCurves.pickForPlot(temperatures, PLOT_TEMPERATURES);
        SpectralCurves curves = SpectralCurves.of(m, shown, sources);
        String sub = m.description();
        if (shown.length < temperatures.length) {
            sub = (sub.isEmpty() ? "" : sub + " — ") + "Planck curves for " + shown.length + " of the "
                    + temperatures.length + " temperatures";
        }
        String title = "Material " + m.name() + ": spectral emissivity, reflectivity"
                + (m.semiTransparent() ? ", transmissivity" : "") + " and Planck curves";
        String subtitle = sub;
        OutputTarget.write(plot, force, stdout, ps -> {
            try {
                SpectrumPlot.writePng(title, subtitle, curves, ps);
            } catch (IOException e) {
                throw new UserError(plot + ": cannot write the plot: " + OutputTarget.problem(e), ExitCodes.BAD_INPUT);
            }
            if (ps.checkError()) {
                throw new UserError(plot + ": cannot write the plot", ExitCodes.BAD_INPUT);
            }
        });
    }
}
