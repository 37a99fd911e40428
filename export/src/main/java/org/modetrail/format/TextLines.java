package org.modetrail.format;

import java.io.BufferedReader;
import java.io.Closeable;
import java.io.IOException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads a text file line by line with bounds: the file's size is checked before reading and no line may be longer
 * than the limit, so a file without line breaks cannot fill the memory. UTF-8; a byte-order mark is dropped.
 */
public final class TextLines implements Closeable {
    private final Path file;
    private final BufferedReader in;
    private final int maxLineChars;
    private final StringBuilder line = new StringBuilder();
    private int number;

    private TextLines(Path file, BufferedReader in, int maxLineChars) {
        this.file = file;
        this.in = in;
        this.maxLineChars = maxLineChars;
    }

    /** @param what how the user names this file, for the message when it is missing ("the MOT file") */
    public static TextLines open(Path file, ImportLimits limits, String what) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new ImportException(file, 0, 0, null, "no such file; check the path given for " + what);
        }
        long size = Files.size(file);
        if (size > limits.maxFileBytes()) {
            throw new ImportException(file, 0, 0, null, "the file is " + size + " bytes, more than the limit of "
                    + limits.maxFileBytes() + "; split it or raise the limit");
        }
        BufferedReader in = new BufferedReader(new java.io.InputStreamReader(Files.newInputStream(file),
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16);
        return new TextLines(file, in, limits.maxLineChars());
    }

    /** The next line without its line break, or null at the end. */
    public String next() throws IOException {
        line.setLength(0);
        int c;
        boolean any = false;
        try {
            while ((c = in.read()) >= 0) {
                any = true;
                if (c == '\n') {
                    break;
                }
                if (line.length() >= maxLineChars) {
                    throw new ImportException(file, number + 1, 0, null, "the line is longer than " + maxLineChars
                            + " characters; this is not a tracks file, or it is damaged");
                }
                line.append((char) c);
            }
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new ImportException(file, number + 1, 0, null, "the file is not UTF-8 text here; save it as UTF-8");
        }
        if (!any) {
            return null;
        }
        number++;
        int end = line.length();
        if (end > 0 && line.charAt(end - 1) == '\r') {
            line.setLength(end - 1);
        }
        if (number == 1 && line.length() > 0 && line.charAt(0) == '\uFEFF') {
            line.deleteCharAt(0);
        }
        return line.toString();
    }

    /** 1-based number of the line {@link #next()} returned last. */
    public int number() {
        return number;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
