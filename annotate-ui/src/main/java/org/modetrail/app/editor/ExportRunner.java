package org.modetrail.app.editor;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;

import org.modetrail.exports.ProjectExport;
import org.modetrail.format.ExportCancelledException;
import org.modetrail.model.Project;
import org.modetrail.overlay.OverlayEncoding;
import org.modetrail.overlay.OverlayResult;
import org.modetrail.overlay.OverlayStyle;
import org.modetrail.overlay.OverlayVideo;
import org.modetrail.summary.ProjectSummary;
import org.modetrail.video.VideoException;
import org.modetrail.video.VideoSource;

/**
 * Runs the export screen's jobs, free of Swing: one worker thread takes the jobs of a batch in the screen's order
 * (so two decoders never compete for the machine's cores), each with a video source of its own, and tells a
 * listener each job's {@link ExportJobState} on that thread. Everything written goes through the export library
 * ({@link ProjectExport}, {@link ProjectSummary}, {@link org.modetrail.picture.ProjectPlots}, {@link OverlayVideo}),
 * which replaces files atomically, so a failed or cancelled job leaves no partial file.
 */
final class ExportRunner implements AutoCloseable {
    /** Told of every change of a job's state, on the worker thread (or the caller's for the first waiting). */
    @FunctionalInterface
    interface Listener {
        void changed(ExportItem item, ExportJobState state);

        /** Every job of the batch has finished (after its last {@link #changed}). */
        default void batchFinished() {
        }
    }

