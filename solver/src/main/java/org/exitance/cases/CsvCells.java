package org.exitance.cases;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Reading and cell parsing shared by the CSV readers (Jackson's CSV module): rows by header
 * name with the line each came from; spaces trimmed, blank lines skipped, lines starting with '#'
 * are comments. Errors name the file and line.
 */
final class CsvCells {
    private CsvCells() {
    }

    /**
     * A file's data rows.
     *
     * @param header column names as the header gives them
     * @param rows   each data row, by column name
     * @param lines  the line (1-based) of each row
     */
    record Rows(List<String> header, List<Map<String, String>> rows, List<Integer> lines) {
    }

    /**
     * Reads every row; the caller turns a failure into its own message.
     *
     * @throws IOException      the file cannot be read or parsed as CSV
     * @throws RuntimeException the parser failed in another way
     */
    static Rows read(Path csv) throws IOException {
        CsvMapper mapper = new CsvMapper();
        mapper.enable(CsvParser.Feature.TRIM_SPACES);
        mapper.enable(CsvParser.Feature.SKIP_EMPTY_LINES);
        mapper.enable(CsvParser.Feature.ALLOW_COMMENTS);
        CsvSchema schema = CsvSchema.emptySchema().withHeader().withComments();
        List<Map<String, String>> rows = new ArrayList<>();
        List<Integer> lines = new ArrayList<>();
        List<String> header = new ArrayList<>();
        try (MappingIterator<Map<String, String>> it = mapper.readerFor(Map.class).with(schema).readValues(csv.toFile())) {
            while (it.hasNextValue()) {
                // the row's own line: read before nextValue, which moves on past the line end
                int line = it.getCurrentLocation().getLineNr();
                rows.add(it.nextValue());
                lines.add(line);
            }
            ((CsvSchema) it.getParserSchema()).forEach(c -> header.add(c.getName()));
        }
        return new Rows(header, rows, lines);
    }

    /** A finite number from the named column of a row read at the given line. */
    static double number(Path csv, int line, String column, Map<String, String> row) throws CaseException {
        String s = row.get(column);
        if (s == null || s.isEmpty()) {
            throw new CaseException(csv, "", "line " + line + ": missing value for " + column);
        }
        try {
            double v = Double.parseDouble(s);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new CaseException(csv, "", "line " + line + ": " + column + " is not a number: '" + s + "'");
    }

    /** The error for a cell outside its range ({@link Limits}). */
    static CaseException outOfRange(Path csv, int line, String column, double v, Limits.Range r) {
        return new CaseException(csv, "", "line " + line + ": " + column + " must lie " + r.describe()
                + " (see Limits in docs/case-format.md), got " + Limits.number(v));
    }

    /** A table may have at most {@link Limits#TABLE_POINTS} rows. */
    static void requireRowCount(Path csv, int rows) throws CaseException {
        if (rows > Limits.TABLE_POINTS.max()) {
            throw new CaseException(csv, "", rows + " data rows; a table may have at most "
                    + Limits.number(Limits.TABLE_POINTS.max()) + " (see Limits in docs/case-format.md)");
        }
    }

    /**
     * The line of the header: the first line that is neither blank nor a comment; −1 if there is
     * none; 1 if the file cannot be read here (the parser then reports why).
     */
    static int headerLine(Path csv) {
        try {
            List<String> all = Files.readAllLines(csv);
            for (int i = 0; i < all.size(); i++) {
                String t = all.get(i).trim();
                if (!t.isEmpty() && !t.startsWith("#")) {
                    return i + 1;
                }
            }
        } catch (IOException | RuntimeException e) {
            return 1;
        }
        return -1;
    }
}
