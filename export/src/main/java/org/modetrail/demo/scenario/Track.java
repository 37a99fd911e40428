package org.modetrail.demo.scenario;

/**
 * The motion of one object over the whole clip: centre, heading and size (a factor on the look's semi-axes) for
 * every frame, computed once when the scenario is made.
 */
final class Track {

    private final double[] cx;
    private final double[] cy;
    private final double[] heading;
    private final double[] size;

    Track(double[] cx, double[] cy, double[] heading, double[] size) {
        int n = cx.length;
        if (cy.length != n || heading.length != n || size.length != n) {
            throw new IllegalArgumentException("track arrays must all have one value per frame");
        }
        for (double s : size) {
            if (!(s > 0)) {
                throw new IllegalArgumentException("object size factor must be positive, got " + s);
            }
        }
        this.cx = cx.clone();
        this.cy = cy.clone();
        this.heading = heading.clone();
        this.size = size.clone();
    }

    /** A track of constant size 1. */
    static Track of(Route route, double[] heading) {
        double[] one = new double[route.frames()];
        java.util.Arrays.fill(one, 1);
        return new Track(route.x(), route.y(), heading, one);
    }

    int frames() {
        return cx.length;
    }

    double cx(int frame) {
        return cx[frame];
    }

    double cy(int frame) {
        return cy[frame];
    }

    double heading(int frame) {
        return heading[frame];
    }

    double size(int frame) {
        return size[frame];
    }

    Pose pose(int frame, ObjectLook look) {
        double s = size[frame];
        return Pose.of(cx[frame], cy[frame], look.semiLength() * s, look.semiWidth() * s, heading[frame]);
    }
}
