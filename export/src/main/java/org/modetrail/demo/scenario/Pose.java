package org.modetrail.demo.scenario;

/**
 * Where a body is in one frame: centre, semi-axes and heading. A pixel belongs to the body when its centre lies
 * strictly inside the superellipse {@code (u/a)^4 + (v/b)^4 < 1}, {@code u} along the heading; painting and ground
 * truth use this one test, so the truth box is the box of the painted pixels.
 *
 * @param cx  centre x in image coordinates (pixel {@code i} spans {@code [i, i+1)})
 * @param cy  centre y
 * @param a   semi-length along the heading
 * @param b   semi-width
 * @param cos cosine of the heading (radians from +x towards +y, image down)
 * @param sin sine of the heading
 */
record Pose(double cx, double cy, double a, double b, double cos, double sin) {

    static Pose of(double cx, double cy, double a, double b, double heading) {
        // StrictMath: identical results on every JVM, so truth files do not depend on the machine.
        return new Pose(cx, cy, a, b, StrictMath.cos(heading), StrictMath.sin(heading));
    }

    /** Superellipse value at the centre of pixel (i, j): below 1 inside the body. */
    double q(int i, int j) {
        double dx = i + 0.5 - cx;
        double dy = j + 0.5 - cy;
        double nu = (dx * cos + dy * sin) / a;
        double nv = (-dx * sin + dy * cos) / b;
        double u2 = nu * nu;
        double v2 = nv * nv;
        return u2 * u2 + v2 * v2;
    }

    boolean covers(int i, int j) {
        return q(i, j) < 1;
    }

    /** Half-width of a box surely holding the body: that of the rotated a x b rectangle around it. */
    double halfExtentX() {
        return a * Math.abs(cos) + b * Math.abs(sin);
    }

    double halfExtentY() {
        return a * Math.abs(sin) + b * Math.abs(cos);
    }

    int firstColumn() {
        return (int) Math.floor(cx - halfExtentX());
    }

    int lastColumn() {
        return (int) Math.ceil(cx + halfExtentX());
    }

    int firstRow() {
        return (int) Math.floor(cy - halfExtentY());
    }

    int lastRow() {
        return (int) Math.ceil(cy + halfExtentY());
    }
}
