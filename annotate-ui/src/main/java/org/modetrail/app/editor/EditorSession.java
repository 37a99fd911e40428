package org.modetrail.app.editor;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;

import org.modetrail.format.project.AutosaveConfig;
import org.modetrail.format.project.ProjectAutosave;
import org.modetrail.format.project.ProjectFile;
import org.modetrail.format.project.ProjectFileException;
import org.modetrail.model.Edit;
import org.modetrail.model.History;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;
import org.modetrail.run.Span;
import org.modetrail.run.TrackResults;
import org.modetrail.run.TrackRunner;
import org.modetrail.video.VideoException;
import org.modetrail.video.IndexProgress;
import org.modetrail.video.VideoOptions;
import org.modetrail.video.VideoSource;

/**
 * What the editor works on, free of Swing: the project with its undo history, the file it is saved to, the
 * autosave, and the tracking that edits start in the background. Edits are applied at once; the spans they leave
 * to track are queued and tracked on a worker thread with a video source of its own (the window's decoder keeps
 * serving frames meanwhile), and each result is folded into the current step of the history only if the track's
 * keyframes are still those it was tracked from (an edit made meanwhile has queued its own tracking). Listeners
 * are called on whichever thread made the change; the window passes them on to the event thread.
 */
public final class EditorSession implements AutoCloseable {
    /** Undo steps kept. */
    static final int HISTORY_DEPTH = 200;
    /** How often the window sees a running track grow. */
    static final Duration PARTIAL_EVERY = Duration.ofMillis(400);

    /** What the window hears about. */
    public interface Listener {
        /** The project changed: an edit, an undo, a finished tracking, a save. */
        default void projectChanged(Project project) {
        }

        /** Tracking progress: frames done of all in the running job; {@code running} false when idle. */
        default void trackingProgress(boolean running, long done, long total) {
        }

        /** Something went wrong in the background (a failed autosave or tracking); the message says what. */
        default void problem(String message) {
        }
    }

