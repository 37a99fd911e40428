package org.modetrail.app.bench;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * The bench's scratch folder: the generated clip and a private frame-index cache (so the user's own cache is left
 * alone). A temp folder by default, removed afterwards; a folder the user named keeps everything but what this
 * run made, and a clip made there before with the same settings is reused.
 */
final class Workspace implements AutoCloseable {
    private final Path dir;
    private final boolean ownsDir;
    private final boolean keep;
    private final List<Path> made = new ArrayList<>();

    private Workspace(Path dir, boolean ownsDir, boolean keep) {
        this.dir = dir;
        this.ownsDir = ownsDir;
        this.keep = keep;
    }

    static Workspace open(Path work, boolean keep) throws IOException {
        if (work == null) {
            return new Workspace(Files.createTempDirectory("modetrail-bench-"), true, keep);
        }
        Files.createDirectories(work);
        return new Workspace(work, false, keep);
    }

    Path dir() {
        return dir;
    }

    /** Where a generated clip with these settings lives; the name says what is in it. */
    Path clipPath(int frames, int gop) {
        return dir.resolve("testsrc2-1080p-" + frames + "f-gop" + gop + ".mp4");
    }

    /** A folder of this run's own, for the frame-index cache. */
    Path indexCacheDir() throws IOException {
        Path p = dir.resolve("frame-index");
        if (!Files.exists(p)) {
            made.add(p);
        }
        return Files.createDirectories(p);
    }

    void madeHere(Path p) {
        made.add(p);
    }

    @Override
    public void close() throws IOException {
        if (keep) {
            return;
        }
        if (ownsDir) {
            deleteTree(dir);
        } else {
            for (Path p : made) {
                deleteTree(p);
            }
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            walk.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.delete(p);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }
}
