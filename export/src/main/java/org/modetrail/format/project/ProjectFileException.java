package org.modetrail.format.project;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A project file that cannot be read: damaged, cut short, from a newer Modetrail, or holding values the model
 * refuses. The message starts with the file, then the line and column when known, then what is wrong and what to
 * do, so the editor can show it as it is.
 */
public final class ProjectFileException extends IOException {
    private final Path file;
    private final int line;
    private final int column;

    /**
     * @param file   the file being read
     * @param line   1-based line, or 0 when the place is not known (a value found after an upgrade, say)
     * @param column 1-based column in characters, or 0 when not known
     * @param detail what is wrong and what to do
     */
    public ProjectFileException(Path file, int line, int column, String detail, Throwable cause) {
        super(file + where(line, column) + ": " + detail, cause);
        this.file = file;
        this.line = Math.max(line, 0);
        this.column = Math.max(column, 0);
    }

    public ProjectFileException(Path file, int line, int column, String detail) {
        this(file, line, column, detail, null);
    }

    private static String where(int line, int column) {
        if (line <= 0) {
            return "";
        }
        return column > 0 ? " line " + line + " column " + column : " line " + line;
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
}
