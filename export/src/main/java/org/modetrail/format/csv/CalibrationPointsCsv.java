package org.modetrail.format.csv;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.WorldPoint;

/**
 * Reads a calibration points file: header {@code image_x,image_y,world_x_m,world_y_m} (in any order; other columns
 * are refused so a typo does not pass unnoticed), one point pair per row: where the point is in the image, in pixels
 * from the top-left corner of the frame, and where it is on the ground, in metres (decimals with a dot). Points come
 * back in file order, so point k of the fit's report is data row k. Every problem names its line.
 */
public final class CalibrationPointsCsv {
    public static final List<String> COLUMNS = List.of("image_x", "image_y", "world_x_m", "world_y_m");
    private static final int MAX_ROWS = 100_000;

    private CalibrationPointsCsv() {
    }

    /** The file's points, without checking them against a frame size. */
    public static List<GroundPoint> read(Path file) throws IOException {
        return read(file, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /**
     * @param width  the video's frame width in pixels, to refuse image points outside the frame
     * @param height the video's frame height
     */
    public static List<GroundPoint> read(Path file, double width, double height) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new CsvFormatException(file, 0, "no such file; check the path given to --points");
        }
        List<GroundPoint> points = new ArrayList<>();
        List<Integer> lines = new ArrayList<>();
        int last = CsvLine.read(file, COLUMNS, List.of(), MAX_ROWS, "points", (line, f, columns) -> {
            GroundPoint p = parse(file, line, f, columns, width, height);
            for (int k = 0; k < points.size(); k++) {
                GroundPoint q = points.get(k);
                if (q.image().equals(p.image())) {
                    throw new CsvFormatException(file, line, "the image point " + p.image().x() + ","
                            + p.image().y() + " is already on line " + lines.get(k) + "; each point must be a"
                            + " different place: remove one or correct it");
                }
                if (q.world().equals(p.world())) {
                    throw new CsvFormatException(file, line, "the ground point " + p.world().x() + ","
                            + p.world().y() + " is already on line " + lines.get(k) + "; each point must be a"
                            + " different place: remove one or correct it");
                }
            }
            points.add(p);
            lines.add(line);
        });
        if (points.size() < 4) {
            throw new CsvFormatException(file, last + 1, "only " + points.size() + " point(s); a ground"
                    + " calibration needs at least 4 rows under the header, spread over the ground");
        }
        return points;
    }

    private static GroundPoint parse(Path file, int line, List<String> f, Map<String, Integer> columns, double width,
                                     double height) throws CsvFormatException {
        double u = CsvLine.number(file, line, f, columns, "image_x");
        double v = CsvLine.number(file, line, f, columns, "image_y");
        double x = CsvLine.number(file, line, f, columns, "world_x_m");
        double y = CsvLine.number(file, line, f, columns, "world_y_m");
        if (u < 0 || v < 0 || u > width || v > height) {
            throw new CsvFormatException(file, line, "the image point " + u + "," + v + " lies outside the "
                    + (int) width + "x" + (int) height + " frame");
        }
        return new GroundPoint(new PixelPoint(u, v), new WorldPoint(x, y));
    }

}
