package org.modetrail.format.project;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.function.UnaryOperator;

/**
 * Atomic replacement of any output file (exports, summaries, plots): the file under the name asked for is at every
 * moment either the old one or the complete new one ({@link AtomicWrite}), never half written.
 */
public final class AtomicFiles {
    /** Something that writes the file's bytes. */
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    public static void write(Path target, Content content) throws IOException {
        AtomicWrite.replace(target, false, content::writeTo, UnaryOperator.identity());
    }
}
