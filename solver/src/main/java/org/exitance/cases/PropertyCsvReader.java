package org.exitance.cases;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads tabulated spectral emissivity from a CSV file beside the case (Jackson's CSV module).
 * The header names the columns; two layouts are accepted:
 * <pre>
 *   wavelength_um,emissivity
 *   temperature_K,wavelength_um,emissivity      (rows grouped by temperature, in any order)
 * </pre>
 * Lines starting with '#' are comments.
 */
final class PropertyCsvReader {
    private PropertyCsvReader() {
    }

    /** One emissivity table at one temperature (NaN when the file has no temperature column). */
    record Table(double temperatureK, double[] wavelengthUm, double[] emissivity, int firstLine) {
    }

    /**
     * @param csv      the CSV file
     * @param referrer the JSON position that names it, for errors about the reference itself
     * @return tables sorted by temperature (one table with NaN temperature when there is no temperature column)
     */
    static List<Table> read(Path csv, JsonCursor referrer) throws CaseException {
        return read(csv, referrer, "emissivity");
    }

    /**
     * As {@link #read(Path, JsonCursor)} for a property column of another name: {@code
     * transmissivity} or {@code reflectivity} of a window (the header is then
     * {@code wavelength_um,<column>}, with an optional leading {@code temperature_K}).
     */
    static List<Table> read(Path csv, JsonCursor referrer, String column) throws CaseException {
        if (!Files.isRegularFile(csv)) {
            throw referrer.error("property file not found: " + csv);
        }
        FileLimits.requireReadable(csv, referrer);
        CsvCells.Rows read;
        try {
            read = CsvCells.read(csv);
        } catch (NoSuchFileException e) {
            throw referrer.error("property file not found: " + csv);
        } catch (IOException | RuntimeException e) {
            throw new CaseException(csv, "", "unreadable CSV: " + CaseException.oneLine(e.getMessage()));
        }
        List<Map<String, String>> rows = read.rows();
        List<Integer> lines = read.lines();
        List<String> header = read.header();
        boolean withT = header.contains("temperature_K");
        List<String> expected = withT ? List.of("temperature_K", "wavelength_um", column)
                : List.of("wavelength_um", column);
        if (!header.equals(expected)) {
            throw new CaseException(csv, "", "line " + Math.max(1, CsvCells.headerLine(csv)) + ": header must be 'wavelength_um,"
                    + column + "' or 'temperature_K,wavelength_um," + column + "', got '" + String.join(",", header) + "'");
        }
        if (rows.isEmpty()) {
            throw new CaseException(csv, "", "no data rows");
        }
        CsvCells.requireRowCount(csv, rows.size());
        Map<Double, List<double[]>> byT = new LinkedHashMap<>();
        Map<Double, Integer> firstLine = new LinkedHashMap<>();
        for (int r = 0; r < rows.size(); r++) {
            Map<String, String> row = rows.get(r);
            int line = lines.get(r);
            double t = withT ? CsvCells.number(csv, line, "temperature_K", row) : Double.NaN;
            if (withT && !(t > 0)) {
                throw new CaseException(csv, "", "line " + line + ": temperature_K must be above 0 K, got " + t);
            }
            if (withT && !Limits.TEMPERATURE_K.contains(t)) {
                throw CsvCells.outOfRange(csv, line, "temperature_K", t, Limits.TEMPERATURE_K);
            }
            double w = CsvCells.number(csv, line, "wavelength_um", row);
            double e = CsvCells.number(csv, line, column, row);
            byT.computeIfAbsent(t, k -> new ArrayList<>()).add(new double[] {w, e, line});
            firstLine.putIfAbsent(t, line);
        }
        List<Table> out = new ArrayList<>();
        for (Map.Entry<Double, List<double[]>> e : byT.entrySet()) {
            List<double[]> pts = e.getValue();
            double[] w = new double[pts.size()];
            double[] v = new double[pts.size()];
            for (int i = 0; i < w.length; i++) {
                w[i] = pts.get(i)[0];
                v[i] = pts.get(i)[1];
                int line = (int) pts.get(i)[2];
                if (!(w[i] > 0)) {
                    throw new CaseException(csv, "", "line " + line + ": wavelength_um must be positive, got " + w[i]);
                }
                if (!Limits.WAVELENGTH_UM.contains(w[i])) {
                    throw CsvCells.outOfRange(csv, line, "wavelength_um", w[i], Limits.WAVELENGTH_UM);
                }
                if (i > 0 && !(w[i] > w[i - 1])) {
                    throw new CaseException(csv, "", "line " + line + ": wavelengths must increase, got "
                            + w[i] + " after " + w[i - 1]);
                }
                if (v[i] < 0 || v[i] > 1) {
                    throw new CaseException(csv, "", "line " + line + ": " + column + " must lie in [0, 1], got " + v[i]);
                }
            }
            out.add(new Table(e.getKey(), w, v, firstLine.get(e.getKey())));
        }
        out.sort((a, b) -> Double.compare(a.temperatureK(), b.temperatureK()));
        return out;
    }

}
