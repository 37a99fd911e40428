package org.modetrail.summary;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.modetrail.format.project.AtomicWrite;
import org.modetrail.model.CountingLine;
import org.modetrail.model.Site;
import org.modetrail.model.Zone;

/**
 * The per-track summary as CSV, one row per track: {@code track_id,class,first_frame,last_frame,boxed_frames,
 * duration_s,path_px,path_m,mean_speed_m_s,peak_speed_m_s,peak_speed_sigma_m_s,peak_left_out_frames} (the frames
 * with a speed that the peak leaves out, see {@link TrackSummaries}), then {@code zone:NAME:s} per zone
 * and {@code line:NAME:left_to_right}, {@code line:NAME:right_to_left} per counting line. Empty cells where a value
 * needs a calibration the project does not have. Dot decimals whatever the locale; written atomically.
 */
public final class SummaryCsv {
    public static final String FIXED_HEADER = "track_id,class,first_frame,last_frame,boxed_frames,duration_s,"
            + "path_px,path_m,mean_speed_m_s,peak_speed_m_s,peak_speed_sigma_m_s,peak_left_out_frames";

    private SummaryCsv() {
    }

    public static void write(List<TrackSummary> summaries, Site site, Path out) throws IOException {
        AtomicWrite.replace(out, os -> {
            Writer w = new BufferedWriter(new OutputStreamWriter(os, StandardCharsets.UTF_8));
            w.write(header(site));
            w.write('\n');
            for (TrackSummary s : summaries) {
                List<String> cells = new ArrayList<>();
                cells.add(Integer.toString(s.trackId()));
                cells.add(quote(s.className()));
                cells.add(s.firstFrame() < 0 ? "" : Integer.toString(s.firstFrame()));
                cells.add(s.lastFrame() < 0 ? "" : Integer.toString(s.lastFrame()));
                cells.add(Integer.toString(s.boxedFrames()));
                cells.add(number(s.durationS(), 4));
                cells.add(number(s.pathLengthPx(), 2));
                cells.add(number(s.pathLengthM(), 3));
                cells.add(number(s.meanSpeedMs(), 3));
                cells.add(number(s.peakSpeedMs(), 3));
                cells.add(number(s.peakSpeedSigmaMs(), 3));
                cells.add(Double.isFinite(s.pathLengthM()) ? Integer.toString(s.peakLeftOut()) : "");
                for (Zone z : site.zones()) {
                    cells.add(number(s.secondsInZone().getOrDefault(z.name(), 0.0), 4));
                }
                for (CountingLine l : site.lines()) {
                    cells.add(Long.toString(s.crossingCount(l.name(), CrossingDirection.LEFT_TO_RIGHT)));
                    cells.add(Long.toString(s.crossingCount(l.name(), CrossingDirection.RIGHT_TO_LEFT)));
                }
                w.write(String.join(",", cells));
                w.write('\n');
            }
            w.flush();
        });
    }

    static String header(Site site) {
        StringBuilder h = new StringBuilder(FIXED_HEADER);
        for (Zone z : site.zones()) {
            h.append(',').append(quote("zone:" + z.name() + ":s"));
        }
        for (CountingLine l : site.lines()) {
            h.append(',').append(quote("line:" + l.name() + ":left_to_right"));
            h.append(',').append(quote("line:" + l.name() + ":right_to_left"));
        }
        return h.toString();
    }

    private static String number(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }

    /** RFC 4180 quoting where a name needs it. */
    private static String quote(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }
}
