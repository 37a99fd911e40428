package org.modetrail.app.editor;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.model.GroundCalibration;
import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;

/**
 * The ground grid to draw over the picture once a calibration exists: lines of constant ground x and y every
 * {@code spacing} metres, over the points' ground extent rounded out to whole spacings, mapped into the image through the
 * calibration's ground-to-image map. View geometry only. Each line is cut into short pieces so that a piece lying
 * beyond the horizon (on the other side of the camera from the points) is left out rather than drawn wrapped.
 *
 * @param spacing  metres between lines: 1, 2 or 5 times a power of ten, so that about 10 to 25 lines span the area
 * @param segments the pieces to draw, in image pixels
 */
record GroundGrid(double spacing, List<Segment> segments) {
    /** One straight piece of a grid line in the image; {@code major} for lines every 5 spacings (and 0). */
    record Segment(PixelPoint a, PixelPoint b, boolean major) {
    }

    /** Pieces each grid line is cut into. */
    private static final int PIECES = 12;
    /** Most grid cells across the points' larger extent. */
    private static final int MAX_CELLS = 25;

    GroundGrid {
        segments = List.copyOf(segments);
    }

    /** The spacing for a ground extent of {@code extent} metres: the smallest 1-2-5 step giving at most 25 cells. */
    static double spacingFor(double extent) {
        if (!(extent > 0) || !Double.isFinite(extent)) {
            return 1;
        }
        double raw = extent / MAX_CELLS;
        double decade = Math.pow(10, Math.floor(Math.log10(raw)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * decade >= raw * (1 - 1e-9)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    static GroundGrid of(GroundCalibration c) {
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        double cx = 0;
        double cy = 0;
        for (GroundPoint p : c.points()) {
            minX = Math.min(minX, p.world().x());
            maxX = Math.max(maxX, p.world().x());
            minY = Math.min(minY, p.world().y());
            maxY = Math.max(maxY, p.world().y());
            cx += p.world().x() / c.points().size();
            cy += p.world().y() / c.points().size();
        }
        double s = spacingFor(Math.max(maxX - minX, maxY - minY));
        double x0 = Math.floor(minX / s) * s;
        double x1 = Math.ceil(maxX / s) * s;
        double y0 = Math.floor(minY / s) * s;
        double y1 = Math.ceil(maxY / s) * s;
        double[] g = c.imageToWorld().inverse().entries();
        double side = Math.signum(g[6] * cx + g[7] * cy + g[8]);
        List<Segment> out = new ArrayList<>();
        for (long k = Math.round(x0 / s); k <= Math.round(x1 / s); k++) {
            line(g, side, k * s, y0, k * s, y1, k % 5 == 0, out);
        }
        for (long k = Math.round(y0 / s); k <= Math.round(y1 / s); k++) {
            line(g, side, x0, k * s, x1, k * s, k % 5 == 0, out);
        }
        return new GroundGrid(s, out);
    }

    private static void line(double[] g, double side, double ax, double ay, double bx, double by, boolean major,
                             List<Segment> out) {
        PixelPoint prev = null;
        for (int i = 0; i <= PIECES; i++) {
            double t = i / (double) PIECES;
            PixelPoint p = map(g, side, ax + t * (bx - ax), ay + t * (by - ay));
            if (p != null && prev != null) {
                out.add(new Segment(prev, p, major));
            }
            prev = p;
        }
    }

    /** The ground point in the image, or null where it lies at or beyond the horizon. */
    private static PixelPoint map(double[] g, double side, double x, double y) {
        double w = g[6] * x + g[7] * y + g[8];
        if (Math.signum(w) != side || Math.abs(w) < 1e-9) {
            return null;
        }
        double u = (g[0] * x + g[1] * y + g[2]) / w;
        double v = (g[3] * x + g[4] * y + g[5]) / w;
        return Double.isFinite(u) && Double.isFinite(v) && Math.abs(u) < 1e6 && Math.abs(v) < 1e6
                ? new PixelPoint(u, v) : null;
    }
}
