package org.modetrail.format;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A tracks file given for import is wrong at some place. The message starts with the file, then the line (and the
 * column, and for JSON the JSON Pointer of the value, when known), then what is wrong and what to do, so it can be
 * shown to the user as it is.
 */
public class ImportException extends IOException {
    private final Path file;
    private final int line;
    private final int column;
    private final String jsonPath;

    /**
     * @param file     the file being read
     * @param line     1-based line, 0 when not known
     * @param column   1-based column, 0 when not known
     * @param jsonPath JSON Pointer (RFC 6901) of the offending value, e.g. {@code /annotations/3/bbox}, or null
     * @param problem  what is wrong and what to do
     */
    public ImportException(Path file, int line, int column, String jsonPath, String problem) {
        super(file + where(line, column, jsonPath) + ": " + problem);
        this.file = file;
        this.line = Math.max(0, line);
        this.column = Math.max(0, column);
        this.jsonPath = jsonPath;
    }

    private static String where(int line, int column, String jsonPath) {
        StringBuilder s = new StringBuilder();
        if (line > 0) {
            s.append(", line ").append(line);
            if (column > 0) {
                s.append(", column ").append(column);
            }
        }
        if (jsonPath != null && !jsonPath.isEmpty()) {
            s.append(" (at ").append(jsonPath).append(')');
        }
        return s.toString();
    }

    public Path file() {
        return file;
    }

    /** 1-based line of the problem, 0 when not known. */
    public int line() {
        return line;
    }

    /** 1-based column of the problem, 0 when not known. */
    public int column() {
        return column;
    }

    /** JSON Pointer of the offending value in a JSON file, or null. */
    public String jsonPath() {
        return jsonPath;
    }
}
