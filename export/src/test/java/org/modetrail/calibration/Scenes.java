package org.modetrail.calibration;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.modetrail.model.GroundPoint;
import org.modetrail.model.PixelPoint;
import org.modetrail.model.WorldPoint;

/** Synthetic ground scenes for the tests: a fixed ground-to-image homography and points projected through it. */
final class Scenes {
    /**
     * Ground to image of a camera 10 m up a pole beside a road (the numbers of clips/road-calibration.csv, h33 = 1):
     * (u, v, 1) ~ H (x, y, 1), x across the road and y along it in metres, u and v in pixels of a 960 x 540 frame.
     */
    static final double[] GROUND_TO_IMAGE = {
        183.210924161849, 52.761869324265, 1101.246137240964,
        0.461585601269, 1.609740292933, 1727.338795443153,
        0.058123728858, 0.202701531548, 1};

    private Scenes() {
    }

    static double[] apply(double[] h, double x, double y) {
        double w = h[6] * x + h[7] * y + h[8];
        return new double[] {(h[0] * x + h[1] * y + h[2]) / w, (h[3] * x + h[4] * y + h[5]) / w};
    }

    static GroundPoint exact(double[] g2i, double x, double y) {
        double[] p = apply(g2i, x, y);
        return new GroundPoint(new PixelPoint(p[0], p[1]), new WorldPoint(x, y));
    }

    /** {@code n} ground points spread over x 0..14 m, y 12..60 m, seen by the camera with Gaussian image noise. */
    static List<GroundPoint> road(int n, double noisePx, long seed) {
        Random r = new Random(seed);
        List<GroundPoint> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double x = 14 * r.nextDouble();
            double y = 12 + 48 * r.nextDouble();
            double[] p = apply(GROUND_TO_IMAGE, x, y);
            out.add(new GroundPoint(new PixelPoint(p[0] + noisePx * r.nextGaussian(),
                    p[1] + noisePx * r.nextGaussian()), new WorldPoint(x, y)));
        }
        return out;
    }
}
