package org.modetrail.demo;

import java.io.BufferedWriter;
import java.io.OutputStreamWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import org.modetrail.format.project.AtomicWrite;

/**
 * Writes files so that readers see either the old file or the complete new one, never a partial write: the content
 * goes to a temporary file in the same folder (same file system, so the rename is atomic) and is renamed over the
 * target.
 */
final class AtomicFiles {

    private AtomicFiles() {
    }

    /** Something that writes text. */
    interface TextContent {
        void writeTo(Writer out) throws IOException;
    }

    static void writeText(Path target, TextContent content) throws IOException {
        AtomicWrite.replace(target, os -> {
            BufferedWriter out = new BufferedWriter(new OutputStreamWriter(os, StandardCharsets.UTF_8));
            content.writeTo(out);
            out.flush();
        });
    }

    static void moveIntoPlace(Path temp, Path target) throws IOException {
        // Temp files are created owner-only; the finished file should be as readable as any other.
        try {
            Files.setPosixFilePermissions(temp, PosixFilePermissions.fromString("rw-r--r--"));
        } catch (UnsupportedOperationException e) {
            // Not a POSIX file system: it has its own defaults.
        }
        try {
            Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            // Some file systems cannot rename atomically; replacing is the best they offer.
            Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
