package org.modetrail.format.csv;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.modetrail.evaluation.Annotations;
import org.modetrail.evaluation.LabelledBox;
import org.modetrail.model.Box;

/**
 * Reads the boxes of a ground truth or of tracks to evaluate, in the tracks CSV layout ({@value TracksCsv#HEADER}):
 * only {@code track_id,frame,x,y,width,height} are needed; the other columns of that layout (and the ground
 * columns of a calibrated export) may be there and are not used; a ground truth may carry {@code visible}, the
 * visible fraction of the object from 0 to 1. Columns in any order; other names are refused so a typo does not
 * pass unnoticed. Every problem names the file and the line.
 */
public final class EvaluationCsv {
    private static final List<String> REQUIRED = List.of("track_id", "frame", "x", "y", "width", "height");
    private static final List<String> OPTIONAL;
    private static final int MAX_ROWS = 50_000_000;

    static {
        List<String> o = new ArrayList<>(List.of("visible", "class", "time_s", "source", "score",
                TracksCsv.UNCERTAINTY_COLUMN));
        o.addAll(List.of(TracksCsv.GROUND_COLUMNS.split(",")));
        OPTIONAL = List.copyOf(o);
    }

    private EvaluationCsv() {
    }

    /**
     * @param what what the file is, for messages ("the truth", "the tracks")
     */
    public static Annotations read(Path file, String what) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new CsvFormatException(file, 0, "no such file; check the path given for " + what);
        }
        List<LabelledBox> boxes = new ArrayList<>();
        Map<Long, Integer> lineOf = new HashMap<>();
        CsvLine.read(file, REQUIRED, OPTIONAL, MAX_ROWS, "boxes", (line, f, columns) -> {
            LabelledBox b = parse(file, line, f, columns);
            Integer before = lineOf.put(((long) b.id() << 32) | b.frame(), line);
            if (before != null) {
                throw new CsvFormatException(file, line, "id " + b.id() + " already has a box on frame "
                        + b.frame() + " (line " + before + "); keep one row per id and frame");
            }
            boxes.add(b);
        });
        return Annotations.of(boxes);
    }

    private static LabelledBox parse(Path file, int line, List<String> f, Map<String, Integer> columns)
            throws CsvFormatException {
        int id = CsvLine.whole(file, line, f, columns, "track_id");
        int frame = CsvLine.whole(file, line, f, columns, "frame");
        double x = CsvLine.number(file, line, f, columns, "x");
        double y = CsvLine.number(file, line, f, columns, "y");
        double w = CsvLine.number(file, line, f, columns, "width");
        double h = CsvLine.number(file, line, f, columns, "height");
        if (frame < 0) {
            throw new CsvFormatException(file, line, "frame must be 0 or more, got " + frame);
        }
        if (!(w > 0) || !(h > 0)) {
            throw new CsvFormatException(file, line, "the box needs a positive width and height, got " + w + "x" + h);
        }
        double visible = 1;
        if (columns.containsKey("visible")) {
            visible = CsvLine.number(file, line, f, columns, "visible");
            if (visible < 0 || visible > 1) {
                throw new CsvFormatException(file, line, "visible must be between 0 and 1, got " + visible);
            }
        }
        return new LabelledBox(id, frame, new Box(x, y, w, h), visible);
    }
}
