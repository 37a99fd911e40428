package org.modetrail.format.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Files made to hurt the reader: each must be refused quickly, with a message, and without running out of heap. */
class HostileFileTest {
    private static final String HEAD = "{\"format\": \"modetrail-project\", \"schema\": 2,\n";

    @TempDir
    Path dir;

    private interface Body {
        void write(OutputStream out) throws IOException;
    }

    private Path file(Body body) throws IOException {
        Path file = dir.resolve("hostile.json");
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            out.write(HEAD.getBytes(StandardCharsets.US_ASCII));
            body.write(out);
        }
        return file;
    }

    private static void repeat(OutputStream out, byte b, long times) throws IOException {
        byte[] chunk = new byte[1 << 16];
        java.util.Arrays.fill(chunk, b);
        for (long left = times; left > 0; left -= chunk.length) {
            out.write(chunk, 0, (int) Math.min(left, chunk.length));
        }
    }

    private static ProjectFileException refused(Path file) {
        return assertTimeoutPreemptively(Duration.ofSeconds(5),
                () -> assertThrows(ProjectFileException.class, () -> ProjectFile.read(file)));
    }

    @Test
    void deepNestingIsRefused() throws Exception {
        Path file = file(out -> {
            // In a field the reader skips, so only the parser's own depth limit can stop it.
            out.write("\"junk\": ".getBytes(StandardCharsets.US_ASCII));
            repeat(out, (byte) '[', 10_000);
            repeat(out, (byte) ']', 10_000);
            out.write('}');
        });
        ProjectFileException e = refused(file);
        assertTrue(e.getMessage().contains("nested more than 32 deep"), e.getMessage());
        assertEquals(2, e.line());
    }

    @Test
    void hundredMegabyteStringIsRefused() throws Exception {
        Path file = file(out -> {
            out.write("\"video\": {\"path\": \"".getBytes(StandardCharsets.US_ASCII));
            repeat(out, (byte) 'a', 100L << 20);
            out.write("\"}}".getBytes(StandardCharsets.US_ASCII));
        });
        ProjectFileException e = refused(file);
        assertTrue(e.getMessage().contains("a value (string or number) is longer than 1000000 characters"),
                e.getMessage());
    }

    @Test
    void hundredMegabyteStringIsRefusedWhereItIsSkipped() throws Exception {
        // In an unknown field before the schema: the first pass skips it without keeping it.
        Path file = dir.resolve("skipped.json");
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            out.write("{\"junk\": \"".getBytes(StandardCharsets.US_ASCII));
            repeat(out, (byte) 'a', 100L << 20);
            out.write("\"}".getBytes(StandardCharsets.US_ASCII));
        }
        ProjectFileException e = refused(file);
        assertTrue(e.getMessage().contains("not a Modetrail project file"), e.getMessage());
    }

    @Test
    void hugeNumberIsRefused() throws Exception {
        Path file = file(out -> {
            out.write("\"video\": {\"path\": \"a\", \"width\": ".getBytes(StandardCharsets.US_ASCII));
            repeat(out, (byte) '9', 10_000_000);
            out.write("}}".getBytes(StandardCharsets.US_ASCII));
        });
        ProjectFileException e = refused(file);
        // The parser's buffer limit (shared with strings) stops it after a million digits, long before ten.
        assertTrue(e.getMessage().contains("a value (string or number) is longer than 1000000 characters")
                || e.getMessage().contains("a number has more than 64 digits"), e.getMessage());
    }

    @Test
    void numberBeyondIntIsRefusedAsAFrame() throws Exception {
        Path file = dir.resolve("p.json");
        Files.writeString(file, DamagedFileTest.VALID.replace("[2,\"k\"", "[99999999999,\"k\""));
        ProjectFileException e = refused(file);
        assertTrue(e.getMessage().contains("is 99999999999, beyond the range of a whole number"), e.getMessage());
    }

    @Test
    void fileAboveTheSizeLimitIsRefusedBeforeParsing() throws Exception {
        Path file = dir.resolve("p.json");
        Files.writeString(file, DamagedFileTest.VALID + " ".repeat(1024));
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> ProjectFile.read(file, ProjectLimits.DEFAULT.withMaxDocumentBytes(1024)));
        assertTrue(e.getMessage().contains("more than the 1024 a project may have"), e.getMessage());
    }

    @Test
    void tooManyAnnotationsAreRefused() throws Exception {
        Path file = dir.resolve("p.json");
        Files.writeString(file, DamagedFileTest.VALID);
        ProjectFileException e = assertThrows(ProjectFileException.class,
                () -> ProjectFile.read(file, ProjectLimits.DEFAULT.withMaxAnnotations(2)));
        assertTrue(e.getMessage().contains("line 12 column 7: more than 2 frame annotations"), e.getMessage());
    }

    @Test
    void limitsAreValidated() {
        assertThrows(IllegalArgumentException.class, () -> ProjectLimits.DEFAULT.withMaxAnnotations(0));
        assertThrows(IllegalArgumentException.class, () -> new ProjectLimits(1 << 20, 4, 1000, 30, 1, 1, 1));
    }
}
