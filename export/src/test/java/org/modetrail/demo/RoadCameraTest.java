package org.modetrail.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class RoadCameraTest {

    /** Stated here, not taken from the defaults: 1280 x 720, f = 1000 px, 8 m up, 25 degrees down, 12 degrees pan. */
    private static final RoadCamera CAMERA = new RoadCamera(1280, 720, 1000, -3, 2, 8, 25, 12);
    private static final PinholeReference REFERENCE =
            new PinholeReference(1000, 640, 360, -3, 2, 8, 25, 12);
    private static final double[][] WORLD = {
        {0, 20, 0}, {3.5, 30, 0}, {14, 45, 0}, {7, 80, 0}, {-2, 15, 0}, {10.5, 25, 1.5}, {5.25, 60, 3.7}};

    @Test
    void projectionAgreesWithIndependentPinholeModel() {
        for (double[] w : WORLD) {
            double[] got = CAMERA.project(w[0], w[1], w[2]);
            double[] want = REFERENCE.project(w[0], w[1], w[2]);
            assertEquals(want[0], got[0], 1e-7, "u of " + java.util.Arrays.toString(w));
            assertEquals(want[1], got[1], 1e-7, "v of " + java.util.Arrays.toString(w));
        }
    }

    @Test
    void groundHomographyAgreesWithIndependentPinholeModel() {
        double[] h = CAMERA.homography();
        assertEquals(1.0, h[8], 0);
        for (double[] w : WORLD) {
            if (w[2] != 0) {
                continue;
            }
            double s = h[6] * w[0] + h[7] * w[1] + h[8];
            double[] want = REFERENCE.project(w[0], w[1], 0);
            assertEquals(want[0], (h[0] * w[0] + h[1] * w[1] + h[2]) / s, 1e-7);
            assertEquals(want[1], (h[3] * w[0] + h[4] * w[1] + h[5]) / s, 1e-7);
        }
    }

    @Test
    void imageToGroundInvertsTheHomography() {
        double[] g = CAMERA.groundFromImage();
        for (double[] w : WORLD) {
            if (w[2] != 0) {
                continue;
            }
            double[] uv = REFERENCE.project(w[0], w[1], 0);
            double s = g[6] * uv[0] + g[7] * uv[1] + g[8];
            assertEquals(w[0], (g[0] * uv[0] + g[1] * uv[1] + g[2]) / s, 1e-6);
            assertEquals(w[1], (g[3] * uv[0] + g[4] * uv[1] + g[5]) / s, 1e-6);
        }
    }

    @Test
    void opticalAxisMeetsTheGroundAtHeightOverTanTilt() {
        // Plain trigonometry: the axis, tilted 25 degrees down from 8 m, reaches the ground 8 / tan 25 m away,
        // in the pan direction; that ground point must image at the principal point.
        double d = 8 / Math.tan(Math.toRadians(25));
        double pan = Math.toRadians(12);
        double[] uv = CAMERA.project(-3 + d * Math.sin(pan), 2 + d * Math.cos(pan), 0);
        assertEquals(640, uv[0], 1e-9);
        assertEquals(360, uv[1], 1e-9);
    }

    @Test
    void pointAboveTheHorizonIsBehindTheGroundPlane() {
        // A far point at camera height lies on the horizon, above the image centre for a downward tilt.
        double far = 1e6;
        double pan = Math.toRadians(12);
        double[] uv = CAMERA.project(-3 + far * Math.sin(pan), 2 + far * Math.cos(pan), 8);
        assertEquals(360 - 1000 * Math.tan(Math.toRadians(25)), uv[1], 1e-3);
    }

    @Test
    void rejectsCamerasThatCannotSeeTheGround() {
        assertThrows(IllegalArgumentException.class, () -> new RoadCamera(640, 480, 500, 0, 0, 8, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> new RoadCamera(640, 480, 500, 0, 0, -1, 20, 0));
        assertThrows(IllegalArgumentException.class, () -> new RoadCamera(640, 480, 0, 0, 0, 8, 20, 0));
    }
}
