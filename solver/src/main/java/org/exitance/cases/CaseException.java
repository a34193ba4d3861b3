package org.exitance.cases;

import java.nio.file.Path;

/**
 * A case file (or a file it refers to) is unreadable or invalid. The message is one line:
 * {@code FILE: JSON-PATH: problem}; the command line prints it and exits with code 2.
 */
public final class CaseException extends Exception {
    private final transient Path file;
    private final String jsonPath;
    private final String problem;

    public CaseException(Path file, String jsonPath, String problem) {
        super(file + ": " + (jsonPath == null || jsonPath.isEmpty() ? "" : jsonPath + ": ") + problem);
        this.file = file;
        this.jsonPath = jsonPath;
        this.problem = problem;
    }

    public Path file() {
        return file;
    }

    /** JSONPath-style location such as {@code $.surfaces[2].area_m2}, or "" for the whole file. */
    public String jsonPath() {
        return jsonPath;
    }

    public String problem() {
        return problem;
    }

    /** The first line of a library's message, trimmed ("unknown error" for none): messages stay one line. */
    static String oneLine(String s) {
        if (s == null) {
            return "unknown error";
        }
        int nl = s.indexOf('\n');
        return (nl >= 0 ? s.substring(0, nl) : s).trim();
    }
}
