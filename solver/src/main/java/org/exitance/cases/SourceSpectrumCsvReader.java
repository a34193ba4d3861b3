package org.exitance.cases;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * Reads a source spectrum from a CSV file (Jackson's CSV module):
 * <pre>
 *   # comment lines start with '#'
 *   wavelength_um,irradiance_W_m2_um
 *   0.30,510.0
 *   0.50,1950.0
 * </pre>
 * Wavelengths in µm, at least two, strictly increasing; spectral irradiance in W/(m²·µm), ≥ 0,
 * not all zero. Every error is a {@link CaseException} naming the file and, where there is one,
 * the line.
 */
public final class SourceSpectrumCsvReader {
    /** The required header. */
    public static final String HEADER = "wavelength_um,irradiance_W_m2_um";

    private SourceSpectrumCsvReader() {
    }

    /** Reads the file; the spectrum's label is the file name. */
    public static SourceSpectrum read(Path csv) throws CaseException {
        if (!Files.exists(csv)) {
            throw new CaseException(csv, "", "file not found");
        }
        if (!Files.isRegularFile(csv)) {
            throw new CaseException(csv, "", "not a regular file");
        }
        FileLimits.requireReadable(csv, null);
        if (CsvCells.headerLine(csv) < 0) {
            throw new CaseException(csv, "", "empty: the first line that is not a comment must be '" + HEADER + "'");
        }
        CsvCells.Rows read;
        try {
            read = CsvCells.read(csv);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? -1 : e.getLocation().getLineNr();
            String where = line > 0 ? "line " + line + ": " : "";
            throw new CaseException(csv, "", where + "unreadable CSV: " + CaseException.oneLine(e.getOriginalMessage()));
        } catch (IOException | RuntimeException e) {
            throw new CaseException(csv, "", "unreadable CSV: " + CaseException.oneLine(e.getMessage()));
        }
        List<Map<String, String>> rows = read.rows();
        List<Integer> lines = read.lines();
        List<String> header = read.header();
        if (!String.join(",", header).equals(HEADER)) {
            throw new CaseException(csv, "", "line " + CsvCells.headerLine(csv) + ": header must be '" + HEADER + "', got '"
                    + String.join(",", header) + "'");
        }
        if (rows.size() < 2) {
            throw new CaseException(csv, "", "needs at least two data rows, got " + rows.size());
        }
        CsvCells.requireRowCount(csv, rows.size());
        double[] w = new double[rows.size()];
        double[] g = new double[rows.size()];
        for (int r = 0; r < rows.size(); r++) {
            int line = lines.get(r);
            if (rows.get(r).size() > 2) {
                throw new CaseException(csv, "", "line " + line + ": more than two values");
            }
            w[r] = CsvCells.number(csv, line, "wavelength_um", rows.get(r));
            g[r] = CsvCells.number(csv, line, "irradiance_W_m2_um", rows.get(r));
            if (!(w[r] > 0)) {
                throw new CaseException(csv, "", "line " + line + ": wavelength_um must be positive, got " + w[r]);
            }
            if (!Limits.WAVELENGTH_UM.contains(w[r])) {
                throw CsvCells.outOfRange(csv, line, "wavelength_um", w[r], Limits.WAVELENGTH_UM);
            }
            if (r > 0 && !(w[r] > w[r - 1])) {
                throw new CaseException(csv, "", "line " + line + ": wavelengths must increase, got " + w[r]
                        + " µm after " + w[r - 1] + " µm");
            }
            if (g[r] < 0) {
                throw new CaseException(csv, "", "line " + line + ": irradiance_W_m2_um must not be negative, got " + g[r]);
            }
            if (!Limits.SPECTRAL_IRRADIANCE_W_M2_UM.contains(g[r])) {
                throw CsvCells.outOfRange(csv, line, "irradiance_W_m2_um", g[r], Limits.SPECTRAL_IRRADIANCE_W_M2_UM);
            }
        }
        try {
            return new SourceSpectrum(csv.getFileName().toString(), w, g);
        } catch (IllegalArgumentException e) {
            throw new CaseException(csv, "", e.getMessage());
        }
    }

}
