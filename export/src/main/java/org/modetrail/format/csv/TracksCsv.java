package org.modetrail.format.csv;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.IntToDoubleFunction;

import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * Writes tracks as CSV: header {@code track_id,class,frame,time_s,x,y,width,height,source,score}, one row per frame
 * on which a track has a box, sorted by track then frame; time from each frame's presentation timestamp; numbers
 * with a dot whatever the locale. Written to a temporary file and moved into place, so a failure never leaves a
 * half-written file under the name asked for.
 */
public final class TracksCsv {
    public static final String HEADER = "track_id,class,frame,time_s,x,y,width,height,source,score";

    private TracksCsv() {
    }

    /** @param timeOfFrame seconds from the first frame for each frame index */
    public static void write(Project project, IntToDoubleFunction timeOfFrame, Path out) throws IOException {
        AtomicWrite.replace(out, raw -> {
            BufferedWriter w = new BufferedWriter(new OutputStreamWriter(raw, StandardCharsets.UTF_8), 1 << 16);
            w.write(HEADER);
            w.write('\n');
            List<Track> tracks = new ArrayList<>(project.tracks());
            tracks.sort(Comparator.comparingInt(Track::id));
            for (Track t : tracks) {
                String cls = CsvLine.quote(t.className());
                for (FrameAnnotation a : t.frames().values()) {
                    if (!a.isVisible()) {
                        continue;
                    }
                    w.write(String.format(Locale.ROOT, "%d,%s,%d,%.6f,%.3f,%.3f,%.3f,%.3f,%s,%.4f\n", t.id(), cls,
                            a.frame(), timeOfFrame.applyAsDouble(a.frame()), a.box().x(), a.box().y(),
                            a.box().width(), a.box().height(), a.source().name().toLowerCase(Locale.ROOT),
                            a.score()));
                }
            }
            w.flush();
        });
    }
}
