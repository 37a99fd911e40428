package org.modetrail.app.cli;

import java.util.Locale;

import org.modetrail.model.Track;
import org.modetrail.quality.Concern;
import org.modetrail.quality.TrackQuality;

/** One line per track after a run: what it is made of and the first places to check. */
final class QualityLine {
    private static final int SHOWN = 3;

    private QualityLine() {
    }

    static String of(Track t, TrackQuality q) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "track %d (%s): %d keyframes, %d tracked, %d interpolated, %d marked, %d empty; mean similarity %.2f",
                t.id(), t.className(), q.keyframes(), q.tracked(), q.interpolated(), q.marked(), q.empty(),
                q.meanScore()));
        if (!q.concerns().isEmpty()) {
            sb.append("; check");
            for (int i = 0; i < Math.min(SHOWN, q.concerns().size()); i++) {
                Concern c = q.concerns().get(i);
                sb.append(i == 0 ? " " : ", ").append(describe(c));
            }
        }
        return sb.toString();
    }

    private static String describe(Concern c) {
        String frames = c.from() == c.to() ? "frame " + c.from() : "frames " + c.from() + "-" + c.to();
        return switch (c.kind()) {
            case JUMP -> String.format(Locale.ROOT, "%s (jump of %.1f box diagonals)", frames, c.value());
            case SIZE_CHANGE -> String.format(Locale.ROOT, "%s (size x%.2f)", frames, c.value());
            case SIZE_DRIFT -> String.format(Locale.ROOT, "%s (size %.1fx off the keyframe's)", frames, c.value());
            case WEAK_SPAN -> String.format(Locale.ROOT, "%s (similarity %.2f)", frames, c.value());
        };
    }
}
