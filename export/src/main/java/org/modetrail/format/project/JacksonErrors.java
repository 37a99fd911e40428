package org.modetrail.format.project;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import java.nio.file.Path;

/** Turns the parser's exceptions into messages for the user, with the line and column the parser reached. */
final class JacksonErrors {
    private static final String WHAT_TO_DO = "; open the backup (.bak) or the recovery file instead, "
            + "or correct the file in a text editor";

    private JacksonErrors() {
    }

    static ProjectFileException translate(Path file, JsonProcessingException e, JsonLocation fallback,
                                          ProjectLimits limits) {
        JsonLocation at = e.getLocation() != null && e.getLocation().getLineNr() > 0 ? e.getLocation() : fallback;
        int line = at == null ? 0 : at.getLineNr();
        int column = at == null ? 0 : at.getColumnNr();
        return new ProjectFileException(file, line, column, describe(e, limits), e);
    }

    private static String describe(JsonProcessingException e, ProjectLimits limits) {
        String original = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        if (e instanceof StreamConstraintsException) {
            return limitMessage(original, limits) + "; this is not a project Modetrail wrote, so it was not read";
        }
        if (original.startsWith("Unexpected end-of-input")) {
            return "the file ends in the middle of the project (cut short while saving or copying?)" + WHAT_TO_DO;
        }
        // Jackson's own wording is precise ("Unexpected character ('x' (code 120))…"); keep its first line only.
        int newline = original.indexOf('\n');
        String first = newline < 0 ? original : original.substring(0, newline);
        return "this is not valid JSON here: " + first + WHAT_TO_DO;
    }

    private static String limitMessage(String original, ProjectLimits limits) {
        String lower = original.toLowerCase(java.util.Locale.ROOT);
        if (lower.contains("nesting depth")) {
            return "lists and objects are nested more than " + limits.maxNestingDepth() + " deep";
        }
        if (lower.contains("string value length") || lower.contains("name length")) {
            // The parser counts a number's digits in the same buffer, so this may be a very long number too.
            return "a value (string or number) is longer than " + limits.maxStringChars() + " characters";
        }
        if (lower.contains("number value length")) {
            return "a number has more than " + limits.maxNumberChars() + " digits";
        }
        if (lower.contains("document length")) {
            return "the file is larger than " + limits.maxDocumentBytes() + " bytes";
        }
        return "the file exceeds a safety limit (" + original + ")";
    }
}
