package org.modetrail.app.editor;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Where one export job stands, as the export screen shows it.
 *
 * @param stage       waiting, running, done, failed or cancelled
 * @param done        steps done (frames, for the overlay and the COCO frame images), 0 when not counted
 * @param total       steps in all, 0 when not counted
 * @param secondsLeft estimate of the time left while running and counted, else negative
 * @param message     for a failure what went wrong and what to do; for a cancel what was left
 * @param files       the files written, once done
 */
record ExportJobState(Stage stage, int done, int total, double secondsLeft, String message, List<Path> files) {
    enum Stage { WAITING, RUNNING, DONE, FAILED, CANCELLED }

    ExportJobState {
        files = List.copyOf(files);
        message = message == null ? "" : message;
        if (done < 0 || total < 0 || done > total) {
            throw new IllegalArgumentException("progress " + done + " of " + total);
        }
    }

    static final ExportJobState WAITING = new ExportJobState(Stage.WAITING, 0, 0, -1, "", List.of());

    static ExportJobState started() {
        return new ExportJobState(Stage.RUNNING, 0, 0, -1, "", List.of());
    }

    /** Running with {@code done} of {@code total} steps and about {@code secondsLeft} to go (negative: unknown). */
    static ExportJobState running(int done, int total, double secondsLeft) {
        return new ExportJobState(Stage.RUNNING, done, total, secondsLeft, "", List.of());
    }

    /**
     * The time left if the rate since the first report goes on (the encoder's and decoder's start-up is not a
     * rate); unknown (negative) until 5 steps and half a second have passed since it.
     *
     * @param stepsSince   steps done since the first report
     * @param secondsSince seconds since the first report
     * @param stepsLeft    steps still to do
     */
    static double secondsLeft(int stepsSince, double secondsSince, int stepsLeft) {
        return stepsSince >= 5 && secondsSince >= 0.5 ? secondsSince * stepsLeft / stepsSince : -1;
    }

    static ExportJobState doneWith(List<Path> files, String message) {
        return new ExportJobState(Stage.DONE, 0, 0, -1, message, files);
    }

    static ExportJobState failed(String message) {
        return new ExportJobState(Stage.FAILED, 0, 0, -1, message, List.of());
    }

    static ExportJobState cancelled(String message) {
        return new ExportJobState(Stage.CANCELLED, 0, 0, -1, message, List.of());
    }

    boolean finished() {
        return stage == Stage.DONE || stage == Stage.FAILED || stage == Stage.CANCELLED;
    }

    /** A short line for the progress bar: "waiting", "120 / 450 frames · 4 s left", "done", ... */
    String shortText() {
        return switch (stage) {
            case WAITING -> "waiting";
            case RUNNING -> total == 0 ? "running…" : String.format(Locale.ROOT, "%d / %d frames%s", done, total,
                    secondsLeft < 0 ? "" : " · " + timeLeft(secondsLeft) + " left");
            case DONE -> "done";
            case FAILED -> "failed";
            case CANCELLED -> "cancelled";
        };
    }

    static String timeLeft(double seconds) {
        long s = Math.round(Math.ceil(seconds));
        return s < 60 ? s + " s" : String.format(Locale.ROOT, "%d min %02d s", s / 60, s % 60);
    }
}
