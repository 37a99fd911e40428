package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.nio.file.Path;

/**
 * A parser with typed reads that fail with the file, line and column of the offending value, so every message the
 * user sees points at a place they can open in a text editor.
 */
final class JsonCursor {
    private final JsonParser parser;
    private final Path file;

    JsonCursor(JsonParser parser, Path file) {
        this.parser = parser;
        this.file = file;
    }

    Path file() {
        return file;
    }

    /** The next token; end of input inside the document is an error (the file was cut short). */
    JsonToken next() throws IOException {
        JsonToken t = parser.nextToken();
        if (t == null) {
            throw failHere("the file ends in the middle of the project (cut short while saving or copying?); "
                    + "open the backup (.bak) or the recovery file instead");
        }
        return t;
    }

    JsonToken current() {
        return parser.currentToken();
    }

    /** Whether anything but white space follows the document. */
    boolean atEnd() throws IOException {
        return parser.nextToken() == null;
    }

    void expect(JsonToken wanted, String what) throws IOException {
        if (next() != wanted) {
            throw fail(what + " should be " + describe(wanted) + ", found " + describe(parser.currentToken()));
        }
    }

    String fieldName() throws IOException {
        return parser.currentName();
    }

    int readInt(String what) throws IOException {
        JsonToken t = next();
        if (t != JsonToken.VALUE_NUMBER_INT) {
            throw fail(what + " should be a whole number, found " + describe(t));
        }
        if (parser.getNumberType() != JsonParser.NumberType.INT) {
            throw fail(what + " is " + parser.getText() + ", beyond the range of a whole number here");
        }
        return parser.getIntValue();
    }

    double readDouble(String what) throws IOException {
        next();
        return currentDouble(what);
    }

    /** The number the cursor is on (after {@link #next()}). */
    double currentDouble(String what) throws IOException {
        JsonToken t = current();
        if (t != JsonToken.VALUE_NUMBER_INT && t != JsonToken.VALUE_NUMBER_FLOAT) {
            throw fail(what + " should be a number, found " + describe(t));
        }
        double d = parser.getDoubleValue();
        if (!Double.isFinite(d)) {
            throw fail(what + " is " + parser.getText() + ", too large for a number");
        }
        return d;
    }

    String readString(String what) throws IOException {
        JsonToken t = next();
        if (t != JsonToken.VALUE_STRING) {
            throw fail(what + " should be a string in quotes, found " + describe(t));
        }
        return parser.getText();
    }

    /** The text of the current token (a string the caller has just checked for). */
    String textOfCurrent() throws IOException {
        return parser.getText();
    }

    void skipValue() throws IOException {
        next();
        parser.skipChildren();
    }

    /** Where the current token starts. */
    JsonLocation location() {
        return parser.currentTokenLocation();
    }

    ProjectFileException fail(String detail) {
        return failAt(location(), detail);
    }

    ProjectFileException failHere(String detail) {
        return failAt(parser.currentLocation(), detail);
    }

    ProjectFileException failAt(JsonLocation at, String detail) {
        return new ProjectFileException(file, at == null ? 0 : at.getLineNr(), at == null ? 0 : at.getColumnNr(),
                detail);
    }

    static String describe(JsonToken t) {
        if (t == null) {
            return "the end of the file";
        }
        return switch (t) {
            case START_OBJECT -> "an object {…}";
            case END_OBJECT -> "the end of an object '}'";
            case START_ARRAY -> "a list […]";
            case END_ARRAY -> "the end of a list ']'";
            case FIELD_NAME -> "a field name";
            case VALUE_STRING -> "a string";
            case VALUE_NUMBER_INT -> "a whole number";
            case VALUE_NUMBER_FLOAT -> "a number";
            case VALUE_TRUE, VALUE_FALSE -> "true or false";
            case VALUE_NULL -> "null";
            default -> t.toString();
        };
    }
}
