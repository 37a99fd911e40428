package org.modetrail.model;

import java.util.List;

/**
 * A named area drawn on the video (a nest box, a crossing, a lane), as a simple polygon in image pixels. A track is
 * inside while its ground contact point is.
 */
public record Zone(String name, List<PixelPoint> polygon) {
    public Zone {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a zone needs a name");
        }
        name = name.strip();
        polygon = List.copyOf(polygon);
        if (polygon.size() < 3) {
            throw new IllegalArgumentException("zone '" + name + "' needs at least 3 corners, got " + polygon.size());
        }
    }

    /** Whether {@code p} lies inside the polygon (even-odd rule; points on an edge may fall either way). */
    public boolean contains(PixelPoint p) {
        boolean inside = false;
        int n = polygon.size();
        for (int i = 0, j = n - 1; i < n; j = i++) {
            PixelPoint a = polygon.get(i);
            PixelPoint b = polygon.get(j);
            if ((a.y() > p.y()) != (b.y() > p.y())
                    && p.x() < (b.x() - a.x()) * (p.y() - a.y()) / (b.y() - a.y()) + a.x()) {
                inside = !inside;
            }
        }
        return inside;
    }
}
