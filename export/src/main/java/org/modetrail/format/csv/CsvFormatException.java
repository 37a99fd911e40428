package org.modetrail.format.csv;

import java.io.IOException;
import java.nio.file.Path;

/** A CSV file the user gave is wrong at a line; the message names the file and the line and says what to fix. */
public class CsvFormatException extends IOException {
    private final Path file;
    private final int line;

    public CsvFormatException(Path file, int line, String problem) {
        super(file + ", line " + line + ": " + problem);
        this.file = file;
        this.line = line;
    }

    public Path file() {
        return file;
    }

    /** 1-based line number. */
    public int line() {
        return line;
    }
}
