package org.modetrail.format.csv;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.modetrail.model.Box;

/**
 * Reads a keyframes file: header {@code track_id,frame,x,y,width,height} (in any order, with an optional
 * {@code class} column; other columns are refused so a typo does not pass unnoticed), one keyframe per row, frame
 * 0-based, the box's top-left corner and size in pixels (decimals with a dot). Every problem names its line.
 */
public final class KeyframesCsv {
    /** The smallest box side the tracker can start from, in pixels. */
    public static final double MIN_SIDE_PX = 2;

    private static final List<String> REQUIRED = List.of("track_id", "frame", "x", "y", "width", "height");
    private static final int MAX_ROWS = 10_000_000;

    private KeyframesCsv() {
    }

    /**
     * @param width      the video's frame width, to refuse boxes outside the frame
     * @param height     the video's frame height
     * @param frameCount the video's frames, to refuse frames beyond the end
     */
    public static List<KeyframeRow> read(Path file, int width, int height, int frameCount) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new CsvFormatException(file, 0, "no such file; check the path given to --keyframes");
        }
        List<KeyframeRow> rows = new ArrayList<>();
        Set<Long> seen = new HashSet<>();
        CsvLine.read(file, REQUIRED, List.of("class"), MAX_ROWS, "keyframes", (line, f, columns) -> {
            KeyframeRow row = parse(file, line, f, columns, width, height, frameCount);
            long key = ((long) row.trackId() << 32) | row.frame();
            if (!seen.add(key)) {
                throw new CsvFormatException(file, line, "track " + row.trackId() + " already has a keyframe on"
                        + " frame " + row.frame() + "; keep one row per track and frame");
            }
            rows.add(row);
        });
        if (rows.isEmpty()) {
            throw new CsvFormatException(file, 2, "no keyframes: add at least one row under the header");
        }
        return rows;
    }

    private static KeyframeRow parse(Path file, int line, List<String> f, Map<String, Integer> columns, int width,
                                     int height, int frameCount) throws CsvFormatException {
        int trackId = CsvLine.whole(file, line, f, columns, "track_id");
        int frame = CsvLine.whole(file, line, f, columns, "frame");
        double x = CsvLine.number(file, line, f, columns, "x");
        double y = CsvLine.number(file, line, f, columns, "y");
        double w = CsvLine.number(file, line, f, columns, "width");
        double h = CsvLine.number(file, line, f, columns, "height");
        if (trackId < 1) {
            throw new CsvFormatException(file, line, "track_id must be 1 or more, got " + trackId);
        }
        if (frame < 0 || frame >= frameCount) {
            throw new CsvFormatException(file, line, "frame " + frame + " is beyond the video, whose frames are 0 to "
                    + (frameCount - 1));
        }
        if (!(w > 0) || !(h > 0)) {
            throw new CsvFormatException(file, line, "the box needs a positive width and height, got " + w + "x" + h);
        }
        if (w < MIN_SIDE_PX || h < MIN_SIDE_PX) {
            throw new CsvFormatException(file, line, "the box " + w + "x" + h + " is too small to track; a keyframe "
                    + "box needs at least " + (int) MIN_SIDE_PX + " x " + (int) MIN_SIDE_PX + " pixels (draw it where more of the "
                    + "object is in view)");
        }
        if (x < 0 || y < 0 || x + w > width || y + h > height) {
            throw new CsvFormatException(file, line, "the box " + x + "," + y + " " + w + "x" + h + " reaches outside"
                    + " the " + width + "x" + height + " frame");
        }
        String className = null;
        if (columns.containsKey("class")) {
            className = f.get(columns.get("class"));
            if (className.isBlank()) {
                throw new CsvFormatException(file, line, "the class is empty");
            }
        }
        return new KeyframeRow(line, trackId, frame, new Box(x, y, w, h), className);
    }
}
