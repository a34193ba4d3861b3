package org.exitance.cases;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/** Cell parsing and line bookkeeping shared by the CSV readers; errors name the file and line. */
final class CsvCells {
    private CsvCells() {
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
