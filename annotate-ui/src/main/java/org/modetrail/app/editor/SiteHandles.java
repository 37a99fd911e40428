package org.modetrail.app.editor;

import java.util.ArrayList;
import java.util.List;

import org.modetrail.model.CountingLine;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.Site;
import org.modetrail.model.SiteEdits;
import org.modetrail.model.Zone;

/**
 * Where a pointer is on the zones and counting lines drawn in the view, and what dragging there does to them. Pure
 * geometry, no Swing, as {@link BoxHandles} is for boxes.
 *
 * <p>A zone is reached on its outline (its corners and edges), a line along its length, within {@code tolerance}
 * view pixels; the selected item's corners or ends come first, so they can be dragged where another item's
 * outline passes. Inside a zone, away from its outline, the pointer is free for drawing boxes: only a click there
 * (not a drag) selects the zone ({@link #zoneAt}).
 *
 * <p>Points are kept inside the frame, [0, width] x [0, height] in image pixels: a corner dragged past an edge
 * stops at it, a whole item moved stops when its first point reaches an edge (its shape is kept).
 *
 * @param tolerance how near (view pixels) a point or outline is reached, above 0
 */
public record SiteHandles(double tolerance) {

    /** What is under the pointer: an item, and the corner or end of it ({@code point} index), or -1 for elsewhere on it. */
    public record Hit(SiteItem item, int point) {
        public boolean onPoint() {
            return point >= 0;
        }
    }

    /** Points after an edit, and whether the frame's edge stopped any of them. */
    public record Moved(List<PixelPoint> points, boolean clamped) {
        public Moved {
            points = List.copyOf(points);
        }
    }

    /** Reached within 7 view pixels (a little more than a box's grips: lines and corners are thin targets). */
    public static SiteHandles defaults() {
        return new SiteHandles(7);
    }

    public SiteHandles {
        if (!(tolerance > 0) || !Double.isFinite(tolerance)) {
            throw new IllegalArgumentException("tolerance must be above 0 view pixels, got " + tolerance);
        }
    }

    /** The points of an item: a zone's corners in order, a line's from and to ends. */
    public static List<PixelPoint> points(Site site, SiteItem item) {
        if (item == null) {
            return null;
        }
        if (item.kind() == SiteItem.Kind.ZONE) {
            for (Zone z : site.zones()) {
                if (z.name().equals(item.name())) {
                    return z.polygon();
                }
            }
        } else {
            for (CountingLine l : site.lines()) {
                if (l.name().equals(item.name())) {
                    return List.of(l.from(), l.to());
                }
            }
        }
        return null;
    }

    /**
     * The item under view point (vx, vy): first a corner or end of {@code selected}, then any line, then any zone's
     * outline (lines are drawn over zones); null when none is in reach.
     */
    public Hit hit(Site site, SiteItem selected, ViewTransform t, double vx, double vy) {
        List<PixelPoint> sel = points(site, selected);
        if (sel != null) {
            int i = nearestPoint(sel, t, vx, vy);
            if (i >= 0) {
                return new Hit(selected, i);
            }
        }
        Hit best = null;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (CountingLine l : site.lines()) {
            double d = distanceToSegment(vx, vy, t, l.from(), l.to());
            if (d <= tolerance && d < bestDistance) {
                best = new Hit(SiteItem.line(l.name()), -1);
                bestDistance = d;
            }
        }
        if (best != null) {
            return best;
        }
        for (Zone z : site.zones()) {
            List<PixelPoint> p = z.polygon();
            for (int i = 0, j = p.size() - 1; i < p.size(); j = i++) {
                double d = distanceToSegment(vx, vy, t, p.get(j), p.get(i));
                if (d <= tolerance && d < bestDistance) {
                    best = new Hit(SiteItem.zone(z.name()), -1);
                    bestDistance = d;
                }
            }
        }
        return best;
    }

    /** The smallest zone containing image point (x, y), so nested zones can be reached; null when none does. */
    public static SiteItem zoneAt(Site site, double x, double y) {
        SiteItem best = null;
        double bestArea = Double.POSITIVE_INFINITY;
        PixelPoint p = new PixelPoint(x, y);
        for (Zone z : site.zones()) {
            double a = SiteEdits.area(z.polygon());
            if (z.contains(p) && a < bestArea) {
                best = SiteItem.zone(z.name());
                bestArea = a;
            }
        }
        return best;
    }

    /** The index of the point within reach of (vx, vy), the nearest if several are; -1 when none is. */
    public int nearestPoint(List<PixelPoint> points, ViewTransform t, double vx, double vy) {
        int best = -1;
        double bestDistance = tolerance;
        for (int i = 0; i < points.size(); i++) {
            PixelPoint p = points.get(i);
            double d = Math.hypot(t.toViewX(p.x()) - vx, t.toViewY(p.y()) - vy);
            if (d <= bestDistance) {
                best = i;
                bestDistance = d;
            }
        }
        return best;
    }

    /** The view distance from (vx, vy) to the segment a-b (image points shown through {@code t}). */
    static double distanceToSegment(double vx, double vy, ViewTransform t, PixelPoint a, PixelPoint b) {
        double ax = t.toViewX(a.x()), ay = t.toViewY(a.y());
        double ex = t.toViewX(b.x()) - ax, ey = t.toViewY(b.y()) - ay;
        double len2 = ex * ex + ey * ey;
        double along = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((vx - ax) * ex + (vy - ay) * ey) / len2));
        return Math.hypot(vx - (ax + along * ex), vy - (ay + along * ey));
    }

    /** Image point (x, y) kept inside the frame. */
    public static PixelPoint inFrame(double x, double y, int frameWidth, int frameHeight) {
        return new PixelPoint(Math.max(0, Math.min(frameWidth, x)), Math.max(0, Math.min(frameHeight, y)));
    }

    /** Point {@code index} of {@code points} moved by (dx, dy) image pixels, stopped at the frame's edges. */
    public static Moved movePoint(List<PixelPoint> points, int index, double dx, double dy, int frameWidth,
                                  int frameHeight) {
        List<PixelPoint> out = new ArrayList<>(points);
        PixelPoint p = points.get(index);
        PixelPoint kept = inFrame(p.x() + dx, p.y() + dy, frameWidth, frameHeight);
        out.set(index, kept);
        return new Moved(out, kept.x() != p.x() + dx || kept.y() != p.y() + dy);
    }

    /** All of {@code points} moved by (dx, dy) image pixels, the shift cut so that every point stays in the frame. */
    public static Moved moveAll(List<PixelPoint> points, double dx, double dy, int frameWidth, int frameHeight) {
        double minX = Double.POSITIVE_INFINITY, maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY, maxY = Double.NEGATIVE_INFINITY;
        for (PixelPoint p : points) {
            minX = Math.min(minX, p.x());
            maxX = Math.max(maxX, p.x());
            minY = Math.min(minY, p.y());
            maxY = Math.max(maxY, p.y());
        }
        // The shift that keeps the points' extent in the frame; an item wider than the frame stays where it is.
        double sx = Math.max(Math.min(0, -minX), Math.min(Math.max(0, frameWidth - maxX), dx));
        double sy = Math.max(Math.min(0, -minY), Math.min(Math.max(0, frameHeight - maxY), dy));
        List<PixelPoint> out = new ArrayList<>(points.size());
        for (PixelPoint p : points) {
            out.add(new PixelPoint(p.x() + sx, p.y() + sy));
        }
        return new Moved(out, sx != dx || sy != dy);
    }
}
