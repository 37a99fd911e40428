package org.modetrail.demo;

/**
 * A pinhole camera written out from first principles for the tests, independently of {@link RoadCamera}:
 * {@code x ~ K [R | -R C] X} (Hartley and Zisserman, "Multiple View Geometry", 2nd ed., section 6.1). The rotation
 * is built as a product of elementary rotations rather than from axis vectors as RoadCamera does.
 */
final class PinholeReference {

    private final double[][] p = new double[3][4];

    /**
     * @param focalPx focal length in pixels; principal point (u0, v0)
     * @param cx      camera centre in world metres (x across the road, y along it, z up)
     * @param tiltDeg optical axis below the horizontal
     * @param panDeg  optical axis turned from +y towards +x
     */
    PinholeReference(double focalPx, double u0, double v0, double cx, double cy, double cz,
                     double tiltDeg, double panDeg) {
        double t = Math.toRadians(tiltDeg);
        double s = Math.toRadians(panDeg);
        // Level camera looking along +y: camera x = world x, camera y (down) = -world z, camera z = world y.
        double[][] level = {{1, 0, 0}, {0, 0, -1}, {0, 1, 0}};
        // Turning the camera clockwise (seen from above) by s equals rotating the world anticlockwise by s.
        double[][] pan = {{Math.cos(s), -Math.sin(s), 0}, {Math.sin(s), Math.cos(s), 0}, {0, 0, 1}};
        // Pitching down by t about the camera's x axis (y down): the new optical axis is (0, sin t, cos t).
        double[][] tilt = {{1, 0, 0}, {0, Math.cos(t), -Math.sin(t)}, {0, Math.sin(t), Math.cos(t)}};
        double[][] r = multiply(tilt, multiply(level, pan));
        double[][] k = {{focalPx, 0, u0}, {0, focalPx, v0}, {0, 0, 1}};
        double[] centre = {cx, cy, cz};
        double[][] rt = new double[3][4];
        for (int i = 0; i < 3; i++) {
            System.arraycopy(r[i], 0, rt[i], 0, 3);
            rt[i][3] = -(r[i][0] * centre[0] + r[i][1] * centre[1] + r[i][2] * centre[2]);
        }
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 4; j++) {
                for (int m = 0; m < 3; m++) {
                    p[i][j] += k[i][m] * rt[m][j];
                }
            }
        }
    }

    static PinholeReference of(RoadCamera c) {
        return new PinholeReference(c.focalPx(), c.widthPx() / 2.0, c.heightPx() / 2.0, c.xM(), c.yM(), c.heightM(),
                c.tiltDeg(), c.panDeg());
    }

    /** (u, v) of a world point. */
    double[] project(double x, double y, double z) {
        double[] h = new double[3];
        for (int i = 0; i < 3; i++) {
            h[i] = p[i][0] * x + p[i][1] * y + p[i][2] * z + p[i][3];
        }
        return new double[] {h[0] / h[2], h[1] / h[2]};
    }

    private static double[][] multiply(double[][] a, double[][] b) {
        double[][] c = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                for (int m = 0; m < 3; m++) {
                    c[i][j] += a[i][m] * b[m][j];
                }
            }
        }
        return c;
    }
}