    private final Path videoFile;
    private final String software;
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "editor-export");
        t.setDaemon(true);
        return t;
    });

    ExportRunner(Path videoFile, String software) {
        this.videoFile = videoFile;
        this.software = software;
    }

    /** The jobs of one press of Export; each can be cancelled while it waits or runs. */
    static final class Batch {
        private final Map<ExportItem, AtomicBoolean> cancel = new EnumMap<>(ExportItem.class);
        private volatile boolean finished;

        void cancel(ExportItem item) {
            AtomicBoolean c = cancel.get(item);
            if (c != null) {
                c.set(true);
            }
        }

        void cancelAll() {
            cancel.values().forEach(c -> c.set(true));
        }

        boolean isFinished() {
            return finished;
        }
    }

    /** Starts the plan's items on {@code project} (a snapshot: later edits do not change what is written). */
    Batch start(Project project, ExportPlan plan, Listener listener) {
        Batch batch = new Batch();
        List<ExportItem> items = new ArrayList<>();
        for (ExportItem item : ExportItem.values()) {
            if (plan.items().contains(item)) {
                items.add(item);
                batch.cancel.put(item, new AtomicBoolean());
                listener.changed(item, ExportJobState.WAITING);
            }
        }
        worker.submit(() -> {
            try {
                for (ExportItem item : items) {
                    AtomicBoolean cancelled = batch.cancel.get(item);
                    if (cancelled.get()) {
                        listener.changed(item, ExportJobState.cancelled("stopped before it started; nothing written"));
                        continue;
                    }
                    listener.changed(item, ExportJobState.started());
                    listener.changed(item, runOne(item, project, plan, cancelled, listener));
                }
            } finally {
                batch.finished = true;
                listener.batchFinished();
            }
        });
        return batch;
    }

    private ExportJobState runOne(ExportItem item, Project project, ExportPlan plan, AtomicBoolean cancelled,
                                  Listener listener) {
        Path file = plan.files(item).get(0);
        Ticker tick = new Ticker(item, listener);
        try {
            Files.createDirectories(plan.folder());
        } catch (IOException e) {
            return ExportJobState.failed("Could not make the folder " + plan.folder() + " (" + e.getMessage()
                    + "); choose another folder.");
        }
        try (VideoSource video = VideoSource.open(videoFile)) {
            String done;
            switch (item) {
                case CSV, COCO, MOT -> {
                    Path frames = item == ExportItem.COCO ? plan.framesFolder().orElse(null) : null;
                    ProjectExport.Result r = ProjectExport.write(project, video, item.tracksFormat(), file, frames,
                            software, (d, t) -> {
                                tick.report(d, t);
                                return !cancelled.get();
                            });
                    done = r.groundColumns() ? "with ground positions and speeds"
                            : r.coco() != null ? r.coco().images() + " images, " + r.coco().annotations()
                            + " boxes" + (r.coco().imageFiles() > 0 ? ", " + r.coco().imageFiles()
                            + " frame images in " + frames.getFileName() : "") : "";
                }
                case SUMMARY -> {
                    ProjectSummary s = ProjectSummary.of(project, video.index().timesSeconds());
                    s.writeCsv(file);
                    done = s.tracks().size() + " tracks" + (s.metres() ? ", with metres and speeds" : ", in pixels");
                }
                case PLOTS -> {
                    double[] t = video.index().timesSeconds();
                    plan.plots().write(project, n -> t[n], plan.baseName(), plan.folder(), plan.baseName() + "-");
                    done = "";
                }
                case OVERLAY -> {
                    OverlayStyle style = OverlayStyle.forFrameHeight(project.video().height())
                            .withTrailLength(plan.overlayTrail());
                    OverlayResult r = OverlayVideo.write(video, project, file, style, OverlayEncoding.defaults(),
                            plan.overlayFrom(), plan.overlayTo() + 1,
                            tick::report, cancelled::get);
                    done = String.format(Locale.ROOT, "%d frames, %s, %.1f MB", r.framesWritten(), r.codec(),
                            r.bytes() / 1e6);
                }
                default -> throw new IllegalStateException(item.name());
            }
            return ExportJobState.doneWith(plan.files(item), done);
        } catch (ExportCancelledException | CancellationException e) {
            return ExportJobState.cancelled(file.getFileName() + " was not written"
                    + (Files.exists(file) ? " (the file there before is kept as it was)" : "")
                    + (item == ExportItem.COCO && plan.cocoFrames() ? "; the frame images it added to "
                    + plan.framesFolder().orElseThrow().getFileName() + " were taken away again" : ""));
        } catch (VideoException e) {
            return ExportJobState.failed(e.getMessage() + " — the export reads the project's video; put it back "
                    + "where the project says, or reopen the project.");
        } catch (IOException e) {
            return ExportJobState.failed("Could not write " + file + ": " + e.getMessage() + ". Check that the "
                    + "folder can be written to and the disk has room, or choose another folder.");
        } catch (IllegalArgumentException e) {
            return ExportJobState.failed(file.getFileName() + " not written: " + e.getMessage() + ".");
        } catch (RuntimeException e) {
            return ExportJobState.failed(file.getFileName() + " not written: " + e
                    + " (an error in Modetrail; please report it with the project).");
        }
    }

    /** Passes a job's progress on at most every 100 ms (and at the end), so the screen is not flooded. */
    private static final class Ticker {
        private static final long EVERY_NANOS = 100_000_000L;
        private final ExportItem item;
        private final Listener listener;
        private long first;
        private int firstDone = -1;
        private long last = Long.MIN_VALUE;

        Ticker(ExportItem item, Listener listener) {
            this.item = item;
            this.listener = listener;
        }

        void report(int done, int total) {
            long now = System.nanoTime();
            if (firstDone < 0) {
                first = now;
                firstDone = done;
            }
            if (done == total || last == Long.MIN_VALUE || now - last >= EVERY_NANOS) {
                last = now;
                listener.changed(item, ExportJobState.running(done, total,
                        ExportJobState.secondsLeft(done - firstDone, (now - first) / 1e9, total - done)));
            }
        }
    }

    /** Stops taking jobs; a running one is left to finish on its daemon thread. */
    @Override
    public void close() {
        worker.shutdown();
    }
}