    private final Path videoFile;
    private final VideoSource trackingVideo;
    private final TrackRunner runner;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "editor-tracking");
        t.setDaemon(true);
        return t;
    });
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private final AtomicBoolean cancel = new AtomicBoolean();
    private final AutosaveConfig autosaveConfig;
    /** Spans waiting for the worker; guarded by this. */
    private final Set<Span> pending = new LinkedHashSet<>();
    private History history;
    private Path projectFile;
    private ProjectAutosave autosave;
    private boolean dirty;
    private boolean jobQueued;
    private int runningJobs;

    private EditorSession(Project project, Path projectFile, Path videoFile, AutosaveConfig autosaveConfig,
                          boolean dirty, IndexProgress progress) throws VideoException {
        this.history = new History(project, HISTORY_DEPTH);
        this.projectFile = projectFile;
        this.videoFile = videoFile;
        this.autosaveConfig = autosaveConfig;
        this.trackingVideo = VideoSource.open(videoFile, VideoOptions.defaults(), progress);
        this.runner = new TrackRunner();
        this.dirty = dirty;
        this.autosave = new ProjectAutosave(projectFile, autosaveConfig, this::autosaveFailed);
        if (dirty) {
            autosave.markDirty(project);
        }
    }

    /** A new, empty project on {@code video}, to be saved as {@code projectFile} (which need not exist). */
    public static EditorSession forVideo(Path video, VideoRef ref, Path projectFile, AutosaveConfig autosave)
            throws VideoException {
        return new EditorSession(Project.of(ref), projectFile, video, autosave, false, IndexProgress.NONE);
    }

    /**
     * The project in {@code file}, or the edits in its recovery file when {@code recover} (the window asks first,
     * {@link ProjectAutosave#findRecovery}); a recovered project starts unsaved.
     */
    public static EditorSession forProject(Path file, boolean recover, AutosaveConfig autosave)
            throws ProjectFileException, VideoException, IOException {
        return forProject(file, recover, autosave, IndexProgress.NONE);
    }

    /** As {@link #forProject(Path, boolean, AutosaveConfig)}, telling {@code progress} how a first scan goes. */
    public static EditorSession forProject(Path file, boolean recover, AutosaveConfig autosave,
                                           IndexProgress progress)
            throws ProjectFileException, VideoException, IOException {
        Project p = recover ? ProjectFile.read(ProjectAutosave.recoveryFile(file)) : ProjectFile.read(file);
        Path video = ProjectFile.videoPath(p, file);
        return new EditorSession(p, file, video, autosave, recover, progress);
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public synchronized Project project() {
        return history.current();
    }

    public Path videoFile() {
        return videoFile;
    }

    public synchronized Path projectFile() {
        return projectFile;
    }

    public synchronized boolean isDirty() {
        return dirty;
    }

    public synchronized boolean canUndo() {
        return history.canUndo();
    }

    public synchronized boolean canRedo() {
        return history.canRedo();
    }

    /** Applies an edit (from {@link org.modetrail.model.Edits}) and queues the tracking it needs. */
    public void apply(Edit edit) {
        Project p;
        synchronized (this) {
            p = history.apply(edit);
            dirty = true;
            autosave.markDirty(p);
            if (edit.retrack()) {
                pending.add(new Span(edit.trackId(), edit.from(), edit.to()));
                scheduleLocked();
            }
        }
        fireChanged(p);
    }

    public void undo() {
        Project p;
        synchronized (this) {
            if (!history.canUndo()) {
                return;
            }
            p = history.undo();
            dirty = true;
            autosave.markDirty(p);
        }
        fireChanged(p);
    }

    public void redo() {
        Project p;
        synchronized (this) {
            if (!history.canRedo()) {
                return;
            }
            p = history.redo();
            dirty = true;
            autosave.markDirty(p);
        }
        fireChanged(p);
    }

    /** Saves to the project file (atomically, the old version kept as .bak); the recovery file is then dropped. */
    public void save() throws IOException {
        Project p;
        Path file;
        synchronized (this) {
            p = history.current();
            file = projectFile;
        }
        ProjectFile.write(p, file);
        synchronized (this) {
            autosave.saved(p);
            dirty = history.current() != p;
        }
        fireChanged(project());
    }

    /** Saves under a new name, which the session then keeps (with its own recovery file). */
    public void saveAs(Path file) throws IOException {
        Objects.requireNonNull(file);
        synchronized (this) {
            if (!file.equals(projectFile)) {
                autosave.close();
                projectFile = file;
                autosave = new ProjectAutosave(file, autosaveConfig, this::autosaveFailed);
            }
        }
        save();
    }

    /** Stops the running tracking and drops what is queued; frames already tracked stay as they were. */
    public void cancelTracking() {
        synchronized (this) {
            pending.clear();
        }
        cancel.set(true);
    }

    public synchronized boolean isTracking() {
        return runningJobs > 0 || jobQueued;
    }

    /** Waits until no tracking is queued or running (for tests and for closing). */
    public boolean awaitIdle(Duration timeout) throws InterruptedException {
        long end = System.nanoTime() + timeout.toNanos();
        while (isTracking()) {
            if (System.nanoTime() > end) {
                return false;
            }
            Thread.sleep(10);
        }
        return true;
    }

    private void scheduleLocked() {
        if (jobQueued) {
            return;
        }
        jobQueued = true;
        worker.submit(this::runPending);
    }

    /** One job: every pending span, tracked from the project as it is when the job starts. */
    private void runPending() {
        Project snapshot;
        List<Span> spans;
        synchronized (this) {
            jobQueued = false;
            spans = new ArrayList<>(pending);
            pending.clear();
            snapshot = history.current();
            spans.removeIf(s -> snapshot.track(s.trackId()).isEmpty());
            if (spans.isEmpty()) {
                return;
            }
            runningJobs++;
            cancel.set(false);
        }
        try {
            Project tracked = runner.track(trackingVideo, snapshot, spans,
                    (done, total) -> listeners.forEach(l -> l.trackingProgress(true, done, total)), cancel::get,
                    soFar -> foldIn(snapshot, soFar, spans), PARTIAL_EVERY);
            foldIn(snapshot, tracked, spans);
        } catch (CancellationException e) {
            // The user stopped it; nothing to fold in.
        } catch (VideoException | RuntimeException e) {
            listeners.forEach(l -> l.problem("Tracking stopped: " + e.getMessage()));
        } finally {
            synchronized (this) {
                runningJobs--;
            }
            listeners.forEach(l -> l.trackingProgress(false, 0, 0));
        }
    }

    /** Brings a (partial or final) result into the current step of the history and tells the listeners. */
    private void foldIn(Project snapshot, Project tracked, List<Span> spans) {
        Project merged;
        synchronized (this) {
            merged = TrackResults.foldIn(history.current(), snapshot, tracked, spans);
            if (merged == history.current()) {
                return;
            }
            history.amend(merged);
            dirty = true;
            autosave.markDirty(merged);
        }
        fireChanged(merged);
    }

    private void fireChanged(Project p) {
        listeners.forEach(l -> l.projectChanged(p));
    }

    private void autosaveFailed(IOException e) {
        listeners.forEach(l -> l.problem("Autosave failed (your edits are still open here; save to keep them): "
                + e.getMessage()));
    }

    @Override
    public void close() throws IOException {
        cancelTracking();
        worker.shutdown();
        try {
            worker.awaitTermination(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        trackingVideo.close();
        synchronized (this) {
            autosave.close();
        }
    }
}
