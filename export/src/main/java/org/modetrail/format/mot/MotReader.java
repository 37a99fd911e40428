package org.modetrail.format.mot;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.modetrail.format.ImportLimits;
import org.modetrail.format.Place;
import org.modetrail.format.TextLines;
import org.modetrail.format.TrackAssembler;
import org.modetrail.model.Box;
import org.modetrail.model.BoxSource;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.ObjectClass;
import org.modetrail.model.Presence;
import org.modetrail.model.Project;
import org.modetrail.model.VideoRef;

/**
 * Reads a MOTChallenge text file (Milan et al. 2016, arXiv:1603.00831): lines of ten comma-separated fields
 * {@code frame, id, bb_left, bb_top, bb_width, bb_height, conf, x, y, z}, frames and ids from 1. Every box comes in
 * as a keyframe (the format does not say who drew it); its score is {@code conf} when that lies in [0, 1] and 1
 * otherwise (-1 is the usual "no confidence"). The format names no class, so every track gets the one class given.
 * Frame f of the file is Modetrail frame f - 1. Boxes reaching a little past the frame edge are clipped to it;
 * boxes further outside are refused. Every problem names the file, the line and the field.
 */
public final class MotReader {
    private static final String LAYOUT = "frame, id, bb_left, bb_top, bb_width, bb_height, conf, x, y, z";
    private static final String[] FIELDS = LAYOUT.split(", ");

    private MotReader() {
    }

    public static Project read(Path file, VideoRef video, ObjectClass objectClass) throws IOException {
        return read(file, video, objectClass, ImportLimits.DEFAULT);
    }

    public static Project read(Path file, VideoRef video, ObjectClass objectClass, ImportLimits limits)
            throws IOException {
        TrackAssembler tracks = new TrackAssembler(file, video, limits);
        try (TextLines in = TextLines.open(file, limits, "the MOTChallenge file")) {
            String text;
            while ((text = in.next()) != null) {
                if (!text.isBlank()) {
                    line(tracks, in.number(), text, objectClass.name());
                }
            }
        }
        return tracks.build(List.of(objectClass));
    }

    private static void line(TrackAssembler tracks, int line, String text, String className) throws IOException {
        Path file = tracks.file();
        String[] f = text.split(",", -1);
        if (f.length != FIELDS.length) {
            throw Place.line(line).error(file, "has " + f.length + " fields; a MOTChallenge line has "
                    + FIELDS.length + ": " + LAYOUT);
        }
        double[] v = new double[f.length];
        int column = 1;
        for (int i = 0; i < f.length; i++) {
            String s = f[i].strip();
            try {
                v[i] = Double.parseDouble(s);
                if (!Double.isFinite(v[i]) || s.isEmpty() || Character.isLetter(s.charAt(s.length() - 1))) {
                    throw new NumberFormatException();
                }
            } catch (NumberFormatException e) {
                throw new Place(line, column, null).error(file, FIELDS[i] + " (field " + (i + 1) + ") must be a"
                        + " number with a dot for decimals, got '" + s + "'");
            }
            column += f[i].length() + 1;
        }
        Place at = Place.line(line);
        long frame = whole(file, line, v[0], f[0], "frame");
        long id = whole(file, line, v[1], f[1], "id");
        if (frame < 1) {
            throw at.error(file, "frame " + frame + " is below 1; MOTChallenge frames count from 1");
        }
        if (id < 1 || id > Integer.MAX_VALUE) {
            throw at.error(file, "id " + id + " is outside 1.." + Integer.MAX_VALUE + "; MOTChallenge ids count from 1");
        }
        int index = tracks.checkedFrame((int) Math.min(frame - 1, Integer.MAX_VALUE), frame, at);
        Box box = tracks.checkedBox(v[2], v[3], v[4], v[5], at);
        double score = v[6] >= 0 && v[6] <= 1 ? v[6] : 1;
        tracks.add((int) id, className,
                new FrameAnnotation(index, Presence.VISIBLE, box, BoxSource.KEYFRAME, score), at);
    }

    private static long whole(Path file, int line, double v, String text, String name) throws IOException {
        if (v != Math.rint(v) || Math.abs(v) > 1e15) {
            throw Place.line(line).error(file, name + " must be a whole number, got '" + text.strip() + "'");
        }
        return (long) v;
    }
}
