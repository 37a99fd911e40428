package org.modetrail.format.project;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Duration;
import java.util.Set;
import java.util.function.UnaryOperator;
import java.util.regex.Pattern;

/**
 * Replaces a file so that it is at every moment either the complete old version or the complete new one, even if
 * the process is killed or the machine loses power: the content goes to a temporary file in the same folder (so
 * the rename stays on one file system), is forced to the disk, and is renamed over the target. The old version
 * can be kept as NAME.bak, made the same way so that it too is never partial.
 */
public final class AtomicWrite {
    /** A temporary file untouched this long belongs to a write that was killed. */
    static final Duration LEFTOVER_AGE = Duration.ofMinutes(2);

    /** Something that writes bytes. */
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Something that writes a whole file by its path (an encoder that opens the file itself). */
    public interface FileContent {
        /** Writes the complete content to {@code temp}, an existing empty file that may be overwritten. */
        void writeTo(Path temp) throws IOException;
    }

    private AtomicWrite() {
    }

    static Path backupOf(Path target) {
        return target.resolveSibling(target.getFileName() + ".bak");
    }

    /** Replaces {@code target} with the bytes {@code content} writes, keeping no backup. */
    public static void replace(Path target, Content content) throws IOException {
        replace(target, false, content, UnaryOperator.identity());
    }

    /**
     * Replaces {@code target} with the file {@code content} writes under a temporary name in the same folder; the
     * temporary file is forced to the disk and renamed over the target only when {@code content} returns normally.
     * When it throws (an error, a cancellation) the temporary file is deleted and the target is left as it was.
     */
    public static void replaceWithFile(Path target, FileContent content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temp = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".part");
        boolean moved = false;
        try {
            content.writeTo(temp);
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                channel.force(true);
            }
            copyPermissions(absolute, temp);
            move(temp, absolute);
            moved = true;
            syncFolder(folder);
            removeLeftovers(absolute);
        } finally {
            if (!moved) {
                Files.deleteIfExists(temp);
            }
        }
    }

    /**
     * @param wrap lets tests put a failing stream between the content and the file; {@code UnaryOperator.identity()}
     *             otherwise
     */
    static void replace(Path target, boolean keepBackup, Content content, UnaryOperator<OutputStream> wrap)
            throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        Path temp = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".part");
        boolean moved = false;
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                OutputStream out = new BufferedOutputStream(wrap.apply(Channels.newOutputStream(channel)), 1 << 16);
                content.writeTo(out);
                out.flush();
                // Without this the rename can reach the disk before the data, leaving an empty file after a crash.
                channel.force(true);
            }
            copyPermissions(absolute, temp);
            if (keepBackup && Files.exists(absolute)) {
                keepBackup(absolute, backupOf(absolute));
            }
            move(temp, absolute);
            moved = true;
            syncFolder(folder);
            removeLeftovers(absolute);
        } finally {
            if (!moved) {
                Files.deleteIfExists(temp);
            }
        }
    }

    /**
     * Deletes the temporary files a killed earlier write of {@code target} (or of its backup) left behind: those
     * named like ours and untouched for {@link #LEFTOVER_AGE}, so a write still in flight is never disturbed.
     */
    static void removeLeftovers(Path target) {
        // Files.createTempFile puts a decimal number between the prefix and the suffix.
        Pattern ours = Pattern.compile(Pattern.quote("." + target.getFileName()) + "(\\.bak)?\\.\\d+\\.part");
        long cutoff = System.currentTimeMillis() - LEFTOVER_AGE.toMillis();
        try (DirectoryStream<Path> parts = Files.newDirectoryStream(target.getParent(), "*.part")) {
            for (Path p : parts) {
                if (ours.matcher(p.getFileName().toString()).matches()
                        && Files.getLastModifiedTime(p).toMillis() < cutoff) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException e) {
            // Leftovers cost only space; the save itself has succeeded.
        }
    }

    /** Makes NAME.bak the current file: a hard link where the file system has them (no copy), else a copy. */
    private static void keepBackup(Path current, Path backup) throws IOException {
        Path temp = Files.createTempFile(current.getParent(), "." + backup.getFileName() + ".", ".part");
        try {
            Files.delete(temp);
            try {
                Files.createLink(temp, current);
            } catch (IOException | UnsupportedOperationException e) {
                Files.copy(current, temp, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
                try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE)) {
                    channel.force(true);
                }
            }
            move(temp, backup);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            // Some file systems cannot rename atomically; replacing is the best they offer.
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Temporary files are owner-only; the saved file keeps the old one's permissions, or the usual rw-r--r--. */
    private static void copyPermissions(Path target, Path temp) throws IOException {
        try {
            Set<PosixFilePermission> permissions = Files.exists(target)
                    ? Files.getPosixFilePermissions(target)
                    : PosixFilePermissions.fromString("rw-r--r--");
            Files.setPosixFilePermissions(temp, permissions);
        } catch (UnsupportedOperationException e) {
            // Not a POSIX file system: it has its own defaults.
        }
    }

    /** Makes the rename itself durable. Not every system can open a folder (Windows cannot); there it is skipped. */
    private static void syncFolder(Path folder) {
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // The data is safe already; only the rename may be replayed differently after a power cut.
        }
    }
}
