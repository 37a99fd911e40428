package org.modetrail.format.csv;

import java.io.IOException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.modetrail.format.ImportException;
import org.modetrail.format.ImportLimits;
import org.modetrail.format.Place;
import org.modetrail.format.TextLines;
import org.modetrail.format.TrackAssembler;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;

/**
 * Reads the tracks file {@link TracksCsv} writes (header {@value TracksCsv#HEADER}, optionally
 * {@value TracksCsv#UNCERTAINTY_COLUMN} (an empty cell: not known; files without the column read as not known), and
 * the ground columns of a calibrated export, which are ignored; columns in any order) back into
 * a project on the given video. The {@code source} column becomes each box's source, so keyframes stay keyframes
 * and tracked boxes stay tracked; {@code time_s} is checked to be a number and otherwise not used (the frame
 * decides). Classes are taken in the order the file first names them, with palette colours. Every problem names
 * the file and the line.
 */
public final class TracksCsvReader {
    private static final List<String> COLUMNS = List.of(TracksCsv.HEADER.split(","));
    /** The ground columns of a calibrated export: allowed, and ignored (they follow from the calibration). */
    private static final List<String> GROUND = List.of(TracksCsv.GROUND_COLUMNS.split(","));

    private TracksCsvReader() {
    }

    public static Project read(Path file, VideoRef video) throws IOException {
        return read(file, video, ImportLimits.DEFAULT);
    }

    public static Project read(Path file, VideoRef video, ImportLimits limits) throws IOException {
        TrackAssembler tracks = new TrackAssembler(file, video, limits);
        try (TextLines in = TextLines.open(file, limits, "the tracks CSV")) {
            String header = in.next();
            if (header == null || header.isBlank()) {
                throw new ImportException(file, 1, 0, null, "the file is empty; a tracks file starts with the header "
                        + TracksCsv.HEADER);
            }
            Map<String, Integer> columns = columns(file, header);
            String text;
            while ((text = in.next()) != null) {
                if (!text.isBlank()) {
                    row(tracks, Place.line(in.number()), text, columns);
                }
            }
        }
        return tracks.build();
    }

    private static Map<String, Integer> columns(Path file, String header) throws ImportException {
        List<String> names;
        try {
            names = CsvLine.split(header);
        } catch (IllegalArgumentException e) {
            throw new ImportException(file, 1, 0, null, e.getMessage());
        }
        Map<String, Integer> columns = new HashMap<>();
        for (int i = 0; i < names.size(); i++) {
            String name = names.get(i).toLowerCase(Locale.ROOT);
            if (!COLUMNS.contains(name) && !GROUND.contains(name) && !name.equals(TracksCsv.UNCERTAINTY_COLUMN)) {
                throw new ImportException(file, 1, 0, null, "unknown column '" + names.get(i) + "'; a tracks file"
                        + " has the columns " + TracksCsv.HEADER + ", optionally " + TracksCsv.UNCERTAINTY_COLUMN
                        + " and, from a calibrated project, " + TracksCsv.GROUND_COLUMNS);
            }
            if (columns.put(name, i) != null) {
                throw new ImportException(file, 1, 0, null, "column '" + name + "' appears twice");
            }
        }
        for (String c : COLUMNS) {
            if (!columns.containsKey(c)) {
                throw new ImportException(file, 1, 0, null, "the header lacks column '" + c + "'; a tracks file has "
                        + TracksCsv.HEADER);
            }
        }
        return columns;
    }

    private static void row(TrackAssembler tracks, Place at, String text, Map<String, Integer> columns)
            throws ImportException {
        Path file = tracks.file();
        List<String> f;
        try {
            f = CsvLine.split(text);
        } catch (IllegalArgumentException e) {
            throw at.error(file, e.getMessage());
        }
        if (f.size() != columns.size()) {
            throw at.error(file, "has " + f.size() + " fields but the header " + columns.size() + "; each row needs "
                    + TracksCsv.HEADER);
        }
        int trackId = whole(file, at, f, columns, "track_id");
        String className = f.get(columns.get("class"));
        int frame = whole(file, at, f, columns, "frame");
        number(file, at, f, columns, "time_s");
        double x = number(file, at, f, columns, "x");
        double y = number(file, at, f, columns, "y");
        double w = number(file, at, f, columns, "width");
        double h = number(file, at, f, columns, "height");
        String sourceText = f.get(columns.get("source"));
        double score = number(file, at, f, columns, "score");
        if (trackId < 1) {
            throw at.error(file, "track_id must be 1 or more, got " + trackId);
        }
        if (className.isBlank()) {
            throw at.error(file, "the class is empty; name the object's class");
        }
        BoxSource source;
        try {
            source = BoxSource.valueOf(sourceText.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw at.error(file, "source must be keyframe, tracked or interpolated, got '" + sourceText + "'");
        }
        if (!(score >= 0 && score <= 1)) {
            throw at.error(file, "score must be between 0 and 1, got " + score);
        }
        double uncertainty = Double.NaN;
        Integer uncertaintyColumn = columns.get(TracksCsv.UNCERTAINTY_COLUMN);
        if (uncertaintyColumn != null && !f.get(uncertaintyColumn).isBlank()) {
            uncertainty = number(file, at, f, columns, TracksCsv.UNCERTAINTY_COLUMN);
            if (!(uncertainty >= 0)) {
                throw at.error(file, TracksCsv.UNCERTAINTY_COLUMN + " must be 0 or more pixels (empty where not"
                        + " known), got " + uncertainty);
            }
        }
        tracks.checkedFrame(frame, frame, at);
        Box box = tracks.checkedBox(x, y, w, h, at);
        tracks.add(trackId, className, new FrameAnnotation(frame, Presence.VISIBLE, box, source, score, uncertainty),
                at);
    }

    private static int whole(Path file, Place at, List<String> f, Map<String, Integer> c, String name)
            throws ImportException {
        String s = f.get(c.get(name));
        try {
            return Integer.parseInt(s);
        } catch (NumberFormatException e) {
            throw at.error(file, name + " must be a whole number, got '" + s + "'");
        }
    }

    private static double number(Path file, Place at, List<String> f, Map<String, Integer> c, String name)
            throws ImportException {
        String s = f.get(c.get(name));
        try {
            double v = Double.parseDouble(s);
            if (!Double.isFinite(v) || s.endsWith("d") || s.endsWith("D") || s.endsWith("f") || s.endsWith("F")) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw at.error(file, name + " must be a number with a dot for decimals, got '" + s + "'");
        }
    }
}
