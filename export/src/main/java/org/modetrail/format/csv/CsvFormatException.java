package org.modetrail.format.csv;

import java.io.IOException;
import java.nio.file.Path;

/** A CSV file the user gave is wrong at a line; the message names the file and the line and says what to fix. */
public class CsvFormatException extends IOException {
    private final Path file;
    private final int line;

    /** {@code line} 0 for a problem with the whole file (missing, not text): the message then names no line. */
    public CsvFormatException(Path file, int line, String problem) {
        super(file + (line > 0 ? ", line " + line : "") + ": " + problem);
        this.file = file;
        this.line = line;
    }

    public Path file() {
        return file;
    }

    /** 1-based line number; 0 when the problem is with the whole file. */
    public int line() {
        return line;
    }
}
