package org.modetrail.format.mot;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * Writes tracks as a MOTChallenge text file: one line per box,
 * {@code frame, id, bb_left, bb_top, bb_width, bb_height, conf, x, y, z}, comma-separated, as defined by Milan et
 * al. 2016, "MOT16: A benchmark for multi-object tracking", arXiv:1603.00831 (the file-format section). Frames and
 * ids count from 1 there; Modetrail frames count from 0, so the file has frame + 1; Modetrail track ids already
 * start at 1 and are written as they are. {@code conf} is the box's score; x, y, z (world coordinates) are -1 for
 * a 2D box. Lines are sorted by frame, then id. Hidden and absent marks have no line (the format has only boxes);
 * boxes are written as the tracker had them, not clipped. Numbers have a dot whatever the locale. The file is
 * replaced atomically.
 */
public final class MotWriter {
    private MotWriter() {
    }

    public static void write(Project project, Path out) throws IOException {
        record Line(int frame, int id, FrameAnnotation a) {
        }
        List<Line> lines = new ArrayList<>();
        for (Track t : project.tracks()) {
            for (FrameAnnotation a : t.frames().values()) {
                if (a.isVisible()) {
                    lines.add(new Line(a.frame(), t.id(), a));
                }
            }
        }
        lines.sort(Comparator.comparingInt(Line::frame).thenComparingInt(Line::id));
        AtomicWrite.replace(out, raw -> {
            Writer w = new BufferedWriter(new OutputStreamWriter(raw, StandardCharsets.UTF_8), 1 << 16);
            for (Line l : lines) {
                w.write(format(l.frame, l.id, l.a));
            }
            w.flush();
        });
    }

    /** One line with its line break, e.g. {@code 1,3,10.000,20.000,30.000,40.000,1.0000,-1,-1,-1}. */
    static String format(int frame, int id, FrameAnnotation a) {
        return String.format(Locale.ROOT, "%d,%d,%.3f,%.3f,%.3f,%.3f,%.4f,-1,-1,-1\n", frame + 1, id, a.box().x(),
                a.box().y(), a.box().width(), a.box().height(), a.score());
    }
}
