package org.modetrail.model;

/** A point on the ground plane in metres, in the frame of the site plan or the measured marks the user gave. */
public record WorldPoint(double x, double y) {
    public WorldPoint {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("a ground point needs finite coordinates, got " + x + ", " + y);
        }
    }

    public double distance(WorldPoint o) {
        return Math.hypot(x - o.x, y - o.y);
    }
}
