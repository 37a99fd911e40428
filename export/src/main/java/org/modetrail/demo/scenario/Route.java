package org.modetrail.demo.scenario;

/**
 * A path of centre positions, one per frame. Internal value holder: the arrays are owned by the route once made.
 */
record Route(double[] x, double[] y) {

    Route {
        if (x.length != y.length || x.length == 0) {
            throw new IllegalArgumentException("route needs as many x as y values, at least one");
        }
    }

    int frames() {
        return x.length;
    }

    /** Where the centre may go: the frame less a margin that keeps the largest body inside. */
    record Area(double minX, double minY, double maxX, double maxY) {

        Area {
            if (!(maxX > minX) || !(maxY > minY)) {
                throw new IllegalArgumentException("area must have positive size");
            }
        }

        static Area inside(int width, int height, double marginX, double marginY) {
            return new Area(marginX, marginY, width - marginX, height - marginY);
        }

        boolean contains(double px, double py) {
            return px >= minX && px <= maxX && py >= minY && py <= maxY;
        }

        double centreX() {
            return (minX + maxX) / 2;
        }

        double centreY() {
            return (minY + maxY) / 2;
        }
    }
}
