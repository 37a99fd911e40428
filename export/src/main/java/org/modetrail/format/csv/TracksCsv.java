package org.modetrail.format.csv;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.IntToDoubleFunction;

import org.modetrail.calibration.GroundSample;
import org.modetrail.calibration.GroundTrajectory;
import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.FrameAnnotation;
import org.modetrail.model.Project;
import org.modetrail.model.Track;

/**
 * Writes tracks as CSV: header {@code track_id,class,frame,time_s,x,y,width,height,source,score,uncertainty_px}, one
 * row per frame on which a track has a box, sorted by track then frame; time from each frame's presentation
 * timestamp; {@code uncertainty_px} the box's one-sigma uncertainty per axis in pixels
 * ({@link FrameAnnotation#uncertaintyPx()}), empty where not known; numbers with a dot whatever the locale. Written to a temporary file and moved into place, so a failure never leaves a
 * half-written file under the name asked for.
 */
public final class TracksCsv {
    /** The columns every tracks file has (readers require them). */
    public static final String HEADER = "track_id,class,frame,time_s,x,y,width,height,source,score";
    /** The box's uncertainty, written after {@link #HEADER}'s columns; readers accept files without it. */
    public static final String UNCERTAINTY_COLUMN = "uncertainty_px";

    private TracksCsv() {
    }

    /** Columns added where the project's ground is calibrated (see {@link #write(Project, IntToDoubleFunction, Map, Path)}). */
    public static final String GROUND_COLUMNS =
            "world_x_m,world_y_m,speed_m_s,speed_sigma_m_s,position_sigma_m,heading_deg";

    /** @param timeOfFrame seconds from the first frame for each frame index */
    public static void write(Project project, IntToDoubleFunction timeOfFrame, Path out) throws IOException {
        write(project, timeOfFrame, null, out);
    }

    /**
     * The same with the ground columns {@link #GROUND_COLUMNS} after the track columns: the box's contact point on
     * the ground (metres, as mapped, not smoothed), the smoothed speed with its standard uncertainty, the
     * position's standard uncertainty and the heading (degrees, 0 along +x of the ground frame, 90 along +y). Cells
     * are empty where a frame has no ground sample (beyond the horizon) or no speed (a run too short).
     *
     * @param ground per track id, its ground samples ({@link GroundTrajectory}); null for no ground columns
     */
    public static void write(Project project, IntToDoubleFunction timeOfFrame, Map<Integer, List<GroundSample>> ground,
                             Path out) throws IOException {
        AtomicWrite.replace(out, raw -> {
            BufferedWriter w = new BufferedWriter(new OutputStreamWriter(raw, StandardCharsets.UTF_8), 1 << 16);
            w.write(HEADER);
            w.write(',');
            w.write(UNCERTAINTY_COLUMN);
            if (ground != null) {
                w.write(',');
                w.write(GROUND_COLUMNS);
            }
            w.write('\n');
            List<Track> tracks = new ArrayList<>(project.tracks());
            tracks.sort(Comparator.comparingInt(Track::id));
            for (Track t : tracks) {
                String cls = CsvLine.quote(t.className());
                Map<Integer, GroundSample> byFrame = new HashMap<>();
                if (ground != null) {
                    for (GroundSample g : ground.getOrDefault(t.id(), List.of())) {
                        byFrame.put(g.frame(), g);
                    }
                }
                for (FrameAnnotation a : t.frames().values()) {
                    if (!a.isVisible()) {
                        continue;
                    }
                    w.write(String.format(Locale.ROOT, "%d,%s,%d,%.6f,%.3f,%.3f,%.3f,%.3f,%s,%.4f", t.id(), cls,
                            a.frame(), timeOfFrame.applyAsDouble(a.frame()), a.box().x(), a.box().y(),
                            a.box().width(), a.box().height(), a.source().name().toLowerCase(Locale.ROOT),
                            a.score()));
                    w.write(',');
                    w.write(finite(a.uncertaintyPx(), 3));
                    if (ground != null) {
                        GroundSample g = byFrame.get(a.frame());
                        if (g == null) {
                            w.write(",,,,,,");
                        } else {
                            w.write(String.format(Locale.ROOT, ",%.4f,%.4f,%s,%s,%.4f,%s", g.raw().x(), g.raw().y(),
                                    finite(g.speedMs(), 4), finite(g.speedSigmaMs(), 4), g.positionSigmaM(),
                                    finite(g.headingDeg(), 2)));
                        }
                    }
                    w.write('\n');
                }
            }
            w.flush();
        });
    }

    private static String finite(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }
}
