package org.modetrail.demo;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Ground truth as CSV: a header, then one row per object per frame in frame order. Numbers use a dot for decimals
 * whatever the machine's locale.
 */
public final class TruthCsv {

    public static final String IMAGE_HEADER = "track_id,class,frame,time_s,x,y,width,height,visible";
    public static final String WORLD_HEADER = IMAGE_HEADER + ",world_x_m,world_y_m,speed_m_s";

    private TruthCsv() {
    }

    /** Writes {@code rows} atomically; with {@code world} true the three road columns are included. */
    public static void write(Path target, List<TruthRow> rows, boolean world) throws IOException {
        AtomicFiles.writeText(target, out -> write(out, rows, world));
    }

    static void write(Writer out, List<TruthRow> rows, boolean world) throws IOException {
        out.write(world ? WORLD_HEADER : IMAGE_HEADER);
        out.write('\n');
        StringBuilder line = new StringBuilder(128);
        for (TruthRow r : rows) {
            line.setLength(0);
            line.append(r.trackId()).append(',').append(r.objectClass()).append(',').append(r.frame()).append(',')
                    .append(number(r.timeS(), 4)).append(',')
                    .append(number(r.x(), 3)).append(',').append(number(r.y(), 3)).append(',')
                    .append(number(r.width(), 3)).append(',').append(number(r.height(), 3)).append(',')
                    .append(number(r.visible(), 4));
            if (world) {
                line.append(',').append(number(r.worldXM(), 4)).append(',').append(number(r.worldYM(), 4))
                        .append(',').append(number(r.speedMS(), 4));
            }
            out.write(line.append('\n').toString());
        }
    }

    /** Fixed decimals, trailing zeros dropped: "12", "0.04", "0.8731". */
    static String number(double v, int decimals) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("cannot write " + v + " to a truth file");
        }
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.indexOf('.') >= 0) {
            int end = s.length();
            while (s.charAt(end - 1) == '0') {
                end--;
            }
            if (s.charAt(end - 1) == '.') {
                end--;
            }
            s = s.substring(0, end);
        }
        return s.equals("-0") ? "0" : s;
    }
}
