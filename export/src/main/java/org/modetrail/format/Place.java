package org.modetrail.format;

/**
 * Where in an imported file a value was read, for messages.
 *
 * @param line     1-based line, 0 when not known
 * @param column   1-based column, 0 when not known
 * @param jsonPath JSON Pointer of the value in a JSON file, null in a text file
 */
public record Place(int line, int column, String jsonPath) {
    public static Place line(int line) {
        return new Place(line, 0, null);
    }

    public ImportException error(java.nio.file.Path file, String problem) {
        return new ImportException(file, line, column, jsonPath, problem);
    }
}
