package org.modetrail.format.project;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;
import org.modetrail.model.Project;

/**
 * Keeps a recovery copy of an edited project beside it (NAME.recovery), so a crash loses at most one interval of
 * edits. The first edit after a write schedules the next write one interval later; edits until then only replace
 * what will be written, so the disk sees at most one write per interval however fast the user works. Writes run
 * on one background thread and are atomic; the project file itself is never touched.
 */
public final class ProjectAutosave implements AutoCloseable {
    private final Path recovery;
    private final AutosaveConfig config;
    private final Consumer<IOException> onFailure;
    private final ScheduledExecutorService executor;
    /** Held while writing or deleting the recovery file, so a discard cannot be undone by a write in flight. */
    private final Object fileLock = new Object();
    /** Guards the fields below. */
    private final Object stateLock = new Object();
    private Project pending;
    private ScheduledFuture<?> scheduled;
    private boolean closed;
    private int writes;

    /**
     * @param projectFile the project being edited (it need not exist yet)
     * @param onFailure   told when a background write fails (a full disk, say); the next edit tries again
     */
    public ProjectAutosave(Path projectFile, AutosaveConfig config, Consumer<IOException> onFailure) {
        this.recovery = recoveryFile(projectFile);
        this.config = config;
        this.onFailure = onFailure;
        this.executor = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "modetrail-autosave " + projectFile.getFileName());
            t.setDaemon(true); // a forgotten close() must not keep the application alive
            return t;
        });
    }

    /** The recovery file for {@code projectFile}: NAME.recovery in the same folder. */
    public static Path recoveryFile(Path projectFile) {
        return projectFile.resolveSibling(projectFile.getFileName() + ".recovery");
    }

    /**
     * The recovery file if it holds edits newer than the project (it was written after the project was last
     * saved, or the project was never saved), for the editor to offer on open; read it with
     * {@link ProjectFile#read}. An older recovery file is left alone, since it may still be what the user wants.
     */
    public static Optional<Path> findRecovery(Path projectFile) throws IOException {
        Path r = recoveryFile(projectFile);
        if (!Files.isRegularFile(r)) {
            return Optional.empty();
        }
        try {
            return Files.getLastModifiedTime(r).compareTo(Files.getLastModifiedTime(projectFile)) > 0
                    ? Optional.of(r) : Optional.empty();
        } catch (NoSuchFileException e) {
            return Optional.of(r);
        }
    }

    /** Deletes the recovery file of {@code projectFile} (the user declined it, or saved). */
    public static void discardRecovery(Path projectFile) throws IOException {
        Files.deleteIfExists(recoveryFile(projectFile));
    }

    /** Notes that {@code project} is the current, unsaved state; it reaches the recovery file within the interval. */
    public void markDirty(Project project) {
        synchronized (stateLock) {
            if (closed) {
                throw new IllegalStateException("the autosave for " + recovery + " is closed");
            }
            pending = project;
            if (scheduled == null) {
                scheduled = executor.schedule(this::writeInBackground, config.interval().toMillis(),
                        TimeUnit.MILLISECONDS);
            }
        }
    }

    /**
     * Tells the autosave that {@code savedVersion} is now in the project file: the recovery file is deleted, and an
     * edit still waiting is dropped when it is that version (a newer one is kept and written as usual).
     */
    public void saved(Project savedVersion) throws IOException {
        synchronized (fileLock) {
            synchronized (stateLock) {
                if (pending == savedVersion || (pending != null && pending.equals(savedVersion))) {
                    pending = null;
                    if (scheduled != null) {
                        scheduled.cancel(false);
                        scheduled = null;
                    }
                }
            }
            Files.deleteIfExists(recovery);
        }
    }

    /** Recovery writes finished so far (for tests and the status bar). */
    int writes() {
        synchronized (stateLock) {
            return writes;
        }
    }

    private void writeInBackground() {
        try {
            writePending();
        } catch (IOException e) {
            onFailure.accept(e);
        } catch (UncheckedIOException e) {
            onFailure.accept(e.getCause());
        }
    }

    private void writePending() throws IOException {
        synchronized (fileLock) {
            Project p;
            synchronized (stateLock) {
                p = pending;
                pending = null;
                scheduled = null;
            }
            if (p != null) {
                ProjectFile.write(p, recovery, false, UnaryOperator.identity());
                synchronized (stateLock) {
                    writes++;
                }
            }
        }
    }

    /** Writes any waiting edit now and stops the background thread. */
    @Override
    public void close() throws IOException {
        synchronized (stateLock) {
            if (closed) {
                return;
            }
            closed = true;
            if (scheduled != null) {
                scheduled.cancel(false);
            }
        }
        try {
            writePending();
        } finally {
            executor.shutdown();
            try {
                executor.awaitTermination(10, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
